package org.holdpoint.stats;

/**
 * Result of the Anderson–Darling test of normality with estimated mean and sd.
 *
 * @param n          number of values
 * @param a2         the unadjusted statistic A², reported as the JSON {@code andersonA2}
 * @param a2Adjusted A²(1 + 0.75/n + 2.25/n²), the statistic the p-value comes from
 * @param p          the approximate p-value (D'Agostino &amp; Stephens 1986, Table 4.9)
 */
public record AndersonDarlingResult(int n, double a2, double a2Adjusted, double p) {

    /** Validates the record. */
    public AndersonDarlingResult {
        if (n < AndersonDarling.MIN_N) {
            throw new StatsException("Anderson-Darling needs at least 8 values, got %d", n);
        }
        if (!Double.isFinite(a2) || !(p >= 0 && p <= 1)) {
            throw new StatsException("Anderson-Darling A2 must be finite and p a probability, got %s and %s", a2, p);
        }
    }
}
