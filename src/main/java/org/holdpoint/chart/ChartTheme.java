package org.holdpoint.chart;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.GraphicsEnvironment;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.Stroke;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;
import java.util.Arrays;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.Axis;
import org.jfree.chart.axis.ValueAxis;
import org.jfree.chart.block.BlockBorder;
import org.jfree.chart.plot.Plot;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.chart.title.LegendTitle;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.title.Title;
import org.jfree.chart.ui.RectangleInsets;

/**
 * Colours, shapes, line styles, fonts and page sizes of every Holdpoint chart, immutable.
 *
 * <p>The two groups are a dark blue (before) and an orange (after): far apart in lightness, so they stay apart in
 * greyscale print, and on the blue–orange axis that the common colour-vision deficiencies keep. Colour never
 * carries meaning alone: the groups also differ in point shape (circle, triangle) and line dash (solid, dashed), and
 * every conclusion is written in words and drawn with its own shape. Sizes are in points (1/72 inch) so that a chart
 * of the default width fills the 170 mm text width of an A4 page; {@link ChartExport} renders them at
 * {@link #scale()} pixels per point.
 */
public final class ChartTheme {
    /** Dark blue of the before group (luminance about 8 %). */
    public static final Color BEFORE = new Color(0x1B, 0x4F, 0x91);
    /** Orange of the after group (luminance about 35 %). */
    public static final Color AFTER = new Color(0xD9, 0x6F, 0x00);
    /** Light tint of {@link #BEFORE} for filled areas. */
    public static final Color BEFORE_FILL = new Color(0xC8, 0xD8, 0xEE);
    /** Light tint of {@link #AFTER} for filled areas. */
    public static final Color AFTER_FILL = new Color(0xFB, 0xDB, 0xB4);
    /** Text, axes and limit lines. */
    public static final Color INK = new Color(0x22, 0x22, 0x22);
    /** Secondary text and the inconclusive conclusion. */
    public static final Color MUTED = new Color(0x5A, 0x5A, 0x5A);
    /** Grid lines. */
    public static final Color GRID = new Color(0xDD, 0xDD, 0xDD);
    /** The margin band of the equivalence picture. */
    public static final Color BAND = new Color(0xD6, 0xE6, 0xD6);
    /** The "not equivalent" conclusion: a dark vermilion, darker than {@link #AFTER}. */
    public static final Color FAIL = new Color(0xA8, 0x3A, 0x00);

    private static final ChartTheme DEFAULTS = new ChartTheme(defaultFamily(), 482, 2.5, 20261201L);

    private final String fontFamily;
    private final double width;
    private final double scale;
    private final long jitterSeed;

    private ChartTheme(String fontFamily, double width, double scale, long jitterSeed) {
        this.fontFamily = fontFamily;
        this.width = width;
        this.scale = scale;
        this.jitterSeed = jitterSeed;
    }

    /**
     * The defaults: DejaVu Sans when installed, else the logical "SansSerif" font; width 482 pt (170 mm, the text
     * width of an A4 page with 20 mm margins); 2.5 pixels per point (180 dpi); jitter seed 20261201.
     *
     * @return the default theme
     */
    public static ChartTheme withDefaults() {
        return DEFAULTS;
    }

    /**
     * @param family a font family name; the logical "SansSerif" is used when it is not installed
     * @return a theme with that font family
     */
    public ChartTheme withFontFamily(String family) {
        boolean installed = Arrays.asList(GraphicsEnvironment.getLocalGraphicsEnvironment()
                .getAvailableFontFamilyNames()).contains(family);
        return new ChartTheme(installed ? family : Font.SANS_SERIF, width, scale, jitterSeed);
    }

    /**
     * @param newWidth chart width in points, 200..1200
     * @return a theme with that width
     */
    public ChartTheme withWidth(double newWidth) {
        if (!(newWidth >= 200 && newWidth <= 1200)) {
            throw new ChartException("chart width must lie in 200..1200 pt, got %s", newWidth);
        }
        return new ChartTheme(fontFamily, newWidth, scale, jitterSeed);
    }

    /**
     * @param pixelsPerPoint the export resolution, 1..6 (72·scale dpi)
     * @return a theme with that resolution
     */
    public ChartTheme withScale(double pixelsPerPoint) {
        if (!(pixelsPerPoint >= 1 && pixelsPerPoint <= 6)) {
            throw new ChartException("scale must lie in 1..6 pixels per point, got %s", pixelsPerPoint);
        }
        return new ChartTheme(fontFamily, width, pixelsPerPoint, jitterSeed);
    }

    /**
     * @param seed the seed of the deterministic horizontal jitter of individual values
     * @return a theme with that seed
     */
    public ChartTheme withJitterSeed(long seed) {
        return new ChartTheme(fontFamily, width, scale, seed);
    }

    private static String defaultFamily() {
        try {
            String[] names = GraphicsEnvironment.getLocalGraphicsEnvironment().getAvailableFontFamilyNames();
            return Arrays.asList(names).contains("DejaVu Sans") ? "DejaVu Sans" : Font.SANS_SERIF;
        } catch (RuntimeException | Error e) {
            // no font configuration at all: the logical font still renders
            return Font.SANS_SERIF;
        }
    }

    /** @return the font family in use */
    public String fontFamily() {
        return fontFamily;
    }

    /** @return the chart width in points */
    public double width() {
        return width;
    }

    /** @return pixels per point when exporting */
    public double scale() {
        return scale;
    }

    /** @return the jitter seed */
    public long jitterSeed() {
        return jitterSeed;
    }

    /** @return the height of a box plot, histogram, probability plot or power curve in points (0.62 × width) */
    public double standardHeight() {
        return Math.round(width * 0.62);
    }

    /**
     * The height of an equivalence picture: 14 pt per row plus 150 pt of titles, axis and legend.
     *
     * @param rows the number of rows
     * @return the height in points
     */
    public double equivalenceHeight(int rows) {
        return 150 + 14.0 * Math.max(rows, 1);
    }

    /** @return 12 pt bold, for chart titles */
    public Font titleFont() {
        return new Font(fontFamily, Font.BOLD, 12);
    }

    /** @return 9 pt, for subtitles and axis labels */
    public Font labelFont() {
        return new Font(fontFamily, Font.PLAIN, 9);
    }

    /** @return 8 pt, for tick labels, legends and marker labels */
    public Font tickFont() {
        return new Font(fontFamily, Font.PLAIN, 8);
    }

    /** @return 7 pt, for the method note at the foot of a chart */
    public Font noteFont() {
        return new Font(fontFamily, Font.PLAIN, 7);
    }

    /**
     * @param group 0 for before, 1 for after
     * @return the group's line and point colour
     */
    public Color groupColour(int group) {
        return group == 0 ? BEFORE : AFTER;
    }

    /**
     * @param group 0 for before, 1 for after
     * @return the group's fill colour
     */
    public Color groupFill(int group) {
        return group == 0 ? BEFORE_FILL : AFTER_FILL;
    }

    /**
     * @param group 0 for before, 1 for after
     * @param size  the shape's width in points
     * @return a circle for before, an upward triangle for after, centred on (0, 0)
     */
    public Shape groupShape(int group, double size) {
        return group == 0 ? circle(size) : triangle(size);
    }

    /**
     * @param group 0 for before, 1 for after
     * @return a solid 1.2 pt line for before, a dashed one for after
     */
    public Stroke groupStroke(int group) {
        return group == 0 ? new BasicStroke(1.2f)
                : new BasicStroke(1.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {5f, 3f}, 0f);
    }

    /** @return the dashed line of a specification limit */
    public Stroke limitStroke() {
        return new BasicStroke(1.0f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 10f, new float[] {6f, 3f}, 0f);
    }

    /** @return the dotted line of a nominal value or target */
    public Stroke nominalStroke() {
        return new BasicStroke(1.0f, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND, 10f, new float[] {1f, 3f}, 0f);
    }

    /**
     * @param size width in points
     * @return a circle centred on (0, 0)
     */
    static Shape circle(double size) {
        return new Ellipse2D.Double(-size / 2, -size / 2, size, size);
    }

    /**
     * @param size width in points
     * @return an upward triangle centred on (0, 0)
     */
    static Shape triangle(double size) {
        double h = size * 0.866;
        Path2D.Double p = new Path2D.Double();
        p.moveTo(0, -h * 2 / 3);
        p.lineTo(size / 2, h / 3);
        p.lineTo(-size / 2, h / 3);
        p.closePath();
        return p;
    }

    /**
     * @param size width in points
     * @return a diamond centred on (0, 0)
     */
    static Shape diamond(double size) {
        double r = size / 2;
        Path2D.Double p = new Path2D.Double();
        p.moveTo(0, -r);
        p.lineTo(r, 0);
        p.lineTo(0, r);
        p.lineTo(-r, 0);
        p.closePath();
        return p;
    }

    /**
     * @param size width in points
     * @return a diagonal cross (an "x") of bar width size/4, centred on (0, 0)
     */
    static Shape cross(double size) {
        double r = size / 2;
        double t = size / 8;
        Path2D.Double p = new Path2D.Double();
        double[][] pts = {{-r, -r + t}, {-r + t, -r}, {0, -t}, {r - t, -r}, {r, -r + t}, {t, 0}, {r, r - t},
            {r - t, r}, {0, t}, {-r + t, r}, {-r, r - t}, {-t, 0}};
        p.moveTo(pts[0][0], pts[0][1]);
        for (int i = 1; i < pts.length; i++) {
            p.lineTo(pts[i][0], pts[i][1]);
        }
        p.closePath();
        return p;
    }

    /**
     * Applies the fonts, white background, anti-aliasing and frame of this theme to a chart and its plot.
     *
     * @param chart the chart to style
     */
    public void apply(JFreeChart chart) {
        chart.setAntiAlias(true);
        chart.setTextAntiAlias(RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        chart.getRenderingHints().put(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
        chart.getRenderingHints().put(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
        chart.setBackgroundPaint(Color.WHITE);
        chart.setPadding(new RectangleInsets(6, 6, 6, 10));
        if (chart.getTitle() != null) {
            chart.getTitle().setFont(titleFont());
            chart.getTitle().setPaint(INK);
        }
        for (int i = 0; i < chart.getSubtitleCount(); i++) {
            styleSubtitle(chart.getSubtitle(i));
        }
        stylePlot(chart.getPlot());
    }

    private void styleSubtitle(Title t) {
        if (t instanceof LegendTitle legend) {
            legend.setItemFont(tickFont());
            legend.setItemPaint(INK);
            legend.setFrame(BlockBorder.NONE);
            legend.setBackgroundPaint(Color.WHITE);
        } else if (t instanceof TextTitle text && text.getFont().getSize() > 7) {
            text.setFont(labelFont());
            text.setPaint(MUTED);
        }
    }

    void stylePlot(Plot plot) {
        plot.setBackgroundPaint(Color.WHITE);
        plot.setOutlinePaint(MUTED);
        plot.setOutlineStroke(new BasicStroke(0.6f));
        if (plot instanceof XYPlot xy) {
            xy.setDomainGridlinePaint(GRID);
            xy.setRangeGridlinePaint(GRID);
            xy.setDomainGridlineStroke(new BasicStroke(0.5f));
            xy.setRangeGridlineStroke(new BasicStroke(0.5f));
            for (int i = 0; i < xy.getDomainAxisCount(); i++) {
                styleAxis(xy.getDomainAxis(i));
            }
            for (int i = 0; i < xy.getRangeAxisCount(); i++) {
                styleAxis(xy.getRangeAxis(i));
            }
        } else if (plot instanceof CategoryPlot cat) {
            cat.setRangeGridlinePaint(GRID);
            cat.setRangeGridlineStroke(new BasicStroke(0.5f));
            styleAxis(cat.getDomainAxis());
            for (int i = 0; i < cat.getRangeAxisCount(); i++) {
                styleAxis(cat.getRangeAxis(i));
            }
        }
    }

    void styleAxis(Axis axis) {
        if (axis == null) {
            return;
        }
        axis.setLabelFont(labelFont());
        axis.setLabelPaint(INK);
        axis.setTickLabelFont(tickFont());
        axis.setTickLabelPaint(INK);
        axis.setAxisLinePaint(MUTED);
        axis.setTickMarkPaint(MUTED);
        if (axis instanceof ValueAxis v) {
            v.setTickMarkOutsideLength(3f);
        }
    }

    /**
     * A small note for the foot of a chart (method, scaling), wrapped to the chart width.
     *
     * @param text the note
     * @return the title to add with {@code chart.addSubtitle}
     */
    public TextTitle note(String text) {
        TextTitle t = new TextTitle(text, noteFont());
        t.setPaint(MUTED);
        t.setPosition(org.jfree.chart.ui.RectangleEdge.BOTTOM);
        t.setHorizontalAlignment(org.jfree.chart.ui.HorizontalAlignment.LEFT);
        t.setTextAlignment(org.jfree.chart.ui.HorizontalAlignment.LEFT);
        t.setPadding(new RectangleInsets(4, 2, 0, 2));
        return t;
    }

    /**
     * A subtitle under the chart title.
     *
     * @param text the subtitle
     * @return the title to add with {@code chart.addSubtitle}
     */
    public TextTitle subtitle(String text) {
        TextTitle t = new TextTitle(text, labelFont());
        t.setPaint(MUTED);
        t.setPadding(new RectangleInsets(1, 2, 4, 2));
        return t;
    }
}
