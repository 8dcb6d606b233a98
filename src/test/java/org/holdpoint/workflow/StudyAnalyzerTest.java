package org.holdpoint.workflow;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import org.holdpoint.stats.Conclusion;
import org.holdpoint.stats.LocationMethod;
import org.holdpoint.stats.Sample;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.Exclusion;
import org.holdpoint.study.GroupData;
import org.holdpoint.study.ImportReport;
import org.holdpoint.study.MarginSpec;
import org.holdpoint.study.Progress;
import org.holdpoint.study.SpecLimits;
import org.holdpoint.result.StudyResult;
import org.holdpoint.result.Verdict;
import org.junit.jupiter.api.Test;

/**
 * The analysis use case end to end on the NIST/SEMATECH e-Handbook §7.3.1 device assembly-time data
 * (old process = before, n = 11; new process = after, n = 9). Published (as quoted, see the shared
 * docs/sources.md §B7): Welch t = 2.2694 for old − new, Welch–Satterthwaite df ≈ 15.5; recomputed there:
 * t = 2.269373, df = 15.532514, t(0.95, 15.53) = 1.749112. Our difference is after − before, so t is
 * −2.2694 and the difference −3.868687 (32.222222 − 36.090909).
 */
class StudyAnalyzerTest {
    private static final double[] OLD = {32, 37, 35, 28, 41, 44, 35, 31, 34, 38, 42};
    private static final double[] NEW = {36, 31, 30, 31, 34, 36, 29, 32, 31};

    private static Dataset assemblyTimes() {
        CharacteristicData c = new CharacteristicData("Assembly time", "min", GroupData.typed(Sample.of(OLD), "old"),
                GroupData.typed(Sample.of(NEW), "new"), false, List.of());
        return new Dataset(List.of(c), List.of(), new ImportReport(20, java.util.Map.of(), List.of(), List.of()));
    }

    private static AnalysisSettings withMargin(double d, Double sdLimit) {
        CharacteristicSettings s = new CharacteristicSettings("min", SpecLimits.NONE,
                new MarginSpec(MarginSpec.Kind.ABSOLUTE, -d, d), sdLimit, null, null);
        return new AnalysisSettings(0.05, false, false, s, null, null, null);
    }

    private static CharacteristicResult analyse(AnalysisSettings settings) {
        StudyResult r = new StudyAnalyzer().analyze(assemblyTimes(), settings, Progress.NONE);
        return r.characteristics().get(0);
    }

    @Test
    void welchIsTheDefaultAndMatchesTheHandbook() {
        CharacteristicResult r = analyse(withMargin(10, null));
        assertThat(r.method()).isEqualTo(LocationMethod.WELCH);
        // NIST/SEMATECH e-Handbook 7.3.1: t = 2.2694 (old - new), df ~ 15.5; recomputed 2.269373, 15.532514
        assertThat(r.welch().t()).isCloseTo(-2.269373, within(1e-6));
        assertThat(r.welch().df()).isCloseTo(15.532514, within(1e-6));
        assertThat(r.welch().estimate()).isCloseTo(32.222222 - 36.090909, within(1e-6));
    }

    @Test
    void theThreeConclusionsFollowTheNinetyPercentInterval() {
        // 90 % interval = -3.868687 -/+ 1.749112 * 1.704725 = (-6.8505, -0.8869) from the recomputed handbook values
        assertThat(analyse(withMargin(10, null)).tost().conclusion()).isEqualTo(Conclusion.EQUIVALENT);
        assertThat(analyse(withMargin(2, null)).tost().conclusion()).isEqualTo(Conclusion.INCONCLUSIVE);
        assertThat(analyse(withMargin(0.5, null)).tost().conclusion()).isEqualTo(Conclusion.NOT_EQUIVALENT);
        CharacteristicResult r = analyse(withMargin(2, null));
        assertThat(r.tost().ciLower()).isCloseTo(-6.8505, within(1e-3));
        assertThat(r.tost().ciUpper()).isCloseTo(-0.8869, within(1e-3));
        assertThat(r.verdict().status()).isEqualTo(Verdict.Status.INCONCLUSIVE);
    }

    @Test
    void overallVerdictNeedsEveryCharacteristicToPass() {
        StudyResult passed = new StudyAnalyzer().analyze(assemblyTimes(), withMargin(10, null), Progress.NONE);
        assertThat(passed.changeVerified()).isTrue();
        StudyResult notAssessed = new StudyAnalyzer().analyze(assemblyTimes(),
                AnalysisSettings.defaultSettings(), Progress.NONE);
        assertThat(notAssessed.changeVerified()).isFalse();
        CharacteristicResult r = notAssessed.characteristics().get(0);
        assertThat(r.verdict().status()).isEqualTo(Verdict.Status.NOT_ASSESSED);
        assertThat(r.tost()).isNull();
        assertThat(r.notes()).anyMatch(n -> n.contains("equivalence was not assessed (no margin set)"));
        assertThat(notAssessed.failing()).singleElement().asString().contains("Assembly time");
    }

    @Test
    void anSdGrowthLimitThatIsNotMetFailsAnEquivalentCharacteristic() {
        // sd(new)/sd(old) = 2.538591/4.908249 = 0.5172 (recomputed handbook values); a limit of 0.3 cannot be met
        CharacteristicResult r = analyse(withMargin(10, 0.3));
        assertThat(r.tost().conclusion()).isEqualTo(Conclusion.EQUIVALENT);
        assertThat(r.sdGrowth().sdRatio()).isCloseTo(2.538591 / 4.908249, within(1e-6));
        assertThat(r.sdGrowth().met()).isFalse();
        assertThat(r.verdict().status()).isEqualTo(Verdict.Status.FAILED);
        assertThat(analyse(withMargin(10, 5.0)).sdGrowth().met()).isTrue();
    }

    @Test
    void anExclusionNeedsAReasonAndIsRecorded() {
        assertThatThrownBy(() -> new Exclusion(null, "A3", " ")).hasMessageContaining("needs a reason");
        AnalysisSettings s = new AnalysisSettings(0.05, false, false, withMargin(10, null).defaults(), null, null,
                List.of(new Exclusion(null, "A6", "fixture loose during this part")));
        CharacteristicResult r = analyse(s);
        // row 6 of the typed 'old' group holds 44 (the sixth value); it is left out of the before group
        assertThat(r.before().n()).isEqualTo(10);
        assertThat(r.notes()).anyMatch(n -> n.contains("fixture loose") && n.contains("44"));
    }

    @Test
    void aCharacteristicThatCannotBeAnalysedIsNamed() {
        CharacteristicData flat = new CharacteristicData("Flat", null, GroupData.typed(Sample.of(1, 1, 1), "b"),
                GroupData.typed(Sample.of(1, 1), "a"), false, List.of());
        Dataset d = new Dataset(List.of(flat), List.of(), new ImportReport(5, java.util.Map.of(), List.of(),
                List.of()));
        assertThatThrownBy(() -> new StudyAnalyzer().analyze(d, AnalysisSettings.defaultSettings(), Progress.NONE))
                .isInstanceOf(AnalysisException.class).hasMessageContaining("Flat")
                .hasMessageContaining("no variation in either group");
    }

    @Test
    void aCharacteristicThatCannotBeAssessedLeavesTheOthersAnalysed() {
        CharacteristicData flat = new CharacteristicData("Flat", "mm", GroupData.typed(Sample.ofDecimals("0.500",
                "0.500", "0.500"), "b"), GroupData.typed(Sample.ofDecimals("0.500", "0.500"), "a"), false, List.of());
        CharacteristicData one = new CharacteristicData("One", "mm", GroupData.typed(Sample.of(1.2), "b"),
                GroupData.typed(Sample.of(1.1, 1.3, 1.2), "a"), false, List.of());
        CharacteristicData ok = new CharacteristicData("Ok", "mm", GroupData.typed(Sample.of(1.1, 1.3, 1.2), "b"),
                GroupData.typed(Sample.of(1.0, 1.2, 1.4), "a"), false, List.of());
        Dataset d = new Dataset(List.of(flat, one, ok), List.of(), new ImportReport(14, java.util.Map.of(),
                List.of(), List.of()));
        var result = new StudyAnalyzer().analyze(d, AnalysisSettings.defaultSettings(), Progress.NONE);
        var flatResult = result.characteristics().get(0);
        assertThat(flatResult.verdict().status()).isEqualTo(org.holdpoint.result.Verdict.Status.NOT_ASSESSABLE);
        assertThat(flatResult.verdict().reasons().get(0)).contains("every before value is 0.500 mm",
                "values recorded to 0.001 mm", "check the measurement system");
        assertThat(flatResult.decidingTest()).isNull();
        assertThat(result.characteristics().get(1).verdict().reasons().get(0))
                .contains("the before group has only 1 value");
        assertThat(result.characteristics().get(2).decidingTest()).isNotNull();
        assertThat(result.changeVerified()).isFalse();
        assertThat(result.summary()).contains("2 could not be assessed");
    }
}
