package org.holdpoint.chart;

import java.awt.BasicStroke;
import java.awt.Font;
import java.util.List;
import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.result.Stability;
import org.holdpoint.stats.ControlChart;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * The individuals chart of a process change (docs/methods.md §16): before and after on one run-order axis with
 * the change between them, the before phase's centre line and limits across both phases (labelled), the after
 * phase's own limits dashed over its part, and every signal ringed and numbered by its test — never by colour
 * alone.
 *
 * <p>Datasets: 0 = the values (series 0 before, 1 after), 1 = the after phase's own limits, 2 = the signals.
 */
public final class RunChart {
    private RunChart() {
    }

    /**
     * @param r        the characteristic's result, with a stability block
     * @param decimals decimals for the limits' labels (the characteristic's resolution plus two)
     * @param theme    the theme
     * @return the chart
     * @throws ChartException when the result has no stability block
     */
    public static JFreeChart create(CharacteristicResult r, int decimals, ChartTheme theme) {
        Stability st = r.checks() == null ? null : r.checks().stability();
        if (st == null) {
            throw new ChartException("no run order is known for " + r.name() + ", so there is no control chart");
        }
        XYSeriesCollection values = new XYSeriesCollection();
        XYSeries before = new XYSeries("before, in run order", false, true);
        XYSeries after = new XYSeries("after, in run order", false, true);
        int nb = st.beforeRun().size();
        for (int i = 0; i < nb; i++) {
            before.add(i + 1, st.beforeRun().get(i));
        }
        for (int i = 0; i < st.afterRun().size(); i++) {
            after.add(nb + i + 1, st.afterRun().get(i));
        }
        values.addSeries(before);
        values.addSeries(after);
        int n = nb + st.afterRun().size();
        NumberAxis x = new NumberAxis("run order (before 1\u2013" + nb + ", after " + (nb + 1) + "\u2013" + n + ")");
        x.setRange(0.3, n + 0.7);
        x.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        NumberAxis y = new NumberAxis(Numbers.axisLabel(r.name(), r.unit()));
        y.setAutoRangeIncludesZero(false);
        XYLineAndShapeRenderer points = new XYLineAndShapeRenderer(true, true);
        for (int g = 0; g < 2; g++) {
            points.setSeriesPaint(g, theme.groupColour(g));
            points.setSeriesShape(g, theme.groupShape(g, 5));
            points.setSeriesStroke(g, new BasicStroke(0.8f));
        }
        XYPlot plot = new XYPlot(values, x, y, points);
        ControlChart.Limits l = st.before().own();
        double lo = Math.min(l.lcl(), Math.min(before.getMinY(), after.getMinY()));
        double hi = Math.max(l.ucl(), Math.max(before.getMaxY(), after.getMaxY()));
        ControlChart.Limits own = st.after().own();
        lo = Math.min(lo, own.lcl());
        hi = Math.max(hi, own.ucl());
        y.setRange(ChartRanges.padded(new double[] {lo, hi}, 0.08));
        int d = Math.min(10, Math.max(0, decimals));
        plot.addRangeMarker(line(l.ucl(), "UCL " + Numbers.fixed(l.ucl(), d), theme, true));
        plot.addRangeMarker(line(l.center(), "centre " + Numbers.fixed(l.center(), d), theme, false));
        plot.addRangeMarker(line(l.lcl(), "LCL " + Numbers.fixed(l.lcl(), d), theme, true));
        ValueMarker change = new ValueMarker(nb + 0.5, ChartTheme.MUTED, new BasicStroke(1.2f, BasicStroke.CAP_BUTT,
                BasicStroke.JOIN_MITER, 10, new float[] {2, 3}, 0));
        change.setLabel("change");
        change.setLabelFont(theme.noteFont());
        change.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
        change.setLabelTextAnchor(TextAnchor.TOP_LEFT);
        plot.addDomainMarker(change);
        // the after phase's own limits over its part, for comparison
        XYSeriesCollection ownLimits = new XYSeriesCollection();
        for (double v : new double[] {own.ucl(), own.lcl()}) {
            XYSeries s = new XYSeries(v == own.ucl() ? "after phase's own limits" : "after phase's own LCL", false,
                    true);
            s.add(nb + 0.5, v);
            s.add(n + 0.5, v);
            ownLimits.addSeries(s);
        }
        XYLineAndShapeRenderer dashed = new XYLineAndShapeRenderer(true, false);
        for (int i = 0; i < 2; i++) {
            dashed.setSeriesPaint(i, ChartTheme.AFTER);
            dashed.setSeriesStroke(i, theme.groupStroke(1));
            dashed.setSeriesVisibleInLegend(i, i == 0);
        }
        plot.setDataset(1, ownLimits);
        plot.setRenderer(1, dashed);
        // signals: ringed, numbered by their test
        XYSeriesCollection sig = new XYSeriesCollection();
        XYSeries rings = new XYSeries("signal (number = ISO 7870-2 test)", false, true);
        addSignals(rings, plot, st.before().signals(), st.beforeRun(), 0, theme);
        addSignals(rings, plot, st.after().signals(), st.afterRun(), nb, theme);
        sig.addSeries(rings);
        XYLineAndShapeRenderer ring = new XYLineAndShapeRenderer(false, true);
        ring.setSeriesShape(0, new java.awt.geom.Ellipse2D.Double(-7, -7, 14, 14));
        ring.setSeriesShapesFilled(0, false);
        ring.setSeriesPaint(0, ChartTheme.INK);
        ring.setSeriesStroke(0, new BasicStroke(1.4f));
        plot.setDataset(2, sig);
        plot.setRenderer(2, ring);
        plot.setDatasetRenderingOrder(org.jfree.chart.plot.DatasetRenderingOrder.FORWARD);
        JFreeChart chart = new JFreeChart(r.name(), theme.titleFont(), plot, false);
        int sb = st.before().signals().size();
        int sa = st.after().signals().size();
        chart.addSubtitle(theme.subtitle("individuals chart in run order: before " + (sb == 0 ? "in control"
                : sb + " signal" + (sb == 1 ? "" : "s")) + "; after against the before limits: " + (sa == 0
                        ? "in control" : sa + " signal" + (sa == 1 ? "" : "s"))));
        chart.addSubtitle(theme.note("Limits from the before phase: centre \u00b1 3\u03c3\u0302, \u03c3\u0302 = mean "
                + "moving range / d\u2082 (ISO 7870-2); dashed: the after phase's own limits. Ringed points complete "
                + "a test: 1 beyond a limit, 2 nine in a row on one side, 3 six in a row rising or falling."));
        chart.addSubtitle(BoxPlotChart.legend(plot));
        theme.apply(chart);
        return chart;
    }

    private static void addSignals(XYSeries rings, XYPlot plot, List<ControlChart.Signal> signals, List<Double> run,
            int offset, ChartTheme theme) {
        // one ring per point, labelled with every test it completes, e.g. "1,2"
        java.util.Map<Integer, List<String>> tests = new java.util.TreeMap<>();
        for (ControlChart.Signal s : signals) {
            tests.computeIfAbsent(s.index(), k -> new java.util.ArrayList<>()).add(Integer.toString(s.test()));
        }
        for (var e : tests.entrySet()) {
            double xv = offset + e.getKey();
            double yv = run.get(e.getKey() - 1);
            rings.add(xv, yv);
            XYTextAnnotation a = new XYTextAnnotation(String.join(",", e.getValue()), xv, yv);
            a.setFont(theme.noteFont().deriveFont(Font.BOLD));
            a.setPaint(ChartTheme.INK);
            a.setTextAnchor(TextAnchor.BOTTOM_CENTER);
            plot.addAnnotation(a);
        }
    }

    private static ValueMarker line(double v, String label, ChartTheme theme, boolean limit) {
        ValueMarker m = new ValueMarker(v, limit ? ChartTheme.FAIL : ChartTheme.MUTED, limit ? theme.limitStroke()
                : theme.nominalStroke());
        m.setLabel(label);
        m.setLabelFont(theme.noteFont());
        m.setLabelPaint(ChartTheme.INK);
        m.setLabelAnchor(RectangleAnchor.TOP_LEFT);
        m.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
        m.setLabelOffset(new RectangleInsets(2, 4, 2, 4));
        return m;
    }
}
