package org.holdpoint.chart;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.holdpoint.stats.Conclusion;
import org.holdpoint.stats.EquivalenceResult;
import org.holdpoint.stats.Margin;
import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.study.MarginSpec;
import org.holdpoint.study.SpecLimits;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.SymbolAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.Range;
import org.jfree.data.xy.XYIntervalSeriesCollection;
import org.junit.jupiter.api.Test;

/** Rendering checks of the equivalence picture on invented data; the TOST numbers come from stats. */
class EquivalenceChartTest {
    private final ChartTheme theme = ChartTheme.withDefaults();

    @Test
    void scalingMapsTheMarginBoundsToMinusOneAndOne() {
        // the transform's definition: d/|L| below zero, d/U above; exact in binary64 for these values
        Margin asym = Margin.of(-0.5, 1.0);
        assertThat(EquivalenceChart.scaled(-0.5, asym)).isEqualTo(-1.0);
        assertThat(EquivalenceChart.scaled(1.0, asym)).isEqualTo(1.0);
        assertThat(EquivalenceChart.scaled(0.0, asym)).isEqualTo(0.0);
        assertThat(EquivalenceChart.scaled(-0.25, asym)).isEqualTo(-0.5);
        assertThat(EquivalenceChart.scaled(0.25, asym)).isEqualTo(0.25);
        Margin lowerOnly = new Margin(-0.4, null);
        assertThat(EquivalenceChart.scaled(-0.4, lowerOnly)).isEqualTo(-1.0);
        assertThat(EquivalenceChart.scaled(0.8, lowerOnly)).isEqualTo(2.0);
        Margin upperOnly = new Margin(null, 2.0);
        assertThat(EquivalenceChart.scaled(-1.0, upperOnly)).isEqualTo(-0.5);
        assertThat(EquivalenceChart.scaled(2.0, upperOnly)).isEqualTo(1.0);
    }

    @Test
    void oneRowPerCharacteristicWithConclusionWordsAndScaledIntervals() {
        List<CharacteristicResult> results = ChartFixtures.study(ChartFixtures.demo()).characteristics();
        JFreeChart chart = EquivalenceChart.create(results, null, theme);
        XYPlot plot = chart.getXYPlot();
        String[] names = ((SymbolAxis) plot.getRangeAxis(0)).getSymbols();
        String[] words = ((SymbolAxis) plot.getRangeAxis(1)).getSymbols();
        assertThat(names).hasSize(results.size());
        assertThat(words).hasSize(results.size());
        XYIntervalSeriesCollection data = (XYIntervalSeriesCollection) plot.getDataset();
        int items = 0;
        for (int s = 0; s < data.getSeriesCount(); s++) {
            items += data.getItemCount(s);
        }
        assertThat(items).as("one interval per characteristic with a margin").isEqualTo(4);
        for (int row = 0; row < results.size(); row++) {
            CharacteristicResult r = results.get(row);
            assertThat(names[row]).startsWith(r.name());
            EquivalenceResult t = r.decidingTost();
            if (t == null) {
                assertThat(words[row]).isEqualTo("not assessed (no margin)");
                continue;
            }
            String other = EquivalenceChart.otherFailures(r);
            assertThat(words[row]).endsWith(t.conclusion().words() + (other.isEmpty() ? "" : "; FAILED on " + other));
            int[] at = find(data, row);
            assertThat((Object) data.getSeriesKey(at[0])).isEqualTo(t.conclusion().words());
            assertThat(data.getXValue(at[0], at[1])).isEqualTo(EquivalenceChart.scaled(t.estimate(), r.margin()));
            assertThat(data.getStartXValue(at[0], at[1])).isEqualTo(EquivalenceChart.scaled(t.ciLower(), r.margin()));
            assertThat(data.getEndXValue(at[0], at[1])).isEqualTo(EquivalenceChart.scaled(t.ciUpper(), r.margin()));
            Range x = plot.getDomainAxis().getRange();
            assertThat(x.contains(data.getStartXValue(at[0], at[1])) && x.contains(data.getEndXValue(at[0], at[1])))
                    .isTrue();
        }
        Range x = plot.getDomainAxis().getRange();
        assertThat(x.contains(-1) && x.contains(1) && x.contains(0)).isTrue();
        // the fixture was built to show all three visual classes
        assertThat(words).anyMatch(w -> w.contains("not equivalent")).anyMatch(w -> w.contains("inconclusive"))
                .anyMatch(w -> w.contains("non-inferior"));
        assertThat(names[0]).contains("\u00b10.006 mm");
        assertThat(names[2]).contains("\u22120.5/+1 N\u00b7m");
        assertThat(names[3]).contains("\u2265 \u22120.4 HRC");
    }

    /** A row whose interval passes but whose characteristic failed on spread or capability says so. */
    @Test
    void aRowThatPassedTheMeanButFailedOtherwiseSaysWhy() {
        // invented: the mean stays, the spread grows fourfold against a limit of 1.3 (the analysis, not the
        // chart, decides; the chart must say why it failed)
        List<CharacteristicResult> results = List.of(flangeHeight(0.5).result());
        JFreeChart chart = EquivalenceChart.create(results, null, theme);
        String[] words = ((SymbolAxis) chart.getXYPlot().getRangeAxis(1)).getSymbols();
        boolean seen = false;
        for (int row = 0; row < results.size(); row++) {
            CharacteristicResult r = results.get(row);
            if (r.verdict().status() == org.holdpoint.result.Verdict.Status.FAILED && r.decidingTost() != null
                    && r.decidingTost().conclusion().claimHolds()) {
                assertThat(words[row]).contains("; FAILED on ");
                seen = true;
            }
        }
        assertThat(seen).as("equivalent but failed on spread").isTrue();
        assertThat(words[0]).endsWith("equivalent; FAILED on spread");
    }

    @Test
    void levelAndScalingAreWrittenOnTheChart() {
        JFreeChart chart = EquivalenceChart.create(ChartFixtures.study(ChartFixtures.demo()).characteristics(), null,
                theme);
        StringBuilder text = new StringBuilder();
        for (int i = 0; i < chart.getSubtitleCount(); i++) {
            if (chart.getSubtitle(i) instanceof org.jfree.chart.title.TextTitle t) {
                text.append(t.getText()).append('\n');
            }
        }
        assertThat(text.toString()).contains("90 % intervals").contains("scaled to its own margin");
        assertThat(chart.getXYPlot().getDomainAxis().getLabel()).contains("fraction of the margin");
    }

    @Test
    void legendGivesEveryConclusionItsOwnShape() {
        XYPlot plot = EquivalenceChart.create(ChartFixtures.study(ChartFixtures.demo()).characteristics(), null,
                theme).getXYPlot();
        List<String> labels = new ArrayList<>();
        List<java.awt.geom.Rectangle2D> shapes = new ArrayList<>();
        for (int i = 0; i < plot.getFixedLegendItems().getItemCount(); i++) {
            LegendItem li = plot.getFixedLegendItems().get(i);
            labels.add(li.getLabel());
            shapes.add(li.getShape().getBounds2D());
        }
        assertThat(labels).contains("not equivalent", "inconclusive", "non-inferior");
        assertThat(EquivalenceChart.shape(Conclusion.EQUIVALENT)).isNotEqualTo(EquivalenceChart.shape(
                Conclusion.NOT_EQUIVALENT));
        assertThat(EquivalenceChart.shape(Conclusion.INCONCLUSIVE).getClass())
                .isNotEqualTo(EquivalenceChart.shape(Conclusion.EQUIVALENT).getClass());
    }

    @Test
    void fortyRowsFitOneChartAndRender() {
        List<CharacteristicResult> rows = manyRows(40, 7);
        JFreeChart chart = EquivalenceChart.create(rows, "characteristics 1\u201340 of 40", theme);
        assertThat(((SymbolAxis) chart.getXYPlot().getRangeAxis()).getSymbols()).hasSize(40);
        double h = theme.equivalenceHeight(40);
        assertThat(h).as("fits the 257 mm text height of an A4 page").isLessThan(257 / 25.4 * 72);
        BufferedImage img = ChartAssertions.decode(ChartExport.png(chart, theme.width(), h, theme.scale()));
        ChartAssertions.assertRendered(img, theme.width(), h, theme.scale());
    }

    @Test
    void farOutIntervalsAreCutAtTheEdgeAndWrittenThere() {
        SplittableRandom rnd = new SplittableRandom(3);
        ChartFixtures.Item far = ChartFixtures.item("Flatness", "mm", ChartFixtures.normal(rnd, 20, 0.05, 0.002, 4),
                ChartFixtures.normal(rnd, 20, 0.09, 0.002, 4), SpecLimits.NONE,
                new MarginSpec(MarginSpec.Kind.ABSOLUTE, -0.004, 0.004));
        XYPlot plot = EquivalenceChart.create(List.of(far.result()), null, theme).getXYPlot();
        assertThat(plot.getDomainAxis().getUpperBound()).isLessThan(EquivalenceChart.CLAMP * 1.1);
        List<String> notes = new ArrayList<>();
        for (Object a : ((org.jfree.chart.renderer.xy.AbstractXYItemRenderer) plot.getRenderer()).getAnnotations()) {
            if (a instanceof XYTextAnnotation t) {
                notes.add(t.getText());
            }
        }
        assertThat(notes).isNotEmpty().allMatch(t -> t.endsWith("\u25b8"));
    }

    @Test
    void aStudyWithoutMarginsStillRendersItsRows() {
        CharacteristicResult none = ChartFixtures.demo().get(4).result();
        JFreeChart chart = EquivalenceChart.create(List.of(none), null, theme);
        assertThat(((SymbolAxis) chart.getXYPlot().getRangeAxis(1)).getSymbols())
                .containsExactly("not assessed (no margin)");
        assertThat(chart.getXYPlot().getDataset().getSeriesCount()).isZero();
        BufferedImage img = ChartAssertions.decode(ChartExport.png(chart, theme.width(), theme.equivalenceHeight(1),
                1));
        ChartAssertions.assertRendered(img, theme.width(), theme.equivalenceHeight(1), 1);
    }

    @Test
    void tooManyRowsAreRefused() {
        assertThatThrownBy(() -> EquivalenceChart.create(manyRows(61, 1), null, theme))
                .isInstanceOf(ChartException.class).hasMessageContaining("pages");
        assertThatThrownBy(() -> EquivalenceChart.create(List.of(), null, theme)).isInstanceOf(ChartException.class);
    }

    static List<CharacteristicResult> manyRows(int count, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        List<CharacteristicResult> rows = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            double shift = (rnd.nextDouble() - 0.5) * 0.06;
            rows.add(ChartFixtures.item("Feature " + (i + 1) + " position", "mm",
                    ChartFixtures.normal(rnd, 15 + rnd.nextInt(20), 10, 0.01, 4),
                    ChartFixtures.normal(rnd, 15 + rnd.nextInt(20), 10 + shift, 0.01, 4), SpecLimits.NONE,
                    new MarginSpec(MarginSpec.Kind.ABSOLUTE, -0.01, 0.01)).result());
        }
        return rows;
    }

    private static int[] find(XYIntervalSeriesCollection data, int row) {
        for (int s = 0; s < data.getSeriesCount(); s++) {
            for (int i = 0; i < data.getItemCount(s); i++) {
                if (data.getYValue(s, i) == row) {
                    return new int[] {s, i};
                }
            }
        }
        throw new AssertionError("no interval for row " + row);
    }

    /** The box plot names the criteria that decided, and draws the margin around the before mean. */
    @Test
    void theBoxPlotShowsTheDecidingCriteria() {
        ChartFixtures.Item flange = flangeHeight(0.05);
        var data = flange.data();
        CharacteristicResult r = flange.result();
        JFreeChart chart = BoxPlotChart.withCriteria(BoxPlotChart.create(data, org.holdpoint.study.SpecLimits.NONE,
                theme), r, theme);
        String line = ((org.jfree.chart.title.TextTitle) chart.getSubtitle(1)).getText();
        assertThat(line).contains("mean: ").contains("spread: sd ratio bound").contains("NOT below the limit 1.3");
        var band = (org.jfree.chart.plot.IntervalMarker) chart.getCategoryPlot()
                .getRangeMarkers(org.jfree.chart.ui.Layer.BACKGROUND).iterator().next();
        assertThat(band.getStartValue()).isCloseTo(r.before().mean() - 0.05, org.assertj.core.api.Assertions.within(1e-12));
        assertThat(band.getEndValue()).isCloseTo(r.before().mean() + 0.05, org.assertj.core.api.Assertions.within(1e-12));
    }

    /**
     * Invented: a flange height whose mean stays while its spread grows fourfold, analysed by the real
     * analysis against a margin ±m and an sd-growth limit of 1.3.
     */
    private static ChartFixtures.Item flangeHeight(double m) {
        java.util.SplittableRandom rnd = new java.util.SplittableRandom(7);
        double[] before = ChartFixtures.normal(rnd, 30, 20.0, 0.01, 3);
        double[] after = ChartFixtures.normal(rnd, 30, 20.0, 0.04, 3);
        var data = new org.holdpoint.study.CharacteristicData("Flange height", "mm",
                org.holdpoint.study.GroupData.typed(org.holdpoint.stats.Sample.of(before), "b.csv"),
                org.holdpoint.study.GroupData.typed(org.holdpoint.stats.Sample.of(after), "a.csv"), false, List.of());
        var own = new org.holdpoint.study.CharacteristicSettings("mm", org.holdpoint.study.SpecLimits.NONE,
                new org.holdpoint.study.MarginSpec(org.holdpoint.study.MarginSpec.Kind.ABSOLUTE, -m, m), 1.3, null,
                null);
        var settings = new org.holdpoint.study.AnalysisSettings(0.05, false, false, null,
                java.util.Map.of("Flange height", own), null, null);
        CharacteristicResult r = new org.holdpoint.workflow.StudyAnalyzer().analyze(
                new org.holdpoint.study.Dataset(List.of(data), List.of(), new org.holdpoint.study.ImportReport(60,
                        java.util.Map.of(), List.of(), List.of())), settings, org.holdpoint.study.Progress.NONE)
                .characteristics().get(0);
        return new ChartFixtures.Item(data, r);
    }
}
