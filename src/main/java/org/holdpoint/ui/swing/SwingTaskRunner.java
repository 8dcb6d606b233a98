package org.holdpoint.ui.swing;

import java.util.function.Consumer;
import javax.swing.SwingWorker;
import javax.swing.Timer;
import org.holdpoint.ui.model.TaskRunner;

/**
 * Runs jobs on a {@link SwingWorker} thread. The progress strip appears only when a job takes longer
 * than {@link #SHOW_AFTER_MS} ms (quick jobs do not flicker); Cancel stops the job between steps.
 * The outcome is handed to the caller on the event thread.
 */
final class SwingTaskRunner implements TaskRunner {
    /** The delay before the progress strip is shown. */
    static final int SHOW_AFTER_MS = 200;
    private final ProgressStrip strip;
    private boolean busy;

    /**
     * @param strip the progress bar, label and Cancel button
     */
    SwingTaskRunner(ProgressStrip strip) {
        this.strip = strip;
    }

    /** Called on the event thread. */
    @Override
    public <T> void run(String title, Job<T> job, Consumer<Outcome<T>> done) {
        busy = true;
        SwingProgress progress = new SwingProgress(strip::step);
        Timer show = new Timer(SHOW_AFTER_MS, e -> strip.open(title, progress::cancel));
        show.setRepeats(false);
        show.start();
        new SwingWorker<Outcome<T>, Void>() {
            /** Runs on the worker thread. */
            @Override
            protected Outcome<T> doInBackground() {
                progress.attach(Thread.currentThread());
                // below the event thread, so that a scheduler that honours priorities lets the window paint first
                Thread.currentThread().setPriority(Thread.MIN_PRIORITY);
                try {
                    return TaskRunner.outcome(job, progress);
                } finally {
                    Thread.currentThread().setPriority(Thread.NORM_PRIORITY);
                    progress.attach(null);
                    Thread.interrupted();
                }
            }

            /** Runs on the event thread. */
            @Override
            protected void done() {
                show.stop();
                strip.close();
                busy = false;
                Outcome<T> o;
                try {
                    o = get();
                } catch (InterruptedException | java.util.concurrent.ExecutionException e) {
                    o = new Outcome<>(org.holdpoint.ui.model.TaskStatus.FAILED, null,
                            org.holdpoint.ui.model.UserMessage.of(e.getCause() == null ? e : e.getCause()));
                }
                done.accept(o);
            }
        }.execute();
    }

    /** Called on the event thread. */
    @Override
    public boolean busy() {
        return busy;
    }
}
