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
                .mapToObj(i -> new org.holdpoint.study.Origin("f.csv", null, i + 2, 3).describe()).toList();
        var st = new org.holdpoint.result.Stability(ControlChart.judge(b, l), ControlChart.judge(a, l),
                origins.subList(0, b.length), origins.subList(0, a.length), "the sequence column",
                ControlChart.DEFAULT_TESTS);
        return result(st);
    }

    private static CharacteristicResult result(org.holdpoint.result.Stability st) {
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
    void subgroupsGiveAMeansChartAboveAnSdChartWithTheSpreadSignalsRingedThere() {
        double[][] b = {{10.01, 9.99, 10.02, 9.98, 10.00}, {10.00, 10.03, 9.97, 10.01, 9.99},
            {9.98, 10.02, 10.00, 10.01, 9.99}, {10.02, 9.99, 10.00, 9.98, 10.01}};
        // the after phase: one subgroup far off the centre, one with a wide spread, one of four values
        double[][] a = {{10.00, 10.01, 9.99, 10.02, 9.98}, {10.10, 10.11, 10.09, 10.12, 10.10},
            {9.90, 10.10, 9.85, 10.15, 10.00}, {10.00, 10.01, 9.99, 10.02}};
        ControlChart.Limits l = ControlChart.subgroupLimits(b);
        ControlChart.Phase pa = ControlChart.judgeSubgroups(a, l, ControlChart.DEFAULT_TESTS);
        var labels = java.util.stream.IntStream.range(0, 4).mapToObj(i -> "subgroup " + (i + 1)).toList();
        var st = new org.holdpoint.result.Stability(ControlChart.judgeSubgroups(b, l, ControlChart.DEFAULT_TESTS), pa,
                labels, labels, "the sequence column", ControlChart.DEFAULT_TESTS);
        JFreeChart chart = RunChart.create(result(st), 4, ChartTheme.withDefaults());
        var both = (org.jfree.chart.plot.CombinedDomainXYPlot) chart.getPlot();
        XYPlot means = (XYPlot) both.getSubplots().get(0);
        XYPlot sds = (XYPlot) both.getSubplots().get(1);
        assertThat(means.getDataset(0).getItemCount(1)).isEqualTo(4);
        assertThat(pa.signals()).contains(new ControlChart.Signal(1, 2), new ControlChart.Signal(1, 3,
                ControlChart.Chart.SPREAD));
        long location = pa.signals().stream().filter(x -> x.chart() == ControlChart.Chart.LOCATION)
                .map(ControlChart.Signal::index).distinct().count();
        long spread = pa.signals().stream().filter(x -> x.chart() == ControlChart.Chart.SPREAD).count();
        assertThat(means.getDataset(2).getItemCount(0)).isEqualTo((int) location);
        assertThat(sds.getDataset(2).getItemCount(0)).isEqualTo((int) spread);
        // the subgroup of four has its own (wider) limits, drawn as short bars
        assertThat(means.getDataset(3).getSeriesCount()).isEqualTo(2);
        assertThat(means.getDataset(3).getYValue(1, 0)).isEqualTo(l.ucl(4));
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
