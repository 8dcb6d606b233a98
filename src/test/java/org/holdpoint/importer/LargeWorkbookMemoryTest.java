package org.holdpoint.importer;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.File;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.holdpoint.importer.bench.BenchFiles;
import org.holdpoint.importer.bench.ImportChild;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/**
 * The streaming import of a million-value workbook fits a 256 MB heap: a child JVM started with
 * -Xmx256m on the test class path imports a generated stacked .xlsx of 500,000 values per group.
 */
@org.junit.jupiter.api.Tag("slow")
class LargeWorkbookMemoryTest {
    @TempDir
    Path dir;

    @Test
    @Timeout(value = 15, unit = TimeUnit.MINUTES)
    void millionValuesImportWithin256MegabytesOfHeap() throws Exception {
        Path file = BenchFiles.stacked(dir.resolve("million.xlsx"), 500_000);
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        ProcessBuilder pb = new ProcessBuilder(List.of(java, "-Xmx256m", "-XX:+UseSerialGC", "-cp",
                System.getProperty("java.class.path"), ImportChild.class.getName(), file.toString()));
        pb.redirectErrorStream(true);
        pb.redirectOutput(dir.resolve("child.log").toFile());
        Process p = pb.start();
        boolean done = p.waitFor(12, TimeUnit.MINUTES);
        if (!done) {
            p.destroyForcibly();
        }
        String out = Files.readString(dir.resolve("child.log"), StandardCharsets.UTF_8);
        assertThat(done).as("child finished").isTrue();
        assertThat(p.exitValue()).as(out).isZero();
        assertThat(out).contains("values=1000000 before=500000 after=500000 exact=true maxHeapMB=");
        assertThat(new File(file.toString())).exists();
    }
}
