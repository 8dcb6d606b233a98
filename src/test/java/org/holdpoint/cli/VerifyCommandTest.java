package org.holdpoint.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.OutputStream;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** {@code analyze --report} and {@code verify} through the command line: exit codes and messages. */
class VerifyCommandTest {
    @TempDir
    Path dir;
    Path data;
    final StringWriter out = new StringWriter();
    final StringWriter err = new StringWriter();

    @BeforeEach
    void data() throws Exception {
        // an invented stacked CSV: a fixture bore of a turning cell, before and after an insert change
        StringBuilder csv = new StringBuilder("characteristic,phase,unit,value\n");
        String[] before = {"12.004", "12.006", "12.003", "12.005", "12.007", "12.004", "12.006", "12.005"};
        String[] after = {"12.005", "12.004", "12.006", "12.005", "12.003", "12.006", "12.005", "12.004"};
        for (int i = 0; i < before.length; i++) {
            csv.append("Fixture bore,before,U").append(i).append(',').append(before[i]).append('\n');
        }
        for (int i = 0; i < after.length; i++) {
            csv.append("Fixture bore,after,V").append(i).append(',').append(after[i]).append('\n');
        }
        data = Files.writeString(dir.resolve("bore.csv"), csv.toString());
    }

    private int run(String... args) {
        out.getBuffer().setLength(0);
        err.getBuffer().setLength(0);
        CommandLine cl = org.holdpoint.Holdpoint.commandLine(org.holdpoint.workflow.WindowLauncher.NONE, args);
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        return cl.execute(args);
    }

    @Test
    void reportThenVerify() throws Exception {
        Path xlsx = dir.resolve("CR-7.xlsx");
        assertThat(run("analyze", data.toString(), "-q", "--margin", "0.002", "--change-id", "CR-7", "--kind",
                "tooling", "--report", xlsx.toString(), "--signed-by", "A. Lindqvist", "--role", "process engineer",
                "--meaning", "prepared")).as(err.toString()).isZero();
        assertThat(out.toString()).contains("Wrote the sign-off workbook").contains("record SHA-256");
        assertThat(run("verify", xlsx.toString())).as(out + err.toString()).isEqualTo(ExitCodes.OK);
        assertThat(out.toString()).contains("INTACT").contains("CR-7");

        // an existing workbook is kept without --overwrite
        assertThat(run("analyze", data.toString(), "-q", "--report", xlsx.toString())).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(err.toString()).contains("exists").contains("--overwrite");
        assertThat(run("analyze", data.toString(), "-q", "--margin", "0.002", "--change-id", "CR-7", "--report",
                xlsx.toString(), "--overwrite")).isZero();

        Path edited = dir.resolve("edited.xlsx");
        try (XSSFWorkbook wb = new XSSFWorkbook(Files.newInputStream(xlsx));
                OutputStream os = Files.newOutputStream(edited)) {
            wb.getSheet("Raw data").getRow(1).getCell(3).setCellValue(12.104);
            wb.write(os);
        }
        assertThat(run("verify", edited.toString())).isEqualTo(ExitCodes.ALTERED);
        assertThat(out.toString()).contains("EDITED: 1 difference").contains("Raw data!D2")
                .contains("shows 12.104, recomputed 12.004");
    }

    @Test
    void notAWorkbookGivesTwo() throws Exception {
        Path junk = Files.writeString(dir.resolve("junk.xlsx"), "not a workbook");
        assertThat(run("verify", junk.toString())).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(err.toString()).startsWith("holdpoint: ").contains("junk.xlsx").doesNotContain("Exception");
        assertThat(run("verify", dir.resolve("missing.xlsx").toString())).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(err.toString()).contains("not found");
    }

    @Test
    void signOptionsNeedAReport() {
        assertThat(run("analyze", data.toString(), "--signed-by", "A. Lindqvist")).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(err.toString()).contains("--signed-by needs --report OUT.xlsx or --save-study OUT.json");
        assertThat(run("analyze", data.toString(), "--sign-key", "k.key")).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(err.toString()).contains("need --report");
    }

    /**
     * --key checks a signature that must be there: a workbook without one fails (exit 1), a key file
     * that is not a key is a mistake in the command (exit 2), and a signed workbook with its key passes.
     */
    @Test
    void aKeyCheckNeedsASignatureByThatKey() throws Exception {
        Path key = dir.resolve("qa.key");
        Path pub = dir.resolve("qa.pub");
        assertThat(run("keygen", "--out", dir.resolve("qa").toString())).as(err.toString()).isZero();
        Path signed = dir.resolve("signed.xlsx");
        Path study = dir.resolve("signed.json");
        assertThat(run("analyze", data.toString(), "-q", "--margin", "0.002", "--report", signed.toString(),
                "--sign-key", key.toString(), "--sign-public-key", pub.toString(), "--save-study", study.toString()))
                .as(err.toString()).isZero();
        String printed = out.toString();
        assertThat(run("verify", signed.toString(), "--key", pub.toString())).as(out.toString()).isEqualTo(ExitCodes.OK);
        // the study file and the workbook are one record (the same SHA-256 twice in the analyze output)
        java.util.regex.Matcher m = java.util.regex.Pattern.compile("record SHA-256 ([0-9a-f]{64})").matcher(printed);
        assertThat(m.find()).isTrue();
        String first = m.group(1);
        assertThat(m.find()).isTrue();
        assertThat(m.group(1)).isEqualTo(first);
        Path unsigned = dir.resolve("unsigned.xlsx");
        assertThat(run("analyze", data.toString(), "-q", "--margin", "0.002", "--report", unsigned.toString()))
                .isZero();
        assertThat(run("verify", unsigned.toString(), "--key", pub.toString())).isEqualTo(ExitCodes.ALTERED);
        assertThat(out.toString()).contains("not signed with this key").contains("EDITED");
        assertThat(run("verify", unsigned.toString(), "--key", "/dev/zero")).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(err.toString()).contains("/dev/zero is not a key file");
        assertThat(run("verify", unsigned.toString(), "--key", data.toString())).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(err.toString()).contains("is not an Ed25519 public key");
    }
}
