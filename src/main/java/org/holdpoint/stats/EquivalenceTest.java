package org.holdpoint.stats;

/**
 * Schuirmann's two one-sided tests (TOST) for equivalence of the means of a before and an after
 * group against a margin (L, U), and the one-sided non-inferiority (only L) and mirror (only U)
 * forms.
 *
 * <p>With the d, se and ν of the matching t-test: tL = (d − L)/se, pL = P(T_ν ≥ tL);
 * tU = (d − U)/se, pU = P(T_ν ≤ tU); p = max(pL, pU); the (1 − 2α) interval is d ∓ t_{1−α,ν}·se.
 * Each one-sided test runs at α (intersection–union, Berger 1982). The conclusion is decided from the
 * tails (every inequality strict): equivalent when pL &lt; α and pU &lt; α; not equivalent when
 * F_ν(tL) &lt; α or F_ν(−tU) &lt; α (the interval lies wholly outside); otherwise inconclusive.
 *
 * <p>Sources: Schuirmann 1987, J. Pharmacokinet. Biopharm. 15:657–680; Berger &amp; Hsu 1996,
 * Stat. Sci. 11:283–319; Wellek 2010, Testing Statistical Hypotheses of Equivalence and
 * Noninferiority, 2nd ed.
 */
public final class EquivalenceTest {
    private static final EquivalenceTest DEFAULTS = new EquivalenceTest(null, VarianceAssumption.UNEQUAL, 0.05);

    private final Margin margin;
    private final VarianceAssumption variances;
    private final double alpha;

    private EquivalenceTest(Margin margin, VarianceAssumption variances, double alpha) {
        this.margin = margin;
        this.variances = variances;
        this.alpha = alpha;
    }

    /**
     * The defaults: no margin yet (one must be set before testing), Welch (unequal variances),
     * α = 0.05 per one-sided test (a 90 % interval).
     *
     * @return the default test
     */
    public static EquivalenceTest withDefaults() {
        return DEFAULTS;
    }

    /**
     * @param newMargin the margin (L, U) or a one-sided margin
     * @return a test with that margin
     */
    public EquivalenceTest withMargin(Margin newMargin) {
        if (newMargin == null) {
            throw new StatsException("a margin is required");
        }
        return new EquivalenceTest(newMargin, variances, alpha);
    }

    /**
     * @param assumption the variance assumption of the two-sample form
     * @return a test with that assumption
     */
    public EquivalenceTest with(VarianceAssumption assumption) {
        return new EquivalenceTest(margin, assumption, alpha);
    }

    /**
     * @param newAlpha the level of each one-sided test, in (0, 0.5)
     * @return a test with that α
     */
    public EquivalenceTest withAlpha(double newAlpha) {
        return new EquivalenceTest(margin, variances, Alpha.checkBelowHalf(newAlpha));
    }

    /**
     * Two-sample TOST on raw data.
     *
     * @param before the before sample, ≥ 2 values
     * @param after  the after sample, ≥ 2 values
     * @return the result
     */
    public EquivalenceResult test(Sample before, Sample after) {
        GroupPair pair = GroupPair.of(before, after);
        return test(TTest.withDefaults().with(variances).difference(pair.difference(), pair.before().summary(),
                pair.after().summary()));
    }

    /**
     * TOST of the ratio after/before against a ratio margin: the two one-sided tests on the logarithms of the
     * values against (ln L, ln U) — Welch or pooled for independent groups, paired t for pairs — shown on the
     * ratio scale: the estimate is the ratio of the geometric means (the median ratio for lognormal data) and
     * the interval its exponential (docs/methods.md §3).
     *
     * @param before the before values (all above 0)
     * @param after  the after values (all above 0)
     * @param paired whether the values are pairs, in the same order
     * @return the result with {@link EquivalenceResult#ratio()} set
     * @throws StatsException when no ratio margin was set or a value is not above 0
     */
    public EquivalenceResult testRatio(Sample before, Sample after, boolean paired) {
        if (margin == null || !margin.ratio()) {
            throw new StatsException("no ratio margin was set");
        }
        Sample lb = logs(before, "before");
        Sample la = logs(after, "after");
        EquivalenceTest onLogs = withMargin(margin.logScale());
        EquivalenceResult r = paired ? onLogs.testPaired(lb, la) : onLogs.test(lb, la);
        return r.onRatioScale(margin);
    }

    private static Sample logs(Sample s, String group) {
        double[] l = new double[s.size()];
        int bad = 0;
        for (int i = 0; i < l.length; i++) {
            double v = s.value(i);
            if (!(v > 0)) {
                bad++;
            }
            l[i] = Math.log(v);
        }
        if (bad > 0) {
            throw new StatsException("a ratio margin needs values above 0; %d value(s) of the %s group are not", bad,
                    group);
        }
        return Sample.of(l);
    }

    /**
     * Two-sample TOST on summary statistics.
     *
     * @param before n, mean, variance of the before group
     * @param after  n, mean, variance of the after group
     * @return the result
     */
    public EquivalenceResult test(SummaryStatistics before, SummaryStatistics after) {
        return test(TTest.withDefaults().with(variances).difference(after.mean() - before.mean(), before, after));
    }

    /**
     * Paired TOST on the differences after_i − before_i.
     *
     * @param before the before values, unit by unit
     * @param after  the after values of the same units in the same order
     * @return the result
     */
    public EquivalenceResult testPaired(Sample before, Sample after) {
        return test(Difference.paired(Descriptives.of(GroupPair.pairedDifferences(before, after)).summary()));
    }

    /**
     * Paired TOST on the summary statistics of the differences.
     *
     * @param differences n, mean and variance of after − before
     * @return the result
     */
    public EquivalenceResult testPaired(SummaryStatistics differences) {
        return test(Difference.paired(differences));
    }

    /**
     * TOST on an already formed difference.
     *
     * @param d the difference with its se and df
     * @return the result
     * @throws StatsException if no margin was set
     */
    public EquivalenceResult test(Difference d) {
        if (margin == null) {
            throw new StatsException("no equivalence margin was set");
        }
        if (margin.ratio()) {
            throw new StatsException("a ratio margin is tested on the logarithms of the values (testRatio)");
        }
        double est = d.estimate();
        double se = d.se();
        double df = d.df();
        Double tL = null;
        Double tU = null;
        Double pL = null;
        Double pU = null;
        boolean lowerRejected = true;
        boolean upperRejected = true;
        boolean outside = false;
        if (margin.lower() != null) {
            tL = (est - margin.lower()) / se;
            pL = Distributions.tCdf(-tL, df);
            lowerRejected = pL < alpha;
            outside |= Distributions.tCdf(tL, df) < alpha;
        }
        if (margin.upper() != null) {
            tU = (est - margin.upper()) / se;
            pU = Distributions.tCdf(tU, df);
            upperRejected = pU < alpha;
            outside |= Distributions.tCdf(-tU, df) < alpha;
        }
        double p = Math.max(pL == null ? 0 : pL, pU == null ? 0 : pU);
        double half = Distributions.tUpperQuantile(alpha, df) * se;
        return new EquivalenceResult(d.method(), margin.lower(), margin.upper(), est, se, df, tL, tU, pL, pU, p,
                est - half, est + half, 1 - 2 * alpha, alpha, decide(lowerRejected && upperRejected, outside));
    }

    private Conclusion decide(boolean bothRejected, boolean outside) {
        return switch (margin.claim()) {
            case EQUIVALENCE -> bothRejected ? Conclusion.EQUIVALENT
                    : outside ? Conclusion.NOT_EQUIVALENT : Conclusion.INCONCLUSIVE;
            case NON_INFERIORITY -> bothRejected ? Conclusion.NON_INFERIOR
                    : outside ? Conclusion.INFERIOR : Conclusion.INCONCLUSIVE;
            case NON_SUPERIORITY -> bothRejected ? Conclusion.NON_SUPERIOR
                    : outside ? Conclusion.SUPERIOR : Conclusion.INCONCLUSIVE;
        };
    }
}
