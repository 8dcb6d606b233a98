package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/** Pass/fail sample sizes: published success-run values and R's binomial and beta functions. */
class SuccessRunPlanTest {

    /**
     * The well-known success-run sizes n = ⌈ln(1 − C)/ln R⌉: 59 parts for 95 %/95 % and 299 for
     * 95 %/99 % (quoted in the issue and throughout reliability demonstration practice; from memory),
     * and 22 for 90 %/90 %.
     */
    @Test
    void zeroFailureSuccessRun() {
        assertThat(SuccessRunPlan.withDefaults().sampleSize().n()).isEqualTo(59);
        assertThat(SuccessRunPlan.withDefaults().withReliability(0.99).sampleSize().n()).isEqualTo(299);
        assertThat(SuccessRunPlan.withDefaults().withConfidence(0.9).withReliability(0.9).sampleSize().n())
                .isEqualTo(22);
        // R 4.2.2: pbinom(0, 59, 0.05) = 0.048494525249423076; pbinom(0, 58, 0.05) = 0.05104686868360326
        SuccessRunPlan p = SuccessRunPlan.withDefaults();
        assertThat(p.failingProbability(59)).isCloseTo(0.048494525249423076, within(1e-15));
        assertThat(p.failingProbability(58)).isCloseTo(0.05104686868360326, within(1e-15));
        assertThat(p.sampleSize().achievedConfidence()).isCloseTo(1 - 0.048494525249423076, within(1e-15));
    }

    /** An exact integer quotient must not add a part: R = 0.5, C = 0.75 gives ln 0.25/ln 0.5 = 2 exactly. */
    @Test
    void ceilingIsGuardedAtExactIntegers() {
        // 0.5² = 0.25 = 1 − C, so n = 2 (Rⁿ ≤ 1 − C < R^(n−1)); common practice, no source
        assertThat(SuccessRunPlan.withDefaults().withConfidence(0.75).withReliability(0.5).sampleSize().n())
                .isEqualTo(2);
        assertThat(SuccessRunPlan.withDefaults().withConfidence(0.875).withReliability(0.5).sampleSize().n())
                .isEqualTo(3);
    }

    /**
     * c failures allowed. Expected n from R 4.2.2 by an upward scan:
     * {@code f <- function(C, R, c) { n <- c + 1; while (pbinom(c, n, 1 - R) > 1 - C) n <- n + 1; n }},
     * with pbinom(c, n, 1 − R) at n and n − 1, and the Clopper–Pearson check qbeta(1 − C, n − c, c + 1) ≥ R.
     */
    @Test
    void failuresAllowedMatchBinomialOfR() {
        // C, R, c, n, pbinom(c, n, 1 - R), pbinom(c, n - 1, 1 - R), qbeta(1 - C, n - c, c + 1)
        double[][] cases = {
            {0.95, 0.95, 1, 93, 0.049975795242616389, 0.052136402931676817, 0.95000602161201164},
            {0.95, 0.95, 2, 124, 0.049529777678686875, 0.051420819786612323, 0.95009982877168797},
            {0.95, 0.99, 1, 473, 0.049797538819848837, 0.050212606248028695, 0.99001029252577533},
            {0.90, 0.95, 3, 132, 0.099228304425783093, 0.10245052007242242, 0.95009041077308676},
            {0.99, 0.999, 2, 8403, 0.0099979724112072375, 0.010005875279870199, 0.99900003052940001},
            {0.95, 0.90, 5, 103, 0.047948873373196421, 0.050983637805135033, 0.90064408496222281}};
        for (double[] c : cases) {
            SuccessRunPlan plan = SuccessRunPlan.withDefaults().withConfidence(c[0]).withReliability(c[1])
                    .withFailures((int) c[2]);
            SuccessRunResult r = plan.sampleSize();
            assertThat(r.n()).as("C %s R %s c %s", c[0], c[1], c[2]).isEqualTo((int) c[3]);
            assertThat(plan.failingProbability(r.n())).isCloseTo(c[4], within(1e-13));
            assertThat(plan.failingProbability(r.n() - 1)).isCloseTo(c[5], within(1e-13));
            assertThat(r.achievedConfidence()).isCloseTo(1 - c[4], within(1e-13));
            assertThat(c[6]).isGreaterThanOrEqualTo(c[1]);
        }
    }

    @Test
    void badInputIsRejected() {
        assertThatThrownBy(() -> SuccessRunPlan.withDefaults().withConfidence(1))
                .hasMessageContaining("confidence must lie strictly between 0 and 1");
        assertThatThrownBy(() -> SuccessRunPlan.withDefaults().withReliability(Double.NaN))
                .hasMessageContaining("reliability");
        assertThatThrownBy(() -> SuccessRunPlan.withDefaults().withFailures(-1)).hasMessageContaining("failures");
    }
}
