package org.holdpoint.stats;

/**
 * The number of parts to test for a pass/fail characteristic: with at most {@code failures} failures
 * among n parts, the reliability is at least R with confidence C (one-sided Clopper–Pearson bound).
 *
 * @param confidence         C
 * @param reliability        R
 * @param failures           c, the failures allowed
 * @param n                  the smallest such n
 * @param achievedConfidence 1 − P(X ≤ c; n, 1 − R), at least C
 */
public record SuccessRunResult(double confidence, double reliability, int failures, int n,
        double achievedConfidence) {

    /** Validates the record. */
    public SuccessRunResult {
        Checks.probability(confidence, "confidence");
        Checks.probability(reliability, "reliability");
        Checks.atLeast(failures, 0, "failures");
        Checks.atLeast(n, failures + 1, "n");
        Checks.probability(achievedConfidence, "achieved confidence");
    }
}
