package org.holdpoint.stats;

import java.util.List;

/**
 * The normality checks of one group: Shapiro–Wilk (3 ≤ n ≤ 5000) and Anderson–Darling (n ≥ 8); a check that
 * cannot apply is null and a note says why.
 *
 * @param n        number of values
 * @param shapiro  Shapiro–Wilk result, or null
 * @param anderson Anderson–Darling result, or null
 * @param notes    why a check is absent
 */
public record NormalityResult(int n, ShapiroWilkResult shapiro, AndersonDarlingResult anderson, List<String> notes) {

    /** Validates the record. */
    public NormalityResult {
        notes = List.copyOf(notes);
    }

    /**
     * Runs both checks, each only where it applies.
     *
     * @param sample the group's values
     * @return the result
     */
    public static NormalityResult of(Sample sample) {
        java.util.ArrayList<String> notes = new java.util.ArrayList<>();
        ShapiroWilkResult sw = null;
        AndersonDarlingResult ad = null;
        try {
            sw = ShapiroWilk.test(sample);
        } catch (StatsException e) {
            notes.add("Shapiro-Wilk not computed: " + e.getMessage());
        }
        try {
            ad = AndersonDarling.test(sample);
        } catch (StatsException e) {
            notes.add("Anderson-Darling not computed: " + e.getMessage());
        }
        return new NormalityResult(sample.size(), sw, ad, notes);
    }

    /** @return Shapiro–Wilk W, or null (JSON {@code shapiroW}) */
    public Double shapiroW() {
        return shapiro == null ? null : shapiro.w();
    }

    /** @return Shapiro–Wilk p, or null (JSON {@code shapiroP}) */
    public Double shapiroP() {
        return shapiro == null ? null : shapiro.p();
    }

    /** @return the unadjusted Anderson–Darling A², or null (JSON {@code andersonA2}) */
    public Double andersonA2() {
        return anderson == null ? null : anderson.a2();
    }

    /** @return the Anderson–Darling p, or null (JSON {@code andersonP}) */
    public Double andersonP() {
        return anderson == null ? null : anderson.p();
    }
}
