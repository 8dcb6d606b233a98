package org.holdpoint.chart;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import org.holdpoint.stats.BoxStatistics;
import org.holdpoint.stats.Sample;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.SpecLimits;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.Marker;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.ui.Layer;
import org.jfree.data.Range;
import org.jfree.data.category.CategoryDataset;
import org.jfree.data.statistics.BoxAndWhiskerCategoryDataset;
import org.jfree.data.statistics.MultiValueCategoryDataset;
import org.junit.jupiter.api.Test;

/**
 * Rendering checks of the box plot on invented data. The box numbers themselves come from {@link BoxStatistics},
 * which is checked against R in {@code BoxStatisticsTest}; here we check that the chart shows exactly them.
 */
class BoxPlotChartTest {
    private final ChartTheme theme = ChartTheme.withDefaults();
    private final ChartFixtures.Item bore = ChartFixtures.demo().get(0);
    private final SpecLimits limits = bore.result().settings().spec();

    @Test
    void datasetCarriesStatsBoxesAndEveryOutlierAtItsValue() {
        JFreeChart chart = BoxPlotChart.create(bore.data(), limits, theme);
        BoxAndWhiskerCategoryDataset boxes = (BoxAndWhiskerCategoryDataset) chart.getCategoryPlot().getDataset(0);
        assertThat(boxes.getRowCount()).isEqualTo(1);
        assertThat(boxes.getColumnCount()).isEqualTo(2);
        Sample[] groups = {bore.data().before().sample(), bore.data().after().sample()};
        for (int g = 0; g < 2; g++) {
            BoxStatistics s = BoxStatistics.of(groups[g]);
            assertThat(boxes.getQ1Value(0, g).doubleValue()).isEqualTo(s.q1());
            assertThat(boxes.getMedianValue(0, g).doubleValue()).isEqualTo(s.median());
            assertThat(boxes.getQ3Value(0, g).doubleValue()).isEqualTo(s.q3());
            assertThat(boxes.getMinRegularValue(0, g).doubleValue()).isEqualTo(s.lowerWhisker());
            assertThat(boxes.getMaxRegularValue(0, g).doubleValue()).isEqualTo(s.upperWhisker());
            assertThat(boxes.getMeanValue(0, g).doubleValue()).isEqualTo(s.mean());
            // docs/methods.md §12: min/max outlier at the data extremes, so no value is drawn as a far-out marker
            assertThat(boxes.getMinOutlier(0, g).doubleValue()).isEqualTo(s.min());
            assertThat(boxes.getMaxOutlier(0, g).doubleValue()).isEqualTo(s.max());
            assertThat(doubles(boxes.getOutliers(0, g))).containsExactly(boxedList(s.outlierValues()));
        }
        // the fixture placed two outliers 0.0005 mm apart in the after group and one in the before group
        assertThat(doubles(boxes.getOutliers(0, 1))).containsExactlyInAnyOrder(12.031,
                12.0305);
        assertThat(doubles(boxes.getOutliers(0, 0))).containsExactly(11.972);
    }

    @Test
    void everyValueAndBothMeansAreInTheOverlayDatasets() {
        CategoryPlot plot = BoxPlotChart.create(bore.data(), limits, theme).getCategoryPlot();
        MultiValueCategoryDataset values = (MultiValueCategoryDataset) plot.getDataset(1);
        CategoryDataset means = plot.getDataset(2);
        Sample[] groups = {bore.data().before().sample(), bore.data().after().sample()};
        for (int g = 0; g < 2; g++) {
            assertThat(doubles(values.getValues(0, g))).containsExactlyInAnyOrder(boxedList(groups[g].values()));
            assertThat(means.getValue(0, g).doubleValue()).isEqualTo(BoxStatistics.of(groups[g]).mean());
        }
        List<Object> categories = new ArrayList<>();
        for (Object c : plot.getCategories()) {
            categories.add(c);
        }
        assertThat(categories).containsExactly("before (n = 30)", "after (n = 30)");
    }

    @Test
    void rangeContainsDataAndAllLimitsAndLimitsAreLabelled() {
        CategoryPlot plot = BoxPlotChart.create(bore.data(), limits, theme).getCategoryPlot();
        Range r = plot.getRangeAxis().getRange();
        for (Sample s : new Sample[] {bore.data().before().sample(), bore.data().after().sample()}) {
            for (double v : s.values()) {
                assertThat(r.contains(v)).as("value %s inside %s", v, r).isTrue();
            }
        }
        assertThat(r.contains(11.95) && r.contains(12.0) && r.contains(12.05)).isTrue();
        assertThat(plot.getRangeMarkers(Layer.FOREGROUND).size()).isEqualTo(3);
        List<String> labels = new ArrayList<>();
        for (Object m : plot.getRangeMarkers(Layer.FOREGROUND)) {
            labels.add(((Marker) m).getLabel());
            assertThat(((ValueMarker) m).getValue()).isIn(11.95, 12.0, 12.05);
        }
        assertThat(labels).containsExactlyInAnyOrder("LSL 11.95", "USL 12.05", "nominal 12");
        assertThat(plot.getRangeAxis().getLabel()).isEqualTo("Bore diameter \u00d8 12 H7 [mm]");
    }

    @Test
    void quartileMethodIsStatedOnTheChart() {
        JFreeChart chart = BoxPlotChart.create(bore.data(), limits, theme);
        StringBuilder text = new StringBuilder();
        for (int i = 0; i < chart.getSubtitleCount(); i++) {
            if (chart.getSubtitle(i) instanceof org.jfree.chart.title.TextTitle t) {
                text.append(t.getText()).append('\n');
            }
        }
        assertThat(text.toString()).contains("Hyndman & Fan type 7").contains("1.5 \u00d7 IQR");
    }

    @Test
    void rendersDeterministicallyAndLeavesTheCallersArraysAlone() {
        double[] before = {5.01, 5.03, 4.98, 5.00, 5.02, 5.07, 4.99, 5.01, 5.00, 5.04, 4.97, 5.30};
        double[] after = {5.02, 5.00, 5.01, 4.99, 5.03, 5.02, 5.01, 5.05, 5.00, 4.70, 5.02, 5.01};
        double[] beforeCopy = before.clone();
        double[] afterCopy = after.clone();
        Sample b = Sample.of(before);
        Sample a = Sample.of(after);
        JFreeChart chart = BoxPlotChart.create("Pin height", "mm", b, a, SpecLimits.NONE, theme);
        byte[] first = ChartExport.png(chart, theme.width(), theme.standardHeight(), theme.scale());
        byte[] second = ChartExport.png(BoxPlotChart.create("Pin height", "mm", b, a, SpecLimits.NONE, theme),
                theme.width(), theme.standardHeight(), theme.scale());
        assertThat(first).as("seeded jitter: same picture twice").isEqualTo(second);
        assertThat(before).containsExactly(beforeCopy);
        assertThat(after).containsExactly(afterCopy);
        assertThat(b.values()).containsExactly(beforeCopy);
        assertThat(a.values()).containsExactly(afterCopy);
        BufferedImage img = ChartAssertions.decode(first);
        ChartAssertions.assertRendered(img, theme.width(), theme.standardHeight(), theme.scale());
        // both group colours are actually painted (outlines and points)
        assertThat(ChartAssertions.pixelsNear(img, ChartTheme.BEFORE, 12)).isGreaterThan(200);
        assertThat(ChartAssertions.pixelsNear(img, ChartTheme.AFTER, 12)).isGreaterThan(200);
    }

    @Test
    void rendersTheDemoCharacteristicAtThePageSize() {
        JFreeChart chart = BoxPlotChart.create(bore.data(), limits, theme);
        BufferedImage img = ChartAssertions.decode(ChartExport.png(chart, theme.width(), theme.standardHeight(),
                theme.scale()));
        ChartAssertions.assertRendered(img, theme.width(), theme.standardHeight(), theme.scale());
    }

    @Test
    void emptyGroupIsRejectedWithTheCharacteristicsName() {
        assertThatThrownBy(() -> BoxPlotChart.create("Gap", "mm", Sample.of(1, 2), Sample.of(), SpecLimits.NONE,
                theme)).isInstanceOf(ChartException.class).hasMessageContaining("'Gap'").hasMessageContaining("after");
    }

    @Test
    void noLimitsMeansNoMarkers() {
        CharacteristicData d = ChartFixtures.demo().get(4).data();
        CategoryPlot plot = BoxPlotChart.create(d, SpecLimits.NONE, theme).getCategoryPlot();
        assertThat((Object) plot.getRangeMarkers(Layer.FOREGROUND)).isNull();
    }

    static List<Double> doubles(List<?> numbers) {
        List<Double> r = new ArrayList<>();
        for (Object o : numbers) {
            r.add(((Number) o).doubleValue());
        }
        return r;
    }

    private static Double[] boxedList(double[] v) {
        Double[] r = new Double[v.length];
        for (int i = 0; i < v.length; i++) {
            r[i] = v[i];
        }
        return r;
    }

    /**
     * Above {@value BoxPlotChart#MAX_DRAWN} values a group is drawn by a sample evenly spaced in rank, the
     * extremes included, so the points never become a solid blob over the box; the note says so. (Invented
     * values; the rule is the project's own, common practice, no source.)
     */
    @Test
    void aHugeGroupIsDrawnByASampleEvenlySpacedInRank() {
        java.util.SplittableRandom rnd = new java.util.SplittableRandom(11);
        double[] big = new double[400_000];
        for (int i = 0; i < big.length; i++) {
            big[i] = 10 + rnd.nextGaussian();
        }
        org.holdpoint.stats.Sample s = org.holdpoint.stats.Sample.of(big);
        org.holdpoint.stats.BoxStatistics st = org.holdpoint.stats.BoxStatistics.of(s);
        double[] drawn = BoxPlotChart.drawn(big, st);
        assertThat(drawn.length).isLessThanOrEqualTo(BoxPlotChart.MAX_DRAWN);
        double[] sorted = big.clone();
        java.util.Arrays.sort(sorted);
        assertThat(drawn).contains(sorted[0], sorted[sorted.length - 1]);
        double[] small = java.util.Arrays.copyOf(big, 300);
        assertThat(BoxPlotChart.drawn(small, org.holdpoint.stats.BoxStatistics.of(
                org.holdpoint.stats.Sample.of(small)))).hasSize(300);
        org.jfree.chart.JFreeChart chart = BoxPlotChart.create("Big", "mm", s, s,
                org.holdpoint.study.SpecLimits.NONE, ChartTheme.withDefaults());
        assertThat(((org.jfree.chart.title.TextTitle) chart.getSubtitle(0)).getText()).contains("a sample of the values");
        assertThat(((org.jfree.chart.title.TextTitle) chart.getSubtitle(1)).getText()).contains("evenly spaced in rank");
    }
}
