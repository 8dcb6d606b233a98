package org.holdpoint.stats;

/**
 * Result of a two-sided t-test of no difference, with the (1 − α) confidence interval of the
 * difference after − before.
 *
 * @param method          the design and variance assumption
 * @param t               the t statistic, estimate/se
 * @param df              degrees of freedom
 * @param p               two-sided p-value min(1, 2·F_ν(−|t|))
 * @param estimate        difference after − before
 * @param se              standard error of the estimate
 * @param ciLower         lower end of the (1 − α) interval
 * @param ciUpper         upper end of the (1 − α) interval
 * @param confidenceLevel 1 − α
 */
public record TTestResult(LocationMethod method, double t, double df, double p, double estimate, double se,
        double ciLower, double ciUpper, double confidenceLevel) {

    /** Validates the record. */
    public TTestResult {
        if (!(p >= 0 && p <= 1)) {
            throw new StatsException("p must be a probability, got %s", p);
        }
    }

    /**
     * Whether no difference is rejected at level α (p &lt; α).
     *
     * @param alpha the significance level, in (0, 1)
     * @return p &lt; α
     */
    public boolean reject(double alpha) {
        Alpha.check(alpha);
        return p < alpha;
    }
}
