package org.holdpoint.workflow.bench;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import org.holdpoint.stats.Sample;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.ChangeDescription;
import org.holdpoint.study.ChangeKind;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.GroupData;
import org.holdpoint.study.ImportReport;
import org.holdpoint.study.InputInfo;
import org.holdpoint.study.Layout;
import org.holdpoint.study.MarginSpec;
import org.holdpoint.study.Progress;
import org.holdpoint.study.SpecLimits;
import org.holdpoint.result.StudyResult;
import org.holdpoint.workflow.AnalysisOutcome;
import org.holdpoint.workflow.AnalyzeUseCase;
import org.holdpoint.workflow.ChartSource;
import org.holdpoint.workflow.ReportOptions;
import org.holdpoint.workflow.ReportUseCase;
import org.holdpoint.workflow.StudyAnalyzer;
import org.holdpoint.workflow.VerifyUseCase;

/**
 * Benchmark (not a test): time to write, and to verify, the sign-off workbook for the demo study, a
 * 200-characteristic study and a study of a million raw values; medians of the runs after one warm-up.
 * Run: {@code java -Xmx2g -cp target/classes:target/test-classes:<deps> org.holdpoint.workflow.bench.SignoffBenchmark [runs]}.
 */
public final class SignoffBenchmark {
    private SignoffBenchmark() {
    }

    public static void main(String[] args) throws Exception {
        int runs = args.length > 0 ? Integer.parseInt(args[0]) : 5;
        Path dir = Files.createTempDirectory("signoff-bench");
        AnalysisOutcome demo = new AnalyzeUseCase().run(org.holdpoint.workflow.ImportOptions.file(Path.of("sample-data",
                "boring-bar-insert.csv")), null, AnalysisSettings.defaultSettings(), Progress.NONE);
        ChangeStudy demoStudy = new ChangeStudy(change("CR-DEMO"), demo.data(), demo.settings(), List.of());
        measure("demo study (7 characteristics, 420 values, 2 charts each)", demoStudy, demo.result(), charts(),
                dir, runs);
        ChangeStudy wide = synthetic(200, 30, 1);
        measure("200 characteristics x (30 + 30) values, 2 charts each", wide, analyze(wide), charts(), dir, runs);
        ChangeStudy big = synthetic(20, 25_000, 2);
        measure("1,000,000 raw values (20 characteristics x (25,000 + 25,000)), no charts", big, analyze(big),
                ChartSource.NONE, dir, runs);
    }

    private static void measure(String label, ChangeStudy study, StudyResult result, ChartSource charts, Path dir,
            int runs) throws Exception {
        Path file = dir.resolve("bench.xlsx");
        double[] write = new double[runs];
        double[] writeCpu = new double[runs];
        double[] verify = new double[runs];
        var mx = java.lang.management.ManagementFactory.getThreadMXBean();
        for (int i = -1; i < runs; i++) {
            long c0 = mx.getCurrentThreadCpuTime();
            long t0 = System.nanoTime();
            new ReportUseCase(Clock.systemUTC()).write(study, result, ReportOptions.withDefaults().withCharts(charts)
                    .withExisting(ReportOptions.ExistingFile.REPLACE), file);
            long t1 = System.nanoTime();
            long c1 = mx.getCurrentThreadCpuTime();
            var v = new VerifyUseCase().verify(file, null, Progress.NONE);
            long t2 = System.nanoTime();
            if (v.status() != org.holdpoint.workflow.VerifyResult.Status.INTACT) {
                throw new IllegalStateException("benchmark workbook does not verify: " + v.differences());
            }
            if (i >= 0) {
                write[i] = (t1 - t0) / 1e9;
                writeCpu[i] = (c1 - c0) / 1e9;
                verify[i] = (t2 - t1) / 1e9;
            }
        }
        System.out.printf(Locale.ROOT, "%s: write median %.2f s (min %.2f, max %.2f), write CPU median %.2f s, "
                + "verify median %.2f s, file %.1f MB, %d runs%n", label, median(write), min(write), max(write),
                median(writeCpu), median(verify),
                Files.size(file) / 1e6, runs);
    }

    private static StudyResult analyze(ChangeStudy s) {
        return new StudyAnalyzer().analyze(s.data(), s.settings(), Progress.NONE);
    }

    private static ChangeDescription change(String id) {
        return new ChangeDescription(id, "Benchmark study", ChangeKind.MACHINE, "BM-1", "A", "timing", "bench",
                null, null);
    }

    /** Invented normal data at 4 decimals, seeded. */
    static ChangeStudy synthetic(int characteristics, int perGroup, long seed) {
        SplittableRandom rnd = new SplittableRandom(seed);
        List<CharacteristicData> chars = new ArrayList<>();
        int row = 2;
        for (int c = 0; c < characteristics; c++) {
            double centre = 10 + c;
            GroupData b = group(rnd, centre, perGroup, row);
            row += perGroup;
            GroupData a = group(rnd, centre + 0.0002, perGroup, row);
            row += perGroup;
            chars.add(new CharacteristicData(String.format(Locale.ROOT, "Dimension %03d", c + 1), "mm", b, a, false,
                    List.of()));
        }
        Dataset data = new Dataset(chars, List.of(new InputInfo("bench.csv", "00".repeat(32), null, Layout.STACKED,
                "data")), new ImportReport(2L * characteristics * perGroup, java.util.Map.of(), List.of(), List.of()));
        CharacteristicSettings defaults = new CharacteristicSettings("mm", SpecLimits.NONE,
                new MarginSpec(MarginSpec.Kind.ABSOLUTE, -0.005, 0.005), 1.3, null, null);
        return new ChangeStudy(change("CR-BENCH"), data, new AnalysisSettings(0.05, false, false, defaults, null,
                null, List.of()), List.of());
    }

    private static GroupData group(SplittableRandom rnd, double centre, int n, int firstRow) {
        long[] unscaled = new long[n];
        int[] rows = new int[n];
        int[] cols = new int[n];
        for (int i = 0; i < n; i++) {
            double v = centre + 0.002 * gaussian(rnd);
            unscaled[i] = Math.round(v * 10_000);
            rows[i] = firstRow + i;
            cols[i] = 4;
        }
        return new GroupData(Sample.ofUnscaled(unscaled, 4), "bench.csv", null, rows, cols, null, null, null, null);
    }

    private static double gaussian(SplittableRandom rnd) {
        double u = rnd.nextDouble();
        double v = rnd.nextDouble();
        return Math.sqrt(-2 * Math.log(1 - u)) * Math.cos(2 * Math.PI * v);
    }

    private static ChartSource charts() {
        byte[] a = png(800, 600);
        byte[] b = png(800, 600);
        return (study, result) -> {
            java.util.Map<String, List<org.holdpoint.report.NamedImage>> m = new java.util.LinkedHashMap<>();
            result.characteristics().forEach(c -> m.put(c.name(), List.of(
                    org.holdpoint.report.NamedImage.of("Box plot", a), org.holdpoint.report.NamedImage.of("Run order",
                            b))));
            return m;
        };
    }

    private static byte[] png(int w, int h) {
        try {
            var img = new java.awt.image.BufferedImage(w, h, java.awt.image.BufferedImage.TYPE_INT_RGB);
            var g = img.createGraphics();
            g.setColor(java.awt.Color.WHITE);
            g.fillRect(0, 0, w, h);
            g.setColor(java.awt.Color.DARK_GRAY);
            for (int i = 0; i < 40; i++) {
                g.drawLine(i * 20, h, i * 20, h - (i * 37) % h);
            }
            g.dispose();
            var out = new java.io.ByteArrayOutputStream();
            javax.imageio.ImageIO.write(img, "png", out);
            return out.toByteArray();
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    private static double median(double[] x) {
        double[] s = x.clone();
        Arrays.sort(s);
        int n = s.length;
        return n % 2 == 1 ? s[n / 2] : (s[n / 2 - 1] + s[n / 2]) / 2;
    }

    private static double min(double[] x) {
        return Arrays.stream(x).min().orElse(Double.NaN);
    }

    private static double max(double[] x) {
        return Arrays.stream(x).max().orElse(Double.NaN);
    }
}
