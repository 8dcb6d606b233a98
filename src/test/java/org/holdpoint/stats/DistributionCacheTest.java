package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** The distribution instances kept for reuse stay bounded however many fractional degrees of freedom pass. */
class DistributionCacheTest {
    @Test
    void thousandsOfFractionalDegreesOfFreedomKeepTheCachesSmall() {
        for (int i = 0; i < 3000; i++) {
            double df = 3 + i * 0.0137;
            Distributions.tQuantile(0.95, df);
            Distributions.chiSquaredQuantile(0.05, df);
            Distributions.fQuantile(0.95, df, df + 1);
        }
        // three caches of at most 256 entries each (Distributions.CACHE_SIZE)
        assertThat(Distributions.cachedInstances()).isLessThanOrEqualTo(3 * 256);
    }
}
