package org.holdpoint.study;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * Study-wide settings of an analysis.
 *
 * @param alpha             the significance level; intervals of difference are (1 − α), equivalence (1 − 2α)
 * @param equalVariances    whether the user asserts equal variances (pooled tests decide), else Welch
 * @param holm              whether difference p-values get a Holm adjustment across characteristics
 * @param defaults          criteria applied to every characteristic (overridden per characteristic)
 * @param perCharacteristic criteria per characteristic name
 * @param overrides         criteria that win over everything (command-line options)
 * @param exclusions        values excluded by the user, with reasons
 * @param methods           the generation of methods the study is computed with: {@link #METHODS} for a new
 *                          study; 2 for a record written before capability by fitted distributions and the
 *                          paired spread test existed; 3 for a record whose control charts were individuals charts
 *                          in the sequence column's order alone (each is re-computed as it was, docs/study-file.md)
 * @param stability         the control charts' run order and tests
 */
public record AnalysisSettings(double alpha, boolean equalVariances, boolean holm, CharacteristicSettings defaults,
        Map<String, CharacteristicSettings> perCharacteristic, CharacteristicSettings overrides,
        List<Exclusion> exclusions, int methods, StabilityOptions stability) {

    /**
     * The current generation of methods: 3 judges capability by a fitted distribution where the default rule or
     * the criteria say so, and compares the spreads of a paired design by the Pitman–Morgan test; 4 draws charts
     * of subgroup means and sds when a subgroup column exists, reads dates and natural order in the sequence
     * column, takes the row order when the user says so, and notes when no run order is known.
     */
    public static final int METHODS = 4;

    /**
     * Settings of a given method generation with the default chart options.
     *
     * @param alpha             the significance level
     * @param equalVariances    whether equal variances are asserted
     * @param holm              whether p-values get a Holm adjustment
     * @param defaults          criteria for every characteristic
     * @param perCharacteristic criteria per characteristic
     * @param overrides         criteria that win over everything
     * @param exclusions        excluded values
     * @param methods           the method generation
     */
    public AnalysisSettings(double alpha, boolean equalVariances, boolean holm, CharacteristicSettings defaults,
            Map<String, CharacteristicSettings> perCharacteristic, CharacteristicSettings overrides,
            List<Exclusion> exclusions, int methods) {
        this(alpha, equalVariances, holm, defaults, perCharacteristic, overrides, exclusions, methods,
                StabilityOptions.DEFAULT);
    }

    /**
     * Settings computed with the current methods.
     *
     * @param alpha             the significance level
     * @param equalVariances    whether equal variances are asserted
     * @param holm              whether p-values get a Holm adjustment
     * @param defaults          criteria for every characteristic
     * @param perCharacteristic criteria per characteristic
     * @param overrides         criteria that win over everything
     * @param exclusions        excluded values
     */
    public AnalysisSettings(double alpha, boolean equalVariances, boolean holm, CharacteristicSettings defaults,
            Map<String, CharacteristicSettings> perCharacteristic, CharacteristicSettings overrides,
            List<Exclusion> exclusions) {
        this(alpha, equalVariances, holm, defaults, perCharacteristic, overrides, exclusions, METHODS);
    }

    /**
     * @param generation a method generation
     * @return whether the methods of that generation apply (a record of an earlier one is re-computed as it was)
     */
    public boolean since(int generation) {
        return methods >= generation;
    }

    /** Validates and copies. */
    public AnalysisSettings {
        if (!(alpha > 0 && alpha < 0.5)) {
            throw new org.holdpoint.stats.StatsException("alpha must lie strictly between 0 and 0.5, got %s", alpha);
        }
        defaults = defaults == null ? CharacteristicSettings.EMPTY : defaults;
        overrides = overrides == null ? CharacteristicSettings.EMPTY : overrides;
        perCharacteristic = java.util.Collections.unmodifiableMap(new LinkedHashMap<>(
                perCharacteristic == null ? Map.of() : perCharacteristic));
        exclusions = exclusions == null ? List.of() : List.copyOf(exclusions);
        stability = stability == null ? StabilityOptions.DEFAULT : stability;
        if (methods < 2 || methods > METHODS) {
            throw new org.holdpoint.stats.StatsException("method generation %d is not known (2 to %d)", methods, METHODS);
        }
    }

    /**
     * @param d the new defaults
     * @param per the new per-characteristic criteria
     * @param o the new overrides
     * @return these settings with other criteria, everything else kept
     */
    public AnalysisSettings withCriteria(CharacteristicSettings d, Map<String, CharacteristicSettings> per,
            CharacteristicSettings o) {
        return new AnalysisSettings(alpha, equalVariances, holm, d, per, o, exclusions, methods, stability);
    }

    /**
     * @param s the chart options
     * @return these settings with them
     */
    public AnalysisSettings withStability(StabilityOptions s) {
        return new AnalysisSettings(alpha, equalVariances, holm, defaults, perCharacteristic, overrides, exclusions,
                methods, s);
    }

    /** @return α = 0.05, Welch, no Holm, nothing else set */
    public static AnalysisSettings defaultSettings() {
        return new AnalysisSettings(0.05, false, false, null, null, null, null);
    }

    /**
     * The criteria in force for one characteristic: defaults, then the per-characteristic settings,
     * then the overrides.
     *
     * @param name the characteristic's name
     * @return the resolved criteria
     */
    public CharacteristicSettings resolve(String name) {
        CharacteristicSettings own = perCharacteristic.get(name);
        if (own == null) {
            String key = NameKeys.key(name);
            for (Map.Entry<String, CharacteristicSettings> e : perCharacteristic.entrySet()) {
                if (NameKeys.key(e.getKey()).equals(key)) {
                    own = e.getValue();
                    break;
                }
            }
        }
        return defaults.overriddenBy(own).overriddenBy(overrides);
    }
}
