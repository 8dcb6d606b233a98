package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/**
 * Planning against a one-sided margin (non-inferiority: a lower bound only; non-superiority: an upper bound
 * only): one one-sided t-test, its exact power 1 − F(t_{1−α,ν}; ν, δ) with the noncentral t.
 * Reference: R 4.2.2, computed with
 * {@code f <- function(alpha, L, T, s, n) { se <- s*sqrt(2/n); df <- 2*n-2; 1 - pt(qt(1-alpha, df), df, (T-L)/se) }}.
 */
class OneSidedPlanTest {

    private static EquivalencePlan lowerOnly(double l, double alpha) {
        return EquivalencePlan.withDefaults().withMargin(new Margin(l, null)).withAlpha(alpha);
    }

    @Test
    void exactPowerMatchesTheNoncentralT() {
        // f(0.05, -0.02, 0, 0.03, 30) = 0.8177505582882284
        assertThat(lowerOnly(-0.02, 0.05).tostPower(0, 0.03, 30)).isCloseTo(0.8177505582882284, within(1e-9));
        // f(0.05, -0.02, 0.005, 0.03, 20) = 0.82715673474857421
        assertThat(lowerOnly(-0.02, 0.05).tostPower(0.005, 0.03, 20)).isCloseTo(0.82715673474857421, within(1e-9));
        // f(0.025, -0.5, 0, 1, 40) = 0.59813160092383066
        assertThat(lowerOnly(-0.5, 0.025).tostPower(0, 1, 40)).isCloseTo(0.59813160092383066, within(1e-9));
        // an upper bound only is the mirror image: U = 0.02, T = 0 as L = -0.02, T = 0
        assertThat(EquivalencePlan.withDefaults().withMargin(new Margin(null, 0.02)).tostPower(0, 0.03, 30))
                .isCloseTo(0.8177505582882284, within(1e-9));
    }

    @Test
    void theSmallestSizeReachingTheTargetIsFound() {
        // R: the smallest n with f(0.05, -0.02, 0, 0.03, n) >= 0.8 is 29 (0.80589625234590168; at 28 0.79335937017341907)
        PlanResult r = lowerOnly(-0.02, 0.05).withTargetPower(0.8).sampleSize(0, 0.03);
        assertThat(r.n()).isEqualTo(29);
        assertThat(r.achievedPower()).isCloseTo(0.80589625234590168, within(1e-9));
        assertThat(r.powerAtPrevious()).isCloseTo(0.79335937017341907, within(1e-9));
        assertThat(r.marginUpper()).isInfinite();
    }

    @Test
    void powerOnTheBoundIsAlphaAndASearchThereIsRefusedWithTheReason() {
        // f(0.05, -0.02, -0.02, 0.03, 30) = 0.050000000000000044: on the bound the power is alpha
        EquivalencePlan p = lowerOnly(-0.02, 0.05);
        assertThat(p.powerAt(-0.02, 0.03, 30).achievedPower()).isCloseTo(0.05, within(1e-9));
        assertThat(p.powerAt(-0.03, 0.03, 30).achievedPower()).isLessThan(0.05);
        assertThatThrownBy(() -> p.withTargetPower(0.8).sampleSize(-0.02, 0.03))
                .isInstanceOf(StatsException.class).hasMessageContaining("on or outside the margin")
                .hasMessageContaining("at most alpha");
    }
}
