package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/** The adaptive Gauss–Kronrod (7/15) rule against integrals known in closed form. */
class QuadratureTest {

    @Test
    void aPolynomialOfDegree20IsExactOnOnePiece() {
        // the 15-point Kronrod rule integrates polynomials of degree 3·7 + 1 = 22 exactly (Kronrod 1965); here
        // x^20 over [0, 1] = 1/21 (arithmetic)
        assertThat(Quadrature.integrate(x -> Math.pow(x, 20), new double[] {0, 1}, 1e-14))
                .isCloseTo(1.0 / 21, within(1e-16));
    }

    @Test
    void smoothIntegralsMatchTheirClosedForms() {
        // ∫0^π sin x dx = 2 (arithmetic)
        assertThat(Quadrature.integrate(Math::sin, new double[] {0, Math.PI}, 1e-13)).isCloseTo(2, within(1e-13));
        // ∫−8^8 φ(x) dx = 1 − 2Φ(−8) = 1 − 1.2442319768082e-15 (R 4.2.2: 1 - 2 * pnorm(-8))
        double phi = Quadrature.integrate(x -> Math.exp(-x * x / 2) / Math.sqrt(2 * Math.PI),
                new double[] {-8, 0, 8}, 1e-14);
        assertThat(phi).isCloseTo(1 - 1.2442319768082e-15, within(2e-15));
        // ∫0^1 1/√x dx = 2: an integrable end singularity is reached by bisection (arithmetic)
        assertThat(Quadrature.integrate(x -> 1 / Math.sqrt(x), new double[] {0, 1}, 1e-10))
                .isCloseTo(2, within(1e-8));
    }

    @Test
    void anIntegrandTooRoughForTheWorkBoundIsRefusedNotApproximated() {
        // sin(1/x) oscillates without end towards 0: the tolerance cannot be met, and the method says so
        assertThatThrownBy(() -> Quadrature.integrate(x -> Math.sin(1 / x), new double[] {1e-9, 1}, 1e-15))
                .isInstanceOf(StatsException.class).hasMessageContaining("did not reach its tolerance");
    }
}
