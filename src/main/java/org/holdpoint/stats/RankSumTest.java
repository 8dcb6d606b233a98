package org.holdpoint.stats;

import java.util.ArrayList;
import java.util.List;

/**
 * The Wilcoxon–Mann–Whitney rank-sum test for two independent samples, with the Hodges–Lehmann
 * shift estimate after − before and its confidence interval (Wilcoxon 1945, Biometrics Bull.
 * 1:80–83; Mann &amp; Whitney 1947, Ann. Math. Stat. 18:50–60; Hodges &amp; Lehmann 1963, Ann. Math.
 * Stat. 34:598–611; Bauer 1972, JASA 67:687–690).
 *
 * <p>U = #{a_i &gt; b_j} + ½#{a_i = b_j} (after a, before b; ties are equal doubles). Exact branch:
 * p = min(1, 2P(U ≤ u)) below mn/2, else min(1, 2P(U ≥ u)); interval [D_(q), D_(mn−q+1)] with q the
 * smallest value with P(U ≤ q) ≥ α/2 (1 if that is 0, when the level is out of reach). Normal
 * branch: z = (U − mn/2 − ½sign)/σ, σ² = (mn/12)[(N+1) − Σ(t³−t)/(N(N−1))] over the combined tie
 * groups; interval by the exact crossing rule D_(kL), D_(kU) with kL = ⌊K/2 − zσ0 − ½⌋ + 1,
 * kU = ⌊K/2 + zσ0 + ½⌋ + 1, where σ0 uses the ties within each sample. The k-th difference comes from
 * {@link PairwiseSelection}, so 10⁵ × 10⁵ values need no 10¹⁰ array.
 */
public final class RankSumTest {
    private static final RankSumTest DEFAULTS = new RankSumTest(0.05, null, RankMethodRule.AUTOMATIC,
            RankSumTest.PARALLEL_PAIRS);
    static final int EXACT_LIMIT = 50;

    private final double alpha;
    private final Margin margin;
    private final RankMethodRule rule;
    private final long parallelFrom;

    private RankSumTest(double alpha, Margin margin, RankMethodRule rule, long parallelFrom) {
        this.parallelFrom = parallelFrom;
        this.alpha = alpha;
        this.margin = margin;
        this.rule = rule;
    }

    /**
     * The defaults: α = 0.05 (95 % interval; the equivalence interval is 1 − 2α = 90 %), no margin,
     * {@link RankMethodRule#AUTOMATIC}.
     *
     * @return the default test
     */
    public static RankSumTest withDefaults() {
        return DEFAULTS;
    }

    /**
     * @param newAlpha α in (0, 0.5): the interval is (1 − α), the equivalence interval (1 − 2α)
     * @return a test with that α
     */
    public RankSumTest withAlpha(double newAlpha) {
        return new RankSumTest(Alpha.checkBelowHalf(newAlpha), margin, rule, parallelFrom);
    }

    /**
     * @param newMargin the equivalence margin, or null for none
     * @return a test that also judges equivalence against that margin
     */
    public RankSumTest withMargin(Margin newMargin) {
        if (newMargin != null && newMargin.ratio()) {
            throw new StatsException("the rank-based equivalence takes a margin in units, not a ratio margin");
        }
        return new RankSumTest(alpha, newMargin, rule, parallelFrom);
    }

    /**
     * @param newRule exact-or-normal rule
     * @return a test with that rule
     */
    public RankSumTest with(RankMethodRule newRule) {
        if (newRule == null) {
            throw new StatsException("a method rule is required");
        }
        return new RankSumTest(alpha, margin, newRule, parallelFrom);
    }

    /**
     * Runs the test on the shift after − before.
     *
     * @param before the before sample, ≥ 1 value
     * @param after  the after sample, ≥ 1 value
     * @return the result
     * @throws StatsException if a sample is empty
     */
    public RankSumResult test(Sample before, Sample after) {
        if (before.size() == 0 || after.size() == 0) {
            throw new StatsException("the rank-sum test needs at least one value in each group, got %d before and "
                    + "%d after", before.size(), after.size());
        }
        // the samples' own sorted arrays: nothing here writes to them
        double[] a = after.sorted();
        double[] b = before.sorted();
        int m = a.length;
        int n = b.length;
        long k = (long) m * n;
        List<String> notes = new ArrayList<>();
        Merge merged = merge(a, b);
        long twiceU = merged.twiceU();
        boolean ties = merged.tieSum() != 0;
        boolean exact = rule == RankMethodRule.AUTOMATIC && m < EXACT_LIMIT && n < EXACT_LIMIT && !ties;
        PairwiseSelection sel = PairwiseSelection.differences(a, b);
        double nn = (double) m + n;
        double sigma0 = exact ? Double.NaN : Math.sqrt((k / 12.0)
                * ((nn + 1) - (RankDistributions.tieSum(a) + RankDistributions.tieSum(b)) / (nn * (nn - 1))));
        if (!exact && k >= SHARED_ROUNDS_FROM) {
            // the estimate and the interval bounds are ranks close together: their first rounds are shared
            long lowest = (k + 1) / 2;
            long highest = k / 2 + 1;
            for (double level : margin == null || k >= parallelFrom ? new double[] {alpha}
                    : new double[] {alpha, 2 * alpha}) {
                long[] idx = RankDistributions.crossingIndices(k, Normal.upperQuantile(level / 2), sigma0);
                lowest = Math.min(lowest, Math.max(1, Math.min(k, idx[0])));
                highest = Math.max(highest, Math.max(1, Math.min(k, idx[1])));
            }
            sel.prepare(lowest, highest);
        }
        double[] mid = sel.middlePair();
        double shift = RankDistributions.midpoint(mid[0], mid[1]);
        Double p;
        Double z = null;
        RankInterval ci;
        RankInterval eq;
        if (exact) {
            double[] pmf = RankDistributions.mannWhitneyPmf(m, n);
            double[] cdf = RankDistributions.cumulative(pmf);
            p = RankDistributions.twoSidedExact(pmf, (int) (twiceU / 2));
            ci = exactInterval(sel, cdf, k, alpha, m, n, notes);
            eq = margin == null ? null : exactInterval(sel, cdf, k, 2 * alpha, m, n, notes);
        } else {
            double sigma2 = (k / 12.0) * ((nn + 1) - merged.tieSum() / (nn * (nn - 1)));
            double dz = (twiceU - (double) k) / 2;
            if (sigma2 > 0) {
                z = (dz - 0.5 * Math.signum(dz)) / Math.sqrt(sigma2);
                p = RankDistributions.normalTwoSided(z);
            } else {
                p = null;
                notes.add("all values are equal, so the rank-sum p-value is undefined");
            }
            if (margin != null && k >= parallelFrom) {
                // with many pairs the equivalence interval is selected beside the confidence interval, on a
                // selection of its own (each selection is deterministic, so the bounds are the same either way)
                PairwiseSelection other = PairwiseSelection.differences(a, b);
                List<String> eqNotes = new ArrayList<>();
                java.util.concurrent.CompletableFuture<RankInterval> f = java.util.concurrent.CompletableFuture
                        .supplyAsync(() -> normalInterval(other, k, 2 * alpha, sigma0, eqNotes));
                ci = normalInterval(sel, k, alpha, sigma0, notes);
                eq = Background.join(f);
                notes.addAll(eqNotes);
            } else {
                ci = normalInterval(sel, k, alpha, sigma0, notes);
                eq = margin == null ? null : normalInterval(sel, k, 2 * alpha, sigma0, notes);
            }
        }
        RankEquivalence equivalence = eq == null ? null : RankEquivalence.judge(margin, alpha, eq);
        if (equivalence != null && !eq.levelReached()) {
            notes.add("no equivalence claim: the interval level needed for it could not be reached");
        }
        return new RankSumResult(n, m, twiceU, p, z, exact ? RankMethod.EXACT : RankMethod.NORMAL, shift, ci,
                equivalence, notes);
    }

    /** 2U and Σ(t³ − t) over the tie groups of the combined sample, from one merge. */
    record Merge(long twiceU, double tieSum) {
    }

    /**
     * Merges the two ascending arrays: 2U = Σ over after values of 2·#{before below} + #{before equal}, and the
     * tie sum of the combined sample, in O(m + n).
     */
    static Merge merge(double[] a, double[] b) {
        long twiceU = 0;
        double ties = 0;
        int i = 0;
        int j = 0;
        while (i < a.length || j < b.length) {
            double v = i < a.length && (j >= b.length || a[i] <= b[j]) ? a[i] : b[j];
            int ca = 0;
            while (i < a.length && a[i] == v) {
                ca++;
                i++;
            }
            int jStart = j;
            while (j < b.length && b[j] == v) {
                j++;
            }
            int cb = j - jStart;
            twiceU += (long) ca * (2L * jStart + cb);
            double t = ca + cb;
            ties += (t * t - 1) * t;
        }
        return new Merge(twiceU, ties);
    }

    /** From this many pairwise differences the two intervals are selected side by side (measured). */
    static final long PARALLEL_PAIRS = 100_000_000L;
    /** From this many pairwise differences the selections share their first rounds (PairwiseSelection.prepare). */
    static final long SHARED_ROUNDS_FROM = 10_000_000L;

    /**
     * @param pairs from how many pairwise differences the two intervals are selected side by side
     * @return this test with that threshold (for the test that both ways give the same bounds)
     */
    RankSumTest withParallelFrom(long pairs) {
        return new RankSumTest(alpha, margin, rule, pairs);
    }

    private static RankInterval exactInterval(PairwiseSelection sel, double[] cdf, long k, double twoSidedAlpha,
            int m, int n, List<String> notes) {
        int qu = RankDistributions.lowerQuantile(cdf, twoSidedAlpha / 2);
        boolean raised = qu == 0;
        if (raised) {
            qu = 1;
        }
        double achieved = 1 - 2 * cdf[qu - 1];
        // the level falls short only when q was raised from 0, and then only if 1 − 2P(U ≤ 0) is below it
        boolean reached = !raised || achieved >= 1 - twoSidedAlpha - 1e-12;
        if (!reached) {
            notes.add(String.format(java.util.Locale.ROOT, "the %.4g level cannot be reached with %d and %d values; "
                    + "the interval spans all differences", 1 - twoSidedAlpha, m, n));
        }
        double lower = sel.select(qu);
        double upper = sel.select(k - qu + 1);
        return new RankInterval(lower, upper, 1 - twoSidedAlpha, Math.max(0, achieved), reached, RankMethod.EXACT);
    }

    private static RankInterval normalInterval(PairwiseSelection sel, long k, double twoSidedAlpha, double sigma0,
            List<String> notes) {
        double z = Normal.upperQuantile(twoSidedAlpha / 2);
        long[] idx = RankDistributions.crossingIndices(k, z, sigma0);
        boolean reached = idx[0] >= 1 && idx[1] <= k;
        double achieved = 1 - twoSidedAlpha;
        if (!reached) {
            // the widest interval [D_(1), D_(K)] has the normal-approximation level of z = (K − 1)/(2σ0)
            achieved = 1 - 2 * Normal.cdf(-(k - 1) / (2 * sigma0));
            notes.add(String.format(java.util.Locale.ROOT, "the %.4g level cannot be reached; the interval spans all "
                    + "differences (about %.4g)", 1 - twoSidedAlpha, achieved));
        }
        long kl = Math.max(1, Math.min(k, idx[0]));
        long ku = Math.max(1, Math.min(k, idx[1]));
        return new RankInterval(sel.select(kl), sel.select(ku), 1 - twoSidedAlpha, achieved, reached,
                RankMethod.NORMAL);
    }
}
