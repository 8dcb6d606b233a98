package org.holdpoint.stats;

import java.util.List;

/**
 * Capability of one group by the percentile method on a fitted distribution (docs/methods.md §14).
 *
 * @param fit       the fitted distribution
 * @param lsl       lower specification limit, or null
 * @param usl       upper specification limit, or null
 * @param alpha     1 − the level of the lower confidence bound
 * @param x00135    the 0.135 % quantile of the fit
 * @param x50       the median of the fit
 * @param x99865    the 99.865 % quantile of the fit
 * @param pp        (USL − LSL)/(X99.865 − X0.135), both limits only
 * @param ppu       (USL − X50)/(X99.865 − X50), or null without USL
 * @param ppl       (X50 − LSL)/(X50 − X0.135), or null without LSL
 * @param ppk       min(Ppu, Ppl), or the one that exists
 * @param ppkLower  the parametric-bootstrap lower confidence bound of Ppk, or null when it could not be formed
 * @param ppmBelow  10⁶·P(X &lt; LSL) under the fit, or null without LSL
 * @param ppmAbove  10⁶·P(X &gt; USL) under the fit (its own tail), or null without USL
 * @param seed      the seed of the bootstrap's generator
 * @param resamples the number of bootstrap resamples
 * @param notes     plain-words notes
 */
public record PercentileCapabilityResult(FittedDistribution fit, Double lsl, Double usl, double alpha, double x00135,
        double x50, double x99865, Double pp, Double ppu, Double ppl, Double ppk, Double ppkLower, Double ppmBelow,
        Double ppmAbove, long seed, int resamples, List<String> notes) {

    /** Copies the notes. */
    public PercentileCapabilityResult {
        notes = List.copyOf(notes);
    }

    /**
     * Whether the capability requirement is met, judged on the lower bound of Ppk as for the normal model.
     *
     * @param requirement the required index
     * @return ppkLower &gt; requirement, or null when the bound is undefined
     */
    public Boolean meets(double requirement) {
        return ppkLower == null ? null : ppkLower > requirement;
    }
}
