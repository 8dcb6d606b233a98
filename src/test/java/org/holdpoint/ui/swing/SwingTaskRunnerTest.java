package org.holdpoint.ui.swing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.awt.GraphicsEnvironment;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicReference;
import javax.swing.SwingUtilities;
import org.holdpoint.ui.model.TaskRunner;
import org.holdpoint.ui.model.TaskStatus;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * The window's task runner: a job runs off the event thread, its outcome comes back on the event thread; the
 * progress strip opens only for a job longer than its delay, and its Cancel stops the job between steps.
 */
@Tag("gui")
class SwingTaskRunnerTest {

    @BeforeAll
    static void needsDisplay() {
        assumeFalse(GraphicsEnvironment.isHeadless(), "no display: skipped");
    }

    @Test
    void aJobRunsOffTheEventThreadAndReportsOnIt() throws Exception {
        AtomicReference<ProgressStrip> strip = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> strip.set(new ProgressStrip()));
        SwingTaskRunner runner = new SwingTaskRunner(strip.get());
        CountDownLatch done = new CountDownLatch(1);
        AtomicReference<Boolean> jobOnEdt = new AtomicReference<>();
        AtomicReference<Boolean> doneOnEdt = new AtomicReference<>();
        AtomicReference<TaskRunner.Outcome<Integer>> outcome = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> runner.run("quick", p -> {
            jobOnEdt.set(SwingUtilities.isEventDispatchThread());
            return 42;
        }, o -> {
            doneOnEdt.set(SwingUtilities.isEventDispatchThread());
            outcome.set(o);
            done.countDown();
        }));
        assertThat(done.await(30, TimeUnit.SECONDS)).isTrue();
        assertThat(jobOnEdt.get()).isFalse();
        assertThat(doneOnEdt.get()).isTrue();
        assertThat(outcome.get().status()).isEqualTo(TaskStatus.COMPLETED);
        assertThat(outcome.get().value()).isEqualTo(42);
        assertThat(runner.busy()).isFalse();
    }

    @Test
    void cancelStopsALongJobBetweenSteps() throws Exception {
        AtomicReference<ProgressStrip> strip = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> strip.set(new ProgressStrip()));
        SwingTaskRunner runner = new SwingTaskRunner(strip.get());
        CountDownLatch done = new CountDownLatch(1);
        AtomicReference<TaskRunner.Outcome<Integer>> outcome = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> runner.run("long", p -> {
            for (int i = 0; i < 600; i++) {
                p.checkCancelled();
                p.step("step " + i, i / 600.0);
                Thread.sleep(50);
            }
            return 1;
        }, o -> {
            outcome.set(o);
            done.countDown();
        }));
        // the strip opens after its delay; then its Cancel is pressed
        long until = System.currentTimeMillis() + 10_000;
        while (System.currentTimeMillis() < until) {
            AtomicReference<Boolean> enabled = new AtomicReference<>(false);
            SwingUtilities.invokeAndWait(() -> enabled.set(strip.get().cancelButton().isEnabled()
                    && strip.get().isVisible()));
            if (enabled.get()) {
                break;
            }
            Thread.sleep(50);
        }
        SwingUtilities.invokeAndWait(() -> strip.get().cancelButton().doClick());
        assertThat(done.await(30, TimeUnit.SECONDS)).isTrue();
        assertThat(outcome.get().status()).isEqualTo(TaskStatus.CANCELLED);
    }
}
