package org.holdpoint.workflow;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.holdpoint.stats.Capability;
import org.holdpoint.stats.CapabilityResult;
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
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.CharacteristicSettings;
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
            boolean paired, boolean equalVariances, List<String> notes) {
        GroupChecks before = group("before", c.before(), s, alpha, notes);
        GroupChecks after = group("after", c.after(), s, alpha, notes);
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
            if (after.capability() == null || after.capability().ppkLower() == null) {
                notes.add("the capability requirement could not be judged: it needs LSL or USL and at least 2 "
                        + "after values");
            } else {
                capabilityMet = after.capability().meets(s.capabilityRequirement());
            }
        }
        String recommendation = recommend(before, after, c, paired, equalVariances);
        return new AssumptionChecks(before, after, rankSum, signedRank, capabilityMet, recommendation);
    }

    private static GroupChecks group(String label, GroupData g, CharacteristicSettings s, double alpha,
            List<String> notes) {
        NormalityResult normality = NormalityResult.of(g.sample());
        normality.notes().forEach(n -> notes.add(label + ": " + n));
        GrubbsResult grubbs = null;
        EsdResult esd = null;
        List<FlaggedValue> flagged = new ArrayList<>();
        try {
            grubbs = Grubbs.withDefaults().withAlpha(alpha).test(g.sample());
            int upTo = (int) Math.min(ESD_MAX_OUTLIERS, Math.max(1, (g.size() + 9L) / 10));
            esd = GeneralizedEsd.withDefaults().withMaxOutliers(upTo).withAlpha(alpha).test(g.sample());
            for (int i : esd.outlierIndices()) {
                flagged.add(new FlaggedValue(label, g.sample().value(i), g.origin(i), "generalized ESD (Rosner 1983)"));
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
        if (s.spec().any()) {
            try {
                Capability cap = Capability.withDefaults().withLimits(s.spec().lsl(), s.spec().usl()).withAlpha(alpha);
                capability = g.hasSubgroups() ? cap.with(WithinEstimator.POOLED_SD).compute(g.sample(),
                        subgroupCodes(g)) : cap.compute(g.sample());
                capability.notes().forEach(n -> notes.add(label + " capability: " + n));
            } catch (StatsException e) {
                notes.add(label + ": capability not computed: " + e.getMessage());
            }
        }
        return new GroupChecks(normality, grubbs, esd, flagged, lag1, runs, lots, capability);
    }

    /** The group in the order of its sequence column (numeric when every entry is a number, else as text). */
    private static GroupData inSequence(GroupData g) {
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
        double[] v = new double[idx.length];
        for (int i = 0; i < idx.length; i++) {
            v[i] = g.sample().value(idx[i]);
        }
        return GroupData.typed(org.holdpoint.stats.Sample.of(v), g.file());
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
