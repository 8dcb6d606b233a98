package org.holdpoint.study;

/**
 * A tolerance-interval criterion (docs/methods.md §17): the interval of the after group that covers at least
 * {@code coverage} of the parts with confidence {@code confidence} must lie inside the specification limits.
 *
 * @param coverage   the proportion p, in (0, 1), e.g. 0.99
 * @param confidence the confidence γ, in (0, 1), e.g. 0.95
 */
public record ToleranceRequirement(double coverage, double confidence) {
    /** Validates. */
    public ToleranceRequirement {
        if (!(coverage > 0 && coverage < 1)) {
            throw new IllegalArgumentException("the tolerance coverage must lie strictly between 0 and 1 (e.g. 0.99), "
                    + "got " + coverage);
        }
        if (!(confidence > 0 && confidence < 1)) {
            throw new IllegalArgumentException("the tolerance confidence must lie strictly between 0 and 1 (e.g. "
                    + "0.95), got " + confidence);
        }
    }

    /** @return e.g. "99 % / 95 %" */
    public String words() {
        return percent(coverage) + " / " + percent(confidence);
    }

    private static String percent(double v) {
        return new java.math.BigDecimal(Double.toString(v * 100)).stripTrailingZeros().toPlainString() + " %";
    }
}
