package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * Parts after the change for the capability criterion (the lower bound of Ppk above a requirement).
 * One limit: exact against the noncentral t of R 4.2.2 (for noncentralities up to 37.62, where its pt is exact)
 * and of scipy 1.17.1 (above), with
 * {@code bissell <- function(p, n, alpha) p - qnorm(1-alpha)*sqrt(1/(9*n) + p^2/(2*(n-1)))} and
 * {@code pw1 <- function(n, a, R, alpha) { ps <- uniroot(function(p) bissell(p,n,alpha)-R, c(R, R+20),
 * tol=1e-14)$root; 1 - pt(3*sqrt(n)*ps, n-1, sqrt(n)*a) }} (a = (USL − μ)/σ). Two limits: against a seeded
 * simulation through the analysis' own capability computation.
 */
class CapabilityPlanTest {

    @Test
    void oneLimitMatchesTheNoncentralT() {
        CapabilityPlan p = CapabilityPlan.forRequirement(1.33);
        double inf = Double.POSITIVE_INFINITY;
        // pw1(30, 4.8, 1.33, 0.05) = 0.34184138239041262; pw1(50, 4.5, ...) = 0.28016685535669916
        assertThat(p.power(30, 4.8, inf)).isCloseTo(0.34184138239041262, within(1e-9));
        assertThat(p.power(50, 4.5, inf)).isCloseTo(0.28016685535669916, within(1e-9));
        // n = 100, a = 4.2: the noncentrality 42 lies above 37.62, where R's pt switches to an approximation
        // (its documentation says so; it gives 0.16108703111928324): the reference is scipy 1.17.1,
        // stats.nct.sf(3*sqrt(100)*ps, 99, sqrt(100)*4.2) with ps from brentq on the same bound = 0.16092217500182698
        assertThat(p.power(100, inf, 4.2)).as("a lower limit alone is the mirror image")
                .isCloseTo(0.16092217500182698, within(1e-9));
        // the smallest n reaching 0.9 for a = 4.8 is 141 (noncentrality 57: scipy 1.17.1 as above gives
        // 0.9003151140094421, at 140 0.8983513404414994; R's approximation gives the same n)
        CapabilityPlan.Result r = p.withTargetPower(0.9).sampleSize(4.8, inf);
        assertThat(r.nAfter()).isEqualTo(141);
        assertThat(r.achievedPower()).isCloseTo(0.9003151140094421, within(1e-9));
        assertThat(r.powerAtPrevious()).isCloseTo(0.8983513404414994, within(1e-9));
    }

    /**
     * Two limits, off centre (a = 5.1, b = 6.0, true Ppk 1.7): the share of 20,000 seeded samples of 40 whose
     * computed lower bound exceeds 1.33 agrees with the exact power within four standard errors.
     */
    @Test
    void twoLimitsAgreeWithASimulationOfTheAnalysis() {
        double a = 5.1;
        double b = 6.0;
        int n = 40;
        double exact = CapabilityPlan.forRequirement(1.33).power(n, a, b);
        Capability cap = Capability.withDefaults().withLimits(-b, a);
        SplittableRandom rnd = new SplittableRandom(20261204L);
        int pass = 0;
        int reps = 20_000;
        for (int i = 0; i < reps; i++) {
            double[] x = new double[n];
            for (int j = 0; j < n; j++) {
                x[j] = rnd.nextGaussian();
            }
            Double lb = cap.compute(Sample.of(x)).ppkLower();
            if (lb != null && lb > 1.33) {
                pass++;
            }
        }
        double share = pass / (double) reps;
        double se = Math.sqrt(exact * (1 - exact) / reps);
        assertThat(share).isCloseTo(exact, within(4 * se));
    }

    @Test
    void aTrueProcessAtTheRequirementCannotBePlannedFor() {
        assertThatThrownBy(() -> CapabilityPlan.forRequirement(1.33).sampleSize(3.99, Double.POSITIVE_INFINITY))
                .isInstanceOf(StatsException.class).hasMessageContaining("true Ppk is 1.330");
    }
}
