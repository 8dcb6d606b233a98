package org.holdpoint.stats;

import java.util.List;

/**
 * Result of the Wilcoxon–Mann–Whitney rank-sum comparison of an after with a before sample.
 *
 * @param nBefore     size of the before sample (n)
 * @param nAfter      size of the after sample (m)
 * @param twiceU      2U, exact: U = #{a_i &gt; b_j} + ½#{a_i = b_j}, the Mann–Whitney U of the after sample
 * @param p           two-sided p-value, or null when undefined (all values equal)
 * @param z           the continuity-corrected normal score (normal branch), or null
 * @param method      exact or normal
 * @param shift       Hodges–Lehmann shift: the median of the m·n differences fl(a_i − b_j)
 * @param ci          the (1 − α) interval of the shift
 * @param equivalence the (1 − 2α) interval judged against the margin, or null without a margin
 * @param notes       plain-words notes (level not reached, undefined p, ...)
 */
public record RankSumResult(int nBefore, int nAfter, long twiceU, Double p, Double z, RankMethod method,
        double shift, RankInterval ci, RankEquivalence equivalence, List<String> notes) {

    /** Validates the record. */
    public RankSumResult {
        if (nBefore < 1 || nAfter < 1) {
            throw new StatsException("both samples need at least one value");
        }
        if (p != null && !(p >= 0 && p <= 1)) {
            throw new StatsException("p must be a probability, got %s", p);
        }
        notes = List.copyOf(notes);
    }

    /** @return U = twiceU/2, the JSON {@code u} */
    public double u() {
        return twiceU / 2.0;
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
