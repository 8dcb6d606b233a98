package org.holdpoint.archive;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.BufferedReader;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.holdpoint.study.ArchiveException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The embedded archive open in another program is refused in the archive's words, not with the
 * database engine's advice about its own server mode (H2's error 90020).
 */
class ArchiveInUseTest {
    @TempDir
    Path dir;

    @Test
    void anArchiveOpenElsewhereIsRefusedInPlainWords() throws Exception {
        String url = "jdbc:h2:file:" + dir.resolve("db").toAbsolutePath() + "/holdpoint";
        try (JdbcArchive created = JdbcArchive.open(url)) {
            assertThat(created).isNotNull();
        }
        String classpath = System.getProperty("surefire.test.class.path", System.getProperty("java.class.path"));
        Process p = new ProcessBuilder(List.of(Path.of(System.getProperty("java.home"), "bin", "java").toString(),
                "-cp", classpath, HoldingChild.class.getName(), url)).redirectError(ProcessBuilder.Redirect.DISCARD)
                .start();
        try {
            BufferedReader out = new BufferedReader(new InputStreamReader(p.getInputStream(), StandardCharsets.UTF_8));
            assertThat(out.readLine()).isEqualTo("open");
            assertThatThrownBy(() -> {
                try (JdbcArchive second = JdbcArchive.open(url)) {
                    second.list(org.holdpoint.study.ArchiveQuery.withDefaults());
                }
            }).isInstanceOf(ArchiveException.class).hasMessageContaining("is open in another Holdpoint program")
                    .hasMessageNotContaining("server mode");
        } finally {
            p.destroy();
            p.waitFor(30, TimeUnit.SECONDS);
        }
    }
}
