package org.holdpoint.stats;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.math3.special.Gamma;

/**
 * Process capability against specification limits (Kane 1986, J. Qual. Technol. 18:41–52; Bissell 1990, Appl.
 * Statist. 39:331–340; Chou, Owen &amp; Borrego 1990, J. Qual. Technol. 22:223–229; Kotz &amp; Johnson 1993;
 * ISO 22514-2).
 *
 * <p>Overall indices use the overall s (n − 1, not bias-corrected): Pp = (USL − LSL)/(6s), Ppu = (USL − x̄)/(3s),
 * Ppl = (x̄ − LSL)/(3s), Ppk = min. Lower (1 − α) bounds: Pp·√(χ²_{α,n−1}/(n−1)) and Bissell's
 * Ppk − z_{1−α}√(1/(9n) + Ppk²/(2(n−1))). Within indices Cp, Cpk use σ_w from the chosen
 * {@link WithinEstimator}. Expected fractions out of specification are lower normal tails times 10⁶.
 */
public final class Capability {
    private static final Capability DEFAULTS = new Capability(null, null, 0.05, WithinEstimator.POOLED_SD);

    private final Double lsl;
    private final Double usl;
    private final double alpha;
    private final WithinEstimator estimator;

    private Capability(Double lsl, Double usl, double alpha, WithinEstimator estimator) {
        this.lsl = lsl;
        this.usl = usl;
        this.alpha = alpha;
        this.estimator = estimator;
    }

    /**
     * The defaults: no limits yet (at least one must be set), α = 0.05 (95 % lower bounds), pooled within sd.
     *
     * @return the default calculation
     */
    public static Capability withDefaults() {
        return DEFAULTS;
    }

    /**
     * @param lower LSL, or null
     * @param upper USL, or null; LSL &lt; USL when both are given
     * @return a calculation against those limits
     */
    public Capability withLimits(Double lower, Double upper) {
        if (lower == null && upper == null) {
            throw new StatsException("capability needs LSL, USL or both");
        }
        if ((lower != null && !Double.isFinite(lower)) || (upper != null && !Double.isFinite(upper))) {
            throw new StatsException("specification limits must be finite, got LSL = %s, USL = %s", lower, upper);
        }
        if (lower != null && upper != null && !(lower < upper)) {
            throw new StatsException("LSL must be below USL, got LSL = %s, USL = %s", lower, upper);
        }
        return new Capability(lower, upper, alpha, estimator);
    }

    /**
     * @param newAlpha α in (0, 0.5) for the (1 − α) lower bounds
     * @return a calculation at that level
     */
    public Capability withAlpha(double newAlpha) {
        return new Capability(lsl, usl, Alpha.checkBelowHalf(newAlpha), estimator);
    }

    /**
     * @param newEstimator the within-subgroup sd estimator
     * @return a calculation with that estimator
     */
    public Capability with(WithinEstimator newEstimator) {
        if (newEstimator == null) {
            throw new StatsException("a within-subgroup estimator is required");
        }
        return new Capability(lsl, usl, alpha, newEstimator);
    }

    /**
     * Overall indices only (and, with {@link WithinEstimator#MOVING_RANGE}, the within indices from run order).
     *
     * @param sample the group's values in run order
     * @return the result
     */
    public CapabilityResult compute(Sample sample) {
        return compute(sample, null);
    }

    /**
     * Overall and within-subgroup indices.
     *
     * @param sample    the group's values in run order
     * @param subgroups one subgroup label per value (same order), or null
     * @return the result
     * @throws StatsException if no limit was set, n &lt; 2, or the labels do not match the values
     */
    public CapabilityResult compute(Sample sample, int[] subgroups) {
        if (lsl == null && usl == null) {
            throw new StatsException("capability needs LSL, USL or both; none was set");
        }
        int n = sample.size();
        if (n < 2) {
            throw new StatsException("capability needs at least 2 values, got %d", n);
        }
        if (subgroups != null && subgroups.length != n) {
            throw new StatsException("%d subgroup labels for %d values", subgroups.length, n);
        }
        Descriptives d = Descriptives.of(sample);
        List<String> notes = new ArrayList<>();
        Indices overall = indices(d.mean(), d.sd(), n - 1.0, n, notes, "overall");
        Double ppLower = overall.p == null ? null : overall.p * Math.sqrt(chi2Ratio(n - 1.0));
        Double ppmBelow = lsl == null || !(d.sd() > 0) ? null : 1e6 * Normal.cdf((lsl - d.mean()) / d.sd());
        Double ppmAbove = usl == null || !(d.sd() > 0) ? null : 1e6 * Normal.cdf((d.mean() - usl) / d.sd());
        Within w = within(sample, subgroups, notes);
        Indices within = null;
        Double cpLower = null;
        if (w != null) {
            within = indices(d.mean(), w.sigma, w.df, n, notes, "within");
            if (within.p != null && w.uncorrected != null) {
                cpLower = width() / (6 * w.uncorrected) * Math.sqrt(chi2Ratio(w.df));
            }
            if (w.uncorrected == null) {
                within = new Indices(within.p, within.u, within.l, within.k, null);
                notes.add("no lower bounds for Cp and Cpk with the moving-range estimator");
            }
        }
        return new CapabilityResult(n, d.mean(), d.sd(), lsl, usl, alpha, overall.p, overall.u, overall.l, overall.k,
                ppLower, overall.kLower, ppmBelow, ppmAbove, w == null ? null : estimator,
                w == null ? null : w.sigma, w == null || w.uncorrected == null ? null : (int) w.df,
                within == null ? null : within.p, within == null ? null : within.u, within == null ? null : within.l,
                within == null ? null : within.k, cpLower, within == null ? null : within.kLower, notes);
    }

    private Double width() {
        return lsl == null || usl == null ? null : usl - lsl;
    }

    private double chi2Ratio(double df) {
        return Distributions.chiSquaredQuantile(alpha, df) / df;
    }

    private record Indices(Double p, Double u, Double l, Double k, Double kLower) {
    }

    private Indices indices(double mean, double sigma, double df, int n, List<String> notes, String which) {
        if (!(sigma > 0)) {
            notes.add("the " + which + " sd is zero, so the " + which + " capability indices are undefined");
            return new Indices(null, null, null, null, null);
        }
        Double p = lsl != null && usl != null ? (usl - lsl) / (6 * sigma) : null;
        Double u = usl == null ? null : (usl - mean) / (3 * sigma);
        Double l = lsl == null ? null : (mean - lsl) / (3 * sigma);
        double k = u == null ? l : l == null ? u : Math.min(u, l);
        return new Indices(p, u, l, k, bissellLowerBound(k, n, df, alpha));
    }

    /**
     * Bissell's (1990) approximate lower (1 − α) bound k − z_{1−α}√(1/(9n) + k²/(2ν)), ν = n − 1 for Ppk, d for Cpk.
     *
     * @param index the point estimate (Ppk, Ppu, Ppl or Cpk)
     * @param n     the number of values
     * @param df    ν
     * @param alpha α in (0, 0.5)
     * @return the bound
     */
    public static double bissellLowerBound(double index, long n, double df, double alpha) {
        return index - Normal.upperQuantile(alpha) * Math.sqrt(1.0 / (9.0 * n) + index * index / (2 * df));
    }

    private record Within(double sigma, double df, Double uncorrected) {
    }

    private Within within(Sample sample, int[] subgroups, List<String> notes) {
        if (estimator == WithinEstimator.MOVING_RANGE) {
            double[] x = sample.values();
            double sum = 0;
            for (int i = 1; i < x.length; i++) {
                sum += Math.abs(x[i] - x[i - 1]);
            }
            return new Within(sum / (x.length - 1) / d2(2), x.length - 1.0, null);
        }
        if (subgroups == null) {
            notes.add("no subgroups given, so Cp and Cpk (within-subgroup indices) are not computed");
            return null;
        }
        Map<Integer, List<Double>> groups = new LinkedHashMap<>();
        for (int i = 0; i < subgroups.length; i++) {
            groups.computeIfAbsent(subgroups[i], g -> new ArrayList<>()).add(sample.value(i));
        }
        double ss = 0;
        long df = 0;
        for (List<Double> g : groups.values()) {
            if (g.size() > 1) {
                double[] v = g.stream().mapToDouble(Double::doubleValue).toArray();
                double[] dev = Deviations.of(Sample.of(v));
                for (double e : dev) {
                    ss += e * e;
                }
                df += v.length - 1;
            }
        }
        if (df == 0) {
            notes.add("every subgroup has a single value, so the within-subgroup sd is undefined");
            return null;
        }
        double sp = Math.sqrt(ss / df);
        return new Within(sp / c4(df + 1), df, sp);
    }

    /**
     * c4(k) = √(2/(k−1))·Γ(k/2)/Γ((k−1)/2), the mean of s/σ for k normal values, via log-gamma.
     *
     * @param k ≥ 2
     * @return c4(k)
     */
    public static double c4(long k) {
        if (k < 2) {
            throw new StatsException("c4 needs k >= 2, got %d", k);
        }
        return Math.sqrt(2.0 / (k - 1)) * Math.exp(Gamma.logGamma(k / 2.0) - Gamma.logGamma((k - 1) / 2.0));
    }

    /**
     * d2(k) = ∫[1 − Φ(x)^k − (1 − Φ(x))^k]dx over the real line, the mean range of k standard normal values, by
     * adaptive Gauss–Kronrod integration of the symmetric integrand on [0, 16] to a relative 1e-13 (failing
     * loudly when that is not reached); each k is computed once and kept.
     *
     * @param k ≥ 2
     * @return d2(k)
     */
    public static double d2(int k) {
        if (k < 2) {
            throw new StatsException("d2 needs k >= 2, got %d", k);
        }
        return D2.computeIfAbsent(k, n -> 2 * Quadrature.integrate(x -> d2Integrand(x, n),
                new double[] {0, 1, 2, 3, 4, 6, 8, 16}, 1e-13));
    }

    private static final java.util.concurrent.ConcurrentHashMap<Integer, Double> D2 =
            new java.util.concurrent.ConcurrentHashMap<>();

    /** 1 − Φ(x)^k − Φ(−x)^k with 1 − Φ(x)^k = −expm1(k·log1p(−Φ(−x))), accurate in both tails. */
    private static double d2Integrand(double x, int k) {
        double upper = Normal.cdf(-x);
        return -Math.expm1(k * Math.log1p(-upper)) - Math.pow(upper, k);
    }
}
