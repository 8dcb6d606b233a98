package org.holdpoint.result;

import java.util.List;
import org.holdpoint.stats.CapabilityResult;
import org.holdpoint.stats.EsdResult;
import org.holdpoint.stats.GrubbsResult;
import org.holdpoint.stats.Lag1Result;
import org.holdpoint.stats.NormalityResult;
import org.holdpoint.stats.PercentileCapabilityResult;
import org.holdpoint.stats.RunsResult;

/**
 * The checks of one group: shape, outliers, order and capability. A check that does not apply is null.
 *
 * @param normality  Shapiro–Wilk and Anderson–Darling
 * @param grubbs     Grubbs' two-sided test for one outlier, or null
 * @param esd        the generalized ESD for up to k outliers, or null
 * @param flagged    the values flagged by the ESD (or by Grubbs when the ESD does not apply), with origins
 * @param lag1       lag-1 autocorrelation in run order (only with a sequence column), or null
 * @param runs       runs test about the median in run order (only with a sequence column), or null
 * @param lots       the number of distinct lots, or null without a lot column
 * @param capability capability against the specification limits by the normal model, or null without limits
 *                   or when a fitted distribution is used instead
 * @param percentile capability by the percentile method on the fitted distribution, or null when the normal
 *                   model is used (docs/methods.md §14)
 * @param outliersOn what the outlier tests ran on: the raw values, or the normal scores of the fitted family
 * @param tolerance  the tolerance interval when the criteria ask for one (docs/methods.md §17), or null
 */
public record GroupChecks(NormalityResult normality, GrubbsResult grubbs, EsdResult esd, List<FlaggedValue> flagged,
        Lag1Result lag1, RunsResult runs, Integer lots, CapabilityResult capability,
        PercentileCapabilityResult percentile, String outliersOn, org.holdpoint.stats.ToleranceInterval tolerance) {

    /** Copies the list. */
    public GroupChecks {
        flagged = flagged == null ? List.of() : List.copyOf(flagged);
    }

    /** @return the lower bound of Ppk by the model in use, or null */
    public Double ppkLower() {
        return percentile != null ? percentile.ppkLower() : capability != null ? capability.ppkLower() : null;
    }

    /** @return Ppk by the model in use, or null */
    public Double ppk() {
        return percentile != null ? percentile.ppk() : capability != null ? capability.ppk() : null;
    }

    /** @return 1 − the level of the Ppk bound, or NaN without capability */
    public double capabilityAlpha() {
        return percentile != null ? percentile.alpha() : capability != null ? capability.alpha() : Double.NaN;
    }

    /**
     * @return how the indices were computed, in words: "" for the normal model, else e.g. " (weibull fit,
     *         percentile method)", to follow the word Ppk
     */
    public String modelWords() {
        return percentile == null ? "" : " (" + percentile.fit().family().key() + " fit, percentile method)";
    }

    /** @return whether any capability was computed */
    public boolean hasCapability() {
        return capability != null || percentile != null;
    }
}
