package org.holdpoint.stats;

import org.apache.commons.math3.special.Erf;

/**
 * The standard normal distribution: cdf and quantile accurate in the far tails.
 *
 * <p>The cdf uses Cody's rational Chebyshev approximations (see {@link #cdf}; beyond |z| = 40, where the
 * tail is below 1e-300, ½·erfc(|z|/√2)), each tail computed from its own side, never as 1 − the other
 * (docs/methods.md §2); the quantile is Wichura's AS 241
 * (PPND16, Appl. Statist. 37:477–484, 1988), accurate to about 1e-16 relative.
 */
public final class Normal {
    private static final double SQRT1_2 = Math.sqrt(0.5);
    private static final double LOG_SQRT_2PI = 0.5 * Math.log(2 * Math.PI);
    /** {@link #logCdf} uses its asymptotic series at and below this z (Φ(z) would underflow soon after). */
    static final double SERIES_BELOW = -37;

    private Normal() {
    }

    /**
     * Φ(z), the lower tail P(Z ≤ z), by Cody's rational Chebyshev approximations (Cody 1969, "Rational
     * Chebyshev approximations for the error function", Math. Comp. 23:631–637; the ANORM routine of
     * Cody 1993, ACM TOMS 19:22–32, ALGORITHM 715), accurate to about 1e-16 relative in the lower tail;
     * the Gaussian factor is split as exp(−t²/2)·exp(−(z² − t²)/2) with t = ⌊16z⌋/16 so that a large
     * |z| keeps its relative accuracy. Upper tails are taken as Φ(−z), from their own side.
     *
     * @param z any real value
     * @return Φ(z) in [0, 1]
     */
    public static double cdf(double z) {
        if (Double.isNaN(z)) {
            return Double.NaN;
        }
        double y = Math.abs(z);
        if (y <= 0.66291) {
            double xsq = y > 1.1e-16 ? z * z : 0;
            double num = A[4] * xsq;
            double den = xsq;
            for (int i = 0; i < 3; i++) {
                num = (num + A[i]) * xsq;
                den = (den + B[i]) * xsq;
            }
            double t = z * (num + A[3]) / (den + B[3]);
            return 0.5 + t;
        }
        double tail;
        if (y <= 5.656854248) {
            double num = C[8] * y;
            double den = y;
            for (int i = 0; i < 7; i++) {
                num = (num + C[i]) * y;
                den = (den + D[i]) * y;
            }
            tail = (num + C[7]) / (den + D[7]) * gaussian(y);
        } else if (y < 40) {
            double xsq = 1 / (z * z);
            double num = P[5] * xsq;
            double den = xsq;
            for (int i = 0; i < 4; i++) {
                num = (num + P[i]) * xsq;
                den = (den + Q[i]) * xsq;
            }
            double r = xsq * (num + P[4]) / (den + Q[4]);
            tail = (ONE_OVER_SQRT_2PI - r) / y * gaussian(y);
        } else {
            tail = 0.5 * Erf.erfc(y * SQRT1_2);
        }
        return z < 0 ? tail : 1 - tail;
    }

    /** exp(−y²/2) with the square split at a multiple of 1/16 (exact), as Cody's ANORM does. */
    private static double gaussian(double y) {
        double t = Math.floor(y * 16) / 16;
        double del = (y - t) * (y + t);
        return Math.exp(-t * t * 0.5) * Math.exp(-del * 0.5);
    }

    private static final double ONE_OVER_SQRT_2PI = 0.398942280401432677939946059934;
    private static final double[] A = {2.2352520354606839287, 161.02823106855587881, 1067.6894854603709582,
        18154.981253343561249, 0.065682337918207449113};
    private static final double[] B = {47.20258190468824187, 976.09855173777669322, 10260.932208618978205,
        45507.789335026729956};
    private static final double[] C = {0.39894151208813466764, 8.8831497943883759412, 93.506656132177855979,
        597.27027639480026226, 2494.5375852903726711, 6848.1904505362823326, 11602.651437647350124,
        9842.7148383839780218, 1.0765576773720192317e-8};
    private static final double[] D = {22.266688044328115691, 235.38790178262499861, 1519.377599407554805,
        6485.558298266760755, 18615.571640885098091, 34900.952721145977266, 38912.003286093271411,
        19685.429676859990727};
    private static final double[] P = {0.21589853405795699, 0.1274011611602473639, 0.022235277870649807,
        0.001421619193227893466, 2.9112874951168792e-5, 0.02307344176494017303};
    private static final double[] Q = {1.28426009614491121, 0.468238212480865118, 0.0659881378689285515,
        0.00378239633202758244, 7.29751555083966205e-5};

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
        if (z > SERIES_BELOW) {
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
