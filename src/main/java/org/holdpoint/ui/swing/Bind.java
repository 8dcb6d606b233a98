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
