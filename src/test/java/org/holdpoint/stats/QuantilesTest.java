package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.holdpoint.stats.Accuracy.assertRel;

import org.junit.jupiter.api.Test;

/**
 * Type-7 quantiles (Hyndman &amp; Fan 1996, Am. Statist. 50:361–365, definition 7) against R 4.2.2
 * {@code quantile(x, probs, type = 7)}; replaces the former smoke test of the median of {1, 2, 3, 4}.
 */
class QuantilesTest {

    @Test
    void oneToFour() {
        // R: quantile(c(1, 2, 3, 4), c(0, 0.1, 0.25, 0.5, 0.75, 1), type = 7) = 1, 1.3, 1.75, 2.5, 3.25, 4
        double[] x = {1, 2, 3, 4};
        double[] p = {0, 0.1, 0.25, 0.5, 0.75, 1};
        double[] r = {1, 1.3, 1.75, 2.5, 3.25, 4};
        for (int i = 0; i < p.length; i++) {
            assertRel("Q(" + p[i] + ")", Quantiles.type7(x, p[i]), r[i], 1e-15);
        }
        assertThat(Quantiles.median(x)).isEqualTo(2.5);
    }

    @Test
    void unsortedWithTies() {
        // R: y <- c(10.2, -3.5, 7.75, 0.125, 4, 4, 12.5); quantile(y, c(0.05, 0.25, 0.5, 0.9), type = 7)
        //    = -2.4124999999999996, 2.0625, 4, 11.120000000000001; median(y) = 4
        double[] y = {10.2, -3.5, 7.75, 0.125, 4, 4, 12.5};
        double[] copy = y.clone();
        assertRel("Q(0.05)", Quantiles.type7Unsorted(y, 0.05), -2.4124999999999996, 1e-15);
        assertRel("Q(0.25)", Quantiles.type7Unsorted(y, 0.25), 2.0625, 1e-15);
        assertRel("Q(0.5)", Quantiles.type7Unsorted(y, 0.5), 4, 1e-15);
        assertRel("Q(0.9)", Quantiles.type7Unsorted(y, 0.9), 11.120000000000001, 1e-15);
        assertThat(y).as("input not modified").containsExactly(copy);
        assertThat(Descriptives.of(Sample.of(y)).median()).isEqualTo(4.0);
    }
}
