package org.holdpoint.study;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;

/**
 * The one home of the rules for criteria, used by every entry point (command line, settings file,
 * the window's Criteria and Plan steps, the settings record itself): each returns at most one problem
 * per field, in plain words that speak of the user's numbers, never of an option or a column, so that
 * each entry point can say where the value came from.
 */
public final class CriteriaCheck {
    private CriteriaCheck() {
    }

    /** A criterion that can be wrong. */
    public enum Field {
        /** Lower specification limit. */
        LSL,
        /** Nominal value. */
        NOMINAL,
        /** Upper specification limit. */
        USL,
        /** The equivalence margin. */
        MARGIN,
        /** The largest acceptable sd(after)/sd(before). */
        SD_GROWTH_LIMIT,
        /** The smallest acceptable capability index. */
        CAPABILITY_REQUIREMENT,
        /** The significance level. */
        ALPHA,
        /** The allocation ratio n_after / n_before of a plan. */
        ALLOCATION_RATIO
    }

    /**
     * One problem of one field.
     *
     * @param field   the field
     * @param message what is wrong and what would be right, in plain words
     */
    public record Problem(Field field, String message) {
    }

    /** The largest allocation ratio n_after / n_before a plan accepts. */
    public static final double MAX_ALLOCATION_RATIO = 1000;
    /** The largest margin in percent of the tolerance width. */
    public static final double MAX_MARGIN_PERCENT = 100;

    /**
     * The problems of one characteristic's criteria, at most one per field. The margin in percent of
     * the tolerance is not required to have limits here (they may come from another source); see
     * {@link #resolvable}.
     *
     * @param lsl                   the lower specification limit, or null
     * @param nominal               the nominal value, or null
     * @param usl                   the upper specification limit, or null
     * @param margin                the margin as entered, or null
     * @param sdGrowthLimit         the sd-growth limit, or null
     * @param capabilityRequirement the capability requirement, or null
     * @return the problems, empty when the criteria are valid
     */
    public static List<Problem> check(Double lsl, Double nominal, Double usl, MarginSpec margin,
            Double sdGrowthLimit, Double capabilityRequirement) {
        List<Problem> out = new ArrayList<>();
        add(out, Field.LSL, finite(lsl, "the LSL"));
        add(out, Field.USL, finite(usl, "the USL"));
        add(out, Field.NOMINAL, finite(nominal, "the nominal value"));
        add(out, Field.USL, limitsProblem(lsl, usl));
        if (isFinite(nominal) && (isFinite(lsl) && nominal < lsl || isFinite(usl) && nominal > usl)) {
            add(out, Field.NOMINAL, "the nominal value (" + text(nominal) + ") must lie between the LSL and the USL");
        }
        add(out, Field.MARGIN, margin(margin));
        add(out, Field.SD_GROWTH_LIMIT, positive(sdGrowthLimit, "the sd-growth limit", "1.25"));
        add(out, Field.CAPABILITY_REQUIREMENT, positive(capabilityRequirement, "the capability requirement",
                "1.33"));
        return out;
    }

    /**
     * @param lsl the lower specification limit, or null
     * @param usl the upper specification limit, or null
     * @return the problem of their order, or null
     */
    public static String limitsProblem(Double lsl, Double usl) {
        if (isFinite(lsl) && isFinite(usl) && !(lsl < usl)) {
            return "the USL (" + text(usl) + ") must be above the LSL (" + text(lsl) + ")";
        }
        return null;
    }

    /**
     * @param margin a margin as entered, or null
     * @return its problem, or null when it is valid (or absent)
     */
    public static String margin(MarginSpec margin) {
        if (margin == null) {
            return null;
        }
        Double lo = margin.lower();
        Double hi = margin.upper();
        String bad = lo != null && !Double.isFinite(lo) || hi != null && !Double.isFinite(hi)
                ? "the margin must be a finite number" : null;
        if (bad != null) {
            return bad;
        }
        if (margin.kind() == MarginSpec.Kind.ABSOLUTE) {
            if (lo != null && !(lo < 0)) {
                return "the lower margin L (" + text(lo) + ") must be below 0: the margin (L, U) bounds after − before "
                        + "and must contain 0, e.g. −0.02";
            }
            if (hi != null && !(hi > 0)) {
                return "the upper margin U (" + text(hi) + ") must be above 0: the margin (L, U) bounds after − before "
                        + "and must contain 0, e.g. 0.02";
            }
            return null;
        }
        if (margin.kind() == MarginSpec.Kind.RATIO) {
            if (lo != null && !(lo > 0 && lo < 1)) {
                return "the lower ratio margin (" + text(lo) + ") must lie between 0 and 1: after/before may drop to "
                        + "it, e.g. 0.9";
            }
            if (hi != null && !(hi > 1)) {
                return "the upper ratio margin (" + text(hi) + ") must be above 1: after/before may grow to it, e.g. "
                        + "1.1 (at most 10 % more)";
            }
            return null;
        }
        if (margin.kind() == MarginSpec.Kind.PERCENT_OF_UPPER_LIMIT && lo != null) {
            return "a margin in % of the USL bounds the rise only; leave the lower side empty";
        }
        for (Double p : new Double[] {lo, hi}) {
            if (p != null && !(p > 0 && p <= MAX_MARGIN_PERCENT)) {
                return "a margin in % of the " + (margin.kind() == MarginSpec.Kind.PERCENT_OF_UPPER_LIMIT ? "USL"
                        : "tolerance width") + " must lie above 0 and at most " + text(MAX_MARGIN_PERCENT)
                        + ", e.g. 10; got " + text(p);
            }
        }
        return null;
    }

    /**
     * Whether a margin in percent of the tolerance can be turned into units with these limits.
     *
     * @param margin the margin, or null
     * @param spec   the limits in force
     * @return the problem, or null
     */
    public static String resolvable(MarginSpec margin, SpecLimits spec) {
        if (margin != null && margin.kind() == MarginSpec.Kind.PERCENT_OF_TOLERANCE
                && (spec == null || spec.lsl() == null || spec.usl() == null)) {
            return "a margin in % of the tolerance needs both the LSL and the USL";
        }
        if (margin != null && margin.kind() == MarginSpec.Kind.PERCENT_OF_UPPER_LIMIT
                && (spec == null || spec.usl() == null || spec.lsl() != null || !(spec.usl() > 0))) {
            return "a margin in % of the USL is for a characteristic with a positive USL and no LSL; with both limits "
                    + "give it in % of the tolerance";
        }
        return null;
    }

    /**
     * @param alpha a significance level
     * @return its problem, or null
     */
    public static String alpha(double alpha) {
        return alpha > 0 && alpha < 0.5 ? null : "the significance level α must lie strictly between 0 and 0.5, e.g. "
                + "0.05; got " + text(alpha);
    }

    /**
     * @param ratio an allocation ratio n_after / n_before
     * @return its problem, or null
     */
    public static String allocationRatio(double ratio) {
        return ratio > 0 && ratio <= MAX_ALLOCATION_RATIO ? null : "the allocation ratio n_after / n_before must lie "
                + "above 0 and at most " + text(MAX_ALLOCATION_RATIO) + " (1 = equal groups); got " + text(ratio);
    }

    private static String positive(Double v, String what, String example) {
        if (v == null) {
            return null;
        }
        if (!Double.isFinite(v)) {
            return what + " must be a finite number";
        }
        return v > 0 ? null : what + " must be above 0, e.g. " + example + "; got " + text(v);
    }

    private static String finite(Double v, String what) {
        return v == null || Double.isFinite(v) ? null : what + " must be a finite number";
    }

    private static boolean isFinite(Double v) {
        return v != null && Double.isFinite(v);
    }

    private static void add(List<Problem> out, Field f, String message) {
        if (message != null && out.stream().noneMatch(p -> p.field() == f)) {
            out.add(new Problem(f, message));
        }
    }

    /** The shortest decimal text of a value, as the user would have typed it. */
    static String text(double v) {
        if (!Double.isFinite(v)) {
            return v > 0 ? "a number too large to hold" : v < 0 ? "a number too far below zero to hold" : "not a number";
        }
        return BigDecimal.valueOf(v).stripTrailingZeros().toPlainString();
    }
}
