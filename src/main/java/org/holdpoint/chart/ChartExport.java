package org.holdpoint.chart;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.file.Path;
import java.util.Iterator;
import javax.imageio.IIOImage;
import javax.imageio.ImageIO;
import javax.imageio.ImageTypeSpecifier;
import javax.imageio.ImageWriter;
import javax.imageio.metadata.IIOInvalidTreeException;
import javax.imageio.metadata.IIOMetadata;
import javax.imageio.metadata.IIOMetadataNode;
import javax.imageio.stream.ImageOutputStream;
import org.jfree.chart.JFreeChart;

/**
 * PNG export of a chart: drawn at its size in points, scaled to pixels, anti-aliased, with the physical resolution
 * stored in the PNG (pHYs chunk) so that a workbook or document places it at its intended size. SVG is not offered
 * (it would need a further library).
 */
public final class ChartExport {
    private static final double METRES_PER_INCH = 0.0254;

    private ChartExport() {
    }

    /**
     * Renders a chart to an image.
     *
     * @param chart  the chart
     * @param width  width in points
     * @param height height in points
     * @param scale  pixels per point (the image is 72·scale dpi)
     * @return an RGB image of round(width·scale) × round(height·scale) pixels
     */
    public static BufferedImage image(JFreeChart chart, double width, double height, double scale) {
        if (!(width > 0 && height > 0 && scale > 0)) {
            throw new ChartException("a chart needs a positive size and scale, got %s x %s pt at %s", width, height,
                    scale);
        }
        int w = (int) Math.round(width * scale);
        int h = (int) Math.round(height * scale);
        BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
        Graphics2D g2 = img.createGraphics();
        try {
            g2.setColor(Color.WHITE);
            g2.fillRect(0, 0, w, h);
            g2.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g2.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g2.setRenderingHint(RenderingHints.KEY_FRACTIONALMETRICS, RenderingHints.VALUE_FRACTIONALMETRICS_ON);
            g2.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            g2.setRenderingHint(RenderingHints.KEY_RENDERING, RenderingHints.VALUE_RENDER_QUALITY);
            g2.scale(scale, scale);
            chart.draw(g2, new Rectangle2D.Double(0, 0, width, height));
        } finally {
            g2.dispose();
        }
        return img;
    }

    /**
     * Renders a chart to PNG bytes.
     *
     * @param chart  the chart
     * @param width  width in points
     * @param height height in points
     * @param scale  pixels per point
     * @return the PNG file's bytes
     */
    public static byte[] png(JFreeChart chart, double width, double height, double scale) {
        BufferedImage img = image(chart, width, height, scale);
        ByteArrayOutputStream out = new ByteArrayOutputStream(64 * 1024);
        try {
            writePng(img, 72 * scale, out);
        } catch (IOException e) {
            throw new ChartException(e, "could not encode the chart as PNG: %s", e.getMessage());
        }
        return out.toByteArray();
    }

    /**
     * Renders a chart and writes it atomically (a temporary file in the same directory, then a move).
     *
     * @param chart  the chart
     * @param width  width in points
     * @param height height in points
     * @param scale  pixels per point
     * @param target the PNG file to create or replace
     * @return the target
     * @throws ChartException if the file cannot be written; no partial file is left behind
     */
    public static Path writePng(JFreeChart chart, double width, double height, double scale, Path target) {
        return writeAtomically(png(chart, width, height, scale), target);
    }

    /**
     * Writes bytes to a file atomically: a temporary file in the target's directory, then a move over the target.
     *
     * @param bytes  the content
     * @param target the file to create or replace
     * @return the target
     * @throws ChartException if the file cannot be written; no partial file is left behind
     */
    public static Path writeAtomically(byte[] bytes, Path target) {
        try {
            org.holdpoint.files.AtomicFiles.writeBytes(target, bytes);
            return target;
        } catch (IOException e) {
            throw new ChartException(e, "could not write the chart file %s: %s; check that the folder exists and "
                    + "is writable", target, e.getMessage());
        }
    }

    private static void writePng(BufferedImage img, double dpi, ByteArrayOutputStream out) throws IOException {
        Iterator<ImageWriter> writers = ImageIO.getImageWritersByFormatName("png");
        if (!writers.hasNext()) {
            throw new IOException("no PNG encoder available");
        }
        ImageWriter writer = writers.next();
        try (ImageOutputStream ios = ImageIO.createImageOutputStream(out)) {
            writer.setOutput(ios);
            IIOMetadata meta = writer.getDefaultImageMetadata(ImageTypeSpecifier.createFromRenderedImage(img),
                    writer.getDefaultWriteParam());
            setResolution(meta, dpi);
            writer.write(null, new IIOImage(img, null, meta), writer.getDefaultWriteParam());
        } finally {
            writer.dispose();
        }
    }

    private static void setResolution(IIOMetadata meta, double dpi) throws IIOInvalidTreeException {
        String pixelsPerMetre = Long.toString(Math.round(dpi / METRES_PER_INCH));
        IIOMetadataNode phys = new IIOMetadataNode("pHYs");
        phys.setAttribute("pixelsPerUnitXAxis", pixelsPerMetre);
        phys.setAttribute("pixelsPerUnitYAxis", pixelsPerMetre);
        phys.setAttribute("unitSpecifier", "meter");
        IIOMetadataNode root = new IIOMetadataNode("javax_imageio_png_1.0");
        root.appendChild(phys);
        meta.mergeTree("javax_imageio_png_1.0", root);
    }
}
