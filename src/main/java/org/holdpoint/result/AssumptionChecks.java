package org.holdpoint.result;

import org.holdpoint.stats.FamilySelection;
import org.holdpoint.stats.RankSumResult;
import org.holdpoint.stats.SignedRankResult;

/**
 * The checks behind a t-based conclusion and the distribution-free comparison.
 *
 * @param before            checks of the before group
 * @param after             checks of the after group
 * @param rankSum           Wilcoxon–Mann–Whitney with Hodges–Lehmann shift (independent), or null
 * @param signedRank        Wilcoxon signed rank with Hodges–Lehmann shift (paired), or null
 * @param capabilityMet     whether the after group's lower Ppk bound exceeds the requirement, or null
 * @param recommendation    which comparison the data support, with the reason in plain words
 * @param distribution      the family capability is judged by and why, or null without limits
 * @param stability         control charts in run order, or null when no run order is known
 */
public record AssumptionChecks(GroupChecks before, GroupChecks after, RankSumResult rankSum,
        SignedRankResult signedRank, Boolean capabilityMet, String recommendation, FamilySelection distribution,
        Stability stability) {
}
