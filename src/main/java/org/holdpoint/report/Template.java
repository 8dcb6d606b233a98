package org.holdpoint.report;

import java.io.ByteArrayInputStream;
import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.poi.ss.usermodel.Name;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.CellReference;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/**
 * A sign-off workbook template: an .xlsx whose defined names (see {@link TemplateName}) say where the
 * writer puts each value and block. Layout, logo, headings and page setup are the template's own.
 */
public final class Template {
    private final byte[] bytes;
    private final String name;
    private final Map<TemplateName, Anchor> anchors;
    private final List<String> sheetNames;
    private final Map<String, Map<Long, String>> cellTexts;
    private final String fingerprint;

    private Template(byte[] bytes, String name, Map<TemplateName, Anchor> anchors, List<String> sheetNames,
            Map<String, Map<Long, String>> cellTexts) {
        this.bytes = bytes;
        this.name = name;
        this.anchors = anchors;
        this.sheetNames = List.copyOf(sheetNames);
        this.cellTexts = cellTexts;
        this.fingerprint = fingerprint(anchors, sheetNames, cellTexts);
    }

    /**
     * The SHA-256 of what a reader of the template sees: its sheets in order, where its names point and
     * every non-empty cell's text. Stored in the record sheet, so that verify knows which template's
     * own labels a workbook must show (a file's bytes differ from one save to the next; its content not).
     */
    private static String fingerprint(Map<TemplateName, Anchor> anchors, List<String> sheets,
            Map<String, Map<Long, String>> cells) {
        StringBuilder sb = new StringBuilder("holdpoint template 1\n");
        sheets.forEach(n -> sb.append("sheet\0").append(n).append('\n'));
        anchors.forEach((t, a) -> sb.append("name\0").append(t.definedName()).append('\0').append(a.sheet())
                .append('\0').append(a.row()).append('\0').append(a.column()).append('\n'));
        for (String sheet : sheets) {
            new java.util.TreeMap<>(cells.getOrDefault(sheet, Map.of())).forEach((k, v) -> sb.append("cell\0")
                    .append(sheet).append('\0').append(k).append('\0').append(v).append('\n'));
        }
        return org.holdpoint.files.Sha256.ofText(sb.toString());
    }

    /** @return the template's content fingerprint (see {@link #fingerprint}) */
    public String fingerprint() {
        return fingerprint;
    }

    /** @return the sheet names in order */
    List<String> sheetNames() {
        return sheetNames;
    }

    /**
     * @param sheet a sheet name
     * @return the template's own non-empty cell texts of that sheet, keyed by {@link SignoffWorkbookReader#key}
     */
    Map<Long, String> cellTexts(String sheet) {
        return cellTexts.getOrDefault(sheet, Map.of());
    }

    /** @return the default template, built by {@link TemplateGenerator} (identical to templates/holdpoint-default.xlsx) */
    public static Template defaultTemplate() {
        return of(TemplateGenerator.build(), "the default template");
    }

    /**
     * Reads a template file.
     *
     * @param file the .xlsx template
     * @return the template
     * @throws ReportException when the file cannot be read or lacks a required name
     */
    public static Template read(Path file) {
        try {
            if (!Files.isRegularFile(file)) {
                throw new ReportException("%s: cannot read the template (%s); give the path of the .xlsx "
                        + "template", file, Files.isDirectory(file) ? "it is a folder" : Files.exists(file)
                                ? "it is not a regular file but a device or pipe" : "it does not exist");
            }
            if (Files.size(file) > 64L << 20) {
                throw new ReportException("%s: a template of %d MB is not a template; give the path of the .xlsx "
                        + "template", file, Files.size(file) >> 20);
            }
            return of(Files.readAllBytes(file), file.toString());
        } catch (IOException e) {
            throw new ReportException(e, "%s: cannot read the template (%s); check the path", file, e.getMessage());
        }
    }

    /**
     * A template from bytes.
     *
     * @param bytes the .xlsx bytes
     * @param name  a name for messages
     * @return the template
     * @throws ReportException when the bytes are no workbook or a required name is missing or misplaced
     */
    public static Template of(byte[] bytes, String name) {
        try (XSSFWorkbook wb = new XSSFWorkbook(new ByteArrayInputStream(bytes))) {
            Map<TemplateName, Anchor> anchors = validate(wb, name);
            List<String> sheets = new ArrayList<>();
            Map<String, Map<Long, String>> cells = new HashMap<>();
            org.apache.poi.ss.usermodel.DataFormatter fmt = new org.apache.poi.ss.usermodel.DataFormatter(
                    java.util.Locale.ROOT);
            for (Sheet sh : wb) {
                sheets.add(sh.getSheetName());
                Map<Long, String> m = new HashMap<>();
                for (org.apache.poi.ss.usermodel.Row row : sh) {
                    for (org.apache.poi.ss.usermodel.Cell c : row) {
                        String t = c.getCellType() == org.apache.poi.ss.usermodel.CellType.STRING
                                ? c.getStringCellValue() : fmt.formatCellValue(c);
                        if (!t.isEmpty()) {
                            m.put(SignoffWorkbookReader.key(c.getRowIndex(), c.getColumnIndex()), t);
                        }
                    }
                }
                cells.put(sh.getSheetName(), m);
            }
            return new Template(bytes.clone(), name, anchors, sheets, cells);
        } catch (IOException | RuntimeException e) {
            if (e instanceof ReportException r) {
                throw r;
            }
            throw new ReportException(e, "%s: not a readable .xlsx workbook (%s)", name, e.getMessage());
        }
    }

    private static Map<TemplateName, Anchor> validate(XSSFWorkbook wb, String file) {
        Map<TemplateName, Anchor> found = new EnumMap<>(TemplateName.class);
        List<String> missing = new ArrayList<>();
        for (TemplateName t : TemplateName.values()) {
            Name n = wb.getName(t.definedName());
            if (n == null || n.getRefersToFormula() == null) {
                missing.add(t.definedName());
                continue;
            }
            Anchor a = parse(n.getRefersToFormula(), file, t.definedName());
            if (wb.getSheet(a.sheet()) == null) {
                throw new ReportException("%s: the name %s points at sheet '%s', which does not exist", file,
                        t.definedName(), a.sheet());
            }
            found.put(t, a);
        }
        if (!missing.isEmpty()) {
            throw new ReportException("%s: the template lacks the required name%s %s; define %s (Formulas > Name "
                    + "Manager) as described in templates/README.md", file, missing.size() == 1 ? "" : "s",
                    String.join(", ", missing), missing.size() == 1 ? "it" : "them");
        }
        Map<String, TemplateName> blockSheets = new HashMap<>();
        for (TemplateName t : TemplateName.values()) {
            if (!t.block()) {
                continue;
            }
            TemplateName other = blockSheets.put(found.get(t).sheet(), t);
            if (other != null) {
                throw new ReportException("%s: %s and %s are on the same sheet '%s'; give every block its own sheet",
                        file, other.definedName(), t.definedName(), found.get(t).sheet());
            }
        }
        for (TemplateName t : TemplateName.values()) {
            if (!t.block() && blockSheets.get(found.get(t).sheet()) != null
                    && blockSheets.get(found.get(t).sheet()) != TemplateName.SUMMARY_TABLE) {
                throw new ReportException("%s: %s must not be on the sheet of %s; put single values on the summary "
                        + "sheet or a sheet of their own", file, t.definedName(),
                        blockSheets.get(found.get(t).sheet()).definedName());
            }
        }
        Anchor raw = found.get(TemplateName.RAW_DATA);
        Sheet rawSheet = wb.getSheet(raw.sheet());
        if (rawSheet.getLastRowNum() > raw.row()) {
            throw new ReportException("%s: sheet '%s' has rows below %s (row %d); the raw data are streamed there, "
                    + "so leave everything below it empty", file, raw.sheet(), TemplateName.RAW_DATA.definedName(),
                    raw.row() + 1);
        }
        return found;
    }

    /**
     * Parses a defined name's formula such as {@code 'Summary'!$B$3} into an anchor.
     *
     * @param formula the refers-to formula
     * @param file    the file, for messages
     * @param name    the defined name, for messages
     * @return the anchor
     * @throws ReportException when the name does not point at one cell of a sheet
     */
    static Anchor parse(String formula, String file, String name) {
        String f = formula.startsWith("=") ? formula.substring(1) : formula;
        int colon = f.indexOf(':', f.lastIndexOf('!') + 1);
        String first = colon < 0 ? f : f.substring(0, colon);
        try {
            CellReference ref = new CellReference(first);
            if (ref.getSheetName() == null || ref.getRow() < 0 || ref.getCol() < 0) {
                throw new IllegalArgumentException("no sheet or cell");
            }
            return new Anchor(ref.getSheetName(), ref.getRow(), ref.getCol());
        } catch (RuntimeException e) {
            throw new ReportException("%s: the name %s refers to '%s', not to a cell of a sheet; make it point at one "
                    + "cell such as 'Summary'!$B$3", file, name, formula);
        }
    }

    /** @return the template's name for messages */
    public String name() {
        return name;
    }

    /**
     * @param t a template name
     * @return where it points
     */
    public Anchor anchor(TemplateName t) {
        return anchors.get(t);
    }

    /** @return every anchor */
    public Map<TemplateName, Anchor> anchors() {
        return java.util.Collections.unmodifiableMap(anchors);
    }

    /** @return a fresh copy of the template's bytes as a stream */
    InputStream open() {
        return new ByteArrayInputStream(bytes);
    }
}
