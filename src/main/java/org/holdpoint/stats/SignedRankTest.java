package org.holdpoint.stats;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * The Wilcoxon signed-rank test for paired samples with the Hodges–Lehmann estimate (median of the
 * Walsh averages) and its confidence interval (Wilcoxon 1945, Biometrics Bull. 1:80–83; Hodges &amp;
 * Lehmann 1963, Ann. Math. Stat. 34:598–611; Bauer 1972, JASA 67:687–690).
 *
 * <p>d_i = fl(after_i − before_i) in binary64; every d_i == 0 is dropped (n' remain), ties are equal
 * doubles. V = Σ_{d&gt;0} midrank(|d|). Exact branch (n' &lt; 50, no ties in |d|, no zeros): counts
 * c_k(v) = c_{k−1}(v) + c_{k−1}(v − k) over 2^n'; interval [W_(q), W_(K−q+1)] over the sorted Walsh
 * averages. Normal branch: z = (V − n'(n'+1)/4 − ½sign)/σ_V with σ_V² = n'(n'+1)(2n'+1)/24 −
 * Σ(t³−t)/48 over |d| ties; interval by the exact crossing rule with σ0 from groups of identical d,
 * after R's check of both ends (α doubled until the level can be reached; if it cannot, both bounds
 * are the median of the d).
 */
public final class SignedRankTest {
    private static final SignedRankTest DEFAULTS = new SignedRankTest(0.05, null, RankMethodRule.AUTOMATIC);

    private final double alpha;
    private final Margin margin;
    private final RankMethodRule rule;

    private SignedRankTest(double alpha, Margin margin, RankMethodRule rule) {
        this.alpha = alpha;
        this.margin = margin;
        this.rule = rule;
    }

    /**
     * The defaults: α = 0.05 (95 % interval, 90 % equivalence interval), no margin,
     * {@link RankMethodRule#AUTOMATIC}.
     *
     * @return the default test
     */
    public static SignedRankTest withDefaults() {
        return DEFAULTS;
    }

    /**
     * @param newAlpha α in (0, 0.5)
     * @return a test with that α
     */
    public SignedRankTest withAlpha(double newAlpha) {
        return new SignedRankTest(Alpha.checkBelowHalf(newAlpha), margin, rule);
    }

    /**
     * @param newMargin the equivalence margin, or null for none
     * @return a test that also judges equivalence against that margin
     */
    public SignedRankTest withMargin(Margin newMargin) {
        if (newMargin != null && newMargin.ratio()) {
            throw new StatsException("the rank-based equivalence takes a margin in units, not a ratio margin");
        }
        return new SignedRankTest(alpha, newMargin, rule);
    }

    /**
     * @param newRule exact-or-normal rule
     * @return a test with that rule
     */
    public SignedRankTest with(RankMethodRule newRule) {
        if (newRule == null) {
            throw new StatsException("a method rule is required");
        }
        return new SignedRankTest(alpha, margin, newRule);
    }

    /**
     * Runs the test on the paired differences after_i − before_i.
     *
     * @param before the before values, unit by unit
     * @param after  the after values of the same units, same order
     * @return the result
     * @throws StatsException if the sizes differ, or every difference is zero
     */
    public SignedRankResult test(Sample before, Sample after) {
        if (before.size() != after.size()) {
            throw new StatsException("paired samples must have equal sizes, got %d before and %d after",
                    before.size(), after.size());
        }
        double[] all = new double[before.size()];
        for (int i = 0; i < all.length; i++) {
            all[i] = after.value(i) - before.value(i) + 0.0;
        }
        return testDifferences(all);
    }

    /**
     * Runs the test on given differences (zeros are dropped).
     *
     * @param differences after − before per pair
     * @return the result
     * @throws StatsException if there is no non-zero difference
     */
    public SignedRankResult testDifferences(double[] differences) {
        int pairs = differences.length;
        double[] d = Arrays.stream(differences).filter(x -> x != 0).toArray();
        int n = d.length;
        if (n == 0) {
            throw new StatsException("all %d paired differences are zero, so the signed-rank test is undefined", pairs);
        }
        for (double x : d) {
            if (!Double.isFinite(x)) {
                throw new StatsException("a paired difference is not finite (%s)", x);
            }
        }
        Arrays.sort(d);
        int zeros = pairs - n;
        List<String> notes = new ArrayList<>();
        if (zeros > 0) {
            notes.add(String.format(Locale.ROOT, "%d zero difference(s) dropped; %d pairs used", zeros, n));
        }
        double[] abs = absAscending(d);
        long twiceV = twiceV(d, abs);
        double absTies = RankDistributions.tieSum(abs);
        boolean exact = rule == RankMethodRule.AUTOMATIC && n < RankSumTest.EXACT_LIMIT && absTies == 0 && zeros == 0;
        PairwiseSelection sel = PairwiseSelection.walshSums(d);
        long k = sel.size();
        double[] mid = sel.middlePair();
        double shift = RankDistributions.midpoint(0.5 * mid[0], 0.5 * mid[1]);
        Double p;
        Double z = null;
        RankInterval ci;
        RankInterval eq;
        if (exact) {
            double[] pmf = RankDistributions.signedRankPmf(n);
            double[] cdf = RankDistributions.cumulative(pmf);
            p = RankDistributions.twoSidedExact(pmf, (int) (twiceV / 2));
            ci = exactInterval(sel, cdf, k, alpha, n, notes);
            eq = margin == null ? null : exactInterval(sel, cdf, k, 2 * alpha, n, notes);
        } else {
            double nn = n;
            double sigma2 = nn * (nn + 1) * (2 * nn + 1) / 24 - absTies / 48;
            double dz = (twiceV - nn * (nn + 1) / 2) / 2;
            if (sigma2 > 0) {
                z = (dz - 0.5 * Math.signum(dz)) / Math.sqrt(sigma2);
                p = RankDistributions.normalTwoSided(z);
            } else {
                p = null;
                notes.add("the signed-rank variance is zero, so the p-value is undefined");
            }
            double sigma0 = Math.sqrt(nn * (nn + 1) * (2 * nn + 1) / 24 - RankDistributions.tieSum(d) / 48);
            double[] ends = {endScore(d, d[0]), endScore(d, d[n - 1])};
            ci = normalInterval(sel, d, ends, k, alpha, sigma0, notes);
            eq = margin == null ? null : normalInterval(sel, d, ends, k, 2 * alpha, sigma0, notes);
        }
        RankEquivalence equivalence = eq == null ? null : RankEquivalence.judge(margin, alpha, eq);
        if (equivalence != null && !eq.levelReached()) {
            notes.add("no equivalence claim: the interval level needed for it could not be reached");
        }
        return new SignedRankResult(pairs, zeros, n, twiceV, p, z, exact ? RankMethod.EXACT : RankMethod.NORMAL,
                shift, ci, equivalence, notes);
    }

    /** 2V = Σ over positive d of 2·midrank(|d|) = Σ (first + last) 1-based positions of its |d| tie group. */
    static long twiceV(double[] sortedD, double[] sortedAbs) {
        long s = 0;
        for (double x : sortedD) {
            if (x > 0) {
                int first = lowerBound(sortedAbs, x);
                int last = upperBound(sortedAbs, x) - 1;
                s += (first + 1) + (last + 1);
            }
        }
        return s;
    }

    private static int lowerBound(double[] a, double v) {
        int lo = 0;
        int hi = a.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (a[mid] < v) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    private static int upperBound(double[] a, double v) {
        int lo = 0;
        int hi = a.length;
        while (lo < hi) {
            int mid = (lo + hi) >>> 1;
            if (a[mid] <= v) {
                lo = mid + 1;
            } else {
                hi = mid;
            }
        }
        return lo;
    }

    private static RankInterval exactInterval(PairwiseSelection sel, double[] cdf, long k, double twoSidedAlpha, int n,
            List<String> notes) {
        int qu = RankDistributions.lowerQuantile(cdf, twoSidedAlpha / 2);
        boolean raised = qu == 0;
        if (raised) {
            qu = 1;
        }
        double achieved = 1 - 2 * cdf[qu - 1];
        // the level falls short only when q was raised from 0, and then only if 1 − 2P(U ≤ 0) is below it
        boolean reached = !raised || achieved >= 1 - twoSidedAlpha - 1e-12;
        if (!reached) {
            notes.add(String.format(Locale.ROOT, "the %.4g level cannot be reached with %d differences; the interval "
                    + "spans all Walsh averages", 1 - twoSidedAlpha, n));
        }
        return new RankInterval(0.5 * sel.select(qu), 0.5 * sel.select(k - qu + 1), 1 - twoSidedAlpha,
                Math.max(0, achieved), reached, RankMethod.EXACT);
    }

    private static RankInterval normalInterval(PairwiseSelection sel, double[] d, double[] ends, long k,
            double twoSidedAlpha, double sigma0, List<String> notes) {
        double a = twoSidedAlpha;
        double lowEnd = ends[0];
        double highEnd = ends[1];
        // R's wilcox.test doubles alpha until both ends of the data lie outside the ±z band
        while (a < 1 && !(lowEnd >= Normal.upperQuantile(a / 2) && highEnd <= Normal.quantile(a / 2))) {
            a *= 2;
        }
        boolean reached = a == twoSidedAlpha;
        if (a >= 1) {
            int n = d.length;
            double med = n % 2 == 1 ? d[n / 2] : RankDistributions.midpoint(d[n / 2 - 1], d[n / 2]);
            notes.add(String.format(Locale.ROOT, "the %.4g level cannot be reached with %d differences; both bounds "
                    + "are the median difference", 1 - twoSidedAlpha, d.length));
            return new RankInterval(med, med, 1 - twoSidedAlpha, 0, false, RankMethod.NORMAL);
        }
        double z = Normal.upperQuantile(a / 2);
        long[] idx = RankDistributions.crossingIndices(k, z, sigma0);
        if (idx[0] < 1 || idx[1] > k) {
            reached = false;
        }
        if (!reached) {
            notes.add(String.format(Locale.ROOT, "the %.4g level cannot be reached with %d differences; about %.4g "
                    + "is achieved", 1 - twoSidedAlpha, d.length, 1 - a));
        }
        long kl = Math.max(1, Math.min(k, idx[0]));
        long ku = Math.max(1, Math.min(k, idx[1]));
        return new RankInterval(0.5 * sel.select(kl), 0.5 * sel.select(ku), 1 - twoSidedAlpha, 1 - a, reached,
                RankMethod.NORMAL);
    }

    /**
     * The continuity-corrected signed-rank score of d − c, as the reference evaluates it at the ends
     * of the data: fl(d_i − c), zeros dropped, midranks of |·|, tie-corrected σ; NaN if nothing is left.
     */
    static double endScore(double[] d, double c) {
        // d is ascending and rounding is monotone, so fl(d_i − c) is ascending too: no sort is needed
        double[] xd = new double[d.length];
        int nx = 0;
        for (double v : d) {
            double t = v - c;
            if (t != 0) {
                xd[nx++] = t;
            }
        }
        if (nx == 0) {
            return Double.NaN;
        }
        xd = Arrays.copyOf(xd, nx);
        double[] abs = absAscending(xd);
        double nn = nx;
        double zd = twiceV(xd, abs) / 2.0 - nn * (nn + 1) / 4;
        double sigma = Math.sqrt(nn * (nn + 1) * (2 * nn + 1) / 24 - RankDistributions.tieSum(abs) / 48);
        return (zd - 0.5 * Math.signum(zd)) / sigma;
    }

    /** |x| in ascending order for ascending x: the negatives reversed merged with the non-negatives, O(n). */
    static double[] absAscending(double[] x) {
        int firstNonNegative = 0;
        while (firstNonNegative < x.length && x[firstNonNegative] < 0) {
            firstNonNegative++;
        }
        double[] out = new double[x.length];
        int neg = firstNonNegative - 1;
        int pos = firstNonNegative;
        for (int k = 0; k < out.length; k++) {
            if (neg >= 0 && (pos >= x.length || -x[neg] <= x[pos])) {
                out[k] = -x[neg--];
            } else {
                out[k] = x[pos++];
            }
        }
        return out;
    }
}
