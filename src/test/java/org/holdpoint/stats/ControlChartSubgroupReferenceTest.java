package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.holdpoint.stats.Accuracy.assertRel;
import static org.holdpoint.stats.Accuracy.number;

import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.TreeMap;
import java.util.stream.Collectors;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * Charts of subgroup means and sds, and the ISO 7870-2 tests 1–8 on individuals and on subgroup means, on seeded
 * cases of our own (planted alternation, hugging, mixture and zone patterns; equal and unequal subgroup sizes, a
 * subgroup of one; a slow trend) against the formulas written out independently in base R 4.2.2
 * ({@code control/make-subgroup-values.R}; docs/sources.md): limits within 1e-12 relative, signals exactly. A
 * handbook's worked individuals chart and the constants' tables are checked below.
 */
class ControlChartSubgroupReferenceTest {
    static Stream<Map<String, String>> rows() {
        return Accuracy.csv("control/subgroup-values.csv").stream();
    }

    /** The phase's subgroups in order (individual values are subgroups of one). */
    private static double[][] groups(String id, String phase) {
        TreeMap<Integer, List<Double>> g = new TreeMap<>();
        for (Map<String, String> r : Accuracy.csv("control/subgroup-samples.csv")) {
            if (r.get("id").equals(id) && r.get("phase").equals(phase)) {
                g.computeIfAbsent(Integer.parseInt(r.get("subgroup")), k -> new ArrayList<>())
                        .add(Double.parseDouble(r.get("x")));
            }
        }
        return g.values().stream().map(l -> l.stream().mapToDouble(Double::doubleValue).toArray())
                .toArray(double[][]::new);
    }

    private static double[] flat(double[][] g) {
        return Stream.of(g).flatMapToDouble(java.util.Arrays::stream).toArray();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("rows")
    void limitsAndSignalsOfEveryTestAgreeWithR(Map<String, String> row) {
        String id = row.get("id");
        String what = id + " " + row.get("phase");
        boolean means = row.get("kind").equals("means");
        ControlChart.Limits l = means ? ControlChart.subgroupLimits(groups(id, "b"))
                : ControlChart.limits(flat(groups(id, "b")));
        assertRel(what + " centre", l.center(), number(row, "center"), 1e-12);
        assertRel(what + " sigma", l.sigma(), number(row, "sigma"), 1e-12);
        assertRel(what + " LCL", l.lcl(), number(row, "lcl"), 1e-12);
        assertRel(what + " UCL", l.ucl(), number(row, "ucl"), 1e-12);
        assertRel(what + " spread centre", l.spreadCenter(), number(row, "spread_center"), 1e-12);
        assertThat(l.spreadLcl()).as(what + " spread LCL").isCloseTo(number(row, "spread_lcl"),
                org.assertj.core.data.Offset.offset(1e-12 * l.spreadUcl()));
        assertRel(what + " spread UCL", l.spreadUcl(), number(row, "spread_ucl"), 1e-12);
        assertThat(l.size()).as(what + " size").isEqualTo(Integer.parseInt(row.get("size")));
        ControlChart.Phase p = means ? ControlChart.judgeSubgroups(groups(id, row.get("phase")), l,
                ControlChart.ALL_TESTS) : ControlChart.judge(flat(groups(id, row.get("phase"))), l, ControlChart.ALL_TESTS);
        assertThat(words(p, ControlChart.Chart.LOCATION)).as(what + " signals").isEqualTo(row.get("signals"));
        assertThat(words(p, ControlChart.Chart.SPREAD)).as(what + " sd signals").isEqualTo(row.get("sd_signals"));
    }

    @Test
    void everyTestIsExercisedByTheCases() {
        // the planted patterns must make every test signal somewhere, or the comparison above proves little
        String all = rows().map(r -> r.get("signals")).collect(Collectors.joining(" "));
        for (int t = 1; t <= 8; t++) {
            assertThat(all).as("test " + t).containsPattern("(^|\\s)" + t + ":");
        }
        assertThat(rows().map(r -> r.get("sd_signals")).collect(Collectors.joining(" "))).contains("1:");
    }

    private static String words(ControlChart.Phase p, ControlChart.Chart chart) {
        return p.signals().stream().filter(s -> s.chart() == chart).map(s -> s.test() + ":" + s.index())
                .collect(Collectors.joining(" "));
    }

    @Test
    void theHandbooksWorkedIndividualsChartIsReproduced() {
        // NIST/SEMATECH e-Handbook of Statistical Methods, §6.3.2.2 (individuals control charts): the flow rates of
        // the first ten batches of a new process, with MR-bar = 1.8778, centre 50.81, UCL 55.8041, LCL 45.8159 and
        // the moving-range UCL 6.1347; these figures are from memory of that page (its tables round d2 to 1.128 and
        // D4 to 3.267), so the limits are compared within what that rounding explains
        double[] flow = {49.6, 47.6, 49.9, 51.3, 47.8, 51.2, 52.6, 52.4, 53.6, 52.1};
        ControlChart.Limits l = ControlChart.limits(flow);
        assertThat(l.center()).isCloseTo(50.81, org.assertj.core.data.Offset.offset(5e-12));
        assertThat(l.mrBar()).isCloseTo(1.8778, org.assertj.core.data.Offset.offset(5e-5));
        double rounding = 3 * l.mrBar() * Math.abs(1 / 1.128 - 1 / ControlChart.D2);
        assertThat(l.ucl()).isCloseTo(55.8041, org.assertj.core.data.Offset.offset(rounding + 5e-5));
        assertThat(l.lcl()).isCloseTo(45.8159, org.assertj.core.data.Offset.offset(rounding + 5e-5));
        assertThat(l.mrUcl()).isCloseTo(6.1347, org.assertj.core.data.Offset.offset(l.mrBar() * 5e-4 + 5e-5));
        // with the tables' rounded constants the handbook's limits come out to its four decimals
        assertThat(l.center() + 3 * l.mrBar() / 1.128).isCloseTo(55.8041, org.assertj.core.data.Offset.offset(5e-5));
        assertThat(3.267 * l.mrBar()).isCloseTo(6.1347, org.assertj.core.data.Offset.offset(1e-4));
        assertThat(ControlChart.signals(flow, l)).isEmpty();
    }

    @Test
    void subgroupLimitsOfEqualSizesAreTheTablesA3B3B4() {
        // ISO 7870-2 Table 2 (also Montgomery's Appendix VI), from memory of those tables to their printed
        // decimals: n = 4: A3 1.628, B3 0, B4 2.266; n = 5: A3 1.427, B3 0, B4 2.089; n = 10: A3 0.975,
        // B3 0.284, B4 1.716
        double[][] table = {{4, 1.628, 0, 2.266}, {5, 1.427, 0, 2.089}, {10, 0.975, 0.284, 1.716}};
        for (double[] t : table) {
            int n = (int) t[0];
            double[][] g = new double[6][n];
            java.util.Random rnd = new java.util.Random(n);
            for (double[] sub : g) {
                for (int j = 0; j < n; j++) {
                    sub[j] = 20 + rnd.nextGaussian();
                }
            }
            ControlChart.Limits l = ControlChart.subgroupLimits(g);
            double sBar = Stream.of(g).mapToDouble(x -> Descriptives.of(Sample.of(x)).sd()).average().orElseThrow();
            double xBar = Stream.of(g).mapToDouble(x -> Descriptives.of(Sample.of(x)).mean()).average().orElseThrow();
            assertThat(l.spreadCenter()).as("n = %d s-bar", n).isCloseTo(sBar, org.assertj.core.data.Offset.offset(1e-12));
            assertThat(l.center()).as("n = %d centre", n).isCloseTo(xBar, org.assertj.core.data.Offset.offset(1e-12));
            assertThat((l.ucl() - l.center()) / sBar).as("n = %d A3", n).isCloseTo(t[1],
                    org.assertj.core.data.Offset.offset(5e-4));
            assertThat(l.spreadLcl() / sBar).as("n = %d B3", n).isCloseTo(t[2], org.assertj.core.data.Offset.offset(5e-4));
            assertThat(l.spreadUcl() / sBar).as("n = %d B4", n).isCloseTo(t[3], org.assertj.core.data.Offset.offset(5e-4));
        }
    }

    @Test
    void limitsNeedASubgroupThatVaries() {
        assertThatThrownBy(() -> ControlChart.subgroupLimits(new double[][] {{1}, {2}}))
                .hasMessageContaining("at least one subgroup of 2");
        assertThatThrownBy(() -> ControlChart.subgroupLimits(new double[][] {{1, 1}, {2, 2}}))
                .hasMessageContaining("within-subgroup sd is 0");
        assertThatThrownBy(() -> ControlChart.tests(List.of(9))).hasMessageContaining("tests 1 to 8");
    }
}
