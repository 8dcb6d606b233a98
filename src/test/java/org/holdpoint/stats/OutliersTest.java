package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** Grubbs and generalized ESD against the NIST/SEMATECH e-Handbook worked examples and R 4.2.2 formula values. */
class OutliersTest {
    private static final Sample URANIUM = ReferenceData.decimals("/org/holdpoint/stats/handbook/grubbs-uranium-8.txt");
    private static final Sample ROSNER =
            ReferenceData.decimals("/org/holdpoint/stats/handbook/rosner-generalized-esd-54.txt");

    @Test
    void grubbsUraniumHandbookExample() {
        // e-Handbook §1.3.5.17.1: G = 2.4687 (truncated; recomputed 2.468765), one-sided critical 2.032 at α = 0.05
        GrubbsResult max = Grubbs.withDefaults().with(OutlierSide.MAXIMUM).test(URANIUM);
        assertThat(max.g()).isCloseTo(2.4687, within(1e-4));
        assertThat(max.critical()).isCloseTo(2.032, within(5e-4));
        assertThat(max.outlier()).isTrue();
        assertThat(max.index()).isEqualTo(7);
        assertThat(max.value()).isEqualTo(245.57);
        // R 4.2.2: G <- (max(x)-mean(x))/sd(x); t2 <- n*(n-2)*G^2/((n-1)^2-n*G^2); n*pt(-sqrt(t2), n-2)
        assertThat(max.g()).isCloseTo(2.4687646112124502, within(1e-13));
        assertThat(max.p()).isCloseTo(1.5013193410356792e-07, within(1e-8 * 1.5e-7));
        // R 4.2.2: t <- qt(1-0.05/n, n-2); (n-1)/sqrt(n)*sqrt(t^2/(n-2+t^2))
        assertThat(max.critical()).isCloseTo(2.031652001549944, within(1e-12));
    }

    @Test
    void grubbsTwoSidedAndMinimum() {
        GrubbsResult two = Grubbs.withDefaults().test(URANIUM);
        // docs/sources.md §B4 (C) and R 4.2.2 qt(1-0.05/(2*n), n-2) in the same formula: 2.1266450871954636
        assertThat(two.critical()).isCloseTo(2.1266450871954636, within(1e-12));
        assertThat(two.p()).isCloseTo(3.0026386820713584e-07, within(1e-8 * 3e-7));
        assertThat(two.outlier()).isTrue();
        GrubbsResult min = Grubbs.withDefaults().with(OutlierSide.MINIMUM).test(URANIUM);
        // R 4.2.2: (mean(x)-min(x))/sd(x) = 0.44937524415662461; Bonferroni bound 2.67 clipped to 1
        assertThat(min.g()).isCloseTo(0.44937524415662461, within(1e-13));
        assertThat(min.p()).isEqualTo(1.0);
        assertThat(min.outlier()).isFalse();
        assertThat(min.index()).isZero();
    }

    @Test
    void grubbsAtItsBoundAndOnEqualValues() {
        // all but one equal: G = (n−1)/√n, the largest possible value (Grubbs 1950), t infinite, p 0
        GrubbsResult r = Grubbs.withDefaults().test(Sample.of(1, 1, 1, 1, 5));
        assertThat(r.g()).isCloseTo(4 / Math.sqrt(5), within(1e-12));
        assertThat(r.p()).isLessThan(1e-12);
        assertThatThrownBy(() -> Grubbs.withDefaults().test(Sample.of(2, 2, 2))).isInstanceOf(StatsException.class)
                .hasMessageContaining("equal");
        assertThatThrownBy(() -> Grubbs.withDefaults().test(Sample.of(2, 3))).hasMessageContaining("at least 3");
    }

    @Test
    void rosnerHandbookExample() {
        // e-Handbook §1.3.5.17.3 (docs/sources.md §B5): R_i and λ_i printed truncated to 3 decimals, 3 outliers
        double[] r = {3.118, 2.942, 3.179, 2.810, 2.815, 2.848, 2.279, 2.310, 2.101, 2.067};
        double[] lambda = {3.158, 3.151, 3.143, 3.136, 3.128, 3.120, 3.111, 3.103, 3.094, 3.085};
        EsdResult res = GeneralizedEsd.withDefaults().withMaxOutliers(10).test(ROSNER);
        assertThat(res.steps()).hasSize(10);
        for (int i = 0; i < 10; i++) {
            assertThat(res.steps().get(i).r()).isCloseTo(r[i], within(1.5e-3));
            assertThat(res.steps().get(i).lambda()).isCloseTo(lambda[i], within(1.5e-3));
        }
        assertThat(res.count()).isEqualTo(3);
        // removal order 6.01, 5.42, 5.34 (docs/sources.md §B5, recomputed); the file is sorted, so positions 53, 52, 51
        assertThat(res.outlierIndices()).containsExactly(53, 52, 51);
        assertThat(res.steps().subList(0, 3)).extracting(EsdResult.Step::value).containsExactly(6.01, 5.42, 5.34);
    }

    @Test
    void esdIndicesReferToTheCallersOrderAndTheInputIsUntouched() {
        double[] values = ROSNER.values();
        SplittableRandom rnd = new SplittableRandom(11L);
        for (int i = values.length - 1; i > 0; i--) {
            int j = rnd.nextInt(i + 1);
            double t = values[i];
            values[i] = values[j];
            values[j] = t;
        }
        double[] copy = values.clone();
        Sample shuffled = Sample.of(values);
        EsdResult res = GeneralizedEsd.withDefaults().withMaxOutliers(10).test(shuffled);
        assertThat(res.count()).isEqualTo(3);
        assertThat(res.outlierIndices()).extracting(shuffled::value).containsExactly(6.01, 5.42, 5.34);
        assertThat(shuffled.values()).containsExactly(copy);
        // default r = ceil(54/10) = 6 (common practice, no source)
        assertThat(GeneralizedEsd.withDefaults().test(shuffled).maxTests()).isEqualTo(6);
    }

    @Test
    void esdStopsWhenTheRemainingValuesAreEqual() {
        EsdResult res = GeneralizedEsd.withDefaults().withMaxOutliers(3).test(Sample.of(4, 4, 4, 4, 4, 9));
        assertThat(res.steps()).hasSize(1);
        assertThat(res.notes()).singleElement().asString().contains("all equal");
        assertThat(res.steps().get(0).index()).isEqualTo(5);
    }
}
