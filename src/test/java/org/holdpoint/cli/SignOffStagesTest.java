package org.holdpoint.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.poi.ss.usermodel.DataFormatter;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.holdpoint.cli.AnalyzeCommandTest.Run;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Three people sign on three days: prepared with the analysis, reviewed and approved later with
 * {@code holdpoint sign}, each time into a new workbook with the same record, hash and seal. What a
 * signature shows and how it stays linked to its record follow the US rule for electronic records
 * (21 CFR 11.50: the printed name, the date and time and the meaning of every signature are shown with
 * the record; 11.70: a signature is linked to its record so that it cannot be moved to another one),
 * summarised here in our own words; a typed name is not an electronic signature and the workbook says so.
 */
class SignOffStagesTest {
    private static String sha(String out) {
        Matcher m = Pattern.compile("record\\s+SHA-256 ([0-9a-f]{64})").matcher(out);
        assertThat(m.find()).as(out).isTrue();
        return m.group(1);
    }

    @Test
    void laterStagesKeepTheRecordItsHashAndItsSeal(@TempDir Path dir) throws Exception {
        Path demo = dir.resolve("demo");
        assertThat(AnalyzeCommandTest.run("demo", "--out", demo.toString()).code()).isZero();
        assertThat(AnalyzeCommandTest.run("keygen", "--out", dir.resolve("qa").toString()).code()).isZero();
        Path s1 = dir.resolve("prepared.xlsx");
        Path study = dir.resolve("study.json");
        Run a = AnalyzeCommandTest.run("analyze", demo.resolve("boring-bar-insert.csv").toString(), "-q", "--report",
                s1.toString(), "--save-study", study.toString(), "--change-id", "CR-91", "--title", "Insert grade",
                "--part", "PH-2210", "--signed-by", "R. Brandt", "--role", "process engineer", "--meaning",
                "prepared the study", "--sign-key", dir.resolve("qa.key").toString(), "--sign-public-key",
                dir.resolve("qa.pub").toString());
        assertThat(a.code()).as(a.err()).isZero();
        String record = sha(a.out());
        byte[] firstBytes = Files.readAllBytes(s1);
        Path s2 = dir.resolve("reviewed.xlsx");
        Run r = AnalyzeCommandTest.run("sign", s1.toString(), "--out", s2.toString(), "--stage", "reviewed",
                "--signed-by", "K. Osei", "--role", "quality engineer", "--meaning", "method and data checked");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(sha(r.out())).isEqualTo(record);
        assertThat(Files.readAllBytes(s1)).as("the signed workbook is only read").isEqualTo(firstBytes);
        Path s3 = dir.resolve("approved.xlsx");
        Run p = AnalyzeCommandTest.run("sign", s2.toString(), "--out", s3.toString(), "--stage", "approved",
                "--signed-by", "M. Lindqvist", "--role", "quality manager", "--meaning", "approved for production");
        assertThat(p.code()).as(p.err()).isZero();
        Run v = AnalyzeCommandTest.run("verify", s3.toString(), "--key", dir.resolve("qa.pub").toString());
        assertThat(v.code()).as(v.out()).isZero();
        assertThat(sha(v.out())).isEqualTo(record);
        assertThat(v.out()).contains("valid Ed25519 signature", "prepared  R. Brandt (process engineer)",
                "reviewed  K. Osei (quality engineer)", "approved  M. Lindqvist (quality manager)");
        // 11.50: each manifestation shows printed name, date and time, and meaning beside the record
        try (XSSFWorkbook wb = new XSSFWorkbook(Files.newInputStream(s3))) {
            XSSFSheet sh = wb.getSheet("Sign-off");
            DataFormatter f = new DataFormatter();
            String[][] rows = {{"prepared", "R. Brandt", "prepared the study"}, {"reviewed", "K. Osei",
                "method and data checked"}, {"approved", "M. Lindqvist", "approved for production"}};
            // 11.50 also asks the manifestation to sit with the record: the part, revision and record hash
            // are written right above the signature rows
            assertThat(f.formatCellValue(sh.getRow(2).getCell(0))).contains("Part PH-2210").contains(
                    "signatures below sign the study record with SHA-256 ");
            for (int i = 0; i < 3; i++) {
                var row = sh.getRow(5 + i);
                assertThat(f.formatCellValue(row.getCell(0))).isEqualTo(rows[i][0]);
                assertThat(f.formatCellValue(row.getCell(1))).isEqualTo(rows[i][1]);
                assertThat(f.formatCellValue(row.getCell(3))).matches("\\d{4}-\\d{2}-\\d{2}T\\d{2}:\\d{2}:\\d{2}Z");
                assertThat(f.formatCellValue(row.getCell(4))).isEqualTo(rows[i][2]);
            }
        }
        // 11.70: every entry names the record it signs; the study file and the workbook share that record
        Run fromStudy = AnalyzeCommandTest.run("verify", s1.toString());
        assertThat(fromStudy.code()).isZero();
        assertThat(Files.readString(study)).contains("\"record\" : \"" + record + "\"");
    }

    @Test
    void anEditedWorkbookIsNotSignedAndTheInputIsNeverTheOutput(@TempDir Path dir) throws Exception {
        Path demo = dir.resolve("demo");
        assertThat(AnalyzeCommandTest.run("demo", "--out", demo.toString()).code()).isZero();
        Path s1 = dir.resolve("s1.xlsx");
        assertThat(AnalyzeCommandTest.run("analyze", demo.resolve("boring-bar-insert.csv").toString(), "-q",
                "--report", s1.toString()).code()).isZero();
        Run same = AnalyzeCommandTest.run("sign", s1.toString(), "--out", s1.toString(), "--stage", "reviewed",
                "--signed-by", "K. Osei", "--overwrite");
        assertThat(same.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(same.err()).contains("an output never replaces an input");
        Path edited = dir.resolve("edited.xlsx");
        try (XSSFWorkbook wb = new XSSFWorkbook(Files.newInputStream(s1))) {
            wb.getSheet("Summary").getRow(14).getCell(4).setCellValue(25.0);
            try (var out = Files.newOutputStream(edited)) {
                wb.write(out);
            }
        }
        Run r = AnalyzeCommandTest.run("sign", edited.toString(), "--out", dir.resolve("s2.xlsx").toString(),
                "--stage", "approved", "--signed-by", "M. Lindqvist");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("was edited since it was written", "only added to an intact record");
        assertThat(dir.resolve("s2.xlsx")).doesNotExist();
    }

    @Test
    void theArchiveKeepsTheSameSignOffList(@TempDir Path dir) throws Exception {
        String url = "jdbc:h2:file:" + dir.resolve("archive").toAbsolutePath() + "/db";
        Path demo = dir.resolve("demo");
        assertThat(AnalyzeCommandTest.run("demo", "--out", demo.toString()).code()).isZero();
        Path study = dir.resolve("study.json");
        Run a = AnalyzeCommandTest.run("analyze", demo.resolve("boring-bar-insert.csv").toString(), "-q",
                "--save-study", study.toString(), "--change-id", "CR-92", "--title", "Insert grade", "--part",
                "PH-2210", "--signed-by", "R. Brandt", "--role", "process engineer", "--meaning", "prepared");
        assertThat(a.code()).as(a.err()).isZero();
        String record = sha(a.out());
        Run add = AnalyzeCommandTest.run("archive", "add", study.toString(), "--archive", url, "--actor", "R. Brandt");
        assertThat(add.code()).as(add.err()).isZero();
        assertThat(add.out()).contains(record);
        Matcher id = Pattern.compile("as id (\\d+)").matcher(add.out());
        assertThat(id.find()).isTrue();
        Run sign = AnalyzeCommandTest.run("archive", "sign", id.group(1), "--archive", url, "--stage", "reviewed",
                "--signed-by", "K. Osei", "--role", "quality engineer", "--meaning", "method and data checked");
        assertThat(sign.code()).as(sign.err()).isZero();
        Run list = AnalyzeCommandTest.run("archive", "list", "--archive", url, "--signer", "osei");
        assertThat(list.code()).as(list.err()).isZero();
        assertThat(list.out()).contains("CR-92");
        // the signer of the study's own document is found the same way, by part of the name in any case
        Run byDocument = AnalyzeCommandTest.run("archive", "list", "--archive", url, "--signer", "BRANDT");
        assertThat(byDocument.code()).as(byDocument.err()).isZero();
        assertThat(byDocument.out()).contains("CR-92", "R. Brandt, K. Osei");
        Run show = AnalyzeCommandTest.run("archive", "show", id.group(1), "--archive", url);
        assertThat(show.out()).contains("signed in the record: prepared R. Brandt (process engineer)",
                "signed in the archive: K. Osei (quality engineer)");
        Run none = AnalyzeCommandTest.run("archive", "list", "--archive", url, "--signer", "lindqvist");
        assertThat(none.out()).doesNotContain("CR-92").contains("0 record(s)");
        Path exported = dir.resolve("exported.xlsx");
        Run export = AnalyzeCommandTest.run("archive", "export", id.group(1), "--archive", url, "--report",
                exported.toString());
        assertThat(export.code()).as(export.err()).isZero();
        Run v = AnalyzeCommandTest.run("verify", exported.toString());
        assertThat(v.code()).as(v.out()).isZero();
        assertThat(sha(v.out())).isEqualTo(record);
        assertThat(v.out()).contains("prepared  R. Brandt (process engineer)", "reviewed  K. Osei (quality engineer)");
    }
}
