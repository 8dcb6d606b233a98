package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Box statistics against R 4.2.2 (2022-11-10 r83330). R's boxplot.stats() takes Tukey hinges from
 * fivenum(), so the reference whiskers were computed from quantile(type = 7) explicitly:
 *
 * <pre>
 * ref &lt;- function(x) {
 *   q &lt;- quantile(x, c(0.25, 0.5, 0.75), type = 7, names = FALSE)
 *   iqr &lt;- q[3] - q[1]; lo &lt;- q[1] - 1.5 * iqr; hi &lt;- q[3] + 1.5 * iqr
 *   inside &lt;- x[x &gt;= lo &amp; x &lt;= hi]
 *   list(n = length(x), mean = mean(x), q = q, lw = min(inside), uw = max(inside),
 *        min = min(x), max = max(x), outPos0 = which(x &lt; lo | x &gt; hi) - 1, outVal = x[x &lt; lo | x &gt; hi])
 * }
 * </pre>
 *
 * printed with sprintf("%.17g"). The data of each case are given with the R call that generated them.
 */
class BoxStatisticsTest {

    /** One R reference case: input in run order and the expected numbers. */
    record Case(String name, double[] x, double mean, double q1, double median, double q3, double lowerWhisker,
            double upperWhisker, int[] outlierPositions, double[] outlierValues) {
        @Override
        public String toString() {
            return name;
        }
    }

    static Stream<Arguments> rCases() {
        return Stream.of(
                // ref(c(1, 2, 3, 4))
                new Case("four", new double[] {1, 2, 3, 4}, 2.5, 1.75, 2.5, 3.25, 1, 4, new int[0], new double[0]),
                // ref(c(2, 100, 0, 1))   (upper whisker 2 lies inside the box, below Q3 = 26.5)
                new Case("whiskerInsideBox", new double[] {2, 100, 0, 1}, 25.75, 0.75, 1.5, 26.5, 0, 2,
                        new int[] {1}, new double[] {100}),
                // set.seed(20261201); x <- round(rnorm(25, 12.5, 0.02), 3); x[7] <- 12.62; x[19] <- 12.41; ref(x)
                new Case("normal25", new double[] {12.506, 12.503, 12.513, 12.499000000000001, 12.512,
                    12.531000000000001, 12.619999999999999, 12.478, 12.536, 12.513, 12.475, 12.512, 12.496, 12.522,
                    12.510999999999999, 12.51, 12.518000000000001, 12.494, 12.41, 12.457000000000001,
                    12.513999999999999, 12.48, 12.518000000000001, 12.503, 12.525},
                        12.50624, 12.496, 12.510999999999999, 12.518000000000001, 12.475, 12.536,
                        new int[] {6, 18, 19}, new double[] {12.619999999999999, 12.41, 12.457000000000001}),
                // set.seed(7); ref(round(rexp(12, 2), 1))   (ties and a zero)
                new Case("skewTies12", new double[] {0, 0.80000000000000004, 0.90000000000000002,
                    0.40000000000000002, 0.29999999999999999, 1.3, 0.40000000000000002, 2.1000000000000001,
                    0.10000000000000001, 0, 0.5, 0.40000000000000002},
                        0.59999999999999998, 0.24999999999999997, 0.40000000000000002, 0.82500000000000007, 0, 1.3,
                        new int[] {7}, new double[] {2.1000000000000001}),
                // ref(c(3.25))
                new Case("one", new double[] {3.25}, 3.25, 3.25, 3.25, 3.25, 3.25, 3.25, new int[0], new double[0]),
                // ref(c(2, 5))
                new Case("two", new double[] {2, 5}, 3.5, 2.75, 3.5, 4.25, 2, 5, new int[0], new double[0]),
                // ref(c(9.1, 8.7, 9.9))
                new Case("three", new double[] {9.1, 8.7, 9.9}, 9.2333333333333325, 8.8999999999999986, 9.1, 9.5,
                        8.7, 9.9, new int[0], new double[0]),
                // ref(rep(4.2, 5))
                new Case("allEqual", new double[] {4.2, 4.2, 4.2, 4.2, 4.2}, 4.2, 4.2, 4.2, 4.2, 4.2, 4.2,
                        new int[0], new double[0]),
                // ref(c(5, 5, 7, 5, 5, 5, 5))   (IQR = 0: every value off the box is an outlier)
                new Case("zeroIqr", new double[] {5, 5, 7, 5, 5, 5, 5}, 5.2857142857142856, 5, 5, 5, 5, 5,
                        new int[] {2}, new double[] {7}),
                // set.seed(99); ref(round(rlnorm(40, 0, 0.8), 4))   (right-skewed, two high outliers)
                new Case("lognormal40", new double[] {1.1867000000000001, 1.4677, 1.0728, 1.4262999999999999,
                    0.74809999999999999, 1.1031, 0.501, 1.4795, 0.74729999999999996, 0.35510000000000003,
                    0.55069999999999997, 2.0901999999999998, 1.8222, 0.13439999999999999, 0.087800000000000003,
                    1.0002, 0.72960000000000003, 0.24759999999999999, 1.4902, 1.242, 2.4087999999999998,
                    1.8258000000000001, 0.9536, 0.7591, 1.1950000000000001, 1.5548999999999999, 1.7279, 0.6462,
                    0.33489999999999998, 3.0649999999999999, 2.9994999999999998, 1.4336, 0.88959999999999995,
                    1.1079000000000001, 0.1595, 0.33510000000000001, 0.85389999999999999, 1.056,
                    1.0750999999999999, 1.2946},
                        1.1289625000000001, 0.70874999999999999, 1.07395, 1.47065, 0.087800000000000003,
                        2.4087999999999998, new int[] {29, 30}, new double[] {3.0649999999999999, 2.9994999999999998}))
                .map(Arguments::of);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("rCases")
    void matchesR(Case c) {
        double[] input = c.x().clone();
        BoxStatistics b = BoxStatistics.of(input);

        assertThat(b.n()).isEqualTo(c.x().length);
        // quantiles: R forms (1 - h)·x_lo + h·x_hi, we form x_lo + h·(x_hi − x_lo); a few ulps apart at most
        assertClose(b.q1(), c.q1());
        assertClose(b.median(), c.median());
        assertClose(b.q3(), c.q3());
        assertClose(b.mean(), c.mean());
        // whiskers, extremes and outliers are data values: exact
        assertThat(b.lowerWhisker()).isEqualTo(c.lowerWhisker());
        assertThat(b.upperWhisker()).isEqualTo(c.upperWhisker());
        assertThat(b.min()).isEqualTo(java.util.Arrays.stream(c.x()).min().orElseThrow());
        assertThat(b.max()).isEqualTo(java.util.Arrays.stream(c.x()).max().orElseThrow());
        assertThat(b.outlierPositions()).containsExactly(c.outlierPositions());
        assertThat(b.outlierValues()).containsExactly(c.outlierValues());
        // the caller's array is neither sorted nor otherwise changed
        assertThat(input).containsExactly(c.x());
    }

    @Test
    void sampleDoorEqualsArrayDoor() {
        double[] x = {0.3, -1.2, 4.4, 0.0, 2.5, 0.3, 9.0};
        assertThat(BoxStatistics.of(Sample.of(x))).isEqualTo(BoxStatistics.of(x));
    }

    @Test
    void seededLoopKeepsInvariants() {
        // invariants of the definition (no outside source needed): ordering, outliers exactly the values
        // beyond the fences, whiskers are data values inside them
        SplittableRandom rnd = new SplittableRandom(20261201L);
        for (int trial = 0; trial < 500; trial++) {
            int n = 1 + rnd.nextInt(60);
            double[] x = new double[n];
            for (int i = 0; i < n; i++) {
                x[i] = Math.round(rnd.nextGaussian() * 100 * (rnd.nextInt(10) == 0 ? 5 : 1)) / 10.0;
            }
            double[] copy = x.clone();
            BoxStatistics b = BoxStatistics.of(x);
            assertThat(x).containsExactly(copy);
            int outside = 0;
            for (int i = 0; i < n; i++) {
                boolean out = x[i] < b.lowerFence() || x[i] > b.upperFence();
                outside += out ? 1 : 0;
                if (!out) {
                    assertThat(x[i]).isBetween(b.lowerWhisker(), b.upperWhisker());
                }
            }
            assertThat(b.outliers()).hasSize(outside);
            assertThat(copy).contains(b.lowerWhisker(), b.upperWhisker());
            assertThat(b.lowerWhisker()).isGreaterThanOrEqualTo(b.lowerFence());
            assertThat(b.upperWhisker()).isLessThanOrEqualTo(b.upperFence());
        }
    }

    @Test
    void rejectsEmptyAndNonFinite() {
        assertThatThrownBy(() -> BoxStatistics.of(new double[0])).isInstanceOf(StatsException.class)
                .hasMessageContaining("at least one value");
        assertThatThrownBy(() -> BoxStatistics.of(1, Double.NaN)).isInstanceOf(StatsException.class)
                .hasMessageContaining("value 2");
    }

    @Test
    void methodIsStated() {
        assertThat(BoxStatistics.METHOD).contains("type 7").contains("1.5");
    }

    private static void assertClose(double actual, double expected) {
        assertThat(actual).isCloseTo(expected, within(4 * Math.ulp(Math.max(1, Math.abs(expected)))));
    }
}
