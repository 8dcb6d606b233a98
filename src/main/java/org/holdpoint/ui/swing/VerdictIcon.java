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
 * The shape of a verdict, drawn by code at any size (sharp on high-DPI screens): a disc with a tick,
 * a square with a cross, a triangle with a question mark, or a ring with a dash. The shape alone
 * tells the verdicts apart; colour only helps.
 */
public final class VerdictIcon implements Icon {
    private static final Color PASS = new Color(0x1E, 0x7B, 0x3A);
    private static final Color FAIL = new Color(0xB0, 0x24, 0x18);
    private static final Color UNSURE = new Color(0xB2, 0x6B, 0x00);
    private static final Color NONE = new Color(0x6B, 0x6B, 0x6B);
    private final VerdictLook look;
    private final int size;

    /**
     * @param look the verdict's look
     * @param size width and height in (unscaled) pixels
     */
    public VerdictIcon(VerdictLook look, int size) {
        this.look = look;
        this.size = size;
    }

    /** @return the colour that accompanies the shape */
    public Color color() {
        return switch (look) {
            case PASSED -> PASS;
            case FAILED -> FAIL;
            case INCONCLUSIVE -> UNSURE;
            case NOT_ASSESSED, NOT_ASSESSABLE -> NONE;
        };
    }

    @Override
    public void paintIcon(Component c, Graphics g, int x, int y) {
        Graphics2D g2 = (Graphics2D) g.create();
        try {
            g2.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g2.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
            g2.translate(x, y);
            double s = size;
            g2.setColor(color());
            float w = (float) Math.max(1.5, s / 8);
            switch (look.shape()) {
                case DISC_TICK -> {
                    g2.fill(new Ellipse2D.Double(0.5, 0.5, s - 1, s - 1));
                    g2.setColor(Color.WHITE);
                    g2.setStroke(new BasicStroke(w, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
                    Path2D tick = new Path2D.Double();
                    tick.moveTo(s * 0.27, s * 0.52);
                    tick.lineTo(s * 0.44, s * 0.69);
                    tick.lineTo(s * 0.74, s * 0.33);
                    g2.draw(tick);
                }
                case SQUARE_CROSS -> {
                    g2.fill(new RoundRectangle2D.Double(1, 1, s - 2, s - 2, s / 5, s / 5));
                    g2.setColor(Color.WHITE);
                    g2.setStroke(new BasicStroke(w, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
                    Path2D cross = new Path2D.Double();
                    cross.moveTo(s * 0.3, s * 0.3);
                    cross.lineTo(s * 0.7, s * 0.7);
                    cross.moveTo(s * 0.7, s * 0.3);
                    cross.lineTo(s * 0.3, s * 0.7);
                    g2.draw(cross);
                }
                case TRIANGLE_QUERY -> {
                    Path2D tri = new Path2D.Double();
                    tri.moveTo(s / 2, 0.5);
                    tri.lineTo(s - 0.5, s - 1);
                    tri.lineTo(0.5, s - 1);
                    tri.closePath();
                    g2.fill(tri);
                    g2.setColor(Color.WHITE);
                    g2.setFont(c == null ? g2.getFont().deriveFont(java.awt.Font.BOLD, (float) (s * 0.62))
                            : c.getFont().deriveFont(java.awt.Font.BOLD, (float) (s * 0.62)));
                    java.awt.FontMetrics fm = g2.getFontMetrics();
                    g2.drawString("?", (float) (s - fm.stringWidth("?")) / 2, (float) (s * 0.9));
                }
                case RING_DASH -> {
                    g2.setStroke(new BasicStroke(w));
                    g2.draw(new Ellipse2D.Double(w / 2 + 0.5, w / 2 + 0.5, s - w - 1, s - w - 1));
                    g2.setStroke(new BasicStroke(w, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
                    g2.drawLine((int) Math.round(s * 0.32), (int) Math.round(s / 2), (int) Math.round(s * 0.68),
                            (int) Math.round(s / 2));
                }
                case SQUARE_SLASH -> {
                    g2.setStroke(new BasicStroke(w));
                    g2.draw(new java.awt.geom.Rectangle2D.Double(w / 2 + 0.5, w / 2 + 0.5, s - w - 1, s - w - 1));
                    g2.setStroke(new BasicStroke(w, BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
                    g2.drawLine((int) Math.round(s * 0.28), (int) Math.round(s * 0.72), (int) Math.round(s * 0.72),
                            (int) Math.round(s * 0.28));
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
