package org.holdpoint.stats;

/**
 * Result of a test of the variance ratio var(after)/var(before) with its (1 − α) interval: the F-test for
 * independent groups, the Pitman–Morgan test for a paired design.
 *
 * @param ratio           s_a²/s_b² (equal to f)
 * @param f               the variance ratio s_a²/s_b²
 * @param df1             F-test: numerator df n_a − 1; Pitman–Morgan: n − 2, the df of its t
 * @param df2             F-test: denominator df n_b − 1; Pitman–Morgan: n − 2
 * @param p               two-sided p
 * @param ciLower         lower bound of the ratio's interval
 * @param ciUpper         upper bound of the ratio's interval
 * @param confidenceLevel 1 − α
 * @param method          which test
 * @param r               Pitman–Morgan: the correlation of sums and differences; null for the F-test
 * @param t               Pitman–Morgan: its t statistic r·√((n − 2)/(1 − r²)); null for the F-test
 */
public record VarianceRatioResult(double ratio, double f, double df1, double df2, double p, double ciLower,
        double ciUpper, double confidenceLevel, SpreadMethod method, Double r, Double t) {

    /** The test of a variance ratio. */
    public enum SpreadMethod {
        /** Independent groups: F = s_a²/s_b² on (n_a − 1, n_b − 1) df. */
        F_TEST("F-test"),
        /** Paired design: the correlation of sums and differences (Pitman 1939; Morgan 1939). */
        PITMAN_MORGAN("Pitman-Morgan test");

        private final String words;

        SpreadMethod(String words) {
            this.words = words;
        }

        /** @return the test's name, e.g. "F-test" */
        public String words() {
            return words;
        }
    }

    /**
     * An F-test result.
     *
     * @param ratio           s_a²/s_b²
     * @param f               the F statistic
     * @param df1             numerator df
     * @param df2             denominator df
     * @param p               two-sided p
     * @param ciLower         f / F_{1−α/2}(ν1, ν2)
     * @param ciUpper         f / F_{α/2}(ν1, ν2)
     * @param confidenceLevel 1 − α
     */
    public VarianceRatioResult(double ratio, double f, double df1, double df2, double p, double ciLower,
            double ciUpper, double confidenceLevel) {
        this(ratio, f, df1, df2, p, ciLower, ciUpper, confidenceLevel, SpreadMethod.F_TEST, null, null);
    }

    /** Validates the record. */
    public VarianceRatioResult {
        if (!(p >= 0 && p <= 1)) {
            throw new StatsException("p must be a probability, got %s", p);
        }
        java.util.Objects.requireNonNull(method, "method");
    }
}
