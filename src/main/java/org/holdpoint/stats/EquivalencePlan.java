package org.holdpoint.stats;

import java.util.ArrayList;
import java.util.List;

/**
 * Planning of an equivalence trial: exact power of the two one-sided tests (TOST) and the smallest
 * sample size reaching a target power, for parallel groups (pooled sd, allocation ratio r) or pairs.
 *
 * <p>Sizes: parallel n₁ = n (before), n₂ = ⌈r·n₁⌉ (after), se = σ·√(1/n₁ + 1/n₂), ν = n₁ + n₂ − 2;
 * paired m = n pairs, se = σ/√m, ν = m − 1. The power is exact: the probability that both one-sided
 * t-tests reject, an integral over the chi distribution of the estimated se (Owen's Q; Owen 1965,
 * Biometrika 52:437–446; Phillips 1990, J. Pharmacokinet. Biopharm. 18:137–144), good to about 1e-12.
 *
 * <p>The search scans n upward from the smallest size with ν ≥ 1, because at small n the exact power is
 * not monotone in n (bisection could return a wrong n). Sizes whose upper bound
 * UB(n) = min(Φ(dL − z_{1−α}), Φ(−dU − z_{1−α})) lies below target − 1e-12 are skipped without the
 * integral: a TOST rejection is a rejection by each one-sided t-test, and no such test beats the
 * known-σ z-test. The first n whose exact power reaches the target is returned.
 */
public final class EquivalencePlan {
    /** The default cap on n per group (or pairs) for the search. */
    public static final int DEFAULT_CAP = 100_000;
    private static final double BOUND_SLACK = 1e-12;
    private static final double RATIO_ROUNDING = 1e-9;
    private static final EquivalencePlan DEFAULTS =
            new EquivalencePlan(null, 0.05, Design.PARALLEL, 1, 0.8, DEFAULT_CAP, 21);

    private final Margin margin;
    private final double alpha;
    private final Design design;
    private final double ratio;
    private final double targetPower;
    private final int cap;
    private final int tablePoints;

    private EquivalencePlan(Margin margin, double alpha, Design design, double ratio, double targetPower, int cap,
            int tablePoints) {
        this.margin = margin;
        this.alpha = alpha;
        this.design = design;
        this.ratio = ratio;
        this.targetPower = targetPower;
        this.cap = cap;
        this.tablePoints = tablePoints;
    }

    /**
     * The defaults: no margin yet (one must be set before planning), α = 0.05 per one-sided test,
     * parallel groups, ratio 1, target power 0.8, cap 100,000 per group, a power table of 21 points.
     *
     * @return the default plan
     */
    public static EquivalencePlan withDefaults() {
        return DEFAULTS;
    }

    /**
     * @param newMargin a two-sided margin (L, U)
     * @return a plan with that margin
     * @throws StatsException if the margin is null or one-sided
     */
    public EquivalencePlan withMargin(Margin newMargin) {
        if (newMargin == null) {
            throw new StatsException("planning needs a margin: (L, U), or one bound for a one-sided claim");
        }
        if (newMargin.ratio()) {
            throw new StatsException("planning with a ratio margin is not available yet; plan with the margin in units "
                    + "it corresponds to at the baseline mean");
        }
        return new EquivalencePlan(newMargin, alpha, design, ratio, targetPower, cap, tablePoints);
    }

    /**
     * @param newAlpha the level of each one-sided test, in (0, 0.5)
     * @return a plan with that α
     */
    public EquivalencePlan withAlpha(double newAlpha) {
        return new EquivalencePlan(margin, Alpha.checkBelowHalf(newAlpha), design, ratio, targetPower, cap,
                tablePoints);
    }

    /**
     * @param newDesign parallel groups or pairs
     * @return a plan with that design
     */
    public EquivalencePlan with(Design newDesign) {
        if (newDesign == null) {
            throw new StatsException("a design is required");
        }
        return new EquivalencePlan(margin, alpha, newDesign, ratio, targetPower, cap, tablePoints);
    }

    /**
     * @param newRatio r = n_after/n_before, in (0, 1000]; n₂ = ⌈r·n₁⌉ (ignored for pairs)
     * @return a plan with that allocation ratio
     */
    public EquivalencePlan withRatio(double newRatio) {
        if (!(newRatio > 0 && newRatio <= 1000)) {
            throw new StatsException("the allocation ratio must lie in (0, 1000], got %s", newRatio);
        }
        return new EquivalencePlan(margin, alpha, design, newRatio, targetPower, cap, tablePoints);
    }

    /**
     * @param newTarget the target power, in (α, 1) (checked against α when searching)
     * @return a plan with that target
     */
    public EquivalencePlan withTargetPower(double newTarget) {
        if (!(newTarget > 0 && newTarget < 1)) {
            throw new StatsException("the target power must lie strictly between alpha and 1, got %s", newTarget);
        }
        return new EquivalencePlan(margin, alpha, design, ratio, newTarget, cap, tablePoints);
    }

    /**
     * @param newCap the largest n per group (or pairs) the search may return, ≥ 2
     * @return a plan with that cap
     */
    public EquivalencePlan withCap(int newCap) {
        return new EquivalencePlan(margin, alpha, design, ratio, targetPower, Checks.atLeast(newCap, 2, "the cap"),
                tablePoints);
    }

    /**
     * @param points the number of equally spaced true differences from L to U in the power table, ≥ 2
     * @return a plan with that table size
     */
    public EquivalencePlan withTablePoints(int points) {
        return new EquivalencePlan(margin, alpha, design, ratio, targetPower, cap,
                Checks.atLeast(points, 2, "the number of power table points"));
    }

    /** @return the level of each one-sided test */
    public double alpha() {
        return alpha;
    }

    /** @return the allocation ratio n_after / n_before */
    public double ratio() {
        return ratio;
    }

    /** @return the target power of a search */
    public double targetPower() {
        return targetPower;
    }

    /** @return the design */
    public Design design() {
        return design;
    }

    /**
     * The after-group size for a before-group size n: ⌈r·n⌉ with products within 1e-9 of an integer taken
     * as that integer (so that r = 1.1, n = 10 gives 11, not 12); n itself for pairs.
     *
     * @param n the before-group size (or pairs), ≥ 1
     * @return n₂
     */
    public int nAfter(int n) {
        if (design == Design.PAIRED) {
            return n;
        }
        double x = ratio * n;
        double nearest = Math.rint(x);
        double size = Math.abs(x - nearest) <= RATIO_ROUNDING * Math.max(1, x) ? nearest : Math.ceil(x);
        return (int) Math.max(1, Math.min(Integer.MAX_VALUE, size));
    }

    /**
     * Exact TOST power at n (parallel: n₁ = n, n₂ = ⌈r·n⌉; paired: n pairs) for the true difference T.
     * With T on a margin it is at most α.
     *
     * @param difference the true difference T, any real value
     * @param sd         σ &gt; 0
     * @param n          the before-group size or pairs, with ν ≥ 1
     * @return the power, in [0, 1]
     */
    public double tostPower(double difference, double sd, int n) {
        Margin m = requireMargin();
        Sizes s = sizes(n, Checks.positive(sd, "the sd"));
        return power(m, finite(difference), s);
    }

    /**
     * Two one-sided tests for a margin with both bounds; one one-sided test (non-inferiority or
     * non-superiority) for a margin with one bound.
     */
    private double power(Margin m, double difference, Sizes s) {
        if (m.lower() != null && m.upper() != null) {
            return clamp(ExactPower.tost(alpha, m.lower(), m.upper(), difference, s.se, s.df));
        }
        double delta = m.lower() != null ? (difference - m.lower()) / s.se : (m.upper() - difference) / s.se;
        return clamp(ExactPower.oneSided(alpha, delta, s.df));
    }

    /** The distance of the true difference from the nearer bound, on the claim's side (negative outside). */
    private static double distanceInside(Margin m, double difference) {
        double d = Double.POSITIVE_INFINITY;
        if (m.lower() != null) {
            d = Math.min(d, difference - m.lower());
        }
        if (m.upper() != null) {
            d = Math.min(d, m.upper() - difference);
        }
        return d;
    }

    /**
     * Exact power of the two-sided t-test at level α (c = t_{1−α/2,ν}) to detect a true shift T at n:
     * 1 − F(c; ν, δ) + F(−c; ν, δ), δ = T/se, the noncentral t as an integral over the chi distribution.
     *
     * @param shift the true shift T
     * @param sd    σ &gt; 0
     * @param n     the before-group size or pairs, with ν ≥ 1
     * @return the power, in [0, 1]
     */
    public double tTestPower(double shift, double sd, int n) {
        Sizes s = sizes(n, Checks.positive(sd, "the sd"));
        return clamp(ExactPower.tTest(alpha, finite(shift), s.se, s.df));
    }

    /**
     * The exact TOST power at n over {@link #withTablePoints equally spaced} true differences from L to U.
     *
     * @param sd σ &gt; 0
     * @param n  the before-group size or pairs, with ν ≥ 1
     * @return the table, L and U included
     */
    public List<PowerPoint> powerTable(double sd, int n) {
        Margin m = requireMargin();
        List<PowerPoint> table = new ArrayList<>(tablePoints);
        // one-sided: from the bound over as far again on the claim's side (at least 4 sd of the difference)
        double lo;
        double hi;
        if (m.lower() != null && m.upper() != null) {
            lo = m.lower();
            hi = m.upper();
        } else {
            double reach = Math.max(Math.abs(m.lower() != null ? m.lower() : m.upper()),
                    4 * sizes(n, Checks.positive(sd, "the sd")).se);
            lo = m.lower() != null ? m.lower() : m.upper() - 2 * reach;
            hi = m.lower() != null ? m.lower() + 2 * reach : m.upper();
        }
        double step = (hi - lo) / (tablePoints - 1);
        for (int i = 0; i < tablePoints; i++) {
            double t = i == tablePoints - 1 ? hi : lo + i * step;
            table.add(new PowerPoint(t, tostPower(t, sd, n)));
        }
        return table;
    }

    /**
     * The plan at a given size: the exact TOST power there, at n − 1, the t-test power and the table.
     *
     * @param difference the expected true difference, strictly inside the margin
     * @param sd         σ &gt; 0
     * @param n          the before-group size or pairs, with ν ≥ 1
     * @return the plan (targetPower null)
     */
    public PlanResult powerAt(double difference, double sd, int n) {
        // defined wherever the difference lies: on a bound it is at most α, outside it is smaller still
        requireMargin();
        return result(finite(difference), sd, n, null, tostPower(difference, sd, n));
    }

    /**
     * The smallest n whose exact TOST power reaches the target, by the upward scan described above.
     *
     * @param difference the expected true difference, strictly inside the margin
     * @param sd         σ &gt; 0
     * @return the plan at that n
     * @throws StatsException if the target is not in (α, 1) or the cap is reached first
     */
    public PlanResult sampleSize(double difference, double sd) {
        Margin m = requireMargin();
        checkInside(difference);
        checkTarget();
        Checks.positive(sd, "the sd");
        double zAlpha = Normal.upperQuantile(alpha);
        double needed = Normal.quantile(targetPower - BOUND_SLACK) + zAlpha;
        double near = distanceInside(m, difference);
        for (int n = smallestN(); n <= cap; n++) {
            Sizes s = sizes(n, sd);
            // UB(n) < target − 1e-12 ⇔ min(dL, −dU) − z_{1−α} < Φ⁻¹(target − 1e-12), Φ being increasing
            if (near / s.se < needed) {
                continue;
            }
            double p = power(m, difference, s);
            if (p >= targetPower) {
                return result(difference, sd, n, targetPower, p);
            }
        }
        throw capReached();
    }

    /**
     * The smallest n at which the two-sided t-test at level α detects the shift with the target power,
     * by the same upward scan, skipping n whose two-sided z-test power (an upper bound) is below the target.
     * The margin is not used. Reproduces Julious 2004, Stat. Med. 23:1921–1986, Table I (α = 0.05, 90 %).
     *
     * @param shift the shift to detect, ≠ 0
     * @param sd    σ &gt; 0
     * @return the sizes and powers
     * @throws StatsException if the target is not in (α, 1) or the cap is reached first
     */
    public TTestPlanResult tTestSampleSize(double shift, double sd) {
        if (!(shift != 0 && Double.isFinite(shift))) {
            throw new StatsException("the shift to detect must be finite and non-zero, got %s", shift);
        }
        checkTarget();
        Checks.positive(sd, "the sd");
        double z = Normal.upperQuantile(0.5 * alpha);
        // the z-test power Φ(δ − z) + Φ(−δ − z) is at most Φ(δ − z) + α/2, so δ below this cannot reach the target
        double needed = targetPower - 0.5 * alpha - BOUND_SLACK > 0
                ? z + Normal.quantile(targetPower - 0.5 * alpha - BOUND_SLACK) : Double.NEGATIVE_INFINITY;
        for (int n = smallestN(); n <= cap; n++) {
            Sizes s = sizes(n, sd);
            double delta = Math.abs(shift) / s.se;
            if (delta < needed || Normal.cdf(delta - z) + Normal.cdf(-delta - z) < targetPower - BOUND_SLACK) {
                continue;
            }
            double p = clamp(ExactPower.tTest(alpha, shift, s.se, s.df));
            if (p >= targetPower) {
                Double previous = n > smallestN() ? tTestPower(shift, sd, n - 1) : null;
                return new TTestPlanResult(design, alpha, shift, sd, ratioUsed(), targetPower, n, nAfter(n), p,
                        previous);
            }
        }
        throw capReached();
    }

    private PlanResult result(double difference, double sd, int n, Double target, double power) {
        Margin m = margin;
        Double previous = n > smallestN() ? tostPower(difference, sd, n - 1) : null;
        return new PlanResult(design, alpha, m.lower() == null ? Double.NEGATIVE_INFINITY : m.lower(),
                m.upper() == null ? Double.POSITIVE_INFINITY : m.upper(), difference, sd, ratioUsed(), target, n,
                nAfter(n), power, previous, tTestPower(difference, sd, n), powerTable(sd, n));
    }

    /** The smallest before-group size (or pairs) with at least one degree of freedom. */
    int smallestN() {
        if (design == Design.PAIRED) {
            return 2;
        }
        int n = 1;
        while ((long) n + nAfter(n) - 2 < 1) {
            n++;
        }
        return n;
    }

    private Sizes sizes(int n, double sd) {
        if (design == Design.PAIRED) {
            Checks.atLeast(n, 2, "the number of pairs");
            return new Sizes(sd / Math.sqrt(n), n - 1.0);
        }
        Checks.atLeast(n, 1, "n per group");
        long n2 = nAfter(n);
        double df = (double) n + n2 - 2;
        if (!(df >= 1)) {
            throw new StatsException("n = %d and %d leave no degree of freedom; use at least %d per group", n, n2,
                    smallestN());
        }
        return new Sizes(sd * Math.sqrt(1.0 / n + 1.0 / n2), df);
    }

    private double ratioUsed() {
        return design == Design.PAIRED ? 1 : ratio;
    }

    private Margin requireMargin() {
        if (margin == null) {
            throw new StatsException("no equivalence margin was set");
        }
        return margin;
    }

    private void checkInside(double difference) {
        Margin m = requireMargin();
        if (!(distanceInside(m, difference) > 0)) {
            throw new StatsException("no number of parts reaches a target power when the expected difference %s lies "
                    + "on or outside the margin %s: there the power is at most alpha = %s. Plan for an expected "
                    + "difference inside the margin, or widen the margin if the drawing or the customer allows it",
                    difference, "(" + (m.lower() == null ? "none" : m.lower()) + ", " + (m.upper() == null ? "none"
                            : m.upper()) + ")", alpha);
        }
    }

    private void checkTarget() {
        if (!(targetPower > alpha && targetPower < 1)) {
            throw new StatsException("the target power must lie strictly between alpha = %s and 1, got %s", alpha,
                    targetPower);
        }
    }

    private StatsException capReached() {
        return new StatsException("the target power %s is not reached with up to %d %s; the cap was reached",
                targetPower, cap, design == Design.PAIRED ? "pairs" : "per group");
    }

    private static double finite(double x) {
        if (Double.isFinite(x)) {
            return x;
        }
        throw new StatsException("the true difference must be finite, got %s", x);
    }

    private static double clamp(double p) {
        return Math.max(0, Math.min(1, p));
    }

    /** The standard error of the difference and its degrees of freedom at one size. */
    private record Sizes(double se, double df) {
    }
}
