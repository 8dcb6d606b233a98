package org.holdpoint.stats;

/**
 * Sample size for demonstrating a reliability R with confidence C on a pass/fail characteristic.
 *
 * <p>Zero failures allowed (success run): n = ⌈ln(1 − C)/ln R⌉, ln R formed as log1p(−(1 − R)); the
 * ceiling is taken of x − 1e-9 and then verified, Rⁿ ≤ 1 − C &lt; R^(n−1), so a quotient that lands a
 * rounding error above an integer does not add a part. With c failures allowed: the smallest n with
 * P(X ≤ c; n, 1 − R) = I_R(n − c, c + 1) ≤ 1 − C, the one-sided Clopper–Pearson bound (Clopper &amp;
 * Pearson 1934, Biometrika 26:404–413; Meeker, Hahn &amp; Escobar 2017, Statistical Intervals, 2nd ed.).
 * That probability falls as n grows, so the smallest n is found by doubling and bisection.
 */
public final class SuccessRunPlan {
    private static final int MAX_N = Integer.MAX_VALUE / 2;
    private static final double CEILING_GUARD = 1e-9;
    private static final SuccessRunPlan DEFAULTS = new SuccessRunPlan(0.95, 0.95, 0);

    private final double confidence;
    private final double reliability;
    private final int failures;

    private SuccessRunPlan(double confidence, double reliability, int failures) {
        this.confidence = confidence;
        this.reliability = reliability;
        this.failures = failures;
    }

    /**
     * The defaults: confidence C = 0.95, reliability R = 0.95, no failure allowed.
     *
     * @return the default plan
     */
    public static SuccessRunPlan withDefaults() {
        return DEFAULTS;
    }

    /**
     * @param c the confidence C, in (0, 1)
     * @return a plan with that confidence
     */
    public SuccessRunPlan withConfidence(double c) {
        return new SuccessRunPlan(open(c, "confidence"), reliability, failures);
    }

    /**
     * @param r the reliability R to demonstrate, in (0, 1)
     * @return a plan with that reliability
     */
    public SuccessRunPlan withReliability(double r) {
        return new SuccessRunPlan(confidence, open(r, "reliability"), failures);
    }

    /**
     * @param c the number of failures allowed, ≥ 0
     * @return a plan with that allowance
     */
    public SuccessRunPlan withFailures(int c) {
        return new SuccessRunPlan(confidence, reliability, Checks.atLeast(c, 0, "the number of failures allowed"));
    }

    /**
     * The smallest n (see the class description).
     *
     * @return n with its achieved confidence
     * @throws StatsException if n would exceed about 10⁹
     */
    public SuccessRunResult sampleSize() {
        int n = failures == 0 ? zeroFailures() : withFailures();
        return new SuccessRunResult(confidence, reliability, failures, n, 1 - failingProbability(n));
    }

    /**
     * P(X ≤ c; n, 1 − R) = I_R(n − c, c + 1): the chance of passing the test with reliability exactly R.
     *
     * @param n the number of parts, &gt; c
     * @return the probability
     */
    public double failingProbability(int n) {
        Checks.atLeast(n, failures + 1, "n");
        if (failures == 0) {
            return Math.pow(reliability, n);
        }
        return Distributions.regularizedBeta(reliability, 1 - reliability, (double) n - failures, failures + 1.0);
    }

    private double logReliability() {
        return Math.log1p(-(1 - reliability));
    }

    private int zeroFailures() {
        double x = Math.log1p(-confidence) / logReliability();
        if (!(x < MAX_N)) {
            throw tooMany();
        }
        int n = (int) Math.max(1, Math.ceil(x - CEILING_GUARD));
        double limit = 1 - confidence;
        // verified with pow, which is within an ulp and exact where Rⁿ is representable (0.5³ = 0.125)
        while (Math.pow(reliability, n) > limit) {
            n++;
        }
        while (n > 1 && Math.pow(reliability, n - 1) <= limit) {
            n--;
        }
        return n;
    }

    private int withFailures() {
        double limit = 1 - confidence;
        long lo = failures + 1L;
        if (failingProbability((int) lo) <= limit) {
            return (int) lo;
        }
        long hi = 2 * lo;
        while (failingProbability((int) hi) > limit) {
            lo = hi;
            hi *= 2;
            if (hi > MAX_N) {
                throw tooMany();
            }
        }
        // invariant: P(lo) > limit ≥ P(hi)
        while (hi - lo > 1) {
            long mid = (lo + hi) >>> 1;
            if (failingProbability((int) mid) <= limit) {
                hi = mid;
            } else {
                lo = mid;
            }
        }
        return (int) hi;
    }

    private StatsException tooMany() {
        return new StatsException("reliability %s with confidence %s needs more than %d parts", reliability,
                confidence, MAX_N);
    }

    private static double open(double p, String name) {
        if (p > 0 && p < 1) {
            return p;
        }
        throw new StatsException("the %s must lie strictly between 0 and 1, got %s", name, p);
    }
}
