package org.holdpoint.stats;

/**
 * The rank-based equivalence conclusion: the (1 − 2α) Hodges–Lehmann interval judged against a
 * margin by the strict interval rules of {@link EquivalenceTest} (equivalent iff L &lt; lower and
 * upper &lt; U; not equivalent iff upper &lt; L or lower &gt; U; otherwise inconclusive, including a
 * bound exactly on a margin). When the interval's level could not be reached the claim is not made
 * (inconclusive).
 *
 * @param margin     the margin (L, U) or a one-sided margin
 * @param alpha      α of each one-sided statement
 * @param interval   the (1 − 2α) interval, with its achieved level
 * @param conclusion the conclusion in words
 */
public record RankEquivalence(Margin margin, double alpha, RankInterval interval, Conclusion conclusion) {

    /** Validates the record. */
    public RankEquivalence {
        if (margin == null || interval == null || conclusion == null) {
            throw new StatsException("margin, interval and conclusion are required");
        }
    }

    /** @return whether the claim of the margin holds */
    public boolean equivalent() {
        return conclusion.claimHolds();
    }

    /**
     * Judges a (1 − 2α) interval against a margin by the strict interval rules.
     *
     * @param margin   the margin
     * @param alpha    α
     * @param interval the interval at level 1 − 2α
     * @return the conclusion
     */
    static RankEquivalence judge(Margin margin, double alpha, RankInterval interval) {
        double lo = interval.lower();
        double hi = interval.upper();
        Double l = margin.lower();
        Double u = margin.upper();
        Conclusion c = switch (margin.claim()) {
            case EQUIVALENCE -> l < lo && hi < u ? Conclusion.EQUIVALENT
                    : hi < l || lo > u ? Conclusion.NOT_EQUIVALENT : Conclusion.INCONCLUSIVE;
            case NON_INFERIORITY -> lo > l ? Conclusion.NON_INFERIOR
                    : hi < l ? Conclusion.INFERIOR : Conclusion.INCONCLUSIVE;
            case NON_SUPERIORITY -> hi < u ? Conclusion.NON_SUPERIOR
                    : lo > u ? Conclusion.SUPERIOR : Conclusion.INCONCLUSIVE;
        };
        if (c.claimHolds() && !interval.levelReached()) {
            c = Conclusion.INCONCLUSIVE;
        }
        return new RankEquivalence(margin, alpha, interval, c);
    }
}
