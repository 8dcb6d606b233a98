package org.holdpoint.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;
import org.holdpoint.stats.BoxStatistics;
import org.holdpoint.stats.Sample;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.SpecLimits;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.axis.CategoryAxis;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.DatasetRenderingOrder;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.renderer.category.LineAndShapeRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.category.DefaultCategoryDataset;
import org.jfree.data.statistics.BoxAndWhiskerItem;
import org.jfree.data.statistics.DefaultBoxAndWhiskerCategoryDataset;
import org.jfree.data.statistics.DefaultMultiValueCategoryDataset;

/**
 * The box plot of one characteristic, before and after side by side, built from {@link BoxStatistics} (type-7
 * quartiles, whiskers to the most extreme values within 1.5·IQR), with every individual value drawn over it at its
 * true value, the mean marked, and LSL, nominal and USL as labelled lines.
 *
 * <p>Plot datasets: 0 = the boxes ({@link DefaultBoxAndWhiskerCategoryDataset}, one series, columns before and
 * after; each item's outliers are the true outlier values and its min/max outlier are the data minimum and maximum,
 * so that nothing is parked at an edge), 1 = every value ({@link DefaultMultiValueCategoryDataset}), 2 = the means.
 */
public final class BoxPlotChart {
    /** Series key of the boxes. */
    public static final String BOX_SERIES = "box";
    /** Series key of the individual values. */
    public static final String VALUES_SERIES = "values";
    /** Series key of the means. */
    public static final String MEAN_SERIES = "mean";
    private BoxPlotChart() {
    }

    /**
     * The box plot of a characteristic's data.
     *
     * @param data   the characteristic (name, unit, before and after groups)
     * @param limits the specification limits to draw, or {@link SpecLimits#NONE}
     * @param theme  the theme
     * @return the chart
     */
    public static JFreeChart create(CharacteristicData data, SpecLimits limits, ChartTheme theme) {
        return create(data.name(), data.unit(), data.before().sample(), data.after().sample(), limits, theme);
    }

    /**
     * The box plot of two samples; the samples are only read.
     *
     * @param name   the characteristic's name (chart title)
     * @param unit   the unit for the axis label, or null
     * @param before the before values in run order
     * @param after  the after values in run order
     * @param limits the specification limits to draw, or {@link SpecLimits#NONE}
     * @param theme  the theme
     * @return the chart
     * @throws ChartException if a group is empty
     */
    public static JFreeChart create(String name, String unit, Sample before, Sample after, SpecLimits limits,
            ChartTheme theme) {
        Sample[] groups = {before, after};
        String[] labels = new String[2];
        BoxStatistics[] stats = new BoxStatistics[2];
        DefaultBoxAndWhiskerCategoryDataset boxes = new DefaultBoxAndWhiskerCategoryDataset();
        DefaultBoxAndWhiskerCategoryDataset drawn = new DefaultBoxAndWhiskerCategoryDataset();
        DefaultMultiValueCategoryDataset values = new DefaultMultiValueCategoryDataset();
        DefaultCategoryDataset means = new DefaultCategoryDataset();
        boolean thinned = false;
        for (int g = 0; g < 2; g++) {
            if (groups[g].size() == 0) {
                throw new ChartException("characteristic '%s' has no %s values to draw", name,
                        g == 0 ? "before" : "after");
            }
            stats[g] = BoxStatistics.of(groups[g]);
            labels[g] = (g == 0 ? "before" : "after") + " (n = " + groups[g].size() + ")";
            boxes.add(item(stats[g], true), BOX_SERIES, labels[g]);
            drawn.add(item(stats[g], false), BOX_SERIES, labels[g]);
            double[] shown = drawn(groups[g].values(), stats[g]);
            thinned |= shown.length < groups[g].size();
            values.add(boxed(shown), VALUES_SERIES, labels[g]);
            means.addValue(stats[g].mean(), MEAN_SERIES, labels[g]);
        }
        CategoryPlot plot = plot(unit == null ? name : Numbers.axisLabel(name, unit), boxes, drawn, values, means,
                stats, theme);
        addLimits(plot, limits, theme);
        ((NumberAxis) plot.getRangeAxis()).setRange(ChartRanges.padded(rangeOf(stats, limits), 0.06));
        JFreeChart chart = new JFreeChart(name, theme.titleFont(), plot, false);
        chart.addSubtitle(theme.subtitle(thinned ? "before and after the change: box, a sample of the values, mean"
                : "before and after the change: box, every value, mean"));
        chart.addSubtitle(theme.note("Box: " + BoxStatistics.METHOD + ". Each value is drawn at its true value, "
                + "spread sideways by a fixed (seeded) jitter; values beyond the whiskers are ringed."
                + (thinned ? " A group of more than " + String.format(java.util.Locale.ROOT, "%,d", MAX_DRAWN)
                + " values is drawn by " + String.format(java.util.Locale.ROOT, "%,d", MAX_DRAWN) + " of them, evenly "
                + "spaced in rank order (every value beyond the whiskers among them while they are fewer than "
                + String.format(java.util.Locale.ROOT, "%,d", MAX_DRAWN / 2) + "); the box and the counts use "
                + "every value." : "")));
        chart.addSubtitle(legend(plot));
        theme.apply(chart);
        return chart;
    }

    /**
     * Shows on a box plot what decided the verdict: the margin as a band around the before mean (where the
     * after mean may lie; the confidence interval of the difference decides, see the equivalence chart), and a
     * line under the title with the spread and capability criteria against their limits.
     *
     * @param chart  a chart from {@link #create}
     * @param result the characteristic's analysis
     * @param theme  the theme
     * @return the same chart
     */
    public static JFreeChart withCriteria(JFreeChart chart, org.holdpoint.result.CharacteristicResult result,
            ChartTheme theme) {
        CategoryPlot plot = chart.getCategoryPlot();
        var margin = result.margin();
        if (margin != null && result.before() != null) {
            double centre = result.before().mean();
            // a ratio margin is drawn as the before mean times its bounds (the test itself is on the logarithms)
            double lo = margin.lower() == null ? plot.getRangeAxis().getLowerBound()
                    : margin.ratio() ? centre * margin.lower() : centre + margin.lower();
            double hi = margin.upper() == null ? plot.getRangeAxis().getUpperBound()
                    : margin.ratio() ? centre * margin.upper() : centre + margin.upper();
            org.jfree.chart.plot.IntervalMarker band = new org.jfree.chart.plot.IntervalMarker(lo, hi,
                    new Color(ChartTheme.BAND.getRed(), ChartTheme.BAND.getGreen(), ChartTheme.BAND.getBlue(), 110));
            // named in the legend, not on the plot, where a label would sit on the values
            if (plot.getFixedLegendItems() != null) {
                plot.getFixedLegendItems().add(new org.jfree.chart.LegendItem(margin.ratio()
                        ? "ratio margin times the before mean" : "margin around the before mean", null,
                        null, null, new java.awt.Rectangle(-7, -4, 14, 8), band.getPaint()));
            }
            plot.addRangeMarker(band, org.jfree.chart.ui.Layer.BACKGROUND);
            NumberAxis axis = (NumberAxis) plot.getRangeAxis();
            axis.setRange(ChartRanges.padded(new double[] {Math.min(axis.getLowerBound(), lo),
                Math.max(axis.getUpperBound(), hi)}, 0.0));
        }
        var checks = result.checks();
        var tol = result.settings().tolerance();
        if (tol != null && checks != null) {
            NumberAxis axis = (NumberAxis) plot.getRangeAxis();
            double lo = axis.getLowerBound();
            double hi = axis.getUpperBound();
            int g = 0;
            for (var ti : new org.holdpoint.stats.ToleranceInterval[] {checks.before().tolerance(),
                checks.after().tolerance()}) {
                if (ti != null && g < plot.getCategories().size()) {
                    plot.addAnnotation(new ToleranceBracket((Comparable<?>) plot.getCategories().get(g), ti.lower(),
                            ti.upper(), tol.words().replace(" ", ""), theme.noteFont()));
                    lo = ti.lower() == null ? lo : Math.min(lo, ti.lower());
                    hi = ti.upper() == null ? hi : Math.max(hi, ti.upper());
                }
                g++;
            }
            axis.setRange(ChartRanges.padded(new double[] {lo, hi}, 0.03));
        }
        List<String> parts = new ArrayList<>();
        var eq = result.decidingTost();
        if (eq != null) {
            parts.add("mean: " + eq.conclusion().words());
        }
        var g = result.sdGrowth();
        if (g != null) {
            parts.add("spread: sd ratio bound " + String.format(java.util.Locale.ROOT, "%.3f", g.upperBound())
                    + (g.met() ? " below" : " NOT below") + " the limit " + Numbers.format(g.limit()));
        }
        if (checks != null && checks.capabilityMet() != null && checks.after().ppkLower() != null) {
            parts.add("capability: Ppk bound " + String.format(java.util.Locale.ROOT, "%.3f",
                    checks.after().ppkLower()) + (checks.capabilityMet() ? " meets" : " does NOT meet")
                    + " the required " + Numbers.format(result.settings().capabilityRequirement()));
        }
        if (tol != null && checks != null && checks.after().tolerance() != null) {
            parts.add("tolerance: after " + tol.words() + " interval " + result.toleranceState().words()
                    + " (bracket beside each box)");
        }
        if (!parts.isEmpty()) {
            chart.addSubtitle(1, theme.subtitle(String.join("; ", parts)));
        }
        return chart;
    }

    static LegendTitle legend(org.jfree.chart.plot.Plot plot) {
        LegendTitle legend = new LegendTitle(plot);
        legend.setPosition(RectangleEdge.BOTTOM);
        return legend;
    }

    private static BoxAndWhiskerItem item(BoxStatistics s, boolean withOutliers) {
        List<Double> outliers = new ArrayList<>();
        if (withOutliers) {
            for (double v : s.outlierValues()) {
                outliers.add(v);
            }
        }
        // min/max outlier at the data extremes: JFreeChart then draws no value as a "far out" marker at an edge
        return new BoxAndWhiskerItem(s.mean(), s.median(), s.q1(), s.q3(), s.lowerWhisker(), s.upperWhisker(),
                s.min(), s.max(), outliers);
    }

    /** The most values drawn per group; beyond it the points would hide the box. */
    static final int MAX_DRAWN = 2000;

    /**
     * The values drawn for a group: all of them up to {@link #MAX_DRAWN}; above, the values beyond the whiskers
     * (up to half the budget, evenly spaced in rank) and the rest of the budget evenly spaced in rank among
     * the values within the whiskers, so that the picture keeps the shape of the whole group.
     *
     * @param v     the values
     * @param stats their box statistics
     * @return the values to draw
     */
    static double[] drawn(double[] v, BoxStatistics stats) {
        if (v.length <= MAX_DRAWN) {
            return v;
        }
        double[] sorted = v.clone();
        java.util.Arrays.sort(sorted);
        List<Double> inside = new ArrayList<>();
        List<Double> outside = new ArrayList<>();
        for (double x : sorted) {
            (x < stats.lowerFence() || x > stats.upperFence() ? outside : inside).add(x);
        }
        List<Double> out = evenly(outside, MAX_DRAWN / 2);
        out.addAll(evenly(inside, MAX_DRAWN - out.size()));
        double[] a = new double[out.size()];
        for (int i = 0; i < a.length; i++) {
            a[i] = out.get(i);
        }
        return a;
    }

    /** At most k of the sorted values, evenly spaced in rank, the smallest and the largest included. */
    private static List<Double> evenly(List<Double> sorted, int k) {
        if (sorted.size() <= k) {
            return new ArrayList<>(sorted);
        }
        List<Double> out = new ArrayList<>(k);
        for (int i = 0; i < k; i++) {
            out.add(sorted.get((int) Math.round(i * (sorted.size() - 1) / (double) (k - 1))));
        }
        return out;
    }

    private static List<Double> boxed(double[] v) {
        List<Double> list = new ArrayList<>(v.length);
        for (double x : v) {
            list.add(x);
        }
        return list;
    }

    private static CategoryPlot plot(String axisLabel, DefaultBoxAndWhiskerCategoryDataset boxes,
            DefaultBoxAndWhiskerCategoryDataset drawn, DefaultMultiValueCategoryDataset values,
            DefaultCategoryDataset means, BoxStatistics[] stats, ChartTheme theme) {
        CategoryAxis x = new CategoryAxis(null);
        x.setCategoryMargin(0.3);
        NumberAxis y = new NumberAxis(axisLabel);
        y.setAutoRangeIncludesZero(false);
        OwnOutliersBoxRenderer boxRenderer = new OwnOutliersBoxRenderer(drawn, theme);
        CategoryPlot plot = new CategoryPlot(boxes, x, y, boxRenderer);
        plot.setDataset(1, values);
        plot.setRenderer(1, new ValuesRenderer(stats, theme));
        plot.setDataset(2, means);
        plot.setRenderer(2, meanRenderer());
        plot.setDatasetRenderingOrder(DatasetRenderingOrder.FORWARD);
        plot.setRangeGridlinesVisible(true);
        plot.setInsets(new RectangleInsets(4, 4, 4, 4));
        plot.setFixedLegendItems(legend(theme));
        return plot;
    }

    private static LineAndShapeRenderer meanRenderer() {
        LineAndShapeRenderer r = new LineAndShapeRenderer(false, true);
        r.setSeriesShape(0, ChartTheme.diamond(8));
        r.setUseFillPaint(true);
        r.setSeriesFillPaint(0, Color.WHITE);
        r.setDrawOutlines(true);
        r.setUseOutlinePaint(true);
        r.setSeriesOutlinePaint(0, ChartTheme.INK);
        r.setSeriesOutlineStroke(0, new BasicStroke(1.3f));
        return r;
    }

    private static LegendItemCollection legend(ChartTheme theme) {
        LegendItemCollection items = new LegendItemCollection();
        for (int g = 0; g < 2; g++) {
            LegendItem box = new LegendItem((g == 0 ? "before" : "after") + " value", null, null, null,
                    theme.groupShape(g, ValuesRenderer.POINT_SIZE + 2), theme.groupColour(g));
            items.add(box);
        }
        items.add(new LegendItem("mean", null, null, null, true, ChartTheme.diamond(8), true, Color.WHITE, true,
                ChartTheme.INK, new BasicStroke(1.3f), false, new Rectangle2D.Double(), new BasicStroke(), Color.BLACK));
        items.add(new LegendItem("beyond the whiskers (ringed)", null, null, null, true, ChartTheme.circle(8), false,
                Color.WHITE, true, ChartTheme.INK, new BasicStroke(1.1f), false, new Rectangle2D.Double(),
                new BasicStroke(), Color.BLACK));
        return items;
    }

    private static void addLimits(CategoryPlot plot, SpecLimits limits, ChartTheme theme) {
        if (limits == null) {
            return;
        }
        addLimit(plot, limits.lsl(), "LSL", theme, false);
        addLimit(plot, limits.usl(), "USL", theme, false);
        addLimit(plot, limits.nominal(), "nominal", theme, true);
    }

    static ValueMarker limitMarker(double value, String label, ChartTheme theme, boolean nominal) {
        ValueMarker m = new ValueMarker(value, ChartTheme.INK, nominal ? theme.nominalStroke() : theme.limitStroke());
        m.setLabel(label + " " + Numbers.format(value));
        m.setLabelFont(new Font(theme.fontFamily(), Font.PLAIN, 8));
        m.setLabelPaint(ChartTheme.INK);
        m.setLabelBackgroundColor(new Color(255, 255, 255, 200));
        return m;
    }

    private static void addLimit(CategoryPlot plot, Double value, String label, ChartTheme theme, boolean nominal) {
        if (value == null) {
            return;
        }
        ValueMarker m = limitMarker(value, label, theme, nominal);
        // limits labelled just inside the left edge, on the side of the line facing the data, so they are never
        // clipped; the nominal on the right edge, so that it never sits on a limit's label when the two are close
        boolean below = label.equals("USL");
        if (nominal) {
            m.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
            m.setLabelTextAnchor(TextAnchor.BOTTOM_RIGHT);
        } else {
            m.setLabelAnchor(below ? RectangleAnchor.BOTTOM_LEFT : RectangleAnchor.TOP_LEFT);
            m.setLabelTextAnchor(below ? TextAnchor.TOP_LEFT : TextAnchor.BOTTOM_LEFT);
        }
        m.setLabelOffset(new RectangleInsets(2, 4, 2, 4));
        plot.addRangeMarker(m);
    }

    private static double[] rangeOf(BoxStatistics[] stats, SpecLimits limits) {
        double lo = Math.min(stats[0].min(), stats[1].min());
        double hi = Math.max(stats[0].max(), stats[1].max());
        if (limits != null) {
            for (Double v : new Double[] {limits.lsl(), limits.nominal(), limits.usl()}) {
                if (v != null) {
                    lo = Math.min(lo, v);
                    hi = Math.max(hi, v);
                }
            }
        }
        return new double[] {lo, hi};
    }
}
