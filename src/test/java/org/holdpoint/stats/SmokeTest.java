package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

class SmokeTest {
    @Test
    void medianOfFour() {
        // type-7 median of {1,2,3,4} is 2.5 (Hyndman & Fan 1996 definition 7)
        assertThat(Quantiles.median(new double[] {1, 2, 3, 4})).isEqualTo(2.5);
    }
}
