package org.holdpoint.stats;

/**
 * Two-sided t-tests of no difference between a before and an after group: Welch's test (the
 * default), the pooled two-sample test, and the paired test, each with the (1 − α) confidence
 * interval d ± t_{1−α/2,ν}·se of the difference after − before.
 *
 * <p>Sources: Student 1908 (Biometrika 6:1–25); Welch 1947 (Biometrika 34:28–35); Satterthwaite 1946
 * (Biometrics Bull. 2:110–114). The variance assumption is chosen by the user, never by a pre-test.
 * Immutable; configure with the {@code with…} methods.
 */
public final class TTest {
    private static final TTest DEFAULTS = new TTest(VarianceAssumption.UNEQUAL, 0.05);

    private final VarianceAssumption variances;
    private final double alpha;

    private TTest(VarianceAssumption variances, double alpha) {
        this.variances = variances;
        this.alpha = alpha;
    }

    /**
     * The defaults: unequal variances (Welch), α = 0.05 (a 95 % interval).
     *
     * @return the default test
     */
    public static TTest withDefaults() {
        return DEFAULTS;
    }

    /**
     * @param assumption the variance assumption of the two-sample test
     * @return a test with that assumption
     */
    public TTest with(VarianceAssumption assumption) {
        return new TTest(assumption, alpha);
    }

    /**
     * @param newAlpha the level; the interval is the (1 − α) one
     * @return a test with that α
     * @throws StatsException unless 0 &lt; α &lt; 1
     */
    public TTest withAlpha(double newAlpha) {
        return new TTest(variances, Alpha.check(newAlpha));
    }

    /**
     * Two-sample test on raw data (Welch or pooled as configured).
     *
     * @param before the before sample, ≥ 2 values
     * @param after  the after sample, ≥ 2 values
     * @return the result
     * @throws StatsException if a group has fewer than 2 values or both have zero spread
     */
    public TTestResult test(Sample before, Sample after) {
        GroupPair pair = GroupPair.of(before, after);
        return test(difference(pair.difference(), pair.before().summary(), pair.after().summary()));
    }

    /**
     * Two-sample test on summary statistics (Welch or pooled as configured).
     *
     * @param before n, mean, variance of the before group
     * @param after  n, mean, variance of the after group
     * @return the result
     */
    public TTestResult test(SummaryStatistics before, SummaryStatistics after) {
        return test(difference(after.mean() - before.mean(), before, after));
    }

    /**
     * The paired t-test on the differences after_i − before_i of the same units.
     *
     * @param before the before values, unit by unit
     * @param after  the after values of the same units in the same order
     * @return the result
     */
    public TTestResult testPaired(Sample before, Sample after) {
        Sample d = GroupPair.pairedDifferences(before, after);
        return test(Difference.paired(Descriptives.of(d).summary()));
    }

    /**
     * The paired t-test on the summary statistics of the differences.
     *
     * @param differences n, mean and variance of after − before
     * @return the result
     */
    public TTestResult testPaired(SummaryStatistics differences) {
        return test(Difference.paired(differences));
    }

    Difference difference(double d, SummaryStatistics before, SummaryStatistics after) {
        return variances == VarianceAssumption.EQUAL ? Difference.pooled(d, before, after)
                : Difference.welch(d, before, after);
    }

    /**
     * The test from an already formed difference.
     *
     * @param d the difference with se and df
     * @return the result
     */
    public TTestResult test(Difference d) {
        double t = d.t();
        double p = Distributions.tTwoSided(t, d.df());
        double half = Distributions.tUpperQuantile(alpha / 2, d.df()) * d.se();
        return new TTestResult(d.method(), t, d.df(), p, d.estimate(), d.se(), d.estimate() - half,
                d.estimate() + half, 1 - alpha);
    }
}
