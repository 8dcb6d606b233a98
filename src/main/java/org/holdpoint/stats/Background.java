package org.holdpoint.stats;

import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;

/**
 * Work computed beside the caller's thread, joined with its own exception (a failure there is never wrapped). Two
 * kinds: work started with {@link java.util.concurrent.CompletableFuture#supplyAsync} always runs beside the caller
 * (on two cores the common pool has one thread, and such work then gets a thread of its own), which is what the rank
 * comparison needs; work started with {@link #fork} runs beside the caller only if a pool thread is free, else the
 * caller runs it when it joins, which suits work that helps but must never wait in a queue.
 */
public final class Background {
    private Background() {
    }

    /**
     * Starts work on the common pool that {@link Forked#join} runs on the joining thread itself when no pool thread
     * has taken it yet (so a busy pool never makes the caller wait idle).
     *
     * @param <T>  the result type
     * @param work the work
     * @return the handle to join
     */
    public static <T> Forked<T> fork(java.util.function.Supplier<T> work) {
        Forked<T> f = new Forked<>(work);
        java.util.concurrent.ForkJoinPool.commonPool().execute(f.task);
        return f;
    }

    /** @param <T> the result type of work started by {@link #fork} */
    public static final class Forked<T> {
        private final java.util.concurrent.ForkJoinTask<Object[]> task;

        private Forked(java.util.function.Supplier<T> work) {
            task = java.util.concurrent.ForkJoinTask.adapt(() -> {
                try {
                    return new Object[] {work.get(), null};
                } catch (RuntimeException | Error e) {
                    return new Object[] {null, e};
                }
            });
        }

        /**
         * @return the work's result
         * @throws RuntimeException the work's own exception, as it was thrown
         */
        @SuppressWarnings("unchecked")
        public T join() {
            Object[] r = task.join();
            if (r[1] instanceof RuntimeException e) {
                throw e;
            }
            if (r[1] instanceof Error e) {
                throw e;
            }
            return (T) r[0];
        }
    }

    /**
     * @param <T> the result type
     * @param f   work started with {@link CompletableFuture#supplyAsync}
     * @return its result
     * @throws RuntimeException the work's own exception, as it was thrown
     */
    public static <T> T join(CompletableFuture<T> f) {
        try {
            return f.join();
        } catch (CompletionException e) {
            if (e.getCause() instanceof RuntimeException r) {
                throw r;
            }
            if (e.getCause() instanceof Error err) {
                throw err;
            }
            throw e;
        }
    }
}
