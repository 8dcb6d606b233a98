package org.holdpoint.stats;

import org.apache.commons.math3.special.Gamma;

/**
 * Maximum-likelihood fits of the families of {@link DistributionFamily}, each solved from its own likelihood
 * equations to full double precision (docs/methods.md §14): closed forms for the normal, lognormal and
 * Rayleigh families; Newton steps kept inside a sign-change bracket for the Weibull profile equation
 * (Cohen 1965) and the gamma equation ln α − ψ(α) = ln x̄ − mean(ln x) (Choi &amp; Wette 1969). A root that is not
 * reached is an error, never a parameter.
 */
public final class DistributionFits {
    private static final int MAX_STEPS = 200;

    private DistributionFits() {
    }

    /**
     * Fits a family by maximum likelihood.
     *
     * @param family the family
     * @param x      the values (at least 2, not all equal)
     * @return the fit
     * @throws StatsException when the family cannot be fitted to these values, with the reason
     */
    public static FittedDistribution fit(DistributionFamily family, double[] x) {
        return fit(family, x, Double.NaN);
    }

    /**
     * Fits a family, starting a one-dimensional solver from a known shape (the bootstrap refits near it); such a
     * refit carries no log-likelihood (NaN).
     *
     * @param family     the family
     * @param x          the values
     * @param shapeStart a start for the Weibull or gamma shape, or NaN
     * @return the fit
     */
    static FittedDistribution fit(DistributionFamily family, double[] x, double shapeStart) {
        if (x.length < 2) {
            throw new StatsException("a distribution fit needs at least 2 values, got %d", x.length);
        }
        String refusal = family.refusal(x);
        if (refusal != null) {
            throw new StatsException("the %s family %s", family.key(), refusal);
        }
        double min = Double.POSITIVE_INFINITY;
        double max = Double.NEGATIVE_INFINITY;
        for (double v : x) {
            if (!Double.isFinite(v)) {
                throw new StatsException("a distribution fit needs finite values");
            }
            min = Math.min(min, v);
            max = Math.max(max, v);
        }
        if (min == max && family != DistributionFamily.RAYLEIGH) {
            throw new StatsException("all %d values are equal; no %s distribution can be fitted", x.length,
                    family.key());
        }
        int n = x.length;
        double a;
        double b;
        switch (family) {
            case NORMAL -> {
                a = mean(x);
                b = mlSd(x, a);
            }
            case LOGNORMAL -> {
                double[] l = new double[n];
                for (int i = 0; i < n; i++) {
                    l[i] = Math.log(x[i]);
                }
                a = mean(l);
                b = mlSd(l, a);
            }
            case WEIBULL -> {
                a = weibullShape(x, max, shapeStart);
                CompensatedSum s0 = new CompensatedSum();
                for (double v : x) {
                    s0.add(Math.pow(v / max, a));
                }
                b = max * Math.pow(s0.value() / n, 1 / a);
            }
            case GAMMA -> {
                double mean = mean(x);
                CompensatedSum s = new CompensatedSum();
                for (double v : x) {
                    s.add(-Math.log(v / mean));
                }
                a = gammaShape(s.value() / n, shapeStart);
                b = a / mean;
            }
            case RAYLEIGH -> {
                CompensatedSum s = new CompensatedSum();
                for (double v : x) {
                    s.add(v * v);
                }
                a = Math.sqrt(s.value() / (2.0 * n));
                b = Double.NaN;
            }
            default -> throw new IllegalStateException("unknown family " + family);
        }
        if (!Double.isNaN(shapeStart)) {
            // a bootstrap refit: only its quantiles are used, so its log-likelihood (a logarithm per value, for the
            // gamma also a log-gamma per value) is not summed
            return new FittedDistribution(family, a, b, n, Double.NaN);
        }
        CompensatedSum ll = new CompensatedSum();
        for (double v : x) {
            ll.add(FittedDistribution.logDensity(family, a, b, v));
        }
        return new FittedDistribution(family, a, b, n, ll.value());
    }

    /**
     * The Weibull shape: the root of g(k) = Σ y^k ln y / Σ y^k − 1/k − mean(ln y), y = x/max (the profile
     * likelihood equation; scaling by the largest value keeps every power in [0, 1]). g rises from −∞ to
     * −mean(ln y) &gt; 0, so the root is unique.
     */
    private static double weibullShape(double[] x, double max, double start) {
        int n = x.length;
        double[] ly = new double[n];
        for (int i = 0; i < n; i++) {
            ly[i] = Math.log(x[i] / max);
        }
        double meanLy = mean(ly);
        double k;
        if (start > 0 && Double.isFinite(start)) {
            k = start;
        } else {
            // start from the moments of ln x: sd(ln x) = π/(k√6) for a Weibull variable
            CompensatedSum ss = new CompensatedSum();
            for (double v : ly) {
                ss.add((v - meanLy) * (v - meanLy));
            }
            double sdl = Math.sqrt(ss.value() / Math.max(1, n - 1));
            k = sdl > 0 ? Math.PI / (sdl * Math.sqrt(6)) : 1;
        }
        double lo = 0;
        double hi = Double.POSITIVE_INFINITY;
        for (int step = 0; step < MAX_STEPS; step++) {
            CompensatedSum a0 = new CompensatedSum();
            CompensatedSum a1 = new CompensatedSum();
            CompensatedSum a2 = new CompensatedSum();
            for (double l : ly) {
                double w = Math.exp(k * l);
                a0.add(w);
                a1.add(w * l);
                a2.add(w * l * l);
            }
            double s0 = a0.value();
            double r1 = a1.value() / s0;
            double g = r1 - 1 / k - meanLy;
            if (g < 0) {
                lo = k;
            } else if (g > 0) {
                hi = k;
            } else {
                return k;
            }
            double dg = a2.value() / s0 - r1 * r1 + 1 / (k * k);
            double next = k - g / dg;
            if (!(next > lo && next < hi)) {
                next = Double.isInfinite(hi) ? 2 * k : 0.5 * (lo + hi);
            }
            if (Math.abs(next - k) <= 1e-15 * k || Double.isFinite(hi) && hi - lo <= 4e-16 * hi) {
                return next;
            }
            k = next;
        }
        throw new StatsException("the Weibull shape did not converge in %d steps (bracket %s to %s)", MAX_STEPS,
                lo, hi);
    }

    /**
     * The gamma shape: the root of ln α − ψ(α) = s (s = ln x̄ − mean ln x &gt; 0), in u = ln α; the left side
     * falls from +∞ to 0, so the root is unique.
     */
    private static double gammaShape(double s, double start) {
        if (!(s > 0)) {
            throw new StatsException("the values are too close together for a gamma fit (ln of the mean minus the "
                    + "mean of ln is %s)", s);
        }
        // Choi & Wette's start (Minka 2002, eq. 9 form)
        double alpha = start > 0 && Double.isFinite(start) ? start
                : (3 - s + Math.sqrt((s - 3) * (s - 3) + 24 * s)) / (12 * s);
        double lo = Double.NEGATIVE_INFINITY;
        double hi = Double.POSITIVE_INFINITY;
        double u = Math.log(alpha);
        for (int step = 0; step < MAX_STEPS; step++) {
            double a = Math.exp(u);
            double f = logMinusDigamma(a) - s;
            if (f > 0) {
                lo = u;
            } else if (f < 0) {
                hi = u;
            } else {
                return a;
            }
            // the derivative only steers the step: Commons Math's trigamma is accurate enough for that
            double df = 1 - a * Gamma.trigamma(a);
            double next = u - f / df;
            if (!(next > lo && next < hi)) {
                next = Double.isInfinite(lo) ? (Double.isInfinite(hi) ? u : hi - 1)
                        : Double.isInfinite(hi) ? lo + 1 : 0.5 * (lo + hi);
            }
            if (Math.abs(next - u) <= 1e-15 * Math.max(1, Math.abs(u))) {
                return Math.exp(next);
            }
            u = next;
        }
        throw new StatsException("the gamma shape did not converge in %d steps", MAX_STEPS);
    }

    /**
     * ln α − ψ(α): for α ≥ 20 by its asymptotic series 1/(2α) + Σ B₂ⱼ/(2j α^{2j}) (Abramowitz &amp; Stegun 1964,
     * 6.3.18), which avoids the cancellation of two nearly equal logarithms; below 20 by the recurrence
     * ψ(α) = ψ(α + m) − Σ 1/(α + j) (A&amp;S 6.3.5) up to α + m ≥ 20. (Commons Math's digamma is good to about
     * 1e-7 relative here, too coarse for the gamma shape.)
     */
    static double logMinusDigamma(double a) {
        if (a >= 20) {
            return series(a);
        }
        int m = (int) Math.ceil(20 - a);
        double shifted = a + m;
        CompensatedSum s = new CompensatedSum();
        s.add(Math.log(a / shifted));
        s.add(series(shifted));
        for (int j = 0; j < m; j++) {
            s.add(1 / (a + j));
        }
        return s.value();
    }

    /** ln x − ψ(x) for x ≥ 20 by A&amp;S 6.3.18 (the next term is below 1e-17 of the value). */
    private static double series(double x) {
        double r = 1 / (x * x);
        return 1 / (2 * x) + r * (1.0 / 12 - r * (1.0 / 120 - r * (1.0 / 252 - r * (1.0 / 240 - r * (1.0 / 132
                - r * 691.0 / 32760)))));
    }

    /** The maximum-likelihood sd (divisor n) about a given mean. */
    private static double mlSd(double[] x, double mean) {
        CompensatedSum ss = new CompensatedSum();
        for (double v : x) {
            ss.add((v - mean) * (v - mean));
        }
        return Math.sqrt(ss.value() / x.length);
    }

    private static double mean(double[] x) {
        CompensatedSum s = new CompensatedSum();
        for (double v : x) {
            s.add(v);
        }
        double m = s.value() / x.length;
        // one correction pass: the mean of the residuals
        CompensatedSum r = new CompensatedSum();
        for (double v : x) {
            r.add(v - m);
        }
        return m + r.value() / x.length;
    }
}
