package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.holdpoint.stats.Accuracy.assertRel;
import static org.holdpoint.stats.Accuracy.number;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The Pitman–Morgan test of a paired variance ratio, its interval and the paired sd-growth bound on five seeded
 * paired samples of our own (n = 5 to 80, correlations −0.4 to 0.9), against base R 4.2.2: {@code cor.test} of
 * the sums and differences for r, t and p; the interval and the bound by inverting {@code cor.test} with
 * {@code uniroot} (an independent route to the closed form used here); the sd-growth p by {@code cor.test(...,
 * alternative = "less")}. Inputs, calls and version: {@code paired/} and {@code make-pitman-morgan-values.R}
 * (docs/sources.md). Agreement: statistics, bounds 1e-9 relative; p-values 1e-8 relative.
 */
class PitmanMorganReferenceTest {
    static Stream<Map<String, String>> rows() {
        return Accuracy.csv("paired/pm-values.csv").stream();
    }

    private static Sample column(String id, String column) {
        List<String> v = new ArrayList<>();
        for (Map<String, String> r : Accuracy.csv("paired/pm-samples.csv")) {
            if (r.get("id").equals(id)) {
                v.add(r.get(column));
            }
        }
        return Sample.of(v.stream().mapToDouble(Double::parseDouble).toArray());
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("rows")
    void agreesWithCorTestAndItsInversion(Map<String, String> row) {
        String id = row.get("id");
        double alpha = number(row, "alpha");
        Sample b = column(id, "before");
        Sample a = column(id, "after");
        VarianceRatioResult v = SpreadTests.pitmanMorgan(b, a, alpha);
        String what = id + " alpha " + alpha;
        assertThat(v.method()).isEqualTo(VarianceRatioResult.SpreadMethod.PITMAN_MORGAN);
        assertRel(what + " ratio", v.ratio(), number(row, "ratio"), 1e-12);
        assertRel(what + " r of sums and differences", v.r(), number(row, "r_sd"), 1e-9);
        assertRel(what + " t", v.t(), number(row, "t"), 1e-9);
        assertRel(what + " p", v.p(), number(row, "p"), 1e-8);
        assertRel(what + " interval lower", v.ciLower(), number(row, "ci_lower"), 1e-9);
        assertRel(what + " interval upper", v.ciUpper(), number(row, "ci_upper"), 1e-9);
        SdGrowthResult g = SpreadTests.sdGrowthPaired(b, a, number(row, "limit"), alpha);
        assertRel(what + " sd-growth bound", g.upperBound(), number(row, "growth_bound"), 1e-9);
        assertRel(what + " sd-growth p", g.p(), number(row, "growth_p"), 1e-8);
        assertThat(g.met()).isEqualTo(g.p() < alpha).isEqualTo(g.upperBound() < g.limit());
    }

    @Test
    void anExactLinearRelationIsRefusedInWords() {
        Sample b = Sample.of(1.0, 2.0, 3.5, 4.0);
        assertThatThrownBy(() -> SpreadTests.pitmanMorgan(b, Sample.of(2.0, 3.0, 4.5, 5.0), 0.05))
                .isInstanceOf(StatsException.class).hasMessageContaining("exact linear function");
        assertThatThrownBy(() -> SpreadTests.pitmanMorgan(Sample.of(1, 2), Sample.of(1, 3), 0.05))
                .hasMessageContaining("at least 3 pairs");
    }
}
