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
