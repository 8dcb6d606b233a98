package org.holdpoint.stats;

/**
 * Parts after the change for the capability criterion: the after group's lower (1 − α) confidence bound of
 * Ppk, Bissell's k − z_{1−α}·√(1/(9n) + k²/(2(n − 1))) as the analysis computes it ({@link Capability}), must
 * exceed the requirement R. The bound grows with the estimated Ppk k, so it passes exactly when k ≥ k*, the
 * root of bound(k*) = R; the probability of that under a normal process with true mean and sd is
 * {@link ExactPower#ppkAtLeast} (exact for one and for two specification limits; docs/methods.md §11).
 * Immutable.
 */
public final class CapabilityPlan {
    private static final int DEFAULT_CAP = 100_000;
    private final double requirement;
    private final double alpha;
    private final double targetPower;

    private CapabilityPlan(double requirement, double alpha, double targetPower) {
        this.requirement = requirement;
        this.alpha = alpha;
        this.targetPower = targetPower;
    }

    /**
     * @param requirement R &gt; 0, the smallest acceptable lower bound of Ppk
     * @return a plan with α = 0.05 and target power 0.8
     */
    public static CapabilityPlan forRequirement(double requirement) {
        if (!(requirement > 0) || !Double.isFinite(requirement)) {
            throw new StatsException("the capability requirement must be a positive number, got %s", requirement);
        }
        return new CapabilityPlan(requirement, 0.05, 0.8);
    }

    /**
     * @param a α of the lower bound, in (0, 0.5)
     * @return a copy
     */
    public CapabilityPlan withAlpha(double a) {
        Alpha.checkBelowHalf(a);
        return new CapabilityPlan(requirement, a, targetPower);
    }

    /**
     * @param p the target power, in (α, 1)
     * @return a copy
     */
    public CapabilityPlan withTargetPower(double p) {
        if (!(p > alpha && p < 1)) {
            throw new StatsException("the target power must lie strictly between alpha = %s and 1, got %s", alpha, p);
        }
        return new CapabilityPlan(requirement, alpha, p);
    }

    private double bound(double k, int n) {
        return k - Normal.upperQuantile(alpha) * Math.sqrt(1.0 / (9.0 * n) + k * k / (2.0 * (n - 1)));
    }

    /** The estimated Ppk whose lower bound equals the requirement at n (bisection to 1e-13, said if it fails). */
    double threshold(int n) {
        double lo = requirement;
        double hi = requirement + 1;
        while (bound(hi, n) < requirement) {
            hi = requirement + 2 * (hi - requirement);
            if (hi > 1e6) {
                throw new StatsException("no Ppk estimate reaches a lower bound of %s with %d parts", requirement, n);
            }
        }
        for (int i = 0; i < 200 && hi - lo > 1e-13 * hi; i++) {
            double mid = 0.5 * (lo + hi);
            if (bound(mid, n) < requirement) {
                lo = mid;
            } else {
                hi = mid;
            }
        }
        return hi;
    }

    /**
     * The power at a size for a true process a = (USL − μ)/σ, b = (μ − LSL)/σ (∞ for a missing limit).
     *
     * @param n the number of parts after the change, ≥ 3
     * @param a (USL − μ)/σ, or +∞
     * @param b (μ − LSL)/σ, or +∞
     * @return P(the lower bound of Ppk exceeds the requirement)
     */
    public double power(int n, double a, double b) {
        Checks.atLeast(n, 3, "the number of parts after");
        if (Double.isInfinite(a) && Double.isInfinite(b)) {
            throw new StatsException("capability needs at least one specification limit");
        }
        return ExactPower.ppkAtLeast(n, a, b, threshold(n));
    }

    /**
     * The smallest number of parts after the change whose power reaches the target.
     *
     * @param a (USL − μ)/σ of the true process, or +∞
     * @param b (μ − LSL)/σ, or +∞
     * @return the plan
     * @throws StatsException when the true Ppk does not exceed the requirement, or the cap is reached
     */
    public Result sampleSize(double a, double b) {
        double truePpk = Math.min(a, b) / 3;
        if (!(truePpk > requirement)) {
            throw new StatsException("no number of parts shows a Ppk bound above %s when the true Ppk is %.3f: plan for a "
                    + "process whose Ppk exceeds the requirement", requirement, truePpk);
        }
        Double previous = null;
        for (int n = 3; n <= DEFAULT_CAP; n++) {
            double p = power(n, a, b);
            if (p >= targetPower) {
                return new Result(requirement, truePpk, alpha, targetPower, n, p, previous);
            }
            previous = p;
        }
        throw new StatsException("the target power %s is not reached with up to %d parts; the cap was reached",
                targetPower, DEFAULT_CAP);
    }

    /**
     * A capability plan.
     *
     * @param requirement     R
     * @param truePpk         the assumed true Ppk
     * @param alpha           α of the lower bound
     * @param targetPower     the target
     * @param nAfter          parts after the change
     * @param achievedPower   the power there
     * @param powerAtPrevious the power with one part fewer, or null at the smallest size
     */
    public record Result(double requirement, double truePpk, double alpha, double targetPower, int nAfter,
            double achievedPower, Double powerAtPrevious) {
    }
}
