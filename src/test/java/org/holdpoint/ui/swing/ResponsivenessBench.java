package org.holdpoint.ui.swing;

import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.SplittableRandom;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;
import org.holdpoint.ui.model.Step;

/**
 * Not a test (a benchmark measures): imports and analyses a million-value workbook in the real window
 * while an {@link EdtWatchdog} (a 10 ms Swing timer that records how late each tick arrives) watches the
 * event thread; then shows the results step (table, detail and charts of 250,000 values per group) and
 * keeps watching. Prints the longest and the 99th-percentile lateness. Run under xvfb-run; see
 * docs/performance.md, section "Window responsiveness".
 */
public final class ResponsivenessBench {
    private ResponsivenessBench() {
    }

    /**
     * @param args the workbook to use (generated when missing), default target/bench/million.xlsx
     * @throws Exception on failure
     */
    public static void main(String[] args) throws Exception {
        Path book = Path.of(args.length > 0 ? args[0] : "target/bench/million.xlsx");
        if (!Files.exists(book)) {
            long t = System.nanoTime();
            generate(book, 250_000);
            System.out.printf(Locale.ROOT, "generated %s (%,d bytes) in %.1f s%n", book, Files.size(book),
                    (System.nanoTime() - t) / 1e9);
        }
        if (Boolean.getBoolean("bench.stalls")) {
            startStallSampler();
        }
        TimedQueue queue = new TimedQueue();
        java.awt.Toolkit.getDefaultToolkit().getSystemEventQueue().push(queue);
        WindowDriver d = new WindowDriver();
        MainWindow win = d.open(Themes.LIGHT, 1440, 900);
        Thread.sleep(1000);
        for (int run = 1; run <= 3; run++) {
            EdtWatchdog dog = new EdtWatchdog(10);
            queue.reset();
            WindowDriver.onEdt(() -> {
                win.show(Step.DATA);
                dog.start();
                win.session().dataForm().setFile(book);
                win.session().importAndAnalyse();
                return null;
            });
            long t0 = System.nanoTime();
            Thread.sleep(300);
            WindowDriver.await("the import", () -> !win.session().busy(), 600_000);
            double importS = (System.nanoTime() - t0) / 1e9;
            WindowDriver.onEdt(() -> {
                dog.stop();
                return null;
            });
            report("import + analysis run " + run, dog, importS);
            queue.report();
            queue.reset();
            EdtWatchdog show = new EdtWatchdog(10);
            WindowDriver.onEdt(() -> {
                show.start();
                win.show(Step.RESULTS);
                return null;
            });
            Thread.sleep(8000);
            WindowDriver.onEdt(() -> {
                show.stop();
                return null;
            });
            report("results step with charts, 8 s, run " + run, show, 8);
            queue.report();
            if (run == 1) {
                d.screenshot(Path.of("target/bench/million-results.png"));
            }
            if (win.session().lastProblem() != null) {
                System.out.println("problem: " + win.session().lastProblem());
            }
        }
        d.close();
        System.exit(0);
    }

    /**
     * The event queue with a stopwatch: the event-thread CPU time and wall time of every event dispatched,
     * so that the longest event our code handles can be told apart from time the thread merely waited
     * for a CPU on a loaded machine.
     */
    private static final class TimedQueue extends java.awt.EventQueue {
        private final java.lang.management.ThreadMXBean bean = java.lang.management.ManagementFactory
                .getThreadMXBean();
        private volatile long maxCpuNs;
        private volatile long maxWallNs;
        private volatile long events;
        private volatile String maxCpuEvent = "";

        @Override
        protected void dispatchEvent(java.awt.AWTEvent e) {
            long c0 = bean.getCurrentThreadCpuTime();
            long w0 = System.nanoTime();
            super.dispatchEvent(e);
            long cpu = bean.getCurrentThreadCpuTime() - c0;
            long wall = System.nanoTime() - w0;
            events++;
            if (cpu > maxCpuNs) {
                maxCpuNs = cpu;
                String s = e.toString();
                maxCpuEvent = s.length() > 110 ? s.substring(0, 110) : s;
            }
            maxWallNs = Math.max(maxWallNs, wall);
        }

        void reset() {
            maxCpuNs = 0;
            maxWallNs = 0;
            events = 0;
            maxCpuEvent = "";
        }

        void report() {
            System.out.printf(Locale.ROOT, "    events %,d; longest event: CPU %d ms, wall %d ms; the CPU-longest was %s%n",
                    events, maxCpuNs / 1_000_000, maxWallNs / 1_000_000, maxCpuEvent);
        }
    }

    /** Prints what the event thread was doing whenever it has not run a posted no-op for 80 ms. */
    private static void startStallSampler() {
        Thread t = new Thread(() -> {
            while (true) {
                try {
                    java.util.concurrent.atomic.AtomicBoolean ran = new java.util.concurrent.atomic.AtomicBoolean();
                    javax.swing.SwingUtilities.invokeLater(() -> ran.set(true));
                    Thread.sleep(80);
                    if (!ran.get()) {
                        for (var e : Thread.getAllStackTraces().entrySet()) {
                            if (e.getKey().getName().startsWith("AWT-EventQueue")) {
                                StackTraceElement[] st = e.getValue();
                                StringBuilder sb = new StringBuilder("EDT stall:");
                                for (int i = 0; i < Math.min(14, st.length); i++) {
                                    sb.append("\n    ").append(st[i]);
                                }
                                System.out.println(sb);
                            }
                        }
                        while (!ran.get()) {
                            Thread.sleep(10);
                        }
                    }
                } catch (InterruptedException e) {
                    return;
                }
            }
        }, "stall-sampler");
        t.setDaemon(true);
        t.start();
    }

    private static void report(String what, EdtWatchdog dog, double seconds) {
        System.out.printf(Locale.ROOT, "%-40s %6.1f s  ticks %6d  lateness max %5d ms  p99 %4d ms  median %3d ms%n",
                what, seconds, dog.ticks(), dog.maxLatenessMs(), dog.quantileMs(0.99), dog.quantileMs(0.5));
    }

    /** A wide workbook: a phase column and four characteristics, {@code rows} rows: 4 × rows values. */
    static void generate(Path target, int rows) throws Exception {
        Files.createDirectories(target.getParent());
        SplittableRandom rnd = new SplittableRandom(20261201L);
        try (SXSSFWorkbook wb = new SXSSFWorkbook(200)) {
            Sheet s = wb.createSheet("Measurements");
            Row h = s.createRow(0);
            String[] head = {"phase", "Bore A", "Bore B", "Bore C", "Bore D"};
            for (int c = 0; c < head.length; c++) {
                h.createCell(c).setCellValue(head[c]);
            }
            for (int r = 1; r <= rows; r++) {
                Row row = s.createRow(r);
                boolean before = r <= rows / 2;
                row.createCell(0).setCellValue(before ? "before" : "after");
                for (int c = 1; c < head.length; c++) {
                    double v = 10 * c + rnd.nextGaussian() * 0.01 + (before ? 0 : 0.0005);
                    row.createCell(c).setCellValue(Math.round(v * 1e4) / 1e4);
                }
            }
            Path tmp = target.resolveSibling(target.getFileName() + ".part");
            try (OutputStream out = Files.newOutputStream(tmp)) {
                wb.write(out);
            }
            Files.move(tmp, target, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        }
    }
}
