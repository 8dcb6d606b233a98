package org.holdpoint.workflow;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.study.Progress;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The Summary's size and number columns are as wide as what they show: a trial of 1,500 parts per phase printed
 * "1499 / 15" (the column was laid out for two- and three-digit sizes). Invented study: two bore features of a
 * die-cast bracket, before and after a supplier change.
 */
class SummaryColumnWidthTest {
    /** Imports NAME.csv with its criteria beside it, analyses it and writes NAME-signoff.xlsx. */
    private static Path signoff(Path dir, String name, CharSequence csv, String criteria) throws Exception {
        Path data = Files.writeString(dir.resolve(name + ".csv"), csv, StandardCharsets.UTF_8);
        Files.writeString(dir.resolve(name + ".settings.csv"), "characteristic,lsl,usl,margin\n" + criteria,
                StandardCharsets.UTF_8);
        AnalysisOutcome in = new AnalyzeUseCase().importOnly(ImportOptions.file(data),
                AnalyzeUseCase.settingsBeside(data), AnalysisSettings.defaultSettings());
        ChangeStudy study = new ChangeStudy(null, in.data(), in.settings(), List.of());
        Path xlsx = dir.resolve(name + "-signoff.xlsx");
        new ReportUseCase(SignoffWorkbookTest.CLOCK).write(study, new StudyAnalyzer().analyze(study.data(),
                study.settings(), Progress.NONE), ReportOptions.withDefaults(), xlsx);
        return xlsx;
    }

    @Test
    void fourDigitSizesFitTheirColumn(@TempDir Path dir) throws Exception {
        java.util.SplittableRandom rnd = new java.util.SplittableRandom(1500);
        StringBuilder csv = new StringBuilder("phase,Bore A (mm),Bore B (mm)\n");
        for (String phase : new String[] {"before", "after"}) {
            for (int i = 0; i < 1500; i++) {
                String a = phase.equals("before") && i == 7 ? "" : String.format(Locale.ROOT, "%.4f",
                        10 + 0.01 * rnd.nextGaussian());
                csv.append(phase).append(',').append(a).append(',').append(String.format(Locale.ROOT, "%.4f",
                        250 + 0.02 * rnd.nextGaussian())).append('\n');
            }
        }
        Path xlsx = signoff(dir, "bracket", csv, "Bore A,9.95,10.05,0.01\nBore B,249.9,250.1,0.02\n");
        List<String> checked = new ArrayList<>();
        try (InputStream is = Files.newInputStream(xlsx); XSSFWorkbook wb = new XSSFWorkbook(is)) {
            Sheet summary = wb.getSheet("Summary");
            for (Row row : summary) {
                for (Cell cell : row) {
                    if (cell.getCellType() == CellType.STRING && cell.getStringCellValue().matches("\\d{4} / \\d{4}")) {
                        String shown = cell.getStringCellValue();
                        // a column's width is in 1/256 of a character of the default font
                        assertThat(summary.getColumnWidth(cell.getColumnIndex()) / 256.0).as(shown)
                                .isGreaterThanOrEqualTo(shown.length() + 1);
                        checked.add(shown);
                    }
                }
            }
        }
        assertThat(checked).containsExactly("1499 / 1500", "1500 / 1500");
    }

    /**
     * The verdict's mark is as wide as its column: "not assessable" with its sign, in bold, was cut in the second
     * Summary table (its column is one of the means table's). Invented study: a moulded cover whose vent depth the
     * gauge reads as one value in both phases.
     */
    @Test
    void theLongestVerdictMarkFitsItsColumn(@TempDir Path dir) throws Exception {
        java.util.SplittableRandom rnd = new java.util.SplittableRandom(31);
        StringBuilder csv = new StringBuilder("phase,Wall (mm),Vent depth (mm)\n");
        for (String phase : new String[] {"before", "after"}) {
            for (int i = 0; i < 40; i++) {
                csv.append(phase).append(',').append(String.format(Locale.ROOT, "%.3f", 2.4 + 0.01 * rnd.nextGaussian()))
                        .append(",0.05\n");
            }
        }
        Path xlsx = signoff(dir, "cover", csv, "Wall,2.35,2.45,0.01\nVent depth,0.03,0.07,0.005\n");
        // the verdict's mark as the workbook shows it: a sign, then the words
        String mark = "\u2298 not assessable";
        int found = 0;
        try (InputStream is = Files.newInputStream(xlsx); XSSFWorkbook wb = new XSSFWorkbook(is)) {
            Sheet summary = wb.getSheet("Summary");
            for (Row row : summary) {
                for (Cell cell : row) {
                    if (cell.getCellType() == CellType.STRING && cell.getStringCellValue().equals(mark)) {
                        // bold text: two characters more than its length, in 1/256 of a default character
                        assertThat(summary.getColumnWidth(cell.getColumnIndex()) / 256.0).as(mark)
                                .isGreaterThanOrEqualTo(mark.length() + 2);
                        found++;
                    }
                }
            }
        }
        assertThat(found).as("the mark is shown").isPositive();
    }
}
