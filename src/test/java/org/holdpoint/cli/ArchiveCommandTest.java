package org.holdpoint.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The archive commands end to end on an embedded archive file: save a study, archive it, find it,
 * sign it, correct it, verify the chain, and find an edit made directly in the database.
 */
class ArchiveCommandTest {
    private static String sha(String text, String after) {
        java.util.regex.Matcher m = java.util.regex.Pattern.compile(java.util.regex.Pattern.quote(after)
                + "\\s*([0-9a-f]{64})").matcher(text);
        assertThat(m.find()).as(after + " in: " + text).isTrue();
        return m.group(1);
    }

    /**
     * One run writing the workbook and the study file, signed: the workbook's record, the study file and
     * the archived version are one document with one SHA-256 (the signature is stamped once per run).
     */
    @Test
    void theWorkbookTheStudyFileAndTheArchiveShowOneHash(@TempDir Path dir) throws Exception {
        String url = "jdbc:h2:file:" + dir.resolve("archive").toAbsolutePath() + "/db";
        Path demo = dir.resolve("demo");
        assertThat(AnalyzeCommandTest.run("demo", "--out", demo.toString()).code()).isZero();
        Path study = dir.resolve("study.json");
        Path workbook = dir.resolve("signoff.xlsx");
        AnalyzeCommandTest.Run saved = AnalyzeCommandTest.run("analyze", demo.resolve("boring-bar-insert.csv")
                .toString(), "--save-study", study.toString(), "--report", workbook.toString(), "--change-id",
                "CR-78", "--title", "Second-source insert", "--part", "PH-2210", "--signed-by", "T. Oyelaran",
                "--role", "process engineer", "--meaning", "prepared the study", "--analyst", "T. Oyelaran");
        assertThat(saved.code()).as(saved.err()).isZero();
        String fromStudy = sha(saved.out(), "Saved the study file " + study + System.lineSeparator()
                + "  record SHA-256");
        String fromWorkbook = sha(saved.out(), "Wrote the sign-off workbook " + workbook + System.lineSeparator()
                + "  record SHA-256");
        AnalyzeCommandTest.Run verified = AnalyzeCommandTest.run("verify", workbook.toString());
        assertThat(verified.code()).as(verified.out() + verified.err()).isZero();
        AnalyzeCommandTest.Run add = AnalyzeCommandTest.run("archive", "add", study.toString(), "--archive", url,
                "--actor", "T. Oyelaran");
        assertThat(add.code()).as(add.err()).isZero();
        String archived = sha(add.out(), "(record SHA-256");
        assertThat(fromWorkbook).isEqualTo(fromStudy);
        assertThat(sha(verified.out(), "SHA-256")).isEqualTo(fromStudy);
        assertThat(archived).isEqualTo(fromStudy);
        // the record says who analysed it and when: one time for the run, the same as the signature's
        com.fasterxml.jackson.databind.JsonNode tree = new com.fasterxml.jackson.databind.ObjectMapper().readTree(
                study.toFile());
        assertThat(tree.path("analysis").path("analyst").asText()).isEqualTo("T. Oyelaran");
        assertThat(tree.path("analysis").path("at").asText()).isEqualTo(tree.path("signatures").get(0)
                .path("timestamp").asText()).matches("\\d{4}-\\d{2}-\\d{2}T\\d{2}:\\d{2}:\\d{2}Z");
    }

    /**
     * A study file written by another version of the program is archived as it is: the stored results and
     * the version that wrote them stay, and the archive shows the record hash of that file, not of a
     * re-computation by the version that archives it.
     */
    @Test
    void aStudyFileFromAnotherVersionKeepsItsRecordHash(@TempDir Path dir) throws Exception {
        String url = "jdbc:h2:file:" + dir.resolve("archive").toAbsolutePath() + "/db";
        Path demo = dir.resolve("demo");
        assertThat(AnalyzeCommandTest.run("demo", "--out", demo.toString()).code()).isZero();
        Path study = dir.resolve("study.json");
        AnalyzeCommandTest.Run saved = AnalyzeCommandTest.run("analyze", demo.resolve("boring-bar-insert.csv")
                .toString(), "-q", "--save-study", study.toString(), "--change-id", "CR-79", "--title", "Insert",
                "--part", "PH-2210");
        assertThat(saved.code()).as(saved.err()).isZero();
        String written = sha(saved.out(), "record SHA-256");
        // as an earlier version would have written it: another version number and other stored words
        String older = Files.readString(study).replace("\"version\" : \"" + org.holdpoint.workflow.Version.get()
                + "\"", "\"version\" : \"0.0.9\"").replace("CHANGE NOT VERIFIED", "CHANGE NOT VERIFIED (0.0.9)");
        assertThat(older).contains("0.0.9");
        Files.writeString(study, older);
        String olderRecord = org.holdpoint.workflow.StudyFiles.recordSha256(org.holdpoint.workflow.StudyFiles.tree(
                older));
        AnalyzeCommandTest.Run add = AnalyzeCommandTest.run("archive", "add", study.toString(), "--archive", url);
        assertThat(add.code()).as(add.err()).isZero();
        assertThat(sha(add.out(), "(record SHA-256")).isEqualTo(olderRecord).isNotEqualTo(written);
    }

    @Test
    void aStudyIsArchivedFoundSignedCorrectedAndVerified(@TempDir Path dir) throws Exception {
        String url = "jdbc:h2:file:" + dir.resolve("archive").toAbsolutePath() + "/db";
        Path demo = dir.resolve("demo");
        assertThat(AnalyzeCommandTest.run("demo", "--out", demo.toString()).code()).isZero();
        Path study = dir.resolve("study.json");
        AnalyzeCommandTest.Run saved = AnalyzeCommandTest.run("analyze", demo.resolve("boring-bar-insert.csv")
                .toString(), "--save-study", study.toString(), "--change-id", "CR-77", "--title",
                "Second-source boring-bar insert", "--kind", "supplier", "--part", "PH-2210", "--revision", "C");
        assertThat(saved.code()).as(saved.err()).isZero();
        assertThat(Files.exists(study)).isTrue();

        AnalyzeCommandTest.Run add = AnalyzeCommandTest.run("archive", "add", study.toString(), "--archive", url,
                "--actor", "A. Engineer");
        assertThat(add.code()).as(add.err()).isZero();
        assertThat(add.out()).contains("CR-77 version 1");

        AnalyzeCommandTest.Run again = AnalyzeCommandTest.run("archive", "add", study.toString(), "--archive", url);
        assertThat(again.code()).isEqualTo(2);
        assertThat(again.err()).contains("already archived").contains("--reason");

        AnalyzeCommandTest.Run fix = AnalyzeCommandTest.run("archive", "add", study.toString(), "--archive", url,
                "--reason", "re-measured chamfer");
        assertThat(fix.code()).as(fix.err()).isZero();
        assertThat(fix.out()).contains("version 2").contains("superseding");

        AnalyzeCommandTest.Run list = AnalyzeCommandTest.run("archive", "list", "--archive", url, "--part", "PH-2210",
                "--json");
        assertThat(list.code()).as(list.err()).isZero();
        JsonNode studies = new ObjectMapper().readTree(list.out()).path("studies");
        assertThat(studies).hasSize(1);
        long id = studies.get(0).path("id").asLong();
        assertThat(studies.get(0).path("verdict").asText()).isEqualTo("not verified");

        AnalyzeCommandTest.Run sign = AnalyzeCommandTest.run("archive", "sign", Long.toString(id), "--archive", url,
                "--signed-by", "Q. Manager", "--role", "quality manager", "--meaning", "reviewed");
        assertThat(sign.code()).as(sign.err()).isZero();
        AnalyzeCommandTest.Run bySigner = AnalyzeCommandTest.run("archive", "list", "--archive", url, "--signer",
                "q. manager");
        assertThat(bySigner.out()).contains("CR-77").contains("1 record(s)");
        AnalyzeCommandTest.Run show = AnalyzeCommandTest.run("archive", "show", Long.toString(id), "--archive", url);
        assertThat(show.out()).contains("Audit trail").contains("version 2 (current)").contains("re-measured chamfer");
        AnalyzeCommandTest.Run all = AnalyzeCommandTest.run("archive", "list", "--archive", url, "--all-versions");
        assertThat(all.out()).contains("2 record(s)");

        AnalyzeCommandTest.Run intact = AnalyzeCommandTest.run("archive", "verify", "--archive", url);
        assertThat(intact.code()).as(intact.out() + intact.err()).isZero();
        assertThat(intact.out()).startsWith("INTACT");

        // an edit made directly in the database, bypassing the tool (the trigger-free embedded file allows it)
        try (Connection c = DriverManager.getConnection(url); Statement s = c.createStatement()) {
            s.executeUpdate("UPDATE study SET part_number = 'PH-9999' WHERE id = " + id);
        }
        AnalyzeCommandTest.Run altered = AnalyzeCommandTest.run("archive", "verify", "--archive", url);
        assertThat(altered.code()).isEqualTo(1);
        assertThat(altered.out()).startsWith("ALTERED").contains("study " + id);
    }
}
