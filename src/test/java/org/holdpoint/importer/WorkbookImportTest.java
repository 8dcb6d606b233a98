package org.holdpoint.importer;

import static org.assertj.core.api.Assertions.assertThat;
import static org.holdpoint.importer.TestData.named;
import static org.holdpoint.importer.TestData.only;
import static org.holdpoint.importer.TestData.read;
import static org.holdpoint.importer.TestData.values;
import static org.holdpoint.importer.Workbooks.row;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.function.BiFunction;
import org.apache.poi.ss.usermodel.FormulaError;
import org.holdpoint.importer.Workbooks.Err;
import org.holdpoint.importer.Workbooks.Formula;
import org.holdpoint.importer.Workbooks.Merge;
import org.holdpoint.importer.Workbooks.SheetSpec;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.Layout;
import org.holdpoint.study.SkipReason;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.io.TempDir;

/** Workbook input (.xlsx streamed, .xls), each test run for both formats. */
class WorkbookImportTest {
    @TempDir
    Path dir;

    private Path book(String ext, boolean evaluate, SheetSpec... sheets) {
        Path f = dir.resolve("trial." + ext);
        return ext.equals("xlsx") ? Workbooks.xlsx(f, evaluate, sheets) : Workbooks.xls(f, evaluate, sheets);
    }

    private Path book(String ext, Object[]... rows) {
        return book(ext, true, new SheetSpec("Data", java.util.Arrays.asList(rows)));
    }

    @ParameterizedTest
    @ValueSource(strings = {"xlsx", "xls"})
    void stackedBelowTitleRows(String ext) {
        Path f = book(ext, row("Cover plate, trial 7"), row("Gauge", 12), null, row("Phase", "Bore (mm)"),
                row("before", 10.0012), row("before", 10.0021), row("after", 10.0033), row("after", 9.9991));
        Dataset d = read(f);
        CharacteristicData c = only(d);
        assertThat(c.name()).isEqualTo("Bore");
        assertThat(c.unit()).isEqualTo("mm");
        assertThat(values(c.before())).containsExactly(10.0012, 10.0021);
        assertThat(values(c.after())).containsExactly(10.0033, 9.9991);
        assertThat(c.before().sample().hasExactDecimals()).isTrue();
        assertThat(c.after().origin(1).describe()).isEqualTo(f + ", sheet Data, cell B8");
        assertThat(d.inputs().get(0).sheet()).isEqualTo("Data");
        assertThat(d.report().messages()).anyMatch(m -> m.contains("header in row 4"));
    }

    @ParameterizedTest
    @ValueSource(strings = {"xlsx", "xls"})
    void mergedTwoLevelHeader(String ext) {
        List<Object[]> rows = List.of(row("unit", "Bore (mm)", null, "Wall (mm)", null),
                row(null, "before", "after", "before", "after"), row("P1", 1.0, 1.1, 2.0, 2.1),
                row("P2", 1.2, 1.3, 2.2, 2.3));
        Path f = book(ext, true, new SheetSpec("S", rows, List.of(new Merge(0, 1, 0, 0), new Merge(0, 0, 1, 2),
                new Merge(0, 0, 3, 4))));
        Dataset d = read(ImportRequest.of(f).withPaired(true));
        assertThat(d.characteristics()).extracting(CharacteristicData::name).containsExactly("Bore", "Wall");
        CharacteristicData wall = named(d, "Wall");
        assertThat(wall.unit()).isEqualTo("mm");
        assertThat(wall.paired()).isTrue();
        assertThat(values(wall.after())).containsExactly(2.1, 2.3);
        assertThat(wall.after().unit(1)).isEqualTo("P2");
        assertThat(d.inputs().get(0).layout()).isEqualTo(Layout.PAIRED);
    }

    @ParameterizedTest
    @ValueSource(strings = {"xlsx", "xls"})
    void cellKindsAreReportedNeverTurnedIntoNumbers(String ext) {
        Path f = book(ext, row("phase", "value"), row("before", 1.5), row("before", "2.5"), row("before", true),
                row("before", LocalDate.of(2026, 11, 30)), row("before", new Err(FormulaError.DIV0)),
                row("before", new Formula("1/0")), row("before", new Formula("B2*2")), row("after", 3.5),
                row("after", "n/a"), row("after", 4.5), row("after", "NaN"));
        Dataset d = read(f);
        CharacteristicData c = only(d);
        // "2.5" stored as text is read as a number; the formula B2*2 gives its cached 3
        assertThat(values(c.before())).containsExactly(1.5, 2.5, 3.0);
        assertThat(values(c.after())).containsExactly(3.5, 4.5);
        assertThat(d.report().skipCounts()).containsEntry(SkipReason.BOOLEAN, 1L).containsEntry(SkipReason.DATE, 1L)
                .containsEntry(SkipReason.ERROR_VALUE, 2L).containsEntry(SkipReason.TEXT, 1L)
                .containsEntry(SkipReason.NOT_FINITE, 1L);
        assertThat(d.report().firstSkipped()).anyMatch(s -> s.origin().cell().equals("B6")
                && s.reason() == SkipReason.ERROR_VALUE && s.text().equals("#DIV/0!"));
        assertThat(d.report().messages()).anyMatch(m -> m.contains("1 numbers stored as text"));
    }

    @ParameterizedTest
    @ValueSource(strings = {"xlsx"})
    void formulaWithoutCachedValueIsReported(String ext) {
        Path f = book(ext, false, new SheetSpec("Data", List.of(row("phase", "value"), row("before", 1.0),
                row("before", 2.0), row("before", new Formula("B2+B3")), row("after", 3.0), row("after", 4.0))));
        Dataset d = read(f);
        assertThat(values(only(d).before())).containsExactly(1.0, 2.0);
        assertThat(d.report().skipCounts()).containsEntry(SkipReason.FORMULA_WITHOUT_VALUE, 1L);
        assertThat(d.report().firstSkipped().get(0).text()).isEqualTo("=B2+B3");
    }

    @ParameterizedTest
    @ValueSource(strings = {"xlsx", "xls"})
    void sheetChoiceAndFirstSheetWithData(String ext) {
        Path f = book(ext, true, new SheetSpec("Notes", List.of()),
                new SheetSpec("Trial", List.of(row("before", "after"), row(1.0, 2.0), row(1.5, 2.5))),
                new SheetSpec("Other", List.of(row("before", "after"), row(7.0, 8.0), row(7.5, 8.5))));
        assertThat(values(only(read(f)).before())).containsExactly(1.0, 1.5);
        assertThat(values(only(read(ImportRequest.of(f).withSheet("other"))).before())).containsExactly(7.0, 7.5);
        assertThat(values(only(read(ImportRequest.of(f).withSheet("3"))).after())).containsExactly(8.0, 8.5);
    }

    @ParameterizedTest
    @ValueSource(strings = {"xlsx", "xls"})
    void trailingEmptyRowsAndColumnsAreIgnored(String ext) {
        List<Object[]> rows = new ArrayList<>();
        rows.add(row("phase", "thickness", "depth"));
        rows.add(row("before", 1.0, 10.0));
        rows.add(row("before", 1.1, 10.1));
        rows.add(row("after", 1.2, 10.2));
        rows.add(row("after", 1.3, 10.3));
        for (int i = 0; i < 20; i++) {
            rows.add(row(null, "", null, null, ""));
        }
        Dataset d = read(book(ext, rows.toArray(new Object[0][])));
        assertThat(d.characteristics()).extracting(CharacteristicData::name).containsExactly("thickness", "depth");
        assertThat(d.report().skippedTotal()).isZero();
        assertThat(d.inputs().get(0).layout()).isEqualTo(Layout.WIDE);
    }

    @ParameterizedTest
    @ValueSource(strings = {"xlsx", "xls"})
    void everyLayout(String ext) {
        BiFunction<String, Object[][], Dataset> run = (name, rows) -> read(book(ext, rows));
        Dataset stacked = run.apply("s", new Object[][] {row("characteristic", "phase", "value"),
            row("a", "before", 1.0), row("b", "before", 2.0), row("a", "after", 1.5), row("b", "after", 2.5)});
        assertThat(stacked.characteristics()).hasSize(2);
        assertThat(stacked.inputs().get(0).layout()).isEqualTo(Layout.STACKED);
        Dataset sbs = run.apply("b", new Object[][] {row("before", "after"), row(1.0, 2.0), row(1.5, null),
            row(1.7, null)});
        assertThat(values(only(sbs).before())).containsExactly(1.0, 1.5, 1.7);
        assertThat(sbs.inputs().get(0).layout()).isEqualTo(Layout.SIDE_BY_SIDE);
        Dataset wide = run.apply("w", new Object[][] {row("group", "x", "y", "z"), row("before", 1.0, 2.0, 3.0),
            row("after", 1.5, 2.5, 3.5)});
        assertThat(wide.characteristics()).extracting(CharacteristicData::name).containsExactly("x", "y", "z");
    }

    @ParameterizedTest
    @ValueSource(strings = {"xlsx", "xls"})
    void traceabilityColumnsKeptWithEachValue(String ext) {
        Path f = book(ext, row("date", "lot", "subgroup", "phase", "value"),
                row(LocalDate.of(2026, 11, 30), "L7", 1, "before", 1.0),
                row(LocalDate.of(2026, 12, 1), "L8", 2, "after", 2.0));
        CharacteristicData c = only(read(f));
        assertThat(c.before().sequence(0)).isEqualTo("2026-11-30T00:00");
        assertThat(c.after().lot(0)).isEqualTo("L8");
        assertThat(c.after().subgroup(0)).isEqualTo("2");
    }

    @org.junit.jupiter.api.Test
    void aWorkbooksOwnDateFormatMarksItsCellsAsDates() throws Exception {
        // a custom number format (id 164 and up, from the workbook's styles part) that shows a date and time, and
        // one that shows a plain number: the first column is the run order's time stamp, the second the values
        Path f = dir.resolve("stamped.xlsx");
        try (org.apache.poi.xssf.usermodel.XSSFWorkbook wb = new org.apache.poi.xssf.usermodel.XSSFWorkbook()) {
            var sheet = wb.createSheet("Log");
            var stamp = wb.createCellStyle();
            stamp.setDataFormat(wb.createDataFormat().getFormat("dd.mm.yyyy hh:mm"));
            var plain = wb.createCellStyle();
            plain.setDataFormat(wb.createDataFormat().getFormat("0.000 \"mm\""));
            var h = sheet.createRow(0);
            h.createCell(0).setCellValue("time stamp");
            h.createCell(1).setCellValue("phase");
            h.createCell(2).setCellValue("value");
            for (int i = 0; i < 4; i++) {
                var r = sheet.createRow(i + 1);
                var t = r.createCell(0);
                t.setCellValue(java.time.LocalDateTime.of(2026, 11, 30, 8 + i, 15));
                t.setCellStyle(stamp);
                r.createCell(1).setCellValue(i < 2 ? "before" : "after");
                var v = r.createCell(2);
                v.setCellValue(12.5 + i * 0.001);
                v.setCellStyle(plain);
            }
            try (var out = java.nio.file.Files.newOutputStream(f)) {
                wb.write(out);
            }
        }
        CharacteristicData c = only(read(f));
        assertThat(c.before().sequence(1)).isEqualTo("2026-11-30T09:15");
        assertThat(values(c.after())).containsExactly(12.502, 12.503);
    }

    @ParameterizedTest
    @ValueSource(strings = {"xlsx", "xls"})
    void unitIdsMayBeNumbers(String ext) {
        Path f = book(ext, row("serial", "before", "after"), row(1001, 5.0, 5.1), row(1002, 6.0, 6.1),
                row(1003, null, 7.1));
        CharacteristicData c = only(read(ImportRequest.of(f).withPaired(true)));
        assertThat(c.before().unit(1)).isEqualTo("1002");
        assertThat(c.unmatchedUnits()).containsExactly("1003");
    }

    @ParameterizedTest
    @ValueSource(strings = {"xlsx", "xls"})
    void twoWorkbooks(String ext) {
        Path b = ext.equals("xlsx") ? Workbooks.xlsx(dir.resolve("b.xlsx"), row("bore"), row(1.0), row(1.1))
                : Workbooks.xls(dir.resolve("b.xls"), row("bore"), row(1.0), row(1.1));
        Path a = TestData.write(dir, "a.csv", "bore\n1.2\n1.3\n1.4\n");
        Dataset d = read(ImportRequest.ofTwo(b, a));
        assertThat(values(only(d).after())).containsExactly(1.2, 1.3, 1.4);
        assertThat(d.inputs().get(0).layout()).isEqualTo(Layout.SEPARATE);
    }
}
