package org.holdpoint.study;

import java.util.List;

/**
 * The criteria for one characteristic; any field may be null (not set). Settings are merged:
 * {@link #overriddenBy(CharacteristicSettings)} takes every field the other sets.
 *
 * @param unit                  unit of measure
 * @param spec                  specification limits (fields individually nullable)
 * @param margin                the equivalence margin as entered
 * @param sdGrowthLimit         the largest acceptable σ_after/σ_before, or null
 * @param capabilityRequirement the minimum acceptable capability index (judged on the lower bound), or null
 * @param paired                whether the same units were measured before and after, or null (from layout)
 * @param distribution          the distribution capability is judged by, or null (the default rule)
 * @param requireStability      whether a control-chart signal in the after phase fails the characteristic, or null
 *                              (no: a finding only)
 * @param tolerance             the tolerance interval the after group must keep inside the limits, or null
 */
public record CharacteristicSettings(String unit, SpecLimits spec, MarginSpec margin, Double sdGrowthLimit,
        Double capabilityRequirement, Boolean paired, DistributionSetting distribution, Boolean requireStability,
        ToleranceRequirement tolerance) {
    /** Nothing set. */
    public static final CharacteristicSettings EMPTY = new CharacteristicSettings(null, SpecLimits.NONE, null, null,
            null, null, null, null, null);

    /**
     * Criteria without a tolerance-interval requirement.
     *
     * @param unit                  unit of measure
     * @param spec                  specification limits
     * @param margin                the equivalence margin as entered
     * @param sdGrowthLimit         the largest acceptable σ_after/σ_before, or null
     * @param capabilityRequirement the minimum acceptable capability index, or null
     * @param paired                whether the design is paired, or null
     * @param distribution          the distribution setting, or null
     * @param requireStability      whether stability is required, or null
     */
    public CharacteristicSettings(String unit, SpecLimits spec, MarginSpec margin, Double sdGrowthLimit,
            Double capabilityRequirement, Boolean paired, DistributionSetting distribution, Boolean requireStability) {
        this(unit, spec, margin, sdGrowthLimit, capabilityRequirement, paired, distribution, requireStability, null);
    }

    /**
     * Criteria without a stability requirement.
     *
     * @param unit                  unit of measure
     * @param spec                  specification limits
     * @param margin                the equivalence margin as entered
     * @param sdGrowthLimit         the largest acceptable σ_after/σ_before, or null
     * @param capabilityRequirement the minimum acceptable capability index, or null
     * @param paired                whether the design is paired, or null
     * @param distribution          the distribution setting, or null
     */
    public CharacteristicSettings(String unit, SpecLimits spec, MarginSpec margin, Double sdGrowthLimit,
            Double capabilityRequirement, Boolean paired, DistributionSetting distribution) {
        this(unit, spec, margin, sdGrowthLimit, capabilityRequirement, paired, distribution, null, null);
    }

    /**
     * Criteria without a distribution setting.
     *
     * @param unit                  unit of measure
     * @param spec                  specification limits
     * @param margin                the equivalence margin as entered
     * @param sdGrowthLimit         the largest acceptable σ_after/σ_before, or null
     * @param capabilityRequirement the minimum acceptable capability index, or null
     * @param paired                whether the design is paired, or null
     */
    public CharacteristicSettings(String unit, SpecLimits spec, MarginSpec margin, Double sdGrowthLimit,
            Double capabilityRequirement, Boolean paired) {
        this(unit, spec, margin, sdGrowthLimit, capabilityRequirement, paired, null);
    }

    /**
     * @param d the distribution setting, or null
     * @return these criteria with it
     */
    public CharacteristicSettings withDistribution(DistributionSetting d) {
        return new CharacteristicSettings(unit, spec, margin, sdGrowthLimit, capabilityRequirement, paired, d,
                requireStability, tolerance);
    }

    /**
     * @param required whether a signal in the after phase fails the characteristic, or null
     * @return these criteria with it
     */
    public CharacteristicSettings withRequireStability(Boolean required) {
        return new CharacteristicSettings(unit, spec, margin, sdGrowthLimit, capabilityRequirement, paired,
                distribution, required, tolerance);
    }

    /**
     * @param t the tolerance-interval requirement, or null
     * @return these criteria with it
     */
    public CharacteristicSettings withTolerance(ToleranceRequirement t) {
        return new CharacteristicSettings(unit, spec, margin, sdGrowthLimit, capabilityRequirement, paired,
                distribution, requireStability, t);
    }

    /** Normalises a null spec to {@link SpecLimits#NONE}. */
    public CharacteristicSettings {
        spec = spec == null ? SpecLimits.NONE : spec;
        List<CriteriaCheck.Problem> problems = CriteriaCheck.check(spec.lsl(), spec.nominal(),
                spec.usl(), margin, sdGrowthLimit, capabilityRequirement);
        if (!problems.isEmpty()) {
            throw new org.holdpoint.stats.StatsException("%s", problems.get(0).message());
        }
    }

    /**
     * These settings with every field that {@code other} sets taken from {@code other}.
     *
     * @param other the settings that win
     * @return the merged settings
     */
    public CharacteristicSettings overriddenBy(CharacteristicSettings other) {
        if (other == null) {
            return this;
        }
        SpecLimits s = new SpecLimits(pick(other.spec.lsl(), spec.lsl()), pick(other.spec.nominal(), spec.nominal()),
                pick(other.spec.usl(), spec.usl()));
        return new CharacteristicSettings(pick(other.unit, unit), s, pick(other.margin, margin),
                pick(other.sdGrowthLimit, sdGrowthLimit), pick(other.capabilityRequirement, capabilityRequirement),
                pick(other.paired, paired), pick(other.distribution, distribution),
                pick(other.requireStability, requireStability), pick(other.tolerance, tolerance));
    }

    private static <T> T pick(T preferred, T fallback) {
        return preferred != null ? preferred : fallback;
    }
}
