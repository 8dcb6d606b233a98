package org.holdpoint.ui.swing;

import java.awt.Dimension;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.event.ComponentAdapter;
import java.awt.event.ComponentEvent;
import java.awt.image.BufferedImage;
import java.util.concurrent.ExecutorService;
import java.util.function.Supplier;
import javax.swing.JComponent;
import javax.swing.SwingUtilities;
import javax.swing.Timer;
import org.holdpoint.chart.ChartExport;
import org.jfree.chart.JFreeChart;

/**
 * Shows a chart that is drawn off the event thread: the chart is built and rendered to an image on a
 * single background thread (a chart of a million values takes seconds to draw), and the event thread
 * only paints the finished image. The image is drawn again, in the background, after the view is resized.
 */
final class ChartView extends JComponent {
    private static final long serialVersionUID = 1L;
    private final transient ExecutorService renderer;
    private transient JFreeChart chart;
    private transient BufferedImage image;
    private String message = " ";
    private int generation;
    private final Timer resized = new Timer(250, e -> render());

    /**
     * @param renderer the single thread that builds and draws charts (shared by the views of one panel)
     */
    ChartView(ExecutorService renderer) {
        this.renderer = renderer;
        resized.setRepeats(false);
        setPreferredSize(new Dimension(480, 360));
        addComponentListener(new ComponentAdapter() {
            @Override
            public void componentResized(ComponentEvent e) {
                resized.restart();
            }
        });
    }

    /**
     * Builds a chart in the background and shows it (event thread).
     *
     * @param build builds the chart; runs on the render thread
     */
    void show(Supplier<JFreeChart> build) {
        int gen = ++generation;
        boolean dark = Themes.isDark();
        chart = null;
        image = null;
        message = "Drawing the chart…";
        repaint();
        renderer.submit(() -> {
            try {
                JFreeChart c = dark ? DarkCharts.darken(build.get()) : build.get();
                SwingUtilities.invokeLater(() -> {
                    if (gen == generation) {
                        chart = c;
                        render();
                    }
                });
            } catch (RuntimeException e) {
                SwingUtilities.invokeLater(() -> fail(gen, e));
            }
        });
    }

    /** Shows nothing (event thread). */
    void clear(String text) {
        generation++;
        chart = null;
        image = null;
        message = text;
        repaint();
    }

    /** @return whether a finished image is shown (tests) */
    boolean drawn() {
        return image != null;
    }

    private void fail(int gen, RuntimeException e) {
        if (gen == generation) {
            message = "The chart could not be drawn: " + e.getMessage();
            repaint();
        }
    }

    /** Renders the current chart at the current size in the background (event thread). */
    private void render() {
        JFreeChart c = chart;
        int w = getWidth();
        int h = getHeight();
        if (c == null || w < 50 || h < 50) {
            return;
        }
        int gen = generation;
        double scale = getGraphicsConfiguration() == null ? 1
                : getGraphicsConfiguration().getDefaultTransform().getScaleX();
        renderer.submit(() -> {
            try {
                BufferedImage img = ChartExport.image(c, w, h, scale);
                SwingUtilities.invokeLater(() -> {
                    if (gen == generation) {
                        image = img;
                        repaint();
                    }
                });
            } catch (RuntimeException e) {
                SwingUtilities.invokeLater(() -> fail(gen, e));
            }
        });
    }

    @Override
    protected void paintComponent(Graphics g) {
        Graphics2D g2 = (Graphics2D) g.create();
        try {
            if (image != null) {
                g2.setRenderingHint(RenderingHints.KEY_INTERPOLATION, RenderingHints.VALUE_INTERPOLATION_BILINEAR);
                g2.drawImage(image, 0, 0, getWidth(), getHeight(), null);
                return;
            }
            g2.setColor(getForeground());
            g2.setFont(getFont());
            java.awt.FontMetrics fm = g2.getFontMetrics();
            g2.drawString(message, Math.max(8, (getWidth() - fm.stringWidth(message)) / 2), getHeight() / 2);
        } finally {
            g2.dispose();
        }
    }
}
