package org.holdpoint.chart;

import java.awt.BasicStroke;
import java.awt.Graphics2D;
import java.awt.Paint;
import java.awt.Stroke;
import java.awt.geom.Rectangle2D;
import org.jfree.chart.axis.CategoryAxis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.renderer.category.BoxAndWhiskerRenderer;
import org.jfree.chart.renderer.category.CategoryItemRendererState;
import org.jfree.data.category.CategoryDataset;
import org.jfree.data.statistics.BoxAndWhiskerCategoryDataset;

/**
 * Draws boxes, medians and whiskers, one colour per category (group), but no outlier markers: JFreeChart merges
 * nearby outliers into one averaged marker, so the outliers are drawn, each at its own value, by
 * {@link ValuesRenderer}. The plot's dataset keeps the true outliers; this renderer draws from a copy without them.
 */
final class OwnOutliersBoxRenderer extends BoxAndWhiskerRenderer {
    private static final long serialVersionUID = 1L;

    private final transient BoxAndWhiskerCategoryDataset withoutOutliers;
    private final transient ChartTheme theme;

    OwnOutliersBoxRenderer(BoxAndWhiskerCategoryDataset withoutOutliers, ChartTheme theme) {
        this.withoutOutliers = withoutOutliers;
        this.theme = theme;
        setMeanVisible(false);
        setFillBox(true);
        setUseOutlinePaintForWhiskers(true);
        setMaximumBarWidth(0.16);
        setWhiskerWidth(0.5);
        setArtifactPaint(ChartTheme.INK);
        setDefaultOutlineStroke(new BasicStroke(1.2f));
        setDefaultStroke(new BasicStroke(1.2f));
    }

    @Override
    public Paint getItemPaint(int row, int column) {
        return theme.groupFill(column);
    }

    @Override
    public Paint getItemOutlinePaint(int row, int column) {
        return theme.groupColour(column);
    }

    @Override
    public Stroke getItemOutlineStroke(int row, int column) {
        return new BasicStroke(1.2f);
    }

    @Override
    public void drawItem(Graphics2D g2, CategoryItemRendererState state, Rectangle2D dataArea, CategoryPlot plot,
            CategoryAxis domainAxis, ValueAxis rangeAxis, CategoryDataset dataset, int row, int column, int pass) {
        super.drawItem(g2, state, dataArea, plot, domainAxis, rangeAxis, withoutOutliers, row, column, pass);
    }
}
