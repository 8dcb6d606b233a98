package org.holdpoint.workflow;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.function.Consumer;
import java.util.stream.Stream;
import java.util.zip.ZipEntry;
import java.util.zip.ZipOutputStream;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.util.CellReference;
import org.apache.poi.xssf.usermodel.XSSFCellStyle;
import org.apache.poi.xssf.usermodel.XSSFFont;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.study.Progress;
import org.holdpoint.result.StudyResult;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * What a reader of the workbook sees cannot change while verify says INTACT: each edit below leaves
 * every written value as it was and changes only what is shown around it, how it is shown, or the
 * workbook's structure (docs/signoff-workbook.md, "What verify compares").
 */
class TamperEvidenceTest {
    @TempDir
    Path dir;
    Path file;

    @BeforeEach
    void write() throws IOException {
        file = dir.resolve("CR-2026-0117.xlsx");
        ChangeStudy study = ReportFixtures.study();
        StudyResult result = ReportFixtures.analyze(study);
        new ReportUseCase(SignoffWorkbookTest.CLOCK).write(study, result, ReportOptions.withDefaults()
                .withCharts(ReportFixtures.charts()), file);
    }

    private static Cell cell(XSSFWorkbook wb, String sheet, String ref) {
        XSSFSheet sh = wb.getSheet(sheet);
        CellReference cr = new CellReference(ref);
        Row row = sh.getRow(cr.getRow()) != null ? sh.getRow(cr.getRow()) : sh.createRow(cr.getRow());
        return row.getCell(cr.getCol(), Row.MissingCellPolicy.CREATE_NULL_AS_BLANK);
    }

    private static XSSFCellStyle restyle(XSSFWorkbook wb, Cell c) {
        XSSFCellStyle s = wb.createCellStyle();
        s.cloneStyleFrom(c.getCellStyle());
        c.setCellStyle(s);
        return s;
    }

    static Stream<Arguments> edits() {
        return Stream.of(
                Arguments.of("the verdict in white", (Consumer<XSSFWorkbook>) wb -> {
                    Cell c = cell(wb, "Summary", "D10");
                    XSSFCellStyle s = restyle(wb, c);
                    XSSFFont f = wb.createFont();
                    f.setColor(org.apache.poi.ss.usermodel.IndexedColors.WHITE.getIndex());
                    s.setFont(f);
                }, "how it is shown"),
                Arguments.of("a format that shows other text", (Consumer<XSSFWorkbook>) wb -> {
                    Cell c = cell(wb, "Summary", "D10");
                    restyle(wb, c).setDataFormat(wb.createDataFormat().getFormat(";;;\"CHANGE VERIFIED\""));
                }, "how it is shown"),
                Arguments.of("a format with fewer decimals", (Consumer<XSSFWorkbook>) wb -> {
                    Cell c = cell(wb, "Summary", "E15");
                    restyle(wb, c).setDataFormat(wb.createDataFormat().getFormat("0.00"));
                }, "how it is shown"),
                Arguments.of("a failed row hidden", (Consumer<XSSFWorkbook>) wb ->
                        wb.getSheet("Summary").getRow(15).setZeroHeight(true), "row visibility"),
                Arguments.of("a column hidden", (Consumer<XSSFWorkbook>) wb ->
                        wb.getSheet("Summary").setColumnHidden(16, true), "column visibility"),
                Arguments.of("text beside the verdict", (Consumer<XSSFWorkbook>) wb ->
                        cell(wb, "Summary", "H10").setCellValue("\u2714 CHANGE VERIFIED \u2014 released by QA"),
                        "a cell the workbook was written without"),
                Arguments.of("an approval under the sign-off block", (Consumer<XSSFWorkbook>) wb ->
                        cell(wb, "Sign-off", "B13").setCellValue("Approved: J. Okafor, 2026-12-02"),
                        "a cell the workbook was written without"),
                Arguments.of("a raw data row appended", (Consumer<XSSFWorkbook>) wb -> {
                    XSSFSheet sh = wb.getSheet("Raw data");
                    Row r = sh.createRow(sh.getLastRowNum() + 1);
                    r.createCell(0).setCellValue("Bore diameter");
                    r.createCell(3).setCellValue(25.011);
                }, "a cell the workbook was written without"),
                Arguments.of("an extra sheet", (Consumer<XSSFWorkbook>) wb -> {
                    wb.unLock();
                    wb.createSheet("Approval").createRow(0).createCell(0).setCellValue("Released");
                }, "sheets and their order"),
                Arguments.of("sheets reordered", (Consumer<XSSFWorkbook>) wb -> {
                    wb.unLock();
                    wb.setSheetOrder("Cautions", 0);
                }, "sheets and their order"),
                Arguments.of("a sheet hidden", (Consumer<XSSFWorkbook>) wb -> {
                    wb.unLock();
                    wb.setSheetHidden(wb.getSheetIndex("Cautions"), true);
                }, "sheet visibility"),
                Arguments.of("a template label edited", (Consumer<XSSFWorkbook>) wb ->
                        cell(wb, "Summary", "B10").setCellValue("Verdict (final)"), "B10"),
                Arguments.of("the verdict's name moved", (Consumer<XSSFWorkbook>) wb ->
                        wb.getName("HP_OverallVerdict").setRefersToFormula("'Summary'!$H$10"),
                        "defined name HP_OverallVerdict"),
                Arguments.of("a record label edited", (Consumer<XSSFWorkbook>) wb ->
                        cell(wb, "Record", "A5").setCellValue("chunk count"), "record label"),
                Arguments.of("a note on the record sheet", (Consumer<XSSFWorkbook>) wb ->
                        cell(wb, "Record", "D3").setCellValue("checked ok"), "a cell the workbook was written without"),
                Arguments.of("the record heading edited", (Consumer<XSSFWorkbook>) wb ->
                        cell(wb, "Record", "A1").setCellValue("notes"), "record heading"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("edits")
    void anEditOfWhatAReaderSeesIsFound(String name, Consumer<XSSFWorkbook> edit, String what) throws IOException {
        Path edited = dir.resolve("edited.xlsx");
        try (XSSFWorkbook wb = SignoffWorkbookTest.open(file)) {
            edit.accept(wb);
            try (OutputStream out = Files.newOutputStream(edited)) {
                wb.write(out);
            }
        }
        VerifyResult r = new VerifyUseCase().verify(edited, null, Progress.NONE);
        assertThat(r.status()).as(name).isEqualTo(VerifyResult.Status.EDITED);
        assertThat(r.differences()).as(name).anyMatch(d -> d.what().contains(what) || d.cell().equals(what));
    }

    /** A damaged chunk count is said, never read as "no record" (it used to become 0). */
    @Test
    void aDamagedChunkCountIsRefusedLoudly() throws IOException {
        Path edited = dir.resolve("chunks.xlsx");
        try (XSSFWorkbook wb = SignoffWorkbookTest.open(file)) {
            cell(wb, "Record", "B5").setCellValue("three");
            try (OutputStream out = Files.newOutputStream(edited)) {
                wb.write(out);
            }
        }
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> new VerifyUseCase().verify(edited, null,
                Progress.NONE)).isInstanceOf(SignoffException.class).hasMessageContaining("damaged chunk count")
                .hasMessageContaining("B5");
    }

    /** An unreadable archive settings file stops the command instead of quietly meaning the embedded archive. */
    @Test
    void anUnreadableArchiveSettingsFileIsSaid() throws IOException {
        Path config = Files.createDirectories(dir.resolve("config/holdpoint"));
        Files.writeString(config.resolve("settings.properties"), "archive.url=jdbc:postgresql://qa/\\uZZZZ\n");
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> ArchiveAccess.configuredUrl(java.util.Map.of(
                "XDG_CONFIG_HOME", dir.resolve("config").toString()), dir)).isInstanceOf(StudyFileException.class)
                .hasMessageContaining("settings.properties cannot be read");
        Files.writeString(config.resolve("settings.properties"), "archive.url=jdbc:h2:file:/tmp/x\n");
        assertThat(ArchiveAccess.configuredUrl(java.util.Map.of("XDG_CONFIG_HOME", dir.resolve("config").toString()),
                dir)).isEqualTo("jdbc:h2:file:/tmp/x");
    }

    @Test
    void theUntouchedWorkbookAndAPlainReSaveAreIntact() throws IOException {
        assertThat(new VerifyUseCase().verify(file, null, Progress.NONE).differences()).isEmpty();
        Path saved = dir.resolve("saved.xlsx");
        try (XSSFWorkbook wb = SignoffWorkbookTest.open(file); OutputStream out = Files.newOutputStream(saved)) {
            wb.write(out);
        }
        assertThat(new VerifyUseCase().verify(saved, null, Progress.NONE).differences()).isEmpty();
    }

    /** Edits at the level of the file's XML, which a spreadsheet program shows but a cell reader may not. */
    @Test
    void aRepeatedCellElementAndAMacroPartAreFound() throws IOException {
        Map<String, byte[]> parts = unzip(file);
        String summary = new String(parts.get("xl/worksheets/sheet1.xml"), StandardCharsets.UTF_8);
        int at = summary.indexOf("<c r=\"D10\"");
        int end = summary.indexOf("</c>", at) + 4;
        assertThat(at).isPositive();
        String twin = summary.substring(0, end) + "<c r=\"D10\" t=\"inlineStr\"><is><t>CHANGE VERIFIED</t></is></c>"
                + summary.substring(end);
        Map<String, byte[]> a = new LinkedHashMap<>(parts);
        a.put("xl/worksheets/sheet1.xml", twin.getBytes(StandardCharsets.UTF_8));
        Path twinFile = Files.write(dir.resolve("twin.xlsx"), zip(a));
        VerifyResult r = new VerifyUseCase().verify(twinFile, null, Progress.NONE);
        assertThat(r.status()).isEqualTo(VerifyResult.Status.EDITED);
        assertThat(r.differences()).anyMatch(d -> d.cell().equals("D10")
                && d.what().contains("repeated or out-of-order cell element"));
        Map<String, byte[]> b = new LinkedHashMap<>(parts);
        b.put("xl/vbaProject.bin", new byte[] {1, 2, 3});
        String types = new String(parts.get("[Content_Types].xml"), StandardCharsets.UTF_8).replace("<Default ",
                "<Default Extension=\"bin\" ContentType=\"application/vnd.ms-office.vbaProject\"/><Default ");
        b.put("[Content_Types].xml", types.getBytes(StandardCharsets.UTF_8));
        Path macro = Files.write(dir.resolve("macro.xlsx"), zip(b));
        VerifyResult m = new VerifyUseCase().verify(macro, null, Progress.NONE);
        assertThat(m.status()).isEqualTo(VerifyResult.Status.EDITED);
        assertThat(m.differences()).anyMatch(d -> d.what().contains("vbaProject"));
    }

    private static Map<String, byte[]> unzip(Path f) throws IOException {
        Map<String, byte[]> out = new LinkedHashMap<>();
        try (java.util.zip.ZipFile z = new java.util.zip.ZipFile(f.toFile())) {
            for (ZipEntry e : java.util.Collections.list(z.entries())) {
                try (InputStream in = z.getInputStream(e)) {
                    out.put(e.getName(), in.readAllBytes());
                }
            }
        }
        return out;
    }

    private static byte[] zip(Map<String, byte[]> parts) throws IOException {
        ByteArrayOutputStream bos = new ByteArrayOutputStream();
        try (ZipOutputStream out = new ZipOutputStream(bos)) {
            for (Map.Entry<String, byte[]> e : parts.entrySet()) {
                out.putNextEntry(new ZipEntry(e.getKey()));
                out.write(e.getValue());
                out.closeEntry();
            }
        }
        return bos.toByteArray();
    }

}
