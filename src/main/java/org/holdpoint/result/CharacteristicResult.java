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
 * Everything computed for one characteristic. A block that does not apply is null.
 *
 * @param name        the characteristic's name
 * @param unit        unit of measure, or null
 * @param settings    the criteria in force
 * @param margin      the margin in units, or null when none was set
 * @param paired      whether the paired design was used
 * @param before      descriptives of the before group
 * @param after       descriptives of the after group
 * @param welch       Welch two-sample t (independent samples), or null
 * @param pooled      pooled two-sample t (independent samples), or null
 * @param pairedTest  paired t (paired design), or null
 * @param tost        TOST on the deciding design (Welch-based; paired-based when paired), or null
 * @param tostPooled  pooled-based TOST (independent samples with a margin), or null
 * @param variance    F-test of the variance ratio, or null
 * @param levene      Brown–Forsythe, or null
 * @param sdGrowth    the sd-growth limit check, or null
 * @param holmP       the Holm-adjusted difference p, or null when not requested
 * @param method      the t-based method the verdict rests on
 * @param checks      shape, outliers, order, capability and the rank-based comparison, or null
 * @param verdict     the verdict
 * @param notes       plain-language notes (what was not computed and why, warnings)
 */
public record CharacteristicResult(String name, String unit, CharacteristicSettings settings, Margin margin,
        boolean paired, Descriptives before, Descriptives after, TTestResult welch, TTestResult pooled,
        TTestResult pairedTest, EquivalenceResult tost, EquivalenceResult tostPooled, VarianceRatioResult variance,
        LeveneResult levene, SdGrowthResult sdGrowth, Double holmP, LocationMethod method, AssumptionChecks checks,
        Verdict verdict, List<String> notes) {

    /** Copies the notes. */
    public CharacteristicResult {
        notes = List.copyOf(notes);
    }

    /**
     * A result without the further checks (kept for callers that compute only the t-based blocks).
     *
     * @param name       name
     * @param unit       unit
     * @param settings   criteria
     * @param margin     margin in units
     * @param paired     paired design
     * @param before     before descriptives
     * @param after      after descriptives
     * @param welch      Welch t
     * @param pooled     pooled t
     * @param pairedTest paired t
     * @param tost       TOST
     * @param tostPooled pooled TOST
     * @param variance   F-test
     * @param levene     Brown–Forsythe
     * @param sdGrowth   sd-growth check
     * @param holmP      Holm-adjusted p
     * @param method     deciding method
     * @param verdict    verdict
     * @param notes      notes
     */
    public CharacteristicResult(String name, String unit, CharacteristicSettings settings, Margin margin,
            boolean paired, Descriptives before, Descriptives after, TTestResult welch, TTestResult pooled,
            TTestResult pairedTest, EquivalenceResult tost, EquivalenceResult tostPooled, VarianceRatioResult variance,
            LeveneResult levene, SdGrowthResult sdGrowth, Double holmP, LocationMethod method, Verdict verdict,
            List<String> notes) {
        this(name, unit, settings, margin, paired, before, after, welch, pooled, pairedTest, tost, tostPooled,
                variance, levene, sdGrowth, holmP, method, null, verdict, notes);
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
        return new CharacteristicResult(name, unit, settings, margin, paired, before, after, welch, pooled,
                pairedTest, tost, tostPooled, variance, levene, sdGrowth, newHolmP, method, checks, newVerdict,
                newNotes);
    }

    /** @return the t-test the verdict's design rests on */
    public TTestResult decidingTest() {
        return switch (method) {
            case PAIRED -> pairedTest;
            case POOLED -> pooled;
            case WELCH -> welch;
        };
    }

    /** @return the equivalence result the verdict rests on, or null without a margin */
    public EquivalenceResult decidingTost() {
        return method == LocationMethod.POOLED ? tostPooled : tost;
    }

    /** @return whether the spread criterion was judged and not met */
    public boolean spreadFailed() {
        return sdGrowth != null && !sdGrowth.met();
    }

    /** @return whether the capability requirement was judged and not met */
    public boolean capabilityFailed() {
        return checks != null && Boolean.FALSE.equals(checks.capabilityMet());
    }
}
