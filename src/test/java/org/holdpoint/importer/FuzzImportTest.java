package org.holdpoint.importer;

import static org.assertj.core.api.Assertions.assertThat;
import static org.holdpoint.importer.Workbooks.row;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Map;
import java.util.SplittableRandom;
import org.holdpoint.study.Dataset;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/**
 * Seeded mutation fuzzing: valid workbooks and CSV files with bytes flipped, inserted, deleted,
 * duplicated or cut off (of the file, and of the sheet XML inside the zip). The importer must either
 * succeed or fail with {@link ImportException}; no other exception may escape.
 */
class FuzzImportTest {
    private static final long SEED = 20261201L;
    private static final String INSERTS = "<>\"'&;,.0123456789\n\r\t e-/";

    @TempDir
    Path dir;

    @Test
    @Timeout(300)
    void mutatedWorkbookBytes() throws Exception {
        byte[] valid = Files.readAllBytes(validWorkbook("v.xlsx"));
        SplittableRandom rnd = new SplittableRandom(SEED);
        int ok = 0;
        for (int i = 0; i < 400; i++) {
            ok += run("xlsx bytes", i, "f.xlsx", mutate(valid, rnd));
        }
        // the zip's checksums catch most byte edits: most mutants are refused (with a message, checked in run),
        // and the few that read are whole workbooks (also checked in run); both kinds occur with this seed
        assertThat(ok).as("mutants refused").isLessThan(400);
        assertThat(refused).as("every refusal named the file").isEqualTo(400 - ok);
    }

    @Test
    @Timeout(300)
    void mutatedSheetXml() throws Exception {
        Map<String, byte[]> parts = BadFiles.unzip(Files.readAllBytes(validWorkbook("w.xlsx")));
        SplittableRandom rnd = new SplittableRandom(SEED + 1);
        int ok = 0;
        for (int i = 0; i < 400; i++) {
            Map<String, byte[]> m = new java.util.LinkedHashMap<>(parts);
            String part = rnd.nextInt(4) == 0 ? "xl/sharedStrings.xml" : "xl/worksheets/sheet1.xml";
            m.put(part, mutate(parts.get(part), rnd));
            ok += run("sheet xml", i, "x.xlsx", BadFiles.zip(m));
        }
        assertThat(ok).as("mild XML mutants still read").isPositive();
    }

    @Test
    @Timeout(300)
    void mutatedXlsBytes() throws Exception {
        byte[] valid = Files.readAllBytes(Workbooks.xls(dir.resolve("v.xls"), row("unit", "before", "after"),
                row("U1", 1.0, 1.1), row("U2", "2.0", 2.1), row("U3", 3.0, null)));
        SplittableRandom rnd = new SplittableRandom(SEED + 3);
        int ok = 0;
        for (int i = 0; i < 300; i++) {
            ok += run("xls bytes", i, "f.xls", mutate(valid, rnd));
        }
        assertThat(ok).as("mutants of unused bytes still read").isPositive();
    }

    @Test
    @Timeout(300)
    void mutatedCsv() {
        byte[] valid = ("Trial 3\nunit;phase;value (mm);lot\nU1;before;10,01;L1\nU2;before;10,02;L1\n"
                + "U3;after;\"10,03\";L2\nU4;after;10,04;L2\nU5;after;n/a;L2\n").getBytes(StandardCharsets.UTF_8);
        SplittableRandom rnd = new SplittableRandom(SEED + 2);
        int ok = 0;
        for (int i = 0; i < 1500; i++) {
            ok += run("csv", i, "c.csv", mutate(valid, rnd));
        }
        assertThat(ok).as("mild CSV mutants still read").isPositive();
    }

    private int refused;

    private int run(String what, int i, String name, byte[] bytes) {
        Path f = TestData.write(dir, name, bytes);
        try {
            for (boolean paired : new boolean[] {false, true}) {
                try {
                    Dataset d = new DataImporter().read(ImportRequest.of(f).withPaired(paired));
                    assertThat(d.characteristics()).isNotEmpty();
                    return 1;
                } catch (ImportException expected) {
                    assertThat(expected.getMessage()).as("a refusal names the file").contains(name);
                }
            }
            refused++;
            return 0;
        } catch (RuntimeException | Error e) {
            throw new AssertionError(what + " mutant " + i + " let " + e + " escape", e);
        }
    }

    private Path validWorkbook(String name) {
        return Workbooks.xlsx(dir.resolve(name), row("Cover plate"), null, row("unit", "phase", "bore (mm)", "wall"),
                row("U1", "before", 10.01, 2.1), row("U2", "before", "10.02", 2.2), row("U1", "after", 10.03, 2.3),
                row("U2", "after", 10.04, true), row("U3", "after", 10.05, 2.5));
    }

    /** One to three random edits: flip, insert, delete, duplicate a run, or cut off the end. */
    static byte[] mutate(byte[] in, SplittableRandom rnd) {
        byte[] b = in.clone();
        int edits = 1 + rnd.nextInt(3);
        for (int e = 0; e < edits && b.length > 1; e++) {
            int at = rnd.nextInt(b.length);
            switch (rnd.nextInt(5)) {
                case 0 -> b[at] = (byte) rnd.nextInt(256);
                case 1 -> {
                    byte[] n = new byte[b.length + 1];
                    System.arraycopy(b, 0, n, 0, at);
                    n[at] = (byte) INSERTS.charAt(rnd.nextInt(INSERTS.length()));
                    System.arraycopy(b, at, n, at + 1, b.length - at);
                    b = n;
                }
                case 2 -> {
                    byte[] n = new byte[b.length - 1];
                    System.arraycopy(b, 0, n, 0, at);
                    System.arraycopy(b, at + 1, n, at, b.length - at - 1);
                    b = n;
                }
                case 3 -> {
                    int len = Math.min(1 + rnd.nextInt(64), b.length - at);
                    byte[] n = new byte[b.length + len];
                    System.arraycopy(b, 0, n, 0, at + len);
                    System.arraycopy(b, at, n, at + len, b.length - at);
                    b = n;
                }
                default -> b = Arrays.copyOf(b, Math.max(1, at));
            }
        }
        return b;
    }
}
