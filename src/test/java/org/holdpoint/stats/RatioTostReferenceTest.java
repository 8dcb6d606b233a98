package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.holdpoint.stats.Accuracy.assertRel;
import static org.holdpoint.stats.Accuracy.number;

import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The TOST of a ratio after/before on the log scale against base R 4.2.2's {@code t.test} on the logarithms
 * (Welch, pooled, paired; conf.level 1 − 2α, exponentiated) and {@code pt} for the one-sided p-values, on three
 * seeded cases of our own ({@code ratio/}, {@code make-ratio-tost-values.R}; docs/sources.md). Agreement: ratio
 * and interval 1e-10 relative, p-values 1e-8 relative.
 */
class RatioTostReferenceTest {
    static Stream<Map<String, String>> rows() {
        return Accuracy.csv("ratio/ratio-tost-values.csv").stream();
    }

    private static Sample group(String id, String group) {
        return Sample.of(Accuracy.csv("ratio/ratio-samples.csv").stream()
                .filter(r -> r.get("id").equals(id) && r.get("group").equals(group))
                .mapToDouble(r -> Double.parseDouble(r.get("x"))).toArray());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("rows")
    void agreesWithTTestOnTheLogarithms(Map<String, String> row) {
        String design = row.get("design");
        EquivalenceTest t = EquivalenceTest.withDefaults().withAlpha(number(row, "alpha"))
                .withMargin(Margin.ratio(number(row, "lower"), number(row, "upper")));
        if (design.equals("pooled")) {
            t = t.with(VarianceAssumption.EQUAL);
        }
        EquivalenceResult r = t.testRatio(group(row.get("id"), "before"), group(row.get("id"), "after"),
                design.equals("paired"));
        String what = row.get("id") + " " + design + " alpha " + row.get("alpha");
        assertThat(r.ratio()).isTrue();
        assertRel(what + " ratio of geometric means", r.estimate(), number(row, "estimate"), 1e-10);
        assertRel(what + " interval lower", r.ciLower(), number(row, "ci_lower"), 1e-10);
        assertRel(what + " interval upper", r.ciUpper(), number(row, "ci_upper"), 1e-10);
        if (number(row, "p_lower") != null) {
            assertRel(what + " p lower", r.pLower(), number(row, "p_lower"), 1e-8);
        } else {
            assertThat(r.pLower()).isNull();
        }
        assertRel(what + " p upper", r.pUpper(), number(row, "p_upper"), 1e-8);
        assertThat(r.lowerMargin()).isEqualTo(number(row, "lower"));
        // the conclusion follows the interval against the margin on the ratio scale
        boolean inside = (r.lowerMargin() == null || r.ciLower() > r.lowerMargin()) && r.ciUpper() < r.upperMargin();
        assertThat(r.equivalent()).isEqualTo(inside);
    }

    @Test
    void aValueAtOrBelowZeroIsRefused() {
        EquivalenceTest t = EquivalenceTest.withDefaults().withMargin(Margin.ratio(0.9, 1.1));
        assertThatThrownBy(() -> t.testRatio(Sample.of(1, 2, 0), Sample.of(1, 2, 3), false))
                .hasMessageContaining("a ratio margin needs values above 0; 1 value(s) of the before group are not");
        assertThatThrownBy(() -> Margin.ratio(1.1, 1.2)).hasMessageContaining("between 0 and 1");
        assertThatThrownBy(() -> Margin.ratio(null, 0.9)).hasMessageContaining("above 1");
    }
}
