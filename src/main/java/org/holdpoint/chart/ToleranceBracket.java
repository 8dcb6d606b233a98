package org.holdpoint.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.geom.Line2D;
import java.awt.geom.Rectangle2D;
import org.jfree.chart.annotations.AbstractAnnotation;
import org.jfree.chart.annotations.CategoryAnnotation;
import org.jfree.chart.axis.CategoryAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.ui.RectangleEdge;

/**
 * A group's tolerance interval drawn as a bracket beside its box (docs/methods.md §17): a vertical line with end
 * ticks at the interval's ends, near the right edge of the group's column; an end that does not exist (a one-sided
 * interval) runs to the edge of the plot without a tick. The label names coverage and confidence.
 */
final class ToleranceBracket extends AbstractAnnotation implements CategoryAnnotation {
    private static final long serialVersionUID = 1L;
    private final Comparable<?> category;
    private final Double lower;
    private final Double upper;
    private final String label;
    private final Font font;

    ToleranceBracket(Comparable<?> category, Double lower, Double upper, String label, Font font) {
        this.category = category;
        this.lower = lower;
        this.upper = upper;
        this.label = label;
        this.font = font;
    }

    @Override
    public void draw(Graphics2D g2, CategoryPlot plot, Rectangle2D dataArea, CategoryAxis domainAxis,
            ValueAxis rangeAxis) {
        int index = plot.getCategories().indexOf(category);
        if (index < 0) {
            return;
        }
        int count = plot.getCategories().size();
        RectangleEdge domainEdge = plot.getDomainAxisEdge();
        RectangleEdge rangeEdge = plot.getRangeAxisEdge();
        double end = domainAxis.getCategoryEnd(index, count, dataArea, domainEdge);
        double middle = domainAxis.getCategoryMiddle(index, count, dataArea, domainEdge);
        double x = end - 0.18 * (end - middle);
        double yLow = lower == null ? dataArea.getMaxY() : rangeAxis.valueToJava2D(lower, dataArea, rangeEdge);
        double yHigh = upper == null ? dataArea.getMinY() : rangeAxis.valueToJava2D(upper, dataArea, rangeEdge);
        g2.setPaint(ChartTheme.INK);
        g2.setStroke(new BasicStroke(1.6f));
        g2.draw(new Line2D.Double(x, yLow, x, yHigh));
        if (lower != null) {
            g2.draw(new Line2D.Double(x - 5, yLow, x + 5, yLow));
        }
        if (upper != null) {
            g2.draw(new Line2D.Double(x - 5, yHigh, x + 5, yHigh));
        }
        g2.setFont(font);
        g2.setPaint(new Color(ChartTheme.INK.getRed(), ChartTheme.INK.getGreen(), ChartTheme.INK.getBlue()));
        float w = (float) g2.getFontMetrics().stringWidth(label);
        float ty = (float) Math.max(dataArea.getMinY() + g2.getFontMetrics().getAscent(), Math.min(yLow, yHigh) - 4);
        g2.drawString(label, (float) Math.min(x - w / 2, dataArea.getMaxX() - w - 2), ty);
    }
}
