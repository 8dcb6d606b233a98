package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;

import java.math.BigDecimal;
import org.junit.jupiter.api.Test;

/**
 * A margin entered as a percentage of the tolerance is that percentage of USL − LSL in decimal
 * arithmetic, as a person computes it by hand (arithmetic, no outside source needed): 20 % of
 * 10.10 − 9.90 is 0.04 exactly, i.e. the double nearest to 0.04, not 0.04000000000000057.
 */
class MarginPercentTest {

    @Test
    void percentagesOfTheToleranceAreExactDecimals() {
        Margin m = Margin.percentOfTolerance(20, 20, 9.90, 10.10);
        assertThat(m.lower()).isEqualTo(-0.04);
        assertThat(m.upper()).isEqualTo(0.04);
        // asymmetric, a tolerance 7.988 to 8.012 (width 0.024): 25 % is 0.006, 12.5 % is 0.003
        Margin a = Margin.percentOfTolerance(12.5, 25, 7.988, 8.012);
        assertThat(a.lower()).isEqualTo(-0.003);
        assertThat(a.upper()).isEqualTo(0.006);
        // every result is the double nearest to the exact decimal product
        for (double pct : new double[] {1, 5, 7.5, 10, 15, 33.3}) {
            for (double[] lim : new double[][] {{0.95, 1.05}, {24.99, 25.021}, {-0.3, 0.3}, {11.98, 12.02}}) {
                double expected = BigDecimal.valueOf(pct).multiply(BigDecimal.valueOf(lim[1]).subtract(
                        BigDecimal.valueOf(lim[0]))).divide(BigDecimal.valueOf(100)).doubleValue();
                assertThat(Margin.percentOfTolerance(pct, pct, lim[0], lim[1]).upper()).isEqualTo(expected);
            }
        }
    }
}
