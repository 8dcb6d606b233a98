package org.holdpoint.stats;

import java.util.concurrent.CompletableFuture;
import java.util.concurrent.CompletionException;

/** Work computed beside the caller's thread, joined with its own exception (a failure there is never wrapped). */
public final class Background {
    private Background() {
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
