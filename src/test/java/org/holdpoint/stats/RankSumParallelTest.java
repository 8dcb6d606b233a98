package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/**
 * With many pairwise differences the equivalence interval is selected beside the confidence interval on a second
 * selection; the result must be exactly the one of selecting both one after the other (the values themselves are
 * checked against R in the rank reference tests).
 */
class RankSumParallelTest {
    @Test
    void sideBySideSelectionGivesTheSameResult() {
        java.util.SplittableRandom rnd = new java.util.SplittableRandom(20261204);
        long[] b = new long[3000];
        long[] a = new long[2500];
        for (int i = 0; i < b.length; i++) {
            b[i] = Math.round((25 + 0.01 * rnd.nextGaussian()) * 10_000);
        }
        for (int i = 0; i < a.length; i++) {
            a[i] = Math.round((25.002 + 0.01 * rnd.nextGaussian()) * 10_000);
        }
        Sample before = Sample.ofUnscaled(b, 4);
        Sample after = Sample.ofUnscaled(a, 4);
        RankSumTest t = RankSumTest.withDefaults().withMargin(Margin.symmetric(0.005));
        RankSumResult oneByOne = t.withParallelFrom(Long.MAX_VALUE).test(before, after);
        RankSumResult sideBySide = t.withParallelFrom(1).test(before, after);
        assertThat(oneByOne.method()).isEqualTo(RankMethod.NORMAL);
        assertThat(sideBySide).isEqualTo(oneByOne);
        assertThat(sideBySide.equivalence()).isNotNull();
    }
}
