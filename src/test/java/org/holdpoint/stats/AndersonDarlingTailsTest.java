package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The Anderson–Darling sum takes ln Φ(z) and ln Φ(−z) of every value from one evaluation of the tail Φ(−|z|);
 * this checks, bit for bit, that each equals what {@link AndersonDarling#logPhi} gives alone (an identity of the
 * code, not a numeric reference: the statistic's published checks are in {@code NormalityTest}), on both sides of
 * every branch point: ±0, the cdf's inner and outer ranges (0.66291, 5.656854248, 40) and the series bound (−37).
 */
class AndersonDarlingTailsTest {
    @Test
    void bothLogTailsEqualTheSeparateOnes() {
        List<Double> zs = new ArrayList<>(List.of(0.0, -0.0, Double.MIN_VALUE, -Double.MIN_VALUE, 1e-300, -1e-17,
                0.66291, -0.66291, 5.656854248, -5.656854248, 37.0, -37.0, 40.0, -40.0, 38.5, -38.5, 1e3, -1e3));
        for (double b : new double[] {0.66291, 5.656854248, 37, 40}) {
            for (double s : new double[] {1, -1}) {
                zs.add(Math.nextUp(s * b));
                zs.add(Math.nextDown(s * b));
            }
        }
        SplittableRandom rnd = new SplittableRandom(20261204);
        for (int i = 0; i < 20_000; i++) {
            zs.add(rnd.nextDouble(-45, 45));
            zs.add(rnd.nextGaussian());
        }
        double[] z = zs.stream().mapToDouble(Double::doubleValue).toArray();
        double[] upper = new double[z.length];
        double[] lower = z.clone();
        for (int j = 0; j < z.length; j++) {
            AndersonDarling.logPhiBoth(lower, upper, j);
        }
        for (int j = 0; j < z.length; j++) {
            assertThat(Double.doubleToRawLongBits(lower[j])).as("ln Phi(%s)", z[j])
                    .isEqualTo(Double.doubleToRawLongBits(AndersonDarling.logPhi(z[j])));
            assertThat(Double.doubleToRawLongBits(upper[j])).as("ln Phi(-(%s))", z[j])
                    .isEqualTo(Double.doubleToRawLongBits(AndersonDarling.logPhi(-z[j])));
        }
    }
    @Test
    void tiedReadingsGiveTheStatisticOfEveryValueComputedAlone() {
        // readings at a 0.001 resolution (many equal values take their logarithms from the previous value): A² bit
        // for bit as the sum with ln Φ of every value evaluated separately (an identity of the code, as above)
        SplittableRandom rnd = new SplittableRandom(7301);
        for (int rep = 0; rep < 6; rep++) {
            int n = 8 + rnd.nextInt(rep < 3 ? 60 : 20_000);
            long[] unscaled = new long[n];
            for (int i = 0; i < n; i++) {
                unscaled[i] = Math.round((12.5 + (rep % 2 == 0 ? 0.02 : 0.003) * rnd.nextGaussian()) * 1000);
            }
            Sample sample = Sample.ofUnscaled(unscaled, 3);
            double sd = Descriptives.of(sample).sd();
            double[] z = Deviations.ofSorted(sample);
            double sum = 0;
            for (int i = 0; i < n; i++) {
                double lower = AndersonDarling.logPhi(z[i] / sd);
                sum += (2.0 * i + 1) * (lower + AndersonDarling.logPhi(-(z[n - 1 - i] / sd)));
            }
            double a2 = -n - sum / n;
            assertThat(Double.doubleToRawLongBits(AndersonDarling.test(sample).a2())).as("n = %d", n)
                    .isEqualTo(Double.doubleToRawLongBits(a2));
        }
    }
}
