package org.holdpoint.stats;

/**
 * A tolerance interval of one group (docs/methods.md §17): the interval that covers at least a proportion of the
 * population with a given confidence.
 *
 * @param coverage           the proportion p
 * @param confidence         the confidence γ asked for
 * @param sides              two-sided, or an upper or lower bound only
 * @param k                  the factor of x̄ ± k·s (on the logarithms for the lognormal), or null for the
 *                           distribution-free interval
 * @param lower              the lower end, or null for an upper bound only
 * @param upper              the upper end, or null for a lower bound only
 * @param method             how it was computed
 * @param achievedConfidence the confidence the interval has: γ for the normal and lognormal intervals, Wilks's for
 *                           the distribution-free one (below γ when the sample is too small)
 * @param n                  the number of values
 */
public record ToleranceInterval(double coverage, double confidence, Sides sides, Double k, Double lower, Double upper,
        Method method, double achievedConfidence, int n) {

    /** Which ends the interval has. */
    public enum Sides {
        /** Both ends (both specification limits are set, or none). */
        TWO_SIDED("two-sided"),
        /** An upper bound only (an upper limit alone). */
        UPPER("upper"),
        /** A lower bound only (a lower limit alone). */
        LOWER("lower");

        private final String key;

        Sides(String key) {
            this.key = key;
        }

        /** @return the word of the JSON contract */
        public String key() {
            return key;
        }
    }

    /** How an interval was computed. */
    public enum Method {
        /** x̄ ± k·s with the exact normal factor. */
        NORMAL("normal", "normal (exact factor)"),
        /** The normal interval of the logarithms, transformed back. */
        LOGNORMAL("lognormal", "lognormal (normal interval of the logarithms, transformed back)"),
        /** The smallest and largest values (Wilks 1941). */
        DISTRIBUTION_FREE("distribution-free", "distribution-free (smallest and largest values, Wilks 1941)");

        private final String key;
        private final String words;

        Method(String key, String words) {
            this.key = key;
            this.words = words;
        }

        /** @return the word of the JSON contract */
        public String key() {
            return key;
        }

        /** @return the method in words */
        public String words() {
            return words;
        }
    }

    /** @return whether the interval has the confidence asked for */
    public boolean confident() {
        return achievedConfidence >= confidence - 1e-12;
    }

    /**
     * @param lsl the lower specification limit, or null
     * @param usl the upper specification limit, or null
     * @return whether every end lies inside the limits that are set (an end on a limit is inside)
     */
    public boolean inside(Double lsl, Double usl) {
        boolean lowOk = lsl == null || lower == null || lower >= lsl;
        boolean highOk = usl == null || upper == null || upper <= usl;
        return lowOk && highOk;
    }

    /**
     * The normal tolerance interval.
     *
     * @param sample     the values, at least 2, not all equal
     * @param coverage   p
     * @param confidence γ
     * @param sides      the ends wanted
     * @return the interval
     */
    public static ToleranceInterval normal(Sample sample, double coverage, double confidence, Sides sides) {
        Descriptives d = Descriptives.of(sample);
        return normalOf(d.mean(), d.sd(), sample.size(), coverage, confidence, sides, Method.NORMAL);
    }

    /**
     * The lognormal tolerance interval: the normal interval of the logarithms, transformed back (exact, since the
     * logarithms of a lognormal population are normal).
     *
     * @param sample     the values, all positive
     * @param coverage   p
     * @param confidence γ
     * @param sides      the ends wanted
     * @return the interval
     */
    public static ToleranceInterval lognormal(Sample sample, double coverage, double confidence, Sides sides) {
        double[] logs = new double[sample.size()];
        for (int i = 0; i < logs.length; i++) {
            double v = sample.value(i);
            if (!(v > 0)) {
                throw new StatsException("a lognormal tolerance interval needs positive values; value %d is %s", i + 1,
                        v);
            }
            logs[i] = Math.log(v);
        }
        Descriptives d = Descriptives.of(Sample.of(logs));
        ToleranceInterval onLogs = normalOf(d.mean(), d.sd(), logs.length, coverage, confidence, sides,
                Method.LOGNORMAL);
        return new ToleranceInterval(coverage, confidence, sides, onLogs.k(),
                onLogs.lower() == null ? null : Math.exp(onLogs.lower()),
                onLogs.upper() == null ? null : Math.exp(onLogs.upper()), Method.LOGNORMAL, confidence, logs.length);
    }

    private static ToleranceInterval normalOf(double mean, double sd, int n, double coverage, double confidence,
            Sides sides, Method method) {
        if (!(sd > 0)) {
            throw new StatsException("all %d values are equal, so no tolerance interval can be computed", n);
        }
        double k = sides == Sides.TWO_SIDED ? ToleranceFactors.twoSided(n, coverage, confidence)
                : ToleranceFactors.oneSided(n, coverage, confidence);
        Double lower = sides == Sides.UPPER ? null : mean - k * sd;
        Double upper = sides == Sides.LOWER ? null : mean + k * sd;
        return new ToleranceInterval(coverage, confidence, sides, k, lower, upper, method, confidence, n);
    }

    /**
     * The distribution-free interval: the smallest and largest values (or one of them), with the confidence they
     * have for the coverage.
     *
     * @param sample     the values, at least 2
     * @param coverage   p
     * @param confidence γ asked for
     * @param sides      the ends wanted
     * @return the interval
     */
    public static ToleranceInterval distributionFree(Sample sample, double coverage, double confidence, Sides sides) {
        int n = sample.size();
        if (n < 2) {
            throw new StatsException("a tolerance interval needs at least 2 values, got %d", n);
        }
        double[] sorted = sample.sorted();
        double achieved = sides == Sides.TWO_SIDED ? ToleranceFactors.wilksTwoSided(n, coverage)
                : ToleranceFactors.wilksOneSided(n, coverage);
        return new ToleranceInterval(coverage, confidence, sides, null, sides == Sides.UPPER ? null : sorted[0],
                sides == Sides.LOWER ? null : sorted[n - 1], Method.DISTRIBUTION_FREE, achieved, n);
    }
}
