package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import java.util.function.DoubleUnaryOperator;
import org.apache.commons.math3.distribution.TDistribution;
import org.apache.commons.math3.special.Gamma;
import org.junit.jupiter.api.Test;

/**
 * Cross-checks of the exact TOST power that need no outside table: the z-first integral form, a seeded
 * Monte Carlo, the size at a margin, the z-test bound, the non-monotone small-n trap, and bad input.
 */
class EquivalencePlanPropertyTest {
    private static final long SEED = 20261201L;

    /** A random but valid planning setting. */
    private record Setting(EquivalencePlan plan, double lower, double upper, double sd, int n, double se,
            double df, double alpha) {
    }

    private static Setting randomSetting(SplittableRandom rnd) {
        double alpha = new double[] {0.025, 0.05, 0.10}[rnd.nextInt(3)];
        double lower = -(0.05 + 0.95 * rnd.nextDouble());
        double upper = 0.05 + 0.95 * rnd.nextDouble();
        double sd = 0.05 + 1.95 * rnd.nextDouble();
        boolean paired = rnd.nextBoolean();
        double ratio = new double[] {1, 1.5, 2, 0.5}[rnd.nextInt(4)];
        int n = 2 + (rnd.nextInt(10) == 0 ? rnd.nextInt(3000) : rnd.nextInt(200));
        EquivalencePlan plan = EquivalencePlan.withDefaults().withMargin(Margin.of(lower, upper)).withAlpha(alpha)
                .with(paired ? Design.PAIRED : Design.PARALLEL).withRatio(ratio);
        int n2 = plan.nAfter(n);
        double se = paired ? sd / Math.sqrt(n) : sd * Math.sqrt(1.0 / n + 1.0 / n2);
        double df = paired ? n - 1 : n + n2 - 2;
        return new Setting(plan, lower, upper, sd, n, se, df, alpha);
    }

    private static double tc(double alpha, double df) {
        return new TDistribution(null, df, 1e-15).inverseCumulativeProbability(1 - alpha);
    }

    /**
     * The z-first form (docs/methods.md §11): power = ∫_{−dL}^{−dU} φ(z)·F_χ²ν(ν·[min(z + dL, −z − dU)/tc]²) dz,
     * split at z = −(dL + dU)/2 and cut to |z| ≤ 12, integrated here by adaptive Simpson (1e-12 per half) with Commons Math's regularized gamma
     * and t quantile, independently of the chi-form code under test.
     */
    static double zFirstPower(double alpha, double lower, double upper, double diff, double se, double df) {
        double t = tc(alpha, df);
        double dL = (diff - lower) / se;
        double dU = (diff - upper) / se;
        DoubleUnaryOperator g = z -> {
            double m = Math.min(z + dL, -z - dU);
            if (m <= 0) {
                return 0;
            }
            double chi2 = df * (m / t) * (m / t);
            return Math.exp(-0.5 * z * z) / Math.sqrt(2 * Math.PI)
                    * Gamma.regularizedGammaP(0.5 * df, 0.5 * chi2, 1e-16, Integer.MAX_VALUE);
        };
        // φ(±12) ≈ 5e-32, far below the tolerance
        double a = Math.max(-dL, -12);
        double b = Math.min(-dU, 12);
        double split = -(dL + dU) / 2;
        if (!(b > a)) {
            return 0;
        }
        if (split <= a || split >= b) {
            return simpson(g, a, b, 1e-12);
        }
        return simpson(g, a, split, 1e-12) + simpson(g, split, b, 1e-12);
    }

    private static double simpson(DoubleUnaryOperator f, double a, double b, double tol) {
        double fa = f.applyAsDouble(a);
        double fb = f.applyAsDouble(b);
        double m = 0.5 * (a + b);
        double fm = f.applyAsDouble(m);
        return simpson(f, a, b, fa, fm, fb, (b - a) / 6 * (fa + 4 * fm + fb), tol, 0);
    }

    private static double simpson(DoubleUnaryOperator f, double a, double b, double fa, double fm, double fb,
            double whole, double tol, int depth) {
        double m = 0.5 * (a + b);
        double lm = 0.5 * (a + m);
        double rm = 0.5 * (m + b);
        double flm = f.applyAsDouble(lm);
        double frm = f.applyAsDouble(rm);
        double left = (m - a) / 6 * (fa + 4 * flm + fm);
        double right = (b - m) / 6 * (fm + 4 * frm + fb);
        double diff = left + right - whole;
        if (depth >= 40 || (depth >= 6 && Math.abs(diff) <= 15 * tol)) {
            return left + right + diff / 15;
        }
        return simpson(f, a, m, fa, flm, fm, left, 0.5 * tol, depth + 1)
                + simpson(f, m, b, fm, frm, fb, right, 0.5 * tol, depth + 1);
    }

    @Test
    void chiFormAgreesWithZFirstFormOverRandomSettings() {
        SplittableRandom rnd = new SplittableRandom(SEED);
        for (int i = 0; i < 60; i++) {
            Setting s = randomSetting(rnd);
            double diff = s.lower + (s.upper - s.lower) * rnd.nextDouble();
            double chiForm = s.plan.tostPower(diff, s.sd, s.n);
            double zFirst = zFirstPower(s.alpha, s.lower, s.upper, diff, s.se, s.df);
            assertThat(chiForm).as("setting %d: %s", i, s).isCloseTo(zFirst, within(1e-9));
        }
    }

    /**
     * Seeded Monte Carlo: d ~ N(T, se²), s²/σ² ~ χ²_ν/ν (Marsaglia–Tsang gamma), reject when
     * (d − L)/ŝe &gt; tc and (d − U)/ŝe &lt; −tc. 400,000 draws per case: SE ≤ √(0.25/4e5) = 7.9e-4, asserted
     * below the tolerance of 4e-3 (about five SE).
     */
    @Test
    void monteCarloAgreesWithExactPower() {
        int reps = 400_000;
        double tolerance = 4e-3;
        SplittableRandom rnd = new SplittableRandom(SEED);
        EquivalencePlan sym = EquivalencePlan.withDefaults().withMargin(Margin.symmetric(0.2));
        EquivalencePlan paired = EquivalencePlan.withDefaults().withMargin(Margin.of(-0.3, 0.4)).with(Design.PAIRED);
        EquivalencePlan unequal = EquivalencePlan.withDefaults().withMargin(Margin.of(-1, 0.8)).withRatio(1.5);
        double[][] cases = { // lower, upper, T, se, df, exact power
            {-0.2, 0.2, 0, 0.1 * Math.sqrt(2.0 / 6), 10, sym.tostPower(0, 0.1, 6)},
            {-0.3, 0.4, 0.05, 0.3 / Math.sqrt(8), 7, paired.tostPower(0.05, 0.3, 8)},
            {-1, 0.8, -0.2, Math.sqrt(1.0 / 10 + 1.0 / 15), 23, unequal.tostPower(-0.2, 1, 10)}};
        for (double[] c : cases) {
            double t = tc(0.05, c[4]);
            int hits = 0;
            for (int r = 0; r < reps; r++) {
                double d = c[2] + c[3] * rnd.nextGaussian();
                double seHat = c[3] * Math.sqrt(2 * gamma(0.5 * c[4], rnd) / c[4]);
                if ((d - c[0]) / seHat > t && (d - c[1]) / seHat < -t) {
                    hits++;
                }
            }
            double p = (double) hits / reps;
            double se = Math.sqrt(p * (1 - p) / reps);
            assertThat(se).isLessThan(tolerance / 4);
            assertThat(p).as("case T = %s", c[2]).isCloseTo(c[5], within(tolerance));
        }
    }

    /** Marsaglia &amp; Tsang 2000 gamma(shape, 1) sampler; shape &lt; 1 via gamma(shape + 1)·U^(1/shape). */
    private static double gamma(double shape, SplittableRandom rnd) {
        if (shape < 1) {
            return gamma(shape + 1, rnd) * Math.pow(rnd.nextDouble(), 1 / shape);
        }
        double d = shape - 1.0 / 3;
        double c = 1 / Math.sqrt(9 * d);
        while (true) {
            double x = rnd.nextGaussian();
            double v = 1 + c * x;
            if (v <= 0) {
                continue;
            }
            v = v * v * v;
            double u = rnd.nextDouble();
            if (Math.log(u) < 0.5 * x * x + d - d * v + d * Math.log(v)) {
                return d * v;
            }
        }
    }

    /** TOST is a level-α test: with T on a margin the power is at most α (Berger 1982 intersection–union). */
    @Test
    void powerOnAMarginIsAtMostAlphaAndPositive() {
        SplittableRandom rnd = new SplittableRandom(SEED + 1);
        for (int i = 0; i < 100; i++) {
            Setting s = randomSetting(rnd);
            double atLower = s.plan.tostPower(s.lower, s.sd, s.n);
            double atUpper = s.plan.tostPower(s.upper, s.sd, s.n);
            assertThat(atLower).as("%s", s).isLessThanOrEqualTo(s.alpha + 1e-12).isGreaterThan(0);
            assertThat(atUpper).as("%s", s).isLessThanOrEqualTo(s.alpha + 1e-12).isGreaterThan(0);
        }
    }

    /** The skip bound of the search: UB = min(Φ(dL − z_{1−α}), Φ(−dU − z_{1−α})) is never below the exact power. */
    @Test
    void zTestBoundIsAnUpperBoundAndPowerIsPositive() {
        SplittableRandom rnd = new SplittableRandom(SEED + 2);
        for (int i = 0; i < 200; i++) {
            Setting s = randomSetting(rnd);
            double diff = s.lower + (s.upper - s.lower) * rnd.nextDouble();
            double power = s.plan.tostPower(diff, s.sd, s.n);
            double z = Normal.upperQuantile(s.alpha);
            double bound = Math.min(Normal.cdf((diff - s.lower) / s.se - z), Normal.cdf((s.upper - diff) / s.se - z));
            assertThat(power).as("%s T = %s", s, diff).isGreaterThan(0).isLessThanOrEqualTo(bound + 1e-12);
        }
    }

    /**
     * The trap of docs/methods.md §11: at small n the power falls before it rises (here from n = 2 to about 9),
     * so only an upward scan is safe. The search must return the brute-force minimum over every n.
     */
    @Test
    void searchReturnsTheTrueMinimumWhenPowerIsNotMonotone() {
        EquivalencePlan plan = EquivalencePlan.withDefaults().withMargin(Margin.symmetric(0.2)).withTargetPower(0.8)
                .withTablePoints(2);
        assertThat(plan.tostPower(0.1, 0.5, 3)).isLessThan(plan.tostPower(0.1, 0.5, 2));
        assertThat(plan.tostPower(0.1, 0.5, 8)).isLessThan(plan.tostPower(0.1, 0.5, 3));
        PlanResult found = plan.sampleSize(0.1, 0.5);
        assertThat(found.n()).isEqualTo(bruteForceMinimum(plan, 0.1, 0.5, 0.8, found.n() + 1));

        // a target just above α, crossed right after the dip of a paired plan
        EquivalencePlan paired = plan.with(Design.PAIRED).withTargetPower(0.06);
        assertThat(paired.tostPower(0, 0.5, 5)).isLessThan(paired.tostPower(0, 0.5, 2));
        PlanResult pairs = paired.sampleSize(0, 0.5);
        assertThat(pairs.n()).isEqualTo(bruteForceMinimum(paired, 0, 0.5, 0.06, pairs.n() + 1));

        // unequal allocation, ratio 2: n2 = 2·n1, search starts at n1 = 1
        EquivalencePlan twice = plan.withRatio(2);
        assertThat(twice.smallestN()).isEqualTo(1);
        PlanResult r2 = twice.sampleSize(0.1, 0.5);
        assertThat(r2.nAfter()).isEqualTo(2 * r2.n());
        assertThat(r2.n()).isEqualTo(bruteForceMinimum(twice, 0.1, 0.5, 0.8, r2.n() + 1));
    }

    private static int bruteForceMinimum(EquivalencePlan plan, double diff, double sd, double target, int upTo) {
        for (int n = plan.smallestN(); n <= upTo; n++) {
            if (plan.tostPower(diff, sd, n) >= target) {
                return n;
            }
        }
        return -1;
    }

    @Test
    void allocationRatioRoundsTheAfterGroupUp() {
        EquivalencePlan p = EquivalencePlan.withDefaults();
        assertThat(p.withRatio(1.1).nAfter(10)).isEqualTo(11);
        assertThat(p.withRatio(1.5).nAfter(3)).isEqualTo(5);
        assertThat(p.withRatio(0.5).nAfter(2)).isEqualTo(1);
        assertThat(p.withRatio(0.5).smallestN()).isEqualTo(2);
        assertThat(p.smallestN()).isEqualTo(2);
        assertThat(p.with(Design.PAIRED).withRatio(3).nAfter(7)).isEqualTo(7);
    }

    @Test
    void planAtAGivenSizeReportsBothPowersAndTheTable() {
        EquivalencePlan plan = EquivalencePlan.withDefaults().withMargin(Margin.symmetric(0.2));
        PlanResult r = plan.powerAt(0, 0.1, 6);
        assertThat(r.targetPower()).isNull();
        // derived, PowerTOST sampleN.TOST exact table header: N = 12 → 0.884063, N = 10 → 0.783580
        assertThat(r.achievedPower()).isCloseTo(0.884063, within(5.000001e-7));
        assertThat(r.powerAtPrevious()).isCloseTo(0.783580, within(5.000001e-7));
        assertThat(r.powerTable()).hasSize(21);
        assertThat(r.powerTable().get(0).difference()).isEqualTo(-0.2);
        assertThat(r.powerTable().get(20).difference()).isEqualTo(0.2);
        assertThat(r.powerTable().get(10).power()).isCloseTo(r.achievedPower(), within(1e-15));
        assertThat(r.powerTable().get(0).power()).isLessThanOrEqualTo(0.05);
        // with T = 0 the two-sided difference test rejects with probability α exactly
        assertThat(r.tTestPower()).isCloseTo(0.05, within(1e-12));
        assertThat(plan.powerAt(0, 0.1, 2).powerAtPrevious()).isNull();
    }

    @Test
    void badInputIsRejectedWithAClearMessage() {
        EquivalencePlan plan = EquivalencePlan.withDefaults().withMargin(Margin.of(-0.2, 0.3));
        assertThatThrownBy(() -> plan.sampleSize(0.3, 0.1)).isInstanceOf(StatsException.class)
                .hasMessageContaining("the expected difference 0.3 lies on or outside the margin");
        assertThatThrownBy(() -> plan.sampleSize(-0.5, 0.1)).hasMessageContaining("lies on or outside the margin");
        assertThatThrownBy(() -> plan.sampleSize(0, 0)).hasMessageContaining("the sd must be positive");
        assertThatThrownBy(() -> plan.sampleSize(0, Double.NaN)).hasMessageContaining("the sd must be positive");
        assertThatThrownBy(() -> plan.withTargetPower(0.05).sampleSize(0, 0.1))
                .hasMessageContaining("strictly between alpha = 0.05 and 1");
        assertThatThrownBy(() -> plan.withTargetPower(1)).hasMessageContaining("strictly between alpha and 1");
        assertThatThrownBy(() -> plan.withCap(50).sampleSize(0.25, 0.2)).hasMessageContaining("cap was reached")
                .hasMessageContaining("up to 50 per group");
        assertThatThrownBy(() -> plan.sampleSize(0.25, 100)).hasMessageContaining("up to 100000 per group");
        assertThatThrownBy(() -> EquivalencePlan.withDefaults().withMargin(null))
                .hasMessageContaining("planning needs a margin");
        assertThatThrownBy(() -> EquivalencePlan.withDefaults().sampleSize(0, 1))
                .hasMessageContaining("no equivalence margin");
        assertThatThrownBy(() -> plan.tostPower(0, 1, 1)).hasMessageContaining("no degree of freedom");
        assertThatThrownBy(() -> plan.with(Design.PAIRED).tostPower(0, 1, 1))
                .hasMessageContaining("number of pairs must be at least 2");
        assertThatThrownBy(() -> plan.withRatio(0)).hasMessageContaining("allocation ratio");
        assertThatThrownBy(() -> plan.tTestSampleSize(0, 1)).hasMessageContaining("non-zero");
    }
}
