package org.holdpoint.stats;

/**
 * A Hodges–Lehmann confidence interval from a rank test: two order statistics of the pairwise
 * differences (or Walsh averages), with the level asked for and the level achieved.
 *
 * @param lower          lower bound, a pairwise difference (Walsh average)
 * @param upper          upper bound
 * @param requestedLevel the level asked for, e.g. 0.95 or (for equivalence) 1 − 2α
 * @param achievedLevel  the level achieved: exact coverage in the exact branch
 *                       (1 − 2P(U ≤ q − 1)), the normal-approximation level otherwise
 * @param levelReached   false when the requested level could not be reached with these sizes
 * @param method         exact or normal
 */
public record RankInterval(double lower, double upper, double requestedLevel, double achievedLevel,
        boolean levelReached, RankMethod method) {

    /** Validates the record. */
    public RankInterval {
        if (!(lower <= upper)) {
            throw new StatsException("interval bounds must be ordered, got [%s, %s]", lower, upper);
        }
        if (!(requestedLevel > 0 && requestedLevel < 1) || !(achievedLevel >= 0 && achievedLevel <= 1)) {
            throw new StatsException("interval levels must be probabilities, got %s and %s", requestedLevel,
                    achievedLevel);
        }
        if (method == null) {
            throw new StatsException("an interval method is required");
        }
    }
}
