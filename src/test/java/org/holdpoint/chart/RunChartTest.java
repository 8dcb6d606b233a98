package org.holdpoint.chart;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.List;
import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.result.Verdict;
import org.holdpoint.stats.ControlChart;
import org.holdpoint.stats.LocationMethod;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.XYPlot;
import org.junit.jupiter.api.Test;

/** The individuals chart: both phases on one axis, the before limits, the after's own limits, signals ringed. */
class RunChartTest {
    private static CharacteristicResult withStability(double[] b, double[] a) {
        ControlChart.Limits l = ControlChart.limits(b);
        var origins = java.util.stream.IntStream.range(0, Math.max(b.length, a.length))
                .mapToObj(i -> new org.holdpoint.study.Origin("f.csv", null, i + 2, 3)).toList();
        var st = new org.holdpoint.result.Stability(ControlChart.judge(b, l), ControlChart.judge(a, l),
                origins.subList(0, b.length), origins.subList(0, a.length), "the sequence column",
                java.util.Arrays.stream(b).boxed().toList(), java.util.Arrays.stream(a).boxed().toList());
        var checks = new org.holdpoint.result.AssumptionChecks(null, null, null, null, null, "", null, st);
        return CharacteristicResult.builder("Shaft OD", "mm", org.holdpoint.study.CharacteristicSettings.EMPTY, false,
                LocationMethod.WELCH).checks(checks).verdict(new Verdict(Verdict.Status.PASSED, List.of())).build();
    }

    @Test
    void everySignalPointIsRingedOnceAndThePhasesShareOneAxis() {
        double[] b = {10.02, 9.98, 10.01, 9.99, 10.03, 9.97, 10.00, 10.02, 9.98, 10.01};
        double[] a = {10.00, 10.01, 10.02, 10.03, 10.04, 10.05, 10.20, 10.01};
        CharacteristicResult r = withStability(b, a);
        JFreeChart chart = RunChart.create(r, 4, ChartTheme.withDefaults());
        XYPlot p = chart.getXYPlot();
        assertThat(p.getDataset(0).getItemCount(0)).isEqualTo(b.length);
        assertThat(p.getDataset(0).getItemCount(1)).isEqualTo(a.length);
        assertThat(p.getDataset(0).getXValue(1, 0)).isEqualTo(b.length + 1);
        long points = ControlChart.signals(a, ControlChart.limits(b)).stream().map(ControlChart.Signal::index)
                .distinct().count();
        assertThat(points).isPositive();
        assertThat(p.getDataset(2).getItemCount(0)).isEqualTo((int) points);
        assertThat(p.getAnnotations()).hasSize((int) points);
        assertThat(p.getRangeMarkers(org.jfree.chart.ui.Layer.FOREGROUND)).hasSize(3);
    }

    @Test
    void withoutARunOrderThereIsNoChart() {
        CharacteristicResult r = CharacteristicResult.builder("Shaft OD", "mm",
                org.holdpoint.study.CharacteristicSettings.EMPTY, false, LocationMethod.WELCH)
                .verdict(new Verdict(Verdict.Status.PASSED, List.of())).build();
        assertThatThrownBy(() -> RunChart.create(r, 4, ChartTheme.withDefaults())).isInstanceOf(ChartException.class)
                .hasMessageContaining("no run order");
    }
}
