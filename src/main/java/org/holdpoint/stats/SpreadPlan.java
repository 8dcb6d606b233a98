package org.holdpoint.stats;

/**
 * Parts per group for the spread criterion: the one-sided (1 − α) upper bound of sd(after)/sd(before),
 * B = √(f / F_α(ν_a, ν_b)) with f = s_a²/s_b², ν_a = n_a − 1, ν_b = n_b − 1, must fall below the limit λ
 * ({@link SpreadTests#sdGrowth}). With a true ratio ρ, f/ρ² follows F(ν_a, ν_b), so the power is
 * P(B &lt; λ) = F_cdf(λ²·F_ppf(α; ν_a, ν_b)/ρ²; ν_a, ν_b) — exact under normality (docs/methods.md §11).
 * Immutable; every {@code with…} returns a copy.
 */
public final class SpreadPlan {
    private static final int DEFAULT_CAP = 100_000;
    private final double limit;
    private final double sdRatio;
    private final double alpha;
    private final double targetPower;
    private final double ratio;
    private final int cap;

    private SpreadPlan(double limit, double sdRatio, double alpha, double targetPower, double ratio, int cap) {
        this.limit = limit;
        this.sdRatio = sdRatio;
        this.alpha = alpha;
        this.targetPower = targetPower;
        this.ratio = ratio;
        this.cap = cap;
    }

    /**
     * @param limit λ &gt; 0, the largest acceptable sd(after)/sd(before)
     * @return a plan with ρ = 1 (nothing changed), α = 0.05, target power 0.8, equal groups
     */
    public static SpreadPlan forLimit(double limit) {
        if (!(limit > 0) || !Double.isFinite(limit)) {
            throw new StatsException("the sd-growth limit must be a positive number, got %s", limit);
        }
        return new SpreadPlan(limit, 1, 0.05, 0.8, 1, DEFAULT_CAP);
    }

    /**
     * @param rho the assumed true sd(after)/sd(before), &gt; 0
     * @return a copy
     */
    public SpreadPlan withSdRatio(double rho) {
        if (!(rho > 0) || !Double.isFinite(rho)) {
            throw new StatsException("the assumed sd ratio must be a positive number, got %s", rho);
        }
        return new SpreadPlan(limit, rho, alpha, targetPower, ratio, cap);
    }

    /**
     * @param a α of the one-sided bound, in (0, 0.5)
     * @return a copy
     */
    public SpreadPlan withAlpha(double a) {
        Alpha.checkBelowHalf(a);
        return new SpreadPlan(limit, sdRatio, a, targetPower, ratio, cap);
    }

    /**
     * @param p the target power, in (α, 1)
     * @return a copy
     */
    public SpreadPlan withTargetPower(double p) {
        if (!(p > 0 && p < 1)) {
            throw new StatsException("the target power must lie strictly between alpha and 1, got %s", p);
        }
        return new SpreadPlan(limit, sdRatio, alpha, p, ratio, cap);
    }

    /**
     * @param r n_after / n_before, &gt; 0
     * @return a copy
     */
    public SpreadPlan withRatio(double r) {
        if (!(r > 0) || !Double.isFinite(r)) {
            throw new StatsException("the allocation ratio must be a positive number, got %s", r);
        }
        return new SpreadPlan(limit, sdRatio, alpha, targetPower, r, cap);
    }

    /** @param n the before-group size @return ⌈ratio·n⌉ */
    int nAfter(int n) {
        return (int) Math.ceil(ratio * n - 1e-9);
    }

    /**
     * The power at a size: the probability that the bound falls below the limit.
     *
     * @param nBefore the before-group size, ≥ 2
     * @return the power
     */
    public double power(int nBefore) {
        Checks.atLeast(nBefore, 2, "the before-group size");
        int na = Math.max(2, nAfter(nBefore));
        double df1 = na - 1.0;
        double df2 = nBefore - 1.0;
        return Distributions.fCdf(limit * limit * Distributions.fQuantile(alpha, df1, df2) / (sdRatio * sdRatio),
                df1, df2);
    }

    /**
     * The smallest before-group size whose power reaches the target, by an upward scan.
     *
     * @return the plan
     * @throws StatsException when the assumed ratio is not below the limit (the power cannot pass α) or the
     *                        cap is reached first
     */
    public Result sampleSize() {
        if (!(sdRatio < limit)) {
            throw new StatsException("no number of parts shows the sd ratio below the limit %s when the true ratio is "
                    + "%s: the power stays at most alpha = %s. Assume a smaller true ratio, or raise the limit if the "
                    + "drawing or the customer allows it", limit, sdRatio, alpha);
        }
        if (!(targetPower > alpha)) {
            throw new StatsException("the target power must lie strictly between alpha = %s and 1, got %s", alpha,
                    targetPower);
        }
        double previous = Double.NaN;
        for (int n = 2; n <= cap; n++) {
            double p = power(n);
            if (p >= targetPower) {
                return new Result(limit, sdRatio, alpha, targetPower, n, Math.max(2, nAfter(n)), p,
                        n > 2 ? previous : null);
            }
            previous = p;
        }
        throw new StatsException("the target power %s is not reached with up to %d per group; the cap was reached",
                targetPower, cap);
    }

    /**
     * The plan at a given size.
     *
     * @param nBefore the before-group size, ≥ 2
     * @return the plan (target power null)
     */
    public Result powerAt(int nBefore) {
        return new Result(limit, sdRatio, alpha, null, nBefore, Math.max(2, nAfter(nBefore)), power(nBefore),
                nBefore > 2 ? power(nBefore - 1) : null);
    }

    /**
     * A spread plan.
     *
     * @param limit           λ
     * @param sdRatio         the assumed true ratio ρ
     * @param alpha           α of the one-sided bound
     * @param targetPower     the target, or null when the size was given
     * @param nBefore         parts before
     * @param nAfter          parts after
     * @param achievedPower   the power there
     * @param powerAtPrevious the power with one part fewer before, or null at the smallest size
     */
    public record Result(double limit, double sdRatio, double alpha, Double targetPower, int nBefore, int nAfter,
            double achievedPower, Double powerAtPrevious) {
    }
}
