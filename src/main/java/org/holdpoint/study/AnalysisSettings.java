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
 */
public record AnalysisSettings(double alpha, boolean equalVariances, boolean holm, CharacteristicSettings defaults,
        Map<String, CharacteristicSettings> perCharacteristic, CharacteristicSettings overrides,
        List<Exclusion> exclusions) {

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
