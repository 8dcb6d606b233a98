package org.holdpoint.stats;

/**
 * An equivalence margin (L, U) for the difference after − before, in the characteristic's unit, or — a ratio
 * margin — for the ratio after/before (0 &lt; L &lt; 1 &lt; U), judged on the log scale (docs/methods.md §3).
 * Either bound may be absent: only L is a non-inferiority margin ("may drop by at most |L|"), only U
 * its mirror ("may rise by at most U"). A present L must be &lt; 0 and a present U &gt; 0 (ratio: L &lt; 1, U &gt; 1).
 *
 * @param lower L, or null when only an upper margin is set
 * @param upper U, or null when only a lower margin is set
 * @param ratio whether the bounds are ratios after/before
 */
public record Margin(Double lower, Double upper, boolean ratio) {

    /**
     * A margin for the difference.
     *
     * @param lower L &lt; 0, or null
     * @param upper U &gt; 0, or null
     */
    public Margin(Double lower, Double upper) {
        this(lower, upper, false);
    }

    /**
     * A margin for the ratio after/before of the (geometric) means, e.g. (0.9, 1.1) or "may grow by at most 20 %"
     * (upper 1.2 alone).
     *
     * @param lower 0 &lt; L &lt; 1, or null
     * @param upper U &gt; 1, or null
     * @return the margin
     */
    public static Margin ratio(Double lower, Double upper) {
        return new Margin(lower, upper, true);
    }

    /** @return the margin of the difference of the logarithms (ln L, ln U); for a ratio margin only */
    public Margin logScale() {
        if (!ratio) {
            throw new StatsException("only a ratio margin has a log scale");
        }
        return new Margin(lower == null ? null : Math.log(lower), upper == null ? null : Math.log(upper), false);
    }

    /** Validates the margin. */
    public Margin {
        if (lower == null && upper == null) {
            throw new StatsException("a margin needs a lower bound, an upper bound or both");
        }
        if (ratio) {
            if (lower != null && !(lower > 0 && lower < 1)) {
                throw new StatsException("the lower ratio margin must lie between 0 and 1 (after/before may drop to "
                        + "it), got %s", lower);
            }
            if (upper != null && !(upper > 1 && Double.isFinite(upper))) {
                throw new StatsException("the upper ratio margin must be above 1 (after/before may grow to it), got %s",
                        upper);
            }
        } else {
            if (lower != null && !(lower < 0 && Double.isFinite(lower))) {
                throw new StatsException("the lower margin must be negative and finite (the margin must contain 0), "
                        + "got %s", lower);
            }
            if (upper != null && !(upper > 0 && Double.isFinite(upper))) {
                throw new StatsException("the upper margin must be positive and finite (the margin must contain 0), "
                        + "got %s", upper);
            }
        }
    }

    /**
     * The two-sided margin (L, U), asymmetric allowed.
     *
     * @param lower L &lt; 0
     * @param upper U &gt; 0
     * @return the margin
     */
    public static Margin of(double lower, double upper) {
        return new Margin(lower, upper);
    }

    /**
     * The symmetric margin (−D, D).
     *
     * @param d D &gt; 0
     * @return the margin
     */
    public static Margin symmetric(double d) {
        if (!(d > 0)) {
            throw new StatsException("a symmetric margin must be positive, got %s", d);
        }
        return new Margin(-d, d);
    }

    /**
     * A margin as percentages of the tolerance width: L = −pL·(USL − LSL)/100, U = pU·(USL − LSL)/100.
     *
     * @param percentLower pL &gt; 0, or NaN for no lower bound
     * @param percentUpper pU &gt; 0, or NaN for no upper bound
     * @param lsl          lower specification limit
     * @param usl          upper specification limit, &gt; LSL
     * @return the margin in the characteristic's unit
     */
    public static Margin percentOfTolerance(double percentLower, double percentUpper, double lsl, double usl) {
        if (!(usl > lsl) || !Double.isFinite(usl - lsl)) {
            throw new StatsException("a margin in percent of tolerance needs LSL < USL, got LSL = %s, USL = %s", lsl,
                    usl);
        }
        // in decimal arithmetic on the numbers as entered (their shortest decimals), so that 20 % of the
        // tolerance 9.90 to 10.10 is 0.04 and not 0.04000000000000057
        java.math.BigDecimal width = java.math.BigDecimal.valueOf(usl).subtract(java.math.BigDecimal.valueOf(lsl));
        Double lo = Double.isNaN(percentLower) ? null : -percentOf(checkPercent(percentLower), width);
        Double hi = Double.isNaN(percentUpper) ? null : percentOf(checkPercent(percentUpper), width);
        return new Margin(lo, hi);
    }

    /**
     * An upper margin as a percentage of the upper specification limit, for a characteristic bounded at zero
     * with an upper limit only (flatness, runout, roughness): U = p % of USL, in decimal arithmetic on the
     * numbers as entered (10 % of 0.05 is 0.005 exactly); no lower bound (the characteristic may shrink freely).
     *
     * @param percent p &gt; 0
     * @param usl     the upper specification limit, &gt; 0
     * @return the one-sided margin (non-superiority)
     */
    public static Margin percentOfUpperLimit(double percent, double usl) {
        if (!(usl > 0) || !Double.isFinite(usl)) {
            throw new StatsException("a margin in percent of the USL needs a positive USL, got %s", usl);
        }
        if (!(percent > 0 && percent < 1000)) {
            throw new StatsException("a margin in percent of the USL must be positive, got %s", percent);
        }
        return new Margin(null, percentOf(percent, java.math.BigDecimal.valueOf(usl)));
    }

    private static double percentOf(double percent, java.math.BigDecimal width) {
        return java.math.BigDecimal.valueOf(percent).multiply(width).movePointLeft(2).doubleValue();
    }

    private static double checkPercent(double p) {
        if (p > 0 && p < 1000) {
            return p;
        }
        throw new StatsException("a margin in percent of tolerance must be positive, got %s", p);
    }

    /** @return the kind of claim this margin supports */
    public Claim claim() {
        if (lower != null && upper != null) {
            return Claim.EQUIVALENCE;
        }
        return lower != null ? Claim.NON_INFERIORITY : Claim.NON_SUPERIORITY;
    }

    /** The claim a margin supports. */
    public enum Claim {
        /** L &lt; δ &lt; U. */
        EQUIVALENCE,
        /** δ &gt; L only (a drop of at most |L|). */
        NON_INFERIORITY,
        /** δ &lt; U only (a rise of at most U). */
        NON_SUPERIORITY
    }
}
