package org.holdpoint.stats;

/**
 * Exact null distributions of the Mann–Whitney U and the Wilcoxon signed-rank V, by dynamic
 * programming, and the helpers shared by the two rank tests.
 */
final class RankDistributions {
    /** The tolerance R's qwilcox/qsignrank subtract from the target probability (10·DBL_EPSILON). */
    static final double QUANTILE_FUZZ = 10 * Math.ulp(1.0);

    private RankDistributions() {
    }

    /**
     * The probabilities P(U = u), u = 0..mn, of the Mann–Whitney U for sizes m, n without ties, by
     * P_{m,n}(u) = m/(m+n)·P_{m−1,n}(u − n) + n/(m+n)·P_{m,n−1}(u) (the largest value belongs to the
     * first sample with probability m/(m+n) and then beats all n values of the second; Mann &amp;
     * Whitney 1947, Ann. Math. Stat. 18:50–60), unit mass at 0 when m or n is 0.
     */
    static double[] mannWhitneyPmf(int m, int n) {
        double[][] prev = new double[n + 1][];
        for (int j = 0; j <= n; j++) {
            prev[j] = new double[] {1};
        }
        for (int i = 1; i <= m; i++) {
            double[][] cur = new double[n + 1][];
            cur[0] = new double[] {1};
            for (int j = 1; j <= n; j++) {
                double[] p = new double[i * j + 1];
                double wi = (double) i / (i + j);
                double wj = (double) j / (i + j);
                double[] left = prev[j];
                double[] down = cur[j - 1];
                for (int u = 0; u < p.length; u++) {
                    double v = 0;
                    int s = u - j;
                    if (s >= 0 && s < left.length) {
                        v += wi * left[s];
                    }
                    if (u < down.length) {
                        v += wj * down[u];
                    }
                    p[u] = v;
                }
                cur[j] = p;
            }
            prev = cur;
        }
        return prev[n];
    }

    /**
     * The counts c(v), v = 0..n(n+1)/2, of signed-rank sums V over the 2ⁿ sign patterns, by
     * c_k(v) = c_{k−1}(v) + c_{k−1}(v − k) (Wilcoxon 1945); exact in {@code long} for n ≤ 62.
     */
    static long[] signedRankCounts(int n) {
        int max = n * (n + 1) / 2;
        long[] c = new long[max + 1];
        c[0] = 1;
        int top = 0;
        for (int k = 1; k <= n; k++) {
            top += k;
            for (int v = top; v >= k; v--) {
                c[v] += c[v - k];
            }
        }
        return c;
    }

    /** Cumulative sums of a pmf: cdf[q] = P(X ≤ q). */
    static double[] cumulative(double[] pmf) {
        double[] cdf = new double[pmf.length];
        double s = 0;
        for (int i = 0; i < pmf.length; i++) {
            s += pmf[i];
            cdf[i] = s;
        }
        return cdf;
    }

    /** The signed-rank pmf c(v)/2ⁿ. */
    static double[] signedRankPmf(int n) {
        long[] c = signedRankCounts(n);
        double scale = Math.scalb(1.0, -n);
        double[] p = new double[c.length];
        for (int i = 0; i < c.length; i++) {
            p[i] = c[i] * scale;
        }
        return p;
    }

    /**
     * Two-sided exact p of a symmetric distribution on 0..max at statistic s:
     * min(1, 2P(X ≤ s)) if s ≤ max/2, else min(1, 2P(X ≥ s)) = min(1, 2P(X ≤ max − s)), each tail summed
     * from its own small side.
     */
    static double twoSidedExact(double[] pmf, int s) {
        int max = pmf.length - 1;
        int q = 2 * s <= max ? s : max - s;
        double tail = 0;
        for (int i = 0; i <= q; i++) {
            tail += pmf[i];
        }
        return Math.min(1, 2 * tail);
    }

    /** The smallest q with P(X ≤ q) ≥ target − 10·DBL_EPSILON, as R's qwilcox and qsignrank. */
    static int lowerQuantile(double[] cdf, double target) {
        double x = target - QUANTILE_FUZZ;
        for (int q = 0; q < cdf.length; q++) {
            if (cdf[q] >= x) {
                return q;
            }
        }
        return cdf.length - 1;
    }

    /** Two-sided normal p 2Φ(−|z|). */
    static double normalTwoSided(double z) {
        return Math.min(1, 2 * Normal.cdf(-Math.abs(z)));
    }

    /** Σ(t³ − t) over the groups of equal values of an ascending array, in double (t³ overflows long). */
    static double tieSum(double[] sorted) {
        double s = 0;
        int i = 0;
        while (i < sorted.length) {
            int j = i + 1;
            while (j < sorted.length && sorted[j] == sorted[i]) {
                j++;
            }
            double t = j - i;
            s += (t * t - 1) * t;
            i = j;
        }
        return s;
    }

    /** The correctly rounded mean of two doubles, (x + y)/2, as a reference's median of two values. */
    static double midpoint(double x, double y) {
        return 0.5 * x + 0.5 * y;
    }

    /**
     * The exact crossing-rule order-statistic indices kL = ⌊K/2 − zσ0 − ½⌋ + 1 and
     * kU = ⌊K/2 + zσ0 + ½⌋ + 1, unclipped.
     */
    static long[] crossingIndices(long k, double z, double sigma0) {
        double half = k / 2.0;
        long kl = (long) Math.floor(half - z * sigma0 - 0.5) + 1;
        long ku = (long) Math.floor(half + z * sigma0 + 0.5) + 1;
        return new long[] {kl, ku};
    }
}
