package org.holdpoint.stats;

import java.util.List;

/**
 * A planned equivalence trial: the sizes, the exact TOST power there, the power of the two-sided
 * difference test at the same sizes, and a power table over true differences. Created by
 * {@link EquivalencePlan}, either by a sample-size search (targetPower set) or for a given n.
 *
 * @param design          parallel groups or paired
 * @param alpha           the level of each one-sided test
 * @param marginLower     L
 * @param marginUpper     U
 * @param difference      the expected true difference T, after − before
 * @param sd              σ (paired: the sd of the differences)
 * @param ratio           the allocation ratio r = n_after/n_before (1 for paired)
 * @param targetPower     the target of the search, or null when the size was given
 * @param n               the before-group size n₁ (paired: the number of pairs m)
 * @param nAfter          the after-group size n₂ = ⌈r·n₁⌉ (paired: m)
 * @param achievedPower   the exact TOST power at (n, nAfter)
 * @param powerAtPrevious the exact TOST power at n − 1, or null when n − 1 leaves no degree of freedom
 * @param tTestPower      the power of the two-sided t-test at level α to detect T at (n, nAfter)
 * @param powerTable      the exact TOST power at (n, nAfter) over true differences from L to U
 */
public record PlanResult(Design design, double alpha, double marginLower, double marginUpper, double difference,
        double sd, double ratio, Double targetPower, int n, int nAfter, double achievedPower,
        Double powerAtPrevious, double tTestPower, List<PowerPoint> powerTable) {

    /** Validates the record and freezes the table. */
    public PlanResult {
        if (design == null) {
            throw new StatsException("a design is required");
        }
        Checks.atLeast(n, 1, "n");
        Checks.atLeast(nAfter, 1, "nAfter");
        Checks.probability(achievedPower, "achieved power");
        if (powerAtPrevious != null) {
            Checks.probability(powerAtPrevious, "power at n - 1");
        }
        Checks.probability(tTestPower, "t-test power");
        // a one-sided margin has an infinite other bound; the difference may lie anywhere when the size was given
        if (!(marginLower < marginUpper) || Double.isNaN(difference) || Double.isInfinite(difference)) {
            throw new StatsException("a plan needs a margin with L < U and a finite difference, got (%s, %s) and %s",
                    marginLower, marginUpper, difference);
        }
        powerTable = List.copyOf(powerTable);
    }

    /** @return the total number of units measured: n + nAfter (paired: the m units, each measured twice) */
    public long totalUnits() {
        return design == Design.PAIRED ? n : (long) n + nAfter;
    }
}
