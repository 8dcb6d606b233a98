package org.holdpoint.stats;

/**
 * Result of the Brown–Forsythe test (Levene's test on absolute deviations from the group medians).
 *
 * @param f   the one-way ANOVA F on z = |x − median|
 * @param df1 k − 1
 * @param df2 N − k
 * @param p   upper tail P(F ≥ f)
 */
public record LeveneResult(double f, double df1, double df2, double p) {
}
