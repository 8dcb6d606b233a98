package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The generalized ESD forms each step's sums of squares, its most extreme value and the next step's sum in one pass;
 * this checks, bit for bit, that every step (statistic, index) and the outlier count are those of the former
 * four-pass form, kept below as the oracle (an identity of the code: the procedure's published example is checked
 * in {@code OutliersTest}), on samples with ties for the most extreme value, equal values left, planted outliers,
 * exact decimals and binary values.
 */
class EsdOnePassTest {
    /** The former form: a pass for the sum, one for its refinement, one for the sums of squares, one for the max. */
    private static List<double[]> fourPasses(Sample sample, int r) {
        int n = sample.size();
        double[] x = Deviations.of(sample);
        boolean[] gone = new boolean[n];
        List<double[]> steps = new ArrayList<>();
        for (int i = 1; i <= r; i++) {
            int left = n - i + 1;
            double sum = 0;
            for (int j = 0; j < n; j++) {
                if (!gone[j]) {
                    sum += x[j];
                }
            }
            double m = sum / left;
            double corr = 0;
            for (int j = 0; j < n; j++) {
                if (!gone[j]) {
                    corr += x[j] - m;
                }
            }
            double mean = m + corr / left;
            double ss = 0;
            double sd = 0;
            for (int j = 0; j < n; j++) {
                if (!gone[j]) {
                    double d = x[j] - mean;
                    ss += d * d;
                    sd += d;
                }
            }
            double s = Math.sqrt(Math.max(0, ss - sd * sd / left) / (left - 1));
            if (!(s > 0)) {
                break;
            }
            int best = -1;
            double bestDev = -1;
            for (int j = 0; j < n; j++) {
                if (!gone[j] && Math.abs(x[j] - mean) > bestDev) {
                    bestDev = Math.abs(x[j] - mean);
                    best = j;
                }
            }
            gone[best] = true;
            steps.add(new double[] {bestDev / s, best});
        }
        return steps;
    }

    private static void check(Sample s, int r) {
        List<double[]> expected = fourPasses(s, Math.min(r, s.size() - 2));
        EsdResult got = GeneralizedEsd.withDefaults().withMaxOutliers(r).test(s);
        assertThat(got.steps()).hasSize(expected.size());
        for (int k = 0; k < expected.size(); k++) {
            EsdResult.Step step = got.steps().get(k);
            assertThat(Double.doubleToRawLongBits(step.r())).as("step %d", k + 1)
                    .isEqualTo(Double.doubleToRawLongBits(expected.get(k)[0]));
            assertThat(step.index()).as("step %d", k + 1).isEqualTo((int) expected.get(k)[1]);
        }
    }

    @Test
    void everyStepAsTheFourPassForm() {
        SplittableRandom rnd = new SplittableRandom(20261204);
        for (int t = 0; t < 300; t++) {
            int n = 3 + rnd.nextInt(t < 250 ? 60 : 4_000);
            long[] u = new long[n];
            double[] v = new double[n];
            int levels = 1 + rnd.nextInt(12);
            for (int i = 0; i < n; i++) {
                // few distinct levels give many ties for the most extreme value; some planted outliers
                u[i] = 12_000 + rnd.nextInt(levels) * (1 + rnd.nextInt(3)) + (rnd.nextInt(40) == 0 ? 400 : 0);
                v[i] = 3.5 + rnd.nextGaussian() * 1e-3 * (rnd.nextInt(25) == 0 ? 30 : 1);
            }
            int r = 1 + rnd.nextInt(12);
            check(Sample.ofUnscaled(u, 3), r);
            check(Sample.of(v), r);
        }
        // all equal after the first removal: the procedure stops at step 2
        check(Sample.of(1, 1, 1, 1, 1, 9), 4);
        check(Sample.of(2, 2, 9, 9, 2, 2, 9, 9), 5);
    }
}
