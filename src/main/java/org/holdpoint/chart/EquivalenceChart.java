package org.holdpoint.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Paint;
import java.awt.Shape;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.holdpoint.stats.Conclusion;
import org.holdpoint.stats.EquivalenceResult;
import org.holdpoint.stats.Margin;
import org.holdpoint.result.CharacteristicResult;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.annotations.XYBoxAnnotation;
import org.jfree.chart.annotations.XYLineAnnotation;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.AxisLocation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.axis.SymbolAxis;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYErrorRenderer;
import org.jfree.chart.ui.Layer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.Range;
import org.jfree.data.xy.XYIntervalSeries;
import org.jfree.data.xy.XYIntervalSeriesCollection;

/**
 * The equivalence picture: one row per characteristic, its (1 − 2α) interval of the difference after − before as a
 * bar with the estimate, drawn against its margin band (L, U) and zero, labelled with the conclusion in words and
 * drawn with the conclusion's shape.
 *
 * <p>Units differ between rows, so each row is scaled to its own margin ({@link #scaled(double, Margin)}): a
 * difference below zero is divided by |L|, above zero by U. The margin band is then (−1, +1) on every row with a
 * two-sided margin, zero stays zero, and a point lies inside the band exactly when it lies inside (L, U), so the
 * picture shows each conclusion as the test drew it. The margins in units are written in the row labels.
 *
 * <p>Plot dataset 0 is an {@link XYIntervalSeriesCollection} with one series per conclusion present (series key =
 * the conclusion in words); x is the scaled estimate with the scaled interval as its x-interval, y the row index
 * (0 = top row).
 */
public final class EquivalenceChart {
    /** Scaled values beyond ±CLAMP are cut at the plot edge and written out. */
    static final double CLAMP = 4;
    /** The most rows one chart holds readably on an A4 page. */
    public static final int MAX_ROWS = 60;

    private EquivalenceChart() {
    }

    /**
     * A difference in units scaled to the margin: d/|L| for d &lt; 0 and d/U for d ≥ 0; with a one-sided margin the
     * one bound present scales both sides.
     *
     * @param d      a difference after − before, in units (a ratio after/before for a ratio margin)
     * @param margin the characteristic's margin
     * @return the scaled difference; −1 is L and +1 is U
     */
    public static double scaled(double d, Margin margin) {
        if (margin.ratio()) {
            // a ratio after/before against a ratio margin: on the log scale, where the test was made (ratio 1 is 0)
            return scaled(Math.log(d), margin.logScale());
        }
        double lower = margin.lower() != null ? -margin.lower() : margin.upper();
        double upper = margin.upper() != null ? margin.upper() : -margin.lower();
        return d < 0 ? d / lower : d / upper;
    }

    /**
     * The equivalence picture of a study's characteristics (or one page of them).
     *
     * @param results   the characteristics' results in display order (top row first), 1..{@link #MAX_ROWS}
     * @param pageLabel a label such as "characteristics 41–80 of 200", or null
     * @param theme     the theme
     * @return the chart
     * @throws ChartException if there are no rows or more than {@link #MAX_ROWS}
     */
    public static JFreeChart create(List<CharacteristicResult> results, String pageLabel, ChartTheme theme) {
        if (results.isEmpty() || results.size() > MAX_ROWS) {
            throw new ChartException("an equivalence chart holds 1 to %d characteristics, got %d; split the study "
                    + "into pages", MAX_ROWS, results.size());
        }
        int k = results.size();
        String[] left = new String[k];
        String[] right = new String[k];
        Map<Conclusion, XYIntervalSeries> series = new EnumMap<>(Conclusion.class);
        double lo = -1;
        double hi = 1;
        Font font = theme.tickFont();
        for (int row = 0; row < k; row++) {
            CharacteristicResult r = results.get(row);
            EquivalenceResult t = r.decidingTost();
            left[row] = rowLabel(r);
            if (r.verdict().status() == org.holdpoint.result.Verdict.Status.NOT_ASSESSABLE) {
                right[row] = "not assessable (see the verdict)";
                continue;
            }
            if (t == null || r.margin() == null) {
                right[row] = "not assessed (no margin)";
                continue;
            }
            String other = otherFailures(r);
            right[row] = glyphs(t.conclusion(), font) + t.conclusion().words()
                    + (other.isEmpty() ? "" : "; FAILED on " + other);
            double x = scaled(t.estimate(), r.margin());
            double xl = scaled(t.ciLower(), r.margin());
            double xh = scaled(t.ciUpper(), r.margin());
            series.computeIfAbsent(t.conclusion(), c -> new XYIntervalSeries(c.words(), false, true))
                    .add(x, xl, xh, row, row, row);
            lo = Math.min(lo, xl);
            hi = Math.max(hi, xh);
        }
        Range xRange = ChartRanges.padded(new double[] {Math.max(lo, -CLAMP), Math.min(hi, CLAMP)}, 0.06);
        XYIntervalSeriesCollection data = new XYIntervalSeriesCollection();
        List<Conclusion> order = new ArrayList<>(series.keySet());
        // legend and series order: the claim holds, then inconclusive, then the claim fails
        order.sort(java.util.Comparator.comparingInt(c -> c.claimHolds() ? 0 : c == Conclusion.INCONCLUSIVE ? 1 : 2));
        for (Conclusion c : order) {
            data.addSeries(series.get(c));
        }
        XYPlot plot = plot(data, order, left, right, xRange, theme);
        addBandsAndClips(plot, results, xRange, theme);
        JFreeChart chart = new JFreeChart("Equivalence of the means, after \u2212 before", theme.titleFont(), plot,
                false);
        chart.addSubtitle(theme.subtitle(levelText(results) + " against each characteristic's margin"
                + (pageLabel == null ? "" : "; " + pageLabel)));
        chart.addSubtitle(theme.note("Each row is scaled to its own margin: a difference below 0 is divided by |L|, "
                + "one above 0 by U, so the band is the margin (L, U) = (\u22121, +1) and 0 is no change; the margins "
                + "in units are in the row labels. Equivalent: the interval lies inside the band; not equivalent: "
                + "wholly outside; inconclusive: it reaches a bound (more data needed). Values beyond \u00b1"
                + Numbers.format(CLAMP) + " are cut at the edge and written there."
                + (results.stream().anyMatch(r -> r.margin() != null && r.margin().ratio()) ? " A row with a ratio "
                        + "margin is scaled on the log scale, ln(after/before) against ln L and ln U, where it was "
                        + "tested." : "")));
        chart.addSubtitle(BoxPlotChart.legend(plot));
        theme.apply(chart);
        plot.getRangeAxis(0).setTickLabelFont(font);
        plot.getRangeAxis(1).setTickLabelFont(font);
        return chart;
    }

    private static XYPlot plot(XYIntervalSeriesCollection data, List<Conclusion> order, String[] left,
            String[] right, Range xRange, ChartTheme theme) {
        NumberAxis x = new NumberAxis("difference as a fraction of the margin (\u22121 = L, 0 = no change, +1 = U)");
        x.setRange(xRange);
        x.setAutoRange(false);
        x.setTickUnit(new NumberTickUnit(xRange.getLength() <= 4 ? 0.5 : 1, new BoundFormat()));
        SymbolAxis names = rowAxis(left, true);
        XYErrorRenderer renderer = renderer(order, theme);
        XYPlot plot = new XYPlot(data, x, names, renderer);
        SymbolAxis words = rowAxis(right, false);
        plot.setRangeAxis(1, words);
        plot.setRangeAxisLocation(1, AxisLocation.BOTTOM_OR_RIGHT);
        plot.setRangeGridlinesVisible(false);
        plot.setDomainGridlinesVisible(true);
        plot.setInsets(new RectangleInsets(4, 2, 4, 2));
        plot.setFixedLegendItems(legend(order, theme));
        return plot;
    }

    /** Tick labels of the scaled axis: the margin bounds are named, "L −1" and "U +1". */
    static final class BoundFormat extends java.text.NumberFormat {
        private static final long serialVersionUID = 1L;

        @Override
        public StringBuffer format(double v, StringBuffer to, java.text.FieldPosition pos) {
            String text = v == -1 ? "L \u22121" : v == 1 ? "U +1" : v == 0 ? "0" : (v > 0 ? "+" : "") + Numbers.format(v);
            return to.append(text);
        }

        @Override
        public StringBuffer format(long v, StringBuffer to, java.text.FieldPosition pos) {
            return format((double) v, to, pos);
        }

        @Override
        public Number parse(String source, java.text.ParsePosition pos) {
            throw new UnsupportedOperationException("display only");
        }
    }

    private static SymbolAxis rowAxis(String[] labels, boolean bands) {
        SymbolAxis axis = new SymbolAxis(null, labels);
        axis.setInverted(true);
        axis.setAutoRange(false);
        axis.setRange(-0.5, labels.length - 0.5);
        axis.setGridBandsVisible(bands);
        axis.setGridBandPaint(Color.WHITE);
        axis.setGridBandAlternatePaint(new Color(0xF5, 0xF5, 0xF5));
        axis.setTickMarksVisible(false);
        return axis;
    }

    private static XYErrorRenderer renderer(List<Conclusion> order, ChartTheme theme) {
        XYErrorRenderer r = new XYErrorRenderer();
        r.setDrawXError(true);
        r.setDrawYError(false);
        r.setDefaultLinesVisible(false);
        r.setErrorStroke(new BasicStroke(2.2f));
        r.setCapLength(6);
        r.setUseFillPaint(true);
        r.setUseOutlinePaint(true);
        r.setDrawOutlines(true);
        for (int s = 0; s < order.size(); s++) {
            Conclusion c = order.get(s);
            r.setSeriesPaint(s, colour(c));
            r.setSeriesOutlinePaint(s, colour(c));
            r.setSeriesFillPaint(s, c == Conclusion.INCONCLUSIVE ? Color.WHITE : colour(c));
            r.setSeriesShape(s, shape(c));
            r.setSeriesOutlineStroke(s, new BasicStroke(1.4f));
        }
        return r;
    }

    private static LegendItemCollection legend(List<Conclusion> order, ChartTheme theme) {
        LegendItemCollection items = new LegendItemCollection();
        for (Conclusion c : order) {
            Paint fill = c == Conclusion.INCONCLUSIVE ? Color.WHITE : colour(c);
            items.add(new LegendItem(c.words(), null, null, null, true, shape(c), true, fill, true, colour(c),
                    new BasicStroke(1.4f), true, new java.awt.geom.Line2D.Double(-8, 0, 8, 0), new BasicStroke(2.2f),
                    colour(c)));
        }
        items.add(new LegendItem("margin band (L, U)", null, null, null, new java.awt.Rectangle(-7, -4, 14, 8),
                ChartTheme.BAND));
        return items;
    }

    /** The three visual classes: the claim holds, the claim fails, or inconclusive. */
    static Shape shape(Conclusion c) {
        if (c == Conclusion.INCONCLUSIVE) {
            return ChartTheme.diamond(9);
        }
        return c.claimHolds() ? ChartTheme.circle(7.5) : ChartTheme.cross(9);
    }

    static Color colour(Conclusion c) {
        if (c == Conclusion.INCONCLUSIVE) {
            return ChartTheme.MUTED;
        }
        return c.claimHolds() ? ChartTheme.BEFORE : ChartTheme.FAIL;
    }

    private static String glyphs(Conclusion c, Font font) {
        String g = c == Conclusion.INCONCLUSIVE ? "\u25c7 " : c.claimHolds() ? "\u25cf " : "\u2715 ";
        return font.canDisplayUpTo(g) == -1 ? g : "";
    }

    /**
     * The criteria other than the mean that failed, in words ("spread", "capability", "spread and
     * capability"), or "" when none did: a row whose interval passes must not read as passed then.
     */
    static String otherFailures(CharacteristicResult r) {
        List<String> failed = new ArrayList<>();
        if (r.spreadFailed()) {
            failed.add("spread");
        }
        if (r.capabilityFailed()) {
            failed.add("capability");
        }
        if (r.toleranceFailed()) {
            failed.add("tolerance interval");
        }
        if (r.stabilityFailed()) {
            failed.add("stability");
        }
        return String.join(" and ", failed);
    }

    static String rowLabel(CharacteristicResult r) {
        String name = r.name().length() > 40 ? r.name().substring(0, 39) + "\u2026" : r.name();
        Margin m = r.margin();
        if (m == null) {
            return name;
        }
        String unit = r.unit() == null || r.unit().isBlank() ? "" : " " + r.unit();
        String margin;
        if (m.ratio()) {
            margin = "ratio " + (m.lower() == null ? "\u2264 " + Numbers.format(m.upper()) : m.upper() == null
                    ? "\u2265 " + Numbers.format(m.lower()) : Numbers.format(m.lower()) + "\u2013"
                    + Numbers.format(m.upper()));
            return name + "  (" + margin + ")";
        }
        if (m.lower() != null && m.upper() != null) {
            margin = -m.lower() == m.upper() ? "\u00b1" + Numbers.format(m.upper())
                    : Numbers.format(m.lower()) + "/+" + Numbers.format(m.upper());
        } else if (m.lower() != null) {
            margin = "\u2265 " + Numbers.format(m.lower());
        } else {
            margin = "\u2264 +" + Numbers.format(m.upper());
        }
        return name + "  (" + margin + unit + ")";
    }

    private static String levelText(List<CharacteristicResult> results) {
        Double level = null;
        Double alpha = null;
        for (CharacteristicResult r : results) {
            EquivalenceResult t = r.decidingTost();
            if (t == null) {
                continue;
            }
            if (level != null && level != t.level()) {
                return "(1 \u2212 2\u03b1) intervals (levels differ between rows)";
            }
            level = t.level();
            alpha = t.alpha();
        }
        if (level == null) {
            return "no characteristic has a margin";
        }
        return String.format(Locale.ROOT, "%s %% intervals (1 \u2212 2\u03b1, \u03b1 = %s per one-sided test)",
                Numbers.format(100 * level), Numbers.format(alpha));
    }

    private static void addBandsAndClips(XYPlot plot, List<CharacteristicResult> results, Range xRange,
            ChartTheme theme) {
        XYErrorRenderer r = (XYErrorRenderer) plot.getRenderer();
        for (int row = 0; row < results.size(); row++) {
            CharacteristicResult c = results.get(row);
            EquivalenceResult t = c.decidingTost();
            if (t == null || c.margin() == null) {
                continue;
            }
            double x0 = c.margin().lower() != null ? -1 : xRange.getLowerBound();
            double x1 = c.margin().upper() != null ? 1 : xRange.getUpperBound();
            // the row axis is inverted, so the box's first corner takes the larger row value
            r.addAnnotation(new XYBoxAnnotation(x0, row + 0.36, x1, row - 0.36, null, null, ChartTheme.BAND),
                    Layer.BACKGROUND);
            clip(r, scaled(t.ciLower(), c.margin()), row, xRange, theme);
            clip(r, scaled(t.ciUpper(), c.margin()), row, xRange, theme);
        }
        // the bounds and zero as lines over the bands but under the intervals
        double top = -0.5;
        double bottom = results.size() - 0.5;
        r.addAnnotation(new XYLineAnnotation(0, top, 0, bottom, new BasicStroke(1.0f), ChartTheme.MUTED),
                Layer.BACKGROUND);
        for (double v : new double[] {-1, 1}) {
            r.addAnnotation(new XYLineAnnotation(v, top, v, bottom, theme.limitStroke(), ChartTheme.INK),
                    Layer.BACKGROUND);
        }
    }

    private static void clip(XYErrorRenderer r, double v, int row, Range xRange, ChartTheme theme) {
        if (v >= -CLAMP && v <= CLAMP) {
            return;
        }
        boolean high = v > CLAMP;
        XYTextAnnotation a = new XYTextAnnotation((high ? "" : "\u25c2 ") + Numbers.format(v) + (high ? " \u25b8" : ""),
                high ? xRange.getUpperBound() : xRange.getLowerBound(), row - 0.42);
        a.setTextAnchor(high ? TextAnchor.BOTTOM_RIGHT : TextAnchor.BOTTOM_LEFT);
        a.setFont(theme.noteFont());
        a.setPaint(ChartTheme.INK);
        r.addAnnotation(a, Layer.FOREGROUND);
    }
}
