package org.holdpoint.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.Shape;
import java.awt.geom.AffineTransform;
import java.awt.geom.Rectangle2D;
import java.util.List;
import java.util.SplittableRandom;
import org.holdpoint.stats.BoxStatistics;
import org.jfree.chart.axis.CategoryAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.renderer.category.AbstractCategoryItemRenderer;
import org.jfree.chart.renderer.category.CategoryItemRendererState;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.category.CategoryDataset;
import org.jfree.data.statistics.MultiValueCategoryDataset;

/**
 * Draws every value of each category at its true value, in the group's colour and shape, spread sideways by a
 * seeded (hence reproducible) jitter, so that values are not hidden under the median and whisker lines and ties
 * stay visible; values beyond the whiskers get a ring, each one separately.
 */
final class ValuesRenderer extends AbstractCategoryItemRenderer {
    private static final long serialVersionUID = 1L;
    /** Point width in points. */
    static final double POINT_SIZE = 4.2;
    private static final double JITTER_HALF_WIDTH = 0.16;

    private final transient BoxStatistics[] stats;
    private final transient ChartTheme theme;

    ValuesRenderer(BoxStatistics[] stats, ChartTheme theme) {
        this.stats = stats.clone();
        this.theme = theme;
    }

    @Override
    public void drawItem(Graphics2D g2, CategoryItemRendererState state, Rectangle2D dataArea, CategoryPlot plot,
            CategoryAxis domainAxis, ValueAxis rangeAxis, CategoryDataset dataset, int row, int column, int pass) {
        List<?> values = ((MultiValueCategoryDataset) dataset).getValues(row, column);
        RectangleEdge xEdge = plot.getDomainAxisEdge();
        RectangleEdge yEdge = plot.getRangeAxisEdge();
        int count = dataset.getColumnCount();
        double middle = domainAxis.getCategoryMiddle(column, count, dataArea, xEdge);
        double width = domainAxis.getCategoryEnd(column, count, dataArea, xEdge)
                - domainAxis.getCategoryStart(column, count, dataArea, xEdge);
        SplittableRandom rnd = new SplittableRandom(theme.jitterSeed() + 0x9E3779B97F4A7C15L * (column + 1));
        Color colour = theme.groupColour(column);
        Color fill = new Color(colour.getRed(), colour.getGreen(), colour.getBlue(), values.size() > 200 ? 90 : 150);
        Shape shape = theme.groupShape(column, POINT_SIZE);
        Shape ring = ChartTheme.circle(POINT_SIZE + 5);
        g2.setStroke(new BasicStroke(1.1f));
        for (Object number : values) {
            double v = ((Number) number).doubleValue();
            double offset = (rnd.nextDouble() * 2 - 1) * JITTER_HALF_WIDTH * width;
            double y = rangeAxis.valueToJava2D(v, dataArea, yEdge);
            AffineTransform at = AffineTransform.getTranslateInstance(middle + offset, y);
            g2.setPaint(fill);
            g2.fill(at.createTransformedShape(shape));
            if (stats[column].isOutlier(v)) {
                g2.setPaint(ChartTheme.INK);
                g2.draw(at.createTransformedShape(ring));
            }
        }
    }
}
