package org.holdpoint.stats;

/**
 * One row of a power table: the exact TOST power if the true difference after − before were
 * {@code difference}.
 *
 * @param difference the true difference T
 * @param power      the exact TOST power at T, in [0, 1]
 */
public record PowerPoint(double difference, double power) {

    /** Validates the row. */
    public PowerPoint {
        if (!Double.isFinite(difference)) {
            throw new StatsException("a power table difference must be finite, got %s", difference);
        }
        Checks.probability(power, "power");
    }
}
