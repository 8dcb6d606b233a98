package org.holdpoint.stats;

import java.util.ArrayList;
import java.util.List;

/**
 * Rosner's generalized extreme studentized deviate (ESD) test for up to r outliers (Rosner 1983, "Percentage
 * points for a generalized ESD many-outlier procedure", Technometrics 25:165–172; NIST/SEMATECH e-Handbook
 * §1.3.5.17.3).
 *
 * <p>For i = 1..r: R_i = max|x − x̄|/s over the n − i + 1 values left (x̄ and s recomputed by two-pass), then the
 * maximising value is set aside (ties by input order). λ_i = (n − i)·t_{p,n−i−1}/√((n − i − 1 + t²)(n − i + 1)),
 * p = 1 − α/(2(n − i + 1)). The number of outliers is the largest i with R_i &gt; λ_i, which handles masking. The
 * default r = ⌈n/10⌉ capped at n − 2 is common practice, no source.
 */
public final class GeneralizedEsd {
    private static final GeneralizedEsd DEFAULTS = new GeneralizedEsd(0, 0.05);

    private final int maxOutliers;
    private final double alpha;

    private GeneralizedEsd(int maxOutliers, double alpha) {
        this.maxOutliers = maxOutliers;
        this.alpha = alpha;
    }

    /**
     * The defaults: α = 0.05 and r = ⌈n/10⌉ capped at n − 2 (common practice, no source).
     *
     * @return the default procedure
     */
    public static GeneralizedEsd withDefaults() {
        return DEFAULTS;
    }

    /**
     * @param r the largest number of outliers to test for, ≥ 1 (capped at n − 2 when run)
     * @return a procedure with that r
     */
    public GeneralizedEsd withMaxOutliers(int r) {
        if (r < 1) {
            throw new StatsException("the number of outliers to test for must be at least 1, got %d", r);
        }
        return new GeneralizedEsd(r, alpha);
    }

    /**
     * @param newAlpha α in (0, 1)
     * @return a procedure at that level
     */
    public GeneralizedEsd withAlpha(double newAlpha) {
        return new GeneralizedEsd(maxOutliers, Alpha.check(newAlpha));
    }

    /**
     * Runs the procedure; the sample is neither reordered nor modified.
     *
     * @param sample at least 3 values
     * @return the steps and the outlier count
     * @throws StatsException if n &lt; 3
     */
    public EsdResult test(Sample sample) {
        int n = sample.size();
        if (n < 3) {
            throw new StatsException("the generalized ESD test needs at least 3 values, got %d", n);
        }
        int r = maxOutliers == 0 ? (n + 9) / 10 : maxOutliers;
        r = Math.min(r, n - 2);
        double[] x = Deviations.of(sample);
        boolean[] gone = new boolean[n];
        List<EsdResult.Step> steps = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        int count = 0;
        double sum = 0;
        for (int j = 0; j < n; j++) {
            sum += x[j];
        }
        for (int i = 1; i <= r; i++) {
            int left = n - i + 1;
            double mean = meanFrom(sum, x, gone, left);
            // one pass: the sums of squares, the most extreme value, and the sum the next step starts from (every
            // value left but the most extreme, added in the same order as a pass of its own would add them: when a
            // value becomes the most extreme, the sum so far without it is the sum of all before it)
            double ss = 0;
            double sd = 0;
            int best = -1;
            double bestDev = -1;
            double withAll = 0;
            double withoutBest = 0;
            for (int j = 0; j < n; j++) {
                if (!gone[j]) {
                    double d = x[j] - mean;
                    ss += d * d;
                    sd += d;
                    double dev = Math.abs(d);
                    if (dev > bestDev) {
                        bestDev = dev;
                        best = j;
                        withoutBest = withAll;
                    } else {
                        withoutBest += x[j];
                    }
                    withAll += x[j];
                }
            }
            double s = Math.sqrt(Math.max(0, ss - sd * sd / left) / (left - 1));
            if (!(s > 0)) {
                notes.add(String.format(java.util.Locale.ROOT,
                        "the %d values left after step %d are all equal; the procedure stops there", left, i - 1));
                break;
            }
            gone[best] = true;
            sum = withoutBest;
            double ri = bestDev / s;
            double lambda = lambda(n, i, alpha);
            steps.add(new EsdResult.Step(i, ri, lambda, best, sample.value(best)));
            if (ri > lambda) {
                count = i;
            }
        }
        return new EsdResult(n, r, alpha, steps, count, notes);
    }

    /** The mean of the values left from their sum, refined by the mean of the residuals from it. */
    private static double meanFrom(double sum, double[] x, boolean[] gone, int left) {
        double m = sum / left;
        double corr = 0;
        for (int j = 0; j < x.length; j++) {
            if (!gone[j]) {
                corr += x[j] - m;
            }
        }
        return m + corr / left;
    }

    /**
     * λ_i = (n − i)·t/√((n − i − 1 + t²)(n − i + 1)) with t = t_{1−α/(2(n−i+1)), n−i−1}.
     *
     * @param n     sample size
     * @param i     step, 1 ≤ i ≤ n − 2
     * @param alpha level
     * @return the critical value
     */
    public static double lambda(int n, int i, double alpha) {
        double df = n - i - 1.0;
        double t = Distributions.tUpperQuantile(alpha / (2.0 * (n - i + 1)), df);
        return (n - i) * t / Math.sqrt((df + t * t) * (n - i + 1));
    }
}
