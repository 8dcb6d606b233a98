package org.holdpoint.ui.swing;

import java.util.function.Consumer;
import java.util.function.Supplier;
import javax.swing.JLabel;
import javax.swing.JComponent;
import javax.swing.event.DocumentEvent;
import javax.swing.event.DocumentListener;
import javax.swing.text.JTextComponent;

/** Small helpers that tie Swing fields to presentation-model properties without feedback loops. */
final class Bind {
    private Bind() {
    }

    /**
     * Writes every edit of a text field into the model; {@code refresh} puts the model's value back
     * only when it differs (so the caret does not jump while typing).
     *
     * @return the refresh action, to call when the model fires
     */
    static Runnable text(JTextComponent field, Supplier<String> get, Consumer<String> set) {
        boolean[] updating = {false};
        field.getDocument().addDocumentListener(new DocumentListener() {
            @Override
            public void insertUpdate(DocumentEvent e) {
                push();
            }

            @Override
            public void removeUpdate(DocumentEvent e) {
                push();
            }

            @Override
            public void changedUpdate(DocumentEvent e) {
                push();
            }

            private void push() {
                if (!updating[0]) {
                    set.accept(field.getText());
                }
            }
        });
        Runnable refresh = () -> {
            String v = get.get();
            if (!v.equals(field.getText())) {
                updating[0] = true;
                try {
                    field.setText(v);
                } finally {
                    updating[0] = false;
                }
            }
        };
        refresh.run();
        return refresh;
    }

    /** A label with a mnemonic for a field. */
    static JLabel label(String text, char mnemonic, JComponent field) {
        JLabel l = new JLabel(text);
        l.setDisplayedMnemonic(mnemonic);
        l.setLabelFor(field);
        return l;
    }

    /** Makes a label a section heading (larger, bold). */
    /** @return the colour of error text, readable on the current theme (dark red on light, salmon on dark) */
    static java.awt.Color errorColour() {
        return com.formdev.flatlaf.FlatLaf.isLafDark() ? new java.awt.Color(0xFF, 0x9A, 0x8C)
                : new java.awt.Color(0xB0, 0x24, 0x18);
    }

    /** @return a label for a problem, in the error colour of whichever theme is installed (also after a switch) */
    static JLabel errorLabel() {
        JLabel l = new JLabel(" ") {
            private static final long serialVersionUID = 1L;

            @Override
            public void updateUI() {
                super.updateUI();
                setForeground(errorColour());
            }
        };
        l.setForeground(errorColour());
        return l;
    }

    /**
     * Keeps a split pane's divider at a share of its width (or height) when the window is resized, the share
     * the user last dragged it to: a window made smaller keeps its proportions instead of squeezing one side.
     *
     * @param split the split pane
     * @param share the starting share, 0..1
     */
    static void keepProportion(javax.swing.JSplitPane split, double share) {
        double[] ratio = {share};
        split.addComponentListener(new java.awt.event.ComponentAdapter() {
            @Override
            public void componentResized(java.awt.event.ComponentEvent e) {
                split.setDividerLocation(ratio[0]);
            }
        });
        // only a drag by the user sets a new share (the layout's own moves on a resize do not)
        if (split.getUI() instanceof javax.swing.plaf.basic.BasicSplitPaneUI ui) {
            ui.getDivider().addMouseListener(new java.awt.event.MouseAdapter() {
                @Override
                public void mouseReleased(java.awt.event.MouseEvent e) {
                    int size = split.getOrientation() == javax.swing.JSplitPane.HORIZONTAL_SPLIT ? split.getWidth()
                            : split.getHeight();
                    if (size > 0) {
                        ratio[0] = Math.max(0.1, Math.min(0.9, split.getDividerLocation() / (double) size));
                    }
                }
            });
        }
    }

    static JLabel heading(String text) {
        JLabel l = new JLabel(text);
        l.putClientProperty("FlatLaf.styleClass", "h3");
        return l;
    }

    /** Makes a label secondary text. */
    static JLabel hint(String text) {
        JLabel l = new JLabel(text);
        l.putClientProperty("FlatLaf.styleClass", "small");
        return l;
    }
}
