package org.holdpoint.ui.swing;

import java.awt.Component;
import java.awt.Graphics;
import java.awt.Insets;
import javax.swing.UIManager;
import javax.swing.border.AbstractBorder;

/** A one-pixel line on chosen edges in the theme's border colour, looked up when painted (so it follows a theme switch). */
final class EdgeBorder extends AbstractBorder {
    private static final long serialVersionUID = 1L;
    private final int top;
    private final int left;
    private final int bottom;
    private final int right;

    EdgeBorder(int top, int left, int bottom, int right) {
        this.top = top;
        this.left = left;
        this.bottom = bottom;
        this.right = right;
    }

    @Override
    public void paintBorder(Component c, Graphics g, int x, int y, int w, int h) {
        g.setColor(UIManager.getColor("Component.borderColor"));
        if (top > 0) {
            g.fillRect(x, y, w, top);
        }
        if (bottom > 0) {
            g.fillRect(x, y + h - bottom, w, bottom);
        }
        if (left > 0) {
            g.fillRect(x, y, left, h);
        }
        if (right > 0) {
            g.fillRect(x + w - right, y, right, h);
        }
    }

    @Override
    public Insets getBorderInsets(Component c, Insets insets) {
        insets.set(top, left, bottom, right);
        return insets;
    }
}
