package org.holdpoint.stats;

import java.util.List;

/**
 * Process capability of one group against its specification limits. Every index that does not exist (a one-sided
 * specification, zero spread, no subgroups) is null and a note says why.
 *
 * @param n           number of values
 * @param mean        x̄
 * @param sd          overall s (divisor n − 1), not bias-corrected
 * @param lsl         lower specification limit, or null
 * @param usl         upper specification limit, or null
 * @param alpha       1 − the level of the lower confidence bounds
 * @param pp          (USL − LSL)/(6s), both limits only
 * @param ppu         (USL − x̄)/(3s)
 * @param ppl         (x̄ − LSL)/(3s)
 * @param ppk         min(Ppu, Ppl), or the one that exists
 * @param ppLower     Pp·√(χ²_{α,n−1}/(n−1))
 * @param ppkLower    Bissell's bound Ppk − z_{1−α}√(1/(9n) + Ppk²/(2(n−1)))
 * @param ppmBelow    10⁶·Φ((LSL − x̄)/s), expected parts per million below LSL under normality
 * @param ppmAbove    10⁶·Φ((x̄ − USL)/s), expected parts per million above USL (a lower tail)
 * @param estimator   the within-subgroup sd estimator, or null when no within indices were computed
 * @param sigmaWithin the within-subgroup sd σ_w, or null
 * @param withinDf    d, the degrees of freedom of s_p, or null
 * @param cp          (USL − LSL)/(6σ_w)
 * @param cpu         (USL − x̄)/(3σ_w)
 * @param cpl         (x̄ − LSL)/(3σ_w)
 * @param cpk         min(Cpu, Cpl), or the one that exists
 * @param cpLower     [(USL − LSL)/(6s_p)]·√(χ²_{α,d}/d), the χ² bound on the uncorrected s_p
 * @param cpkLower    Cpk − z_{1−α}√(1/(9N) + Cpk²/(2d)), an adaptation of Bissell's bound
 * @param notes       plain-words notes
 */
public record CapabilityResult(int n, double mean, double sd, Double lsl, Double usl, double alpha, Double pp,
        Double ppu, Double ppl, Double ppk, Double ppLower, Double ppkLower, Double ppmBelow, Double ppmAbove,
        WithinEstimator estimator, Double sigmaWithin, Integer withinDf, Double cp, Double cpu, Double cpl,
        Double cpk, Double cpLower, Double cpkLower, List<String> notes) {

    /** Validates the record. */
    public CapabilityResult {
        if (lsl == null && usl == null) {
            throw new StatsException("capability needs LSL, USL or both");
        }
        notes = List.copyOf(notes);
    }

    /**
     * Whether the capability requirement is met, judged on the lower bound of Ppk (common practice for the
     * requirement value, e.g. 1.33, no source).
     *
     * @param requirement the required index
     * @return ppkLower &gt; requirement, or null when the bound is undefined
     */
    public Boolean meets(double requirement) {
        return ppkLower == null ? null : ppkLower > requirement;
    }
}
