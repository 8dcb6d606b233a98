package org.holdpoint.stats;

/** The conclusion of an equivalence (or one-sided margin) test, always shown in words. */
public enum Conclusion {
    /** The (1 − 2α) interval lies inside (L, U). */
    EQUIVALENT("equivalent", true),
    /** The interval lies entirely outside (L, U). */
    NOT_EQUIVALENT("not equivalent", false),
    /** The interval straddles a bound, or touches it: more data are needed. */
    INCONCLUSIVE("inconclusive", false),
    /** Lower margin only: the interval's lower end lies above L. */
    NON_INFERIOR("non-inferior", true),
    /** Lower margin only: the interval's upper end lies below L. */
    INFERIOR("inferior", false),
    /** Upper margin only: the interval's upper end lies below U. */
    NON_SUPERIOR("non-superior", true),
    /** Upper margin only: the interval's lower end lies above U. */
    SUPERIOR("superior", false);

    private final String words;
    private final boolean claimHolds;

    Conclusion(String words, boolean claimHolds) {
        this.words = words;
        this.claimHolds = claimHolds;
    }

    /** @return the conclusion in words, as every output shows it */
    public String words() {
        return words;
    }

    /** @return whether the margin claim is shown (equivalent, non-inferior or non-superior) */
    public boolean claimHolds() {
        return claimHolds;
    }
}
