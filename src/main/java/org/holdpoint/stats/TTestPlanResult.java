package org.holdpoint.stats;

/**
 * The smallest sizes at which the two-sided t-test at level α detects a shift with the target power.
 *
 * @param design          parallel groups or paired
 * @param alpha           the two-sided level
 * @param shift           the shift to detect
 * @param sd              σ (paired: the sd of the differences)
 * @param ratio           n_after/n_before (1 for paired)
 * @param targetPower     the target power
 * @param n               the before-group size (paired: pairs)
 * @param nAfter          the after-group size ⌈r·n⌉ (paired: n)
 * @param achievedPower   the exact power at (n, nAfter)
 * @param powerAtPrevious the exact power at n − 1, or null when that leaves no degree of freedom
 */
public record TTestPlanResult(Design design, double alpha, double shift, double sd, double ratio, double targetPower,
        int n, int nAfter, double achievedPower, Double powerAtPrevious) {

    /** Validates the record. */
    public TTestPlanResult {
        if (design == null) {
            throw new StatsException("a design is required");
        }
        Checks.atLeast(n, 1, "n");
        Checks.atLeast(nAfter, 1, "nAfter");
        Checks.probability(achievedPower, "achieved power");
        if (achievedPower < targetPower) {
            throw new StatsException("achieved power %s is below the target %s", achievedPower, targetPower);
        }
    }
}
