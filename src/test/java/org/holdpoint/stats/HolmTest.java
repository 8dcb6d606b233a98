package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import org.junit.jupiter.api.Test;

/** Holm adjustment against R 4.2.2 {@code p.adjust(p, method = "holm")}. */
class HolmTest {

    private static void assertAll(double[] actual, double[] expected) {
        assertThat(actual).hasSameSizeAs(expected);
        for (int i = 0; i < expected.length; i++) {
            assertThat(actual[i]).as("index %d", i).isCloseTo(expected[i], within(1e-15 * Math.max(1e-300,
                    expected[i]) + 1e-300));
        }
    }

    @Test
    void tiesAndATinyValue() {
        // R 4.2.2: p <- c(0.01, 0.04, 0.03, 0.005, 0.5, 0.04, 1e-40, 0.2, 0.03); p.adjust(p, "holm")
        double[] p = {0.01, 0.04, 0.03, 0.005, 0.5, 0.04, 1e-40, 0.2, 0.03};
        double[] copy = p.clone();
        assertAll(Holm.adjust(p), new double[] {0.070000000000000007, 0.17999999999999999, 0.17999999999999999,
            0.040000000000000001, 0.5, 0.17999999999999999, 9.0000000000000002e-40, 0.40000000000000002,
            0.17999999999999999});
        assertThat(p).containsExactly(copy);
    }

    @Test
    void twentyFiveSeededValues() {
        // R 4.2.2: set.seed(5); q <- round(runif(25)^3, 4); p.adjust(q, "holm")
        double[] q = {0.008, 0.3217, 0.7708, 0.023, 0.0011, 0.3446, 0.1472, 0.5274, 0.8751, 0.0013, 0.0204, 0.118,
            0.0323, 0.1748, 0.0181, 0.0082, 0.0582, 0.6999, 0.1709, 0.5973, 0.7055, 0.3743, 0.0094, 0.0115, 0.0027};
        assertAll(Holm.adjust(q), new double[] {0.17599999999999999, 1, 1, 0.36799999999999999, 0.0275, 1, 1, 1, 1,
            0.031199999999999999, 0.3468, 1, 0.48450000000000004, 1, 0.32580000000000003, 0.17599999999999999,
            0.81479999999999997, 1, 1, 1, 1, 1, 0.188, 0.2185, 0.062100000000000002});
    }

    @Test
    void edgeCases() {
        assertThat(Holm.adjust(new double[0])).isEmpty();
        assertThat(Holm.adjust(new double[] {0.3})).containsExactly(0.3);
        assertThatThrownBy(() -> Holm.adjust(new double[] {0.1, Double.NaN})).isInstanceOf(StatsException.class)
                .hasMessageContaining("p-value 2");
    }
}
