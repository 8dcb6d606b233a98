package org.holdpoint.stats;

/** How a rank test's p-value and interval were computed, with the word every output shows. */
public enum RankMethod {
    /** The exact permutation distribution (no ties, both samples below 50, no zero differences). */
    EXACT("exact"),
    /** The normal approximation with tie and continuity corrections. */
    NORMAL("normal");

    private final String word;

    RankMethod(String word) {
        this.word = word;
    }

    /** @return "exact" or "normal", the JSON {@code method} value */
    public String word() {
        return word;
    }
}
