package org.holdpoint.stats;

/**
 * Result of the Shapiro–Wilk test of normality (Royston's AS R94 approximation).
 *
 * @param n number of values
 * @param w the statistic W in (0, 1]
 * @param p the approximate p-value (1e-99 where the reference reports it for "obviously non-normal" small n)
 */
public record ShapiroWilkResult(int n, double w, double p) {

    /** Validates the record. */
    public ShapiroWilkResult {
        if (n < 3 || n > ShapiroWilk.MAX_N) {
            throw new StatsException("Shapiro-Wilk needs 3 to 5000 values, got %d", n);
        }
        if (!(w > 0 && w <= 1) || !(p >= 0 && p <= 1)) {
            throw new StatsException("Shapiro-Wilk W and p must lie in (0, 1], got W = %s, p = %s", w, p);
        }
    }
}
