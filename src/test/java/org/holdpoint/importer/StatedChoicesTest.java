package org.holdpoint.importer;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.SkippedCell;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Inputs that used to be read with a silent choice are now read as the user meant them or reported in
 * the user's words (docs/import.md). Invented data: a spring free length before and after a coiling-
 * machine change.
 */
class StatedChoicesTest {
    @TempDir
    Path dir;

    private static final String CSV = "phase,Free length\nbefore,31.02\nbefore,31.05\nbefore,30.98\n"
            + "after,31.01\nafter,31.04\nafter,30.99\n";

    /** UTF-16 saved without a byte-order mark is text (its NUL bytes alternate), not "binary data". */
    @Test
    void utf16WithoutAByteOrderMarkIsRead() {
        for (java.nio.charset.Charset cs : new java.nio.charset.Charset[] {StandardCharsets.UTF_16LE,
            StandardCharsets.UTF_16BE}) {
            Path f = TestData.write(dir, "spring-" + cs.name() + ".csv", CSV.getBytes(cs));
            Dataset d = TestData.read(f);
            assertThat(d.characteristics()).hasSize(1);
            assertThat(d.characteristics().get(0).name()).isEqualTo("Free length");
            assertThat(d.characteristics().get(0).before().sample().values()).containsExactly(31.02, 31.05, 30.98);
        }
    }

    /** A 30,000-character text in a value cell is reported by its start and its length, not echoed whole. */
    @Test
    void aHugeTextCellIsShortenedInTheReport() {
        String huge = "x".repeat(30_000);
        Path f = TestData.write(dir, "huge.csv", "phase,Free length\nbefore,31.02\nbefore," + huge
                + "\nbefore,30.98\nbefore,31.00\nafter,31.01\nafter,31.04\nafter,30.99\n");
        Dataset d = TestData.read(f);
        SkippedCell s = d.report().firstSkipped().get(0);
        assertThat(s.origin().cell()).isEqualTo("B3");
        assertThat(s.text()).hasSizeLessThan(120).startsWith("xxxx").endsWith("(30,000 characters)");
    }
}
