package org.holdpoint.stats;

import java.util.Arrays;

/**
 * Checks of independence in run order: the lag-1 autocorrelation with its approximate tests and the runs test
 * about the median (Bartlett 1946, JRSS Suppl. 8:27–41; Box, Jenkins, Reinsel &amp; Ljung 2015, Time Series
 * Analysis, 5th ed.; Wald &amp; Wolfowitz 1940, Ann. Math. Stat. 11:147–162; Swed &amp; Eisenhart 1943, Ann. Math.
 * Stat. 14:66–87; NIST/SEMATECH e-Handbook §1.3.5.12–13).
 */
public final class Independence {
    /** The runs test is exact while both n₁ and n₂ are at most this (the range of Swed &amp; Eisenhart's tables). */
    public static final int RUNS_EXACT_LIMIT = 20;

    private Independence() {
    }

    /**
     * The lag-1 autocorrelation r1 = Σ_{i&lt;n}(x_i − x̄)(x_{i+1} − x̄)/Σ(x_i − x̄)² (StRD definition), computed on
     * deviations from exact residuals, with Bartlett's z = r1√n and the refined z = (r1 + 1/n)/√((n−2)²/(n²(n−1)))
     * (E r1 = −1/n for i.i.d. data; the variance is the normal-theory value), each with p = 2Φ(−|z|).
     *
     * @param sample values in run order, n ≥ 3, not all equal
     * @return the result
     * @throws StatsException if n &lt; 3 or all values are equal
     */
    public static Lag1Result lag1(Sample sample) {
        int n = sample.size();
        if (n < 3) {
            throw new StatsException("the lag-1 autocorrelation test needs at least 3 values, got %d", n);
        }
        double[] d = Deviations.of(sample);
        double num = 0;
        double den = 0;
        for (int i = 0; i < n; i++) {
            den += d[i] * d[i];
            if (i + 1 < n) {
                num += d[i] * d[i + 1];
            }
        }
        if (!(den > 0)) {
            throw new StatsException("all %d values are equal, so the lag-1 autocorrelation is undefined", n);
        }
        double r1 = num / den;
        double zb = r1 * Math.sqrt(n);
        double var = (n - 2.0) * (n - 2.0) / ((double) n * n * (n - 1.0));
        double zr = (r1 + 1.0 / n) / Math.sqrt(var);
        return new Lag1Result(n, r1, zb, RankDistributions.normalTwoSided(zb), zr, RankDistributions.normalTwoSided(zr));
    }

    /**
     * The runs test about the median: + above, − below, values equal to the median dropped; exact distribution
     * P(R = 2j) = 2C(n₁−1, j−1)C(n₂−1, j−1)/C(N, n₁), P(R = 2j+1) = [C(n₁−1, j−1)C(n₂−1, j) + C(n₁−1, j)C(n₂−1,
     * j−1)]/C(N, n₁) while n₁, n₂ ≤ 20, else z = (R − E R)/√Var R; p = min(1, 2·min(P(R ≤ r), P(R ≥ r))) or
     * 2Φ(−|z|).
     *
     * @param sample values in run order
     * @return the result
     * @throws StatsException if no value lies above or none below the median
     */
    public static RunsResult runs(Sample sample) {
        double[] x = sample.values();
        double[] sorted = x.clone();
        Arrays.sort(sorted);
        if (sorted.length == 0) {
            throw new StatsException("the runs test needs values, got none");
        }
        double med = Quantiles.median(sorted);
        int above = 0;
        int below = 0;
        int runs = 0;
        int last = 0;
        for (double v : x) {
            int sign = v > med ? 1 : v < med ? -1 : 0;
            if (sign == 0) {
                continue;
            }
            if (sign > 0) {
                above++;
            } else {
                below++;
            }
            if (sign != last) {
                runs++;
                last = sign;
            }
        }
        if (above == 0 || below == 0) {
            throw new StatsException("the runs test needs values both above and below the median (%d above, %d below)",
                    above, below);
        }
        double n1 = above;
        double n2 = below;
        double nn = n1 + n2;
        double expected = 1 + 2 * n1 * n2 / nn;
        double sd = Math.sqrt(2 * n1 * n2 * (2 * n1 * n2 - nn) / (nn * nn * (nn - 1)));
        int dropped = x.length - above - below;
        if (above <= RUNS_EXACT_LIMIT && below <= RUNS_EXACT_LIMIT) {
            double[] pmf = runsPmf(above, below);
            double lowerTail = 0;
            double upperTail = 0;
            for (int r = 0; r < pmf.length; r++) {
                if (r <= runs) {
                    lowerTail += pmf[r];
                }
                if (r >= runs) {
                    upperTail += pmf[r];
                }
            }
            double p = Math.min(1, 2 * Math.min(lowerTail, upperTail));
            return new RunsResult(x.length, med, above, below, dropped, runs, expected, sd, null, p, RankMethod.EXACT);
        }
        Double z = sd > 0 ? (runs - expected) / sd : null;
        double p = z == null ? 1 : RankDistributions.normalTwoSided(z);
        return new RunsResult(x.length, med, above, below, dropped, runs, expected, sd, z, p, RankMethod.NORMAL);
    }

    /** The exact distribution P(R = r), r = 0..n₁+n₂, from binomial coefficients exact in {@code long}. */
    static double[] runsPmf(int n1, int n2) {
        int nn = n1 + n2;
        long[][] c = new long[nn + 1][];
        for (int i = 0; i <= nn; i++) {
            c[i] = new long[i + 1];
            c[i][0] = 1;
            c[i][i] = 1;
            for (int j = 1; j < i; j++) {
                c[i][j] = c[i - 1][j - 1] + c[i - 1][j];
            }
        }
        double total = c[nn][n1];
        double[] p = new double[nn + 1];
        for (int r = 2; r <= nn; r++) {
            int j = r / 2;
            long ways;
            if (r % 2 == 0) {
                ways = 2 * binom(c, n1 - 1, j - 1) * binom(c, n2 - 1, j - 1);
            } else {
                ways = binom(c, n1 - 1, j - 1) * binom(c, n2 - 1, j) + binom(c, n1 - 1, j) * binom(c, n2 - 1, j - 1);
            }
            p[r] = ways / total;
        }
        return p;
    }

    private static long binom(long[][] c, int n, int k) {
        return k < 0 || k > n ? 0 : c[n][k];
    }
}
