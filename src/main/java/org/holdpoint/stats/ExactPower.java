package org.holdpoint.stats;

import java.util.Arrays;
import org.apache.commons.math3.special.Gamma;

/**
 * Exact power of the two one-sided tests and of the two-sided t-test, as one-dimensional integrals
 * over the chi distribution of X = √ν·ŝe/se (Owen 1965; Phillips 1990).
 *
 * <p>TOST at level α per one-sided test, margin (L, U), true difference T, tc = t_{1−α,ν},
 * dL = (T − L)/se, dU = (T − U)/se and R = √ν·(U − L)/(2·tc·se):
 * power = ∫_0^R [Φ(−tc·x/√ν − dU) − Φ(tc·x/√ν − dL)]·f_χν(x) dx = Q_ν(−tc, dU; 0, R) − Q_ν(tc, dL; 0, R).
 * Two-sided t-test for a shift T at level α, c = t_{1−α/2,ν}, δ = T/se:
 * power = ∫_0^∞ [Φ(δ − c·x/√ν) + Φ(−δ − c·x/√ν)]·f_χν(x) dx = 1 − F(c; ν, δ) + F(−c; ν, δ).
 * The chi density is taken in logs, ln f_χν(x) = (ν − 1)·ln x − x²/2 − (ν/2 − 1)·ln 2 − lnΓ(ν/2)
 * (rearranged about the mode, see {@link #chiDensity}), and integrated over [0, R] ∩ [mode − 16, mode + 16] (mode √(ν − 1), chi sd below 0.71), split at
 * mode ± 1, 2, 4, 8, by adaptive Gauss–Kronrod to 1e-13 relative.
 */
final class ExactPower {
    private static final double REL_TOL = 1e-13;
    private static final double HALF_WIDTH = 16;
    private static final double[] SPLITS = {-8, -4, -2, -1, 1, 2, 4, 8};
    private static final double LOG_SQRT_PI = 0.5 * Math.log(Math.PI);
    private static final double LOG_SQRT_2PI = 0.5 * Math.log(2 * Math.PI);

    private ExactPower() {
    }

    /**
     * Exact TOST power for a difference estimate with standard error se and ν degrees of freedom.
     *
     * @param alpha the level of each one-sided test, in (0, 0.5)
     * @param lower L
     * @param upper U &gt; L
     * @param diff  the true difference T (any real value)
     * @param se    the true standard error of the estimate, &gt; 0
     * @param df    ν ≥ 1
     * @return P(both one-sided tests reject)
     */
    static double tost(double alpha, double lower, double upper, double diff, double se, double df) {
        double tc = Distributions.tUpperQuantile(alpha, df);
        double rootNu = Math.sqrt(df);
        double dL = (diff - lower) / se;
        double dU = (diff - upper) / se;
        double reach = rootNu * (upper - lower) / (2 * tc * se);
        double k = tc / rootNu;
        double logConst = logChiConstant(df);
        double mode = df > 1 ? Math.sqrt(df - 1) : 0;
        double hi = Math.min(reach, mode + HALF_WIDTH);
        // when R lies far below the bulk the integrand still lives just below R
        double lo = Math.max(0, Math.min(mode - HALF_WIDTH, hi - HALF_WIDTH));
        if (!(hi > lo)) {
            return 0;
        }
        return Quadrature.integrate(x -> normalDifference(-k * x - dU, k * x - dL) * chiDensity(x, df, logConst),
                breaks(lo, hi, mode), REL_TOL);
    }

    /**
     * Exact power of one one-sided t-test at level α (non-inferiority against a lower margin L, or
     * non-superiority against an upper margin U): with δ = (T − L)/se, or (U − T)/se, and tc = t_{1−α,ν},
     * power = ∫_0^∞ Φ(δ − tc·x/√ν)·f_χν(x) dx = 1 − F(tc; ν, δ), F the noncentral t distribution.
     *
     * @param alpha the level of the one-sided test, in (0, 0.5)
     * @param delta the standardised distance of the true difference from the bound, on the claim's side
     *              positive (any real value)
     * @param df    ν ≥ 1
     * @return P(the one-sided test rejects)
     */
    static double oneSided(double alpha, double delta, double df) {
        double tc = Distributions.tUpperQuantile(alpha, df);
        double k = tc / Math.sqrt(df);
        double logConst = logChiConstant(df);
        double mode = df > 1 ? Math.sqrt(df - 1) : 0;
        double lo = Math.max(0, mode - HALF_WIDTH);
        double hi = mode + HALF_WIDTH;
        double p = Quadrature.integrate(x -> Normal.cdf(delta - k * x) * chiDensity(x, df, logConst),
                breaks(lo, hi, mode), REL_TOL);
        return Math.min(1, p);
    }

    /**
     * The probability that the estimated Ppk of n normal values is at least p* (its lower bound then passes a
     * requirement): with the true process in σ units a = (USL − μ)/σ and b = (μ − LSL)/σ (∞ for a missing
     * limit), s = σ·x/√ν, x ~ χ_ν, and x̄ − μ ~ N(0, σ²/n) independent of s, the event is
     * x̄ − μ ∈ [−b + 3·s·p*, a − 3·s·p*], so P = ∫ [Φ(√n·(a − 3·x·pStar/√ν)) − Φ(√n·(−b + 3·x·pStar/√ν))]⁺ f_χν(x) dx,
     * exact for one and for two limits.
     *
     * @param n     the sample size, ≥ 3
     * @param a     (USL − μ)/σ, or +∞
     * @param b     (μ − LSL)/σ, or +∞
     * @param pStar the estimated Ppk that must be reached
     * @return the probability
     */
    static double ppkAtLeast(int n, double a, double b, double pStar) {
        double df = n - 1.0;
        double rootN = Math.sqrt(n);
        double k = 3 * pStar / Math.sqrt(df);
        double logConst = logChiConstant(df);
        double mode = Math.sqrt(df - 1);
        double lo = Math.max(0, mode - HALF_WIDTH);
        double hi = mode + HALF_WIDTH;
        double p = Quadrature.integrate(x -> {
            double up = Double.isInfinite(a) ? Double.POSITIVE_INFINITY : rootN * (a - k * x);
            double down = Double.isInfinite(b) ? Double.NEGATIVE_INFINITY : rootN * (-b + k * x);
            double inside = Double.isInfinite(up) ? 1 - Normal.cdf(down) : Double.isInfinite(down) ? Normal.cdf(up)
                    : normalDifference(up, down);
            return Math.max(0, inside) * chiDensity(x, df, logConst);
        }, breaks(lo, hi, mode), REL_TOL);
        return Math.min(1, Math.max(0, p));
    }

    /**
     * Exact power of the two-sided t-test at level α for a true shift with standard error se.
     *
     * @param alpha the two-sided level, in (0, 1)
     * @param shift the true shift T
     * @param se    its standard error, &gt; 0
     * @param df    ν ≥ 1
     * @return P(|t| ≥ t_{1−α/2,ν})
     */
    static double tTest(double alpha, double shift, double se, double df) {
        double c = Distributions.tUpperQuantile(0.5 * alpha, df);
        double delta = Math.abs(shift) / se;
        double k = c / Math.sqrt(df);
        double logConst = logChiConstant(df);
        double mode = df > 1 ? Math.sqrt(df - 1) : 0;
        double lo = Math.max(0, mode - HALF_WIDTH);
        double hi = mode + HALF_WIDTH;
        double p = Quadrature.integrate(
                x -> (Normal.cdf(delta - k * x) + Normal.cdf(-delta - k * x)) * chiDensity(x, df, logConst),
                breaks(lo, hi, mode), REL_TOL);
        return Math.min(1, p);
    }

    /**
     * Φ(a) − Φ(b) for a ≥ b without cancellation: from the upper tails when b &gt; 0; and when a and b lie
     * on the same side of 0 and close together (h·max(1, |M|) &lt; ½ with M = (a + b)/2, h = (a − b)/2), as
     * φ(M)·∫_{−h}^{h} exp(−M·s − s²/2) ds by the 15-point Kronrod rule, which is then exact to rounding.
     */
    static double normalDifference(double a, double b) {
        if (!(a > b)) {
            return 0;
        }
        double mid = 0.5 * (a + b);
        double h = 0.5 * (a - b);
        if ((b > 0 || a < 0) && h * Math.max(1, Math.abs(mid)) < 0.5) {
            double sum = Quadrature.WGK[7];
            for (int j = 0; j < 7; j++) {
                double s = h * Quadrature.XGK[j];
                sum += Quadrature.WGK[j] * Math.exp(-0.5 * s * s) * 2 * Math.cosh(mid * s);
            }
            return Normal.density(mid) * h * sum;
        }
        double d = b > 0 ? Normal.cdf(-b) - Normal.cdf(-a) : Normal.cdf(a) - Normal.cdf(b);
        return Math.max(0, d);
    }

    /**
     * The constant K of ln f_χν written about the mode m = √(ν − 1): with a = ν/2,
     * K = (ν − 1)·ln m − m²/2 − (ν/2 − 1)·ln 2 − lnΓ(a) = (a − ½)·log1p(−1/(2a)) + ½ − ½·ln π − δ(a),
     * δ(a) = lnΓ(a) − (a − ½)·ln a + a − ½·ln 2π the Stirling remainder, so no large terms cancel.
     * For ν = 1 it is ln √(2/π).
     */
    static double logChiConstant(double df) {
        if (df == 1) {
            return 0.5 * Math.log(2 / Math.PI);
        }
        double a = 0.5 * df;
        return (a - 0.5) * Math.log1p(-0.5 / a) + 0.5 - LOG_SQRT_PI - stirlingRemainder(a);
    }

    /** δ(a) = lnΓ(a) − (a − ½)·ln a + a − ½·ln 2π: the asymptotic series for a ≥ 15, else directly. */
    static double stirlingRemainder(double a) {
        if (a < 15) {
            return Gamma.logGamma(a) - (a - 0.5) * Math.log(a) + a - LOG_SQRT_2PI;
        }
        double r = 1 / (a * a);
        return (1.0 / 12 - r * (1.0 / 360 - r * (1.0 / 1260 - r * (1.0 / 1680 - r * (1.0 / 1188
                - r * (691.0 / 360360)))))) / a;
    }

    /**
     * f_χν(x) evaluated about the mode m = √(ν − 1), u = x − m, t = u/m:
     * ln f = K + (ν − 1)·[log1p(t) − t] − u²/2, the same as (ν − 1)·ln x − x²/2 + constant but without
     * the cancellation of terms of size ν that makes the direct form noisy at 1e-13 for large ν.
     */
    static double chiDensity(double x, double df, double logConst) {
        if (df == 1) {
            return Math.exp(logConst - 0.5 * x * x);
        }
        if (x <= 0) {
            return 0;
        }
        double m = Math.sqrt(df - 1);
        double u = x - m;
        return Math.exp(logConst + (df - 1) * log1pMinusX(u / m) - 0.5 * u * u);
    }

    /** log1p(t) − t, by its series −t²/2 + t³/3 − … when |t| &lt; ¼ (no cancellation). */
    static double log1pMinusX(double t) {
        if (Math.abs(t) >= 0.25) {
            return Math.log1p(t) - t;
        }
        double term = -t;
        double sum = 0;
        for (int k = 2; k < 60; k++) {
            term *= -t;
            double add = term / k;
            sum -= add;
            if (Math.abs(add) <= 1e-17 * Math.abs(sum)) {
                break;
            }
        }
        return sum;
    }

    /**
     * ∫_0^∞ g(x)·f_χν(x) dx over the bulk of the chi distribution ([mode − 16, mode + 16] ∩ [0, ∞)), split as above,
     * to 1e-13 relative: the expectation of g(X), X ~ χ_ν.
     *
     * @param g  a bounded function
     * @param df ν ≥ 1
     * @return E g(X)
     */
    static double overChi(java.util.function.DoubleUnaryOperator g, double df) {
        double logConst = logChiConstant(df);
        double mode = df > 1 ? Math.sqrt(df - 1) : 0;
        double lo = Math.max(0, mode - HALF_WIDTH);
        double hi = mode + HALF_WIDTH;
        return Quadrature.integrate(x -> g.applyAsDouble(x) * chiDensity(x, df, logConst), breaks(lo, hi, mode),
                REL_TOL);
    }

    /** The interval [lo, hi] split at mode ± 1, 2, 4, 8 where those fall inside. */
    private static double[] breaks(double lo, double hi, double mode) {
        double[] out = new double[SPLITS.length + 2];
        int count = 0;
        out[count++] = lo;
        for (double s : SPLITS) {
            double b = mode + s;
            if (b > lo && b < hi) {
                out[count++] = b;
            }
        }
        out[count++] = hi;
        return Arrays.copyOf(out, count);
    }
}
