package org.holdpoint.result;

import java.util.List;
import org.holdpoint.stats.Descriptives;
import org.holdpoint.stats.EquivalenceResult;
import org.holdpoint.stats.LeveneResult;
import org.holdpoint.stats.LocationMethod;
import org.holdpoint.stats.Margin;
import org.holdpoint.stats.SdGrowthResult;
import org.holdpoint.stats.TTestResult;
import org.holdpoint.stats.VarianceRatioResult;
import org.holdpoint.study.CharacteristicSettings;

/**
 * Everything computed for one characteristic, as named blocks: the descriptives of each group, the
 * comparison of locations ({@link LocationTests}), the comparison of spreads ({@link SpreadTests}), the
 * further checks (shape, outliers, order, capability, rank methods: {@link AssumptionChecks}), the verdict and
 * the notes. A block that does not apply is null (a characteristic that cannot be assessed has only its
 * descriptives and verdict). Built with {@link #builder}, by name, never by position.
 *
 * @param name     the characteristic's name
 * @param unit     unit of measure, or null
 * @param settings the criteria in force
 * @param margin   the margin in units, or null when none was set
 * @param paired   whether the paired design was used
 * @param before   descriptives of the before group
 * @param after    descriptives of the after group
 * @param location the t-based comparison of the locations and its equivalence tests, or null
 * @param spread   the comparison of the spreads, or null
 * @param holmP    the Holm-adjusted difference p, or null when not requested
 * @param method   the t-based method the verdict rests on
 * @param checks   shape, outliers, order, capability and the rank-based comparison, or null
 * @param verdict  the verdict
 * @param notes    plain-language notes (what was not computed and why, warnings)
 */
public record CharacteristicResult(String name, String unit, CharacteristicSettings settings, Margin margin,
        boolean paired, Descriptives before, Descriptives after, LocationTests location, SpreadTests spread,
        Double holmP, LocationMethod method, AssumptionChecks checks, Verdict verdict, List<String> notes) {

    /**
     * The comparison of the locations.
     *
     * @param welch      Welch two-sample t (independent samples), or null
     * @param pooled     pooled two-sample t (independent samples), or null
     * @param pairedTest paired t (paired design), or null
     * @param tost       TOST on the deciding design (Welch-based; paired-based when paired), or null
     * @param tostPooled pooled-based TOST (independent samples with a margin), or null
     */
    public record LocationTests(TTestResult welch, TTestResult pooled, TTestResult pairedTest,
            EquivalenceResult tost, EquivalenceResult tostPooled) {
    }

    /**
     * The comparison of the spreads.
     *
     * @param variance F-test of the variance ratio, or null
     * @param levene   Brown–Forsythe, or null
     * @param sdGrowth the sd-growth limit check, or null
     */
    public record SpreadTests(VarianceRatioResult variance, LeveneResult levene, SdGrowthResult sdGrowth) {
    }

    /** Copies the notes; requires the identity, the descriptives, the method and the verdict. */
    public CharacteristicResult {
        java.util.Objects.requireNonNull(name, "name");
        java.util.Objects.requireNonNull(method, "method");
        java.util.Objects.requireNonNull(verdict, "verdict");
        notes = List.copyOf(notes);
    }

    /**
     * Starts a result for one characteristic.
     *
     * @param name     the characteristic's name
     * @param unit     unit of measure, or null
     * @param settings the criteria in force
     * @param paired   whether the paired design was used
     * @param method   the t-based method the verdict rests on
     * @return a builder; set the blocks that apply, then {@link Builder#build}
     */
    public static Builder builder(String name, String unit, CharacteristicSettings settings, boolean paired,
            LocationMethod method) {
        return new Builder(name, unit, settings, paired, method);
    }

    /** Collects the blocks of a result by name. */
    public static final class Builder {
        private final String name;
        private final String unit;
        private final CharacteristicSettings settings;
        private final boolean paired;
        private final LocationMethod method;
        private Margin margin;
        private Descriptives before;
        private Descriptives after;
        private LocationTests location;
        private SpreadTests spread;
        private Double holmP;
        private AssumptionChecks checks;
        private Verdict verdict;
        private List<String> notes = List.of();

        private Builder(String name, String unit, CharacteristicSettings settings, boolean paired,
                LocationMethod method) {
            this.name = name;
            this.unit = unit;
            this.settings = settings;
            this.paired = paired;
            this.method = method;
        }

        /**
         * @param m the margin in units, or null
         * @return this builder
         */
        public Builder margin(Margin m) {
            margin = m;
            return this;
        }

        /**
         * @param b descriptives of the before group
         * @param a descriptives of the after group
         * @return this builder
         */
        public Builder descriptives(Descriptives b, Descriptives a) {
            before = b;
            after = a;
            return this;
        }

        /**
         * @param l the location block
         * @return this builder
         */
        public Builder location(LocationTests l) {
            location = l;
            return this;
        }

        /**
         * @param s the spread block
         * @return this builder
         */
        public Builder spread(SpreadTests s) {
            spread = s;
            return this;
        }

        /**
         * @param p the Holm-adjusted p, or null
         * @return this builder
         */
        public Builder holmP(Double p) {
            holmP = p;
            return this;
        }

        /**
         * @param c the further checks
         * @return this builder
         */
        public Builder checks(AssumptionChecks c) {
            checks = c;
            return this;
        }

        /**
         * @param v the verdict
         * @return this builder
         */
        public Builder verdict(Verdict v) {
            verdict = v;
            return this;
        }

        /**
         * @param n the notes
         * @return this builder
         */
        public Builder notes(List<String> n) {
            notes = n;
            return this;
        }

        /** @return the result */
        public CharacteristicResult build() {
            return new CharacteristicResult(name, unit, settings, margin, paired, before, after, location, spread,
                    holmP, method, checks, verdict, notes);
        }
    }

    /**
     * This result with another verdict, notes and Holm p.
     *
     * @param newHolmP   the Holm-adjusted p, or null
     * @param newVerdict the verdict
     * @param newNotes   the notes
     * @return the copy
     */
    public CharacteristicResult with(Double newHolmP, Verdict newVerdict, List<String> newNotes) {
        return new CharacteristicResult(name, unit, settings, margin, paired, before, after, location, spread,
                newHolmP, method, checks, newVerdict, newNotes);
    }

    /** @return Welch two-sample t, or null */
    public TTestResult welch() {
        return location == null ? null : location.welch();
    }

    /** @return pooled two-sample t, or null */
    public TTestResult pooled() {
        return location == null ? null : location.pooled();
    }

    /** @return paired t, or null */
    public TTestResult pairedTest() {
        return location == null ? null : location.pairedTest();
    }

    /** @return the TOST on the deciding design (Welch- or paired-based), or null */
    public EquivalenceResult tost() {
        return location == null ? null : location.tost();
    }

    /** @return the pooled-based TOST, or null */
    public EquivalenceResult tostPooled() {
        return location == null ? null : location.tostPooled();
    }

    /** @return the F-test of the variance ratio, or null */
    public VarianceRatioResult variance() {
        return spread == null ? null : spread.variance();
    }

    /** @return Brown–Forsythe, or null */
    public LeveneResult levene() {
        return spread == null ? null : spread.levene();
    }

    /** @return the sd-growth limit check, or null */
    public SdGrowthResult sdGrowth() {
        return spread == null ? null : spread.sdGrowth();
    }

    /** @return the t-test the verdict's design rests on, or null when none was computed */
    public TTestResult decidingTest() {
        return switch (method) {
            case PAIRED -> pairedTest();
            case POOLED -> pooled();
            case WELCH -> welch();
        };
    }

    /** @return the equivalence result the verdict rests on, or null without a margin */
    public EquivalenceResult decidingTost() {
        return method == LocationMethod.POOLED ? tostPooled() : tost();
    }

    /** @return whether the spread criterion was judged and not met */
    public boolean spreadFailed() {
        return sdGrowth() != null && !sdGrowth().met();
    }

    /**
     * @return whether stability is required and the after phase signals against the before limits
     *         (docs/methods.md §16)
     */
    public boolean stabilityFailed() {
        return Boolean.TRUE.equals(settings().requireStability()) && checks != null && checks.stability() != null
                && !checks.stability().after().signals().isEmpty();
    }

    /** @return whether stability is required but no control chart could be drawn, so it is not shown */
    public boolean stabilityNotShown() {
        return Boolean.TRUE.equals(settings().requireStability()) && (checks == null || checks.stability() == null);
    }

    /** Where the tolerance-interval criterion stands (docs/methods.md §17). */
    public enum ToleranceState {
        /** The criteria ask for no tolerance interval. */
        NOT_ASKED("not asked"),
        /** No interval of the after group, or no specification limits to judge it against. */
        NOT_JUDGED("not judged"),
        /** The distribution-free interval does not reach the confidence asked for. */
        NOT_SHOWN("not shown"),
        /** The after group's interval lies inside the limits. */
        INSIDE("inside the limits"),
        /** The after group's interval reaches beyond a limit. */
        OUTSIDE("NOT inside the limits");

        private final String words;

        ToleranceState(String words) {
            this.words = words;
        }

        /** @return the state in words */
        public String words() {
            return words;
        }
    }

    /** @return where the tolerance-interval criterion stands */
    public ToleranceState toleranceState() {
        if (settings().tolerance() == null) {
            return ToleranceState.NOT_ASKED;
        }
        var ti = checks == null ? null : checks.after().tolerance();
        if (ti == null || !settings().spec().any()) {
            return ToleranceState.NOT_JUDGED;
        }
        if (!ti.confident()) {
            return ToleranceState.NOT_SHOWN;
        }
        return ti.inside(settings().spec().lsl(), settings().spec().usl()) ? ToleranceState.INSIDE
                : ToleranceState.OUTSIDE;
    }

    /** @return whether the tolerance-interval criterion was judged and not met (docs/methods.md §17) */
    public boolean toleranceFailed() {
        return toleranceState() == ToleranceState.OUTSIDE;
    }

    /** @return whether the capability requirement was judged and not met */
    public boolean capabilityFailed() {
        return checks != null && Boolean.FALSE.equals(checks.capabilityMet());
    }
}
