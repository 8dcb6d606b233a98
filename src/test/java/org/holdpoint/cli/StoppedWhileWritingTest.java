package org.holdpoint.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.BufferedWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import java.util.concurrent.TimeUnit;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledOnOs;
import org.junit.jupiter.api.condition.OS;
import org.junit.jupiter.api.io.TempDir;

/**
 * A run stopped (SIGTERM, as a plain kill or a closed terminal sends) while it writes the sign-off
 * workbook leaves neither the hidden unfinished file beside the target nor the writer's temporary files
 * (README, "Outputs"). A child JVM writes a workbook of 400,000 values; it is stopped as soon as the
 * unfinished file appears.
 */
class StoppedWhileWritingTest {
    @TempDir
    Path dir;

    @Test
    @EnabledOnOs(OS.LINUX)
    void aStoppedRunLeavesNoUnfinishedFiles() throws Exception {
        Path csv = dir.resolve("big.csv");
        Random rnd = new Random(400);
        try (BufferedWriter w = Files.newBufferedWriter(csv, StandardCharsets.UTF_8)) {
            w.write("phase,Shaft length\n");
            for (int i = 0; i < 400_000; i++) {
                w.write(i % 2 == 0 ? "before," : "after,");
                w.write(String.format(Locale.ROOT, "%.4f%n", 120 + 0.01 * rnd.nextGaussian()));
            }
        }
        Path out = Files.createDirectories(dir.resolve("out"));
        Path tmp = Files.createDirectories(dir.resolve("tmp"));
        String classpath = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        Process p = new ProcessBuilder(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", classpath, "-Djava.io.tmpdir=" + tmp, "org.holdpoint.Holdpoint", "analyze", csv.toString(),
                "--margin", "0.01", "-q", "--report", out.resolve("report.xlsx").toString()))
                .redirectErrorStream(true).redirectOutput(dir.resolve("child.log").toFile()).start();
        boolean seen = false;
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(120);
        while (!seen && p.isAlive() && System.nanoTime() < deadline) {
            try (Stream<Path> s = Files.list(out)) {
                seen = s.anyMatch(f -> f.getFileName().toString().endsWith(".part"));
            }
            Thread.sleep(20);
        }
        assertThat(seen).as("the unfinished file appeared while the child was writing; log: %s",
                Files.readString(dir.resolve("child.log"))).isTrue();
        p.destroy();
        assertThat(p.waitFor(60, TimeUnit.SECONDS)).isTrue();
        try (Stream<Path> s = Files.list(out)) {
            assertThat(s.toList()).as("nothing half-written is left beside the target").isEmpty();
        }
        try (Stream<Path> s = Files.walk(tmp)) {
            assertThat(s.filter(Files::isRegularFile).toList()).as("no temporary file of the writer is left").isEmpty();
        }
    }

    /** Out of memory is one line and exit 3 (an internal limit, never verify's "edited" code 1). */
    @Test
    void outOfMemoryIsOneLineAndExitThree() throws Exception {
        Path csv = dir.resolve("large.csv");
        Random rnd = new Random(3);
        try (BufferedWriter w = Files.newBufferedWriter(csv, StandardCharsets.UTF_8)) {
            w.write("phase,Bore\n");
            for (int i = 0; i < 400_000; i++) {
                w.write(i % 2 == 0 ? "before," : "after,");
                w.write(String.format(Locale.ROOT, "%.5f%n", 30 + 0.01 * rnd.nextGaussian()));
            }
        }
        String classpath = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        Process p = new ProcessBuilder(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-Xmx12m", "-cp", classpath, "org.holdpoint.Holdpoint", "analyze", csv.toString(), "--margin",
                "0.01", "-q")).redirectError(dir.resolve("err.txt").toFile()).redirectOutput(dir.resolve("out.txt")
                .toFile()).start();
        assertThat(p.waitFor(120, TimeUnit.SECONDS)).isTrue();
        String err = Files.readString(dir.resolve("err.txt"));
        assertThat(p.exitValue()).as(err).isEqualTo(3);
        assertThat(err.strip().lines()).as(err).hasSize(1);
        assertThat(err).contains("out of memory", "HOLDPOINT_JAVA_OPTS").doesNotContain("\tat ");
    }
}
