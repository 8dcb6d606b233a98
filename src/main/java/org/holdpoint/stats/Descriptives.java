package org.holdpoint.stats;

/**
 * Descriptive statistics of one group: n, mean, standard deviation (divisor n − 1), type-7 median,
 * minimum and maximum.
 *
 * <p>The mean and sd come from {@link Moments} (compensated mean on exact decimal residuals, then
 * the corrected two-pass sum of squares of Chan, Golub &amp; LeVeque 1983), which reproduces the
 * certified values of all NIST StRD univariate datasets to 14–15 significant digits.
 *
 * @param n        number of values
 * @param mean     arithmetic mean
 * @param sd       sample standard deviation, divisor n − 1 (NaN when n &lt; 2)
 * @param variance sd²
 * @param median   type-7 median
 * @param min      smallest value
 * @param max      largest value
 */
public record Descriptives(int n, double mean, double sd, double variance, double median, double min, double max) {

    /** Validates the record. */
    public Descriptives {
        if (n < 1) {
            throw new StatsException("descriptive statistics need at least one value, got n = %d", n);
        }
    }

    /**
     * Descriptive statistics of one sample.
     *
     * @param sample at least one value
     * @return the statistics
     */
    public static Descriptives of(Sample sample) {
        return of(sample, Moments.Reference.common(sample));
    }

    static Descriptives of(Sample sample, Moments.Reference ref) {
        if (sample.size() == 0) {
            throw new StatsException("descriptive statistics need at least one value, got none");
        }
        return of(sample, Moments.of(sample, ref));
    }

    static Descriptives of(Sample sample, Moments m) {
        double[] sorted = sample.sorted();
        double variance = m.variance();
        return new Descriptives(m.n, m.mean(), Math.sqrt(variance), variance, Quantiles.median(sorted), sorted[0],
                sorted[sorted.length - 1]);
    }

    /** @return the summary (n, mean, variance) for the summary-statistics door of the tests */
    public SummaryStatistics summary() {
        return new SummaryStatistics(n, mean, variance);
    }
}
