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
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * The control chart of a process change (docs/methods.md §16): individuals, or subgroup means above subgroup
 * sds; before and after on one run-order axis with the change between them, the before phase's centre line and limits across both phases (labelled), the after
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
        boolean means = st.kind() == ControlChart.Kind.MEANS;
        ControlChart.Phase pb = st.before();
        ControlChart.Phase pa = st.after();
        int nb = pb.points();
        int n = nb + pa.points();
        NumberAxis x = new NumberAxis((means ? "subgroups in run order" : "run order") + " (before 1\u2013" + nb
                + ", after " + (nb + 1) + "\u2013" + n + ")");
        x.setRange(0.3, n + 0.7);
        x.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        int d = Math.min(10, Math.max(0, decimals));
        XYPlot location = locationPlot(r, st, means, nb, n, d, theme);
        JFreeChart chart;
        XYPlot legendOf = location;
        if (means) {
            CombinedDomainXYPlot both = new CombinedDomainXYPlot(x);
            both.setGap(8);
            both.add(location, 3);
            both.add(spreadPlot(r, st, nb, d, theme), 2);
            chart = new JFreeChart(r.name(), theme.titleFont(), both, false);
        } else {
            location.setDomainAxis(x);
            chart = new JFreeChart(r.name(), theme.titleFont(), location, false);
        }
        int sb = pb.signals().size();
        int sa = pa.signals().size();
        chart.addSubtitle(theme.subtitle((means ? "subgroup mean and sd charts" : "individuals chart")
                + " in run order: before " + (sb == 0 ? "in control"
                : sb + " signal" + (sb == 1 ? "" : "s")) + "; after against the before limits: " + (sa == 0
                        ? "in control" : sa + " signal" + (sa == 1 ? "" : "s"))));
        chart.addSubtitle(theme.note(caption(st, means)));
        chart.addSubtitle(BoxPlotChart.legend(legendOf));
        theme.apply(chart);
        return chart;
    }

    /** The caption: how the limits were set and what each test in use looks for. */
    static String caption(Stability st, boolean means) {
        ControlChart.Limits l = st.before().limits();
        StringBuilder sb = new StringBuilder(means
                ? "Limits from the before phase: centre \u00b1 3\u03c3\u0302/\u221an, \u03c3\u0302 = mean of "
                        + "s/c\u2084(n) over the subgroups; sd chart c\u2084\u03c3\u0302 \u00b1 "
                        + "3\u03c3\u0302\u221a(1 \u2212 c\u2084\u00b2) (ISO 7870-2), drawn for subgroups of "
                        + l.size() + (sizesVary(st) ? "; short bars: the limits of a subgroup of another size" : "")
                : "Limits from the before phase: centre \u00b1 3\u03c3\u0302, \u03c3\u0302 = mean moving range "
                        + "/ d\u2082 (ISO 7870-2)");
        sb.append("; dashed: the after phase's own limits. Ringed points complete a test:");
        String[] words = {"", " 1 beyond a limit", " 2 nine in a row on one side", " 3 six in a row rising or falling",
            " 4 fourteen in a row alternating", " 5 two of three beyond 2\u03c3\u0302 on one side",
            " 6 four of five beyond 1\u03c3\u0302 on one side", " 7 fifteen in a row within 1\u03c3\u0302",
            " 8 eight in a row beyond 1\u03c3\u0302 on both sides"};
        List<String> parts = new java.util.ArrayList<>();
        for (int t : st.tests()) {
            parts.add(words[t]);
        }
        sb.append(String.join(",", parts)).append(means ? " (on the sd chart: 1 only)." : ".");
        return sb.toString();
    }

    private static boolean sizesVary(Stability st) {
        int nominal = st.before().limits().size();
        for (ControlChart.Phase p : List.of(st.before(), st.after())) {
            for (int i = 0; i < p.points(); i++) {
                if (p.size(i) != nominal) {
                    return true;
                }
            }
        }
        return false;
    }

    private static XYPlot locationPlot(CharacteristicResult r, Stability st, boolean means, int nb, int n, int d,
            ChartTheme theme) {
        ControlChart.Phase pb = st.before();
        ControlChart.Phase pa = st.after();
        XYSeriesCollection values = new XYSeriesCollection();
        XYSeries before = new XYSeries(means ? "before, subgroup means" : "before, in run order", false, true);
        XYSeries after = new XYSeries(means ? "after, subgroup means" : "after, in run order", false, true);
        for (int i = 0; i < nb; i++) {
            before.add(i + 1, pb.point(i));
        }
        for (int i = 0; i < pa.points(); i++) {
            after.add(nb + i + 1, pa.point(i));
        }
        values.addSeries(before);
        values.addSeries(after);
        NumberAxis y = new NumberAxis(means ? Numbers.axisLabel("mean", r.unit()) : Numbers.axisLabel(r.name(), r.unit()));
        y.setAutoRangeIncludesZero(false);
        XYPlot plot = new XYPlot(values, null, y, pointRenderer(theme));
        ControlChart.Limits l = pb.own();
        ControlChart.Limits own = pa.own();
        double lo = Math.min(Math.min(l.lcl(), own.lcl()), Math.min(before.getMinY(), after.getMinY()));
        double hi = Math.max(Math.max(l.ucl(), own.ucl()), Math.max(before.getMaxY(), after.getMaxY()));
        plot.addRangeMarker(line(l.ucl(), "UCL " + Numbers.fixed(l.ucl(), d), theme, true));
        plot.addRangeMarker(line(l.center(), "centre " + Numbers.fixed(l.center(), d), theme, false));
        plot.addRangeMarker(line(l.lcl(), "LCL " + Numbers.fixed(l.lcl(), d), theme, true));
        plot.addDomainMarker(change(nb, theme));
        // the after phase's own limits over its part, for comparison
        plot.setDataset(1, ownLimits(own.ucl(), own.lcl(), nb, n));
        plot.setRenderer(1, dashed(theme));
        // a subgroup of another size than the limits are drawn for: its own limits as short bars
        if (means && sizesVary(st)) {
            XYSeriesCollection bars = new XYSeriesCollection();
            int k = 0;
            for (int ph = 0; ph < 2; ph++) {
                ControlChart.Phase p = ph == 0 ? pb : pa;
                for (int i = 0; i < p.points(); i++) {
                    if (p.size(i) != l.size()) {
                        double xv = (ph == 0 ? 0 : nb) + i + 1;
                        for (double v : new double[] {l.lcl(p.size(i)), l.ucl(p.size(i))}) {
                            XYSeries s = new XYSeries("bar " + k++, false, true);
                            s.add(xv - 0.35, v);
                            s.add(xv + 0.35, v);
                            bars.addSeries(s);
                            lo = Math.min(lo, v);
                            hi = Math.max(hi, v);
                        }
                    }
                }
            }
            XYLineAndShapeRenderer barRenderer = new XYLineAndShapeRenderer(true, false);
            for (int i = 0; i < bars.getSeriesCount(); i++) {
                barRenderer.setSeriesPaint(i, ChartTheme.FAIL);
                barRenderer.setSeriesStroke(i, theme.limitStroke());
                barRenderer.setSeriesVisibleInLegend(i, false);
            }
            plot.setDataset(3, bars);
            plot.setRenderer(3, barRenderer);
        }
        y.setRange(ChartRanges.padded(new double[] {lo, hi}, 0.08));
        plot.setDataset(2, rings(plot, pb, pa, nb, ControlChart.Chart.LOCATION, theme));
        plot.setRenderer(2, ringRenderer());
        plot.setDatasetRenderingOrder(org.jfree.chart.plot.DatasetRenderingOrder.FORWARD);
        return plot;
    }

    private static XYPlot spreadPlot(CharacteristicResult r, Stability st, int nb, int d, ChartTheme theme) {
        ControlChart.Phase pb = st.before();
        ControlChart.Phase pa = st.after();
        XYSeriesCollection values = new XYSeriesCollection();
        XYSeries before = new XYSeries("before, subgroup sds", false, true);
        XYSeries after = new XYSeries("after, subgroup sds", false, true);
        for (int i = 0; i < nb; i++) {
            if (!Double.isNaN(pb.spreadPoint(i))) {
                before.add(i + 1, pb.spreadPoint(i));
            }
        }
        for (int i = 0; i < pa.points(); i++) {
            if (!Double.isNaN(pa.spreadPoint(i))) {
                after.add(nb + i + 1, pa.spreadPoint(i));
            }
        }
        values.addSeries(before);
        values.addSeries(after);
        NumberAxis y = new NumberAxis(Numbers.axisLabel("sd", r.unit()));
        XYLineAndShapeRenderer renderer = pointRenderer(theme);
        renderer.setSeriesVisibleInLegend(0, false);
        renderer.setSeriesVisibleInLegend(1, false);
        XYPlot plot = new XYPlot(values, null, y, renderer);
        ControlChart.Limits l = pb.own();
        double hi = Math.max(l.spreadUcl(), Math.max(before.getItemCount() == 0 ? 0 : before.getMaxY(),
                after.getItemCount() == 0 ? 0 : after.getMaxY()));
        plot.addRangeMarker(line(l.spreadUcl(), "UCL " + Numbers.fixed(l.spreadUcl(), d), theme, true));
        plot.addRangeMarker(line(l.spreadCenter(), "centre " + Numbers.fixed(l.spreadCenter(), d), theme, false));
        if (l.spreadLcl() > 0) {
            plot.addRangeMarker(line(l.spreadLcl(), "LCL " + Numbers.fixed(l.spreadLcl(), d), theme, true));
        }
        ValueMarker change = change(nb, theme);
        change.setLabel(null);
        plot.addDomainMarker(change);
        y.setRange(0, hi * 1.3);
        plot.setDataset(2, rings(plot, pb, pa, nb, ControlChart.Chart.SPREAD, theme));
        XYLineAndShapeRenderer ring = ringRenderer();
        ring.setSeriesVisibleInLegend(0, false);
        plot.setRenderer(2, ring);
        plot.setDatasetRenderingOrder(org.jfree.chart.plot.DatasetRenderingOrder.FORWARD);
        return plot;
    }

    private static XYLineAndShapeRenderer pointRenderer(ChartTheme theme) {
        XYLineAndShapeRenderer points = new XYLineAndShapeRenderer(true, true);
        for (int g = 0; g < 2; g++) {
            points.setSeriesPaint(g, theme.groupColour(g));
            points.setSeriesShape(g, theme.groupShape(g, 5));
            points.setSeriesStroke(g, new BasicStroke(0.8f));
        }
        return points;
    }

    private static ValueMarker change(int nb, ChartTheme theme) {
        ValueMarker change = new ValueMarker(nb + 0.5, ChartTheme.MUTED, new BasicStroke(1.2f, BasicStroke.CAP_BUTT,
                BasicStroke.JOIN_MITER, 10, new float[] {2, 3}, 0));
        change.setLabel("change");
        change.setLabelFont(theme.noteFont());
        change.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
        change.setLabelTextAnchor(TextAnchor.TOP_LEFT);
        return change;
    }

    private static XYSeriesCollection ownLimits(double ucl, double lcl, int nb, int n) {
        XYSeriesCollection ownLimits = new XYSeriesCollection();
        for (double v : new double[] {ucl, lcl}) {
            XYSeries s = new XYSeries(v == ucl ? "after phase's own limits" : "after phase's own LCL", false, true);
            s.add(nb + 0.5, v);
            s.add(n + 0.5, v);
            ownLimits.addSeries(s);
        }
        return ownLimits;
    }

    private static XYLineAndShapeRenderer dashed(ChartTheme theme) {
        XYLineAndShapeRenderer dashed = new XYLineAndShapeRenderer(true, false);
        for (int i = 0; i < 2; i++) {
            dashed.setSeriesPaint(i, ChartTheme.AFTER);
            dashed.setSeriesStroke(i, theme.groupStroke(1));
            dashed.setSeriesVisibleInLegend(i, i == 0);
        }
        return dashed;
    }

    private static XYLineAndShapeRenderer ringRenderer() {
        XYLineAndShapeRenderer ring = new XYLineAndShapeRenderer(false, true);
        ring.setSeriesShape(0, new java.awt.geom.Ellipse2D.Double(-7, -7, 14, 14));
        ring.setSeriesShapesFilled(0, false);
        ring.setSeriesPaint(0, ChartTheme.INK);
        ring.setSeriesStroke(0, new BasicStroke(1.4f));
        return ring;
    }

    private static XYSeriesCollection rings(XYPlot plot, ControlChart.Phase pb, ControlChart.Phase pa, int nb,
            ControlChart.Chart chart, ChartTheme theme) {
        XYSeriesCollection sig = new XYSeriesCollection();
        XYSeries rings = new XYSeries("signal (number = ISO 7870-2 test)", false, true);
        addSignals(rings, plot, pb, 0, chart, theme);
        addSignals(rings, plot, pa, nb, chart, theme);
        sig.addSeries(rings);
        return sig;
    }

    private static void addSignals(XYSeries rings, XYPlot plot, ControlChart.Phase p, int offset,
            ControlChart.Chart chart, ChartTheme theme) {
        // one ring per point, labelled with every test it completes, e.g. "1,2"
        java.util.Map<Integer, List<String>> tests = new java.util.TreeMap<>();
        for (ControlChart.Signal s : p.signals()) {
            if (s.chart() == chart) {
                tests.computeIfAbsent(s.index(), k -> new java.util.ArrayList<>()).add(Integer.toString(s.test()));
            }
        }
        for (var e : tests.entrySet()) {
            double xv = offset + e.getKey();
            double yv = chart == ControlChart.Chart.SPREAD ? p.spreadPoint(e.getKey() - 1) : p.point(e.getKey() - 1);
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
