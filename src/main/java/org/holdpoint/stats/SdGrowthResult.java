package org.holdpoint.stats;

/**
 * Whether the standard deviation grew by no more than a limit λ: the upper one-sided (1 − α)
 * confidence bound B on σ_after/σ_before must lie below λ.
 *
 * @param limit      λ, the largest acceptable σ_after/σ_before
 * @param sdRatio    s_a/s_b
 * @param upperBound B = √(f·F_{1−α}(ν2, ν1))
 * @param p          P(F_{ν1,ν2} ≤ f/λ²), the p of H0: σ_a/σ_b ≥ λ
 * @param level      1 − α, the level of the one-sided bound
 * @param met        p &lt; α (equivalently B &lt; λ)
 * @param method     the test the bound comes from (F for independent groups, Pitman–Morgan for pairs)
 */
public record SdGrowthResult(double limit, double sdRatio, double upperBound, double p, double level, boolean met,
        VarianceRatioResult.SpreadMethod method) {

    /**
     * A bound from the F distribution (independent groups).
     *
     * @param limit      λ
     * @param sdRatio    s_a/s_b
     * @param upperBound B
     * @param p          the p of H0: σ_a/σ_b ≥ λ
     * @param level      1 − α
     * @param met        p &lt; α
     */
    public SdGrowthResult(double limit, double sdRatio, double upperBound, double p, double level, boolean met) {
        this(limit, sdRatio, upperBound, p, level, met, VarianceRatioResult.SpreadMethod.F_TEST);
    }
}
