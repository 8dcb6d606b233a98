package org.holdpoint.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The distribution criterion from the command line and from a settings file, and its refusals. */
class DistributionOptionTest {
    private static Path data(Path dir) throws Exception {
        StringBuilder csv = new StringBuilder("characteristic,phase,value\n");
        double[] b = {0.021, 0.034, 0.018, 0.052, 0.027, 0.041, 0.019, 0.066, 0.031, 0.024, 0.029, 0.045};
        double[] a = {0.025, 0.031, 0.022, 0.058, 0.029, 0.047, 0.021, 0.071, 0.035, 0.026, 0.033, 0.049};
        for (double v : b) {
            csv.append("Burr height,before,").append(v).append('\n');
        }
        for (double v : a) {
            csv.append("Burr height,after,").append(v).append('\n');
        }
        Path f = dir.resolve("burr.csv");
        Files.writeString(f, csv);
        return f;
    }

    @Test
    void theOptionSetsTheFamilyForEveryCharacteristic(@TempDir Path dir) throws Exception {
        AnalyzeCommandTest.Run r = AnalyzeCommandTest.run("analyze", data(dir).toString(), "--usl", "0.12",
                "--distribution", "Weibull");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("Capability before (weibull fit: shape = ");
        assertThat(r.out()).contains("Capability model: weibull (set in the criteria)");
    }

    /** A workbook of a study judged by a fitted family verifies intact: every shown cell is re-computed alike. */
    @Test
    void theWorkbookOfAFittedStudyVerifiesIntact(@TempDir Path dir) throws Exception {
        Path book = dir.resolve("burr.xlsx");
        AnalyzeCommandTest.Run r = AnalyzeCommandTest.run("analyze", data(dir).toString(), "--usl", "0.12",
                "--distribution", "lognormal", "--report", book.toString());
        assertThat(r.code()).as(r.err()).isZero();
        AnalyzeCommandTest.Run v = AnalyzeCommandTest.run("verify", book.toString());
        assertThat(v.code()).as(v.out() + v.err()).isZero();
        assertThat(v.out()).contains("INTACT");
        try (var wb = new org.apache.poi.xssf.usermodel.XSSFWorkbook(book.toFile())) {
            var fmt = new org.apache.poi.ss.usermodel.DataFormatter();
            StringBuilder all = new StringBuilder();
            for (var sheet : wb) {
                for (var row : sheet) {
                    for (var cell : row) {
                        all.append(fmt.formatCellValue(cell)).append('\n');
                    }
                }
            }
            assertThat(all).contains("In the tolerance (lognormal fit, percentile method)")
                    .contains("95 % lower bound of Ppk (bootstrap)").contains("X99.865 % of the fit")
                    .contains("Probability plot against the fitted lognormal distribution");
        }
    }

    @Test
    void anUnknownFamilyIsRefusedWithTheWordsThatWork(@TempDir Path dir) throws Exception {
        AnalyzeCommandTest.Run r = AnalyzeCommandTest.run("analyze", data(dir).toString(), "--usl", "0.12",
                "--distribution", "triangular");
        assertThat(r.code()).isEqualTo(2);
        assertThat(r.err()).contains("--distribution: 'triangular' is not a distribution; use auto, normal, "
                + "lognormal, weibull, gamma or rayleigh");
    }

    @Test
    void aSettingsFileNamesTheFamilyAndABadOneIsReportedOnItsCell(@TempDir Path dir) throws Exception {
        Path f = data(dir);
        Files.writeString(dir.resolve("burr.settings.csv"), "characteristic,usl,distribution\nBurr height,0.12,gamma\n");
        AnalyzeCommandTest.Run ok = AnalyzeCommandTest.run("analyze", f.toString());
        assertThat(ok.code()).as(ok.err()).isZero();
        assertThat(ok.out()).contains("(gamma fit: shape = ");
        Files.writeString(dir.resolve("burr.settings.csv"), "characteristic,usl,distribution\nBurr height,0.12,beta\n");
        AnalyzeCommandTest.Run bad = AnalyzeCommandTest.run("analyze", f.toString());
        assertThat(bad.code()).isEqualTo(2);
        assertThat(bad.err()).contains("burr.settings.csv").contains("column distribution: \"beta\" is not a "
                + "distribution");
    }
}
