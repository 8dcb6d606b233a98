package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * Seeded random tied samples: the normal-branch estimate and bounds equal the median and the crossing-rule order
 * statistics recomputed here by brute force (all differences / Walsh averages built and sorted in the test). The
 * rule itself is checked against R in {@link RankTestsReferenceTest}; this checks the selection at many sizes.
 */
class RankBruteForceTest {
    private static double[] tied(SplittableRandom rnd, int n, double shift) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = Math.round((rnd.nextGaussian() + shift) * 4) / 4.0;
        }
        return x;
    }

    private static double tieSum(double[] sorted) {
        double s = 0;
        for (int i = 0; i < sorted.length;) {
            int j = i;
            while (j < sorted.length && sorted[j] == sorted[i]) {
                j++;
            }
            double t = j - i;
            s += t * t * t - t;
            i = j;
        }
        return s;
    }

    private static double median(double[] sorted) {
        int k = sorted.length;
        return k % 2 == 1 ? sorted[k / 2] : 0.5 * sorted[k / 2 - 1] + 0.5 * sorted[k / 2];
    }

    private static double[] bounds(double[] sorted, double z, double sigma0) {
        long k = sorted.length;
        long kl = Math.max(1, Math.min(k, (long) Math.floor(k / 2.0 - z * sigma0 - 0.5) + 1));
        long ku = Math.max(1, Math.min(k, (long) Math.floor(k / 2.0 + z * sigma0 + 0.5) + 1));
        return new double[] {sorted[(int) kl - 1], sorted[(int) ku - 1]};
    }

    @Test
    void rankSumNormalBranch() {
        SplittableRandom rnd = new SplittableRandom(2026L);
        double z = 1.959963984540054; // qnorm(0.975), R 4.2.2
        for (int rep = 0; rep < 150; rep++) {
            double[] b = tied(rnd, 2 + rnd.nextInt(70), 0);
            double[] a = tied(rnd, 2 + rnd.nextInt(70), 0.3);
            RankSumResult r = RankSumTest.withDefaults().with(RankMethodRule.NORMAL).test(Sample.of(b), Sample.of(a));
            double[] d = new double[a.length * b.length];
            int c = 0;
            for (double x : a) {
                for (double y : b) {
                    d[c++] = x - y;
                }
            }
            Arrays.sort(d);
            double[] sa = a.clone();
            double[] sb = b.clone();
            Arrays.sort(sa);
            Arrays.sort(sb);
            double nn = a.length + b.length;
            double sigma0 = Math.sqrt(d.length / 12.0 * ((nn + 1) - (tieSum(sa) + tieSum(sb)) / (nn * (nn - 1))));
            assertThat(r.shift()).isEqualTo(median(d));
            assertThat(new double[] {r.ciLower(), r.ciUpper()}).containsExactly(bounds(d, z, sigma0));
        }
    }

    @Test
    void signedRankNormalBranch() {
        SplittableRandom rnd = new SplittableRandom(2027L);
        double z = 1.959963984540054; // qnorm(0.975), R 4.2.2
        int checked = 0;
        for (int rep = 0; rep < 150; rep++) {
            int n = 3 + rnd.nextInt(80);
            double[] before = tied(rnd, n, 0);
            double[] after = before.clone();
            for (int i = 0; i < n; i++) {
                after[i] += Math.round((rnd.nextGaussian() + 0.2) * 4) / 4.0;
            }
            SignedRankResult r = SignedRankTest.withDefaults().with(RankMethodRule.NORMAL)
                    .test(Sample.of(before), Sample.of(after));
            double[] d = new double[n];
            int m = 0;
            for (int i = 0; i < n; i++) {
                double v = after[i] - before[i];
                if (v != 0) {
                    d[m++] = v;
                }
            }
            d = Arrays.copyOf(d, m);
            Arrays.sort(d);
            double[] w = new double[m * (m + 1) / 2];
            int c = 0;
            for (int i = 0; i < m; i++) {
                for (int j = i; j < m; j++) {
                    w[c++] = (d[i] + d[j]) / 2;
                }
            }
            Arrays.sort(w);
            assertThat(r.shift()).isEqualTo(median(w));
            if (r.ci().levelReached()) {
                double sigma0 = Math.sqrt(m * (m + 1.0) * (2.0 * m + 1) / 24 - tieSum(d) / 48);
                assertThat(new double[] {r.ciLower(), r.ciUpper()}).containsExactly(bounds(w, z, sigma0));
                checked++;
            }
        }
        assertThat(checked).isGreaterThan(100);
    }
}
