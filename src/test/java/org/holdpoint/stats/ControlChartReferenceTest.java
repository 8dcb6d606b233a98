package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.holdpoint.stats.Accuracy.assertRel;
import static org.holdpoint.stats.Accuracy.number;

import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Individuals / moving-range limits from the before phase and the signals of ISO 7870-2 tests 1–3 in both
 * phases, on three seeded cases of our own (stable; a shifted after phase; a planted trend and outlier), against
 * the same formulas written out in base R 4.2.2 ({@code control/make-control-values.R}; docs/sources.md).
 * Limits within 1e-12 relative; the signals (test and 1-based point) exactly.
 */
class ControlChartReferenceTest {
    static Stream<Map<String, String>> rows() {
        return Accuracy.csv("control/control-values.csv").stream();
    }

    private static double[] phase(String id, String phase) {
        return Accuracy.csv("control/control-samples.csv").stream()
                .filter(r -> r.get("id").equals(id) && r.get("phase").equals(phase))
                .mapToDouble(r -> Double.parseDouble(r.get("x"))).toArray();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("rows")
    void limitsAndSignalsAgreeWithR(Map<String, String> row) {
        String id = row.get("id");
        ControlChart.Limits before = ControlChart.limits(phase(id, "b"));
        String what = id + " " + row.get("phase");
        assertRel(what + " centre", before.center(), number(row, "center"), 1e-12);
        assertRel(what + " sigma", before.sigma(), number(row, "sigma"), 1e-12);
        assertRel(what + " LCL", before.lcl(), number(row, "lcl"), 1e-12);
        assertRel(what + " UCL", before.ucl(), number(row, "ucl"), 1e-12);
        assertRel(what + " MR bar", before.mrBar(), number(row, "mrbar"), 1e-12);
        assertRel(what + " MR UCL", before.mrUcl(), number(row, "mrucl"), 1e-12);
        ControlChart.Phase p = ControlChart.judge(phase(id, row.get("phase")), before);
        assertRel(what + " own centre", p.own().center(), number(row, "own_center"), 1e-12);
        assertRel(what + " own sigma", p.own().sigma(), number(row, "own_sigma"), 1e-12);
        String got = p.signals().stream().map(s -> s.test() + ":" + s.index()).collect(Collectors.joining(" "));
        assertThat(got).as(what + " signals").isEqualTo(row.get("signals"));
    }

    @Test
    void theConstantsAreTheStandardsTableValuesUnrounded() {
        // d2 = 1.128 and D4 = 3.267 for moving ranges of two, as tabulated in ISO 7870-2 (and Montgomery's
        // appendix VI); from memory of those tables, to their three decimals
        assertThat(ControlChart.D2).isCloseTo(1.128, org.assertj.core.data.Offset.offset(0.0005));
        assertThat(ControlChart.D4).isCloseTo(3.267, org.assertj.core.data.Offset.offset(0.0005));
    }

    @Test
    void aPointOnTheCentreLineEndsARunAndEqualNeighboursEndATrend() {
        ControlChart.Limits l = new ControlChart.Limits(0, 1, -3, 3, 1.128, 3.685);
        double[] run = {1, 1, 1, 1, 1, 1, 1, 1, 0, 1, 1};
        assertThat(ControlChart.signals(run, l)).isEmpty();
        // the repeated 0.3 restarts the trend, so it completes six rising points only at the ninth point (which is
        // also the ninth in a row above the centre)
        double[] trend = {0.1, 0.2, 0.3, 0.3, 0.4, 0.5, 0.6, 0.7, 0.8};
        assertThat(ControlChart.signals(trend, l)).containsExactly(new ControlChart.Signal(2, 9),
                new ControlChart.Signal(3, 9));
        assertThatThrownBy(() -> ControlChart.limits(new double[] {2, 2, 2})).hasMessageContaining("moving range is 0");
        assertThat(List.of(ControlChart.signals(new double[] {3.5}, l).get(0).test())).containsExactly(1);
    }
}
