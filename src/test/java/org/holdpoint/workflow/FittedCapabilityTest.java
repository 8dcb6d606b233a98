package org.holdpoint.workflow;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.Map;
import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.stats.DistributionFamily;
import org.holdpoint.stats.GeneralizedEsd;
import org.holdpoint.stats.PercentileCapabilityResult;
import org.holdpoint.stats.Sample;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.DistributionSetting;
import org.holdpoint.study.GroupData;
import org.holdpoint.study.ImportReport;
import org.holdpoint.study.Progress;
import org.holdpoint.study.SpecLimits;
import org.junit.jupiter.api.Test;

/**
 * Capability by the fitted distribution through the analysis use case (docs/methods.md §14), on the seeded
 * samples of the stats reference ({@code stats/fits/}, written by base R 4.2.2 with {@code make-fit-values.R}):
 * the family the default rule and AIC choose, and the fitted parameters, quantiles and indices of the chosen
 * family, against R's values in {@code fit-values.csv}.
 */
class FittedCapabilityTest {
    private static List<Map<String, String>> csv(String name) {
        return org.holdpoint.stats.Accuracy.csv("fits/" + name);
    }

    private static double[] sample(String id) {
        return csv("fit-samples.csv").stream().filter(r -> r.get("id").equals(id))
                .mapToDouble(r -> Double.parseDouble(r.get("x"))).toArray();
    }

    private static Map<String, String> rRow(String id, DistributionFamily f) {
        return csv("fit-values.csv").stream().filter(r -> r.get("id").equals(id) && r.get("family").equals(f.key()))
                .findFirst().orElseThrow();
    }

    private static double num(Map<String, String> row, String key) {
        return Double.parseDouble(row.get(key));
    }

    private static CharacteristicResult analyse(String before, String after, CharacteristicSettings s) {
        CharacteristicData c = new CharacteristicData("Gate vestige", "mm", GroupData.typed(Sample.of(sample(before)),
                "before"), GroupData.typed(Sample.of(sample(after)), "after"), false, List.of());
        Dataset d = new Dataset(List.of(c), List.of(), new ImportReport(0, Map.of(), List.of(), List.of()));
        return new StudyAnalyzer().analyze(d, new AnalysisSettings(0.05, false, false, s, null, null, null),
                Progress.NONE).characteristics().get(0);
    }

    private static void assertRel(String what, double actual, double expected, double rel) {
        assertThat(actual).as(what).isCloseTo(expected, within(Math.abs(expected) * rel));
    }

    /** The summed AIC of a family over both groups, from R's maximised log-likelihoods. */
    private static double rAic(String before, String after, DistributionFamily f) {
        return 2.0 * f.parameterCount() * 2 - 2 * (num(rRow(before, f), "loglik") + num(rRow(after, f), "loglik"));
    }

    @Test
    void aZeroBoundedUpperLimitIsJudgedByTheFamilyWithTheLowestAicAsRComputesIt() {
        // USL only at 0.05: the default rule fits every family; R's log-likelihoods decide which
        CharacteristicResult r = analyse("gamma-25", "lnorm-30", new CharacteristicSettings("mm",
                new SpecLimits(null, null, 0.05), null, null, 1.0, null));
        var k = r.checks();
        assertThat(k.distribution().automatic()).isTrue();
        DistributionFamily best = null;
        for (DistributionFamily f : DistributionFamily.values()) {
            if (best == null || rAic("gamma-25", "lnorm-30", f) < rAic("gamma-25", "lnorm-30", best)) {
                best = f;
            }
        }
        DistributionFamily expected = best != DistributionFamily.NORMAL && rAic("gamma-25", "lnorm-30",
                DistributionFamily.NORMAL) - rAic("gamma-25", "lnorm-30", best) < 2 ? DistributionFamily.NORMAL : best;
        assertThat(k.distribution().chosen()).isEqualTo(expected);
        assertThat(expected).as("the samples are skewed enough that a fitted family wins")
                .isNotEqualTo(DistributionFamily.NORMAL);
        PercentileCapabilityResult after = k.after().percentile();
        Map<String, String> row = rRow("lnorm-30", expected);
        // R 4.2.2 (fit-values.csv): parameters, quantiles, Ppk and ppm of the after group's fit, USL 0.05
        assertRel("after first parameter", after.fit().first(), num(row, "param1"), 1e-9);
        assertRel("after X99.865", after.x99865(), num(row, "x99865"), 1e-9);
        assertRel("after Ppk", after.ppk(), num(row, "ppk"), 1e-9);
        assertRel("after ppm above", after.ppmAbove(), num(row, "ppm_above"), 1e-8);
        assertThat(k.before().capability()).as("no normal indices beside the fitted ones").isNull();
        // the requirement is judged on the fitted bound
        assertThat(k.capabilityMet()).isEqualTo(after.ppkLower() > 1.0);
        // a requirement it does not meet names the model in the verdict's reason
        CharacteristicResult strict = analyse("gamma-25", "lnorm-30", new CharacteristicSettings("mm",
                new SpecLimits(null, null, 0.05), null, null, 2.0, null));
        assertThat(strict.checks().capabilityMet()).isFalse();
        assertThat(String.join(" ", strict.verdict().reasons())).contains("Ppk (" + expected.key()
                + " fit, percentile method) after the change is");
    }

    @Test
    void theWindowsDetailNamesTheModelAndItsQuantiles() {
        CharacteristicResult r = analyse("gamma-25", "lnorm-30", new CharacteristicSettings("mm",
                new SpecLimits(null, null, 0.05), null, null, 1.0, null));
        var tol = org.holdpoint.ui.model.ResultDetail.of(r).stream().filter(x -> x.title().equals("In the tolerance"))
                .findFirst().orElseThrow();
        assertThat(tol.lines()).extracting(org.holdpoint.ui.model.ResultDetail.Line::label)
                .contains("Decides", "Model", "Ppk", "Ppk lower bound", "X0.135 / X50 / X99.865", "Outside, ppm");
        String model = tol.lines().stream().filter(l -> l.label().equals("Model")).findFirst().orElseThrow().value();
        assertThat(model).startsWith(r.checks().distribution().chosen().key() + " fit, percentile method")
                .contains("lowest AIC");
    }

    @Test
    void aFamilySetInTheCriteriaIsUsedAsSet() {
        CharacteristicResult r = analyse("rayl-50", "rayl-50", new CharacteristicSettings("mm",
                new SpecLimits(null, null, 0.07), null, null, null, null, DistributionSetting.WEIBULL));
        assertThat(r.checks().distribution().automatic()).isFalse();
        PercentileCapabilityResult b = r.checks().before().percentile();
        Map<String, String> row = rRow("rayl-50", DistributionFamily.WEIBULL);
        // R 4.2.2: the Weibull profile equation solved by uniroot, shape and scale
        assertRel("Weibull shape", b.fit().first(), num(row, "param1"), 1e-9);
        assertRel("Weibull scale", b.fit().second(), num(row, "param2"), 1e-9);
        assertRel("Ppk", b.ppk(), num(row, "ppk"), 1e-9);
    }

    @Test
    void twoSidedLimitsOnNormalDataKeepTheNormalModel() {
        CharacteristicResult r = analyse("norm-60", "norm-60", new CharacteristicSettings("mm",
                new SpecLimits(24.99, null, 25.03), null, null, null, null));
        assertThat(r.checks().distribution().chosen()).isEqualTo(DistributionFamily.NORMAL);
        assertThat(r.checks().distribution().automatic()).isFalse();
        assertThat(r.checks().after().percentile()).isNull();
        assertThat(r.checks().after().capability()).isNotNull();
        assertThat(r.checks().after().outliersOn()).isEqualTo("values");
    }

    @Test
    void aLongTailOfASkewedFamilyIsNotFlaggedAsOutliers() {
        double[] x = sample("lnorm-125");
        int upTo = (int) Math.min(10, Math.max(1, (x.length + 9L) / 10));
        // on the raw values the ESD (Rosner 1983) takes the lognormal's long tail for outliers ...
        int raw = GeneralizedEsd.withDefaults().withMaxOutliers(upTo).withAlpha(0.05).test(Sample.of(x)).count();
        CharacteristicResult r = analyse("lnorm-125", "lnorm-125", new CharacteristicSettings("mm",
                new SpecLimits(null, null, 9.0), null, null, null, null, DistributionSetting.LOGNORMAL));
        // ... on the normal scores of the fitted lognormal (here: the logarithms, standardised) it does not
        assertThat(r.checks().before().outliersOn()).isEqualTo("normal scores of the fitted lognormal distribution");
        int onScores = GeneralizedEsd.withDefaults().withMaxOutliers(upTo).withAlpha(0.05)
                .test(Sample.of(java.util.Arrays.stream(x).map(Math::log).toArray())).count();
        assertThat(r.checks().before().flagged()).hasSize(onScores);
        assertThat(raw).as("the raw-value ESD flags the tail (else this sample shows nothing)").isGreaterThan(onScores);
    }

    @Test
    void readingsOfZeroLeaveTheNormalModelWithACaution() {
        double[] z = {0, 0.01, 0.02, 0.01, 0.03, 0, 0.02, 0.05, 0.01, 0.02, 0.04, 0.01};
        CharacteristicData c = new CharacteristicData("Flatness", "mm", GroupData.typed(Sample.of(z), "b"),
                GroupData.typed(Sample.of(z), "a"), false, List.of());
        Dataset d = new Dataset(List.of(c), List.of(), new ImportReport(0, Map.of(), List.of(), List.of()));
        CharacteristicResult r = new StudyAnalyzer().analyze(d, new AnalysisSettings(0.05, false, false,
                new CharacteristicSettings("mm", new SpecLimits(null, null, 0.1), null, null, null, null), null, null,
                null), Progress.NONE).characteristics().get(0);
        assertThat(r.checks().distribution().chosen()).isEqualTo(DistributionFamily.NORMAL);
        assertThat(r.notes()).anyMatch(n -> n.contains("no family bounded at zero could be fitted")
                && n.contains("2 value(s) are 0 or below"));
    }
}
