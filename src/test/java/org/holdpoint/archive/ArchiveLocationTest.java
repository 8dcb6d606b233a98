package org.holdpoint.archive;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.util.Map;
import org.junit.jupiter.api.Test;

/** The embedded archive's folder follows the XDG Base Directory Specification 0.8 ($XDG_DATA_HOME). */
class ArchiveLocationTest {

    private static final Path HOME = Path.of("/home/petra");

    @Test
    void usesXdgDataHomeWhenSetAndAbsolute() {
        assertThat(ArchiveLocation.defaultFolder(Map.of("XDG_DATA_HOME", "/data/petra"), HOME))
                .isEqualTo(Path.of("/data/petra/holdpoint/archive"));
    }

    @Test
    void fallsBackToLocalShareWhenUnsetBlankOrRelative() {
        Path expected = Path.of("/home/petra/.local/share/holdpoint/archive");
        assertThat(ArchiveLocation.defaultFolder(Map.of(), HOME)).isEqualTo(expected);
        assertThat(ArchiveLocation.defaultFolder(Map.of("XDG_DATA_HOME", " "), HOME)).isEqualTo(expected);
        // the specification says a relative path must be ignored
        assertThat(ArchiveLocation.defaultFolder(Map.of("XDG_DATA_HOME", "rel/dir"), HOME)).isEqualTo(expected);
    }

    @Test
    void theEmbeddedUrlIsAnH2FileThatWritesEachCommit() {
        assertThat(ArchiveLocation.embeddedUrl(Path.of("/a/b")))
                .isEqualTo("jdbc:h2:file:/a/b/holdpoint;WRITE_DELAY=0");
    }
}
