package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.holdpoint.stats.Accuracy.assertRel;
import static org.holdpoint.stats.Accuracy.number;

import java.util.Map;
import java.util.stream.Stream;
import org.assertj.core.data.Offset;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Normal tolerance factors against scipy 1.17.1 ({@code tolerance/make_tolerance_factors.py}; docs/sources.md J):
 * the one-sided factor from scipy's noncentral t quantile, the exact two-sided factor from the Odeh–Owen integral
 * by scipy's quad and brentq, for n = 2 … 500 and six coverage/confidence pairs, within 1e-8 relative (the issue's
 * requirement). A seeded simulation stored beside four of them confirms that the two-sided factor reaches its
 * confidence; published table values and Wilks's sample sizes are checked below.
 */
class ToleranceFactorsReferenceTest {
    static Stream<Map<String, String>> rows() {
        return Accuracy.csv("tolerance/tolerance-factors.csv").stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("rows")
    void factorsAgreeWithScipy(Map<String, String> row) {
        int n = Integer.parseInt(row.get("n"));
        double p = number(row, "coverage");
        double g = number(row, "confidence");
        String what = "n = " + n + ", " + p + " / " + g;
        assertRel(what + " one-sided", ToleranceFactors.oneSided(n, p, g), number(row, "k_one_sided"), 1e-8);
        assertRel(what + " two-sided", ToleranceFactors.twoSided(n, p, g), number(row, "k_two_sided"), 1e-8);
        String sim = row.get("simulated_confidence");
        if (sim != null && !sim.isEmpty()) {
            // 400,000 simulated samples: standard error sqrt(g(1 - g)/400000) <= 0.00035
            double se = Math.sqrt(g * (1 - g) / 400_000);
            assertThat(Double.parseDouble(sim)).as(what + " simulated").isCloseTo(g, Offset.offset(3 * se));
        }
    }

    @Test
    void oneSidedFactorsAreThePublishedTables() {
        // one-sided normal tolerance factors as tabulated in ISO 16269-6 and the NIST/SEMATECH e-Handbook §7.2.6.3
        // (from memory of those tables, to their three decimals): 95 % / 95 %: n = 10 2.911, n = 20 2.396,
        // n = 30 2.220; 99 % / 95 %: n = 10 3.981
        assertThat(ToleranceFactors.oneSided(10, 0.95, 0.95)).isCloseTo(2.911, Offset.offset(5e-4));
        assertThat(ToleranceFactors.oneSided(20, 0.95, 0.95)).isCloseTo(2.396, Offset.offset(5e-4));
        assertThat(ToleranceFactors.oneSided(30, 0.95, 0.95)).isCloseTo(2.220, Offset.offset(5e-4));
        assertThat(ToleranceFactors.oneSided(10, 0.99, 0.95)).isCloseTo(3.981, Offset.offset(5e-4));
    }

    @Test
    void wilksSampleSizesAndConfidences() {
        // Wilks (1941): 95 % coverage with 95 % confidence needs 93 values for [min, max] and 59 for one bound
        // (the sizes every distribution-free validation plan quotes)
        assertThat(ToleranceFactors.wilksSampleSize(0.95, 0.95, true)).isEqualTo(93);
        assertThat(ToleranceFactors.wilksSampleSize(0.95, 0.95, false)).isEqualTo(59);
        // the formulas written out: 1 - n p^(n-1) + (n-1) p^n and 1 - p^n
        assertThat(ToleranceFactors.wilksTwoSided(93, 0.95)).isCloseTo(1 - 93 * Math.pow(0.95, 92)
                + 92 * Math.pow(0.95, 93), Offset.offset(1e-15));
        assertThat(ToleranceFactors.wilksTwoSided(92, 0.95)).isLessThan(0.95);
        assertThat(ToleranceFactors.wilksOneSided(58, 0.95)).isLessThan(0.95);
        assertThat(ToleranceFactors.wilksOneSided(59, 0.95)).isCloseTo(1 - Math.pow(0.95, 59), Offset.offset(1e-15));
    }

    @Test
    void levelsOutsideTheOpenIntervalAreRefused() {
        assertThatThrownBy(() -> ToleranceFactors.twoSided(10, 1.0, 0.95)).hasMessageContaining("coverage");
        assertThatThrownBy(() -> ToleranceFactors.oneSided(10, 0.95, 0.0)).hasMessageContaining("confidence");
        assertThatThrownBy(() -> ToleranceFactors.oneSided(1, 0.95, 0.95)).hasMessageContaining("at least 2");
    }
}
