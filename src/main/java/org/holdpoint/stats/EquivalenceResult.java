package org.holdpoint.stats;

/**
 * Result of the two one-sided tests (TOST) against a margin, with the (1 − 2α) interval of the
 * difference after − before. For a one-sided margin the absent bound's p is null.
 *
 * @param method      the design and variance assumption of the underlying t
 * @param lowerMargin L, or null
 * @param upperMargin U, or null
 * @param estimate    the difference after − before
 * @param se          its standard error
 * @param df          t degrees of freedom
 * @param tLower      (d − L)/se, or null
 * @param tUpper      (d − U)/se, or null
 * @param pLower      P(T ≥ tLower), the p of H0: δ ≤ L, or null
 * @param pUpper      P(T ≤ tUpper), the p of H0: δ ≥ U, or null
 * @param p           the larger of the p-values present
 * @param ciLower     lower end of the (1 − 2α) interval
 * @param ciUpper     upper end of the (1 − 2α) interval
 * @param level       1 − 2α
 * @param alpha       the α of each one-sided test
 * @param conclusion  the three-way conclusion
 * @param ratio       whether this is the ratio after/before: estimate, interval and margins are then ratios (the
 *                    exponentials of the test on the logarithms), se, df, t and p those of that test
 */
public record EquivalenceResult(LocationMethod method, Double lowerMargin, Double upperMargin, double estimate,
        double se, double df, Double tLower, Double tUpper, Double pLower, Double pUpper, double p, double ciLower,
        double ciUpper, double level, double alpha, Conclusion conclusion, boolean ratio) {

    /**
     * A result for the difference after − before.
     *
     * @param method      design
     * @param lowerMargin L
     * @param upperMargin U
     * @param estimate    the difference
     * @param se          its standard error
     * @param df          degrees of freedom
     * @param tLower      t of the lower test
     * @param tUpper      t of the upper test
     * @param pLower      p of the lower test
     * @param pUpper      p of the upper test
     * @param p           the larger p
     * @param ciLower     interval lower end
     * @param ciUpper     interval upper end
     * @param level       1 − 2α
     * @param alpha       α
     * @param conclusion  the conclusion
     */
    public EquivalenceResult(LocationMethod method, Double lowerMargin, Double upperMargin, double estimate,
            double se, double df, Double tLower, Double tUpper, Double pLower, Double pUpper, double p, double ciLower,
            double ciUpper, double level, double alpha, Conclusion conclusion) {
        this(method, lowerMargin, upperMargin, estimate, se, df, tLower, tUpper, pLower, pUpper, p, ciLower, ciUpper,
                level, alpha, conclusion, false);
    }

    /**
     * This result of the test on the logarithms, shown on the ratio scale.
     *
     * @param margin the ratio margin
     * @return estimate, interval and margins as ratios after/before
     */
    EquivalenceResult onRatioScale(Margin margin) {
        return new EquivalenceResult(method, margin.lower(), margin.upper(), Math.exp(estimate), se, df, tLower,
                tUpper, pLower, pUpper, p, Math.exp(ciLower), Math.exp(ciUpper), level, alpha, conclusion, true);
    }

    /** Validates the record. */
    public EquivalenceResult {
        if (!(p >= 0 && p <= 1)) {
            throw new StatsException("p must be a probability, got %s", p);
        }
        if (conclusion == null) {
            throw new StatsException("a conclusion is required");
        }
    }

    /** @return whether the margin claim holds at α: every present one-sided p &lt; α */
    public boolean equivalent() {
        return conclusion.claimHolds();
    }
}
