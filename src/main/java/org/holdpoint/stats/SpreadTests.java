package org.holdpoint.stats;


/**
 * Tests about the spread of the after group relative to the before group: the F-test of the variance
 * ratio with its confidence interval, the upper bound on the sd ratio against a growth limit, and the
 * Brown–Forsythe robust test.
 *
 * <p>Sources: Snedecor &amp; Cochran 1989, Statistical Methods, 8th ed. (F-test); Levene 1960, in
 * Olkin (ed.), Contributions to Probability and Statistics, 278–292; Brown &amp; Forsythe 1974, JASA
 * 69:364–367. Every tail is computed from its own side ({@link Distributions}).
 */
public final class SpreadTests {
    private SpreadTests() {
    }

    /**
     * The F-test of σ_a²/σ_b² = 1 with its (1 − α) interval [f/F_{1−α/2}(ν1,ν2), f/F_{α/2}(ν1,ν2)].
     *
     * @param before the before group's summary, n ≥ 2, variance &gt; 0
     * @param after  the after group's summary, n ≥ 2, variance &gt; 0
     * @param alpha  in (0, 1)
     * @return the result
     * @throws StatsException if a group has fewer than 2 values or zero variance
     */
    public static VarianceRatioResult fTest(SummaryStatistics before, SummaryStatistics after, double alpha) {
        Alpha.check(alpha);
        checkSpread(before, after);
        double f = after.variance() / before.variance();
        double df1 = after.n() - 1.0;
        double df2 = before.n() - 1.0;
        double p = Math.min(1, 2 * Math.min(Distributions.fCdf(f, df1, df2), Distributions.fUpper(f, df1, df2)));
        double lo = f / Distributions.fQuantile(1 - alpha / 2, df1, df2);
        double hi = f / Distributions.fQuantile(alpha / 2, df1, df2);
        return new VarianceRatioResult(f, f, df1, df2, p, lo, hi, 1 - alpha);
    }

    /**
     * The upper one-sided (1 − α) bound on σ_a/σ_b, B = √(f/F_α(ν1, ν2)), judged against a limit λ:
     * met iff P(F_{ν1,ν2} ≤ f/λ²) &lt; α.
     *
     * @param before the before group's summary
     * @param after  the after group's summary
     * @param limit  λ &gt; 0
     * @param alpha  in (0, 0.5)
     * @return the result
     */
    public static SdGrowthResult sdGrowth(SummaryStatistics before, SummaryStatistics after, double limit,
            double alpha) {
        Alpha.checkBelowHalf(alpha);
        if (!(limit > 0) || !Double.isFinite(limit)) {
            throw new StatsException("the sd-growth limit must be a positive number, got %s", limit);
        }
        checkSpread(before, after);
        double f = after.variance() / before.variance();
        double df1 = after.n() - 1.0;
        double df2 = before.n() - 1.0;
        double bound = Math.sqrt(f / Distributions.fQuantile(alpha, df1, df2));
        double p = Distributions.fCdf(f / (limit * limit), df1, df2);
        return new SdGrowthResult(limit, Math.sqrt(f), bound, p, 1 - alpha, p < alpha);
    }

    private static void checkSpread(SummaryStatistics before, SummaryStatistics after) {
        if (before.n() < 2 || after.n() < 2) {
            throw new StatsException("a variance comparison needs at least 2 values per group, got %d before and %d after",
                    before.n(), after.n());
        }
        if (!(before.variance() > 0)) {
            throw new StatsException("the before group has zero spread, so the variance ratio is undefined");
        }
        if (!(after.variance() > 0)) {
            throw new StatsException("the after group has zero spread, so the variance ratio is undefined");
        }
    }

    /**
     * Brown–Forsythe: one-way ANOVA on z_ij = |x_ij − median_i| (type-7 medians), F =
     * (N − k)Σn_i(z̄_i − z̄)² / ((k − 1)ΣΣ(z_ij − z̄_i)²), upper tail on (k − 1, N − k) df.
     *
     * @param groups two or more samples, each with ≥ 2 values
     * @return the result, or null when the within-group sum of squares is zero (F undefined)
     */
    public static LeveneResult brownForsythe(Sample... groups) {
        int k = groups.length;
        if (k < 2) {
            throw new StatsException("Brown-Forsythe needs at least 2 groups, got %d", k);
        }
        long total = 0;
        double[][] z = new double[k][];
        for (int g = 0; g < k; g++) {
            double[] x = groups[g].values();
            if (x.length < 2) {
                throw new StatsException("Brown-Forsythe needs at least 2 values per group, group %d has %d", g + 1,
                        x.length);
            }
            double med = Quantiles.median(groups[g].sorted());
            z[g] = new double[x.length];
            for (int i = 0; i < x.length; i++) {
                z[g][i] = Math.abs(x[i] - med);
            }
            total += x.length;
        }
        double[] means = new double[k];
        double grand = 0;
        for (int g = 0; g < k; g++) {
            Moments m = Moments.of(Sample.of(z[g]), Moments.Reference.common(Sample.of(0.0)));
            means[g] = m.meanResidual;
            grand += m.meanResidual * z[g].length;
        }
        grand /= total;
        double between = 0;
        double within = 0;
        double totalSq = 0;
        for (int g = 0; g < k; g++) {
            between += z[g].length * (means[g] - grand) * (means[g] - grand);
            for (double v : z[g]) {
                within += (v - means[g]) * (v - means[g]);
                totalSq += v * v;
            }
        }
        if (within <= 1e-20 * totalSq || within == 0) {
            return null;
        }
        double df1 = k - 1.0;
        double df2 = total - (double) k;
        double f = (df2 * between) / (df1 * within);
        return new LeveneResult(f, df1, df2, Distributions.fUpper(f, df1, df2));
    }
}
