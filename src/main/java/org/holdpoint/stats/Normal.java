package org.holdpoint.stats;

import org.apache.commons.math3.special.Erf;

/**
 * The standard normal distribution: cdf and quantile accurate in the far tails.
 *
 * <p>The cdf is taken as {@code ½·erfc(−z/√2)}, so each tail is computed from its own side
 * (Abramowitz &amp; Stegun 1964, 7.1.2 and 26.2.29); the quantile is Wichura's AS 241
 * (PPND16, Appl. Statist. 37:477–484, 1988), accurate to about 1e-16 relative.
 */
public final class Normal {
    private static final double SQRT1_2 = Math.sqrt(0.5);
    private static final double LOG_SQRT_2PI = 0.5 * Math.log(2 * Math.PI);

    private Normal() {
    }

    /**
     * Φ(z), the lower tail P(Z ≤ z), from erfc so that Φ(−40) is about 3.7e-350 → 0 only past
     * the double range (Abramowitz &amp; Stegun 26.2.29).
     *
     * @param z any real value
     * @return Φ(z) in [0, 1]
     */
    public static double cdf(double z) {
        if (Double.isNaN(z)) {
            return Double.NaN;
        }
        return 0.5 * Erf.erfc(-z * SQRT1_2);
    }

    /**
     * φ(z), the standard normal density.
     *
     * @param z any real value
     * @return the density at z
     */
    public static double density(double z) {
        return Math.exp(-0.5 * z * z - LOG_SQRT_2PI);
    }

    /**
     * ln Φ(z), using the asymptotic series −z²/2 − ln(−z) − ½ln 2π + ln(1 − z⁻² + 3z⁻⁴ − 15z⁻⁶)
     * where Φ underflows (z &lt; −37; Abramowitz &amp; Stegun 26.2.12).
     *
     * @param z any real value
     * @return ln Φ(z)
     */
    public static double logCdf(double z) {
        if (z > -37) {
            return Math.log(cdf(z));
        }
        double r = 1 / (z * z);
        return -0.5 * z * z - Math.log(-z) - LOG_SQRT_2PI + Math.log1p(-r + 3 * r * r - 15 * r * r * r);
    }

    /**
     * Φ⁻¹(p), the lower-p quantile, by Wichura's algorithm AS 241 (PPND16).
     *
     * @param p a probability in [0, 1]
     * @return z with Φ(z) = p; −∞ at 0 and +∞ at 1
     * @throws StatsException if p is outside [0, 1] or NaN
     */
    public static double quantile(double p) {
        if (!(p >= 0 && p <= 1)) {
            throw new StatsException("probability must lie in [0, 1], got %s", p);
        }
        if (p == 0) {
            return Double.NEGATIVE_INFINITY;
        }
        if (p == 1) {
            return Double.POSITIVE_INFINITY;
        }
        double q = p - 0.5;
        if (Math.abs(q) <= 0.425) {
            double r = 0.180625 - q * q;
            return q * (((((((r * 2509.0809287301226727 + 33430.575583588128105) * r + 67265.770927008700853) * r
                    + 45921.953931549871457) * r + 13731.693765509461125) * r + 1971.5909503065514427) * r
                    + 133.14166789178437745) * r + 3.387132872796366608)
                    / (((((((r * 5226.4952788528545610 + 28729.085735721942674) * r + 39307.89580009271061) * r
                    + 21213.794301586595867) * r + 5394.1960214247511077) * r + 687.1870074920579083) * r
                    + 42.313330701600911252) * r + 1.0);
        }
        double r = q < 0 ? p : 1 - p;
        // for p > 0.5 the upper tail 1 − p is exact in binary64 when p ≥ 0.5 (Sterbenz)
        r = Math.sqrt(-Math.log(r));
        double val;
        if (r <= 5) {
            r -= 1.6;
            val = (((((((r * 7.7454501427834140764e-4 + 0.0227238449892691845833) * r + 0.24178072517745061177) * r
                    + 1.27045825245236838258) * r + 3.64784832476320460504) * r + 5.7694972214606914055) * r
                    + 4.6303378461565452959) * r + 1.42343711074968357734)
                    / (((((((r * 1.05075007164441684324e-9 + 5.475938084995344946e-4) * r + 0.0151986665636164571966) * r
                    + 0.14810397642748007459) * r + 0.68976733498510000455) * r + 1.6763848301838038494) * r
                    + 2.05319162663775882187) * r + 1.0);
        } else {
            r -= 5;
            val = (((((((r * 2.01033439929228813265e-7 + 2.71155556874348757815e-5) * r + 0.0012426609473880784386) * r
                    + 0.026532189526576123093) * r + 0.29656057182850489123) * r + 1.7848265399172913358) * r
                    + 5.4637849111641143699) * r + 6.6579046435011037772)
                    / (((((((r * 2.04426310338993978564e-15 + 1.4215117583164458887e-7) * r + 1.8463183175100546818e-5) * r
                    + 7.868691311456132591e-4) * r + 0.0148753612908506148525) * r + 0.13692988092273580531) * r
                    + 0.59983220655588793769) * r + 1.0);
        }
        return q < 0 ? -val : val;
    }

    /**
     * Φ⁻¹(1 − q) for an upper-tail probability q, accurate when q is tiny (AS 241 on the upper tail).
     *
     * @param q an upper-tail probability in [0, 1]
     * @return z with 1 − Φ(z) = q
     */
    public static double upperQuantile(double q) {
        return -quantile(q);
    }
}
