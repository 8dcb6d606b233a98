package org.holdpoint.workflow;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.io.IOException;
import java.io.InputStream;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.List;
import java.util.function.Consumer;
import java.util.stream.Stream;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.CellReference;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.study.Progress;
import org.holdpoint.study.Signature;
import org.holdpoint.result.StudyResult;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/** The sign-off workbook written and re-verified end to end, with single cells edited in between. */
class SignoffWorkbookTest {
    static final Clock CLOCK = Clock.fixed(Instant.parse("2026-11-21T09:30:00Z"), ZoneOffset.UTC);
    @TempDir
    Path dir;
    Path file;

    @BeforeEach
    void write() throws IOException {
        file = dir.resolve("CR-2026-0117.xlsx");
        write(ReportFixtures.study(), file);
    }

    private static void write(ChangeStudy study, Path target) throws IOException {
        StudyResult result = ReportFixtures.analyze(study);
        new ReportUseCase(CLOCK).write(study, result, ReportOptions.withDefaults().withCharts(ReportFixtures.charts())
                .withSignOff(new Signature(Signature.Stage.PREPARED, "A. Lindqvist", "process engineer",
                        "prepared: study planned, measured and analysed as recorded", null)), target);
    }

    private VerifyResult verify(Path f) {
        return new VerifyUseCase().verify(f, null, Progress.NONE);
    }

    @Test
    void freshWorkbookIsIntact() {
        VerifyResult r = verify(file);
        assertThat(r.differences()).isEmpty();
        assertThat(r.status()).isEqualTo(VerifyResult.Status.INTACT);
        assertThat(r.hashMatches()).isTrue();
        assertThat(r.changeId()).isEqualTo("CR-2026-0117");
        assertThat(r.seal()).isEqualTo(VerifyResult.SealState.UNSIGNED);
    }

    @Test
    void shownNumbersAgreeWithR() throws IOException {
        // R 4.2.2: b <- c(25.0102, ...); a <- c(25.0104, ...) (ReportFixtures.BORE_*)
        // t.test(a, b)$p.value = 0.60336471226878152 (Welch); t.test(a, b)$conf.int = -0.0004408966285449081,
        // 0.00074089662854776169; t.test(a, b, conf.level = 0.9)$conf.int = -0.00033904705888565333,
        // 0.00063904705888850682; var.test(a, b)$p.value = 0.56926752368071454, statistic 0.70330984979384781;
        // mean(a) = 25.010708333333334, mean(b) = 25.010558333333332
        try (XSSFWorkbook wb = open(file)) {
            Sheet summary = wb.getSheet("Summary");
            assertThat(number(summary, "E15")).isCloseTo(25.010558333333332, within(1e-12));
            assertThat(number(summary, "F15")).isCloseTo(25.010708333333334, within(1e-12));
            assertThat(text(summary, "I15")).isEqualTo("(\u22120.000339, 0.000639)");
            Sheet details = wb.getSheet("Details");
            // spread block (layout 2 shows the variance ratio and the F-test on the Details sheet only)
            assertThat(number(details, "B25")).isCloseTo(0.70330984979384781, within(1e-12));
            assertThat(number(details, "B26")).isCloseTo(0.56926752368071454, within(1e-10));
            // difference test block: p at B20, 95 % CI at B21/B22; equivalence 90 % CI at F19/F20
            assertThat(number(details, "B20")).isCloseTo(0.60336471226878152, within(1e-10));
            assertThat(number(details, "B21")).isCloseTo(-0.0004408966285449081, within(1e-14));
            assertThat(number(details, "B22")).isCloseTo(0.00074089662854776169, within(1e-14));
            assertThat(number(details, "F19")).isCloseTo(-0.00033904705888565333, within(1e-14));
            assertThat(number(details, "F20")).isCloseTo(0.00063904705888850682, within(1e-14));
        }
    }

    static Stream<Arguments> edits() {
        return Stream.of(
                Arguments.of("Raw data", "D2", (Consumer<Cell>) c -> c.setCellValue(25.0202), "raw data row 1, Value"),
                Arguments.of("Details", "B26", (Consumer<Cell>) c -> c.setCellValue(0.0312), "F-test p"),
                Arguments.of("Details", "F20", (Consumer<Cell>) c -> c.setCellValue(0.0006), "equivalence CI upper"),
                Arguments.of("Summary", "H15", (Consumer<Cell>) c -> c.setCellValue("(\u22120.005000, 0.005000)"),
                        "margin"),
                Arguments.of("Details", "F10", (Consumer<Cell>) c -> c.setCellValue(-0.005), "margin L"),
                Arguments.of("Sign-off", "D6", (Consumer<Cell>) c -> c.setCellValue("2026-11-25T16:00:00Z"),
                        "sign-off prepared: date and time"),
                Arguments.of("Summary", "H21", (Consumer<Cell>) c -> c.setCellFormula("\"\u2714 passed\""),
                        "verdict"));
    }

    @ParameterizedTest(name = "{0}!{1}")
    @MethodSource("edits")
    void everySingleEditIsFound(String sheet, String cell, Consumer<Cell> edit, String what) throws IOException {
        Path edited = edit(file, sheet, cell, edit);
        VerifyResult r = verify(edited);
        assertThat(r.status()).isEqualTo(VerifyResult.Status.EDITED);
        assertThat(r.differences()).hasSize(1);
        VerifyResult.Difference d = r.differences().get(0);
        assertThat(d.sheet()).isEqualTo(sheet);
        assertThat(d.cell()).isEqualTo(cell);
        assertThat(d.what()).contains(what);
    }

    @Test
    void reSavingWithoutEditsStaysIntact() throws IOException {
        Path same = edit(file, "Summary", "Z1", c -> { });
        assertThat(verify(same).differences()).isEmpty();
    }

    @Test
    void editedRecordBreaksTheHash() throws IOException {
        // the first chunk of the record: row 15 of the hidden sheet, column B
        Path edited = edit(file, "Record", "B15", c -> c.setCellValue(c.getStringCellValue()
                .replace("\"CR-2026-0117\"", "\"CR-2026-0118\"")));
        VerifyResult r = verify(edited);
        assertThat(r.hashMatches()).isFalse();
        assertThat(r.status()).isEqualTo(VerifyResult.Status.EDITED);
        assertThat(r.differences()).extracting(VerifyResult.Difference::what)
                .contains("SHA-256 of the embedded study record");
    }

    @Test
    void handEntriesInEmptySignOffFieldsAreListedApart() throws IOException {
        Path signed = edit(file, "Sign-off", "B7", c -> c.setCellValue("R. Haddad"));
        VerifyResult r = verify(signed);
        assertThat(r.status()).isEqualTo(VerifyResult.Status.INTACT);
        assertThat(r.handEntries()).singleElement().asString().contains("Sign-off!B7").contains("R. Haddad");
    }

    @Test
    void userTextIsNeverAFormula() throws IOException {
        ChangeStudy study = ReportFixtures.study("=1+1");
        Path f = dir.resolve("injection.xlsx");
        StudyResult result = ReportFixtures.analyze(study);
        new ReportUseCase(CLOCK).write(study, result, ReportOptions.withDefaults().withSignOff(new Signature(
                Signature.Stage.PREPARED, "@SUM(A1)", "+cmd", "-2+3", null)), f);
        try (XSSFWorkbook wb = open(f)) {
            for (String[] at : new String[][] {{"Summary", "B15"}, {"Sign-off", "B6"}, {"Sign-off", "C6"},
                {"Sign-off", "E6"}, {"Raw data", "A2"}}) {
                Cell c = cell(wb.getSheet(at[0]), at[1]);
                assertThat(c.getCellType()).as(at[0] + "!" + at[1]).isEqualTo(CellType.STRING);
                assertThat(c.getCellStyle().getQuotePrefixed()).as(at[0] + "!" + at[1]).isTrue();
            }
            assertThat(cell(wb.getSheet("Summary"), "B15").getStringCellValue()).isEqualTo("=1+1");
            assertThat(cell(wb.getSheet("Sign-off"), "B6").getStringCellValue()).isEqualTo("@SUM(A1)");
        }
        assertThat(verify(f).differences()).isEmpty();
    }

    @Test
    void existingFileIsReplacedOnlyWhenAsked() throws IOException {
        byte[] before = Files.readAllBytes(file);
        ChangeStudy study = ReportFixtures.study();
        StudyResult result = ReportFixtures.analyze(study);
        assertThatThrownBy(() -> new ReportUseCase(CLOCK).write(study, result, ReportOptions.withDefaults(), file))
                .isInstanceOf(SignoffException.class).hasMessageContaining("exists").hasMessageContaining("--overwrite");
        assertThat(Files.readAllBytes(file)).isEqualTo(before);
        new ReportUseCase(CLOCK).write(study, result, ReportOptions.withDefaults()
                .withExisting(ReportOptions.ExistingFile.REPLACE), file);
        assertThat(Files.readAllBytes(file)).isNotEqualTo(before);
        assertThat(verify(file).differences()).isEmpty();
    }

    @Test
    void aFailureLeavesNoFile() throws IOException {
        Path target = dir.resolve("sub").resolve("never.xlsx");
        ChangeStudy study = ReportFixtures.study();
        StudyResult result = ReportFixtures.analyze(study);
        ChartSource broken = (s, r) -> {
            throw new IllegalStateException("renderer crashed");
        };
        assertThatThrownBy(() -> new ReportUseCase(CLOCK).write(study, result, ReportOptions.withDefaults()
                .withCharts(broken), target)).hasMessageContaining("renderer crashed");
        try (Stream<Path> left = Files.list(target.getParent())) {
            assertThat(left).isEmpty();
        }
    }

    @Test
    void templateWithoutARequiredNameIsAClearError() throws IOException {
        byte[] bytes = org.holdpoint.report.TemplateGenerator.build();
        Path template = dir.resolve("plant.xlsx");
        try (XSSFWorkbook wb = new XSSFWorkbook(new java.io.ByteArrayInputStream(bytes))) {
            wb.removeName(wb.getName("HP_Method"));
            try (OutputStream out = Files.newOutputStream(template)) {
                wb.write(out);
            }
        }
        ChangeStudy study = ReportFixtures.study();
        StudyResult result = ReportFixtures.analyze(study);
        Path target = dir.resolve("t.xlsx");
        assertThatThrownBy(() -> new ReportUseCase(CLOCK).write(study, result, ReportOptions.withDefaults()
                .withTemplate(template), target)).isInstanceOf(SignoffException.class)
                .hasMessageContaining("plant.xlsx").hasMessageContaining("HP_Method")
                .hasMessageContaining("templates/README.md");
        assertThat(target).doesNotExist();
    }

    @Test
    void notASignOffWorkbook() throws IOException {
        Path plain = dir.resolve("plain.xlsx");
        try (XSSFWorkbook wb = new XSSFWorkbook(); OutputStream out = Files.newOutputStream(plain)) {
            wb.createSheet("Data").createRow(0).createCell(0).setCellValue(1.0);
            wb.write(out);
        }
        assertThatThrownBy(() -> verify(plain)).isInstanceOf(SignoffException.class)
                .hasMessageContaining("not a Holdpoint sign-off workbook");
        Path text = Files.writeString(dir.resolve("notes.xlsx"), "just text");
        assertThatThrownBy(() -> verify(text)).isInstanceOf(SignoffException.class)
                .hasMessageContaining("cannot be read");
    }

    @Test
    void signedRecordSaysWhichKeySigned() throws IOException {
        Path key = dir.resolve("qa.key");
        Path pub = dir.resolve("qa.pub");
        String fingerprint = RecordSigning.generate(key, pub);
        Path other = dir.resolve("other.pub");
        RecordSigning.generate(dir.resolve("other.key"), other);
        ChangeStudy study = ReportFixtures.study();
        StudyResult result = ReportFixtures.analyze(study);
        Path f = dir.resolve("signed.xlsx");
        ReportUseCase.Written w = new ReportUseCase(CLOCK).write(study, result, ReportOptions.withDefaults()
                .withSigningKey(key, pub), f);
        assertThat(w.keyFingerprint()).isEqualTo(fingerprint);
        VerifyResult ok = new VerifyUseCase().verify(f, pub, Progress.NONE);
        assertThat(ok.seal()).isEqualTo(VerifyResult.SealState.VALID);
        assertThat(ok.keyFingerprint()).isEqualTo(fingerprint);
        assertThat(ok.status()).isEqualTo(VerifyResult.Status.INTACT);
        VerifyResult wrongKey = new VerifyUseCase().verify(f, other, Progress.NONE);
        assertThat(wrongKey.seal()).isEqualTo(VerifyResult.SealState.OTHER_KEY);
        assertThat(wrongKey.status()).isEqualTo(VerifyResult.Status.EDITED);
        // re-hashing an edited record cannot forge the signature
        Path edited = edit(f, "Record", "B15", c -> c.setCellValue(c.getStringCellValue().replace("CR-2026-0117",
                "CR-2026-0118")));
        VerifyResult forged = new VerifyUseCase().verify(edited, null, Progress.NONE);
        assertThat(forged.seal()).isEqualTo(VerifyResult.SealState.INVALID);
        // a removed signature is an edit: the signed record names the key that signed it
        Path stripped = f;
        for (String ref : new String[] {"B8", "B9", "B10", "B11"}) {
            stripped = edit(stripped, "Record", ref, c -> c.setCellValue(""));
        }
        VerifyResult removed = new VerifyUseCase().verify(stripped, null, Progress.NONE);
        assertThat(removed.seal()).isEqualTo(VerifyResult.SealState.MISSING);
        assertThat(removed.status()).isEqualTo(VerifyResult.Status.EDITED);
        assertThat(removed.differences()).extracting(VerifyResult.Difference::expected)
                .anyMatch(e -> e.contains(fingerprint) && e.contains("the signature was removed"));
        // a workbook without any signature does not pass a check against a key
        Path unsigned = dir.resolve("unsigned.xlsx");
        new ReportUseCase(CLOCK).write(study, result, ReportOptions.withDefaults(), unsigned);
        assertThat(new VerifyUseCase().verify(unsigned, null, Progress.NONE).status())
                .isEqualTo(VerifyResult.Status.INTACT);
        VerifyResult notWithThisKey = new VerifyUseCase().verify(unsigned, pub, Progress.NONE);
        assertThat(notWithThisKey.seal()).isEqualTo(VerifyResult.SealState.MISSING);
        assertThat(notWithThisKey.status()).isEqualTo(VerifyResult.Status.EDITED);
        assertThat(notWithThisKey.differences()).extracting(VerifyResult.Difference::shown)
                .contains("none: not signed with this key");
        // a key file that is no key is a mistake in the command (exit 2), even for an unsigned workbook
        Path notAKey = java.nio.file.Files.writeString(dir.resolve("notes.pub"), "QA key: see the safe\n");
        assertThatThrownBy(() -> new VerifyUseCase().verify(unsigned, notAKey, Progress.NONE))
                .isInstanceOf(StudyFileException.class).hasMessageContaining("is not an Ed25519 public key");
        assertThatThrownBy(() -> new VerifyUseCase().verify(unsigned, Path.of("/dev/zero"), Progress.NONE))
                .isInstanceOf(StudyFileException.class).hasMessageContaining("is not a key file");
        assertThatThrownBy(() -> new VerifyUseCase().verify(unsigned, dir, Progress.NONE))
                .isInstanceOf(StudyFileException.class).hasMessageContaining("it is a folder");
    }

    /** The fixture with a capability requirement of 1.33 on the bore (common practice, no source). */
    static ChangeStudy withRequirement() {
        ChangeStudy s = ReportFixtures.study();
        java.util.Map<String, org.holdpoint.study.CharacteristicSettings> per = new java.util.LinkedHashMap<>(
                s.settings().perCharacteristic());
        var bore = per.get("Bore diameter");
        per.put("Bore diameter", new org.holdpoint.study.CharacteristicSettings(bore.unit(), bore.spec(),
                bore.margin(), bore.sdGrowthLimit(), 1.33, bore.paired()));
        var set = s.settings();
        return new ChangeStudy(s.change(), s.data(), new org.holdpoint.study.AnalysisSettings(set.alpha(),
                set.equalVariances(), set.holm(), set.defaults(), per, set.overrides(), set.exclusions()),
                s.signatures());
    }

    @Test
    void checksAndCapabilityAreShownAsAnalysedAndAgreeWithR() throws IOException {
        ChangeStudy study = withRequirement();
        StudyResult result = ReportFixtures.analyze(study);
        Path f = dir.resolve("checks.xlsx");
        new ReportUseCase(CLOCK).write(study, result, ReportOptions.withDefaults().withCharts(ReportFixtures.charts()),
                f);
        var k = result.characteristics().get(0).checks();
        try (XSSFWorkbook wb = open(f)) {
            Sheet d = wb.getSheet("Details");
            int top = rowOf(d, 0, "1. Bore diameter: shape, distribution-free comparison and capability", 0);
            assertThat(rowOf(d, 0, "Shape and outliers", top)).isGreaterThan(top);
            assertThat(rowOf(d, 4, "Distribution-free comparison", top)).isGreaterThan(top);
            assertThat(rowOf(d, 0, "In the tolerance (normal model)", top)).isGreaterThan(top);
            assertThat(rowOf(d, 0, "Recommendation", top)).isGreaterThan(top);
            int sw = rowOf(d, 0, "Shapiro\u2013Wilk p", top);
            assertThat(d.getRow(sw).getCell(1).getNumericCellValue()).isEqualTo(k.before().normality().shapiroP());
            assertThat(d.getRow(sw).getCell(2).getNumericCellValue()).isEqualTo(k.after().normality().shapiroP());
            // R 4.2.2: shapiro.test(b)$p.value = 0.99992512270710288, shapiro.test(a)$p.value = 0.93267189542326445
            // (b, a = ReportFixtures.BORE_BEFORE, BORE_AFTER); agreement 1e-4 as the issue asks
            assertThat(d.getRow(sw).getCell(1).getNumericCellValue()).isCloseTo(0.99992512270710288, within(1e-4));
            assertThat(d.getRow(sw).getCell(2).getNumericCellValue()).isCloseTo(0.93267189542326445, within(1e-4));
            int w = rowOf(d, 0, "Shapiro\u2013Wilk W", top);
            // R 4.2.2: shapiro.test(b)$statistic = 0.99144970898298312, shapiro.test(a)$statistic = 0.97222663955638877
            assertThat(d.getRow(w).getCell(1).getNumericCellValue()).isCloseTo(0.99144970898298312, within(1e-6));
            assertThat(d.getRow(w).getCell(2).getNumericCellValue()).isCloseTo(0.97222663955638877, within(1e-6));
            int ad = rowOf(d, 0, "Anderson\u2013Darling A\u00b2 (unadjusted)", top);
            // R 4.2.2, nortest 1.0-4: ad.test(b)$statistic = 0.10793434383144351, ad.test(a)$statistic = 0.15401131959409398
            assertThat(d.getRow(ad).getCell(1).getNumericCellValue()).isCloseTo(0.10793434383144351, within(1e-9));
            assertThat(d.getRow(ad).getCell(2).getNumericCellValue()).isCloseTo(0.15401131959409398, within(1e-9));
            int u = rowOf(d, 4, "U of the after sample", top);
            int p = rowOf(d, 4, "p (two-sided)", top);
            // R 4.2.2: wilcox.test(a, b, conf.int = TRUE): W = 81.5, p-value = 0.6030953205939058 (normal, ties)
            assertThat(d.getRow(u).getCell(5).getNumericCellValue()).isEqualTo(81.5);
            assertThat(d.getRow(p).getCell(5).getNumericCellValue()).isEqualTo(k.rankSum().p())
                    .isCloseTo(0.6030953205939058, within(1e-8));
            assertThat(text(d, "F" + (rowOf(d, 4, "Method of p and interval", top) + 1))).startsWith("normal");
            int hl = rowOf(d, 4, "Hodges\u2013Lehmann shift", top);
            assertThat(d.getRow(hl).getCell(5).getNumericCellValue()).isEqualTo(k.rankSum().shift());
            assertThat(d.getRow(hl + 1).getCell(5).getNumericCellValue()).isEqualTo(k.rankSum().ciLower());
            assertThat(d.getRow(hl + 2).getCell(5).getNumericCellValue()).isEqualTo(k.rankSum().ciUpper());
            assertThat(text(d, "F" + (rowOf(d, 4, "Rank-based equivalence", top) + 1)))
                    .isEqualTo(k.rankSum().equivalence().conclusion().words());
            int lb = rowOf(d, 0, "95 % lower bound of Ppk (Bissell)", top);
            var cap = k.after().capability();
            assertThat(d.getRow(lb).getCell(2).getNumericCellValue()).isEqualTo(cap.ppkLower());
            // R 4.2.2: ppk <- min((25.021 - mean(a))/(3*sd(a)), (mean(a) - 25)/(3*sd(a))) = 5.4185432184876703;
            // ppk - qnorm(0.95)*sqrt(1/(9*12) + ppk^2/(2*11)) = 3.511766582525409 (Bissell 1990)
            assertThat(cap.ppkLower()).isCloseTo(3.511766582525409, within(1e-9));
            assertThat(d.getRow(rowOf(d, 0, "Ppk (overall sd)", top)).getCell(2).getNumericCellValue())
                    .isCloseTo(5.4185432184876703, within(1e-9));
            // no subgroup column: Cp and Cpk are empty cells, never 0 or NaN, and the notes say why
            Cell cp = d.getRow(rowOf(d, 0, "Cp (within subgroups)", top)).getCell(2);
            assertThat(cp.getCellType()).isEqualTo(CellType.BLANK);
            // the sentence that decides comes first in the tolerance block
            assertThat(text(d, "A" + (rowOf(d, 0, "In the tolerance (normal model)", top) + 2)))
                    .isEqualTo("Decides: the after group's 95 % lower bound of Ppk, 3.512, meets the required 1.33.");
            assertThat(text(d, "A" + (rowOf(d, 0, "Recommendation", top) + 2))).isEqualTo(k.recommendation());
            Sheet summary = wb.getSheet("Summary");
            // layout 2: the verdict table under the means table (3 characteristics: header in row 20)
            assertThat(text(summary, "F20")).startsWith("Capability");
            assertThat(text(summary, "F21")).isEqualTo("met: 3.512 > 1.33");
            // torque has no specification limits: an empty capability cell
            assertThat(text(summary, "F23")).isEmpty();
        }
        assertThat(verify(f).differences()).isEmpty();
        int top;
        String ppkCell;
        String pCell;
        try (XSSFWorkbook wb = open(f)) {
            Sheet d = wb.getSheet("Details");
            top = rowOf(d, 0, "1. Bore diameter: shape, distribution-free comparison and capability", 0);
            ppkCell = "C" + (rowOf(d, 0, "95 % lower bound of Ppk (Bissell)", top) + 1);
            pCell = "F" + (rowOf(d, 4, "p (two-sided)", top) + 1);
        }
        VerifyResult r1 = verify(edit(f, "Details", ppkCell, c -> c.setCellValue(1.40)));
        assertThat(r1.status()).isEqualTo(VerifyResult.Status.EDITED);
        assertThat(r1.differences()).singleElement().satisfies(x -> {
            assertThat(x.sheet()).isEqualTo("Details");
            assertThat(x.cell()).isEqualTo(ppkCell);
            assertThat(x.what()).contains("Ppk lower bound");
        });
        VerifyResult r2 = verify(edit(f, "Details", pCell, c -> c.setCellValue(0.0401)));
        assertThat(r2.differences()).singleElement().satisfies(x -> {
            assertThat(x.cell()).isEqualTo(pCell);
            assertThat(x.what()).contains("rank p");
        });
        VerifyResult r3 = verify(edit(f, "Summary", "F21", c -> c.setCellValue("met: 1.500 > 1.33")));
        assertThat(r3.differences()).singleElement().satisfies(x -> assertThat(x.what()).contains("capability"));
    }

    @Test
    void pairedRankComparisonAndFlaggedValuesAreShownWithTheirCells() throws IOException {
        ChangeStudy study = ReportFixtures.pairedWithOutlier();
        StudyResult result = ReportFixtures.analyze(study);
        Path f = dir.resolve("paired.xlsx");
        new ReportUseCase(CLOCK).write(study, result, ReportOptions.withDefaults(), f);
        var wall = result.characteristics().get(1).checks();
        var torque = result.characteristics().get(2).checks();
        assertThat(torque.signedRank()).isNotNull();
        try (XSSFWorkbook wb = open(f)) {
            Sheet d = wb.getSheet("Details");
            int w = rowOf(d, 0, "2. Wall thickness: shape, distribution-free comparison and capability", 0);
            int after = rowOf(d, 0, "After", rowOf(d, 0, "Flagged values (never dropped)", w));
            String shown = text(d, "B" + (after + 1));
            assertThat(wall.after().flagged()).isNotEmpty();
            for (var fv : wall.after().flagged()) {
                assertThat(shown).contains(fv.origin().describe());
            }
            // the far value 2.611 is the last after value: rows 25..34 hold the wall's before values, 35..44 after
            assertThat(shown).contains("2.611 at honing-trial.csv, cell D44");
            int t = rowOf(d, 0, "3. Tightening torque: shape, distribution-free comparison and capability", w);
            int v = rowOf(d, 4, "V (sum of positive ranks)", t);
            assertThat(d.getRow(v).getCell(5).getNumericCellValue()).isEqualTo(torque.signedRank().v());
            assertThat(text(d, "F" + (rowOf(d, 4, "Test (Wilcoxon, paired)", t) + 1))).isEqualTo("signed rank");
            // torque has neither limits nor a margin
            assertThat(text(d, "A" + (rowOf(d, 0, "Capability", t) + 2)))
                    .isEqualTo("not assessed: no specification limits set");
        }
        assertThat(verify(f).differences()).isEmpty();
    }

    @Test
    void orderLotsAndWithinCapabilityAreShownWhenTheDataCarryThem() throws IOException {
        ChangeStudy study = ReportFixtures.withOrder();
        StudyResult result = ReportFixtures.analyze(study);
        Path f = dir.resolve("order.xlsx");
        new ReportUseCase(CLOCK).write(study, result, ReportOptions.withDefaults(), f);
        var k = result.characteristics().get(0).checks();
        assertThat(k.after().lag1()).isNotNull();
        assertThat(k.after().capability().cpk()).isNotNull();
        try (XSSFWorkbook wb = open(f)) {
            Sheet d = wb.getSheet("Details");
            int top = rowOf(d, 0, "1. Bore diameter: shape, distribution-free comparison and capability", 0);
            int lag = rowOf(d, 0, "Lag-1 autocorrelation (run order)", top);
            assertThat(d.getRow(lag).getCell(2).getNumericCellValue()).isEqualTo(k.after().lag1().r1());
            assertThat(d.getRow(rowOf(d, 0, "Runs about the median", top)).getCell(1).getNumericCellValue())
                    .isEqualTo(k.before().runs().runs());
            assertThat(d.getRow(rowOf(d, 0, "Lots", top)).getCell(2).getNumericCellValue()).isEqualTo(2.0);
            assertThat(d.getRow(rowOf(d, 0, "Cpk (within subgroups)", top)).getCell(2).getNumericCellValue())
                    .isEqualTo(k.after().capability().cpk());
            assertThat(text(d, "E" + (rowOf(d, 4, "Within-subgroup sd", top) + 2)))
                    .isEqualTo(k.after().capability().estimator().description());
        }
        assertThat(verify(f).differences()).isEmpty();
    }

    /** @return the 0-based row at or after {@code from} whose cell in column {@code col} holds {@code text} */
    private static int rowOf(Sheet sh, int col, String text, int from) {
        for (int r = from; r <= sh.getLastRowNum(); r++) {
            var row = sh.getRow(r);
            Cell c = row == null ? null : row.getCell(col);
            if (c != null && c.getCellType() == CellType.STRING && c.getStringCellValue().equals(text)) {
                return r;
            }
        }
        throw new AssertionError("no \"" + text + "\" in column " + col + " from row " + (from + 1));
    }

    static XSSFWorkbook open(Path f) throws IOException {
        try (InputStream in = Files.newInputStream(f)) {
            return new XSSFWorkbook(in);
        }
    }

    private Path edit(Path source, String sheet, String ref, Consumer<Cell> edit) throws IOException {
        Path target = dir.resolve("edited-" + sheet.replace(' ', '_') + "-" + ref + ".xlsx");
        try (XSSFWorkbook wb = open(source)) {
            Sheet sh = wb.getSheet(sheet);
            CellReference cr = new CellReference(ref);
            var row = sh.getRow(cr.getRow()) != null ? sh.getRow(cr.getRow()) : sh.createRow(cr.getRow());
            Cell c = row.getCell(cr.getCol(), org.apache.poi.ss.usermodel.Row.MissingCellPolicy.CREATE_NULL_AS_BLANK);
            edit.accept(c);
            try (OutputStream out = Files.newOutputStream(target)) {
                wb.write(out);
            }
        }
        return target;
    }

    private static Cell cell(Sheet sh, String ref) {
        CellReference cr = new CellReference(ref);
        return sh.getRow(cr.getRow()).getCell(cr.getCol());
    }

    private static double number(Sheet sh, String ref) {
        return cell(sh, ref).getNumericCellValue();
    }

    private static String text(Sheet sh, String ref) {
        return cell(sh, ref).getStringCellValue();
    }

}
