package org.holdpoint.importer.bench;

import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;
import org.holdpoint.importer.DataImporter;
import org.holdpoint.importer.ImportRequest;
import org.holdpoint.study.Dataset;

/**
 * Import benchmark (a measurement, not a test): generates with a fixed seed a stacked .xlsx of
 * 1,000,000 values and a wide .xlsx of 200 characteristics × 1,000 rows, then times
 * {@link DataImporter#read} (warm-up runs, then the median of the measured runs) and the bytes
 * allocated per import. Run: {@code java -Xmx256m -cp target/classes:target/test-classes:DEPS
 * org.holdpoint.importer.bench.ImportBenchmark [dir] [runs]}.
 */
public final class ImportBenchmark {
    private ImportBenchmark() {
    }

    /**
     * @param args optional folder for the generated files and number of measured runs (default 7)
     * @throws Exception on failure
     */
    public static void main(String[] args) throws Exception {
        Path dir = args.length > 0 ? Path.of(args[0]) : Files.createTempDirectory("holdpoint-bench");
        int runs = args.length > 1 ? Integer.parseInt(args[1]) : 7;
        Files.createDirectories(dir);
        Path stacked = dir.resolve("stacked-1M.xlsx");
        Path wide = dir.resolve("wide-200x1000.xlsx");
        if (!Files.exists(stacked)) {
            BenchFiles.stacked(stacked, 500_000);
        }
        if (!Files.exists(wide)) {
            BenchFiles.wide(wide, 200, 1000);
        }
        System.out.printf(Locale.ROOT, "java %s, max heap %d MB, %d processors%n", System.getProperty("java.version"),
                Runtime.getRuntime().maxMemory() >> 20, Runtime.getRuntime().availableProcessors());
        measure("stacked 1,000,000 values", stacked, runs);
        measure("wide 200 x 1,000", wide, runs);
    }

    private static void measure(String label, Path file, int runs) {
        DataImporter importer = new DataImporter();
        for (int i = 0; i < 3; i++) {
            importer.read(ImportRequest.of(file));
        }
        double[] ms = new double[runs];
        double[] cpu = new double[runs];
        long[] alloc = new long[runs];
        long values = 0;
        java.lang.management.ThreadMXBean threads = ManagementFactory.getThreadMXBean();
        for (int i = 0; i < runs; i++) {
            long a0 = allocated();
            long c0 = threads.getCurrentThreadCpuTime();
            long t0 = System.nanoTime();
            Dataset d = importer.read(ImportRequest.of(file));
            ms[i] = (System.nanoTime() - t0) / 1e6;
            cpu[i] = (threads.getCurrentThreadCpuTime() - c0) / 1e6;
            alloc[i] = allocated() - a0;
            values = d.report().valuesUsed();
        }
        double[] sorted = ms.clone();
        Arrays.sort(sorted);
        double[] cs = cpu.clone();
        Arrays.sort(cs);
        long[] as = alloc.clone();
        Arrays.sort(as);
        System.out.printf(Locale.ROOT, "%s (%s, %.1f MB): %d values; wall median %.0f ms (min %.0f, max %.0f); "
                + "importing thread's CPU median %.0f ms (min %.0f); over %d runs; allocated median %.0f MB per import; "
                + "load average %s%n", label, file.getFileName(), size(file) / 1e6, values, sorted[runs / 2], sorted[0],
                sorted[runs - 1], cs[runs / 2], cs[0], runs, as[runs / 2] / 1e6, loadAverage());
    }

    private static String loadAverage() {
        try {
            return Files.readString(Path.of("/proc/loadavg")).split(" ")[0];
        } catch (java.io.IOException | RuntimeException e) {
            return String.format(Locale.ROOT, "%.2f", ManagementFactory.getOperatingSystemMXBean().getSystemLoadAverage());
        }
    }

    private static long size(Path f) {
        try {
            return Files.size(f);
        } catch (java.io.IOException e) {
            return -1;
        }
    }

    private static long allocated() {
        java.lang.management.ThreadMXBean b = ManagementFactory.getThreadMXBean();
        if (b instanceof com.sun.management.ThreadMXBean sb) {
            return sb.getThreadAllocatedBytes(Thread.currentThread().getId());
        }
        return 0;
    }
}
