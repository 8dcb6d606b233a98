package org.holdpoint.stats;

/** The layout of a planned trial. */
public enum Design {
    /**
     * Two independent groups, before (n₁) and after (n₂), pooled sd: se = σ·√(1/n₁ + 1/n₂),
     * ν = n₁ + n₂ − 2.
     */
    PARALLEL,
    /** The same m units measured before and after, σ the sd of the differences: se = σ/√m, ν = m − 1. */
    PAIRED
}
