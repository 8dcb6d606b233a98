package org.holdpoint.workflow;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.holdpoint.stats.Capability;
import org.holdpoint.stats.ControlChart;
import org.holdpoint.stats.CapabilityResult;
import org.holdpoint.stats.DistributionFamily;
import org.holdpoint.stats.DistributionFits;
import org.holdpoint.stats.FamilySelection;
import org.holdpoint.stats.FittedDistribution;
import org.holdpoint.stats.PercentileCapability;
import org.holdpoint.stats.PercentileCapabilityResult;
import org.holdpoint.stats.EsdResult;
import org.holdpoint.stats.GeneralizedEsd;
import org.holdpoint.stats.Grubbs;
import org.holdpoint.stats.GrubbsResult;
import org.holdpoint.stats.Independence;
import org.holdpoint.stats.Lag1Result;
import org.holdpoint.stats.Margin;
import org.holdpoint.stats.NormalityResult;
import org.holdpoint.stats.RankSumResult;
import org.holdpoint.stats.RankSumTest;
import org.holdpoint.stats.RunsResult;
import org.holdpoint.stats.SignedRankResult;
import org.holdpoint.stats.SignedRankTest;
import org.holdpoint.stats.StatsException;
import org.holdpoint.stats.WithinEstimator;
import org.holdpoint.result.AssumptionChecks;
import org.holdpoint.result.Stability;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.DistributionSetting;
import org.holdpoint.result.FlaggedValue;
import org.holdpoint.result.GroupChecks;
import org.holdpoint.study.GroupData;
import org.holdpoint.result.Format;

/**
 * The checks behind a t-based conclusion: shape, outliers, order, lots, capability and the
 * distribution-free comparison. Each check that cannot apply is left out with a note saying why.
 */
final class CharacteristicChecks {
    /** Independence is called doubtful below this p (common practice, no source). */
    static final double ORDER_ALPHA = 0.05;
    /** A Shapiro–Wilk p below this counts as a strong departure from normality (common practice, no source). */
    static final double SHAPE_STRONG = 0.001;
    /** Fewer values than this per group make the t-based result fragile (common practice, no source). */
    static final int SMALL_N = 8;
    /**
     * The generalized ESD tests for at most ⌈n/10⌉ outliers, and never more than this many: the
     * procedure is meant for a few outliers, and each step is a pass over the data (common practice,
     * no source).
     */
    static final int ESD_MAX_OUTLIERS = 10;

    private CharacteristicChecks() {
    }

    static AssumptionChecks compute(CharacteristicData c, CharacteristicSettings s, Margin margin, double alpha,
            boolean paired, boolean equalVariances, boolean currentMethods, List<String> notes) {
        NormalityResult nb = NormalityResult.of(c.before().sample());
        NormalityResult na = NormalityResult.of(c.after().sample());
        FamilySelection distribution = !s.spec().any() ? null : currentMethods ? selectFamily(c, s, nb, na, notes)
                : FamilySelection.given(DistributionFamily.NORMAL, "the record was computed with the methods of "
                        + "its time (normal model)");
        DistributionFamily family = distribution == null ? DistributionFamily.NORMAL : distribution.chosen();
        GroupChecks before = group("before", c.before(), nb, s, family, alpha, notes);
        GroupChecks after = group("after", c.after(), na, s, family, alpha, notes);
        RankSumResult rankSum = null;
        SignedRankResult signedRank = null;
        try {
            if (paired) {
                SignedRankTest t = SignedRankTest.withDefaults().withAlpha(alpha);
                signedRank = (margin == null ? t : t.withMargin(margin)).test(c.before().sample(), c.after().sample());
                signedRank.notes().forEach(n -> notes.add("signed rank: " + n));
            } else {
                RankSumTest t = RankSumTest.withDefaults().withAlpha(alpha);
                rankSum = (margin == null ? t : t.withMargin(margin)).test(c.before().sample(), c.after().sample());
                rankSum.notes().forEach(n -> notes.add("rank sum: " + n));
            }
        } catch (StatsException e) {
            notes.add("distribution-free comparison not computed: " + e.getMessage());
        }
        Boolean capabilityMet = null;
        if (s.capabilityRequirement() != null) {
            if (after.ppkLower() == null) {
                notes.add("the capability requirement could not be judged: it needs LSL or USL and at least 2 "
                        + "after values" + (family != DistributionFamily.NORMAL ? " that the " + family.key()
                        + " family can be fitted to" : ""));
            } else {
                capabilityMet = after.ppkLower() > s.capabilityRequirement();
            }
        }
        String recommendation = recommend(before, after, c, paired, equalVariances);
        Stability stability = currentMethods ? stability(c, notes) : null;
        if (stability != null && family != DistributionFamily.NORMAL) {
            notes.add("the control limits are the normal model's (centre plus or minus 3 sigma); this characteristic "
                    + "follows a " + family.key() + " distribution, so a point beyond a limit in its long tail may be the "
                    + "distribution rather than instability");
        }
        return new AssumptionChecks(before, after, rankSum, signedRank, capabilityMet, recommendation, distribution,
                stability);
    }

    /**
     * Individuals charts of both phases in the order of their sequence columns (docs/methods.md §16), or null
     * when a phase has no sequence column.
     */
    private static Stability stability(CharacteristicData c, List<String> notes) {
        if (!c.before().hasSequence() || !c.after().hasSequence()) {
            return null;
        }
        Integer[] ob = runOrder(c.before());
        Integer[] oa = runOrder(c.after());
        try {
            double[] b = values(c.before(), ob);
            double[] a = values(c.after(), oa);
            ControlChart.Limits limits = ControlChart.limits(b);
            // the signals are findings of the verdict (Verdicts), not notes
            return new Stability(ControlChart.judge(b, limits), ControlChart.judge(a, limits), origins(c.before(), ob),
                    origins(c.after(), oa), "the sequence column", java.util.Arrays.stream(b).boxed().toList(),
                    java.util.Arrays.stream(a).boxed().toList());
        } catch (StatsException e) {
            notes.add("no control chart: " + e.getMessage());
            return null;
        }
    }

    private static double[] values(GroupData g, Integer[] order) {
        double[] v = new double[order.length];
        for (int i = 0; i < v.length; i++) {
            v[i] = g.sample().value(order[i]);
        }
        return v;
    }

    private static List<org.holdpoint.study.Origin> origins(GroupData g, Integer[] order) {
        List<org.holdpoint.study.Origin> o = new ArrayList<>();
        for (Integer i : order) {
            o.add(g.origin(i));
        }
        return o;
    }

    /**
     * The family capability is judged by (docs/methods.md §14): the one set for the characteristic; else the
     * default rule: {@code auto} when the characteristic is bounded at a natural zero (a USL, no LSL or an LSL of 0,
     * and no negative value) or when either group departs strongly from a normal shape (Shapiro–Wilk p below
     * {@link #SHAPE_STRONG}); the normal model otherwise.
     */
    static FamilySelection selectFamily(CharacteristicData c, CharacteristicSettings s, NormalityResult nb,
            NormalityResult na, List<String> notes) {
        DistributionSetting set = s.distribution();
        if (set != null && set != DistributionSetting.AUTO) {
            return FamilySelection.given(set.family(), "set in the criteria");
        }
        String why;
        if (set == DistributionSetting.AUTO) {
            why = "auto set in the criteria";
        } else {
            boolean zeroBounded = s.spec().usl() != null && (s.spec().lsl() == null || s.spec().lsl() == 0)
                    && org.holdpoint.stats.Descriptives.of(c.before().sample()).min() >= 0
                    && org.holdpoint.stats.Descriptives.of(c.after().sample()).min() >= 0;
            boolean skewed = strong(nb) || strong(na);
            if (!zeroBounded && !skewed) {
                return FamilySelection.given(DistributionFamily.NORMAL, "default rule: limits not at a natural zero "
                        + "and no strong departure from a normal shape");
            }
            why = zeroBounded ? "default rule: an upper limit on a characteristic bounded at zero"
                    : "default rule: a group departs strongly from a normal shape (Shapiro-Wilk p < " + SHAPE_STRONG + ")";
        }
        try {
            FamilySelection byAic = FamilySelection.byAic(c.before().sample().values(), c.after().sample().values());
            if (byAic.chosen() == DistributionFamily.NORMAL
                    && byAic.candidates().stream().anyMatch(k -> k.refusal() != null)) {
                notes.add("capability by the normal model only because no family bounded at zero could be fitted (it "
                        + byAic.candidates().stream().filter(k -> k.refusal() != null).findFirst().orElseThrow()
                                .refusal() + "); its tail below zero is not physical, so read Ppk and ppm with care");
            }
            return new FamilySelection(byAic.chosen(), true, why + "; " + byAic.reason(), byAic.candidates());
        } catch (StatsException e) {
            notes.add("no distribution could be fitted (" + e.getMessage() + "); capability by the normal model");
            return FamilySelection.given(DistributionFamily.NORMAL, why + "; no other family could be fitted");
        }
    }

    private static GroupChecks group(String label, GroupData g, NormalityResult normality, CharacteristicSettings s,
            DistributionFamily family, double alpha, List<String> notes) {
        normality.notes().forEach(n -> notes.add(label + ": " + n));
        FittedDistribution fit = null;
        if (family != DistributionFamily.NORMAL && s.spec().any()) {
            try {
                fit = DistributionFits.fit(family, g.sample().values());
            } catch (StatsException e) {
                notes.add(label + ": the " + family.key() + " distribution could not be fitted: " + e.getMessage());
            }
        }
        GrubbsResult grubbs = null;
        EsdResult esd = null;
        List<FlaggedValue> flagged = new ArrayList<>();
        String outliersOn = fit == null ? "values" : "normal scores of the fitted " + family.key() + " distribution";
        try {
            // on a skewed family the long tail is the process, not an outlier: test the values mapped to the
            // normal scale through the fit, z = Φ⁻¹(F(x)) (docs/methods.md §14)
            org.holdpoint.stats.Sample tested = fit == null ? g.sample() : fit.normalScores(g.sample());
            grubbs = Grubbs.withDefaults().withAlpha(alpha).test(tested);
            if (fit != null) {
                // report the suspect as measured, not as its normal score
                grubbs = new GrubbsResult(grubbs.n(), grubbs.side(), grubbs.g(), grubbs.index(),
                        g.sample().value(grubbs.index()), grubbs.critical(), grubbs.p(), grubbs.alpha(), grubbs.outlier());
            }
            int upTo = (int) Math.min(ESD_MAX_OUTLIERS, Math.max(1, (g.size() + 9L) / 10));
            esd = GeneralizedEsd.withDefaults().withMaxOutliers(upTo).withAlpha(alpha).test(tested);
            for (int i : esd.outlierIndices()) {
                flagged.add(new FlaggedValue(label, g.sample().value(i), g.origin(i), fit == null
                        ? "generalized ESD (Rosner 1983)" : "generalized ESD (Rosner 1983) on the " + outliersOn));
            }
            if (!flagged.isEmpty()) {
                notes.add(String.format(Locale.ROOT, "%s: %d value(s) flagged as possible outliers (kept in the "
                        + "analysis; exclude one only with a reason): %s", label, flagged.size(), describe(flagged)));
            }
        } catch (StatsException e) {
            notes.add(label + ": outlier tests not computed: " + e.getMessage());
        }
        Lag1Result lag1 = null;
        RunsResult runs = null;
        if (g.hasSequence()) {
            GroupData ordered = inSequence(g);
            try {
                lag1 = Independence.lag1(ordered.sample());
                runs = Independence.runs(ordered.sample());
                if (lag1.pRefined() < ORDER_ALPHA || runs.p() < ORDER_ALPHA) {
                    notes.add(String.format(Locale.ROOT, "%s: independence looks doubtful in run order (lag-1 "
                            + "autocorrelation %s, approximate p = %s; runs about the median %d, expected %s, p = %s); "
                            + "look for drift, tool wear or alternating fixtures", label, Format.num(lag1.r1()),
                            Format.p(lag1.pRefined()), runs.runs(), Format.num(runs.expected()), Format.p(runs.p())));
                }
            } catch (StatsException e) {
                notes.add(label + ": order checks not computed: " + e.getMessage());
            }
        }
        Integer lots = null;
        if (g.hasLots()) {
            Set<String> distinct = new HashSet<>();
            for (int i = 0; i < g.size(); i++) {
                distinct.add(g.lot(i));
            }
            lots = distinct.size();
            if (lots == 1) {
                notes.add(label + ": all values come from a single lot, so the comparison compares lots, not "
                        + "processes");
            }
        }
        CapabilityResult capability = null;
        PercentileCapabilityResult percentile = null;
        if (fit != null) {
            try {
                percentile = PercentileCapability.of(s.spec().lsl(), s.spec().usl(), alpha).compute(fit,
                        g.sample().values());
                percentile.notes().forEach(n -> notes.add(label + " capability: " + n));
            } catch (StatsException e) {
                notes.add(label + ": capability not computed: " + e.getMessage());
            }
        } else if (s.spec().any()) {
            try {
                Capability cap = Capability.withDefaults().withLimits(s.spec().lsl(), s.spec().usl()).withAlpha(alpha);
                capability = g.hasSubgroups() ? cap.with(WithinEstimator.POOLED_SD).compute(g.sample(),
                        subgroupCodes(g)) : cap.compute(g.sample());
                capability.notes().forEach(n -> notes.add(label + " capability: " + n));
            } catch (StatsException e) {
                notes.add(label + ": capability not computed: " + e.getMessage());
            }
        }
        return new GroupChecks(normality, grubbs, esd, flagged, lag1, runs, lots, capability, percentile, outliersOn);
    }



    /** The group in the order of its sequence column (numeric when every entry is a number, else as text). */
    private static GroupData inSequence(GroupData g) {
        return GroupData.typed(org.holdpoint.stats.Sample.of(values(g, runOrder(g))), g.file());
    }

    /** The indices of a group's values in the order of its sequence column (stable for equal entries). */
    private static Integer[] runOrder(GroupData g) {
        Integer[] idx = new Integer[g.size()];
        boolean numeric = true;
        for (int i = 0; i < idx.length; i++) {
            idx[i] = i;
            try {
                Double.parseDouble(g.sequence(i));
            } catch (RuntimeException e) {
                numeric = false;
            }
        }
        boolean asNumbers = numeric;
        java.util.Arrays.sort(idx, (a, b) -> asNumbers
                ? Double.compare(Double.parseDouble(g.sequence(a)), Double.parseDouble(g.sequence(b)))
                : String.valueOf(g.sequence(a)).compareTo(String.valueOf(g.sequence(b))));
        return idx;
    }

    private static int[] subgroupCodes(GroupData g) {
        Map<String, Integer> codes = new HashMap<>();
        int[] r = new int[g.size()];
        for (int i = 0; i < r.length; i++) {
            r[i] = codes.computeIfAbsent(String.valueOf(g.subgroup(i)), k -> codes.size());
        }
        return r;
    }

    private static String describe(List<FlaggedValue> flagged) {
        List<String> parts = new ArrayList<>();
        for (FlaggedValue f : flagged) {
            parts.add(Format.num(f.value()) + " at " + f.origin().describe());
        }
        return StudyAnalyzer.abbreviate(parts);
    }

    private static String recommend(GroupChecks before, GroupChecks after, CharacteristicData c, boolean paired,
            boolean equalVariances) {
        int nMin = Math.min(c.before().size(), c.after().size());
        boolean strongShape = strong(before.normality()) || strong(after.normality());
        if (nMin < SMALL_N) {
            return "rank-based: with fewer than " + SMALL_N + " values in a group the shape cannot be checked, so the "
                    + "rank-based interval is the safer reading (it may be wide)";
        }
        if (strongShape) {
            return "rank-based: a group departs strongly from a normal shape (Shapiro-Wilk p < " + SHAPE_STRONG
                    + "); read the Hodges-Lehmann interval beside the t-based one";
        }
        if (paired) {
            return "paired t: the same units were measured before and after";
        }
        if (equalVariances) {
            return "pooled t: you asserted equal variances";
        }
        return "Welch t: it does not assume equal variances, and the shape checks show no strong departure";
    }

    private static boolean strong(NormalityResult n) {
        return n.shapiro() != null && n.shapiro().p() < SHAPE_STRONG;
    }
}
