package org.holdpoint.ui.swing;

import java.awt.Color;
import java.awt.Paint;
import org.holdpoint.chart.ChartTheme;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.Axis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.Marker;
import org.jfree.chart.plot.Plot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.AbstractRenderer;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.title.Title;
import org.jfree.chart.ui.Layer;

/**
 * Re-colours a chart built for paper so that it reads on the window's dark theme: dark backgrounds, light
 * text, lines and grid, and a lighter "before" blue. Only the window does this; files and the workbook keep
 * the paper colours.
 */
final class DarkCharts {
    private static final Color BACKGROUND = new Color(0x2B, 0x2D, 0x30);
    private static final Color PLOT = new Color(0x1E, 0x1F, 0x22);
    private static final Color TEXT = new Color(0xDF, 0xE1, 0xE5);
    private static final Color SOFT = new Color(0xA9, 0xAD, 0xB3);
    private static final Color GRID = new Color(0x45, 0x48, 0x4D);
    private static final Color BEFORE = new Color(0x7F, 0xAE, 0xEA);

    private DarkCharts() {
    }

    /**
     * Re-colours the chart in place.
     *
     * @param chart a chart styled by {@link ChartTheme}
     * @return the same chart
     */
    static JFreeChart darken(JFreeChart chart) {
        chart.setBackgroundPaint(BACKGROUND);
        if (chart.getTitle() != null) {
            chart.getTitle().setPaint(TEXT);
        }
        for (int i = 0; i < chart.getSubtitleCount(); i++) {
            title(chart.getSubtitle(i));
        }
        plot(chart.getPlot());
        return chart;
    }

    private static void title(Title t) {
        if (t instanceof LegendTitle legend) {
            legend.setBackgroundPaint(BACKGROUND);
            legend.setItemPaint(TEXT);
            legend.setFrame(BlockBorder.NONE);
        } else if (t instanceof TextTitle text) {
            text.setPaint(ChartTheme.MUTED.equals(text.getPaint()) ? SOFT : TEXT);
            text.setBackgroundPaint(null);
        }
    }

    private static void plot(Plot plot) {
        plot.setBackgroundPaint(PLOT);
        plot.setOutlinePaint(SOFT);
        if (plot instanceof CombinedDomainXYPlot combined) {
            axis(combined.getDomainAxis());
            for (Object sub : combined.getSubplots()) {
                plot((Plot) sub);
            }
        }
        if (plot instanceof XYPlot xy) {
            xy.setDomainGridlinePaint(GRID);
            xy.setRangeGridlinePaint(GRID);
            for (int i = 0; i < xy.getDomainAxisCount(); i++) {
                axis(xy.getDomainAxis(i));
            }
            for (int i = 0; i < xy.getRangeAxisCount(); i++) {
                axis(xy.getRangeAxis(i));
            }
            for (Layer layer : new Layer[] {Layer.FOREGROUND, Layer.BACKGROUND}) {
                markers(xy.getDomainMarkers(layer));
                markers(xy.getRangeMarkers(layer));
            }
            for (int i = 0; i < xy.getRendererCount(); i++) {
                renderer((AbstractRenderer) xy.getRenderer(i));
            }
        } else if (plot instanceof CategoryPlot cat) {
            cat.setRangeGridlinePaint(GRID);
            axis(cat.getDomainAxis());
            for (int i = 0; i < cat.getRangeAxisCount(); i++) {
                axis(cat.getRangeAxis(i));
            }
            for (Layer layer : new Layer[] {Layer.FOREGROUND, Layer.BACKGROUND}) {
                markers(cat.getRangeMarkers(layer));
            }
            for (int i = 0; i < cat.getRendererCount(); i++) {
                renderer((AbstractRenderer) cat.getRenderer(i));
            }
        }
        org.jfree.chart.LegendItemCollection fixed = plot instanceof XYPlot xy ? xy.getFixedLegendItems()
                : plot instanceof CategoryPlot cat ? cat.getFixedLegendItems() : null;
        if (fixed != null) {
            for (var it = fixed.iterator(); it.hasNext();) {
                var item = (org.jfree.chart.LegendItem) it.next();
                item.setLabelPaint(TEXT);
                if (ChartTheme.BEFORE.equals(item.getFillPaint())) {
                    item.setFillPaint(BEFORE);
                }
                if (ChartTheme.BEFORE.equals(item.getOutlinePaint())) {
                    item.setOutlinePaint(BEFORE);
                }
                if (ChartTheme.INK.equals(item.getOutlinePaint()) || ChartTheme.MUTED.equals(item.getOutlinePaint())) {
                    item.setOutlinePaint(TEXT);
                }
                if (ChartTheme.INK.equals(item.getLinePaint()) || ChartTheme.MUTED.equals(item.getLinePaint())) {
                    item.setLinePaint(TEXT);
                }
            }
        }
    }

    private static void axis(Axis a) {
        if (a == null) {
            return;
        }
        a.setLabelPaint(TEXT);
        a.setTickLabelPaint(TEXT);
        a.setAxisLinePaint(SOFT);
        a.setTickMarkPaint(SOFT);
    }

    private static void markers(java.util.Collection<?> markers) {
        if (markers == null) {
            return;
        }
        for (Object o : markers) {
            Marker m = (Marker) o;
            if (lightens(m.getPaint())) {
                m.setPaint(TEXT);
            }
            if (lightens(m.getLabelPaint())) {
                m.setLabelPaint(TEXT);
            }
            m.setLabelBackgroundColor(new Color(0x1E, 0x1F, 0x22, 200));
        }
    }

    private static void renderer(AbstractRenderer r) {
        if (r == null) {
            return;
        }
        for (int s = 0; s < 8; s++) {
            Paint p = r.getSeriesPaint(s);
            if (ChartTheme.BEFORE.equals(p)) {
                r.setSeriesPaint(s, BEFORE);
            } else if (lightens(p)) {
                r.setSeriesPaint(s, TEXT);
            }
            Paint o = r.getSeriesOutlinePaint(s);
            if (ChartTheme.BEFORE.equals(o)) {
                r.setSeriesOutlinePaint(s, BEFORE);
            } else if (lightens(o)) {
                r.setSeriesOutlinePaint(s, TEXT);
            }
        }
    }

    private static boolean lightens(Paint p) {
        return ChartTheme.INK.equals(p) || ChartTheme.MUTED.equals(p) || Color.BLACK.equals(p);
    }
}
