package org.holdpoint.ui.swing;

import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Component;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Path2D;
import java.awt.geom.RoundRectangle2D;
import javax.swing.Icon;
import org.holdpoint.ui.model.VerdictLook;

/**
 * The mark of a verdict, drawn by code at any size (sharp on high-DPI screens): a filled hexagon with an
 * equals sign (passed), a filled diamond with an unequal sign (failed), an open hexagon with three dots
 * (inconclusive), an open bar with a dash (not assessed) or an open square with a slash (not assessable).
 * Outline and sign alone tell the verdicts apart; colour only helps, and the words are always shown first.
 */
public final class VerdictIcon implements Icon {
    private static final Color PASS = new Color(0x0B, 0x6E, 0x69);
    private static final Color FAIL = new Color(0x9A, 0x1F, 0x4B);
    private static final Color UNSURE = new Color(0x4E, 0x45, 0x96);
    private static final Color NONE = new Color(0x6B, 0x6B, 0x6B);
    private static final Color PASS_DARK = new Color(0x5F, 0xC8, 0xBE);
    private static final Color FAIL_DARK = new Color(0xF2, 0x8A, 0xB0);
    private static final Color UNSURE_DARK = new Color(0xB5, 0xAC, 0xF0);
    private static final Color NONE_DARK = new Color(0xB8, 0xB8, 0xB8);
    private final VerdictLook look;
    private final int size;

    /**
     * @param look the verdict's look
     * @param size height in (unscaled) pixels; the width is a little larger for the bar
     */
    public VerdictIcon(VerdictLook look, int size) {
        this.look = look;
        this.size = size;
    }

    /** @return the colour that accompanies the mark, readable on the current theme's background */
    public Color color() {
        boolean dark = Themes.isDark();
        return switch (look) {
            case PASSED -> dark ? PASS_DARK : PASS;
            case FAILED -> dark ? FAIL_DARK : FAIL;
            case INCONCLUSIVE -> dark ? UNSURE_DARK : UNSURE;
            case NOT_ASSESSED, NOT_ASSESSABLE -> dark ? NONE_DARK : NONE;
        };
    }

    private static Path2D hexagon(double s, double inset) {
        Path2D p = new Path2D.Double();
        double cx = s / 2;
        double cy = s / 2;
        double r = s / 2 - inset;
        for (int i = 0; i < 6; i++) {
            double a = Math.PI / 6 + i * Math.PI / 3;
            double x = cx + r * Math.cos(a);
            double y = cy + r * Math.sin(a);
            if (i == 0) {
                p.moveTo(x, y);
            } else {
                p.lineTo(x, y);
            }
        }
        p.closePath();
        return p;
    }

    @Override
    public void paintIcon(Component c, Graphics g, int x, int y) {
        Graphics2D g2 = (Graphics2D) g.create();
        try {
            g2.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g2.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            g2.translate(x, y);
            double s = size;
            Color ink = color();
            Color paper = Themes.isDark() ? new Color(0x1E, 0x1F, 0x22) : Color.WHITE;
            g2.setColor(ink);
            float w = (float) Math.max(1.5, s / 9);
            BasicStroke line = new BasicStroke(w, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND);
            switch (look.shape()) {
                case HEXAGON_EQUALS -> {
                    g2.fill(hexagon(s, 0.5));
                    g2.setColor(paper);
                    g2.setStroke(line);
                    g2.draw(new java.awt.geom.Line2D.Double(s * 0.30, s * 0.40, s * 0.70, s * 0.40));
                    g2.draw(new java.awt.geom.Line2D.Double(s * 0.30, s * 0.60, s * 0.70, s * 0.60));
                }
                case DIAMOND_UNEQUAL -> {
                    Path2D d = new Path2D.Double();
                    d.moveTo(s / 2, 0.5);
                    d.lineTo(s - 0.5, s / 2);
                    d.lineTo(s / 2, s - 0.5);
                    d.lineTo(0.5, s / 2);
                    d.closePath();
                    g2.fill(d);
                    g2.setColor(paper);
                    g2.setStroke(line);
                    g2.draw(new java.awt.geom.Line2D.Double(s * 0.33, s * 0.42, s * 0.67, s * 0.42));
                    g2.draw(new java.awt.geom.Line2D.Double(s * 0.33, s * 0.58, s * 0.67, s * 0.58));
                    g2.draw(new java.awt.geom.Line2D.Double(s * 0.58, s * 0.30, s * 0.42, s * 0.70));
                }
                case OPEN_HEXAGON_ELLIPSIS -> {
                    g2.setStroke(new BasicStroke(w));
                    g2.draw(hexagon(s, w / 2 + 0.5));
                    double dot = Math.max(2, s / 8);
                    for (int i = -1; i <= 1; i++) {
                        g2.fill(new Ellipse2D.Double(s / 2 + i * s * 0.2 - dot / 2, s / 2 - dot / 2, dot, dot));
                    }
                }
                case BAR_DASH -> {
                    g2.setStroke(new BasicStroke(w));
                    g2.draw(new RoundRectangle2D.Double(w / 2 + 0.5, s * 0.22, s - w - 1, s * 0.56, s * 0.3, s * 0.3));
                    g2.setStroke(line);
                    g2.draw(new java.awt.geom.Line2D.Double(s * 0.32, s / 2, s * 0.68, s / 2));
                }
                case SQUARE_SLASH -> {
                    g2.setStroke(new BasicStroke(w));
                    g2.draw(new java.awt.geom.Rectangle2D.Double(w / 2 + 0.5, w / 2 + 0.5, s - w - 1, s - w - 1));
                    g2.setStroke(line);
                    g2.draw(new java.awt.geom.Line2D.Double(s * 0.28, s * 0.72, s * 0.72, s * 0.28));
                }
            }
        } finally {
            g2.dispose();
        }
    }

    @Override
    public int getIconWidth() {
        return size;
    }

    @Override
    public int getIconHeight() {
        return size;
    }
}
