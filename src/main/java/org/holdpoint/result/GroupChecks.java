package org.holdpoint.result;

import java.util.List;
import org.holdpoint.stats.CapabilityResult;
import org.holdpoint.stats.EsdResult;
import org.holdpoint.stats.GrubbsResult;
import org.holdpoint.stats.Lag1Result;
import org.holdpoint.stats.NormalityResult;
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
 * @param capability capability against the specification limits, or null without limits
 */
public record GroupChecks(NormalityResult normality, GrubbsResult grubbs, EsdResult esd, List<FlaggedValue> flagged,
        Lag1Result lag1, RunsResult runs, Integer lots, CapabilityResult capability) {

    /** Copies the list. */
    public GroupChecks {
        flagged = flagged == null ? List.of() : List.copyOf(flagged);
    }
}
