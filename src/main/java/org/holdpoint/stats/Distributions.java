package org.holdpoint.stats;

import java.util.Map;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.distribution.ChiSquaredDistribution;
import org.apache.commons.math3.distribution.FDistribution;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.special.Beta;
import org.apache.commons.math3.special.Gamma;

/**
 * The one small wrapper around Commons Math distributions that every method in {@code stats} uses.
 *
 * <p>Why it exists (measured pitfalls of Commons Math 3.6.1): its distributions allocate a random
 * generator per instance, take upper tails as {@code 1 − cdf} (losing all relative accuracy in the
 * far tail) and solve inverse cdfs to an absolute 1e-9 only. Here every tail is computed from its own
 * side through the regularized incomplete beta or gamma function (Abramowitz &amp; Stegun 1964,
 * 26.5.27 and 26.7.1), instances are cached without a generator, and every quantile is polished by
 * Newton steps on the tail that is small, so interval bounds are good to about 1e-13 relative.
 */
public final class Distributions {
    private static final double SOLVER_ACCURACY = 1e-14;
    /**
     * The most terms of a series or continued fraction of the incomplete beta and gamma functions: far beyond
     * what any argument here needs (hundreds), and past it Commons Math throws instead of looping on.
     */
    private static final int MAX_SERIES = 1_000_000;
    private static final double BETA_EPS = 1e-15;
    /** Below this lower-tail probability the solver's 1e-15 function-value accuracy is no guide. */
    private static final double FAR_TAIL = 1e-8;
    /**
     * Instances kept for reuse: degrees of freedom are often fractional (Welch, fitted gamma shapes), so each
     * cache keeps its most recently used entries only and never grows while the window stays open.
     */
    private static final int CACHE_SIZE = 256;
    private static final Map<Double, TDistribution> T_CACHE = lru();
    private static final Map<Long, FDistribution> F_CACHE = lru();
    private static final Map<Double, ChiSquaredDistribution> CHI2_CACHE = lru();

    private static <K, V> Map<K, V> lru() {
        return java.util.Collections.synchronizedMap(new java.util.LinkedHashMap<K, V>(CACHE_SIZE, 0.75f, true) {
            private static final long serialVersionUID = 1L;

            @Override
            protected boolean removeEldestEntry(Map.Entry<K, V> eldest) {
                return size() > CACHE_SIZE;
            }
        });
    }

    /** @return the number of cached distribution instances (for the test that they stay bounded) */
    static int cachedInstances() {
        return T_CACHE.size() + F_CACHE.size() + CHI2_CACHE.size();
    }

    private Distributions() {
    }

    private static void checkDf(double df, String name) {
        if (!(df > 0) || Double.isInfinite(df)) {
            throw new StatsException("degrees of freedom %s must be positive and finite, got %s", name, df);
        }
    }

    /**
     * I_x(a, b) with its complement formed from y = 1 − x given separately, so that neither tail is
     * computed as one minus the other (Abramowitz &amp; Stegun 26.5.27 continued fraction).
     */
    static double regularizedBeta(double x, double y, double a, double b) {
        if (x <= 0) {
            return 0;
        }
        if (y <= 0) {
            return 1;
        }
        if (x > (a + 1) / (a + b + 2)) {
            return 1 - Beta.regularizedBeta(y, b, a, BETA_EPS, MAX_SERIES);
        }
        return Beta.regularizedBeta(x, a, b, BETA_EPS, MAX_SERIES);
    }

    /**
     * Student's t lower tail F_ν(t) = P(T ≤ t). For t &lt; 0 it is ½·I_{ν/(ν+t²)}(ν/2, ½), computed
     * directly, so P(T ≤ −40; ν = 10) keeps its full relative accuracy (Abramowitz &amp; Stegun 26.7.1).
     *
     * @param t  the point
     * @param df ν &gt; 0, may be fractional (Welch–Satterthwaite)
     * @return P(T ≤ t)
     */
    public static double tCdf(double t, double df) {
        checkDf(df, "of t");
        if (Double.isNaN(t)) {
            return Double.NaN;
        }
        if (t == 0) {
            return 0.5;
        }
        if (Double.isInfinite(t)) {
            return t > 0 ? 1 : 0;
        }
        double t2 = t * t;
        // x = df/(df + t²) and its complement y = t²/(df + t²), both computed directly (no 1 − x)
        double x = df / (df + t2);
        double y = t2 / (df + t2);
        double lowerTail = 0.5 * regularizedBeta(x, y, 0.5 * df, 0.5);
        return t < 0 ? lowerTail : 1 - lowerTail;
    }

    /**
     * Student's t upper tail P(T ≥ t) = F_ν(−t), from its own side.
     *
     * @param t  the point
     * @param df ν &gt; 0
     * @return P(T ≥ t)
     */
    public static double tUpper(double t, double df) {
        return tCdf(-t, df);
    }

    /**
     * Two-sided p of Student's t: min(1, 2·F_ν(−|t|)).
     *
     * @param t  the statistic
     * @param df ν &gt; 0
     * @return the two-sided p-value
     */
    public static double tTwoSided(double t, double df) {
        return Math.min(1, 2 * tCdf(-Math.abs(t), df));
    }

    /** Student's t density f_ν(t). */
    static double tDensity(double t, double df) {
        double logDensity = Gamma.logGamma(0.5 * (df + 1)) - Gamma.logGamma(0.5 * df) - 0.5 * Math.log(df * Math.PI)
                - 0.5 * (df + 1) * Math.log1p(t * t / df);
        return Math.exp(logDensity);
    }

    private static TDistribution t(double df) {
        return T_CACHE.computeIfAbsent(df, d -> new TDistribution(null, d, SOLVER_ACCURACY));
    }

    /**
     * Student's t quantile t_{p,ν}: Commons Math's solver at 1e-14 (below a tail of 1e-8 the leading
     * term of the tail instead), then Newton steps on ln F against ln|t| on the smaller tail, so that
     * t_{0.975,ν} and t_{1−1e-20,ν} are both good to about 1e-14 relative.
     *
     * @param p  a probability in (0, 1)
     * @param df ν &gt; 0
     * @return t with F_ν(t) = p
     */
    public static double tQuantile(double p, double df) {
        checkDf(df, "of t");
        checkOpenProbability(p);
        if (p == 0.5) {
            return 0;
        }
        if (p > 0.5) {
            return -tLowerQuantileSmall(1 - p, df);
        }
        return tLowerQuantileSmall(p, df);
    }

    /**
     * t with F_ν(t) = q for q &lt; ½ (negative t), polished by Newton steps on the lower tail, which is
     * computed directly; used for the upper quantile as −t at q = 1 − p.
     */
    private static double tLowerQuantileSmall(double q, double df) {
        double x = q < FAR_TAIL ? Double.NaN : t(df).inverseCumulativeProbability(q);
        if (!(x < 0) || Double.isInfinite(x)) {
            // far tail, or a solver result that only meets its 1e-15 function-value accuracy: start from
            // the leading term of F_ν(t) = ½·I_x(ν/2, ½) ≈ ½·x^(ν/2)/((ν/2)·B(ν/2, ½)), x = ν/(ν + t²)
            double a = 0.5 * df;
            double logX = (Math.log(2 * q) + Math.log(a) + Beta.logBeta(a, 0.5)) / a;
            x = -Math.sqrt(df) * Math.exp(-0.5 * logX) * Math.sqrt(-Math.expm1(logX));
        }
        return -logNewton(s -> tCdf(-s, df), s -> -tDensity(s, df), q, -x);
    }

    /**
     * Solves tail(x) = p for x &gt; 0 by Newton steps on ln tail against ln x. Every lower tail used
     * here behaves like a power of x (t in |t|, F and χ² near 0), so ln tail is nearly linear in ln x
     * and the iteration converges from far starts where Newton on the tail itself stalls; each step is
     * damped to a factor e² at most.
     *
     * @param tail       the tail probability, monotone in x and computed from its own side
     * @param derivative d tail/dx
     * @param p          the target probability
     * @param start      a start &gt; 0
     */
    private static double logNewton(DoubleUnaryOperator tail, DoubleUnaryOperator derivative, double p,
            double start) {
        double x = start;
        for (int i = 0; i < 100; i++) {
            double f = tail.applyAsDouble(x);
            double d = derivative.applyAsDouble(x);
            if (!(f > 0) || d == 0 || Double.isNaN(d)) {
                break;
            }
            double step = Math.max(-2, Math.min(2, Math.log(f / p) * f / (x * d)));
            double next = x * Math.exp(-step);
            if (!(next > 0) || Double.isInfinite(next)) {
                break;
            }
            boolean done = Math.abs(next - x) <= 4e-16 * x;
            x = next;
            if (done) {
                break;
            }
        }
        // fail loudly: a quantile is handed on only when its tail probability is the one asked for
        double reached = tail.applyAsDouble(x);
        if (!(reached > 0) || Math.abs(Math.log(reached / p)) > CONVERGED) {
            throw new StatsException("a quantile solver did not converge: the tail at %s is %s, asked %s", x, reached,
                    p);
        }
        return x;
    }

    /** The largest |ln(tail/p)| accepted from {@link #logNewton} (a relative error of 1e-9 in the tail). */
    private static final double CONVERGED = 1e-9;

    /**
     * Upper t quantile t_{1−q,ν} for an upper-tail probability q, without forming 1 − q.
     *
     * @param q  the upper-tail probability, in (0, ½]
     * @param df ν &gt; 0
     * @return t with P(T ≥ t) = q
     */
    public static double tUpperQuantile(double q, double df) {
        checkDf(df, "of t");
        checkOpenProbability(q);
        if (q >= 0.5) {
            return tQuantile(1 - q, df);
        }
        return -tLowerQuantileSmall(q, df);
    }

    /**
     * F lower tail P(F ≤ f) = I_x(ν1/2, ν2/2) with x = ν1·f/(ν1·f + ν2) (Abramowitz &amp; Stegun 26.6.2).
     *
     * @param f   the point, ≥ 0
     * @param df1 numerator df
     * @param df2 denominator df
     * @return P(F ≤ f)
     */
    public static double fCdf(double f, double df1, double df2) {
        checkDf(df1, "of F numerator");
        checkDf(df2, "of F denominator");
        if (f <= 0) {
            return 0;
        }
        if (Double.isInfinite(f)) {
            return 1;
        }
        double x = df1 * f / (df1 * f + df2);
        double y = df2 / (df1 * f + df2);
        return regularizedBeta(x, y, 0.5 * df1, 0.5 * df2);
    }

    /**
     * F upper tail P(F ≥ f) = I_y(ν2/2, ν1/2) with y = ν2/(ν1·f + ν2) formed directly, never 1 − cdf.
     *
     * @param f   the point, ≥ 0
     * @param df1 numerator df
     * @param df2 denominator df
     * @return P(F ≥ f)
     */
    public static double fUpper(double f, double df1, double df2) {
        checkDf(df1, "of F numerator");
        checkDf(df2, "of F denominator");
        if (f <= 0) {
            return 1;
        }
        if (Double.isInfinite(f)) {
            return 0;
        }
        double y = df2 / (df1 * f + df2);
        double x = df1 * f / (df1 * f + df2);
        return regularizedBeta(y, x, 0.5 * df2, 0.5 * df1);
    }

    private static FDistribution f(double df1, double df2) {
        long key = Double.doubleToLongBits(df1) * 31 + Double.doubleToLongBits(df2);
        FDistribution cached = F_CACHE.get(key);
        if (cached != null && cached.getNumeratorDegreesOfFreedom() == df1
                && cached.getDenominatorDegreesOfFreedom() == df2) {
            return cached;
        }
        FDistribution fresh = new FDistribution(null, df1, df2, SOLVER_ACCURACY);
        F_CACHE.put(key, fresh);
        return fresh;
    }

    /**
     * F quantile F_p(ν1, ν2): Commons Math's solver at 1e-14 (below 1e-8 the leading term of the
     * lower tail instead), polished by Newton steps on ln P(F ≤ f) against ln f on the smaller tail
     * (each tail computed directly).
     *
     * @param p   a probability in (0, 1)
     * @param df1 numerator df
     * @param df2 denominator df
     * @return f with P(F ≤ f) = p
     */
    public static double fQuantile(double p, double df1, double df2) {
        checkDf(df1, "of F numerator");
        checkDf(df2, "of F denominator");
        checkOpenProbability(p);
        if (p > 0.5) {
            // the upper quantile of F(ν1, ν2) is the reciprocal of the lower one of F(ν2, ν1)
            return 1 / fQuantile(1 - p, df2, df1);
        }
        double x = p < FAR_TAIL ? Double.NaN : f(df1, df2).inverseCumulativeProbability(p);
        if (!(x > 0) || Double.isInfinite(x)) {
            // far tail (or a solver result of 0): start from I_x(a, b) ≈ x^a/(a·B(a, b)), a = ν1/2, b = ν2/2
            double a = 0.5 * df1;
            double logX = (Math.log(p) + Math.log(a) + Beta.logBeta(a, 0.5 * df2)) / a;
            x = df2 / df1 * Math.exp(logX) / -Math.expm1(logX);
        }
        return logNewton(v -> fCdf(v, df1, df2), v -> fDensity(v, df1, df2), p, x);
    }

    private static double fDensity(double f, double df1, double df2) {
        double logD = 0.5 * df1 * Math.log(df1) + 0.5 * df2 * Math.log(df2) + (0.5 * df1 - 1) * Math.log(f)
                - 0.5 * (df1 + df2) * Math.log(df1 * f + df2) - Beta.logBeta(0.5 * df1, 0.5 * df2);
        return Math.exp(logD);
    }

    /**
     * χ² lower tail P(X ≤ x) = P(ν/2, x/2), the regularized lower incomplete gamma.
     *
     * @param x  the point
     * @param df ν &gt; 0
     * @return P(X ≤ x)
     */
    public static double chiSquaredCdf(double x, double df) {
        checkDf(df, "of chi-square");
        if (x <= 0) {
            return 0;
        }
        return Gamma.regularizedGammaP(0.5 * df, 0.5 * x, 1e-15, MAX_SERIES);
    }

    /**
     * χ² upper tail P(X ≥ x) = Q(ν/2, x/2), the regularized upper incomplete gamma, from its own side.
     *
     * @param x  the point
     * @param df ν &gt; 0
     * @return P(X ≥ x)
     */
    public static double chiSquaredUpper(double x, double df) {
        checkDf(df, "of chi-square");
        if (x <= 0) {
            return 1;
        }
        return Gamma.regularizedGammaQ(0.5 * df, 0.5 * x, 1e-15, MAX_SERIES);
    }

    /**
     * χ² quantile χ²_{p,ν}, Commons Math's solver at 1e-14 (below 1e-8 the leading term of the lower
     * tail instead) polished by Newton steps on the smaller tail (in ln x for the lower one).
     *
     * @param p  a probability in (0, 1)
     * @param df ν &gt; 0
     * @return x with P(X ≤ x) = p
     */
    public static double chiSquaredQuantile(double p, double df) {
        checkDf(df, "of chi-square");
        checkOpenProbability(p);
        double x = p < FAR_TAIL ? Double.NaN
                : CHI2_CACHE.computeIfAbsent(df, d -> new ChiSquaredDistribution(null, d, SOLVER_ACCURACY))
                        .inverseCumulativeProbability(p);
        if (p <= 0.5) {
            if (!(x > 0) || Double.isInfinite(x)) {
                // far tail, or the solver's 0 (p = 1e-10 at ν = 1): start from the small-x limit
                // P(ν/2, x/2) ≈ (x/2)^(ν/2)/Γ(ν/2 + 1) (Abramowitz & Stegun 6.5.29, first term)
                x = 2 * Math.exp((Math.log(p) + Gamma.logGamma(0.5 * df + 1)) / (0.5 * df));
            }
            return logNewton(v -> chiSquaredCdf(v, df), v -> chiSquaredDensity(v, df), p, x);
        }
        for (int i = 0; i < 6 && x > 0; i++) {
            double diff = (1 - p) - chiSquaredUpper(x, df);
            double dens = chiSquaredDensity(x, df);
            if (!(dens > 0)) {
                break;
            }
            double next = x - diff / dens;
            if (next <= 0) {
                next = x / 2;
            }
            if (Math.abs(next - x) <= 2e-16 * x) {
                x = next;
                break;
            }
            x = next;
        }
        return x;
    }

    /**
     * Quantile of the standard gamma distribution (shape a, rate 1): the Wilson–Hilferty start (Johnson, Kotz
     * &amp; Balakrishnan 1994, eq. 17.xx form of the cube-root normal approximation; the small-x limit
     * (p·Γ(a + 1))^(1/a) when that start is not positive), then Newton steps in ln x on the smaller tail, each
     * tail the regularized incomplete gamma from its own side. No solver instance is built, so the many
     * fractional shapes of a bootstrap cost no cache.
     *
     * @param p a probability in (0, 1)
     * @param a the shape &gt; 0
     * @return x with P(a, x) = p
     */
    public static double gammaQuantile(double p, double a) {
        checkOpenProbability(p);
        if (!(a > 0) || Double.isInfinite(a)) {
            throw new StatsException("the gamma shape must be a positive number, got %s", a);
        }
        double z = p <= 0.5 ? Normal.quantile(p) : -Normal.quantile(1 - p);
        double c = 1 / (9 * a);
        double start = a * Math.pow(1 - c + z * Math.sqrt(c), 3);
        if (!(start > 0) || p < 1e-3 && a < 1) {
            start = Math.exp((Math.log(p) + Gamma.logGamma(a + 1)) / a);
        }
        DoubleUnaryOperator density = x -> Math.exp((a - 1) * Math.log(x) - x - Gamma.logGamma(a));
        if (p <= 0.5) {
            return logNewton(x -> Gamma.regularizedGammaP(a, x, 1e-15, MAX_SERIES), density, p, start);
        }
        return logNewton(x -> Gamma.regularizedGammaQ(a, x, 1e-15, MAX_SERIES), x -> -density.applyAsDouble(x),
                1 - p, start);
    }

    private static double chiSquaredDensity(double x, double df) {
        return Math.exp((0.5 * df - 1) * Math.log(x) - 0.5 * x - 0.5 * df * Math.log(2) - Gamma.logGamma(0.5 * df));
    }

    private static void checkOpenProbability(double p) {
        if (!(p > 0 && p < 1)) {
            throw new StatsException("probability must lie strictly between 0 and 1, got %s", p);
        }
    }
}
