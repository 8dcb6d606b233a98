package org.holdpoint.archive;

import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.SplittableRandom;
import java.util.UUID;
import org.holdpoint.study.ArchiveQuery;
import org.holdpoint.study.NewStudyVersion;

/**
 * Benchmark (a measurement, not a test): archives 10,000 invented studies, then lists, opens and verifies,
 * on an H2 file in a temporary folder and, when HOLDPOINT_PG_URL is set, on a throwaway PostgreSQL database.
 * Prints medians. Run: {@code java -cp target/classes:target/test-classes:<deps> org.holdpoint.archive.ArchiveBenchmark [n]}.
 */
public final class ArchiveBenchmark {

    private static final String[] KINDS = {"tooling", "machine", "material lot", "supplier", "measurement method"};
    private static final String[] NAMES = {"Bore", "Wall", "Torque", "Hardness", "Flatness", "Length"};

    private ArchiveBenchmark() {
    }

    /**
     * @param args optional number of studies (default 10,000)
     * @throws Exception on any failure
     */
    public static void main(String[] args) throws Exception {
        int n = args.length > 0 ? Integer.parseInt(args[0]) : 10_000;
        Path dir = Files.createTempDirectory("holdpoint-bench");
        run("H2 file (embedded default)", ArchiveLocation.embeddedUrl(dir), n);
        Path file = dir.resolve("holdpoint.mv.db");
        System.out.printf(Locale.ROOT, "  H2 file after close: %.1f MB%n", Files.size(file) / 1048576.0);
        Files.delete(file);
        Files.delete(dir);
        String admin = System.getenv("HOLDPOINT_PG_URL");
        if (admin != null && !admin.isBlank()) {
            String db = "hp_bench_" + UUID.randomUUID().toString().replace("-", "").substring(0, 8);
            exec(admin, "CREATE DATABASE " + db);
            try {
                run("PostgreSQL", admin.replaceFirst("/[^/?]*(\\?|$)", "/" + db + "$1"), n);
            } finally {
                exec(admin, "DROP DATABASE " + db);
            }
        }
    }

    private static void run(String label, String url, int n) throws Exception {
        SplittableRandom random = new SplittableRandom(20251201L);
        List<NewStudyVersion> studies = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            studies.add(study(i, random));
        }
        String product;
        try (Connection c = DriverManager.getConnection(url)) {
            product = c.getMetaData().getDatabaseProductName() + " " + c.getMetaData().getDatabaseProductVersion();
        }
        long[] add = new long[n];
        // the benchmark runs as the administrator of a throwaway database, which daily work refuses
        try (JdbcArchive archive = url.startsWith("jdbc:postgresql") ? JdbcArchive.openForMaintenance(url)
                : JdbcArchive.open(url)) {
            long t0 = System.nanoTime();
            for (int i = 0; i < n; i++) {
                long s = System.nanoTime();
                archive.add(studies.get(i), "bench", null);
                add[i] = System.nanoTime() - s;
            }
            double total = (System.nanoTime() - t0) / 1e9;
            long[] listAll = time(5, () -> archive.list(ArchiveQuery.withDefaults()).size());
            // a different filter value each time, so no database can hand back a result it cached
            long[] listPart = time(21, () -> archive.list(ArchiveQuery.withDefaults()
                    .withPartNumber("P-" + random.nextInt(100))).size());
            long[] listChar = time(11, () -> archive.list(ArchiveQuery.withDefaults()
                    .withCharacteristic(NAMES[2 + random.nextInt(4)]).withChangeKind(KINDS[random.nextInt(5)])).size());
            long[] listDates = time(11, () -> {
                Instant from = Instant.parse("2024-01-01T00:00:00Z").plusSeconds(3600L * random.nextInt(n));
                return archive.list(ArchiveQuery.withDefaults().withCreatedBetween(from, from.plusSeconds(3600L * 500)))
                        .size();
            });
            long[] show = time(101, () -> archive.show(1 + random.nextInt(n)).orElseThrow().json().length());
            long[] verify = time(3, () -> (int) archive.verify().eventsChecked());
            System.out.printf(Locale.ROOT, "%s [%s], %d studies (JSON %d chars each on average)%n", label, product, n,
                    studies.stream().mapToInt(s -> s.json().length()).sum() / n);
            System.out.printf(Locale.ROOT, "  add one study:            median %8.2f ms, mean %.2f ms (all %d in %.1f s)%n",
                    median(add), total * 1e3 / n, n, total);
            System.out.printf(Locale.ROOT, "  list all:                 median %8.2f ms%n", median(listAll));
            System.out.printf(Locale.ROOT, "  list by part (100 hits):  median %8.2f ms%n", median(listPart));
            System.out.printf(Locale.ROOT, "  list by characteristic + kind: median %8.2f ms%n", median(listChar));
            System.out.printf(Locale.ROOT, "  list by date range (500 hits): median %8.2f ms%n", median(listDates));
            System.out.printf(Locale.ROOT, "  show one (with JSON):     median %8.2f ms%n", median(show));
            System.out.printf(Locale.ROOT, "  verify whole archive:     median %8.2f ms%n", median(verify));
        }
    }

    @FunctionalInterface
    private interface Action {
        int run() throws Exception;
    }

    private static long[] time(int repeats, Action a) throws Exception {
        a.run(); // warm-up
        long[] t = new long[repeats];
        for (int i = 0; i < repeats; i++) {
            long s = System.nanoTime();
            if (a.run() < 0) {
                throw new IllegalStateException("impossible");
            }
            t[i] = System.nanoTime() - s;
        }
        return t;
    }

    private static double median(long[] nanos) {
        long[] s = nanos.clone();
        Arrays.sort(s);
        int m = s.length / 2;
        double v = s.length % 2 == 1 ? s[m] : (s[m - 1] + s[m]) / 2.0;
        return v / 1e6;
    }

    private static NewStudyVersion study(int i, SplittableRandom r) {
        int k = 2 + r.nextInt(4);
        List<String> names = new ArrayList<>(Arrays.asList(NAMES).subList(0, k));
        StringBuilder json = new StringBuilder("{\"schemaVersion\":1,\"characteristics\":[");
        for (String name : names) {
            json.append("{\"name\":\"").append(name).append("\",\"before\":[");
            for (int v = 0; v < 30; v++) {
                json.append(v == 0 ? "" : ",").append(String.format(Locale.ROOT, "%.4f", 12 + r.nextGaussian() / 100));
            }
            json.append("],\"after\":[");
            for (int v = 0; v < 30; v++) {
                json.append(v == 0 ? "" : ",").append(String.format(Locale.ROOT, "%.4f", 12 + r.nextGaussian() / 100));
            }
            json.append("]},");
        }
        json.setLength(json.length() - 1);
        json.append("]}");
        Instant created = Instant.parse("2024-01-01T00:00:00Z").plusSeconds(3600L * i);
        return NewStudyVersion.of("BENCH-" + i, "Bench change " + i, KINDS[i % KINDS.length], "P-" + (i % 100), "A",
                names, i % 9 == 0 ? "inconclusive" : "change verified", "bench", created, json.toString());
    }

    private static void exec(String url, String sql) throws SQLException {
        try (Connection c = DriverManager.getConnection(url); Statement s = c.createStatement()) {
            s.execute(sql);
        }
    }
}
