package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;

import java.math.BigDecimal;
import java.util.Arrays;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The sorted values and sorted deviations are formed from the sorted decimals instead of by sorting the doubles;
 * this checks, bit for bit, that they are the arrays the sorts give (an identity of the code: the statistics
 * that use them keep their published checks elsewhere), on samples of every kind: exact decimals of several
 * scales and sizes (beyond 2⁵³, where the doubles are rounded), negative values, many ties, binary values.
 */
class SortedDeviationsTest {
    private static void check(Sample s) {
        double[] expectedSorted = s.values();
        Arrays.sort(expectedSorted);
        assertThat(bits(s.sorted())).isEqualTo(bits(expectedSorted));
        double[] expectedDev = Deviations.of(s);
        Arrays.sort(expectedDev);
        assertThat(bits(Deviations.ofSorted(s))).isEqualTo(bits(expectedDev));
    }

    private static long[] bits(double[] v) {
        return Arrays.stream(v).mapToLong(Double::doubleToRawLongBits).toArray();
    }

    @Test
    void exactDecimalsOfEveryScaleAndSize() {
        SplittableRandom rnd = new SplittableRandom(20261204);
        for (int scale : new int[] {0, 1, 3, 4, 9, 15, 18}) {
            // narrow spreads are sorted by counting, wide ones by comparison
            for (long spread : new long[] {10, 1_000, 1L << 40, 1L << 53, 1L << 58}) {
                long[] u = new long[2_000];
                long centre = rnd.nextLong(-(1L << 60), 1L << 60) / 4;
                for (int i = 0; i < u.length; i++) {
                    u[i] = centre + rnd.nextLong(-spread, spread + 1);
                }
                check(Sample.ofUnscaled(u, scale));
            }
        }
    }

    @Test
    void tiesNegativesAndMixedScalesFromTexts() {
        check(Sample.ofDecimals("-0.50", "-0.5", "0", "0.000", "12.25", "12.2500", "-3E-2", "7", "7", "7", "1E+3"));
        check(Sample.ofDecimals("9007199254740993.1", "9007199254740993.2", "9007199254740992.9", "-1.0"));
        SplittableRandom rnd = new SplittableRandom(7);
        BigDecimal[] d = new BigDecimal[5_000];
        for (int i = 0; i < d.length; i++) {
            d[i] = BigDecimal.valueOf(rnd.nextLong(-50, 50), rnd.nextInt(0, 4));
        }
        check(Sample.ofDecimals(d));
    }

    @Test
    void integersInNarrowAndWideRangesSortAsTheLibrarySortsThem() {
        SplittableRandom rnd = new SplittableRandom(3);
        for (int n : new int[] {0, 1, 1023, 1024, 5_000, 200_000}) {
            for (long span : new long[] {1, 2, 50, 4L * Math.max(n, 1) - 1, 4L * Math.max(n, 1), 1L << 22, 1L << 40}) {
                long[] v = new long[n];
                long base = rnd.nextLong(-(1L << 61), 1L << 61);
                for (int i = 0; i < n; i++) {
                    v[i] = base + rnd.nextLong(span);
                }
                long[] expected = v.clone();
                Arrays.sort(expected);
                Sample.sortIntegers(v);
                assertThat(v).as("n %d, span %d", n, span).containsExactly(expected);
            }
        }
        // a range beyond the long range, and the extremes themselves
        long[] v = {Long.MAX_VALUE, Long.MIN_VALUE, 0, -1, 1, Long.MAX_VALUE - 1};
        long[] big = new long[2_000];
        for (int i = 0; i < big.length; i++) {
            big[i] = v[i % v.length];
        }
        long[] expected = big.clone();
        Arrays.sort(expected);
        Sample.sortIntegers(big);
        assertThat(big).containsExactly(expected);
    }

    @Test
    void binaryValues() {
        SplittableRandom rnd = new SplittableRandom(11);
        double[] v = new double[3_000];
        for (int i = 0; i < v.length; i++) {
            v[i] = i % 7 == 0 ? v[Math.max(0, i - 3)] : 1e6 + rnd.nextGaussian() * Math.pow(10, rnd.nextInt(-8, 6));
        }
        check(Sample.of(v));
        check(Sample.of(Math.PI, -Math.E, 0.0, -0.0, Double.MIN_VALUE, -1e308, 1e308));
    }
}
