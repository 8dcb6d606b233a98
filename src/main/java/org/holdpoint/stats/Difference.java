package org.holdpoint.stats;

/**
 * The estimated difference after − before with its standard error and degrees of freedom, shared by
 * the t-test and the equivalence test of the same design.
 *
 * @param method   the design and variance assumption
 * @param estimate the difference of means (or mean paired difference), after − before
 * @param se       its standard error, &gt; 0
 * @param df       the t degrees of freedom (fractional for Welch)
 * @param nBefore  size of the before group (number of pairs when paired)
 * @param nAfter   size of the after group (number of pairs when paired)
 */
public record Difference(LocationMethod method, double estimate, double se, double df, long nBefore, long nAfter) {

    /** Validates the record. */
    public Difference {
        if (!Double.isFinite(estimate)) {
            throw new StatsException("the difference is not finite (%s)", estimate);
        }
        if (!(se > 0) || !Double.isFinite(se)) {
            throw new StatsException("the standard error of the difference is %s: both groups have zero spread, "
                    + "so the t statistic is undefined", se);
        }
        if (!(df > 0)) {
            throw new StatsException("degrees of freedom must be positive, got %s", df);
        }
    }

    /**
     * Welch (1947) / Satterthwaite (1946): se = √(v_a + v_b) with v = s²/n, and
     * ν = 1/(w²/(n_a − 1) + (1 − w)²/(n_b − 1)), w = v_a/(v_a + v_b), a form that cannot overflow.
     */
    static Difference welch(double d, SummaryStatistics before, SummaryStatistics after) {
        checkTwoEach(before, after);
        double va = after.variance() / after.n();
        double vb = before.variance() / before.n();
        double sum = va + vb;
        if (!(sum > 0)) {
            throw zeroSpread();
        }
        double w = va / sum;
        double wb = vb / sum;
        double df = 1 / (w * w / (after.n() - 1) + wb * wb / (before.n() - 1));
        return new Difference(LocationMethod.WELCH, d, Math.sqrt(sum), df, before.n(), after.n());
    }

    /** Student's pooled two-sample t: s_p² = ((n_a−1)s_a² + (n_b−1)s_b²)/(n_a+n_b−2), se = s_p√(1/n_a+1/n_b). */
    static Difference pooled(double d, SummaryStatistics before, SummaryStatistics after) {
        checkTwoEach(before, after);
        double df = (double) after.n() + before.n() - 2;
        double sp2 = ((after.n() - 1) * after.variance() + (before.n() - 1) * before.variance()) / df;
        if (!(sp2 > 0)) {
            throw zeroSpread();
        }
        double se = Math.sqrt(sp2 * (1.0 / after.n() + 1.0 / before.n()));
        return new Difference(LocationMethod.POOLED, d, se, df, before.n(), after.n());
    }

    /** Student (1908) one-sample t on paired differences: se = s_D/√n, ν = n − 1. */
    static Difference paired(SummaryStatistics differences) {
        if (differences.n() < 2) {
            throw new StatsException("a paired comparison needs at least 2 pairs, got %d", differences.n());
        }
        if (!(differences.variance() > 0)) {
            throw new StatsException("all %d paired differences are equal, so the paired t statistic is undefined",
                    differences.n());
        }
        double se = Math.sqrt(differences.variance() / differences.n());
        return new Difference(LocationMethod.PAIRED, differences.mean(), se, differences.n() - 1.0,
                differences.n(), differences.n());
    }

    private static void checkTwoEach(SummaryStatistics before, SummaryStatistics after) {
        if (before.n() < 2) {
            throw new StatsException("the before group needs at least 2 values, got %d", before.n());
        }
        if (after.n() < 2) {
            throw new StatsException("the after group needs at least 2 values, got %d", after.n());
        }
    }

    private static StatsException zeroSpread() {
        return new StatsException("both groups have zero spread (every value in each group is the same), "
                + "so the t statistic is undefined");
    }

    /** @return the t statistic estimate/se */
    public double t() {
        return estimate / se;
    }
}
