package org.holdpoint.ui.model;

import java.util.function.Consumer;
import org.holdpoint.study.Progress;

/**
 * Runs a job away from the caller's thread and hands its outcome back on it. The window's
 * implementation runs jobs on a worker thread with a progress bar and Cancel; tests run them at once.
 */
public interface TaskRunner {
    /**
     * A unit of background work.
     *
     * @param <T> what it produces
     */
    @FunctionalInterface
    interface Job<T> {
        /**
         * Does the work. Called on a worker thread; must not touch the window or the models.
         *
         * @param progress where to report and where to ask whether to stop
         * @return the value
         * @throws Exception any failure; told to the user through {@link UserMessage#of(Throwable)}
         */
        T run(Progress progress) throws Exception;
    }

    /**
     * How a job ended.
     *
     * @param status  completed, cancelled or failed
     * @param value   the value when completed, else null
     * @param problem the problem in plain words when failed, else null
     * @param <T>     the value type
     */
    record Outcome<T>(TaskStatus status, T value, UserMessage problem) {
    }

    /**
     * Starts a job. {@code done} is called exactly once, on the thread that owns the models (the
     * event thread in the window).
     *
     * @param title what the job does, shown beside the progress bar
     * @param job   the work
     * @param done  receives the outcome
     * @param <T>   the value type
     */
    <T> void run(String title, Job<T> job, Consumer<Outcome<T>> done);

    /** @return whether a job is running */
    boolean busy();

    /** A runner that runs the job at once on the calling thread (tests and scripted use). */
    TaskRunner DIRECT = new TaskRunner() {
        @Override
        public <T> void run(String title, Job<T> job, Consumer<Outcome<T>> done) {
            done.accept(outcome(job, Progress.NONE));
        }

        @Override
        public boolean busy() {
            return false;
        }
    };

    /**
     * Runs a job and classifies how it ended.
     *
     * @param job      the job
     * @param progress its progress port
     * @param <T>      the value type
     * @return the outcome
     */
    static <T> Outcome<T> outcome(Job<T> job, Progress progress) {
        try {
            T v = job.run(progress);
            if (progress.cancelled()) {
                return new Outcome<>(TaskStatus.CANCELLED, null, null);
            }
            return new Outcome<>(TaskStatus.COMPLETED, v, null);
        } catch (Progress.CancelledException | InterruptedException e) {
            return new Outcome<>(TaskStatus.CANCELLED, null, null);
        } catch (Exception | OutOfMemoryError e) {
            // A cancel interrupts the worker, which can surface as an I/O failure of the file being read.
            if (progress.cancelled()) {
                return new Outcome<>(TaskStatus.CANCELLED, null, null);
            }
            return new Outcome<>(TaskStatus.FAILED, null, UserMessage.of(e));
        }
    }
}
