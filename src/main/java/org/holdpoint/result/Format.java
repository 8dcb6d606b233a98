package org.holdpoint.result;

import java.util.Locale;
import org.holdpoint.stats.EquivalenceResult;

/** Number formatting for text shown to people (JSON keeps full precision elsewhere). */
public final class Format {
    private Format() {
    }

    /**
     * A number with 6 significant digits, plain when reasonable.
     *
     * @param v the value
     * @return the text; "undefined" for NaN
     */
    public static String num(double v) {
        return num(v, 6);
    }

    /**
     * A number with the given significant digits, for tables.
     *
     * @param v      the value
     * @param digits significant digits, 1..17
     * @return the text; "undefined" for NaN
     */
    public static String num(double v, int digits) {
        if (Double.isNaN(v)) {
            return "undefined";
        }
        if (v == 0) {
            return "0";
        }
        double a = Math.abs(v);
        if (a >= 1e-4 && a < 1e7) {
            java.math.BigDecimal d = new java.math.BigDecimal(v).round(new java.math.MathContext(digits));
            return d.stripTrailingZeros().toPlainString();
        }
        return String.format(Locale.ROOT, "%." + (digits - 1) + "e", v);
    }

    /**
     * A value in the characteristic's unit with fixed decimals (its resolution plus two).
     *
     * @param v        the value
     * @param decimals decimals
     * @return e.g. "0.00280"; "undefined" for NaN
     */
    public static String fixed(double v, int decimals) {
        if (Double.isNaN(v)) {
            return "undefined";
        }
        String t = String.format(Locale.ROOT, "%." + decimals + "f", v);
        return t.matches("-0\\.?0*") ? t.substring(1) : t;
    }

    /**
     * A ratio after/before of an equivalence result (estimate, interval bound, margin): four decimals.
     *
     * @param v the ratio
     * @return e.g. "0.9573"
     */
    public static String ratioBound(double v) {
        return fixed(v, 4);
    }

    /**
     * What an equivalence result's estimate is, in words.
     *
     * @param eq the result
     * @return "ratio after/before (geometric means)" or "difference"
     */
    public static String quantity(EquivalenceResult eq) {
        return eq.ratio() ? "ratio after/before (geometric means)" : "difference";
    }

    /**
     * An estimate or interval bound of an equivalence result: as a ratio, or in the unit's decimals.
     *
     * @param eq       the result
     * @param v        the value
     * @param decimals decimals for a difference
     * @return the text
     */
    public static String equivalenceValue(EquivalenceResult eq, double v, int decimals) {
        return eq.ratio() ? ratioBound(v) : fixed(v, decimals);
    }

    /**
     * A ratio or index read against a limit (sd ratio, Ppk and their bounds): three decimals, the precision
     * at which such limits are written (1.33, 1.300).
     *
     * @param v the value
     * @return e.g. "0.978"; "undefined" for NaN
     */
    public static String ratio(double v) {
        return Double.isNaN(v) ? "undefined" : fixed(v, 3);
    }

    /**
     * A p-value: 4 significant digits, scientific below 1e-4, never 0.
     *
     * @param p the p-value
     * @return the text
     */
    public static String p(double p) {
        if (Double.isNaN(p)) {
            return "undefined";
        }
        if (p == 0) {
            return "< 1e-300";
        }
        if (p < 1e-4) {
            return String.format(Locale.ROOT, "%.3e", p);
        }
        return String.format(Locale.ROOT, "%.4f", p);
    }

    /**
     * A tolerance interval as text, a missing end as −∞ or +∞ (docs/methods.md §17).
     *
     * @param t   the interval
     * @param num how to write an end
     * @return e.g. "(4.15250, 4.22622)" or "(−∞, 0.0318)"
     */
    public static String interval(org.holdpoint.stats.ToleranceInterval t,
            java.util.function.DoubleFunction<String> num) {
        return "(" + (t.lower() == null ? "\u2212\u221e" : num.apply(t.lower())) + ", "
                + (t.upper() == null ? "+\u221e" : num.apply(t.upper())) + ")";
    }

    /**
     * A level such as 0.9 as "90 %".
     *
     * @param level a probability
     * @return the text
     */
    public static String percent(double level) {
        double pct = level * 100;
        if (Math.abs(pct - Math.rint(pct)) < 1e-9) {
            return String.format(Locale.ROOT, "%d %%", (long) Math.rint(pct));
        }
        return String.format(Locale.ROOT, "%s %%", num(pct));
    }

    /**
     * The margin of an equivalence result in words.
     *
     * @param eq the result
     * @return e.g. "(margin -0.01 to 0.01)"
     */
    public static String margin(EquivalenceResult eq) {
        return margin(eq, -1);
    }

    /**
     * The margin of an equivalence result in words, in the characteristic's decimals.
     *
     * @param eq       the result
     * @param decimals decimals, or -1 for six significant digits
     * @return e.g. "(margin -0.0100 to 0.0100)"
     */
    public static String margin(EquivalenceResult eq, int decimals) {
        return margin(eq, v -> decimals < 0 ? num(v) : fixed(v, decimals));
    }

    /**
     * The margin of an equivalence result in words, each bound written by the given function.
     *
     * @param eq  the result
     * @param num writes a value in the characteristic's unit
     * @return e.g. "(margin -0.0100 to 0.0100)"
     */
    public static String margin(EquivalenceResult eq, java.util.function.DoubleFunction<String> num) {
        if (eq.ratio()) {
            if (eq.lowerMargin() != null && eq.upperMargin() != null) {
                return "(ratio margin " + ratioBound(eq.lowerMargin()) + " to " + ratioBound(eq.upperMargin()) + ")";
            }
            return eq.lowerMargin() != null ? "(lower ratio margin " + ratioBound(eq.lowerMargin()) + ")"
                    : "(upper ratio margin " + ratioBound(eq.upperMargin()) + ")";
        }
        if (eq.lowerMargin() != null && eq.upperMargin() != null) {
            return "(margin " + num.apply(eq.lowerMargin()) + " to " + num.apply(eq.upperMargin()) + ")";
        }
        if (eq.lowerMargin() != null) {
            return "(lower margin " + num.apply(eq.lowerMargin()) + ")";
        }
        return "(upper margin " + num.apply(eq.upperMargin()) + ")";
    }
}
