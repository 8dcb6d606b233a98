package org.holdpoint.chart;

import java.awt.BasicStroke;
import java.text.NumberFormat;
import java.util.Locale;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.axis.NumberTickUnit;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

/**
 * The power curve of a planned trial: power against the true difference after − before, with the target power
 * marked. The numbers come from the planning computation; this class only draws them.
 *
 * <p>Dataset 0 holds one series ("power") with one item per given difference, in the given order.
 */
public final class PowerCurveChart {
    private PowerCurveChart() {
    }

    /**
     * The power curve.
     *
     * @param title       the chart title, e.g. the characteristic and the planned sample sizes
     * @param unit        the unit of the difference, or null
     * @param differences true differences after − before, strictly increasing, at least 2, finite
     * @param power       the power at each difference, in [0, 1]; copied, not changed
     * @param targetPower the target power, in (0, 1)
     * @param theme       the theme
     * @return the chart
     * @throws ChartException if the arrays differ in length, are too short, not increasing, or out of range
     */
    public static JFreeChart create(String title, String unit, double[] differences, double[] power,
            double targetPower, ChartTheme theme) {
        return create(title, unit == null || unit.isBlank() ? "true difference after \u2212 before"
                : "true difference after \u2212 before [" + unit + "]", "power of the equivalence test against the "
                + "true difference", "power (probability of showing equivalence)", differences, power, targetPower,
                theme);
    }

    /**
     * The power curve of any criterion against the true value of what it judges (the difference, the sd
     * ratio, the Ppk).
     *
     * @param title       the chart title
     * @param xLabel      the x axis: the true value, with its unit
     * @param subtitle    what the curve shows, in words
     * @param yLabel      the y axis: the probability of what
     * @param xs          the true values, strictly increasing, at least 2, finite
     * @param power       the power at each, in [0, 1]
     * @param targetPower the target power, in (0, 1)
     * @param theme       the theme
     * @return the chart
     * @throws ChartException as {@link #create(String, String, double[], double[], double, ChartTheme)}
     */
    public static JFreeChart create(String title, String xLabel, String subtitle, String yLabel, double[] xs,
            double[] power, double targetPower, ChartTheme theme) {
        double[] differences = xs;
        validate(differences, power, targetPower);
        XYSeries s = new XYSeries("power", false, true);
        for (int i = 0; i < differences.length; i++) {
            s.add(differences[i], power[i]);
        }
        NumberAxis x = new NumberAxis(xLabel);
        x.setAutoRangeIncludesZero(false);
        x.setNumberFormatOverride(Numbers.plainFormat());
        x.setRange(ChartRanges.padded(new double[] {differences[0], differences[differences.length - 1]}, 0.02));
        NumberAxis y = new NumberAxis(yLabel);
        y.setRange(0, 1.04);
        NumberFormat pct = NumberFormat.getPercentInstance(Locale.ROOT);
        y.setTickUnit(new NumberTickUnit(0.2, pct));
        XYLineAndShapeRenderer r = new XYLineAndShapeRenderer(true, differences.length <= 25);
        r.setSeriesPaint(0, ChartTheme.BEFORE);
        r.setSeriesStroke(0, new BasicStroke(2f));
        r.setSeriesShape(0, ChartTheme.circle(4));
        XYPlot plot = new XYPlot(new XYSeriesCollection(s), x, y, r);
        ValueMarker target = new ValueMarker(targetPower, ChartTheme.AFTER, new BasicStroke(1.4f,
                BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {6f, 3f}, 0f));
        target.setLabel("target " + pct.format(targetPower));
        target.setLabelFont(theme.tickFont());
        target.setLabelPaint(ChartTheme.INK);
        target.setLabelBackgroundColor(new java.awt.Color(255, 255, 255, 220));
        target.setLabelAnchor(RectangleAnchor.TOP_RIGHT);
        target.setLabelTextAnchor(TextAnchor.BOTTOM_RIGHT);
        target.setLabelOffset(new RectangleInsets(2, 4, 2, 4));
        plot.addRangeMarker(target);
        plot.addDomainMarker(new ValueMarker(0, ChartTheme.MUTED, new BasicStroke(0.8f)));
        LegendItemCollection items = new LegendItemCollection();
        items.add(new LegendItem("power", null, null, null, new java.awt.geom.Line2D.Double(-8, 0, 8, 0),
                new BasicStroke(2f), ChartTheme.BEFORE));
        items.add(new LegendItem("target power", null, null, null, new java.awt.geom.Line2D.Double(-8, 0, 8, 0),
                target.getStroke(), ChartTheme.AFTER));
        plot.setFixedLegendItems(items);
        JFreeChart chart = new JFreeChart(title, theme.titleFont(), plot, false);
        chart.addSubtitle(theme.subtitle(subtitle));
        chart.addSubtitle(BoxPlotChart.legend(plot));
        theme.apply(chart);
        return chart;
    }

    private static void validate(double[] differences, double[] power, double targetPower) {
        if (differences.length != power.length) {
            throw new ChartException("a power curve needs one power per difference, got %d differences and %d "
                    + "powers", differences.length, power.length);
        }
        if (differences.length < 2) {
            throw new ChartException("a power curve needs at least 2 points, got %d", differences.length);
        }
        for (int i = 0; i < differences.length; i++) {
            if (!Double.isFinite(differences[i]) || (i > 0 && !(differences[i] > differences[i - 1]))) {
                throw new ChartException("differences must be finite and strictly increasing; point %d is %s", i + 1,
                        differences[i]);
            }
            if (!(power[i] >= 0 && power[i] <= 1)) {
                throw new ChartException("power must lie in [0, 1]; point %d is %s", i + 1, power[i]);
            }
        }
        if (!(targetPower > 0 && targetPower < 1)) {
            throw new ChartException("the target power must lie in (0, 1), got %s", targetPower);
        }
    }
}
