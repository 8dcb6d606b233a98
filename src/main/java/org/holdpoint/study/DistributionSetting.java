package org.holdpoint.study;

import java.util.Locale;
import org.holdpoint.stats.DistributionFamily;

/**
 * Which distribution a characteristic's capability is judged by (docs/methods.md §14): one family, or
 * {@code auto} (every family the values allow, compared by AIC). Not set means the default rule.
 */
public enum DistributionSetting {
    /** Fit every family the values allow and take the one with the lowest AIC. */
    AUTO(null),
    /** The normal model (today's indices, Bissell's bound). */
    NORMAL(DistributionFamily.NORMAL),
    /** Two-parameter lognormal. */
    LOGNORMAL(DistributionFamily.LOGNORMAL),
    /** Two-parameter Weibull. */
    WEIBULL(DistributionFamily.WEIBULL),
    /** Gamma. */
    GAMMA(DistributionFamily.GAMMA),
    /** Rayleigh (radial deviations, e.g. true position). */
    RAYLEIGH(DistributionFamily.RAYLEIGH);

    private final DistributionFamily family;

    DistributionSetting(DistributionFamily family) {
        this.family = family;
    }

    /** @return the family, or null for {@link #AUTO} */
    public DistributionFamily family() {
        return family;
    }

    /** @return the word in settings files, JSON and on the command line, e.g. "weibull" */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /**
     * @param text a setting's word in any case
     * @return the setting, or null when the text names none
     */
    public static DistributionSetting parse(String text) {
        for (DistributionSetting d : values()) {
            if (d.key().equalsIgnoreCase(text.strip())) {
                return d;
            }
        }
        return null;
    }

    /** @return the accepted words, for messages */
    public static String words() {
        return "auto, normal, lognormal, weibull, gamma or rayleigh";
    }
}
