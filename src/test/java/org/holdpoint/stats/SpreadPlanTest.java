package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/**
 * Parts per group for the sd-growth criterion. Reference: R 4.2.2 with
 * {@code pw <- function(R, rho, alpha, nb, na) { d1 <- na-1; d2 <- nb-1; pf(R^2*qf(alpha, d1, d2)/rho^2, d1, d2) }}
 * and, for the sizes, the smallest n with {@code pw(R, rho, alpha, n, n) >= target}.
 */
class SpreadPlanTest {

    @Test
    void powerMatchesTheFDistribution() {
        // pw(1.3, 1, 0.05, 30, 30) = 0.39859755031926525: with a limit of 1.3 and 30 per group the spread
        // criterion passes only 40 % of the time even when nothing changed
        assertThat(SpreadPlan.forLimit(1.3).power(30)).isCloseTo(0.39859755031926525, within(1e-12));
        // pw(1.5, 1.1, 0.05, 20, 40) = 0.48154308925217459 (twice as many after as before)
        assertThat(SpreadPlan.forLimit(1.5).withSdRatio(1.1).withRatio(2).power(20))
                .isCloseTo(0.48154308925217459, within(1e-12));
        // pw(1.25, 0.9, 0.025, 60, 60) = 0.7059990008233521
        assertThat(SpreadPlan.forLimit(1.25).withSdRatio(0.9).withAlpha(0.025).power(60))
                .isCloseTo(0.7059990008233521, within(1e-12));
    }

    @Test
    void theSmallestSizeReachingTheTarget() {
        // R: limit 1.3, rho 1, alpha 0.05, power 0.8 -> n = 92 (0.80134336731073985; at 91 0.79745839380150185)
        SpreadPlan.Result r = SpreadPlan.forLimit(1.3).withTargetPower(0.8).sampleSize();
        assertThat(r.nBefore()).isEqualTo(92);
        assertThat(r.nAfter()).isEqualTo(92);
        assertThat(r.achievedPower()).isCloseTo(0.80134336731073985, within(1e-12));
        assertThat(r.powerAtPrevious()).isCloseTo(0.79745839380150185, within(1e-12));
        // R: limit 1.5, power 0.9 -> n = 54 (0.90020348741313982)
        assertThat(SpreadPlan.forLimit(1.5).withTargetPower(0.9).sampleSize().nBefore()).isEqualTo(54);
    }

    @Test
    void aTrueRatioAtTheLimitCannotBePlannedFor() {
        assertThatThrownBy(() -> SpreadPlan.forLimit(1.3).withSdRatio(1.3).sampleSize())
                .isInstanceOf(StatsException.class).hasMessageContaining("at most alpha");
        assertThat(SpreadPlan.forLimit(1.3).withSdRatio(1.3).power(50)).isCloseTo(0.05, within(1e-12));
    }
}
