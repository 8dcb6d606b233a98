package org.holdpoint.ui.swing;

import java.util.Arrays;
import javax.swing.Timer;

/**
 * Measures how responsive the event thread is: a timer that asks to run every {@code periodMs} and
 * records how late each tick arrives. A tick that is late by L ms means the event thread was busy for
 * about L ms. Start and stop it on the event thread; read its figures afterwards.
 */
public final class EdtWatchdog {
    private final int periodMs;
    private final Timer timer;
    private long[] lateness = new long[1024];
    private int count;
    private long last;

    /**
     * @param periodMs the tick period in ms
     */
    public EdtWatchdog(int periodMs) {
        this.periodMs = periodMs;
        this.timer = new Timer(periodMs, e -> tick());
        timer.setCoalesce(false);
    }

    /** Starts measuring (event thread). */
    public void start() {
        last = System.nanoTime();
        timer.start();
    }

    /** Stops measuring (event thread). */
    public void stop() {
        timer.stop();
    }

    private void tick() {
        long now = System.nanoTime();
        long late = Math.max(0, (now - last) / 1_000_000 - periodMs);
        last = now;
        if (count == lateness.length) {
            lateness = Arrays.copyOf(lateness, count * 2);
        }
        lateness[count++] = late;
    }

    /** @return how many ticks were recorded */
    public int ticks() {
        return count;
    }

    /** @return the largest lateness in ms (the longest the event thread was blocked) */
    public long maxLatenessMs() {
        long m = 0;
        for (int i = 0; i < count; i++) {
            m = Math.max(m, lateness[i]);
        }
        return m;
    }

    /**
     * @param q a quantile in [0, 1]
     * @return the lateness at that quantile (nearest rank), in ms
     */
    public long quantileMs(double q) {
        if (count == 0) {
            return 0;
        }
        long[] s = Arrays.copyOf(lateness, count);
        Arrays.sort(s);
        return s[(int) Math.min(count - 1, Math.ceil(q * count) - 1 < 0 ? 0 : Math.ceil(q * count) - 1)];
    }
}
