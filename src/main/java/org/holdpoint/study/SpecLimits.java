package org.holdpoint.study;

/**
 * Specification limits of a characteristic; each may be absent.
 *
 * @param lsl     lower specification limit, or null
 * @param nominal nominal (target) value, or null
 * @param usl     upper specification limit, or null
 */
public record SpecLimits(Double lsl, Double nominal, Double usl) {
    /** No limits. */
    public static final SpecLimits NONE = new SpecLimits(null, null, null);

    /** Validates the limits. */
    public SpecLimits {
        String problem = CriteriaCheck.limitsProblem(lsl, usl);
        if (problem != null) {
            throw new org.holdpoint.stats.StatsException("%s", problem);
        }
    }

    /** @return whether any limit is set */
    public boolean any() {
        return lsl != null || usl != null;
    }
}
