package org.holdpoint.chart;

import java.awt.BasicStroke;
import java.util.Arrays;
import org.holdpoint.stats.Descriptives;
import org.holdpoint.stats.FittedDistribution;
import org.holdpoint.stats.Normal;
import org.holdpoint.stats.Quantiles;
import org.holdpoint.stats.Sample;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.SpecLimits;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.StandardXYBarPainter;
import org.jfree.chart.renderer.xy.XYBarRenderer;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.Range;
import org.jfree.data.xy.XYIntervalSeries;
import org.jfree.data.xy.XYIntervalSeriesCollection;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * Shape charts of one characteristic: the histograms of both groups (common bins, one panel per group, shared value
 * axis) with the fitted normal curve and the spec limits, and a normal probability plot of both groups with their
 * reference lines.
 */
public final class DistributionCharts {
    /** Points on each fitted normal curve. */
    static final int CURVE_POINTS = 161;

    private DistributionCharts() {
    }

    /**
     * Histograms of the before and after groups, stacked, over common bins.
     *
     * <p>Bins: width by the Freedman–Diaconis rule 2·IQR·n^(−1/3) (Freedman &amp; Diaconis 1981, Z. Wahrsch. 57:
     * 453–476) with the type-7 IQR of the pooled values and n the larger group; when the values lie on a measuring
     * grid the width is a whole number of grid steps with edges half a step off the grid, otherwise the count is
     * kept within 5..40; at most 40 bins either way (common practice, no source). Each panel's curve is the normal density with the group's mean and sd, scaled to
     * counts: n·w·φ((x − mean)/sd)/sd for bin width w.
     *
     * <p>Subplot datasets: 0 = the bars ({@link XYIntervalSeriesCollection}, one series), 1 = the curve.
     *
     * @param data   the characteristic
     * @param limits the spec limits to draw, or {@link SpecLimits#NONE}
     * @param theme  the theme
     * @return the chart, whose plot is a {@link CombinedDomainXYPlot} of two subplots (before, after)
     */
    public static JFreeChart histogram(CharacteristicData data, SpecLimits limits, ChartTheme theme) {
        return histogram(data, limits, theme, null);
    }

    /**
     * As {@link #histogram(CharacteristicData, SpecLimits, ChartTheme)}, each panel's curve the density of the
     * distribution fitted to that group (docs/methods.md §14) when {@code fits} is given.
     *
     * @param data   the characteristic
     * @param limits the spec limits to draw
     * @param theme  the theme
     * @param fits   the fitted distributions of before and after, or null for the normal curve
     * @return the chart
     */
    public static JFreeChart histogram(CharacteristicData data, SpecLimits limits, ChartTheme theme,
            FittedDistribution[] fits) {
        Sample[] groups = {data.before().sample(), data.after().sample()};
        double[] all = pooled(groups);
        Arrays.sort(all);
        double[] edges = binEdges(all, Math.max(groups[0].size(), groups[1].size()));
        double lo = Math.min(all[0], edges[0]);
        double hi = Math.max(all[all.length - 1], edges[edges.length - 1]);
        Descriptives[] d = new Descriptives[2];
        for (int g = 0; g < 2; g++) {
            d[g] = Descriptives.of(groups[g]);
            if (fits != null) {
                lo = Math.min(lo, fits[g].quantile(0.001));
                hi = Math.max(hi, fits[g].quantile(0.999));
            } else if (d[g].n() > 1 && d[g].sd() > 0) {
                lo = Math.min(lo, d[g].mean() - 3.5 * d[g].sd());
                hi = Math.max(hi, d[g].mean() + 3.5 * d[g].sd());
            }
        }
        double[] span = withLimits(new double[] {lo, hi}, limits);
        NumberAxis x = new NumberAxis(Numbers.axisLabel(data.name(), data.unit()));
        x.setAutoRangeIncludesZero(false);
        x.setRange(ChartRanges.padded(span, 0.03));
        CombinedDomainXYPlot plot = new CombinedDomainXYPlot(x);
        plot.setGap(8);
        XYPlot[] panels = new XYPlot[2];
        double top = 1;
        for (int g = 0; g < 2; g++) {
            panels[g] = panel(groups[g], d[g], edges, x.getRange(), g, limits, theme, fits == null ? null : fits[g]);
            top = Math.max(top, panels[g].getRangeAxis().getUpperBound());
        }
        for (XYPlot p : panels) {
            // one count scale for both panels, so that equal heights mean equal counts
            p.getRangeAxis().setRange(0, top);
            plot.add(p, 1);
        }
        int decimals = Math.min(10, data.resolutionDecimals() + 2);
        plot.setFixedLegendItems(histogramLegend(d, limits, theme, decimals, fits == null ? "normal"
                : fits[0].family().key()));
        JFreeChart chart = new JFreeChart(data.name(), theme.titleFont(), plot, false);
        String family = fits == null ? "normal" : fits[0].family().key();
        chart.addSubtitle(theme.subtitle("distribution before and after, with the fitted " + family + " curve"));
        chart.addSubtitle(theme.note(String.format(java.util.Locale.ROOT, "Common bins of width %s (%d bins, "
                + "Freedman\u2013Diaconis rule with at least \u221an + 2 bins, in whole measuring steps when the values lie on a "
                + "grid); curve: " + (fits == null ? "normal density with the group's mean and sd"
                        : family + " density fitted to each group by maximum likelihood") + ", scaled to counts.",
                Numbers.fixed(edges[1] - edges[0], Math.max(decimals - 2, decimalsOf(edges[1] - edges[0]))),
                edges.length - 1)));
        chart.addSubtitle(BoxPlotChart.legend(plot));
        theme.apply(chart);
        for (Object sub : plot.getSubplots()) {
            theme.stylePlot((XYPlot) sub);
        }
        return chart;
    }

    private static XYPlot panel(Sample sample, Descriptives d, double[] edges, Range xRange, int g,
            SpecLimits limits, ChartTheme theme, FittedDistribution fit) {
        int[] counts = counts(sample, edges);
        XYIntervalSeries bars = new XYIntervalSeries(g == 0 ? "before" : "after", false, true);
        int max = 0;
        for (int b = 0; b < counts.length; b++) {
            double mid = (edges[b] + edges[b + 1]) / 2;
            bars.add(mid, edges[b], edges[b + 1], counts[b], 0, counts[b]);
            max = Math.max(max, counts[b]);
        }
        XYIntervalSeriesCollection barData = new XYIntervalSeriesCollection();
        barData.addSeries(bars);
        NumberAxis y = new NumberAxis("count, " + (g == 0 ? "before" : "after"));
        y.setStandardTickUnits(NumberAxis.createIntegerTickUnits());
        XYBarRenderer barRenderer = new XYBarRenderer(0);
        barRenderer.setBarPainter(new StandardXYBarPainter());
        barRenderer.setShadowVisible(false);
        barRenderer.setSeriesPaint(0, theme.groupFill(g));
        barRenderer.setDrawBarOutline(true);
        barRenderer.setSeriesOutlinePaint(0, theme.groupColour(g));
        barRenderer.setSeriesOutlineStroke(0, new BasicStroke(0.8f));
        XYPlot p = new XYPlot(barData, null, y, barRenderer);
        double curveMax = 0;
        if (fit != null || d.n() > 1 && d.sd() > 0) {
            XYSeries curve = new XYSeries((fit == null ? "normal" : fit.family().key()) + " fit, " + (g == 0 ? "before"
                    : "after"), false, false);
            double w = edges[1] - edges[0];
            for (int i = 0; i < CURVE_POINTS; i++) {
                double xv = xRange.getLowerBound() + xRange.getLength() * i / (CURVE_POINTS - 1);
                double yv = fit != null ? d.n() * w * Math.exp(fit.logDensity(xv))
                        : d.n() * w * Normal.density((xv - d.mean()) / d.sd()) / d.sd();
                if (!Double.isFinite(yv)) {
                    continue;
                }
                curve.add(xv, yv);
                curveMax = Math.max(curveMax, yv);
            }
            XYLineAndShapeRenderer line = new XYLineAndShapeRenderer(true, false);
            line.setSeriesPaint(0, theme.groupColour(g));
            line.setSeriesStroke(0, new BasicStroke(1.8f));
            p.setDataset(1, new XYSeriesCollection(curve));
            p.setRenderer(1, line);
            // the fitted curve over the bars, not hidden behind them
            p.setDatasetRenderingOrder(org.jfree.chart.plot.DatasetRenderingOrder.FORWARD);
        }
        y.setRange(0, Math.max(1, Math.max(max, curveMax)) * 1.25);
        addLimits(p, limits, theme, g == 0);
        return p;
    }

    /** The decimals a bin width needs at six significant digits (so 0.0024000000000000002 needs 4; at most 10). */
    private static int decimalsOf(double width) {
        java.math.BigDecimal b = new java.math.BigDecimal(width).round(new java.math.MathContext(6))
                .stripTrailingZeros();
        return Math.max(0, Math.min(10, b.scale()));
    }

    private static LegendItemCollection histogramLegend(Descriptives[] d, SpecLimits limits, ChartTheme theme,
            int decimals, String family) {
        LegendItemCollection items = new LegendItemCollection();
        for (int g = 0; g < 2; g++) {
            String text = String.format(java.util.Locale.ROOT, "%s: n = %d, mean %s, sd %s", g == 0 ? "before"
                    : "after", d[g].n(), Numbers.fixed(d[g].mean(), decimals), d[g].n() > 1 ? Numbers.fixed(d[g].sd(), decimals)
                    : "undefined");
            items.add(new LegendItem(text, null, null, null,
                    new java.awt.Rectangle(-6, -4, 12, 8), theme.groupFill(g), new BasicStroke(0.8f),
                    theme.groupColour(g)));
        }
        items.add(new LegendItem("fitted " + family, null, null, null, new java.awt.geom.Line2D.Double(-8, 0, 8, 0),
                new BasicStroke(1.8f), ChartTheme.MUTED));
        if (limits != null && limits.any()) {
            items.add(new LegendItem("spec limit", null, null, null, new java.awt.geom.Line2D.Double(-8, 0, 8, 0),
                    theme.limitStroke(), ChartTheme.INK));
        }
        return items;
    }

    /**
     * A normal probability plot of both groups: each sorted value x_(i) against the standard normal quantile of
     * its Blom plotting position, z_i = Φ⁻¹((i − 3/8)/(n + 1/4)) (Blom 1958, Statistical Estimates and Transformed
     * Beta-Variables), with each group's reference line x = mean + sd·z.
     *
     * <p>Datasets: 0 = the points (series 0 before, 1 after), 1 = the reference lines (same order).
     *
     * @param data   the characteristic
     * @param limits the spec limits to draw as horizontal lines, or {@link SpecLimits#NONE}
     * @param theme  the theme
     * @return the chart
     */
    public static JFreeChart normalProbability(CharacteristicData data, SpecLimits limits, ChartTheme theme) {
        return probability(data, limits, theme, null);
    }

    /**
     * A probability plot on the normal plot's axes: each sorted value against the standard normal quantile of its
     * Blom position, with each group's fitted quantile function x = F⁻¹(Φ(z)) as its reference: a straight line for
     * the normal model, a curve for a fitted family (docs/methods.md §14).
     *
     * @param data   the characteristic
     * @param limits the spec limits to draw as horizontal lines
     * @param theme  the theme
     * @param fits   the fitted distributions of before and after, or null for the normal reference lines
     * @return the chart
     */
    public static JFreeChart probability(CharacteristicData data, SpecLimits limits, ChartTheme theme,
            FittedDistribution[] fits) {
        Sample[] groups = {data.before().sample(), data.after().sample()};
        XYSeriesCollection points = new XYSeriesCollection();
        XYSeriesCollection lines = new XYSeriesCollection();
        double zMax = 1;
        double lo = Double.POSITIVE_INFINITY;
        double hi = Double.NEGATIVE_INFINITY;
        for (int g = 0; g < 2; g++) {
            String name = g == 0 ? "before" : "after";
            double[] sorted = groups[g].values();
            Arrays.sort(sorted);
            XYSeries s = new XYSeries(name, false, true);
            int n = sorted.length;
            for (int i = 0; i < n; i++) {
                double z = blom(i + 1, n);
                s.add(z, sorted[i]);
                zMax = Math.max(zMax, Math.abs(z));
            }
            points.addSeries(s);
            lo = Math.min(lo, sorted[0]);
            hi = Math.max(hi, sorted[n - 1]);
            Descriptives d = Descriptives.of(groups[g]);
            XYSeries ref = new XYSeries((fits == null ? "reference line, " : "fitted " + fits[g].family().key() + ", ")
                    + name, false, true);
            if (fits != null) {
                for (int i = 0; i <= 60; i++) {
                    double z = -zMax - 0.3 + (2 * zMax + 0.6) * i / 60;
                    double p = Normal.cdf(z);
                    if (p > 0 && p < 1) {
                        ref.add(z, fits[g].quantile(p));
                    }
                }
            } else if (n > 1 && d.sd() > 0) {
                ref.add(-zMax - 0.3, d.mean() - (zMax + 0.3) * d.sd());
                ref.add(zMax + 0.3, d.mean() + (zMax + 0.3) * d.sd());
            }
            lines.addSeries(ref);
        }
        NumberAxis x = new NumberAxis("standard normal quantile of the Blom plotting position");
        x.setRange(-zMax - 0.3, zMax + 0.3);
        NumberAxis y = new NumberAxis(Numbers.axisLabel(data.name(), data.unit()));
        y.setAutoRangeIncludesZero(false);
        y.setRange(ChartRanges.padded(withLimits(new double[] {lo, hi}, limits), 0.05));
        XYLineAndShapeRenderer dots = new XYLineAndShapeRenderer(false, true);
        XYLineAndShapeRenderer refs = new XYLineAndShapeRenderer(true, false);
        for (int g = 0; g < 2; g++) {
            dots.setSeriesShape(g, theme.groupShape(g, 5));
            dots.setSeriesPaint(g, theme.groupColour(g));
            refs.setSeriesPaint(g, theme.groupColour(g));
            refs.setSeriesStroke(g, theme.groupStroke(g));
            refs.setSeriesVisibleInLegend(g, true);
        }
        XYPlot plot = new XYPlot(points, x, y, dots);
        plot.setDataset(1, lines);
        plot.setRenderer(1, refs);
        plot.setDatasetRenderingOrder(org.jfree.chart.plot.DatasetRenderingOrder.FORWARD);
        addRangeLimits(plot, limits, theme);
        JFreeChart chart = new JFreeChart(data.name(), theme.titleFont(), plot, false);
        if (fits == null) {
            chart.addSubtitle(theme.subtitle("normal probability plot: points near their line fit a normal distribution"));
            chart.addSubtitle(theme.note("Plotting positions (i \u2212 3/8)/(n + 1/4) (Blom 1958); reference line: "
                    + "mean + sd \u00d7 z of each group. Quantiles shown elsewhere use " + Quantiles.METHOD + "."));
        } else {
            String family = fits[0].family().key();
            chart.addSubtitle(theme.subtitle("probability plot: points near their curve fit the " + family
                    + " distribution"));
            chart.addSubtitle(theme.note("Plotting positions (i \u2212 3/8)/(n + 1/4) (Blom 1958) on the normal scale; "
                    + "curve: the quantiles of the " + family + " distribution fitted to each group by maximum "
                    + "likelihood."));
        }
        chart.addSubtitle(BoxPlotChart.legend(plot));
        theme.apply(chart);
        return chart;
    }

    /**
     * The Blom plotting position's normal quantile.
     *
     * @param i the 1-based rank
     * @param n the sample size
     * @return Φ⁻¹((i − 3/8)/(n + 1/4))
     */
    static double blom(int i, int n) {
        return Normal.quantile((i - 0.375) / (n + 0.25));
    }

    private static double[] pooled(Sample[] groups) {
        double[] all = new double[groups[0].size() + groups[1].size()];
        System.arraycopy(groups[0].values(), 0, all, 0, groups[0].size());
        System.arraycopy(groups[1].values(), 0, all, groups[0].size(), groups[1].size());
        return all;
    }

    /**
     * Common bin edges over the sorted pooled values, width by Freedman–Diaconis (whole grid steps for gridded values),
     * at most 40 bins.
     *
     * @param sorted the pooled values, ascending
     * @param n      the size of the larger group
     * @return ascending edges; edges.length − 1 bins of equal width
     */
    static double[] binEdges(double[] sorted, int n) {
        double min = sorted[0];
        double max = sorted[sorted.length - 1];
        double span = max - min;
        if (span == 0) {
            double half = min == 0 ? 0.5 : Math.abs(min) * 0.005;
            return new double[] {min - half, min + half};
        }
        double iqr = Quantiles.type7(sorted, 0.75) - Quantiles.type7(sorted, 0.25);
        double fd = iqr > 0 ? 2 * iqr / Math.cbrt(n) : span / 5;
        // at least √n + 2 bins (at most 12 by this floor): the Freedman-Diaconis width alone gives 5 coarse bins
        // for 30 parts (the floor is common practice, no source)
        int floor = (int) Math.min(12, Math.ceil(Math.sqrt(n)) + 2);
        fd = Math.min(fd, span / floor);
        double step = resolution(sorted);
        if (step > 0) {
            // values on a measuring grid: whole grid steps per bin, edges half a step off the grid, so that every
            // bin holds the same number of grid values and no comb pattern appears
            long per = Math.max(1, Math.round(fd / step));
            while ((span + step) / (per * step) > 40) {
                per++;
            }
            int bins = (int) Math.ceil((span + step) / (per * step) - 1e-9);
            return edges(min - step / 2, per * step, bins);
        }
        int bins = Math.max(5, Math.min(40, (int) Math.ceil(span / fd)));
        double[] e = edges(min, span / bins, bins);
        e[bins] = max;
        return e;
    }

    private static double[] edges(double start, double width, int bins) {
        double[] e = new double[bins + 1];
        for (int i = 0; i <= bins; i++) {
            e[i] = start + width * i;
        }
        return e;
    }

    /**
     * The measuring step of values on a grid: the smallest gap between distinct values when every gap is a whole
     * multiple of it (within 1e-6 of a step) and the span holds at most 2000 steps; otherwise 0.
     */
    static double resolution(double[] sorted) {
        double gap = Double.POSITIVE_INFINITY;
        for (int i = 1; i < sorted.length; i++) {
            double d = sorted[i] - sorted[i - 1];
            if (d > 0 && d < gap) {
                gap = d;
            }
        }
        double span = sorted[sorted.length - 1] - sorted[0];
        if (!(gap < Double.POSITIVE_INFINITY) || span / gap > 2000) {
            return 0;
        }
        for (int i = 1; i < sorted.length; i++) {
            double k = (sorted[i] - sorted[0]) / gap;
            if (Math.abs(k - Math.rint(k)) > 1e-6 * Math.max(1, k)) {
                return 0;
            }
        }
        return gap;
    }

    /**
     * @param sample the values
     * @param edges  ascending bin edges; the last bin is closed on the right
     * @return the count per bin
     */
    static int[] counts(Sample sample, double[] edges) {
        int bins = edges.length - 1;
        int[] counts = new int[bins];
        double w = (edges[bins] - edges[0]) / bins;
        for (int i = 0; i < sample.size(); i++) {
            double v = sample.value(i);
            int b = (int) Math.floor((v - edges[0]) / w);
            // rounding near an edge: move to the bin whose half-open interval [e_b, e_b+1) holds v
            b = Math.max(0, Math.min(bins - 1, b));
            while (b > 0 && v < edges[b]) {
                b--;
            }
            while (b < bins - 1 && v >= edges[b + 1]) {
                b++;
            }
            counts[b]++;
        }
        return counts;
    }

    static double[] withLimits(double[] loHi, SpecLimits limits) {
        double lo = loHi[0];
        double hi = loHi[1];
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

    private static void addLimits(XYPlot p, SpecLimits limits, ChartTheme theme, boolean labelled) {
        if (limits == null) {
            return;
        }
        String[] names = {"LSL", "nominal", "USL"};
        Double[] values = {limits.lsl(), limits.nominal(), limits.usl()};
        for (int i = 0; i < 3; i++) {
            if (values[i] != null) {
                ValueMarker m = BoxPlotChart.limitMarker(values[i], names[i], theme, i == 1);
                // labels in the top panel only, on the side of the line facing the data, so none is clipped
                boolean leftOfLine = i == 2;
                m.setLabelAnchor(leftOfLine ? RectangleAnchor.TOP_LEFT : RectangleAnchor.TOP_RIGHT);
                m.setLabelTextAnchor(leftOfLine ? TextAnchor.TOP_RIGHT : TextAnchor.TOP_LEFT);
                m.setLabelOffset(new RectangleInsets(2, 3, 2, 3));
                if (!labelled) {
                    m.setLabel(null);
                }
                p.addDomainMarker(m);
            }
        }
    }

    private static void addRangeLimits(XYPlot p, SpecLimits limits, ChartTheme theme) {
        if (limits == null) {
            return;
        }
        String[] names = {"LSL", "nominal", "USL"};
        Double[] values = {limits.lsl(), limits.nominal(), limits.usl()};
        for (int i = 0; i < 3; i++) {
            if (values[i] != null) {
                ValueMarker m = BoxPlotChart.limitMarker(values[i], names[i], theme, i == 1);
                // the points rise from left to right: USL and nominal labels go left, the LSL label right, where
                // the plot is empty; each on the side of its line that faces the inside of the plot
                if (i == 0) {
                    m.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
                    m.setLabelTextAnchor(TextAnchor.BOTTOM_RIGHT);
                } else {
                    m.setLabelAnchor(i == 2 ? RectangleAnchor.BOTTOM_LEFT : RectangleAnchor.TOP_LEFT);
                    m.setLabelTextAnchor(i == 2 ? TextAnchor.TOP_LEFT : TextAnchor.BOTTOM_LEFT);
                }
                m.setLabelOffset(new RectangleInsets(2, 4, 2, 4));
                p.addRangeMarker(m);
            }
        }
    }
}
