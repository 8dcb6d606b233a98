package org.holdpoint.ui.swing;

import java.awt.BorderLayout;
import java.awt.FlowLayout;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;

/** The progress bar, what is being done, and Cancel; hidden when nothing runs. Event thread only. */
final class ProgressStrip extends JPanel {
    private static final long serialVersionUID = 1L;
    private final JLabel label = new JLabel();
    private final JProgressBar bar = new JProgressBar(0, 1000);
    private final JButton cancel = new JButton("Cancel");
    private transient Runnable onCancel = () -> { };

    ProgressStrip() {
        super(new BorderLayout(8, 0));
        createComponents();
        layoutComponents();
        setVisible(false);
    }

    private void createComponents() {
        bar.setStringPainted(false);
        cancel.setMnemonic('n');
        cancel.setToolTipText("Stop the task; nothing is changed or written (Esc)");
        cancel.addActionListener(e -> {
            cancel.setEnabled(false);
            label.setText(label.getText() + " — stopping…");
            onCancel.run();
        });
        cancel.setName("cancel");
        bar.setName("progress");
    }

    private void layoutComponents() {
        setBorder(BorderFactory.createEmptyBorder(4, 8, 4, 8));
        add(label, BorderLayout.WEST);
        add(bar, BorderLayout.CENTER);
        JPanel right = new JPanel(new FlowLayout(FlowLayout.RIGHT, 0, 0));
        right.add(cancel);
        add(right, BorderLayout.EAST);
    }

    /** Shows the strip for a task (event thread). */
    void open(String title, Runnable cancelAction) {
        onCancel = cancelAction;
        label.setText(title);
        bar.setIndeterminate(true);
        cancel.setEnabled(true);
        setVisible(true);
        revalidate();
    }

    /** Shows one step (event thread). */
    void step(String what, double fraction) {
        if (!isVisible()) {
            return;
        }
        bar.setToolTipText(what);
        if (fraction < 0) {
            bar.setIndeterminate(true);
        } else {
            bar.setIndeterminate(false);
            bar.setValue((int) Math.round(Math.min(1, fraction) * 1000));
        }
    }

    /** Hides the strip (event thread). */
    void close() {
        setVisible(false);
        onCancel = () -> { };
        revalidate();
    }

    /** @return the Cancel button (for the Esc key and tests) */
    JButton cancelButton() {
        return cancel;
    }
}
