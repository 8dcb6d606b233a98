package org.holdpoint.archive;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Collections;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.holdpoint.study.ArchiveQuery;
import org.holdpoint.study.StudyVersion;
import org.holdpoint.study.VerificationReport;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Kills a child JVM (SIGKILL via destroyForcibly) while it is archiving into an H2 file, three times in a row
 * on the same file, then checks that the archive opens, verify() passes and every study the child reported as
 * committed is there; and halts a child (Runtime.halt) at a known point inside a write transaction.
 */
class CrashConsistencyTest {

    private static final int COMMITS_BEFORE_KILL = 25;

    @Test
    void killingTheProcessMidArchivingLeavesAConsistentArchive(@TempDir Path dir) throws Exception {
        String url = ArchiveLocation.embeddedUrl(dir);
        List<String> committed = new ArrayList<>();
        for (int run = 0; run < 3; run++) {
            committed.addAll(runAndKill(url, "r" + run));
        }
        try (JdbcArchive archive = JdbcArchive.open(url)) {
            VerificationReport report = archive.verify();
            assertThat(report.problems()).isEmpty();
            List<String> stored = archive.list(ArchiveQuery.withDefaults()).stream().map(StudyVersion::changeId)
                    .toList();
            // a commit the child saw return must survive the kill (WRITE_DELAY=0)
            assertThat(stored).containsAll(committed);
            assertThat(report.studiesChecked()).isEqualTo(stored.size());
            assertThat(stored).doesNotHaveDuplicates();
        }
    }

    @Test
    void haltingInsideASigningTransactionLeavesNoHalfWrittenSignature(@TempDir Path dir) throws Exception {
        String url = ArchiveLocation.embeddedUrl(dir);
        // per study i the child reads the clock once in add and, for even i, once more in sign after it has
        // inserted the signature row: sign of study i = 2k is clock reading 3k + 2, so 32 is the sign of study 20
        Process p = child(url, "halt", "32").redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
        assertThat(p.waitFor(120, TimeUnit.SECONDS)).isTrue();
        assertThat(p.exitValue()).isEqualTo(3);
        try (JdbcArchive archive = JdbcArchive.open(url)) {
            VerificationReport report = archive.verify();
            assertThat(report.problems()).isEmpty();
            assertThat(report.studiesChecked()).isEqualTo(21); // studies 0 … 20
            assertThat(report.signaturesChecked()).isEqualTo(10); // even studies 0 … 18
            assertThat(archive.currentVersion("CRASH-halt-20").orElseThrow().signatures()).isEmpty();
            assertThat(archive.currentVersion("CRASH-halt-18").orElseThrow().signers()).containsExactly("Quinn");
        }
    }

    private static ProcessBuilder child(String url, String... args) {
        String classpath = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        List<String> command = new ArrayList<>(List.of(Path.of(System.getProperty("java.home"), "bin", "java")
                .toString(), "-cp", classpath, "-Xmx256m", CrashChild.class.getName(), url));
        command.addAll(List.of(args));
        return new ProcessBuilder(command).redirectError(ProcessBuilder.Redirect.DISCARD);
    }

    private static List<String> runAndKill(String url, String label) throws IOException, InterruptedException {
        Process p = child(url, label).start();
        List<String> committed = Collections.synchronizedList(new ArrayList<>());
        Thread reader = new Thread(() -> read(p, committed), "crash-child-reader");
        reader.start();
        long deadline = System.nanoTime() + TimeUnit.SECONDS.toNanos(60);
        while (committed.size() < COMMITS_BEFORE_KILL && p.isAlive() && System.nanoTime() < deadline) {
            Thread.sleep(5);
        }
        p.destroyForcibly();
        assertThat(p.waitFor(30, TimeUnit.SECONDS)).isTrue();
        reader.join(TimeUnit.SECONDS.toMillis(30));
        assertThat(committed).as("commits of run %s before the kill", label)
                .hasSizeGreaterThanOrEqualTo(COMMITS_BEFORE_KILL);
        return new ArrayList<>(committed);
    }

    private static void read(Process p, List<String> committed) {
        try (BufferedReader out = new BufferedReader(new InputStreamReader(p.getInputStream(),
                StandardCharsets.UTF_8))) {
            String line;
            while ((line = out.readLine()) != null) {
                if (line.startsWith("committed ")) {
                    committed.add(line.substring("committed ".length()));
                }
            }
        } catch (IOException e) {
            // the stream closes when the child is killed; lines read so far are kept
        }
    }
}
