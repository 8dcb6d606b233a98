package org.holdpoint.stats;

/** Which distribution a rank test may use. */
public enum RankMethodRule {
    /**
     * Exact when it applies (rank sum: both samples below 50 and no ties in the combined sample;
     * signed rank: fewer than 50 non-zero differences, no ties in |d| and no zero differences),
     * otherwise the normal approximation.
     */
    AUTOMATIC,
    /** Always the normal approximation with tie and continuity corrections. */
    NORMAL
}
