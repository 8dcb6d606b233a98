package org.holdpoint.stats;

import java.util.ArrayList;
import java.util.List;

/**
 * The numbers of one box plot: type-7 quartiles and median (Hyndman &amp; Fan 1996, definition 7), whiskers
 * to the most extreme values within 1.5·IQR of the box (Tukey 1977, Exploratory Data Analysis, with type-7
 * quartiles in place of hinges), the values beyond as outliers with their 0-based positions in run order,
 * the mean, and n. Computed here once so that every chart, table and workbook shows the same numbers.
 *
 * @param n            number of values, ≥ 1
 * @param mean         arithmetic mean (as {@link Descriptives#mean()})
 * @param min          smallest value
 * @param q1           type-7 quantile at p = 0.25
 * @param median       type-7 quantile at p = 0.5
 * @param q3           type-7 quantile at p = 0.75
 * @param max          largest value
 * @param lowerFence   Q1 − 1.5·(Q3 − Q1)
 * @param upperFence   Q3 + 1.5·(Q3 − Q1)
 * @param lowerWhisker the smallest value ≥ the lower fence
 * @param upperWhisker the largest value ≤ the upper fence
 * @param outliers     the values outside [lowerFence, upperFence], in run order
 */
public record BoxStatistics(int n, double mean, double min, double q1, double median, double q3, double max,
        double lowerFence, double upperFence, double lowerWhisker, double upperWhisker, List<Outlier> outliers) {

    /** The whisker factor k of the fences Q1 − k·IQR and Q3 + k·IQR (Tukey 1977). */
    public static final double WHISKER_FACTOR = 1.5;

    /** The rule shown next to every box plot. */
    public static final String METHOD = "median and quartiles: " + Quantiles.METHOD
            + "; whiskers to the most extreme values within 1.5 × IQR of the box (Tukey 1977)";

    /**
     * One value outside the fences.
     *
     * @param position its 0-based position in the caller's (run) order
     * @param value    the value
     */
    public record Outlier(int position, double value) {
        /** Validates the outlier. */
        public Outlier {
            if (position < 0) {
                throw new StatsException("an outlier position must not be negative, got %d", position);
            }
            if (!Double.isFinite(value)) {
                throw new StatsException("an outlier value must be finite, got %s", value);
            }
        }
    }

    /**
     * Validates min ≤ Q1 ≤ median ≤ Q3 ≤ max, min ≤ lowerWhisker ≤ upperWhisker ≤ max and that the whiskers lie
     * within the fences, and copies the list. A whisker may lie inside the box: with type-7 quartiles and few values
     * no value need fall between a quartile and its fence.
     */
    public BoxStatistics {
        if (n < 1) {
            throw new StatsException("box statistics need at least one value, got n = %d", n);
        }
        if (!(min <= q1 && q1 <= median && median <= q3 && q3 <= max && min <= lowerWhisker
                && lowerWhisker <= upperWhisker && upperWhisker <= max && lowerFence <= lowerWhisker
                && upperWhisker <= upperFence)) {
            throw new StatsException("box statistics out of order: min %s, fence %s, whisker %s, Q1 %s, median %s, "
                    + "Q3 %s, whisker %s, fence %s, max %s", min, lowerFence, lowerWhisker, q1, median, q3, upperWhisker,
                    upperFence, max);
        }
        if (!Double.isFinite(mean)) {
            throw new StatsException("the mean must be finite, got %s", mean);
        }
        outliers = List.copyOf(outliers);
    }

    /**
     * The box statistics of a sample; the sample is not changed and the outliers keep its run order.
     *
     * @param sample at least one value
     * @return the statistics
     * @throws StatsException if the sample is empty
     */
    public static BoxStatistics of(Sample sample) {
        if (sample.size() == 0) {
            throw new StatsException("a box plot needs at least one value, got none");
        }
        double[] runOrder = sample.raw();
        double[] sorted = sample.sorted();
        double q1 = Quantiles.type7(sorted, 0.25);
        double median = Quantiles.type7(sorted, 0.5);
        double q3 = Quantiles.type7(sorted, 0.75);
        double iqr = q3 - q1;
        double lowerFence = q1 - WHISKER_FACTOR * iqr;
        double upperFence = q3 + WHISKER_FACTOR * iqr;
        double lowerWhisker = sorted[lowestWithin(sorted, lowerFence)];
        double upperWhisker = sorted[highestWithin(sorted, upperFence)];
        List<Outlier> outliers = new ArrayList<>();
        for (int i = 0; i < runOrder.length; i++) {
            if (runOrder[i] < lowerFence || runOrder[i] > upperFence) {
                outliers.add(new Outlier(i, runOrder[i]));
            }
        }
        return new BoxStatistics(sorted.length, Descriptives.of(sample).mean(), sorted[0], q1, median, q3,
                sorted[sorted.length - 1], lowerFence, upperFence, lowerWhisker, upperWhisker, outliers);
    }

    /**
     * The box statistics of values in run order; the array is copied, never changed.
     *
     * @param values at least one finite value
     * @return the statistics
     * @throws StatsException if the array is empty or holds NaN or an infinite value
     */
    public static BoxStatistics of(double... values) {
        return of(Sample.of(values));
    }

    // Q1 itself lies within the fence and some order statistic is ≤ Q1, so the search always succeeds.
    private static int lowestWithin(double[] sorted, double fence) {
        int i = 0;
        while (sorted[i] < fence) {
            i++;
        }
        return i;
    }

    private static int highestWithin(double[] sorted, double fence) {
        int i = sorted.length - 1;
        while (sorted[i] > fence) {
            i--;
        }
        return i;
    }

    /** @return Q3 − Q1 */
    public double iqr() {
        return q3 - q1;
    }

    /** @return the outlier values in run order */
    public double[] outlierValues() {
        return outliers.stream().mapToDouble(Outlier::value).toArray();
    }

    /** @return the 0-based run-order positions of the outliers, ascending */
    public int[] outlierPositions() {
        return outliers.stream().mapToInt(Outlier::position).toArray();
    }

    /**
     * @param value a value of the sample
     * @return whether it lies outside the fences, i.e. is drawn as an outlier
     */
    public boolean isOutlier(double value) {
        return value < lowerFence || value > upperFence;
    }
}
