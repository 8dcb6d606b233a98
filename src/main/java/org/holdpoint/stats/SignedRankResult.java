package org.holdpoint.stats;

import java.util.List;

/**
 * Result of the Wilcoxon signed-rank test on paired differences after − before.
 *
 * @param nPairs      number of pairs given
 * @param zeros       number of zero differences, dropped from the statistic, the estimate and the interval
 * @param nUsed       n' = nPairs − zeros
 * @param twiceV      2V, exact: V = Σ_{d_i &gt; 0} midrank(|d_i|)
 * @param p           two-sided p-value, or null when undefined
 * @param z           the continuity-corrected normal score (normal branch), or null
 * @param method      exact or normal
 * @param shift       Hodges–Lehmann estimate: the median of the Walsh averages fl(d_i + d_j)/2, i ≤ j
 * @param ci          the (1 − α) interval
 * @param equivalence the (1 − 2α) interval judged against the margin, or null without a margin
 * @param notes       plain-words notes
 */
public record SignedRankResult(int nPairs, int zeros, int nUsed, long twiceV, Double p, Double z,
        RankMethod method, double shift, RankInterval ci, RankEquivalence equivalence, List<String> notes) {

    /** Validates the record. */
    public SignedRankResult {
        if (nUsed < 1 || zeros < 0 || nUsed + zeros != nPairs) {
            throw new StatsException("inconsistent pair counts: %d pairs, %d zeros, %d used", nPairs, zeros, nUsed);
        }
        if (p != null && !(p >= 0 && p <= 1)) {
            throw new StatsException("p must be a probability, got %s", p);
        }
        notes = List.copyOf(notes);
    }

    /** @return V = twiceV/2, the JSON {@code v} */
    public double v() {
        return twiceV / 2.0;
    }

    /** @return the lower end of the (1 − α) interval */
    public double ciLower() {
        return ci.lower();
    }

    /** @return the upper end of the (1 − α) interval */
    public double ciUpper() {
        return ci.upper();
    }
}
