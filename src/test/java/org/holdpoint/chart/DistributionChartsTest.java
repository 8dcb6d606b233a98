package org.holdpoint.chart;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.awt.image.BufferedImage;
import java.util.Arrays;
import java.util.List;
import org.holdpoint.stats.Descriptives;
import org.holdpoint.stats.Sample;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.SpecLimits;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.Range;
import org.jfree.data.xy.IntervalXYDataset;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.Test;

/** Rendering checks of the histograms and the normal probability plot. */
class DistributionChartsTest {
    private final ChartTheme theme = ChartTheme.withDefaults();
    private final List<ChartFixtures.Item> demo = ChartFixtures.demo();

    @Test
    void histogramHasOnePanelPerGroupCountingEveryValueOverCommonBins() {
        ChartFixtures.Item it = demo.get(0);
        SpecLimits limits = it.result().settings().spec();
        JFreeChart chart = DistributionCharts.histogram(it.data(), limits, theme);
        CombinedDomainXYPlot plot = (CombinedDomainXYPlot) chart.getPlot();
        List<XYPlot> panels = plot.getSubplots();
        assertThat(panels).hasSize(2);
        Sample[] groups = {it.data().before().sample(), it.data().after().sample()};
        double[][] starts = new double[2][];
        for (int g = 0; g < 2; g++) {
            IntervalXYDataset bars = (IntervalXYDataset) panels.get(g).getDataset(0);
            int bins = bars.getItemCount(0);
            double total = 0;
            starts[g] = new double[bins];
            for (int b = 0; b < bins; b++) {
                total += bars.getYValue(0, b);
                starts[g][b] = bars.getStartXValue(0, b);
            }
            assertThat(total).as("every value counted once").isEqualTo(groups[g].size());
            XYDataset curve = panels.get(g).getDataset(1);
            assertThat(curve.getItemCount(0)).isEqualTo(DistributionCharts.CURVE_POINTS);
            // the curve's peak is n·w·φ(0)/sd at the group mean (density of the fitted normal, scaled to counts)
            Descriptives d = Descriptives.of(groups[g]);
            double w = bars.getEndXValue(0, 0) - bars.getStartXValue(0, 0);
            double peak = 0;
            for (int i = 0; i < curve.getItemCount(0); i++) {
                peak = Math.max(peak, curve.getYValue(0, i));
            }
            assertThat(peak).isCloseTo(d.n() * w / (Math.sqrt(2 * Math.PI) * d.sd()), within(0.01 * peak));
        }
        assertThat(starts[0]).as("common bins").containsExactly(starts[1]);
        assertThat(panels.get(0).getRangeAxis().getRange()).isEqualTo(panels.get(1).getRangeAxis().getRange());
        Range x = plot.getDomainAxis().getRange();
        for (Sample s : groups) {
            for (double v : s.values()) {
                assertThat(x.contains(v)).isTrue();
            }
        }
        assertThat(x.contains(11.95) && x.contains(12.05)).isTrue();
        assertThat(panels.get(0).getDomainMarkers(org.jfree.chart.ui.Layer.FOREGROUND).size()).isEqualTo(3);
        BufferedImage img = ChartAssertions.decode(ChartExport.png(chart, theme.width(), theme.standardHeight(),
                theme.scale()));
        ChartAssertions.assertRendered(img, theme.width(), theme.standardHeight(), theme.scale());
    }

    /**
     * The legend reads as the text output does: mean and sd at the characteristic's resolution plus two
     * decimals, the bin width without floating-point noise (the project's display rule, docs/methods.md;
     * arithmetic on the demo data, no outside value needed).
     */
    @Test
    void legendAndNoteShowValuesAtTheResolutionOfTheData() {
        for (ChartFixtures.Item it : demo) {
            JFreeChart chart = DistributionCharts.histogram(it.data(), it.result().settings().spec(), theme);
            int decimals = it.data().resolutionDecimals() + 2;
            var items = ((CombinedDomainXYPlot) chart.getPlot()).getFixedLegendItems();
            for (int g = 0; g < 2; g++) {
                String label = items.get(g).getLabel();
                assertThat(label).as(it.data().name()).matches("(before|after): n = \\d+, mean \u2212?\\d+\\.\\d{"
                        + decimals + "}, sd \\d+\\.\\d{" + decimals + "}");
            }
            String note = ((org.jfree.chart.title.TextTitle) chart.getSubtitle(1)).getText();
            assertThat(note).as(it.data().name()).containsPattern("bins of width \\d+(\\.\\d{1,6})? \\(")
                    .doesNotContainPattern("\\d{7,}");
        }
    }

    @Test
    void gridValuesGetBinEdgesHalfAStepOffTheGrid() {
        double[] v = {1.0, 1.1, 1.1, 1.2, 1.3, 1.3, 1.3, 1.4, 1.5, 1.7, 2.0, 2.2};
        double[] sorted = v.clone();
        Arrays.sort(sorted);
        assertThat(DistributionCharts.resolution(sorted)).isCloseTo(0.1, within(1e-12));
        double[] edges = DistributionCharts.binEdges(sorted, v.length);
        for (double e : edges) {
            for (double x : v) {
                assertThat(Math.abs(e - x)).as("edge %s vs value %s", e, x).isGreaterThan(0.049);
            }
        }
        int[] counts = DistributionCharts.counts(Sample.of(v), edges);
        assertThat(Arrays.stream(counts).sum()).isEqualTo(v.length);
    }

    @Test
    void constantGroupStillGetsABin() {
        double[] sorted = {4, 4, 4};
        double[] edges = DistributionCharts.binEdges(sorted, 3);
        assertThat(edges).hasSize(2);
        assertThat(DistributionCharts.counts(Sample.of(sorted), edges)).containsExactly(3);
    }

    @Test
    void probabilityPlotUsesBlomPositionsAgainstR() {
        ChartFixtures.Item torque = demo.get(2);
        XYPlot plot = DistributionCharts.normalProbability(torque.data(), torque.result().settings().spec(), theme)
                .getXYPlot();
        XYDataset points = plot.getDataset(0);
        assertThat(points.getSeriesCount()).isEqualTo(2);
        // R 4.2.2: n <- 8; sprintf("%.17g", qnorm(((1:n) - 3/8)/(n + 1/4)))
        double[] blom8 = {-1.4342001596863794, -0.85249503427469386, -0.47278912099226728, -0.15250597424624437,
            0.15250597424624424, 0.47278912099226722, 0.85249503427469386, 1.4342001596863794};
        Sample[] groups = {torque.data().before().sample(), torque.data().after().sample()};
        for (int g = 0; g < 2; g++) {
            double[] sorted = groups[g].values();
            Arrays.sort(sorted);
            assertThat(points.getItemCount(g)).isEqualTo(8);
            for (int i = 0; i < 8; i++) {
                assertThat(points.getXValue(g, i)).isCloseTo(blom8[i], within(1e-14));
                assertThat(points.getYValue(g, i)).isEqualTo(sorted[i]);
            }
            // the reference line passes through (0, mean) with slope sd
            XYDataset lines = plot.getDataset(1);
            Descriptives d = Descriptives.of(groups[g]);
            double x0 = lines.getXValue(g, 0);
            double x1 = lines.getXValue(g, 1);
            double slope = (lines.getYValue(g, 1) - lines.getYValue(g, 0)) / (x1 - x0);
            assertThat(slope).isCloseTo(d.sd(), within(1e-9 * d.sd()));
            assertThat(lines.getYValue(g, 0) - slope * x0).isCloseTo(d.mean(), within(1e-9 * Math.abs(d.mean())));
        }
        Range y = plot.getRangeAxis().getRange();
        assertThat(y.contains(21.0) && y.contains(27.0)).as("spec limits inside the value axis").isTrue();
    }

    @Test
    void blomQuantileForThirtyMatchesR() {
        // R 4.2.2: n <- 30; sprintf("%.17g", qnorm(((1:n) - 3/8)/(n + 1/4))[c(1, 2, 15, 30)])
        assertThat(DistributionCharts.blom(1, 30)).isCloseTo(-2.040281322010411, within(1e-14));
        assertThat(DistributionCharts.blom(2, 30)).isCloseTo(-1.6098160671844481, within(1e-14));
        assertThat(DistributionCharts.blom(15, 30)).isCloseTo(-0.041443733093996606, within(1e-14));
        assertThat(DistributionCharts.blom(30, 30)).isCloseTo(2.0402813220104106, within(1e-14));
    }

    @Test
    void probabilityPlotRendersAndKeepsTheCallersOrder() {
        ChartFixtures.Item it = demo.get(3);
        CharacteristicData d = it.data();
        double[] before = d.before().sample().values();
        JFreeChart chart = DistributionCharts.normalProbability(d, it.result().settings().spec(), theme);
        BufferedImage img = ChartAssertions.decode(ChartExport.png(chart, theme.width(), theme.standardHeight(),
                theme.scale()));
        ChartAssertions.assertRendered(img, theme.width(), theme.standardHeight(), theme.scale());
        assertThat(d.before().sample().values()).containsExactly(before);
    }
}
