package org.holdpoint.stats;

import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.Map;
import org.apache.commons.math3.special.Gamma;

/**
 * A distribution of one family with its maximum-likelihood parameters (docs/methods.md §14): quantiles, both
 * tails each from its own side, the log-likelihood, AIC and the Anderson–Darling statistic of the fit.
 *
 * @param family        the family
 * @param first         the first parameter in R's order (mean, meanlog, shape, shape, sigma)
 * @param second        the second parameter (sd, sdlog, scale, rate), NaN for one-parameter families
 * @param n             the number of values fitted
 * @param logLikelihood the maximised log-likelihood
 */
public record FittedDistribution(DistributionFamily family, double first, double second, int n,
        double logLikelihood) {

    /** @return the parameters by R's names, in R's order */
    public Map<String, Double> parameters() {
        Map<String, Double> m = new LinkedHashMap<>();
        m.put(family.parameterNames().get(0), first);
        if (family.parameterCount() > 1) {
            m.put(family.parameterNames().get(1), second);
        }
        return m;
    }

    /** @return Akaike's information criterion, 2k − 2 ln L (Akaike 1974) */
    public double aic() {
        return 2.0 * family.parameterCount() - 2 * logLikelihood;
    }

    /**
     * The p-quantile of the fitted distribution.
     *
     * @param p a probability in (0, 1)
     * @return x with F(x) = p
     */
    public double quantile(double p) {
        if (!(p > 0 && p < 1)) {
            throw new StatsException("probability must lie strictly between 0 and 1, got %s", p);
        }
        return switch (family) {
            case NORMAL -> first + second * Normal.quantile(p);
            case LOGNORMAL -> Math.exp(first + second * Normal.quantile(p));
            case WEIBULL -> second * Math.pow(-Math.log1p(-p), 1 / first);
            case GAMMA -> Distributions.gammaQuantile(p, first) / second;
            case RAYLEIGH -> first * Math.sqrt(-2 * Math.log1p(-p));
        };
    }

    /**
     * @param x a value
     * @return P(X &lt; x), from the lower side
     */
    public double lowerTail(double x) {
        return switch (family) {
            case NORMAL -> Normal.cdf((x - first) / second);
            case LOGNORMAL -> x <= 0 ? 0 : Normal.cdf((Math.log(x) - first) / second);
            case WEIBULL -> x <= 0 ? 0 : -Math.expm1(-Math.pow(x / second, first));
            case GAMMA -> x <= 0 ? 0 : Distributions.chiSquaredCdf(2 * second * x, 2 * first);
            case RAYLEIGH -> x <= 0 ? 0 : -Math.expm1(-x * x / (2 * first * first));
        };
    }

    /**
     * @param x a value
     * @return P(X &gt; x), from the upper side (never 1 − the lower tail)
     */
    public double upperTail(double x) {
        return switch (family) {
            case NORMAL -> Normal.cdf((first - x) / second);
            case LOGNORMAL -> x <= 0 ? 1 : Normal.cdf((first - Math.log(x)) / second);
            case WEIBULL -> x <= 0 ? 1 : Math.exp(-Math.pow(x / second, first));
            case GAMMA -> x <= 0 ? 1 : Distributions.chiSquaredUpper(2 * second * x, 2 * first);
            case RAYLEIGH -> x <= 0 ? 1 : Math.exp(-x * x / (2 * first * first));
        };
    }

    /**
     * The values mapped to the normal scale through this fit, z = Φ⁻¹(F(x)), each from its nearer tail so that a far
     * value keeps its distance (the scale on which the outlier tests run, docs/methods.md §14).
     *
     * @param x the values
     * @return their normal scores, in the same order
     */
    public Sample normalScores(Sample x) {
        double[] z = new double[x.size()];
        for (int i = 0; i < z.length; i++) {
            double lo = lowerTail(x.value(i));
            double up = upperTail(x.value(i));
            z[i] = lo <= up ? Normal.quantile(Math.max(lo, Double.MIN_NORMAL))
                    : -Normal.quantile(Math.max(up, Double.MIN_NORMAL));
        }
        return Sample.of(z);
    }

    /**
     * @param x a value
     * @return ln f(x), −∞ outside the support
     */
    public double logDensity(double x) {
        return logDensity(family, first, second, x);
    }

    static double logDensity(DistributionFamily family, double a, double b, double x) {
        final double halfLog2Pi = 0.5 * Math.log(2 * Math.PI);
        switch (family) {
            case NORMAL: {
                double z = (x - a) / b;
                return -Math.log(b) - halfLog2Pi - 0.5 * z * z;
            }
            case LOGNORMAL: {
                if (x <= 0) {
                    return Double.NEGATIVE_INFINITY;
                }
                double z = (Math.log(x) - a) / b;
                return -Math.log(x) - Math.log(b) - halfLog2Pi - 0.5 * z * z;
            }
            case WEIBULL: {
                if (x <= 0) {
                    return Double.NEGATIVE_INFINITY;
                }
                double lr = Math.log(x / b);
                return Math.log(a / b) + (a - 1) * lr - Math.exp(a * lr);
            }
            case GAMMA:
                return x <= 0 ? Double.NEGATIVE_INFINITY
                        : a * Math.log(b) + (a - 1) * Math.log(x) - b * x - Gamma.logGamma(a);
            case RAYLEIGH:
                return x < 0 ? Double.NEGATIVE_INFINITY
                        : Math.log(x) - 2 * Math.log(a) - x * x / (2 * a * a);
            default:
                throw new IllegalStateException("unknown family " + family);
        }
    }

    /**
     * The Anderson–Darling statistic of these values against this fitted distribution (Anderson &amp; Darling
     * 1954; each tail's logarithm from its own side), used to compare fits, not as a test: with estimated
     * parameters its null distribution depends on the family.
     *
     * @param values the values that were fitted
     * @return A², +∞ when a value lies where the fit gives it no probability
     */
    public double andersonDarling(double[] values) {
        double[] x = values.clone();
        Arrays.sort(x);
        int m = x.length;
        double sum = 0;
        for (int i = 0; i < m; i++) {
            double lo = lowerTail(x[i]);
            double up = upperTail(x[m - 1 - i]);
            if (!(lo > 0) || !(up > 0)) {
                return Double.POSITIVE_INFINITY;
            }
            sum += (2.0 * i + 1) * (Math.log(lo) + Math.log(up));
        }
        return -m - sum / m;
    }
}
