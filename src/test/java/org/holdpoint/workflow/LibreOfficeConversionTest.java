package org.holdpoint.workflow;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.File;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.TimeUnit;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.study.Signature;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A real spreadsheet application opens the workbook: LibreOffice headless converts it to PDF (and CSV)
 * without errors. Skipped when soffice is not installed (CI installs libreoffice-calc).
 */
@org.junit.jupiter.api.Tag("libreoffice")
class LibreOfficeConversionTest {
    @TempDir
    Path dir;

    @Test
    void convertsToPdfWithOnePagePerSectionAndShowsFormulaTextLiterally() throws Exception {
        String soffice = onPath("soffice");
        assumeTrue(soffice != null, "LibreOffice (soffice) is not installed");
        // 3 characteristics, 5 values per group: the 30 raw data rows fit one landscape page in any font
        ChangeStudy study = ReportFixtures.study("=1+1", 5);
        Path xlsx = dir.resolve("signoff.xlsx");
        new ReportUseCase(SignoffWorkbookTest.CLOCK).write(study, ReportFixtures.analyze(study),
                ReportOptions.withDefaults().withCharts(ReportFixtures.charts()).withSignOff(new Signature(
                        Signature.Stage.PREPARED, "@SUM(A1)", "process engineer", "prepared", null)), xlsx);
        run(soffice, "--convert-to", "pdf", "--outdir", dir.toString(), xlsx.toString());
        Path pdf = dir.resolve("signoff.pdf");
        assertThat(pdf).exists();
        // Summary 1 + Sign-off 1 + Details 6 (per characteristic a page with the t-based blocks and its first
        // chart, then a page of shape, rank comparison and capability with the other charts) + Method 1 + Import report 1
        // + Cautions 1 + Raw data 1 = 12; the hidden record sheet is not printed
        assertThat(pages(pdf)).isEqualTo(12);
        String pdftotext = onPath("pdftotext");
        if (pdftotext != null) {
            run(pdftotext, pdf.toString(), dir.resolve("signoff.txt").toString());
            String text = Files.readString(dir.resolve("signoff.txt"));
            assertThat(text).contains("=1+1").contains("@SUM(A1)").contains("CHANGE NOT VERIFIED");
            // a printed sheet-protection password only invites removing it
            assertThat(text).doesNotContain("password");
        }
        Path csvDir = Files.createDirectories(dir.resolve("csv"));
        // 44 = comma, 34 = quote, 76 = UTF-8; the last field -1 writes every sheet (LibreOffice 7.2 and later)
        run(soffice, "--convert-to", "csv:Text - txt - csv (StarCalc):44,34,76,1,,0,false,true,false,false,false,-1",
                "--outdir", csvDir.toString(), xlsx.toString());
        List<String> csv = new ArrayList<>();
        try (Stream<Path> files = Files.list(csvDir)) {
            for (Path f : files.toList()) {
                csv.addAll(Files.readAllLines(f, StandardCharsets.UTF_8));
            }
        }
        assertThat(csv).anySatisfy(line -> assertThat(line).startsWith("1,=1+1,mm,"));
    }

    private int pages(Path pdf) throws Exception {
        String pdfinfo = onPath("pdfinfo");
        if (pdfinfo != null) {
            String out = run(pdfinfo, pdf.toString());
            Matcher m = Pattern.compile("Pages:\\s+(\\d+)").matcher(out);
            if (m.find()) {
                return Integer.parseInt(m.group(1));
            }
        }
        String raw = new String(Files.readAllBytes(pdf), StandardCharsets.ISO_8859_1);
        Matcher m = Pattern.compile("/Type\\s*/Page(?!s)").matcher(raw);
        int n = 0;
        while (m.find()) {
            n++;
        }
        return n;
    }

    /**
     * Re-saving an untouched workbook in a spreadsheet program changes its bytes (styles renumbered,
     * names re-quoted, view settings added, structure lock dropped) but not what a reader sees: verify
     * stays INTACT (docs/signoff-workbook.md, "What re-saving may change").
     */
    @Test
    void aWorkbookReSavedByLibreOfficeStaysIntact() throws Exception {
        String soffice = onPath("soffice");
        assumeTrue(soffice != null, "LibreOffice (soffice) is not installed");
        ChangeStudy study = ReportFixtures.study();
        Path xlsx = dir.resolve("written.xlsx");
        new ReportUseCase(SignoffWorkbookTest.CLOCK).write(study, ReportFixtures.analyze(study),
                ReportOptions.withDefaults().withCharts(ReportFixtures.charts()), xlsx);
        Path out = Files.createDirectories(dir.resolve("resaved"));
        run(soffice, "--convert-to", "xlsx:Calc MS Excel 2007 XML", "--outdir", out.toString(), xlsx.toString());
        Path resaved = out.resolve("written.xlsx");
        assertThat(Files.mismatch(xlsx, resaved)).isNotEqualTo(-1L);
        VerifyResult r = new VerifyUseCase().verify(resaved, null, org.holdpoint.study.Progress.NONE);
        assertThat(r.differences()).isEmpty();
        assertThat(r.status()).isEqualTo(VerifyResult.Status.INTACT);
    }

    /**
     * A 60-characteristic sign-off printed to PDF: no number is shown as ### and no name or interval is cut
     * (columns as wide as their content, long names wrapped). Invented study: a bearing housing's features
     * measured before and after a fixture change, four sizes of values (2 to 4 decimals).
     */
    @Test
    void sixtyCharacteristicsPrintWithoutHashesOrCutText() throws Exception {
        String soffice = onPath("soffice");
        String pdftotext = onPath("pdftotext");
        assumeTrue(soffice != null && pdftotext != null, "LibreOffice and pdftotext are not installed");
        java.util.Random rnd = new java.util.Random(60);
        StringBuilder data = new StringBuilder("phase");
        StringBuilder criteria = new StringBuilder("characteristic,lsl,usl,margin_percent,sd_growth_limit,capability_min\n");
        double[] base = {8.0, 25.4, 120.0, 0.05};
        double[] tol = {0.012, 0.02, 0.1, 0.02};
        int[] dec = {3, 4, 2, 4};
        List<String> names = new ArrayList<>();
        for (int k = 0; k < 60; k++) {
            String name = "Feature " + (k + 1) + (k % 10 == 0 ? " of the main bearing seat as measured on the "
                    + "coordinate measuring machine in cell 4" : k % 2 == 0 ? " diameter" : " position");
            names.add(name);
            data.append(',').append(name);
            criteria.append(name).append(',').append(String.format(java.util.Locale.ROOT, "%.4f,%.4f", base[k % 4]
                    - 2 * tol[k % 4], base[k % 4] + 2 * tol[k % 4])).append(",10,1.5,1.33\n");
        }
        data.append('\n');
        for (String phase : new String[] {"before", "after"}) {
            for (int i = 0; i < 12; i++) {
                data.append(phase);
                for (int k = 0; k < 60; k++) {
                    data.append(',').append(String.format(java.util.Locale.ROOT, "%." + dec[k % 4] + "f", base[k % 4]
                            + 0.004 * (1 + k % 5) * rnd.nextGaussian()));
                }
                data.append('\n');
            }
        }
        Path csv = Files.writeString(dir.resolve("housing60.csv"), data.toString(), StandardCharsets.UTF_8);
        Files.writeString(dir.resolve("housing60.settings.csv"), criteria.toString(), StandardCharsets.UTF_8);
        AnalysisOutcome outcome = new AnalyzeUseCase().importOnly(ImportOptions.file(csv), null,
                org.holdpoint.study.AnalysisSettings.defaultSettings());
        ChangeStudy study = new ChangeStudy(null, outcome.data(), outcome.settings(), List.of());
        Path xlsx = dir.resolve("housing60.xlsx");
        new ReportUseCase(SignoffWorkbookTest.CLOCK).write(study, new StudyAnalyzer().analyze(study.data(),
                study.settings(), org.holdpoint.study.Progress.NONE), ReportOptions.withDefaults(), xlsx);
        run(soffice, "--convert-to", "pdf", "--outdir", dir.toString(), xlsx.toString());
        run(pdftotext, "-layout", dir.resolve("housing60.pdf").toString(), dir.resolve("housing60.txt").toString());
        String text = Files.readString(dir.resolve("housing60.txt"));
        assertThat(text).doesNotContain("###");
        String flat = text.replaceAll("\\s+", " ");
        for (String name : names) {
            assertThat(flat).as("the whole name is printed").contains(name.substring(Math.max(0, name.length() - 20)));
        }
        // every interval on the Summary pages is printed whole (it wraps after its comma onto a second line, so
        // the check is on the Summary pages as a whole): as many ( as ), and each bound printed
        String summary = text.substring(0, text.indexOf("Sign-off"));
        assertThat(summary.chars().filter(ch -> ch == '(').count())
                .isEqualTo(summary.chars().filter(ch -> ch == ')').count());
        // the Summary prints at about full size: the median height of a word's box on its first page is that of
        // 9-point text at 90 % or more (about 10.5 pt at 100 %; it was 6.1 pt when the table was shrunk to fit)
        run(pdftotext, "-bbox", "-f", "1", "-l", "1", dir.resolve("housing60.pdf").toString(),
                dir.resolve("page1.html").toString());
        java.util.regex.Matcher m = Pattern.compile("yMin=\"([\\d.]+)\" xMax=\"[\\d.]+\" yMax=\"([\\d.]+)\"")
                .matcher(Files.readString(dir.resolve("page1.html")));
        List<Double> heights = new ArrayList<>();
        while (m.find()) {
            heights.add(Double.parseDouble(m.group(2)) - Double.parseDouble(m.group(1)));
        }
        java.util.Collections.sort(heights);
        assertThat(heights).hasSizeGreaterThan(50);
        assertThat(heights.get(heights.size() / 2)).as("median word height on the Summary, pt").isGreaterThan(9.5);
    }

    private String run(String... command) throws IOException, InterruptedException {
        List<String> cmd = new ArrayList<>(List.of(command));
        if (command[0].endsWith("soffice")) {
            // a private profile, so that parallel runs and a desktop session do not collide
            cmd.add(1, "-env:UserInstallation=" + dir.resolve("lo-profile").toUri());
            cmd.add(1, "--headless");
        }
        Process p = new ProcessBuilder(cmd).redirectErrorStream(true).start();
        byte[] out = p.getInputStream().readAllBytes();
        assertThat(p.waitFor(180, TimeUnit.SECONDS)).as("%s finished", command[0]).isTrue();
        assertThat(p.exitValue()).as("%s exit code", command[0]).isZero();
        return new String(out, StandardCharsets.UTF_8);
    }

    private static String onPath(String name) {
        String path = System.getenv("PATH");
        if (path == null) {
            return null;
        }
        for (String d : path.split(File.pathSeparator)) {
            File f = new File(d, name);
            if (f.canExecute()) {
                return f.getAbsolutePath();
            }
        }
        return null;
    }
}
