package org.holdpoint.chart;

import java.nio.file.Path;
import org.jfree.chart.JFreeChart;

/**
 * A chart ready to render, with its file name, kind, characteristic and size in points.
 *
 * @param fileName       a safe file name ending in ".png"
 * @param kind           the kind of chart
 * @param characteristic the characteristic's name, or null for study-wide charts
 * @param chart          the chart
 * @param width          width in points
 * @param height         height in points
 */
public record NamedChart(String fileName, ChartKind kind, String characteristic, JFreeChart chart, double width,
        double height) {

    /** Validates the record. */
    public NamedChart {
        if (fileName == null || !fileName.endsWith(".png") || fileName.contains("/") || fileName.contains("\\")) {
            throw new ChartException("a chart file name must be a plain name ending in .png, got %s", fileName);
        }
        if (kind == null || chart == null) {
            throw new ChartException("a named chart needs a kind and a chart");
        }
        if (!(width > 0 && height > 0)) {
            throw new ChartException("a chart needs a positive size, got %s x %s pt", width, height);
        }
    }

    /**
     * @param scale pixels per point
     * @return the PNG bytes
     */
    public byte[] png(double scale) {
        return ChartExport.png(chart, width, height, scale);
    }

    /**
     * Renders the chart into a directory, atomically.
     *
     * @param directory the target directory (created when missing)
     * @param scale     pixels per point
     * @return the written file
     */
    public Path writeTo(Path directory, double scale) {
        return ChartExport.writeAtomically(png(scale), directory.resolve(fileName));
    }
}
