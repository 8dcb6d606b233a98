package org.holdpoint.ui.swing;

import java.awt.Font;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;
import java.util.List;
import javax.swing.BorderFactory;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JTextArea;
import javax.swing.Scrollable;
import org.holdpoint.ui.model.ResultDetail;

/**
 * The numbers and notes of one characteristic as plain labelled lines (no HTML: a new characteristic is
 * shown in a few milliseconds, so selecting rows never holds up the event thread).
 */
final class DetailView extends JPanel implements Scrollable {
    private static final long serialVersionUID = 1L;

    /** Values longer than this go under their label, across the pane. */
    private static final int SIDE_BY_SIDE = 32;
    /** The label column's width in pixels (unscaled). */
    private static final int LABEL_WIDTH = 140;

    DetailView() {
        super(new GridBagLayout());
        setBorder(BorderFactory.createEmptyBorder(10, 12, 10, 12));
    }

    /**
     * Shows a characteristic's sections (event thread).
     *
     * @param title    the characteristic's name
     * @param sections its sections
     */
    void show(String title, List<ResultDetail.Section> sections) {
        removeAll();
        GridBagConstraints c = new GridBagConstraints();
        c.gridy = 0;
        c.anchor = GridBagConstraints.FIRST_LINE_START;
        c.fill = GridBagConstraints.HORIZONTAL;
        c.gridwidth = 2;
        JLabel t = new JLabel(title);
        t.putClientProperty("FlatLaf.styleClass", "h2");
        add(t, c);
        for (ResultDetail.Section s : sections) {
            c.gridy++;
            c.gridx = 0;
            c.gridwidth = 2;
            c.insets = new Insets(10, 0, 2, 0);
            add(wrap(s.title(), true), c);
            for (ResultDetail.Line l : s.lines()) {
                c.gridy++;
                c.insets = new Insets(1, 0, 1, 8);
                if (l.label().isEmpty()) {
                    c.gridx = 0;
                    c.gridwidth = 2;
                    c.weightx = 1;
                    add(wrap(l.value(), false), c);
                    continue;
                }
                if (l.value().length() > SIDE_BY_SIDE) {
                    // a sentence reads across the whole pane, under its label, instead of in a narrow column
                    c.gridx = 0;
                    c.gridwidth = 2;
                    c.weightx = 1;
                    add(new JLabel(l.label()), c);
                    c.gridy++;
                    c.insets = new Insets(0, 14, 3, 8);
                    add(wrap(l.value(), false), c);
                    continue;
                }
                c.gridwidth = 1;
                c.gridx = 0;
                c.weightx = 0;
                JLabel k = new JLabel(l.label());
                k.setPreferredSize(new java.awt.Dimension(LABEL_WIDTH, k.getPreferredSize().height));
                add(k, c);
                c.gridx = 1;
                c.weightx = 1;
                add(wrap(l.value(), false), c);
            }
            c.weightx = 0;
        }
        c.gridy++;
        c.weighty = 1;
        add(new JPanel(), c);
        revalidate();
        repaint();
        javax.swing.SwingUtilities.invokeLater(() -> scrollRectToVisible(new java.awt.Rectangle(0, 0, 1, 1)));
    }

    /** Shows a one-line message instead (event thread). */
    void message(String text) {
        removeAll();
        add(new JLabel(text));
        revalidate();
        repaint();
    }

    private static JTextArea wrap(String text, boolean bold) {
        JTextArea a = new JTextArea(text);
        a.setLineWrap(true);
        a.setWrapStyleWord(true);
        a.setEditable(false);
        a.setOpaque(false);
        a.setBorder(null);
        a.setFocusable(true);
        if (bold) {
            a.setFont(a.getFont().deriveFont(Font.BOLD));
        }
        return a;
    }

    @Override
    public java.awt.Dimension getPreferredScrollableViewportSize() {
        return getPreferredSize();
    }

    @Override
    public int getScrollableUnitIncrement(java.awt.Rectangle r, int o, int d) {
        return 16;
    }

    @Override
    public int getScrollableBlockIncrement(java.awt.Rectangle r, int o, int d) {
        return r.height - 16;
    }

    @Override
    public boolean getScrollableTracksViewportWidth() {
        return true;
    }

    @Override
    public boolean getScrollableTracksViewportHeight() {
        return false;
    }
}
