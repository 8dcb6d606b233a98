package org.holdpoint.study;

import org.holdpoint.stats.Margin;

/**
 * An equivalence margin as the user entered it: in the characteristic's unit, as percentages of
 * the tolerance width USL − LSL or of the USL, or as bounds of the ratio after/before. Either side may be absent
 * (a one-sided margin).
 *
 * @param kind  how the numbers are meant
 * @param lower L (negative, in units) or the lower percentage (positive), or null
 * @param upper U (positive, in units) or the upper percentage (positive), or null
 */
public record MarginSpec(Kind kind, Double lower, Double upper) {

    /** How a margin was entered. */
    public enum Kind {
        /** In the characteristic's unit. */
        ABSOLUTE,
        /** As a percentage of the tolerance width USL − LSL. */
        PERCENT_OF_TOLERANCE,
        /** An upper margin as a percentage of the USL, for a characteristic with an upper limit only. */
        PERCENT_OF_UPPER_LIMIT,
        /** Bounds of the ratio after/before (0 &lt; lower &lt; 1 &lt; upper), tested on the log scale. */
        RATIO
    }

    /** Validates the spec. */
    public MarginSpec {
        if (kind == null) {
            throw new IllegalArgumentException("margin kind is required");
        }
        if (lower == null && upper == null) {
            throw new IllegalArgumentException("a margin needs at least one bound");
        }
    }

    /**
     * The margin in the characteristic's unit.
     *
     * @param spec the specification limits (used for percentages)
     * @return the margin
     * @throws org.holdpoint.stats.StatsException if the margin does not contain 0 or percentages lack limits
     */
    public Margin resolve(SpecLimits spec) {
        if (kind == Kind.ABSOLUTE) {
            return new Margin(lower, upper);
        }
        if (kind == Kind.RATIO) {
            return Margin.ratio(lower, upper);
        }
        if (kind == Kind.PERCENT_OF_UPPER_LIMIT) {
            if (spec == null || spec.usl() == null || spec.lsl() != null || lower != null) {
                throw new org.holdpoint.stats.StatsException("a margin in percent of the USL is for a characteristic "
                        + "with an upper specification limit only (an upper margin, e.g. flatness may grow by 10 %% "
                        + "of its USL); with both limits give the margin in percent of the tolerance");
            }
            return Margin.percentOfUpperLimit(upper, spec.usl());
        }
        if (spec == null || spec.lsl() == null || spec.usl() == null) {
            throw new org.holdpoint.stats.StatsException(
                    "a margin in percent of tolerance needs both LSL and USL; set them or give the margin in units");
        }
        return Margin.percentOfTolerance(lower == null ? Double.NaN : lower, upper == null ? Double.NaN : upper,
                spec.lsl(), spec.usl());
    }

    /** @return how the margin was set, in words, e.g. "±10 % of tolerance" */
    public String describe() {
        if (kind == Kind.RATIO) {
            return lower != null && upper != null ? "ratio after/before " + fmt(lower) + " to " + fmt(upper)
                    : lower != null ? "ratio after/before at least " + fmt(lower)
                    : "ratio after/before at most " + fmt(upper);
        }
        String unit = kind == Kind.ABSOLUTE ? "" : kind == Kind.PERCENT_OF_UPPER_LIMIT ? " % of the USL"
                : " % of tolerance";
        if (lower != null && upper != null) {
            return kind == Kind.ABSOLUTE ? "(" + fmt(lower) + ", " + fmt(upper) + ") in units"
                    : "-" + fmt(lower) + unit + " / +" + fmt(upper) + unit;
        }
        if (lower != null) {
            return "lower only: " + (kind == Kind.ABSOLUTE ? fmt(lower) + " in units" : "-" + fmt(lower) + unit);
        }
        return "upper only: " + (kind == Kind.ABSOLUTE ? fmt(upper) + " in units" : "+" + fmt(upper) + unit);
    }

    private static String fmt(double v) {
        return v == Math.rint(v) && Math.abs(v) < 1e15 ? Long.toString((long) v) : Double.toString(v);
    }
}
