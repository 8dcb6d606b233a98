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
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.StabilityOptions;
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

    /** From this many values in both groups the rank comparison runs beside the group checks (measured). */
    static final int PARALLEL_N = 20_000;

    private CharacteristicChecks() {
    }

    /** The distribution-free comparison and its notes. */
    private record Ranks(RankSumResult rankSum, SignedRankResult signedRank, List<String> notes) {
    }

    /**
     * The distribution-free comparison of a characteristic, started when the characteristic's analysis starts:
     * with many values it runs beside everything else the characteristic computes (measured in
     * docs/performance.md), otherwise it is computed when asked for. The result and the place of its notes are
     * those of one computation after the other.
     */
    static final class Ranking {
        private final java.util.function.Supplier<Ranks> work;
        private final java.util.concurrent.CompletableFuture<Ranks> background;

        private Ranking(java.util.function.Supplier<Ranks> work, boolean beside) {
            this.work = work;
            this.background = beside ? java.util.concurrent.CompletableFuture.supplyAsync(work) : null;
        }

        Ranks get() {
            return background == null ? work.get() : org.holdpoint.stats.Background.join(background);
        }

        /** @return whether the comparison runs beside the caller (then the characteristic's other work may too) */
        boolean beside() {
            return background != null;
        }
    }

    /**
     * Starts the distribution-free comparison.
     *
     * @param c      the characteristic's data
     * @param margin the equivalence margin in units, or null (none, or a ratio margin)
     * @param alpha  the significance level
     * @param paired whether the groups are paired
     * @param beside whether it may run beside the caller (false: computed when asked for, for the test that both
     *               give the same result)
     * @return the comparison, running beside the caller from {@link #PARALLEL_N} values on when allowed
     */
    static Ranking startRanking(CharacteristicData c, Margin margin, double alpha, boolean paired, boolean beside) {
        return new Ranking(() -> ranks(c, margin, alpha, paired),
                beside && c.before().size() + c.after().size() >= PARALLEL_N);
    }

    private static Ranks ranks(CharacteristicData c, Margin margin, double alpha, boolean paired) {
        List<String> notes = new ArrayList<>();
        try {
            if (paired) {
                SignedRankTest t = SignedRankTest.withDefaults().withAlpha(alpha);
                SignedRankResult r = (margin == null ? t : t.withMargin(margin)).test(c.before().sample(),
                        c.after().sample());
                r.notes().forEach(n -> notes.add("signed rank: " + n));
                return new Ranks(null, r, notes);
            }
            RankSumTest t = RankSumTest.withDefaults().withAlpha(alpha);
            RankSumResult r = (margin == null ? t : t.withMargin(margin)).test(c.before().sample(), c.after().sample());
            r.notes().forEach(n -> notes.add("rank sum: " + n));
            return new Ranks(r, null, notes);
        } catch (StatsException e) {
            notes.add("distribution-free comparison not computed: " + e.getMessage());
            return new Ranks(null, null, notes);
        }
    }

    static AssumptionChecks compute(CharacteristicData c, CharacteristicSettings s, Ranking ranking, double alpha,
            boolean paired, AnalysisSettings study, List<String> notes) {
        boolean currentMethods = study.since(3);
        boolean equalVariances = study.equalVariances();
        // a large characteristic computes the after group's checks beside the before group's (a pool thread takes
        // them when one is free, else this thread does when it joins); results and notes as one after the other
        boolean beside = ranking.beside();
        var naBeside = beside ? org.holdpoint.stats.Background.fork(() -> NormalityResult.of(c.after().sample())) : null;
        NormalityResult nb = NormalityResult.of(c.before().sample());
        NormalityResult na = naBeside != null ? naBeside.join() : NormalityResult.of(c.after().sample());
        FamilySelection distribution = !s.spec().any() ? null : currentMethods ? selectFamily(c, s, nb, na, notes)
                : FamilySelection.given(DistributionFamily.NORMAL, "the record was computed with the methods of "
                        + "its time (normal model)");
        DistributionFamily family = distribution == null ? DistributionFamily.NORMAL : distribution.chosen();
        // generation 4 takes the order checks in the same run order as the control charts (dates read as dates, the
        // rows when the user says so); earlier records keep the sequence column's order as they had it
        StabilityOptions order = study.since(4) ? study.stability() : null;
        List<String> afterNotes = beside ? new ArrayList<>() : notes;
        var afterBeside = beside ? org.holdpoint.stats.Background.fork(() -> group("after", c.after(), na, s, family,
                alpha, order, afterNotes)) : null;
        GroupChecks before = group("before", c.before(), nb, s, family, alpha, order, notes);
        GroupChecks after = afterBeside != null ? afterBeside.join() : group("after", c.after(), na, s, family, alpha,
                order, notes);
        if (afterBeside != null) {
            notes.addAll(afterNotes);
        }
        Ranks ranks = ranking.get();
        RankSumResult rankSum = ranks.rankSum();
        SignedRankResult signedRank = ranks.signedRank();
        notes.addAll(ranks.notes());
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
        Stability stability = !currentMethods ? null : study.since(4) ? stability(c, study.stability(), notes)
                : individualsInSequence(c, notes);
        if (stability != null && family != DistributionFamily.NORMAL) {
            notes.add("the control limits are the normal model's (centre plus or minus 3 sigma); this characteristic "
                    + "follows a " + family.key() + " distribution, so a point beyond a limit in its long tail may be the "
                    + "distribution rather than instability");
        }
        return new AssumptionChecks(before, after, rankSum, signedRank, capabilityMet, recommendation, distribution,
                stability);
    }

    /**
     * Method generation 3 (records written with it are re-computed so): individuals charts of both phases in the
     * order of their sequence columns (numbers, else texts as written), or null when a phase has none.
     */
    private static Stability individualsInSequence(CharacteristicData c, List<String> notes) {
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
            return new Stability(ControlChart.judge(b, limits), ControlChart.judge(a, limits),
                    describe(c.before(), unboxed(ob)), describe(c.after(), unboxed(oa)), "the sequence column",
                    ControlChart.DEFAULT_TESTS);
        } catch (StatsException e) {
            notes.add("no control chart: " + e.getMessage());
            return null;
        }
    }

    /**
     * Control charts of both phases in run order (docs/methods.md §16): charts of subgroup means and sds when both
     * phases have a subgroup column with subgroups of two or more, else individuals charts; null, with a note, when
     * no run order is known or the charts cannot be drawn.
     */
    private static Stability stability(CharacteristicData c, StabilityOptions options, List<String> notes) {
        try {
            RunOrder ob = RunOrder.of(c.before(), options.rowOrderIsRunOrder());
            RunOrder oa = RunOrder.of(c.after(), options.rowOrderIsRunOrder());
            boolean subgroups = c.before().hasSubgroups() && c.after().hasSubgroups();
            if (subgroups && (ob == null || oa == null)) {
                // no order of the values: the subgroups' labels may still order them (numbers or dates)
                Stability st = bySubgroupLabels(c, options, notes);
                if (st != null) {
                    return st;
                }
            }
            if (ob == null || oa == null) {
                notes.add("no control chart: the run order of the " + (ob == null ? "before" : "after")
                        + " values is not known (give a sequence or date/time column, or say that the rows are in "
                        + "run order with --row-order-is-run-order)");
                return null;
            }
            if (subgroups) {
                List<Integer> sb = subgroupsInOrder(c.before(), ob.order());
                List<Integer> sa = subgroupsInOrder(c.after(), oa.order());
                if (sb != null && sa != null) {
                    return subgroupCharts(c, sb, sa, ob.source() + ", subgroups in the order of their first value",
                            options, notes);
                }
            }
            double[] b = values(c.before(), ob.order());
            double[] a = values(c.after(), oa.order());
            ControlChart.Limits limits = ControlChart.limits(b);
            smallBase(b.length, "values", notes);
            return new Stability(ControlChart.judge(b, limits, options.tests()),
                    ControlChart.judge(a, limits, options.tests()), describe(c.before(), ob.order()),
                    describe(c.after(), oa.order()), ob.source().equals(oa.source()) ? ob.source()
                            : "before: " + ob.source() + "; after: " + oa.source(), options.tests());
        } catch (RunOrder.Unknown e) {
            notes.add("no control chart: " + e.getMessage());
            return null;
        } catch (StatsException e) {
            notes.add("no control chart: " + e.getMessage());
            return null;
        }
    }

    /** ISO 7870-2 asks for 20 to 25 subgroups (or points) to set limits; fewer give rough limits. */
    private static void smallBase(int k, String what, List<String> notes) {
        if (k < 20) {
            notes.add("the control limits rest on " + k + " before " + what + "; 20 to 25 are usual for setting "
                    + "limits (ISO 7870-2), so read the signals with care");
        }
    }

    private static Stability bySubgroupLabels(CharacteristicData c, StabilityOptions options, List<String> notes)
            throws RunOrder.Unknown {
        List<List<Integer>> lb = subgroupMembers(c.before());
        List<List<Integer>> la = subgroupMembers(c.after());
        RunOrder ob = RunOrder.ofLabels(lb.stream().map(m -> c.before().subgroup(m.get(0))).toList());
        RunOrder oa = RunOrder.ofLabels(la.stream().map(m -> c.after().subgroup(m.get(0))).toList());
        if (ob == null || oa == null) {
            return null;
        }
        List<Integer> sb = new ArrayList<>();
        for (int k : ob.order()) {
            sb.add(k);
        }
        List<Integer> sa = new ArrayList<>();
        for (int k : oa.order()) {
            sa.add(k);
        }
        return subgroupCharts(c, sb, sa, ob.source(), options, notes);
    }

    /** The subgroups of a group (by label, in the order of first appearance), each a list of value indices. */
    private static List<List<Integer>> subgroupMembers(GroupData g) {
        Map<String, List<Integer>> m = new java.util.LinkedHashMap<>();
        for (int i = 0; i < g.size(); i++) {
            m.computeIfAbsent(String.valueOf(g.subgroup(i)), k -> new ArrayList<>()).add(i);
        }
        return new ArrayList<>(m.values());
    }

    /**
     * The subgroups (indices into {@link #subgroupMembers}) in the order of their first value in run order, or null
     * when no subgroup has two values (then the values are charted one by one).
     */
    private static List<Integer> subgroupsInOrder(GroupData g, int[] order) {
        List<List<Integer>> members = subgroupMembers(g);
        Map<String, Integer> index = new HashMap<>();
        for (int k = 0; k < members.size(); k++) {
            index.put(String.valueOf(g.subgroup(members.get(k).get(0))), k);
        }
        if (members.stream().noneMatch(m -> m.size() >= 2)) {
            return null;
        }
        java.util.LinkedHashSet<Integer> seen = new java.util.LinkedHashSet<>();
        for (int i : order) {
            seen.add(index.get(String.valueOf(g.subgroup(i))));
        }
        return new ArrayList<>(seen);
    }

    private static Stability subgroupCharts(CharacteristicData c, List<Integer> sb, List<Integer> sa, String source,
            StabilityOptions options, List<String> notes) {
        List<List<Integer>> mb = subgroupMembers(c.before());
        List<List<Integer>> ma = subgroupMembers(c.after());
        double[][] b = subgroupValues(c.before(), mb, sb);
        double[][] a = subgroupValues(c.after(), ma, sa);
        ControlChart.Limits limits = ControlChart.subgroupLimits(b);
        smallBase(b.length, "subgroups", notes);
        return new Stability(ControlChart.judgeSubgroups(b, limits, options.tests()),
                ControlChart.judgeSubgroups(a, limits, options.tests()), describeSubgroups(c.before(), mb, sb),
                describeSubgroups(c.after(), ma, sa), source, options.tests());
    }

    private static double[][] subgroupValues(GroupData g, List<List<Integer>> members, List<Integer> order) {
        double[][] r = new double[order.size()][];
        for (int k = 0; k < r.length; k++) {
            List<Integer> m = members.get(order.get(k));
            r[k] = new double[m.size()];
            for (int j = 0; j < m.size(); j++) {
                r[k][j] = g.sample().value(m.get(j));
            }
        }
        return r;
    }

    private static List<String> describeSubgroups(GroupData g, List<List<Integer>> members, List<Integer> order) {
        List<String> r = new ArrayList<>();
        for (int k : order) {
            List<Integer> m = members.get(k);
            r.add("subgroup " + g.subgroup(m.get(0)) + " (" + m.size() + " value" + (m.size() == 1 ? "" : "s")
                    + ", first at " + g.origin(m.get(0)).describe() + ")");
        }
        return r;
    }

    private static List<String> describe(GroupData g, int[] order) {
        List<String> r = new ArrayList<>();
        for (int i : order) {
            r.add(g.origin(i).describe());
        }
        return r;
    }

    private static int[] unboxed(Integer[] order) {
        return java.util.Arrays.stream(order).mapToInt(Integer::intValue).toArray();
    }

    private static double[] values(GroupData g, int[] order) {
        double[] v = new double[order.length];
        for (int i = 0; i < v.length; i++) {
            v[i] = g.sample().value(order[i]);
        }
        return v;
    }

    private static double[] values(GroupData g, Integer[] order) {
        double[] v = new double[order.length];
        for (int i = 0; i < v.length; i++) {
            v[i] = g.sample().value(order[i]);
        }
        return v;
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
            DistributionFamily family, double alpha, StabilityOptions order, List<String> notes) {
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
        GroupData ordered = inRunOrder(g, order);
        if (ordered != null) {
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
        return new GroupChecks(normality, grubbs, esd, flagged, lag1, runs, lots, capability, percentile, outliersOn,
                tolerance(label, g, s, family, notes));
    }

    /**
     * The tolerance interval of a group when the criteria ask for one (docs/methods.md §17): on the family capability
     * is judged by where an exact method exists (normal; lognormal on the logarithms), else distribution-free; two
     * ends with both limits or none, one end with one limit.
     */
    private static org.holdpoint.stats.ToleranceInterval tolerance(String label, GroupData g,
            CharacteristicSettings s, DistributionFamily family, List<String> notes) {
        org.holdpoint.study.ToleranceRequirement t = s.tolerance();
        if (t == null) {
            return null;
        }
        org.holdpoint.stats.ToleranceInterval.Sides sides = s.spec().lsl() != null && s.spec().usl() == null
                ? org.holdpoint.stats.ToleranceInterval.Sides.LOWER
                : s.spec().usl() != null && s.spec().lsl() == null ? org.holdpoint.stats.ToleranceInterval.Sides.UPPER
                : org.holdpoint.stats.ToleranceInterval.Sides.TWO_SIDED;
        try {
            org.holdpoint.stats.ToleranceInterval ti = switch (family) {
                case NORMAL -> org.holdpoint.stats.ToleranceInterval.normal(g.sample(), t.coverage(), t.confidence(),
                        sides);
                case LOGNORMAL -> org.holdpoint.stats.ToleranceInterval.lognormal(g.sample(), t.coverage(),
                        t.confidence(), sides);
                default -> org.holdpoint.stats.ToleranceInterval.distributionFree(g.sample(), t.coverage(),
                        t.confidence(), sides);
            };
            if (ti.method() == org.holdpoint.stats.ToleranceInterval.Method.DISTRIBUTION_FREE) {
                notes.add(String.format(Locale.ROOT, "%s: no exact tolerance interval exists for the %s family, so "
                        + "the distribution-free one is used (the %s), with %s confidence for %s coverage%s",
                        label, family.key(), sides == org.holdpoint.stats.ToleranceInterval.Sides.TWO_SIDED
                                ? "smallest and largest values" : sides == org.holdpoint.stats.ToleranceInterval.Sides.UPPER
                                ? "largest value" : "smallest value", Format.percent(ti.achievedConfidence()),
                        Format.percent(ti.coverage()), ti.confident() ? ""
                                : "; " + org.holdpoint.stats.ToleranceFactors.wilksSampleSize(ti.coverage(),
                                        ti.confidence(), sides == org.holdpoint.stats.ToleranceInterval.Sides.TWO_SIDED)
                                        + " values would give " + Format.percent(ti.confidence())));
            }
            return ti;
        } catch (StatsException e) {
            notes.add(label + ": tolerance interval not computed: " + e.getMessage());
            return null;
        }
    }


    /**
     * The group in run order for the order checks, or null when none is known: with the chart options of method
     * generation 4 the run order of the control charts; else (an earlier record) the sequence column's order.
     */
    private static GroupData inRunOrder(GroupData g, StabilityOptions order) {
        if (order == null) {
            return g.hasSequence() ? inSequence(g) : null;
        }
        try {
            RunOrder o = RunOrder.of(g, order.rowOrderIsRunOrder());
            return o == null ? null : GroupData.typed(org.holdpoint.stats.Sample.of(values(g, o.order())), g.file());
        } catch (RunOrder.Unknown e) {
            // the control chart's note says why the order is not known
            return null;
        }
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
