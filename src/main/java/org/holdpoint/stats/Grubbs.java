package org.holdpoint.stats;

/**
 * Grubbs' test for a single outlier in a normal sample (Grubbs 1950, Ann. Math. Stat. 21:27–58; Grubbs 1969,
 * Technometrics 11:1–21; NIST/SEMATECH e-Handbook §1.3.5.17.1).
 *
 * <p>G = max|x_i − x̄|/s (two-sided), G⁺ = (x_(n) − x̄)/s or G⁻ = (x̄ − x_(1))/s. Critical value
 * G_crit = ((n−1)/√n)·√(t²/(n−2+t²)) with t = t_{1−α/(2n),n−2} two-sided and t_{1−α/n,n−2} one-sided. p-value:
 * t² = n(n−2)G²/((n−1)² − nG²), p = min(1, 2n·F_t(−t; n−2)) two-sided or min(1, n·F_t(−t; n−2)) one-sided, a
 * Bonferroni bound that is exact in the small-p range. Ties of the extreme go to the first in input order.
 */
public final class Grubbs {
    private static final Grubbs DEFAULTS = new Grubbs(OutlierSide.TWO_SIDED, 0.05);

    private final OutlierSide side;
    private final double alpha;

    private Grubbs(OutlierSide side, double alpha) {
        this.side = side;
        this.alpha = alpha;
    }

    /**
     * The defaults: two-sided, α = 0.05.
     *
     * @return the default test
     */
    public static Grubbs withDefaults() {
        return DEFAULTS;
    }

    /**
     * @param newSide the side tested
     * @return a test of that side
     */
    public Grubbs with(OutlierSide newSide) {
        if (newSide == null) {
            throw new StatsException("an outlier side is required");
        }
        return new Grubbs(newSide, alpha);
    }

    /**
     * @param newAlpha α in (0, 1)
     * @return a test at that level
     */
    public Grubbs withAlpha(double newAlpha) {
        return new Grubbs(side, Alpha.check(newAlpha));
    }

    /**
     * Runs the test; the sample is not modified or reordered.
     *
     * @param sample at least 3 values, not all equal
     * @return the result
     * @throws StatsException if n &lt; 3 or all values are equal
     */
    public GrubbsResult test(Sample sample) {
        int n = sample.size();
        if (n < 3) {
            throw new StatsException("Grubbs' test needs at least 3 values, got %d", n);
        }
        double sd = Descriptives.of(sample).sd();
        if (!(sd > 0)) {
            throw new StatsException("all %d values are equal, so Grubbs' statistic is undefined", n);
        }
        double[] dev = Deviations.of(sample);
        int best = 0;
        double bestScore = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < n; i++) {
            double score = switch (side) {
                case TWO_SIDED -> Math.abs(dev[i]);
                case MAXIMUM -> dev[i];
                case MINIMUM -> -dev[i];
            };
            if (score > bestScore) {
                bestScore = score;
                best = i;
            }
        }
        double g = Math.max(0, bestScore / sd);
        double critical = critical(n, alpha, side);
        double p = pValue(n, g, side == OutlierSide.TWO_SIDED);
        return new GrubbsResult(n, side, g, best, sample.value(best), critical, p, alpha, g > critical);
    }

    /**
     * G_crit = ((n−1)/√n)·√(t²/(n−2+t²)), t = t_{1−α/(2n),n−2} (two-sided) or t_{1−α/n,n−2}.
     *
     * @param n     sample size ≥ 3
     * @param alpha level in (0, 1)
     * @param side  two-sided, or one of the one-sided forms
     * @return the critical value
     */
    public static double critical(int n, double alpha, OutlierSide side) {
        if (n < 3) {
            throw new StatsException("Grubbs' test needs at least 3 values, got %d", n);
        }
        Alpha.check(alpha);
        double q = side == OutlierSide.TWO_SIDED ? alpha / (2.0 * n) : alpha / n;
        double t = Distributions.tUpperQuantile(q, n - 2.0);
        double t2 = t * t;
        return (n - 1) / Math.sqrt(n) * Math.sqrt(t2 / (n - 2 + t2));
    }

    /** The Bonferroni p-value of G; 0 at the bound G = (n − 1)/√n, where t is infinite. */
    static double pValue(int n, double g, boolean twoSided) {
        double denom = (double) (n - 1) * (n - 1) - n * g * g;
        if (!(denom > 0)) {
            return 0;
        }
        double t = Math.sqrt(n * (n - 2.0) * g * g / denom);
        return Math.min(1, (twoSided ? 2.0 * n : n) * Distributions.tCdf(-t, n - 2.0));
    }
}
