package org.holdpoint.ui.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import java.util.Map;
import org.holdpoint.stats.Sample;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.GroupData;
import org.holdpoint.study.MarginSpec;
import org.holdpoint.study.SpecLimits;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

/** The Criteria step's model: validation as typed, the reason beside a bad cell, fill-down, copy-from, conversion. */
class CriteriaTableTest {
    private CriteriaTable t;

    private static CharacteristicData c(String name) {
        GroupData g = GroupData.typed(Sample.of(1, 2, 3), "typed");
        return new CharacteristicData(name, "mm", g, g, false, null);
    }

    @BeforeEach
    void rows() {
        t = new CriteriaTable();
        t.showData(List.of(c("A"), c("B"), c("C")), Map.of("B", new CharacteristicSettings("mm",
                new SpecLimits(9.9, 10.0, 10.1), new MarginSpec(MarginSpec.Kind.PERCENT_OF_TOLERANCE, 10.0, 10.0),
                1.25, 1.33, null)));
    }

    @Test
    void criteriaFoundBesideTheDataAreShownAsText() {
        assertThat(t.get(1, CriteriaColumn.LSL)).isEqualTo("9.9");
        assertThat(t.get(1, CriteriaColumn.MARGIN)).isEqualTo("10");
        assertThat(t.get(1, CriteriaColumn.MARGIN_IN)).isEqualTo(CriteriaTable.IN_PERCENT);
        assertThat(t.get(1, CriteriaColumn.PAIRED)).isEqualTo(CriteriaTable.FROM_DATA);
        assertThat(t.get(0, CriteriaColumn.UNIT)).isEqualTo("mm");
        assertThat(t.rowsWithProblems()).isZero();
    }

    @Test
    void theDistributionOfTheCriteriaSurvivesTheTable() {
        t = new CriteriaTable();
        t.showData(List.of(c("A"), c("B")), Map.of("A", new CharacteristicSettings("mm", new SpecLimits(null, null,
                0.05), null, null, null, null, org.holdpoint.study.DistributionSetting.WEIBULL)));
        assertThat(t.get(0, CriteriaColumn.DISTRIBUTION)).isEqualTo("weibull");
        assertThat(t.get(1, CriteriaColumn.DISTRIBUTION)).isEqualTo(CriteriaTable.BY_RULE);
        assertThat(t.toSettings().get("A").distribution()).isEqualTo(org.holdpoint.study.DistributionSetting.WEIBULL);
        assertThat(t.toSettings().get("B").distribution()).isNull();
        t.set(1, CriteriaColumn.DISTRIBUTION, "triangular");
        assertThat(t.rowsWithProblems()).isEqualTo(1);
        t.set(1, CriteriaColumn.DISTRIBUTION, "auto");
        assertThat(t.toSettings().get("B").distribution()).isEqualTo(org.holdpoint.study.DistributionSetting.AUTO);
    }

    @Test
    void aRatioMarginIsTypedAsROrAsLowerSlashUpper() {
        t.set(0, CriteriaColumn.MARGIN_IN, CriteriaTable.IN_RATIO);
        t.set(0, CriteriaColumn.MARGIN, "1.25");
        MarginSpec m = t.toSettings().get("A").margin();
        assertThat(m.kind()).isEqualTo(MarginSpec.Kind.RATIO);
        assertThat(m.lower()).isEqualTo(0.8);
        assertThat(m.upper()).isEqualTo(1.25);
        t.set(0, CriteriaColumn.MARGIN, " / 1.2");
        assertThat(t.toSettings().get("A").margin().lower()).isNull();
        t.set(0, CriteriaColumn.MARGIN, "1.1 / 1.2");
        assertThat(t.rowsWithProblems()).isEqualTo(1);
        assertThat(t.problem(0, CriteriaColumn.MARGIN)).contains("must lie between 0 and 1");
    }

    @Test
    void aBadCellKeepsWhatWasTypedAndSaysWhyBesideIt() {
        t.set(0, CriteriaColumn.LSL, "25,01");
        assertThat(t.get(0, CriteriaColumn.LSL)).isEqualTo("25,01");
        assertThat(t.problem(0, CriteriaColumn.LSL)).contains("point as the decimal separator").contains("25.01");
        t.set(0, CriteriaColumn.LSL, "abc");
        assertThat(t.problem(0, CriteriaColumn.LSL)).isEqualTo("\"abc\" is not a number");
        t.set(0, CriteriaColumn.LSL, "5");
        t.set(0, CriteriaColumn.USL, "4");
        assertThat(t.problem(0, CriteriaColumn.USL)).isEqualTo("the USL (4) must be above the LSL (5)");
        assertThat(t.rowProblem(0)).isEqualTo("USL: the USL (4) must be above the LSL (5)");
        t.set(0, CriteriaColumn.NOMINAL, "7");
        t.set(0, CriteriaColumn.USL, "6");
        assertThat(t.problem(0, CriteriaColumn.NOMINAL)).isEqualTo("the nominal value (7) must lie between the LSL "
                + "and the USL");
        assertThatThrownBy(t::toSettings).isInstanceOf(IllegalStateException.class).hasMessageContaining("\"A\"")
                .hasMessageContaining("Nominal");
    }

    @Test
    void marginsAreCheckedAgainstTheirKind() {
        t.set(0, CriteriaColumn.MARGIN, "-0.01");
        assertThat(t.problem(0, CriteriaColumn.MARGIN)).contains("positive number d");
        t.set(0, CriteriaColumn.MARGIN, "0.01 / 0.02");
        assertThat(t.problem(0, CriteriaColumn.MARGIN)).contains("must contain 0");
        t.set(0, CriteriaColumn.MARGIN, "10");
        t.set(0, CriteriaColumn.MARGIN_IN, CriteriaTable.IN_PERCENT);
        assertThat(t.problem(0, CriteriaColumn.MARGIN)).isEqualTo("a margin in % of the tolerance needs both the LSL and the USL");
        t.set(0, CriteriaColumn.MARGIN_IN, "percent");
        assertThat(t.problem(0, CriteriaColumn.MARGIN_IN)).startsWith("choose one of");
        t.set(0, CriteriaColumn.SD_GROWTH, "0");
        assertThat(t.problem(0, CriteriaColumn.SD_GROWTH)).contains("above 0");
    }

    @Test
    void validRowsBecomeTheStudySettings() {
        t.set(0, CriteriaColumn.MARGIN, "-0.01 / 0.02");
        t.set(2, CriteriaColumn.MARGIN, " / 0.03");
        t.set(2, CriteriaColumn.PAIRED, "yes");
        Map<String, CharacteristicSettings> s = t.toSettings();
        assertThat(s.keySet()).containsExactly("A", "B", "C");
        assertThat(s.get("A").margin()).isEqualTo(new MarginSpec(MarginSpec.Kind.ABSOLUTE, -0.01, 0.02));
        assertThat(s.get("B").margin()).isEqualTo(new MarginSpec(MarginSpec.Kind.PERCENT_OF_TOLERANCE, 10.0, 10.0));
        assertThat(s.get("B").spec()).isEqualTo(new SpecLimits(9.9, 10.0, 10.1));
        assertThat(s.get("C").margin()).isEqualTo(new MarginSpec(MarginSpec.Kind.ABSOLUTE, null, 0.03));
        assertThat(s.get("C").paired()).isTrue();
        assertThat(s.get("A").paired()).isNull();
        assertThat(s.get("A").sdGrowthLimit()).isNull();
    }

    @Test
    void fillDownAndCopyFromTouchOnlyTheChosenRows() {
        t.set(0, CriteriaColumn.SD_GROWTH, "1.5");
        t.fillDown(CriteriaColumn.SD_GROWTH, 0, 1, 2);
        assertThat(List.of(t.get(1, CriteriaColumn.SD_GROWTH), t.get(2, CriteriaColumn.SD_GROWTH)))
                .containsExactly("1.5", "1.5");
        t.copyFrom(1, 2);
        assertThat(t.get(2, CriteriaColumn.USL)).isEqualTo("10.1");
        assertThat(t.get(2, CriteriaColumn.CHARACTERISTIC)).isEqualTo("C");
        assertThat(t.get(0, CriteriaColumn.USL)).isEmpty();
    }

    @Test
    void newDataKeepWhatWasTypedForCharacteristicsStillPresent() {
        t.set(0, CriteriaColumn.LSL, "typed by hand");
        t.showData(List.of(c("A"), c("D")), Map.of("A", CharacteristicSettings.EMPTY));
        assertThat(t.rowCount()).isEqualTo(2);
        assertThat(t.get(0, CriteriaColumn.LSL)).isEqualTo("typed by hand");
        assertThat(t.name(1)).isEqualTo("D");
    }

    @Test
    void alphaIsValidatedAsTyped() {
        t.setAlpha("0.5");
        assertThat(t.alphaProblem()).contains("α must lie strictly between 0 and 0.5");
        t.setAlpha("x");
        assertThat(t.alphaProblem()).isEqualTo("α must be a number such as 0.05");
        t.setAlpha("0.025");
        assertThat(t.alphaProblem()).isNull();
    }

    @Test
    void theNameCannotBeEdited() {
        assertThatThrownBy(() -> t.set(0, CriteriaColumn.CHARACTERISTIC, "X"))
                .isInstanceOf(IllegalArgumentException.class);
    }
}
