package org.holdpoint.chart;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.stream.Stream;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.MarginSpec;
import org.holdpoint.study.SpecLimits;
import org.holdpoint.result.StudyResult;

/**
 * Not a test (a benchmark measures, a test asserts): renders every chart of an invented, seeded 200-characteristic
 * study to PNG files and prints the median wall time of several runs. Run with the test classpath and
 * {@code -Djava.awt.headless=true}: {@code java org.holdpoint.chart.ChartBenchmark [runs] [scale] [threads]}.
 */
public final class ChartBenchmark {
    private ChartBenchmark() {
    }

    /**
     * @param args optional number of timed runs (default 5), pixels per point (default the theme's 2.5) and
     *             rendering threads (default 1)
     * @throws IOException if the temporary directory cannot be used
     */
    public static void main(String[] args) throws IOException {
        int runs = args.length > 0 ? Integer.parseInt(args[0]) : 5;
        ChartTheme theme = args.length > 1 ? ChartTheme.withDefaults().withScale(Double.parseDouble(args[1]))
                : ChartTheme.withDefaults();
        List<ChartFixtures.Item> items = study(200, 20261201L);
        StudyResult result = ChartFixtures.study(items);
        List<CharacteristicData> data = ChartFixtures.data(items);
        long values = items.stream().mapToLong(i -> i.data().before().size() + i.data().after().size()).sum();
        int threads = args.length > 2 ? Integer.parseInt(args[2]) : 1;
        StudyCharts charts = StudyCharts.withDefaults().with(theme).withThreads(threads);
        com.sun.management.OperatingSystemMXBean os = (com.sun.management.OperatingSystemMXBean)
                java.lang.management.ManagementFactory.getOperatingSystemMXBean();
        System.out.printf(Locale.ROOT, "study: %d characteristics, %d values, scale %.1f px/pt, %d rendering "
                + "thread(s), Java %s, %d cores%n", items.size(), values, theme.scale(), threads, System.getProperty("java.version"),
                Runtime.getRuntime().availableProcessors());
        Path dir = Files.createTempDirectory("holdpoint-chart-bench");
        try {
            timeOnce(charts, result, data, dir); // warm-up
            java.lang.management.ThreadMXBean mx = java.lang.management.ManagementFactory.getThreadMXBean();
            double[] total = new double[runs];
            double[] cpu = new double[runs];
            double[] processCpu = new double[runs];
            double[] build = new double[runs];
            int files = 0;
            long bytes = 0;
            for (int r = 0; r < runs; r++) {
                long t0 = System.nanoTime();
                charts.all(result, data);
                long t1 = System.nanoTime();
                long c1 = mx.getCurrentThreadCpuTime();
                long p1 = os.getProcessCpuTime();
                List<Path> written = charts.writeAll(result, data, dir);
                long t2 = System.nanoTime();
                cpu[r] = (mx.getCurrentThreadCpuTime() - c1) / 1e9;
                processCpu[r] = (os.getProcessCpuTime() - p1) / 1e9;
                build[r] = (t1 - t0) / 1e9;
                total[r] = (t2 - t1) / 1e9;
                files = written.size();
                bytes = 0;
                for (Path p : written) {
                    bytes += Files.size(p);
                }
                System.out.printf(Locale.ROOT, "run %d: build only %.2f s; build + render + write %.2f s wall, "
                        + "%.2f s CPU of the calling thread, %.2f s CPU of the process%n", r + 1, build[r], total[r], cpu[r],
                        processCpu[r]);
            }
            System.out.printf(Locale.ROOT, "files %d, total %.1f MB%n", files, bytes / 1e6);
            System.out.printf(Locale.ROOT, "median build only (chart objects, no drawing) %.2f s%n", median(build));
            System.out.printf(Locale.ROOT, "median build + render + write %.2f s wall = %.1f ms per chart%n",
                    median(total), 1000 * median(total) / files);
            System.out.printf(Locale.ROOT, "median CPU time of the calling thread %.2f s = %.1f ms per chart%n",
                    median(cpu), 1000 * median(cpu) / files);
            System.out.printf(Locale.ROOT, "median CPU time of the process (all threads, GC included) %.2f s%n",
                    median(processCpu));
            breakdown(charts, result, data, mx);
        } finally {
            try (Stream<Path> s = Files.walk(dir)) {
                for (Path p : s.sorted(Comparator.reverseOrder()).toList()) {
                    Files.deleteIfExists(p);
                }
            }
        }
    }

    /** CPU time split into drawing (to an image) and PNG encoding, over every chart once. */
    private static void breakdown(StudyCharts charts, StudyResult result, List<CharacteristicData> data,
            java.lang.management.ThreadMXBean mx) {
        double draw = 0;
        double encode = 0;
        int n = 0;
        for (NamedChart c : charts.all(result, data)) {
            long a = mx.getCurrentThreadCpuTime();
            java.awt.image.BufferedImage img = ChartExport.image(c.chart(), c.width(), c.height(),
                    charts.theme().scale());
            long b = mx.getCurrentThreadCpuTime();
            try {
                javax.imageio.ImageIO.write(img, "png", java.io.OutputStream.nullOutputStream());
            } catch (IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
            long d = mx.getCurrentThreadCpuTime();
            draw += (b - a) / 1e9;
            encode += (d - b) / 1e9;
            n++;
        }
        System.out.printf(Locale.ROOT, "one pass, CPU: drawing %.2f s (%.1f ms per chart), PNG encoding %.2f s "
                + "(%.1f ms per chart)%n", draw, 1000 * draw / n, encode, 1000 * encode / n);
    }

    private static void timeOnce(StudyCharts charts, StudyResult result, List<CharacteristicData> data, Path dir) {
        charts.writeAll(result, data, dir);
    }

    private static double median(double[] v) {
        double[] s = v.clone();
        Arrays.sort(s);
        return s.length % 2 == 1 ? s[s.length / 2] : (s[s.length / 2 - 1] + s[s.length / 2]) / 2;
    }

    /** An invented study: group sizes 20..200, every 25th characteristic with 2000 values per group. */
    static List<ChartFixtures.Item> study(int count, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        List<ChartFixtures.Item> items = new ArrayList<>();
        for (int i = 0; i < count; i++) {
            int n = i % 25 == 0 ? 2000 : 20 + rnd.nextInt(181);
            double nominal = 5 + rnd.nextInt(50);
            double sd = 0.005 + rnd.nextDouble() * 0.02;
            double shift = (rnd.nextDouble() - 0.5) * 2 * sd;
            double tol = 8 * sd;
            items.add(ChartFixtures.item(String.format(Locale.ROOT, "Feature %03d diameter", i + 1), "mm",
                    ChartFixtures.normal(rnd, n, nominal, sd, 4), ChartFixtures.normal(rnd, n, nominal + shift, sd, 4),
                    new SpecLimits(nominal - tol, nominal, nominal + tol),
                    new MarginSpec(MarginSpec.Kind.PERCENT_OF_TOLERANCE, 10.0, 10.0)));
        }
        return items;
    }
}
