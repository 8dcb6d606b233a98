package org.holdpoint.importer;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.catchThrowable;
import static org.holdpoint.importer.Workbooks.row;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.nio.file.attribute.PosixFilePermissions;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import java.util.function.Function;
import java.util.stream.Stream;
import org.apache.poi.hssf.record.crypto.Biff8EncryptionKey;
import org.apache.poi.hssf.usermodel.HSSFWorkbook;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.usermodel.FormulaError;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.holdpoint.study.Layout;
import org.junit.jupiter.api.Assumptions;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * The corpus of bad inputs, each made here: every one must fail with one {@link ImportException}
 * whose message names the file and says what is wrong, never another exception, and must leave the
 * input's bytes and timestamp as they were.
 */
class BadFileCorpusTest {
    @TempDir
    static Path dir;

    /** One bad input: its name, how to make it, how to read it, and a fragment the message must hold. */
    record Case(String name, Function<Path, Path> make, Function<Path, ImportRequest> request, String fragment) {
        @Override
        public String toString() {
            return name;
        }
    }

    private static Case c(String name, Function<Path, Path> make, String fragment) {
        return new Case(name, make, ImportRequest::of, fragment);
    }

    private static Path text(Path d, String file, String content) {
        return TestData.write(d, file, content);
    }

    private static Path bytes(Path d, String file, byte[] content) {
        return TestData.write(d, file, content);
    }

    private static byte[] validXlsx(Path d) {
        Path p = Workbooks.xlsx(d.resolve("valid-" + System.nanoTime() + ".xlsx"), row("phase", "value"),
                row("before", 1.0), row("before", 2.0), row("after", 3.0), row("after", 4.0));
        byte[] b = BadFiles.bytes(p);
        try {
            Files.delete(p);
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
        return b;
    }

    private static XSSFWorkbook small() {
        XSSFWorkbook wb = new XSSFWorkbook();
        Sheet s = wb.createSheet("Data");
        Object[][] rows = {{"phase", "value"}, {"before", 1.0}, {"after", 2.0}};
        for (int r = 0; r < rows.length; r++) {
            Row row = s.createRow(r);
            row.createCell(0).setCellValue((String) rows[r][0]);
            if (rows[r][1] instanceof String t) {
                row.createCell(1).setCellValue(t);
            } else {
                row.createCell(1).setCellValue((Double) rows[r][1]);
            }
        }
        return wb;
    }

    static Stream<Case> corpus() {
        List<Case> cases = new ArrayList<>();
        cases.add(c("truncated xlsx (first half)", d -> {
            byte[] v = validXlsx(d);
            return bytes(d, "half.xlsx", Arrays.copyOf(v, v.length / 2));
        }, "cannot be read as a spreadsheet workbook"));
        cases.add(c("truncated xlsx (end cut off)", d -> {
            byte[] v = validXlsx(d);
            return bytes(d, "cut.xlsx", Arrays.copyOf(v, v.length - 40));
        }, "workbook"));
        cases.add(c("zip that is not a workbook", d -> bytes(d, "notes.xlsx",
                BadFiles.zip(java.util.Map.of("readme.txt", "hello".getBytes(StandardCharsets.UTF_8)))),
                "not a spreadsheet workbook"));
        cases.add(c("empty zip", d -> bytes(d, "empty-zip.xlsx", BadFiles.zip(java.util.Map.of())), "workbook"));
        cases.add(c("renamed pdf (.xlsx)", d -> text(d, "report.xlsx", "%PDF-1.7\n%âãÏÓ\n1 0 obj\n<<>>\nendobj\n"),
                "is a PDF document"));
        cases.add(c("renamed pdf (.csv)", d -> text(d, "report.csv", "%PDF-1.4\n1 0 obj\n"), "is a PDF document"));
        cases.add(c("password-protected xlsx", d -> bytes(d, "locked.xlsx", BadFiles.encrypted(small(), "s3cret")),
                "protected with a password"));
        cases.add(c("password-protected xls", d -> {
            Path p = d.resolve("locked.xls");
            Biff8EncryptionKey.setCurrentUserPassword("s3cret");
            try (HSSFWorkbook wb = new HSSFWorkbook()) {
                Sheet s = wb.createSheet("Data");
                s.createRow(0).createCell(0).setCellValue("before");
                s.createRow(1).createCell(0).setCellValue(1.0);
                try (var out = Files.newOutputStream(p)) {
                    wb.write(out);
                }
            } catch (IOException e) {
                throw new java.io.UncheckedIOException(e);
            } finally {
                Biff8EncryptionKey.setCurrentUserPassword(null);
            }
            return p;
        }, "protected with a password"));
        cases.add(c("zip bomb", d -> bytes(d, "bomb.xlsx", BadFiles.zipBomb(validXlsx(d))), "expands far more than the parts of a real workbook"));
        cases.add(c("16,384 columns of noise", d -> {
            SplittableRandom rnd = new SplittableRandom(16384);
            try (XSSFWorkbook wb = new XSSFWorkbook()) {
                Sheet s = wb.createSheet("Noise");
                for (int r = 0; r < 3; r++) {
                    Row row = s.createRow(r);
                    for (int col = 0; col < 16_384; col++) {
                        if (r == 0 || rnd.nextBoolean()) {
                            row.createCell(col).setCellValue(Long.toString(rnd.nextLong(), 36));
                        } else {
                            row.createCell(col).setCellValue(rnd.nextDouble());
                        }
                    }
                }
                Path p = d.resolve("noise.xlsx");
                try (var out = Files.newOutputStream(p)) {
                    wb.write(out);
                }
                return p;
            } catch (IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        }, "cannot tell the layout"));
        cases.add(c("empty sheet", d -> Workbooks.xlsx(d.resolve("empty-sheet.xlsx"), true,
                new Workbooks.SheetSpec("Data", List.of())), "holds no data"));
        cases.add(c("empty csv", d -> bytes(d, "empty.csv", new byte[0]), "is empty"));
        cases.add(c("header only (csv)", d -> text(d, "header.csv", "phase,value\n"), "only a header row"));
        cases.add(c("header only (xlsx)", d -> Workbooks.xlsx(d.resolve("header.xlsx"), row("before", "after")),
                "only a header row"));
        cases.add(c("one group missing", d -> text(d, "onlybefore.csv", "phase,value\nbefore,1\nbefore,2\n"),
                "no after values"));
        cases.add(c("after column empty", d -> text(d, "noafter.csv", "before,after\n1,\n2,\n"), "no after values"));
        cases.add(c("labels that match neither", d -> text(d, "labels.csv",
                "phase,value\nold,1\nold,2\nnew,3\nnew,4\n"), "\"old\", \"new\""));
        cases.add(c("no group column, no before/after columns", d -> text(d, "plain.csv", "a,b\nx,1\ny,2\n"),
                "cannot tell the layout"));
        cases.add(new Case("duplicate unit ids (paired)", d -> text(d, "dup.csv",
                "unit,before,after\nU1,1,2\nU2,1.5,2.5\nU1,1.1,2.1\n"), p -> ImportRequest.of(p).withPaired(true),
                "unit id \"U1\" appears twice"));
        cases.add(new Case("unequal pairs: no unit in both files", d -> {
            text(d, "pb.csv", "unit,value\nA1,1\nA2,2\n");
            return text(d, "pa.csv", "unit,value\nB1,1\nB2,2\n");
        }, p -> ImportRequest.ofTwo(p.resolveSibling("pb.csv"), p).withPaired(true), "no unit id occurs in both"));
        cases.add(new Case("paired without a unit id column", d -> text(d, "nounit.csv",
                "before,after\n1,2\n3,\n"), p -> ImportRequest.of(p).withPaired(true), "never matched by row"));
        cases.add(c("unquoted decimal comma in a comma-separated file", d -> text(d, "split.csv",
                "phase,value\nbefore,10.001\nbefore,10.003\nbefore,10,002\nafter,10.004\nafter,10.000\n"),
                "line 4 has more fields than the header"));
        cases.add(c("NUL byte after the first 64 KiB", d -> {
            StringBuilder sb = new StringBuilder("phase,value\n");
            while (sb.length() < 70_000) {
                sb.append("before,10.001\nafter,10.002\n");
            }
            sb.append("after,10.0\u00000\n");
            return text(d, "nul-late.csv", sb.toString());
        }, "holds a NUL byte"));
        cases.add(c("two value columns", d -> text(d, "twin.csv",
                "phase,value,value\nbefore,1,9\nbefore,2,8\nafter,3,7\nafter,4,6\n"),
                "columns B and C are both named \"value\""));
        cases.add(c("mixed decimal separators (csv)", d -> text(d, "mixed.csv",
                "phase;value\nbefore;10,5\nbefore;10,6\nafter;10.7\nafter;10,8\n"), "mixed decimal separators"));
        cases.add(c("mixed decimal separators (xlsx, text cells)", d -> Workbooks.xlsx(d.resolve("mixed.xlsx"),
                row("phase", "value"), row("before", "1.5"), row("before", "1,6"), row("after", 1.7),
                row("after", 1.8)), "with a decimal comma in B3; with a decimal point in B2"));
        cases.add(c("NaN and Infinity as text", d -> text(d, "nan.csv",
                "phase,value\nbefore,1\nbefore,2\nafter,NaN\nafter,Infinity\nafter,-Infinity\n"),
                "not a finite number"));
        cases.add(c("value column of dates (xlsx)", d -> Workbooks.xlsx(d.resolve("dates.xlsx"), row("phase", "value"),
                row("before", LocalDate.of(2026, 1, 5)), row("before", LocalDate.of(2026, 1, 6)),
                row("after", LocalDate.of(2026, 2, 5)), row("after", LocalDate.of(2026, 2, 6))), "date or time"));
        cases.add(c("value column of dates (csv)", d -> text(d, "dates.csv",
                "phase,value\nbefore,2026-01-05\nbefore,2026-01-06\nafter,2026-02-05\nafter,2026-02-06\n"),
                "date or time"));
        cases.add(c("only error values", d -> Workbooks.xlsx(d.resolve("errors.xlsx"), row("before", "after"),
                row(1.0, new Workbooks.Err(FormulaError.DIV0)), row(2.0, new Workbooks.Err(FormulaError.NA))),
                "error value"));
        cases.add(c("binary noise named .csv", d -> {
            byte[] b = new byte[4096];
            new SplittableRandom(4096).nextBytes(b);
            b[10] = 0;
            return bytes(d, "noise.csv", b);
        }, "not a text file"));
        cases.add(c("OLE2 document that is not a workbook", d -> bytes(d, "letter.xls", BadFiles.oleWithoutWorkbook()),
                "not a spreadsheet workbook"));
        cases.add(c("unbalanced quote", d -> text(d, "quote.csv", "phase,value\nbefore,\"1\nafter,2\n"),
                "quotes"));
        cases.add(c("no header above the numbers", d -> text(d, "noheader.csv", "1,2\n3,4\n5,6\n"),
                "no header row"));
        cases.add(c("all values text", d -> text(d, "na.csv", "before,after\nn/a,n/a\nn/a,n/a\n"),
                "text, not a number"));
        cases.add(c("before column without after column", d -> text(d, "lonely.csv",
                "bore before,wall after\n1,2\n"), "no matching after column"));
        cases.add(new Case("characteristic missing from the after file", d -> {
            text(d, "cb.csv", "bore,wall\n1,2\n1.1,2.1\n");
            return text(d, "ca.csv", "bore,depth\n1,2\n1.1,2.1\n");
        }, p -> ImportRequest.ofTwo(p.resolveSibling("cb.csv"), p), "not in the after file"));
        cases.add(new Case("side by side requested, no such columns", d -> text(d, "forced.csv",
                "phase,value\nbefore,1\nafter,2\n"), p -> ImportRequest.of(p).withLayout(Layout.SIDE_BY_SIDE),
                "needs a before column and an after column"));
        cases.add(new Case("sheet that does not exist", d -> Workbooks.xlsx(d.resolve("sheets.xlsx"),
                row("before", "after"), row(1.0, 2.0)), p -> ImportRequest.of(p).withSheet("Results"),
                "has no sheet \"Results\""));
        cases.add(c("sheet XML cut off inside a valid zip", d -> {
            java.util.Map<String, byte[]> m = BadFiles.unzip(validXlsx(d));
            byte[] sheet = m.get("xl/worksheets/sheet1.xml");
            m.put("xl/worksheets/sheet1.xml", Arrays.copyOf(sheet, sheet.length * 2 / 3));
            return bytes(d, "cutxml.xlsx", BadFiles.zip(m));
        }, "truncated"));
        cases.add(c("two columns for one characteristic", d -> text(d, "twice.csv",
                "phase,bore,wall,Bore\nbefore,1,2,3\nafter,1,2,3\n"), "has two columns (B and D)"));
        cases.add(c("a folder instead of a file", d -> {
            try {
                return Files.createDirectories(d.resolve("folder.xlsx"));
            } catch (IOException e) {
                throw new java.io.UncheckedIOException(e);
            }
        }, "is a folder"));
        return cases.stream();
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("corpus")
    void failsWithOneClearMessageAndLeavesTheFileAlone(Case bad) throws IOException {
        Path d = Files.createDirectories(dir.resolve(bad.name().replaceAll("[^A-Za-z0-9]+", "-")));
        Path file = bad.make().apply(d);
        FileTime mtime = FileTime.fromMillis(1_700_000_000_000L);
        boolean regular = Files.isRegularFile(file);
        byte[] before = regular ? Files.readAllBytes(file) : null;
        if (regular) {
            Files.setLastModifiedTime(file, mtime);
        }
        Throwable t = catchThrowable(() -> new DataImporter().read(bad.request().apply(file)));
        if (Boolean.getBoolean("holdpoint.printMessages") && t != null) {
            System.out.println("[" + bad.name() + "] " + t.getMessage());
        }
        assertThat(t).as(bad.name()).isInstanceOf(ImportException.class);
        String msg = t.getMessage();
        assertThat(msg).as(bad.name()).contains(bad.fragment()).doesNotContain("\tat ")
                .doesNotContain("Exception:");
        assertThat(msg).as(bad.name()).contains(file.getFileName().toString().equals("pa.csv")
                || file.getFileName().toString().equals("ca.csv") ? "" : file.getFileName().toString());
        if (regular) {
            assertThat(Files.readAllBytes(file)).as(bad.name() + ": bytes unchanged").isEqualTo(before);
            assertThat(Files.getLastModifiedTime(file)).as(bad.name() + ": timestamp unchanged").isEqualTo(mtime);
        }
        try (Stream<Path> left = Files.list(d)) {
            assertThat(left.filter(p -> !p.equals(file) && !p.getFileName().toString().matches("p[ab]\\.csv|c[ab]\\.csv")))
                    .as("no output or temporary file left").isEmpty();
        }
    }

    @Test
    void corpusHasAtLeastThirtyFiles() {
        assertThat(corpus().count()).isGreaterThanOrEqualTo(30);
    }

    @Test
    void missingFile() {
        Throwable t = catchThrowable(() -> new DataImporter().read(ImportRequest.of(dir.resolve("nowhere.csv"))));
        assertThat(t).isInstanceOf(ImportException.class).hasMessageContaining("nowhere.csv was not found");
    }

    @Test
    void fileWithoutReadPermission() throws IOException {
        // as root every file stays readable, so this case only runs for ordinary users
        Assumptions.assumeFalse("root".equals(System.getProperty("user.name")), "root can read any file");
        Path p = TestData.write(Files.createDirectories(dir.resolve("perm")), "secret.csv", "before,after\n1,2\n");
        Files.setPosixFilePermissions(p, PosixFilePermissions.fromString("---------"));
        Throwable t = catchThrowable(() -> new DataImporter().read(ImportRequest.of(p)));
        assertThat(t).isInstanceOf(ImportException.class).hasMessageContaining("permission denied");
    }
}
