package org.holdpoint.stats;

import java.util.List;
import java.util.Locale;

/**
 * The distribution families a characteristic's capability can be judged by (docs/methods.md §14), with their
 * parameters named as R names them.
 */
public enum DistributionFamily {
    /** Normal: {@code mean}, {@code sd}. */
    NORMAL(List.of("mean", "sd"), false),
    /** Two-parameter lognormal: {@code meanlog}, {@code sdlog} (the mean and ML sd of ln x). */
    LOGNORMAL(List.of("meanlog", "sdlog"), true),
    /** Two-parameter Weibull: {@code shape} k, {@code scale} λ; F(x) = 1 − exp(−(x/λ)^k). */
    WEIBULL(List.of("shape", "scale"), true),
    /** Gamma: {@code shape} α, {@code rate} β; density β^α x^(α−1) e^(−βx)/Γ(α). */
    GAMMA(List.of("shape", "rate"), true),
    /** Rayleigh (radial deviation of a centred circular normal): {@code sigma}; F(x) = 1 − exp(−x²/(2σ²)). */
    RAYLEIGH(List.of("sigma"), true);

    private final List<String> parameterNames;
    private final boolean positiveOnly;

    DistributionFamily(List<String> parameterNames, boolean positiveOnly) {
        this.parameterNames = parameterNames;
        this.positiveOnly = positiveOnly;
    }

    /** @return the parameter names, in R's order */
    public List<String> parameterNames() {
        return parameterNames;
    }

    /** @return the number of fitted parameters (for AIC) */
    public int parameterCount() {
        return parameterNames.size();
    }

    /** @return the name in settings and JSON, e.g. "weibull" */
    public String key() {
        return name().toLowerCase(Locale.ROOT);
    }

    /**
     * Why this family cannot be fitted to these values, or null when it can.
     *
     * @param x the values
     * @return the reason in words, or null
     */
    public String refusal(double[] x) {
        int bad = 0;
        for (double v : x) {
            if (positiveOnly && !(v > 0)) {
                bad++;
            }
        }
        if (bad > 0) {
            return String.format(Locale.ROOT, "needs values above 0; %d value(s) are 0 or below (e.g. readings "
                    + "at the gauge's resolution)", bad);
        }
        return null;
    }

    /**
     * @param key a family's name in any case
     * @return the family
     * @throws StatsException for an unknown name
     */
    public static DistributionFamily of(String key) {
        for (DistributionFamily f : values()) {
            if (f.key().equalsIgnoreCase(key.strip())) {
                return f;
            }
        }
        throw new StatsException("'%s' is not a distribution family; use normal, lognormal, weibull, gamma or rayleigh",
                key);
    }
}
