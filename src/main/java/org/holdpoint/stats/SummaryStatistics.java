package org.holdpoint.stats;

/**
 * The summary door to the location and spread tests: n, mean and variance of one group, as published
 * in a paper or a handbook when the raw data are not available.
 *
 * @param n        number of values, ≥ 1
 * @param mean     arithmetic mean, finite
 * @param variance sample variance (divisor n − 1), ≥ 0 and finite, or NaN when n = 1
 */
public record SummaryStatistics(long n, double mean, double variance) {

    /** Validates the record. */
    public SummaryStatistics {
        if (n < 1) {
            throw new StatsException("n must be at least 1, got %d", n);
        }
        if (!Double.isFinite(mean)) {
            throw new StatsException("mean must be finite, got %s", mean);
        }
        if (n > 1 && !(variance >= 0 && Double.isFinite(variance))) {
            throw new StatsException("variance must be finite and not negative, got %s", variance);
        }
    }

    /**
     * A summary from the standard deviation instead of the variance.
     *
     * @param n    number of values
     * @param mean mean
     * @param sd   standard deviation (divisor n − 1)
     * @return the summary
     */
    public static SummaryStatistics ofSd(long n, double mean, double sd) {
        return new SummaryStatistics(n, mean, sd * sd);
    }

    /** @return the standard deviation √variance */
    public double sd() {
        return Math.sqrt(variance);
    }
}
