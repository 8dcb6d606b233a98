package org.holdpoint.stats;

/**
 * Result of the F-test of the variance ratio var(after)/var(before) with its (1 − α) interval.
 *
 * @param ratio           s_a²/s_b² (equal to f)
 * @param f               the F statistic, s_a²/s_b²
 * @param df1             numerator df n_a − 1
 * @param df2             denominator df n_b − 1
 * @param p               two-sided p, min(1, 2·min(P(F ≤ f), P(F ≥ f)))
 * @param ciLower         f / F_{1−α/2}(ν1, ν2)
 * @param ciUpper         f / F_{α/2}(ν1, ν2)
 * @param confidenceLevel 1 − α
 */
public record VarianceRatioResult(double ratio, double f, double df1, double df2, double p, double ciLower,
        double ciUpper, double confidenceLevel) {

    /** Validates the record. */
    public VarianceRatioResult {
        if (!(p >= 0 && p <= 1)) {
            throw new StatsException("p must be a probability, got %s", p);
        }
    }
}
