package org.holdpoint.report;

import java.util.Arrays;

/**
 * A chart already rendered to PNG, with the caption shown above it in the workbook. The report never
 * draws charts itself; the caller (the chart package, through the workflow) hands them over as bytes.
 *
 * @param name  the caption, e.g. "Box plot, before and after"
 * @param png   the PNG file's bytes
 * @param width  the image width in pixels, read from the PNG header
 * @param height the image height in pixels, read from the PNG header
 */
public record NamedImage(String name, byte[] png, int width, int height) {
    private static final byte[] SIGNATURE = {(byte) 0x89, 'P', 'N', 'G', '\r', '\n', 0x1a, '\n'};

    /** Validates that the bytes are a PNG and that the stated size matches its IHDR chunk. */
    public NamedImage {
        if (name == null) {
            throw new ReportException("a chart needs a caption");
        }
        if (png == null || png.length < 24 || !Arrays.equals(Arrays.copyOf(png, 8), SIGNATURE)) {
            throw new ReportException("the chart \"%s\" is not a PNG image", name);
        }
        png = png.clone();
        if (width != readInt(png, 16) || height != readInt(png, 20) || width <= 0 || height <= 0) {
            throw new ReportException("the chart \"%s\" has a damaged PNG header", name);
        }
    }

    /**
     * A chart from PNG bytes; the pixel size is read from the PNG's IHDR chunk (bytes 16–23, big-endian).
     *
     * @param name the caption
     * @param png  the PNG bytes
     * @return the image
     * @throws ReportException when the bytes are not a PNG
     */
    public static NamedImage of(String name, byte[] png) {
        if (png == null || png.length < 24) {
            throw new ReportException("the chart \"%s\" is not a PNG image", name);
        }
        return new NamedImage(name, png, readInt(png, 16), readInt(png, 20));
    }

    @Override
    public byte[] png() {
        return png.clone();
    }

    private static int readInt(byte[] b, int at) {
        return ((b[at] & 0xff) << 24) | ((b[at + 1] & 0xff) << 16) | ((b[at + 2] & 0xff) << 8) | (b[at + 3] & 0xff);
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof NamedImage n && n.name.equals(name) && Arrays.equals(n.png, png);
    }

    @Override
    public int hashCode() {
        return name.hashCode() * 31 + Arrays.hashCode(png);
    }

    @Override
    public String toString() {
        return "NamedImage[" + name + ", " + width + "x" + height + "]";
    }
}
