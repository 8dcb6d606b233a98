package org.holdpoint.stats;

import java.util.Arrays;

/**
 * Sample quantiles by linear interpolation between order statistics, Hyndman &amp; Fan (1996,
 * Am. Statist. 50:361–365) definition 7 (R's default): h = (n − 1)p + 1 and
 * Q(p) = x_(⌊h⌋) + (h − ⌊h⌋)(x_(⌊h⌋+1) − x_(⌊h⌋)).
 */
public final class Quantiles {
    /** The name shown wherever these quantiles are shown. */
    public static final String METHOD = "Hyndman & Fan type 7 (linear interpolation between order statistics)";

    private Quantiles() {
    }

    /**
     * The type-7 quantile of already sorted values.
     *
     * @param sorted ascending values, not empty
     * @param p      a probability in [0, 1]
     * @return Q(p)
     */
    public static double type7(double[] sorted, double p) {
        if (sorted.length == 0) {
            throw new StatsException("a quantile needs at least one value");
        }
        if (!(p >= 0 && p <= 1)) {
            throw new StatsException("quantile probability must lie in [0, 1], got %s", p);
        }
        double h = (sorted.length - 1) * p;
        int lo = (int) Math.floor(h);
        if (lo >= sorted.length - 1) {
            return sorted[sorted.length - 1];
        }
        double frac = h - lo;
        return frac == 0 ? sorted[lo] : sorted[lo] + frac * (sorted[lo + 1] - sorted[lo]);
    }

    /**
     * The type-7 quantile of unsorted values; the input is not modified.
     *
     * @param values values in any order
     * @param p      a probability in [0, 1]
     * @return Q(p)
     */
    public static double type7Unsorted(double[] values, double p) {
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        return type7(sorted, p);
    }

    /**
     * The median: for even n the mean of the two middle order statistics (type 7 at p = ½).
     *
     * @param sorted ascending values, not empty
     * @return the median
     */
    public static double median(double[] sorted) {
        int n = sorted.length;
        if (n == 0) {
            throw new StatsException("a median needs at least one value");
        }
        if (n % 2 == 1) {
            return sorted[n / 2];
        }
        double a = sorted[n / 2 - 1];
        double b = sorted[n / 2];
        return a + (b - a) / 2;
    }
}
