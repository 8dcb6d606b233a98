package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

/** Φ(z) against R's pnorm (itself Cody's ANORM), across all three branches and far into the lower tail. */
class NormalCdfTest {

    // Computed with R 4.2.2 Patched (2022-11-10 r83330):
    //   z <- c(-37.5, -20, -8.3, -5.657, -5.6, -1.96, -0.66291, -0.5, -1e-20, 0, 0.3, 0.66292, 1.5, 5.6, 8)
    //   cat(sprintf("%.17g,%.17g\n", z, pnorm(z)), sep = "")
    @ParameterizedTest
    @CsvSource({
        "-37.5, 4.6053530095819552e-308",
        "-20, 2.7536241186062337e-89",
        "-8.3000000000000007, 5.2055697448902552e-17",
        "-5.657, 7.7020881721775998e-09",
        "-5.5999999999999996, 1.071759025831093e-08",
        "-1.96, 0.024997895148220428",
        "-0.66291, 0.25369409838974",
        "-0.5, 0.30853753872598694",
        "-9.9999999999999995e-21, 0.5",
        "0, 0.5",
        "0.29999999999999999, 0.61791142218895267",
        "0.66291999999999995, 0.74630910406752737",
        "1.5, 0.93319279873114191",
        "5.5999999999999996, 0.99999998928240974",
        "8, 0.99999999999999933"})
    void cdfMatchesR(double z, double expected) {
        double got = Normal.cdf(z);
        assertThat(Math.abs(got - expected)).as("Phi(%s)", z).isLessThanOrEqualTo(2e-15 * expected);
    }

    @ParameterizedTest
    @CsvSource({"-3", "-1", "-0.2", "-0.7", "-6"})
    void lowerAndUpperTailsAddToOne(double z) {
        // symmetry of the normal law, Phi(z) + Phi(-z) = 1 (Abramowitz & Stegun 26.2.5)
        assertThat(Math.abs(Normal.cdf(z) + Normal.cdf(-z) - 1)).isLessThanOrEqualTo(2.3e-16);
    }
}
