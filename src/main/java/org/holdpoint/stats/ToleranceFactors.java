package org.holdpoint.stats;

import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.TooManyEvaluationsException;

/**
 * Factors of tolerance intervals (ISO 16269-6:2014; docs/methods.md §17): intervals that cover at least a
 * proportion p of a population with confidence γ.
 *
 * <p><b>Normal, one-sided</b> (x̄ + k·s or x̄ − k·s): k = t'_γ(ν, δ)/√n, the γ-quantile of the noncentral t
 * distribution with ν = n − 1 degrees of freedom and noncentrality δ = z_p·√n. Its upper tail is computed as
 * P(T &gt; t) = ∫ Φ(δ − t·x/√ν)·f_χν(x) dx over the chi distribution (Owen 1965) and inverted by Brent's method.
 *
 * <p><b>Normal, two-sided</b> (x̄ ± k·s), exact (Odeh &amp; Owen 1980; the integral of ISO 16269-6's annex):
 * γ = 2√n ∫_0^∞ P(χ²_ν &gt; ν·r(z)²/k²)·φ(√n·z) dz, with r(z) the root of Φ(z + r) − Φ(z − r) = p; k is found by
 * Brent's method. No approximation (Howe's, Wald–Wolfowitz's) is used.
 *
 * <p><b>Distribution-free</b> (Wilks 1941): the interval [x₍₁₎, x₍ₙ₎] covers p with confidence
 * 1 − n·p^{n−1} + (n − 1)·p^n; the one-sided x₍₁₎ or x₍ₙ₎ with 1 − p^n.
 */
public final class ToleranceFactors {
    /** The largest sample size a distribution-free plan searches. */
    static final int MAX_N = 10_000_000;
    private static final double UPPER_Z = 10;

    private ToleranceFactors() {
    }

    private static void check(int n, double p, double gamma) {
        if (n < 2) {
            throw new StatsException("a tolerance interval needs at least 2 values, got %d", n);
        }
        checkLevels(p, gamma);
    }

    private static void checkLevels(double p, double gamma) {
        if (!(p > 0 && p < 1)) {
            throw new StatsException("the coverage must lie strictly between 0 and 1, got %s", p);
        }
        if (!(gamma > 0 && gamma < 1)) {
            throw new StatsException("the confidence must lie strictly between 0 and 1, got %s", gamma);
        }
    }

    /**
     * P(T &gt; t) for the noncentral t distribution.
     *
     * @param t     the point
     * @param df    ν ≥ 1
     * @param delta the noncentrality δ
     * @return the upper tail
     */
    static double noncentralTUpper(double t, double df, double delta) {
        double scale = t / Math.sqrt(df);
        return Math.min(1, Math.max(0, ExactPower.overChi(x -> Normal.cdf(delta - scale * x), df)));
    }

    /**
     * The one-sided normal tolerance factor.
     *
     * @param n     the sample size, at least 2
     * @param p     the coverage, in (0, 1)
     * @param gamma the confidence, in (0, 1)
     * @return k such that x̄ + k·s (or x̄ − k·s) bounds a proportion p with confidence γ
     */
    public static double oneSided(int n, double p, double gamma) {
        check(n, p, gamma);
        double df = n - 1.0;
        double delta = Normal.quantile(p) * Math.sqrt(n);
        double target = 1 - gamma;
        // P(T > t) falls from 1 to 0 as t grows: bracket the quantile, then solve
        double lo = delta - 1;
        while (noncentralTUpper(lo, df, delta) < target) {
            lo = lo - Math.max(1, Math.abs(lo));
        }
        double hi = delta + 1;
        while (noncentralTUpper(hi, df, delta) > target) {
            hi = hi + Math.max(1, Math.abs(hi));
            if (hi > 1e12) {
                throw new StatsException("the one-sided tolerance factor for n = %d, p = %s, confidence %s is beyond "
                        + "reach", n, p, gamma);
            }
        }
        double t = solve(x -> noncentralTUpper(x, df, delta) - target, lo, hi);
        return t / Math.sqrt(n);
    }

    /**
     * r(z), the half-width about z that a standard normal covers with probability p: Φ(z + r) − Φ(z − r) = p,
     * solved by Newton's method on the tails Φ(−z − r) + Φ(z − r) = 1 − p.
     */
    static double halfWidth(double z, double p) {
        double q = 1 - p;
        double r = z + Normal.upperQuantile(q / 2);
        for (int i = 0; i < 100; i++) {
            double f = Normal.cdf(-z - r) + Normal.cdf(z - r) - q;
            double d = -(Normal.density(z + r) + Normal.density(z - r));
            double step = f / d;
            r -= step;
            if (Math.abs(step) <= 1e-15 * r) {
                return r;
            }
        }
        throw new StatsException("the normal half-width for z = %s, p = %s did not converge in 100 steps", z, p);
    }

    /**
     * The confidence of x̄ ± k·s covering a proportion p (Odeh–Owen integral).
     *
     * @param n the sample size
     * @param p the coverage
     * @param k the factor
     * @return the confidence γ
     */
    static double twoSidedConfidence(int n, double p, double k) {
        double df = n - 1.0;
        double rootN = Math.sqrt(n);
        double end = UPPER_Z / rootN;
        double[] breaks = {0, 0.5 / rootN, 1 / rootN, 2 / rootN, 3 / rootN, 4 / rootN, 6 / rootN, end};
        double integral = Quadrature.integrate(z -> {
            double r = halfWidth(z, p);
            return Distributions.chiSquaredUpper(df * r * r / (k * k), df) * Normal.density(rootN * z);
        }, breaks, 1e-13);
        return Math.min(1, 2 * rootN * integral);
    }

    /**
     * The exact two-sided normal tolerance factor.
     *
     * @param n     the sample size, at least 2
     * @param p     the coverage, in (0, 1)
     * @param gamma the confidence, in (0, 1)
     * @return k such that x̄ ± k·s covers a proportion p with confidence γ
     */
    public static double twoSided(int n, double p, double gamma) {
        check(n, p, gamma);
        double z = Normal.upperQuantile((1 - p) / 2);
        double lo = 0.5 * z;
        while (twoSidedConfidence(n, p, lo) > gamma) {
            lo /= 2;
        }
        double hi = 2 * z;
        while (twoSidedConfidence(n, p, hi) < gamma) {
            hi *= 2;
            if (hi > 1e12) {
                throw new StatsException("the two-sided tolerance factor for n = %d, p = %s, confidence %s is beyond "
                        + "reach", n, p, gamma);
            }
        }
        return solve(k -> twoSidedConfidence(n, p, k) - gamma, lo, hi);
    }

    private static double solve(org.apache.commons.math3.analysis.UnivariateFunction f, double lo, double hi) {
        try {
            return new BrentSolver(1e-15, 1e-14 * Math.max(1, Math.abs(hi)), 1e-300).solve(500, f, lo, hi);
        } catch (TooManyEvaluationsException e) {
            throw new StatsException("the tolerance factor did not converge in 500 evaluations");
        }
    }

    /**
     * The confidence of the distribution-free interval [x₍₁₎, x₍ₙ₎] for a coverage p (Wilks 1941).
     *
     * @param n the sample size
     * @param p the coverage
     * @return 1 − n·p^{n−1} + (n − 1)·p^n
     */
    public static double wilksTwoSided(int n, double p) {
        checkLevels(p, 0.5);
        return 1 - n * Math.pow(p, n - 1) + (n - 1) * Math.pow(p, n);
    }

    /**
     * The confidence of the distribution-free one-sided bound x₍₁₎ (or x₍ₙ₎) for a coverage p.
     *
     * @param n the sample size
     * @param p the coverage
     * @return 1 − p^n
     */
    public static double wilksOneSided(int n, double p) {
        checkLevels(p, 0.5);
        return -Math.expm1(n * Math.log(p));
    }

    /**
     * The smallest sample whose distribution-free interval reaches coverage p with confidence γ.
     *
     * @param p        the coverage
     * @param gamma    the confidence
     * @param twoSided [min, max] (true) or one bound (false)
     * @return the smallest n
     */
    public static int wilksSampleSize(double p, double gamma, boolean twoSided) {
        checkLevels(p, gamma);
        for (int n = twoSided ? 2 : 1; n <= MAX_N; n++) {
            if ((twoSided ? wilksTwoSided(n, p) : wilksOneSided(n, p)) >= gamma) {
                return n;
            }
        }
        throw new StatsException("more than %d values would be needed for coverage %s with confidence %s", MAX_N, p,
                gamma);
    }
}
