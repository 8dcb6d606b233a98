package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Inputs the numerics core must refuse with a {@link StatsException} whose message names the
 * problem and the offending value (the tests assert on message fragments, so wording can improve
 * without breaking them).
 */
class BadInputTest {
    private static final Sample TWO = Sample.of(1.0, 2.0);
    private static final Sample THREE = Sample.of(1.0, 2.0, 4.0);

    @Test
    void groupWithFewerThanTwoValues() {
        assertThatThrownBy(() -> TTest.withDefaults().test(Sample.of(5.0), THREE)).isInstanceOf(StatsException.class)
                .hasMessageContaining("before group needs at least 2 values, got 1");
        assertThatThrownBy(() -> TTest.withDefaults().with(VarianceAssumption.EQUAL).test(THREE, Sample.of(5.0)))
                .isInstanceOf(StatsException.class).hasMessageContaining("after group needs at least 2 values, got 1");
        assertThatThrownBy(() -> TTest.withDefaults().test(Sample.of(), THREE)).isInstanceOf(StatsException.class)
                .hasMessageContaining("before group has no values");
        assertThatThrownBy(() -> TTest.withDefaults().testPaired(Sample.of(1.0), Sample.of(2.0)))
                .isInstanceOf(StatsException.class).hasMessageContaining("at least 2 pairs, got 1");
        assertThatThrownBy(() -> TTest.withDefaults().test(new SummaryStatistics(1, 3, Double.NaN),
                new SummaryStatistics(4, 3, 1))).isInstanceOf(StatsException.class)
                .hasMessageContaining("at least 2 values, got 1");
        assertThatThrownBy(() -> SpreadTests.fTest(new SummaryStatistics(1, 3, Double.NaN),
                new SummaryStatistics(4, 3, 1), 0.05)).isInstanceOf(StatsException.class)
                .hasMessageContaining("at least 2 values per group, got 1 before and 4 after");
        assertThatThrownBy(() -> SpreadTests.brownForsythe(Sample.of(1.0), THREE)).isInstanceOf(StatsException.class)
                .hasMessageContaining("group 1 has 1");
        assertThatThrownBy(() -> Descriptives.of(Sample.of())).isInstanceOf(StatsException.class)
                .hasMessageContaining("at least one value");
        assertThatThrownBy(() -> new SummaryStatistics(0, 1, 1)).isInstanceOf(StatsException.class)
                .hasMessageContaining("n must be at least 1, got 0");
    }

    @Test
    void pairedSamplesOfDifferentSizes() {
        assertThatThrownBy(() -> TTest.withDefaults().testPaired(THREE, TWO)).isInstanceOf(StatsException.class)
                .hasMessageContaining("equal sizes, got 3 before and 2 after");
    }

    @Test
    void zeroSpread() {
        Sample flatA = Sample.of(2.5, 2.5, 2.5);
        Sample flatB = Sample.of(3.0, 3.0);
        assertThatThrownBy(() -> TTest.withDefaults().test(flatA, flatB)).isInstanceOf(StatsException.class)
                .hasMessageContaining("both groups have zero spread").hasMessageContaining("t statistic is undefined");
        assertThatThrownBy(() -> TTest.withDefaults().with(VarianceAssumption.EQUAL).test(flatA, flatB))
                .isInstanceOf(StatsException.class).hasMessageContaining("both groups have zero spread");
        assertThatThrownBy(() -> EquivalenceTest.withDefaults().withMargin(Margin.symmetric(1)).test(flatA, flatB))
                .isInstanceOf(StatsException.class).hasMessageContaining("both groups have zero spread");
        assertThatThrownBy(() -> TTest.withDefaults().testPaired(Sample.of(1, 2, 3), Sample.of(2, 3, 4)))
                .isInstanceOf(StatsException.class)
                .hasMessageContaining("all 3 paired differences are equal");
        assertThatThrownBy(() -> SpreadTests.fTest(Descriptives.of(flatA).summary(), Descriptives.of(THREE).summary(),
                0.05)).isInstanceOf(StatsException.class).hasMessageContaining("before group has zero spread");
        assertThatThrownBy(() -> SpreadTests.sdGrowth(Descriptives.of(THREE).summary(),
                Descriptives.of(flatA).summary(), 1.2, 0.05)).isInstanceOf(StatsException.class)
                .hasMessageContaining("after group has zero spread");
    }

    @Test
    void marginThatDoesNotContainZero() {
        assertThatThrownBy(() -> Margin.of(0.5, 1.0)).isInstanceOf(StatsException.class)
                .hasMessageContaining("must contain 0").hasMessageContaining("got 0.5");
        assertThatThrownBy(() -> Margin.of(-1.0, -0.5)).isInstanceOf(StatsException.class)
                .hasMessageContaining("upper margin must be positive").hasMessageContaining("got -0.5");
        assertThatThrownBy(() -> Margin.of(0.0, 1.0)).isInstanceOf(StatsException.class)
                .hasMessageContaining("lower margin must be negative");
        assertThatThrownBy(() -> Margin.of(-1.0, Double.NaN)).isInstanceOf(StatsException.class)
                .hasMessageContaining("got NaN");
        assertThatThrownBy(() -> new Margin(null, null)).isInstanceOf(StatsException.class)
                .hasMessageContaining("needs a lower bound, an upper bound or both");
        assertThatThrownBy(() -> Margin.symmetric(-2)).isInstanceOf(StatsException.class)
                .hasMessageContaining("symmetric margin must be positive, got -2");
        assertThatThrownBy(() -> Margin.percentOfTolerance(10, 10, 5, 5)).isInstanceOf(StatsException.class)
                .hasMessageContaining("needs LSL < USL");
        assertThatThrownBy(() -> Margin.percentOfTolerance(-10, 10, 0, 5)).isInstanceOf(StatsException.class)
                .hasMessageContaining("must be positive, got -10");
        assertThatThrownBy(() -> EquivalenceTest.withDefaults().test(TWO, THREE)).isInstanceOf(StatsException.class)
                .hasMessageContaining("no equivalence margin was set");
        assertThatThrownBy(() -> EquivalenceTest.withDefaults().withMargin(null)).isInstanceOf(StatsException.class)
                .hasMessageContaining("a margin is required");
    }

    @ParameterizedTest
    @ValueSource(doubles = {0, 1, -0.05, 1.5, Double.NaN, Double.POSITIVE_INFINITY})
    void alphaOutsideZeroOne(double alpha) {
        assertThatThrownBy(() -> TTest.withDefaults().withAlpha(alpha)).isInstanceOf(StatsException.class)
                .hasMessageContaining("alpha must lie strictly between 0 and 1, got " + alpha);
        assertThatThrownBy(() -> SpreadTests.fTest(Descriptives.of(TWO).summary(), Descriptives.of(THREE).summary(),
                alpha)).isInstanceOf(StatsException.class).hasMessageContaining("alpha must lie strictly between");
        assertThatThrownBy(() -> TTest.withDefaults().test(TWO, THREE).reject(alpha)).isInstanceOf(StatsException.class)
                .hasMessageContaining("alpha must lie strictly between");
    }

    @ParameterizedTest
    @ValueSource(doubles = {0, 0.5, 0.75, -0.01, Double.NaN})
    void alphaOutsideZeroHalfForEquivalence(double alpha) {
        assertThatThrownBy(() -> EquivalenceTest.withDefaults().withAlpha(alpha)).isInstanceOf(StatsException.class)
                .hasMessageContaining("alpha must lie strictly between 0 and 0.5, got " + alpha);
        assertThatThrownBy(() -> SpreadTests.sdGrowth(Descriptives.of(TWO).summary(), Descriptives.of(THREE).summary(),
                1.5, alpha)).isInstanceOf(StatsException.class).hasMessageContaining("between 0 and 0.5");
    }

    @Test
    void nanAndInfiniteValues() {
        assertThatThrownBy(() -> Sample.of(1.0, Double.NaN)).isInstanceOf(StatsException.class)
                .hasMessageContaining("value 2 is not a finite number (NaN)");
        assertThatThrownBy(() -> Sample.of(Double.NEGATIVE_INFINITY)).isInstanceOf(StatsException.class)
                .hasMessageContaining("value 1 is not a finite number (-Infinity)");
        assertThatThrownBy(() -> Sample.ofDecimals("1.5", "NaN")).isInstanceOf(StatsException.class)
                .hasMessageContaining("value 2 (\"NaN\") is not a decimal number");
        assertThatThrownBy(() -> Sample.ofDecimals("1,5")).isInstanceOf(StatsException.class)
                .hasMessageContaining("value 1 (\"1,5\") is not a decimal number");
        assertThatThrownBy(() -> Sample.ofDecimals("1e400")).isInstanceOf(StatsException.class)
                .hasMessageContaining("not a finite number");
        assertThatThrownBy(() -> new SummaryStatistics(3, Double.NaN, 1)).isInstanceOf(StatsException.class)
                .hasMessageContaining("mean must be finite, got NaN");
        assertThatThrownBy(() -> new SummaryStatistics(3, 1, -1)).isInstanceOf(StatsException.class)
                .hasMessageContaining("variance must be finite and not negative, got -1");
        assertThatThrownBy(() -> new SummaryStatistics(3, 1, Double.NaN)).isInstanceOf(StatsException.class)
                .hasMessageContaining("got NaN");
        assertThatThrownBy(() -> Distributions.tQuantile(Double.NaN, 5)).isInstanceOf(StatsException.class)
                .hasMessageContaining("probability must lie strictly between 0 and 1, got NaN");
        assertThatThrownBy(() -> Distributions.tCdf(1, Double.NaN)).isInstanceOf(StatsException.class)
                .hasMessageContaining("degrees of freedom of t must be positive and finite, got NaN");
        assertThatThrownBy(() -> Normal.quantile(Double.NaN)).isInstanceOf(StatsException.class)
                .hasMessageContaining("probability must lie in [0, 1], got NaN");
        assertThatThrownBy(() -> SpreadTests.sdGrowth(Descriptives.of(TWO).summary(), Descriptives.of(THREE).summary(),
                Double.NaN, 0.05)).isInstanceOf(StatsException.class)
                .hasMessageContaining("sd-growth limit must be a positive number, got NaN");
    }
}
