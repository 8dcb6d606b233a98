package org.holdpoint.workflow;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;

/**
 * The window's "open the demo" copies the bundled study into a temporary folder for the session; the copies are
 * there while the program runs and gone when it ends (a program that runs the demo a hundred times must not leave a
 * hundred folders behind).
 */
class DemoCopyTest {
    /** The child program: copies the demo, prints the copy's path and whether it exists, and ends. */
    public static final class Child {
        public static void main(String[] args) {
            Path data = new StudyService(ArchiveAccess.none()).extractDemo().file();
            System.out.println(data.toAbsolutePath() + "\t" + Files.isRegularFile(data));
        }
    }

    @Test
    void theDemoCopiesAreThereWhileTheProgramRunsAndGoneAfter() throws Exception {
        String java = Path.of(System.getProperty("java.home"), "bin", "java").toString();
        Process p = new ProcessBuilder(List.of(java, "-cp", System.getProperty("java.class.path"),
                Child.class.getName())).redirectErrorStream(true).start();
        String out = new String(p.getInputStream().readAllBytes(), StandardCharsets.UTF_8).strip();
        assertThat(p.waitFor(60, TimeUnit.SECONDS)).isTrue();
        assertThat(p.exitValue()).as(out).isZero();
        String[] parts = out.substring(out.lastIndexOf('\n') + 1).split("\t");
        assertThat(parts[1]).as("the copy existed while the program ran").isEqualTo("true");
        Path data = Path.of(parts[0]);
        assertThat(data.getFileName().toString()).endsWith(".csv");
        assertThat(Files.exists(data)).as("the copy after the program ended").isFalse();
        assertThat(Files.exists(data.getParent())).as("its folder after the program ended").isFalse();
    }
}
