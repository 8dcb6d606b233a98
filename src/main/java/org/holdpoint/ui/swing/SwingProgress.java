package org.holdpoint.ui.swing;

import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicReference;
import java.util.function.BiConsumer;
import javax.swing.SwingUtilities;
import org.holdpoint.study.Progress;

/**
 * The window's implementation of the {@link Progress} port: steps reported on the worker thread are
 * handed to the event thread (coalesced, so a fast worker never floods it); Cancel sets a flag the
 * worker reads between steps and interrupts the worker thread.
 */
final class SwingProgress implements Progress {
    private final AtomicBoolean cancelled = new AtomicBoolean();
    private final AtomicReference<Object[]> latest = new AtomicReference<>();
    private final BiConsumer<String, Double> view;
    private volatile Thread worker;

    /**
     * @param view shows a step; called on the event thread
     */
    SwingProgress(BiConsumer<String, Double> view) {
        this.view = view;
    }

    /** Called on the worker thread. */
    @Override
    public void step(String what, double fraction) {
        if (latest.getAndSet(new Object[] {what, fraction}) == null) {
            SwingUtilities.invokeLater(() -> {
                Object[] s = latest.getAndSet(null);
                if (s != null) {
                    view.accept((String) s[0], (Double) s[1]);
                }
            });
        }
    }

    /** Called on the worker thread. */
    @Override
    public boolean cancelled() {
        return cancelled.get() || Thread.currentThread() == worker && Thread.currentThread().isInterrupted();
    }

    /** Called on the event thread when the user presses Cancel. */
    void cancel() {
        cancelled.set(true);
        Thread w = worker;
        if (w != null) {
            w.interrupt();
        }
    }

    /** Called on the worker thread as the job starts (null when it ends). */
    void attach(Thread t) {
        worker = t;
    }
}
