package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The whole-array conversion of exact decimals to doubles ({@link Sample#toDoubles}, used for a sample's values,
 * its sorted values and the moments' residuals) gives, bit for bit, what converting each value alone gives (an
 * identity of the code: {@link Sample#toDouble} is the correctly rounded conversion checked elsewhere), on every
 * scale, on both sides of 2⁵³ where the fast path ends, with zeros, negative values and runs of equal values, value by
 * value and through the table of a narrow range.
 */
class ToDoublesTest {
    @Test
    void aNarrowRangeGoesThroughTheTable() {
        // 8,192 readings on a 0.001 grid around 25 mm: range 400 < 8,192 / 4
        SplittableRandom rnd = new SplittableRandom(11);
        long[] u = new long[8_192];
        for (int i = 0; i < u.length; i++) {
            u[i] = 25_000 + rnd.nextInt(401) - 200;
        }
        double[] out = new double[u.length];
        Sample.toDoubles(u, 10, 24_999_999, 4, out);
        for (int i = 0; i < u.length; i++) {
            assertThat(out[i]).isEqualTo(Sample.toDouble(u[i] * 10 - 24_999_999, 4));
        }
        assertThat(u.length).isGreaterThanOrEqualTo(Sample.TABLE_FROM);
    }

    @Test
    void everyValueAsItsOwnConversion() {
        SplittableRandom rnd = new SplittableRandom(20261205);
        for (int scale = 0; scale <= 18; scale++) {
            for (long spread : new long[] {3, 5_000, 1L << 52, 1L << 54, 1L << 60}) {
                // 3,000 values go value by value; 9,000 and 50,000 through the table when their range is narrow
                long[] u = new long[new int[] {3_000, 9_000, 50_000}[rnd.nextInt(3)]];
                for (int i = 0; i < u.length; i++) {
                    u[i] = i > 0 && rnd.nextInt(3) == 0 ? u[i - 1] : rnd.nextLong(-spread, spread + 1);
                }
                u[0] = 0;
                if (u.length == 3_000) {
                    // the ends of the fast path (they would widen the range of the larger arrays past the table)
                    u[1] = (1L << 53) - 1;
                    u[2] = 1L << 53;
                    u[3] = -(1L << 53);
                }
                long factor = spread > 1L << 58 ? 1 : 1 + rnd.nextInt(3) * 9;
                long offset = rnd.nextLong(-1000, 1000);
                double[] out = new double[u.length];
                Sample.toDoubles(u, factor, offset, scale, out);
                for (int i = 0; i < u.length; i++) {
                    double alone = Sample.toDouble(u[i] * factor - offset, scale);
                    assertThat(Double.doubleToRawLongBits(out[i])).as("scale %d, %d", scale, u[i])
                            .isEqualTo(Double.doubleToRawLongBits(alone));
                }
                long[] sorted = u.clone();
                Arrays.sort(sorted);
                Sample.toDoubles(sorted, 1, 0, scale, out);
                for (int i = 0; i < sorted.length; i++) {
                    assertThat(Double.doubleToRawLongBits(out[i]))
                            .isEqualTo(Double.doubleToRawLongBits(Sample.toDouble(sorted[i], scale)));
                }
            }
        }
    }
}
