package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.ForkJoinPool;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import org.junit.jupiter.api.Test;

/** Forked work is run by the joining thread when every pool thread is busy, and its own exception comes back. */
class BackgroundTest {
    @Test
    void theCallerRunsWorkThatNoPoolThreadHasStarted() throws Exception {
        int threads = ForkJoinPool.commonPool().getParallelism();
        CountDownLatch busy = new CountDownLatch(threads);
        CountDownLatch release = new CountDownLatch(1);
        List<java.util.concurrent.ForkJoinTask<?>> blockers = new ArrayList<>();
        try {
            for (int i = 0; i < threads; i++) {
                blockers.add(ForkJoinPool.commonPool().submit(() -> {
                    busy.countDown();
                    release.await(30, TimeUnit.SECONDS);
                    return null;
                }));
            }
            assertThat(busy.await(30, TimeUnit.SECONDS)).as("every pool thread busy").isTrue();
            AtomicReference<Thread> ranOn = new AtomicReference<>();
            Background.Forked<Integer> f = Background.fork(() -> {
                ranOn.set(Thread.currentThread());
                return 42;
            });
            assertThat(f.join()).isEqualTo(42);
            assertThat(ranOn.get()).isSameAs(Thread.currentThread());
        } finally {
            release.countDown();
            for (var b : blockers) {
                b.join();
            }
        }
    }

    @Test
    void theWorksOwnExceptionIsThrownAsItWas() {
        IllegalStateException boom = new IllegalStateException("boom");
        Background.Forked<Object> f = Background.fork(() -> {
            throw boom;
        });
        assertThatThrownBy(f::join).isSameAs(boom);
    }

    @Test
    void manyForksGiveTheirOwnResults() {
        List<Background.Forked<Long>> forks = new ArrayList<>();
        for (int i = 0; i < 200; i++) {
            long n = i;
            forks.add(Background.fork(() -> n * n));
        }
        for (int i = 0; i < forks.size(); i++) {
            assertThat(forks.get(i).join()).isEqualTo((long) i * i);
        }
    }
}
