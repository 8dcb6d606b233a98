package org.holdpoint.stats;

import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.function.Supplier;

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
     * Offers work to the common pool; {@link Forked#join} runs it on the joining thread itself when no pool thread
     * has started it yet (so a busy pool never makes the caller wait idle, and the caller waits only for work
     * already running).
     *
     * @param <T>  the result type
     * @param work the work
     * @return the handle to join
     */
    public static <T> Forked<T> fork(Supplier<T> work) {
        Forked<T> f = new Forked<>(work);
        ForkJoinPool.commonPool().execute(f::runUnlessTaken);
        return f;
    }

    /** @param <T> the result type of work started by {@link #fork} */
    public static final class Forked<T> {
        private final Supplier<T> work;
        /** Set by whichever thread runs the work: the pool thread that takes it, or the joining thread. */
        private final AtomicBoolean taken = new AtomicBoolean();
        private final CountDownLatch done = new CountDownLatch(1);
        private T result;
        private Throwable failure;

        private Forked(Supplier<T> work) {
            this.work = work;
        }

        private void runUnlessTaken() {
            if (taken.compareAndSet(false, true)) {
                run();
            }
        }

        private void run() {
            try {
                result = work.get();
            } catch (RuntimeException | Error e) {
                failure = e;
            } finally {
                done.countDown();
            }
        }

        /**
         * @return the work's result
         * @throws RuntimeException the work's own exception, as it was thrown
         */
        public T join() {
            if (taken.compareAndSet(false, true)) {
                run();
            } else {
                boolean interrupted = false;
                while (true) {
                    try {
                        done.await();
                        break;
                    } catch (InterruptedException e) {
                        // the work is running and ends by itself; the interrupt is kept for the caller
                        interrupted = true;
                    }
                }
                if (interrupted) {
                    Thread.currentThread().interrupt();
                }
            }
            if (failure instanceof RuntimeException e) {
                throw e;
            }
            if (failure instanceof Error e) {
                throw e;
            }
            return result;
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
