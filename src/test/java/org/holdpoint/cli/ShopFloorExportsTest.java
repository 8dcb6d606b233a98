package org.holdpoint.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.holdpoint.cli.AnalyzeCommandTest.Run;
import org.holdpoint.importer.ShopFloorFiles;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Files shaped like real measuring-machine, lab and production-system exports (title rows, merged
 * band rows, units rows, trace columns, text cells such as "n/a" and "OOT", a column constant at the
 * gauge's resolution), generated here in invented scenarios, run through {@code holdpoint analyze} as a
 * user runs it. These check the import and verdict rules of docs/import.md, not numbers: the numbers of
 * the tests themselves are checked against outside references elsewhere.
 */
class ShopFloorExportsTest {
    private static final ObjectMapper JSON = new ObjectMapper();

    private static Run run(String... args) {
        return AnalyzeCommandTest.run(args);
    }

    private static JsonNode characteristic(JsonNode json, String name) {
        for (JsonNode c : json.path("characteristics")) {
            if (c.path("name").asText().equals(name)) {
                return c;
            }
        }
        return null;
    }

    private static List<String> names(JsonNode json) {
        List<String> out = new ArrayList<>();
        json.path("characteristics").forEach(c -> out.add(c.path("name").asText()));
        return out;
    }

    /**
     * A wide export of 56 characteristics of a turned shaft where one column (a go/no-go slot depth
     * recorded at the gauge's resolution) is 0.500 in every row: the other 55 are analysed.
     */
    @Test
    void oneConstantColumnOfFiftySixDoesNotCostTheOtherFiftyFive(@TempDir Path dir) throws Exception {
        Random rnd = new Random(56);
        StringBuilder sb = new StringBuilder("phase");
        for (int k = 1; k <= 56; k++) {
            sb.append(",").append(k == 31 ? "Slot depth" : "Dim " + k);
        }
        sb.append('\n');
        for (String phase : new String[] {"before", "after"}) {
            for (int i = 0; i < 25; i++) {
                sb.append(phase);
                for (int k = 1; k <= 56; k++) {
                    double v = k == 31 ? 0.5 : 10 + k + 0.01 * rnd.nextGaussian();
                    sb.append(',').append(String.format(Locale.ROOT, "%.3f", v));
                }
                sb.append('\n');
            }
        }
        Path csv = Files.writeString(dir.resolve("shaft-op40.csv"), sb.toString(), StandardCharsets.UTF_8);
        Path json = dir.resolve("r.json");
        Run r = run("analyze", csv.toString(), "--margin", "0.02", "--json", json.toString());
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode out = JSON.readTree(json.toFile());
        assertThat(out.path("characteristics")).hasSize(56);
        JsonNode slot = characteristic(out, "Slot depth");
        assertThat(slot.path("verdict").path("status").asText()).isEqualTo("not assessable");
        assertThat(slot.path("verdict").path("reasons").get(0).asText()).contains("no variation in either group",
                "0.500", "values recorded to 0.001", "check the measurement system");
        assertThat(slot.has("welch")).isFalse();
        int analysed = 0;
        for (JsonNode c : out.path("characteristics")) {
            if (c.has("welch") && c.has("tost")) {
                analysed++;
            }
        }
        assertThat(analysed).isEqualTo(55);
        assertThat(out.path("verdict").path("changeVerified").asBoolean()).isFalse();
        assertThat(out.path("verdict").path("summary").asText()).contains("1 could not be assessed");
        assertThat(r.out()).contains("[/] Slot depth", "not assessable");
    }

    /** Nothing that can be analysed: the whole study is bad input. */
    @Test
    void aStudyWhereNothingCanBeAnalysedExitsTwo(@TempDir Path dir) throws Exception {
        Path csv = Files.writeString(dir.resolve("setting.csv"), "phase,Mould temp\nbefore,85\nbefore,85\n"
                + "after,85\nafter,85\n", StandardCharsets.UTF_8);
        Run r = run("analyze", csv.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("Mould temp", "no variation");
    }

    /**
     * Two measuring-machine exports of an injection-moulded housing (before and after a resin supplier
     * change): title rows, a merged band row, a units row, trace columns, the header in different rows.
     */
    @Test
    void measuringMachineExportsWithBandsUnitsAndTraceColumnsAreReadAsTheyCome(@TempDir Path dir) throws Exception {
        Path before = ShopFloorFiles.housing(dir.resolve("before.xlsx"), "before", 1000, 0, 0, 1);
        Path after = ShopFloorFiles.housing(dir.resolve("after.xlsx"), "after", 2000, 0.002, 1, 2);
        Path json = dir.resolve("r.json");
        Run r = run("analyze", "--before", before.toString(), "--after", after.toString(), "--margin", "0.02",
                "--json", json.toString());
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode out = JSON.readTree(json.toFile());
        // band texts are not part of the names; trace columns (serial, lot, cavity, date) are not characteristics
        assertThat(names(out)).containsExactly("Overall length", "Width", "Pin hole dia", "Weight", "Flatness",
                "Wall thickness", "Mould temp");
        assertThat(characteristic(out, "Overall length").path("unit").asText()).isEqualTo("mm");
        assertThat(characteristic(out, "Weight").path("unit").asText()).isEqualTo("g");
        assertThat(characteristic(out, "Mould temp").path("unit").asText()).isEqualTo("°C");
        assertThat(characteristic(out, "Wall thickness").path("verdict").path("status").asText())
                .isEqualTo("not assessable");
        assertThat(characteristic(out, "Mould temp").path("verdict").path("status").asText())
                .isEqualTo("not assessable");
        assertThat(characteristic(out, "Overall length").path("verdict").path("status").asText())
                .isEqualTo("passed");
        // the units row is not data: no "mm" text cell is reported as unusable
        assertThat(r.out()).doesNotContain("(\"mm\")").contains("row 5 holds the units of measure",
                "row 6 holds the units of measure", "\"Cavity\" (C): process grouping",
                "unit id column \"Part serial\" (A)", "lot column \"Resin lot\" (B)", "run order from \"Meas. date\" (D)",
                "cell G33 - text, not a number (\"n/a\")");
    }

    /** The header rows of the two files given one by one. */
    @Test
    void eachFileMayHaveItsOwnHeaderRow(@TempDir Path dir) throws Exception {
        Path before = ShopFloorFiles.housing(dir.resolve("before.xlsx"), "before", 1000, 0, 0, 3);
        Path after = ShopFloorFiles.housing(dir.resolve("after.xlsx"), "after", 2000, 0, 2, 4);
        Run r = run("analyze", "--before", before.toString(), "--after", after.toString(), "--before-header-row",
                "4", "--after-header-row", "6", "--only", "Overall length", "--only", "width");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("header in row 4", "header in row 6", "Overall length", "Width")
                .contains("\"Pin hole dia\" (H), \"Weight\" (I), \"Flatness\" (J), \"Wall thickness\" (K), "
                        + "\"Mould temp\" (L): not in the criteria, not analysed");
        // the columns left out for the same reason are named together, the reason once per file
        assertThat(r.out().split("not in the criteria, not analysed", -1)).hasSize(3);
        Run wrong = run("analyze", before.toString(), "--before-header-row", "4");
        assertThat(wrong.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(wrong.err()).contains("--before-header-row is for two-file input");
    }

    /** The settings file decides what is analysed, and a misspelt row stops the run with the closest name. */
    @Test
    void theCriteriaChooseTheCharacteristicsAndAMisspeltRowIsRefused(@TempDir Path dir) throws Exception {
        Path before = ShopFloorFiles.housing(dir.resolve("before.xlsx"), "before", 1000, 0, 0, 5);
        Path after = ShopFloorFiles.housing(dir.resolve("after.xlsx"), "after", 2000, 0, 0, 6);
        Path settings = Files.writeString(dir.resolve("criteria.csv"), "characteristic,unit,lsl,nominal,usl,margin\n"
                + "Overall length,mm,41.95,42,42.05,0.01\nPin hole diameter,mm,3.185,3.2,3.215,0.003\n",
                StandardCharsets.UTF_8);
        Run bad = run("analyze", "--before", before.toString(), "--after", after.toString(), "--settings",
                settings.toString());
        assertThat(bad.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(bad.err()).contains("criteria.csv", "\"Pin hole diameter\" matches no characteristic",
                "did you mean \"Pin hole dia\"");
        Files.writeString(settings, "characteristic,unit,lsl,nominal,usl,margin\n"
                + "Overall length,mm,41.95,42,42.05,0.01\nPIN_HOLE_DIA (mm),mm,3.185,3.2,3.215,0.003\n",
                StandardCharsets.UTF_8);
        Path json = dir.resolve("r.json");
        Run ok = run("analyze", "--before", before.toString(), "--after", after.toString(), "--settings",
                settings.toString(), "--json", json.toString());
        assertThat(ok.code()).as(ok.err()).isZero();
        JsonNode out = JSON.readTree(json.toFile());
        assertThat(names(out)).containsExactly("Overall length", "Pin hole dia");
        // the criteria row written in another spelling applies to its characteristic
        assertThat(characteristic(out, "Pin hole dia").path("tost").path("upperMargin").asDouble()).isEqualTo(0.003);
        assertThat(ok.out()).contains("\"Width\" (G), \"Weight\" (I), \"Flatness\" (J), \"Wall thickness\" (K), "
                + "\"Mould temp\" (L): not in the criteria, not analysed");
    }

    @Test
    void ignoredColumnsAreLeftOutAndAnUnknownOneIsRefused(@TempDir Path dir) throws Exception {
        Path before = ShopFloorFiles.housing(dir.resolve("before.xlsx"), "before", 1000, 0, 0, 7);
        Path after = ShopFloorFiles.housing(dir.resolve("after.xlsx"), "after", 2000, 0, 0, 8);
        Path json = dir.resolve("r.json");
        Run r = run("analyze", "--before", before.toString(), "--after", after.toString(), "--ignore-column",
                "Mould temp", "--ignore-column", "wall thickness", "--margin", "0.05", "--json", json.toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(names(JSON.readTree(json.toFile()))).containsExactly("Overall length", "Width", "Pin hole dia",
                "Weight", "Flatness");
        Run bad = run("analyze", "--before", before.toString(), "--after", after.toString(), "--ignore-column",
                "Mold temp");
        assertThat(bad.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(bad.err()).contains("\"Mold temp\" is not in the data", "\"Mould temp\"");
    }

    /** German export of a lab: trace columns named in German are recognised. */
    @Test
    void germanTraceColumnsAreNotCharacteristics(@TempDir Path dir) throws Exception {
        StringBuilder sb = new StringBuilder("Seriennummer;Los;Kavität;Zeitstempel;Zustand;Härte HV10;Zugfestigkeit\n");
        Random rnd = new Random(9);
        for (String phase : new String[] {"vorher", "nachher"}) {
            for (int i = 0; i < 12; i++) {
                sb.append(String.format(Locale.GERMANY, "%s-%03d;L%d;%d;2026-11-%02d 08:%02d;%s;%.1f;%.1f%n",
                        phase.substring(0, 2), i, 4 + i % 2, 1 + i % 2, 3 + i % 20, i, phase,
                        300 + 5 * rnd.nextGaussian(), 620 + 8 * rnd.nextGaussian()));
            }
        }
        Path csv = Files.write(dir.resolve("labor.csv"), sb.toString().getBytes(java.nio.charset.Charset
                .forName("windows-1252")));
        Path json = dir.resolve("r.json");
        Run r = run("analyze", csv.toString(), "--group-column", "Zustand", "--before-label", "vorher",
                "--after-label", "nachher", "--json", json.toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(names(JSON.readTree(json.toFile()))).containsExactly("Härte HV10", "Zugfestigkeit");
        assertThat(r.out()).contains("unit id column \"Seriennummer\"", "lot column \"Los\"",
                "run order from \"Zeitstempel\"", "\"Kavität\" (C): process grouping");
    }

    /** The same parts measured twice but read as independent groups: the output says how to pair them. */
    @Test
    void theSameUnitIdsInBothGroupsGiveAPairingHint(@TempDir Path dir) throws Exception {
        StringBuilder sb = new StringBuilder("serial,phase,Bore\n");
        Random rnd = new Random(23);
        for (String phase : new String[] {"before", "after"}) {
            for (int i = 1; i <= 23; i++) {
                sb.append(String.format(Locale.ROOT, "P%02d,%s,%.4f%n", i, phase, 25 + 0.01 * rnd.nextGaussian()));
            }
        }
        Path csv = Files.writeString(dir.resolve("remeasured.csv"), sb.toString(), StandardCharsets.UTF_8);
        Run r = run("analyze", csv.toString(), "--margin", "0.01");
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("PAIRING HINT: 23 of the 23 unit ids", "--paired");
        Run paired = run("analyze", csv.toString(), "--margin", "0.01", "--paired");
        assertThat(paired.code()).as(paired.err()).isZero();
        assertThat(paired.out()).doesNotContain("PAIRING HINT").contains("paired");
    }

    /** A characteristic whose after values are all unusable text is not assessable; the others go on. */
    @Test
    void aCharacteristicWithoutUsableValuesIsNotAssessable(@TempDir Path dir) throws Exception {
        StringBuilder sb = new StringBuilder("phase,Length,Burr height\n");
        Random rnd = new Random(4);
        for (String phase : new String[] {"before", "after"}) {
            for (int i = 0; i < 10; i++) {
                sb.append(String.format(Locale.ROOT, "%s,%.3f,%s%n", phase, 80 + 0.02 * rnd.nextGaussian(),
                        phase.equals("after") ? "not measured" : String.format(Locale.ROOT, "%.3f",
                                0.05 + 0.01 * rnd.nextDouble())));
            }
        }
        Path csv = Files.writeString(dir.resolve("deburr.csv"), sb.toString(), StandardCharsets.UTF_8);
        Path json = dir.resolve("r.json");
        Run r = run("analyze", csv.toString(), "--margin", "0.05", "--json", json.toString());
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode out = JSON.readTree(json.toFile());
        assertThat(characteristic(out, "Burr height").path("verdict").path("status").asText())
                .isEqualTo("not assessable");
        assertThat(characteristic(out, "Burr height").path("verdict").path("reasons").get(0).asText())
                .contains("no usable value in the after group");
        assertThat(characteristic(out, "Length").path("verdict").path("status").asText()).isEqualTo("passed");
        // the sign-off workbook of such a study is written, and verifies intact without a false note
        Path report = dir.resolve("deburr.xlsx");
        Run written = run("analyze", csv.toString(), "--margin", "0.05", "--report", report.toString(), "--charts",
                dir.resolve("charts").toString());
        assertThat(written.code()).as(written.err()).isZero();
        Run verified = run("verify", report.toString());
        assertThat(verified.code()).as(verified.out() + verified.err()).isZero();
        assertThat(verified.out()).contains("INTACT").doesNotContain("differ from those this version computes");
    }
    /**
     * Measuring-machine exports that put the nominal and the tolerances between the header and the
     * measurements (one file per group): those rows are not measurements.
     */
    @Test
    void rowsOfNominalsAndTolerancesUnderTheHeaderAreNotData(@TempDir Path dir) throws Exception {
        Random rnd = new Random(21);
        Path[] files = new Path[2];
        for (int g = 0; g < 2; g++) {
            StringBuilder sb = new StringBuilder("Inspection report, spindle housing op 30\n\n");
            sb.append("Part,Bore X,Bore Y\n");
            sb.append("Nominal,30.000,30.000\nUpper tol,0.015,0.015\nLower tol,-0.015,-0.015\n");
            for (int i = 0; i < 12; i++) {
                sb.append(String.format(Locale.ROOT, "P%03d,%.4f,%.4f%n", 100 * g + i, 30 + 0.004 * rnd.nextGaussian(),
                        30 + 0.004 * rnd.nextGaussian()));
            }
            files[g] = Files.writeString(dir.resolve(g == 0 ? "before.csv" : "after.csv"), sb.toString(),
                    StandardCharsets.UTF_8);
        }
        Path json = dir.resolve("r.json");
        Run r = run("analyze", "--before", files[0].toString(), "--after", files[1].toString(), "--margin", "0.005",
                "--json", json.toString());
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode out = JSON.readTree(json.toFile());
        assertThat(names(out)).containsExactly("Bore X", "Bore Y");
        assertThat(characteristic(out, "Bore X").path("before").path("n").asInt()).isEqualTo(12);
        assertThat(characteristic(out, "Bore X").path("before").path("min").asDouble()).isGreaterThan(29.9);
        assertThat(r.out()).contains("rows 4 to 6 hold nominal values or limits (not read as data");
    }

    /** The value a workbook holds at a cell of its first sheet, read with POI (not with Holdpoint). */
    private static double cellValue(Path xlsx, String ref) throws Exception {
        try (var wb = org.apache.poi.ss.usermodel.WorkbookFactory.create(xlsx.toFile(), null, true)) {
            var cr = new org.apache.poi.ss.util.CellReference(ref);
            return wb.getSheetAt(0).getRow(cr.getRow()).getCell(cr.getCol()).getNumericCellValue();
        }
    }

    /**
     * An exclusion names one cell of one file: in a two-file study the same cell exists in both files,
     * so it needs before: or after:; a cell that holds no used value is refused; the JSON lists exactly
     * the one value left out, with file, sheet, cell, value and reason.
     */
    @Test
    void anExclusionNamesOneCellOfOneFile(@TempDir Path dir) throws Exception {
        Path before = ShopFloorFiles.housing(dir.resolve("before.xlsx"), "before", 1000, 0, 0, 7);
        Path after = ShopFloorFiles.housing(dir.resolve("after.xlsx"), "after", 2000, 0, 0, 8);
        String[] common = {"analyze", "--before", before.toString(), "--after", after.toString(), "--only",
            "Overall length", "--margin", "0.02"};
        Run both = run(concat(common, "--exclude", "F10=probe touched a burr"));
        assertThat(both.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(both.err()).contains("F10 is in both files", "write before:F10 or after:F10");
        Run typo = run(concat(common, "--exclude", "after:Z99=typo"));
        assertThat(typo.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(typo.err()).contains("after:Z99", "no value used in the analysis");
        Run header = run(concat(common, "--exclude", "after:F4=header"));
        assertThat(header.code()).isEqualTo(ExitCodes.BAD_INPUT);
        Run syntax = run(concat(common, "--exclude", "after:F10"));
        assertThat(syntax.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(syntax.err()).contains("[before:|after:][SHEET!]CELL=REASON");
        Path json = dir.resolve("r.json");
        Run ok = run(concat(common, "--exclude", "after:'CMM export'!F10=probe touched a burr", "--json",
                json.toString()));
        assertThat(ok.code()).as(ok.err()).isZero();
        JsonNode out = JSON.readTree(json.toFile());
        assertThat(out.path("exclusions")).hasSize(1);
        JsonNode x = out.path("exclusions").get(0);
        assertThat(x.path("characteristic").asText()).isEqualTo("Overall length");
        assertThat(x.path("group").asText()).isEqualTo("after");
        assertThat(x.path("file").asText()).endsWith("after.xlsx");
        assertThat(x.path("sheet").asText()).isEqualTo("CMM export");
        assertThat(x.path("cell").asText()).isEqualTo("F10");
        assertThat(x.path("value").asDouble()).isEqualTo(cellValue(after, "F10"));
        assertThat(x.path("reason").asText()).isEqualTo("probe touched a burr");
        JsonNode len = characteristic(out, "Overall length");
        assertThat(len.path("before").path("n").asInt()).isEqualTo(30);
        assertThat(len.path("after").path("n").asInt()).isEqualTo(29);
    }

    private static String[] concat(String[] a, String... b) {
        String[] out = java.util.Arrays.copyOf(a, a.length + b.length);
        System.arraycopy(b, 0, out, a.length, b.length);
        return out;
    }

    /**
     * A settings file saved by an office program in Windows-1252 or UTF-16 (with its byte-order mark)
     * is read like a data file in those encodings; the characteristic names with Ø and ° match.
     */
    @Test
    void settingsFilesInWindows1252AndUtf16AreRead(@TempDir Path dir) throws Exception {
        Random rnd = new Random(1252);
        StringBuilder sb = new StringBuilder("Phase;Bohrung Ø;Temperatur °C\n");
        for (String phase : new String[] {"vorher", "nachher"}) {
            for (int i = 0; i < 20; i++) {
                sb.append(phase.equals("vorher") ? "before" : "after").append(';')
                        .append(String.format(Locale.GERMANY, "%.3f", 8 + 0.004 * rnd.nextGaussian())).append(';')
                        .append(String.format(Locale.GERMANY, "%.1f", 60 + 0.5 * rnd.nextGaussian())).append('\n');
            }
        }
        Path data = Files.write(dir.resolve("bohrung.csv"), sb.toString().getBytes("windows-1252"));
        String criteria = "characteristic;unit;lsl;usl;margin\nBohrung Ø;mm;7,98;8,02;0,004\n"
                + "Temperatur °C;°C;55;65;1\n";
        for (java.nio.charset.Charset cs : new java.nio.charset.Charset[] {java.nio.charset.Charset.forName(
                "windows-1252"), StandardCharsets.UTF_16LE, StandardCharsets.UTF_8}) {
            byte[] body = criteria.getBytes(cs);
            byte[] bom = cs.equals(StandardCharsets.UTF_16LE) ? new byte[] {(byte) 0xFF, (byte) 0xFE} : new byte[0];
            byte[] bytes = new byte[bom.length + body.length];
            System.arraycopy(bom, 0, bytes, 0, bom.length);
            System.arraycopy(body, 0, bytes, bom.length, body.length);
            Path settings = Files.write(dir.resolve("criteria-" + cs.name() + ".csv"), bytes);
            Path json = dir.resolve("r-" + cs.name() + ".json");
            Run r = run("analyze", data.toString(), "--settings", settings.toString(), "--json", json.toString());
            assertThat(r.code()).as(cs + ": " + r.err()).isZero();
            JsonNode out = JSON.readTree(json.toFile());
            assertThat(names(out)).as(cs.name()).containsExactly("Bohrung Ø", "Temperatur °C");
            assertThat(characteristic(out, "Bohrung Ø").path("tost").path("upperMargin").asDouble()).isEqualTo(0.004);
            assertThat(characteristic(out, "Temperatur °C").path("criteria").path("lsl").asDouble()).isEqualTo(55);
        }
    }

    /**
     * Numbers pasted into a workbook as text with a decimal comma (as a German-locale spreadsheet keeps
     * them) are read when their column is consistent; a column mixing comma and point is refused with
     * its cells named; --decimal applies to workbooks too.
     */
    @Test
    void decimalCommaTextInAWorkbookIsReadPerColumn(@TempDir Path dir) throws Exception {
        List<Object[]> rows = new ArrayList<>();
        rows.add(org.holdpoint.importer.Workbooks.row("Messprotokoll Welle 4711"));
        rows.add(org.holdpoint.importer.Workbooks.row("Phase", "Durchmesser", "Länge"));
        Random rnd = new Random(44);
        List<java.math.BigDecimal> diameters = new ArrayList<>();
        for (int i = 0; i < 40; i++) {
            String d = String.format(Locale.ROOT, "%.3f", 12.5 + 0.003 * rnd.nextGaussian());
            diameters.add(new java.math.BigDecimal(d));
            rows.add(org.holdpoint.importer.Workbooks.row(i < 20 ? "before" : "after", d.replace('.', ','),
                    Math.round((80 + 0.02 * rnd.nextGaussian()) * 100) / 100.0));
        }
        Path xlsx = org.holdpoint.importer.Workbooks.xlsx(dir.resolve("welle.xlsx"), rows.toArray(new Object[0][]));
        Path json = dir.resolve("r.json");
        Run r = run("analyze", xlsx.toString(), "--margin", "0.01", "--json", json.toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("column B holds numbers stored as text with a decimal comma; read as numbers");
        JsonNode d = characteristic(JSON.readTree(json.toFile()), "Durchmesser");
        java.math.BigDecimal sum = diameters.subList(0, 20).stream().reduce(java.math.BigDecimal.ZERO,
                java.math.BigDecimal::add);
        assertThat(d.path("before").path("n").asInt()).isEqualTo(20);
        assertThat(d.path("before").path("mean").asDouble()).isCloseTo(sum.doubleValue() / 20,
                org.assertj.core.data.Offset.offset(1e-12));
        assertThat(d.path("before").path("min").asDouble()).isEqualTo(
                diameters.subList(0, 20).stream().min(java.math.BigDecimal::compareTo).orElseThrow().doubleValue());
        // a column mixing the two separators: the cells of each kind are named
        rows.set(5, org.holdpoint.importer.Workbooks.row("before", "12.502", 80.01));
        Path mixed = org.holdpoint.importer.Workbooks.xlsx(dir.resolve("gemischt.xlsx"), rows.toArray(new Object[0][]));
        Run bad = run("analyze", mixed.toString(), "--margin", "0.01");
        assertThat(bad.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(bad.err()).contains("gemischt.xlsx", "column B", "with a decimal comma in B3, B4, B5",
                "with a decimal point in B6");
        // --decimal . says the text numbers use a point: the comma ones are then refused, with their cells
        Run point = run("analyze", xlsx.toString(), "--margin", "0.01", "--decimal", ".");
        assertThat(point.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(point.err()).contains("column B", "with a decimal comma in B3");
        Run comma = run("analyze", xlsx.toString(), "--margin", "0.01", "--decimal", ",");
        assertThat(comma.code()).as(comma.err()).isZero();
    }

    /** Messages name a choice in plain words; the command line adds the option that makes it. */
    @Test
    void theCommandLineNamesTheOptionBehindAChoice() {
        assertThat(OptionWords.of("… If so, analyse them as paired (the paired choice); the values …"))
                .contains("(--paired)");
        assertThat(OptionWords.of("Correct those cells to one decimal separator, or choose the decimal mark the "
                + "numbers use")).endsWith("with --decimal");
        assertThat(OptionWords.of("nothing to translate")).isEqualTo("nothing to translate");
    }
}
