package org.holdpoint.stats;

/**
 * Result of Grubbs' test for one outlier. The value is flagged, never dropped.
 *
 * @param n        number of values
 * @param side     two-sided, maximum or minimum
 * @param g        the statistic G
 * @param index    0-based position of the tested value in the caller's order
 * @param value    the tested value
 * @param critical G_crit at α
 * @param p        the Bonferroni p-value min(1, k·n·F_t(−t; n−2)), k = 2 two-sided, else 1
 * @param alpha    the level
 * @param outlier  G &gt; G_crit
 */
public record GrubbsResult(int n, OutlierSide side, double g, int index, double value, double critical, double p,
        double alpha, boolean outlier) {

    /** Validates the record. */
    public GrubbsResult {
        if (n < 3 || !(p >= 0 && p <= 1) || !(g >= 0)) {
            throw new StatsException("invalid Grubbs result: n = %d, G = %s, p = %s", n, g, p);
        }
    }
}
