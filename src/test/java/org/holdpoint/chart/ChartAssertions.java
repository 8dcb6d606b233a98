package org.holdpoint.chart;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.Color;
import java.awt.image.BufferedImage;
import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import javax.imageio.ImageIO;

/** Checks on rendered images shared by the chart tests. */
final class ChartAssertions {
    private ChartAssertions() {
    }

    /** Decodes PNG bytes, failing the test when they are not a PNG. */
    static BufferedImage decode(byte[] png) {
        try {
            BufferedImage img = ImageIO.read(new ByteArrayInputStream(png));
            assertThat(img).as("PNG decodes").isNotNull();
            return img;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Asserts the size in pixels and that the picture is not blank (luminance variance well above zero). */
    static void assertRendered(BufferedImage img, double widthPt, double heightPt, double scale) {
        assertThat(img.getWidth()).isEqualTo((int) Math.round(widthPt * scale));
        assertThat(img.getHeight()).isEqualTo((int) Math.round(heightPt * scale));
        double sum = 0;
        double sumSq = 0;
        int count = 0;
        for (int y = 0; y < img.getHeight(); y += 2) {
            for (int x = 0; x < img.getWidth(); x += 2) {
                int rgb = img.getRGB(x, y);
                double lum = 0.299 * ((rgb >> 16) & 0xFF) + 0.587 * ((rgb >> 8) & 0xFF) + 0.114 * (rgb & 0xFF);
                sum += lum;
                sumSq += lum * lum;
                count++;
            }
        }
        double mean = sum / count;
        double variance = sumSq / count - mean * mean;
        // a white page with a few lines of text already exceeds 100; an empty or single-colour image gives 0
        assertThat(variance).as("luminance variance").isGreaterThan(100);
    }

    /** The number of pixels within a small distance of a colour. */
    static int pixelsNear(BufferedImage img, Color c, int tolerance) {
        int n = 0;
        for (int y = 0; y < img.getHeight(); y++) {
            for (int x = 0; x < img.getWidth(); x++) {
                int rgb = img.getRGB(x, y);
                if (Math.abs(((rgb >> 16) & 0xFF) - c.getRed()) <= tolerance
                        && Math.abs(((rgb >> 8) & 0xFF) - c.getGreen()) <= tolerance
                        && Math.abs((rgb & 0xFF) - c.getBlue()) <= tolerance) {
                    n++;
                }
            }
        }
        return n;
    }
}
