package org.holdpoint.stats;

/**
 * Result of the runs test about the median (Wald &amp; Wolfowitz 1940; Swed &amp; Eisenhart 1943).
 *
 * @param n          number of values given
 * @param median     the type-7 median the values were coded against
 * @param above      n₁, values above the median
 * @param below      n₂, values below the median
 * @param atMedian   values equal to the median, dropped
 * @param runs       R, the number of runs of + and −
 * @param expected   E[R] = 1 + 2n₁n₂/N
 * @param sd         √Var R, Var R = 2n₁n₂(2n₁n₂ − N)/(N²(N − 1))
 * @param z          (R − E[R])/sd in the normal branch, else null
 * @param p          two-sided p-value
 * @param method     exact or normal
 */
public record RunsResult(int n, double median, int above, int below, int atMedian, int runs, double expected,
        double sd, Double z, double p, RankMethod method) {

    /** Validates the record. */
    public RunsResult {
        if (!(p >= 0 && p <= 1) || runs < 1) {
            throw new StatsException("invalid runs result: R = %d, p = %s", runs, p);
        }
    }

    /** @return whether there are fewer runs than expected (drift or positive serial correlation) */
    public boolean tooFewRuns() {
        return runs < expected;
    }
}
