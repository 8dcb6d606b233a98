package org.holdpoint.stats;

/** Whether the two-sample location tests assume equal population variances. */
public enum VarianceAssumption {
    /** Welch's test with the Welch–Satterthwaite df (the default; no assumption of equal variances). */
    UNEQUAL,
    /** The pooled (Student) two-sample test, only when the user asserts equal variances. */
    EQUAL
}
