package org.holdpoint.report;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.EnumMap;
import java.util.HashMap;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.NoSuchElementException;
import org.apache.poi.openxml4j.opc.OPCPackage;
import org.apache.poi.openxml4j.opc.PackageAccess;
import org.apache.poi.ss.util.CellReference;
import org.apache.poi.xssf.eventusermodel.XSSFReader;
import org.apache.poi.xssf.model.SharedStrings;
import org.openxmlformats.schemas.spreadsheetml.x2006.main.CTDefinedName;
import org.openxmlformats.schemas.spreadsheetml.x2006.main.CTWorkbook;
import org.openxmlformats.schemas.spreadsheetml.x2006.main.WorkbookDocument;

/**
 * Reads a sign-off workbook back without loading it whole: the template names, the hidden record (the
 * canonical study JSON, its stored SHA-256, the optional signature) and, through
 * {@link #compare(ReportInput)}, every shown value against a fresh computation. Never modifies the file.
 */
public final class SignoffWorkbookReader {
    private final Path file;
    private final Map<String, String> names;
    private final Anchor recordAnchor;
    private final String[] record;
    private final String studyJson;

    private SignoffWorkbookReader(Path file, Map<String, String> names, Anchor recordAnchor, String[] record,
            String studyJson) {
        this.file = file;
        this.names = names;
        this.recordAnchor = recordAnchor;
        this.record = record;
        this.studyJson = studyJson;
    }

    /**
     * Opens a workbook and reads its record.
     *
     * @param file the .xlsx
     * @return the reader
     * @throws ReportException when the file cannot be read or is not a Holdpoint sign-off workbook
     */
    public static SignoffWorkbookReader open(Path file) {
        if (!Files.isRegularFile(file)) {
            throw new ReportException("%s: file not found; check the path", file);
        }
        try (OPCPackage pkg = OPCPackage.open(file.toFile(), PackageAccess.READ)) {
            XSSFReader reader = new XSSFReader(pkg);
            Map<String, String> names = definedNames(reader);
            String ref = names.get(TemplateName.RECORD.definedName());
            if (ref == null) {
                throw new ReportException("%s is not a Holdpoint sign-off workbook: it has no name %s (the record)",
                        file, TemplateName.RECORD.definedName());
            }
            Anchor a = Template.parse(ref, file.toString(), TemplateName.RECORD.definedName());
            Map<Long, String> cells = new HashMap<>();
            boolean found = readSheet(reader, a.sheet(), (row, col, kind, text, formula) -> {
                if (text != null) {
                    cells.put(key(row, col), text);
                }
            });
            if (!found) {
                throw new ReportException("%s is not a Holdpoint sign-off workbook: the record sheet '%s' is missing",
                        file, a.sheet());
            }
            String[] values = new String[RecordSheet.LABELS.length];
            for (int i = 0; i < values.length; i++) {
                values[i] = cells.getOrDefault(key(a.row() + 1 + i, a.column() + 1), "");
            }
            if (RecordSheet.layoutOf(values[0]) < 0) {
                throw new ReportException("%s is not a Holdpoint sign-off workbook this version can read: the record "
                        + "sheet '%s' does not start with a record format marker it knows (found \"%s\")", file,
                        a.sheet(), values[0]);
            }
            int chunks;
            try {
                chunks = Integer.parseInt(values[3].trim());
            } catch (NumberFormatException e) {
                chunks = -1;
            }
            if (chunks < 1 || chunks > 1_000_000) {
                throw new ReportException("%s: the record sheet '%s' holds a damaged chunk count \"%s\" (cell %s); the "
                        + "record cannot be read, so the workbook cannot be verified. Use the workbook as it was "
                        + "written", file, a.sheet(), values[3], new CellReference(a.row() + 4, a.column() + 1)
                                .formatAsString());
            }
            StringBuilder json = new StringBuilder();
            for (int i = 0; i < chunks; i++) {
                json.append(cells.getOrDefault(key(a.row() + RecordSheet.FIRST_CHUNK + i, a.column() + 1), ""));
            }
            return new SignoffWorkbookReader(file, names, a, values, json.toString());
        } catch (ReportException e) {
            throw e;
        } catch (Exception e) {
            throw new ReportException(e, "%s cannot be read as an .xlsx workbook (%s)", file, e.getMessage());
        }
    }

    private static int parseInt(String s) {
        try {
            return Math.max(0, Integer.parseInt(s.trim()));
        } catch (NumberFormatException e) {
            return 0;
        }
    }

    static long key(int row, int col) {
        return ((long) row << 20) | col;
    }

    private static Map<String, String> definedNames(XSSFReader reader) throws Exception {
        Map<String, String> names = new LinkedHashMap<>();
        try (InputStream in = reader.getWorkbookData()) {
            CTWorkbook wb = WorkbookDocument.Factory.parse(in).getWorkbook();
            if (wb.getDefinedNames() != null) {
                for (CTDefinedName n : wb.getDefinedNames().getDefinedNameArray()) {
                    if (!n.isSetLocalSheetId()) {
                        names.put(n.getName(), n.getStringValue());
                    }
                }
            }
        }
        return names;
    }

    private static boolean readSheet(XSSFReader reader, String sheet, WrittenCellStream.Sink sink) throws Exception {
        SharedStrings strings = reader.getSharedStringsTable();
        XSSFReader.SheetIterator it = (XSSFReader.SheetIterator) reader.getSheetsData();
        while (it.hasNext()) {
            try (InputStream in = it.next()) {
                if (it.getSheetName().equals(sheet)) {
                    WrittenCellStream.read(in, strings, sink);
                    return true;
                }
            }
        }
        return false;
    }

    /** @return the embedded canonical study record (JSON text) */
    public String studyJson() {
        return studyJson;
    }

    /** @return the SHA-256 stored beside the record */
    public String storedSha256() {
        return record[1];
    }

    /** @return when the workbook was written, as stored in the record sheet */
    public String generatedAt() {
        return record[4];
    }

    /** @return the software version stored in the record sheet */
    public String softwareVersion() {
        return record[5];
    }

    /** @return the chart count of each characteristic, in order, as laid out when written */
    public List<Integer> chartCounts() {
        List<Integer> out = new ArrayList<>();
        for (String s : record[6].split(",")) {
            if (!s.isBlank()) {
                out.add(parseInt(s));
            }
        }
        return out;
    }

    /** @return the stored signature of the record, or null when it was not signed */
    public RecordSeal seal() {
        if (record[7].isBlank()) {
            return null;
        }
        try {
            return new RecordSeal(record[7], record[8], record[9], record[10]);
        } catch (ReportException e) {
            return null;
        }
    }

    /** The outcome of comparing the shown values with a fresh computation. */
    public record Comparison(List<WorkbookDifference> differences, List<String> handEntries) {
        /** Copies. */
        public Comparison {
            differences = List.copyOf(differences);
            handEntries = List.copyOf(handEntries);
        }
    }

    /** @return the sign-off entries as JSON, kept apart from the hashed record ("" in older workbooks) */
    public String signaturesJson() {
        return record.length > 12 ? record[12] : "";
    }

    /** @return the content fingerprint of the template the workbook was written with ("" when not stored) */
    public String templateFingerprint() {
        return record.length > 11 ? record[11] : "";
    }

    /**
     * Compares without knowing the template (its own labels are then not compared).
     *
     * @param expected the report input re-computed from the record
     * @return the differences and the hand entries
     */
    public Comparison compare(ReportInput expected) {
        return compare(expected, null);
    }

    /**
     * Compares what the workbook shows with what a workbook written from {@code expected} into
     * {@code template} would show: every written value (numbers to 12 significant digits, text exactly)
     * and its number format, font and colours; every other non-empty cell of every sheet against the
     * template's own text (any other text is an edit); repeated cell elements; the sheets, their order
     * and visibility; hidden rows and columns; the defined names; and parts a Holdpoint workbook never
     * has (macros, external links, comments, embedded objects). Entries typed into the empty sign-off
     * fields are listed apart (they are not part of the record). See docs/signoff-workbook.md.
     *
     * @param expected the report input re-computed from the record
     * @param template the template the workbook was written with, or null when it is not known (its own
     *                 cells, sheets and names are then not compared)
     * @return the differences and the hand entries
     * @throws ReportException when the file cannot be read
     */
    public Comparison compare(ReportInput expected, Template template) {
        List<WorkbookDifference> diffs = new ArrayList<>();
        List<String> hand = new ArrayList<>();
        Map<TemplateName, Anchor> anchors = new EnumMap<>(TemplateName.class);
        for (TemplateName t : TemplateName.values()) {
            String ref = names.get(t.definedName());
            if (ref == null) {
                diffs.add(new WorkbookDifference("(workbook)", "-", "defined name " + t.definedName(), "(missing)",
                        "present"));
                continue;
            }
            Anchor a = Template.parse(ref, file.toString(), t.definedName());
            if (template != null && !same(a, template.anchor(t))) {
                diffs.add(new WorkbookDifference("(workbook)", "-", "defined name " + t.definedName(), describe(a),
                        describe(template.anchor(t))));
                a = template.anchor(t);
            }
            anchors.put(t, a);
        }
        if (anchors.size() < TemplateName.values().length) {
            return new Comparison(diffs, hand);
        }
        Map<String, Integer> counts = new LinkedHashMap<>();
        List<Integer> stored = chartCounts();
        for (int i = 0; i < expected.result().characteristics().size(); i++) {
            counts.put(expected.result().characteristics().get(i).name(), i < stored.size() ? stored.get(i) : 0);
        }
        WorkbookPlan plan = WorkbookPlan.of(expected, anchors, counts, layout());
        Anchor raw = anchors.get(TemplateName.RAW_DATA);
        Anchor rec = anchors.get(TemplateName.RECORD);
        Map<String, Iterator<ShownCell>> bySheet = new LinkedHashMap<>();
        for (SheetContent c : plan.contents()) {
            List<ShownCell> cells = new ArrayList<>(c.cells);
            cells.addAll(c.captions);
            cells.sort(java.util.Comparator.comparingInt(ShownCell::row).thenComparingInt(ShownCell::column));
            Iterator<ShownCell> it = cells.iterator();
            if (c.sheet.equals(raw.sheet())) {
                it = concat(it, new Flat(new RawDataRows(expected, raw, layout())));
            }
            bySheet.put(c.sheet, it);
        }
        bySheet.put(rec.sheet(), recordCells(rec).iterator());
        if (template != null) {
            for (String sheet : template.sheetNames()) {
                bySheet.putIfAbsent(sheet, java.util.Collections.emptyIterator());
            }
        }
        RawDataRows labeller = new RawDataRows(expected, raw, layout());
        try (OPCPackage pkg = OPCPackage.open(file.toFile(), PackageAccess.READ)) {
            XSSFReader reader = new XSSFReader(pkg);
            checkWorkbook(pkg, reader, template, rec.sheet(), diffs);
            org.apache.poi.xssf.model.StylesTable styles = reader.getStylesTable();
            for (Map.Entry<String, Iterator<ShownCell>> e : bySheet.entrySet()) {
                String sheet = e.getKey();
                Merge m = new Merge(sheet, e.getValue(), diffs, hand, sheet.equals(raw.sheet()) ? labeller : null,
                        template == null ? null : template.cellTexts(sheet), styles, !sheet.equals(rec.sheet()));
                if (!readSheet(reader, sheet, m)) {
                    diffs.add(new WorkbookDifference(sheet, "-", "sheet", "(missing)", "present"));
                    continue;
                }
                m.finish();
            }
        } catch (ReportException e) {
            throw e;
        } catch (Exception e) {
            throw new ReportException(e, "%s cannot be read as an .xlsx workbook (%s)", file, e.getMessage());
        }
        return new Comparison(diffs, hand);
    }

    private static boolean same(Anchor a, Anchor b) {
        return a.sheet().equals(b.sheet()) && a.row() == b.row() && a.column() == b.column();
    }

    private static String describe(Anchor a) {
        return "'" + a.sheet() + "'!" + new CellReference(a.row(), a.column()).formatAsString();
    }

    /** @return the layout the workbook was written in (from its record marker) */
    int layout() {
        return RecordSheet.layoutOf(record.length > 0 ? record[0] : "");
    }

    /** The record sheet as the writer lays it out, with the values read from it (checked elsewhere). */
    private List<ShownCell> recordCells(Anchor a) {
        List<ShownCell> out = new ArrayList<>();
        out.add(new ShownCell(a.row(), a.column(), "Holdpoint sign-off record: do not edit", Style.HEADING, 0,
                "record heading"));
        List<String> chunks = RecordSheet.chunks(studyJson);
        for (int i = 0; i < RecordSheet.LABELS.length; i++) {
            String v = i < record.length ? record[i] : "";
            if (i == 0) {
                v = RecordSheet.marker(layout());
            } else if (i == 2) {
                v = Integer.toString(studyJson.length());
            } else if (i == 3) {
                v = Integer.toString(chunks.size());
            }
            out.add(new ShownCell(a.row() + 1 + i, a.column(), RecordSheet.LABELS[i], Style.LABEL, 0, "record label"));
            out.add(new ShownCell(a.row() + 1 + i, a.column() + 1, v, Style.MONO, 0, "record " + RecordSheet.LABELS[i]));
        }
        for (int i = 0; i < chunks.size(); i++) {
            int r = a.row() + RecordSheet.FIRST_CHUNK + i;
            out.add(new ShownCell(r, a.column(), (double) (i + 1), Style.INTEGER, 0, "record chunk number"));
            out.add(new ShownCell(r, a.column() + 1, chunks.get(i), Style.MONO, 0, "record chunk " + (i + 1)));
        }
        return out;
    }

    /** Parts of an .xlsx that a Holdpoint workbook never has: code, links out, comments, embedded objects. */
    private static final java.util.regex.Pattern FOREIGN_PART = java.util.regex.Pattern.compile(
            "(?i).*(vbaproject|externallink|connections|comments|threadedcomment|persons/|activex|ctrlprops"
                    + "|embeddings/|oleobject|pivot|querytable|/tables/|slicer|timeline|customxml/|macrosheets"
                    + "|dialogsheets|webextension).*");

    /** The sheets (names, order, visibility), defined names beyond the template's, and foreign parts. */
    private void checkWorkbook(OPCPackage pkg, XSSFReader reader, Template template, String recordSheet,
            List<WorkbookDifference> diffs) throws Exception {
        for (org.apache.poi.openxml4j.opc.PackagePart part : pkg.getParts()) {
            String n = part.getPartName().getName();
            if (FOREIGN_PART.matcher(n).matches()) {
                diffs.add(new WorkbookDifference("(workbook)", "-", "part " + n, "present",
                        "(none: a Holdpoint workbook has no macros, links, comments or embedded objects)"));
            }
        }
        List<String> sheets = new ArrayList<>();
        try (InputStream in = reader.getWorkbookData()) {
            CTWorkbook wb = WorkbookDocument.Factory.parse(in).getWorkbook();
            for (org.openxmlformats.schemas.spreadsheetml.x2006.main.CTSheet sh : wb.getSheets().getSheetArray()) {
                sheets.add(sh.getName());
                boolean hidden = sh.isSetState() && sh.getState()
                        != org.openxmlformats.schemas.spreadsheetml.x2006.main.STSheetState.VISIBLE;
                if (hidden != sh.getName().equals(recordSheet)) {
                    diffs.add(new WorkbookDifference(sh.getName(), "-", "sheet visibility", hidden ? "hidden"
                            : "visible", hidden ? "visible" : "hidden (the record sheet)"));
                }
            }
            if (template != null && wb.getDefinedNames() != null) {
                java.util.Set<String> known = new java.util.HashSet<>();
                for (TemplateName t : TemplateName.values()) {
                    known.add(t.definedName());
                }
                for (CTDefinedName dn : wb.getDefinedNames().getDefinedNameArray()) {
                    if (!dn.isSetLocalSheetId() && !known.contains(dn.getName()) && !dn.getName().startsWith("_xlnm")) {
                        diffs.add(new WorkbookDifference("(workbook)", "-", "defined name " + dn.getName(),
                                dn.getStringValue(), "(none: not in the template)"));
                    }
                }
            }
        }
        if (template != null && !sheets.equals(template.sheetNames())) {
            diffs.add(new WorkbookDifference("(workbook)", "-", "sheets and their order", String.join(", ", sheets),
                    String.join(", ", template.sheetNames())));
        }
    }

    private static Iterator<ShownCell> concat(Iterator<ShownCell> a, Iterator<ShownCell> b) {
        return new Iterator<>() {
            @Override
            public boolean hasNext() {
                return a.hasNext() || b.hasNext();
            }

            @Override
            public ShownCell next() {
                return a.hasNext() ? a.next() : b.next();
            }
        };
    }

    /** The raw data rows as a stream of cells. */
    private static final class Flat implements Iterator<ShownCell> {
        private final RawDataRows rows;
        private ShownCell[] current = new ShownCell[0];
        private int i;

        Flat(RawDataRows rows) {
            this.rows = rows;
        }

        @Override
        public boolean hasNext() {
            return i < current.length || rows.hasNext();
        }

        @Override
        public ShownCell next() {
            if (i >= current.length) {
                if (!rows.hasNext()) {
                    throw new NoSuchElementException();
                }
                current = rows.next();
                i = 0;
            }
            return current[i++];
        }
    }

    /**
     * Merges the expected cells (row-major) with the file's cells (row-major): each written cell is
     * compared with its expected value and style; every other non-empty cell must be the template's own
     * text at that place.
     */
    private static final class Merge implements WrittenCellStream.Sink {
        private final String sheet;
        private final Iterator<ShownCell> expected;
        private final List<WorkbookDifference> diffs;
        private final List<String> hand;
        private final RawDataRows labeller;
        private final Map<Long, String> templateTexts;
        private final java.util.Set<Long> templateSeen = new java.util.HashSet<>();
        private final java.util.Set<Long> written = new java.util.HashSet<>();
        private final org.apache.poi.xssf.model.StylesTable styles;
        private final Map<String, String> styleProblems = new HashMap<>();
        private final boolean visible;
        private final java.util.BitSet hiddenRows = new java.util.BitSet();
        private final java.util.BitSet hiddenCols = new java.util.BitSet();
        private ShownCell next;
        private int style;
        private int lastRow = -1;
        private int lastCol = -1;

        Merge(String sheet, Iterator<ShownCell> expected, List<WorkbookDifference> diffs, List<String> hand,
                RawDataRows labeller, Map<Long, String> templateTexts, org.apache.poi.xssf.model.StylesTable styles,
                boolean visible) {
            this.sheet = sheet;
            this.expected = expected;
            this.diffs = diffs;
            this.hand = hand;
            this.labeller = labeller;
            this.templateTexts = templateTexts;
            this.styles = styles;
            this.visible = visible;
            this.next = expected.hasNext() ? expected.next() : null;
        }

        @Override
        public void style(int s) {
            style = s;
        }

        @Override
        public void hiddenRow(int row) {
            hiddenRows.set(row);
        }

        @Override
        public void hiddenColumns(int first, int last) {
            if (first >= 0 && last >= first && last < 16_384) {
                hiddenCols.set(first, last + 1);
            }
        }

        @Override
        public void cell(int row, int col, WrittenCellStream.Kind kind, String text, String formula) {
            if (row < lastRow || row == lastRow && col <= lastCol) {
                diffs.add(new WorkbookDifference(sheet, ref(row, col), "a repeated or out-of-order cell element",
                        shown(kind, text, formula), "(each cell once, in order, as the writer writes them)"));
                return;
            }
            lastRow = row;
            lastCol = col;
            while (next != null && before(next, row, col)) {
                check(next, null, null, null, -1);
                advance();
            }
            if (next != null && next.row() == row && next.column() == col) {
                check(next, kind, text, formula, style);
                advance();
            } else if (formula != null) {
                diffs.add(new WorkbookDifference(sheet, ref(row, col), "a cell outside the written values",
                        "formula =" + formula, "(no formula; the workbook is written without formulas)"));
            } else if (kind != null && text != null && !text.isEmpty()) {
                unwritten(row, col, kind, text);
            }
        }

        /** A non-empty cell the writer did not write: the template's own text, or an edit. */
        private void unwritten(int row, int col, WrittenCellStream.Kind kind, String text) {
            if (templateTexts == null) {
                return;
            }
            long k = key(row, col);
            String own = templateTexts.get(k);
            if (own == null) {
                diffs.add(new WorkbookDifference(sheet, ref(row, col), "a cell the workbook was written without",
                        shown(kind, text, null), "(empty)"));
            } else {
                templateSeen.add(k);
                boolean same = kind == WrittenCellStream.Kind.TEXT ? own.equals(text) : sameNumber(own, text);
                if (!same) {
                    diffs.add(new WorkbookDifference(sheet, ref(row, col), "the template's text",
                            shown(kind, text, null), "\"" + own + "\""));
                }
            }
        }

        private static boolean sameNumber(String own, String text) {
            try {
                return Double.parseDouble(own) == Double.parseDouble(text);
            } catch (NumberFormatException e) {
                return false;
            }
        }

        void finish() {
            while (next != null) {
                check(next, null, null, null, -1);
                advance();
            }
            if (templateTexts != null) {
                for (Map.Entry<Long, String> t : templateTexts.entrySet()) {
                    if (!templateSeen.contains(t.getKey()) && !written.contains(t.getKey())) {
                        int row = (int) (t.getKey() >> 20);
                        int col = (int) (t.getKey() & 0xFFFFF);
                        diffs.add(new WorkbookDifference(sheet, ref(row, col), "the template's text", "(empty)",
                                "\"" + t.getValue() + "\""));
                    }
                }
            }
            if (visible) {
                for (int r = hiddenRows.nextSetBit(0); r >= 0; r = hiddenRows.nextSetBit(r + 1)) {
                    diffs.add(new WorkbookDifference(sheet, "row " + (r + 1), "row visibility", "hidden", "shown"));
                }
                for (int c = hiddenCols.nextSetBit(0); c >= 0; c = hiddenCols.nextSetBit(c + 1)) {
                    diffs.add(new WorkbookDifference(sheet, "column " + CellReference.convertNumToColString(c),
                            "column visibility", "hidden", "shown"));
                }
            }
        }

        private void advance() {
            next = expected.hasNext() ? expected.next() : null;
        }

        private static boolean before(ShownCell c, int row, int col) {
            return c.row() < row || (c.row() == row && c.column() < col);
        }

        private void check(ShownCell e, WrittenCellStream.Kind kind, String text, String formula, int styleIndex) {
            written.add(key(e.row(), e.column()));
            String shown = shown(kind, text, formula);
            Object v = e.value();
            boolean empty = kind == null || (kind == WrittenCellStream.Kind.TEXT && text.isEmpty());
            boolean ok;
            boolean caption = e.label() != null && e.label().endsWith(DetailPlan.CAPTION);
            if (formula != null) {
                ok = false;
            } else if (caption) {
                // the name of the chart beside it: charts are renderings, not part of the record
                ok = empty || kind == WrittenCellStream.Kind.TEXT;
            } else if (v == null || (v instanceof String s && s.isEmpty())) {
                ok = empty;
                if (!ok && e.style() == Style.FILLABLE) {
                    hand.add(sheet + "!" + ref(e.row(), e.column()) + " (" + e.label() + "): " + shown);
                    return;
                }
            } else if (v instanceof String s) {
                ok = kind == WrittenCellStream.Kind.TEXT && s.equals(text);
            } else {
                ok = kind == WrittenCellStream.Kind.NUMBER && close((Double) v, text);
            }
            String what = e.label() != null ? e.label() : labeller != null ? labeller.label(e.row(), e.column())
                    : "value";
            if (!ok) {
                diffs.add(new WorkbookDifference(sheet, ref(e.row(), e.column()), what, shown, expectedText(v)));
            } else if (styleIndex >= 0 && !empty) {
                String problem = styleProblem(styleIndex, e);
                if (problem != null) {
                    diffs.add(new WorkbookDifference(sheet, ref(e.row(), e.column()), what + ": how it is shown",
                            problem, "format " + Styles.formatCode(e.style(), e.decimals()) + ", readable text"));
                }
            }
        }

        /**
         * What is wrong with the way a cell shows its value: a number format other than the writer's
         * (which can show other digits, or other text, or nothing), text drawn in the colour of its
         * background, or a font too small to read. Null when nothing is.
         */
        private String styleProblem(int index, ShownCell e) {
            String key = index + "/" + e.style() + "/" + e.decimals();
            String found = styleProblems.computeIfAbsent(key, k -> {
                String p = styleProblemOf(index, e);
                return p == null ? "" : p;
            });
            return found.isEmpty() ? null : found;
        }

        private String styleProblemOf(int index, ShownCell e) {
            {
                if (styles == null || index >= styles.getNumCellStyles()) {
                    return index == 0 ? sameFormat("General", e) : "a cell format that does not exist";
                }
                org.apache.poi.xssf.usermodel.XSSFCellStyle st = styles.getStyleAt(index);
                String f = sameFormat(st.getDataFormatString(), e);
                if (f != null) {
                    return f;
                }
                org.apache.poi.xssf.usermodel.XSSFFont font = st.getFont();
                if (font != null && font.getFontHeightInPoints() < 6) {
                    return "font of " + font.getFontHeightInPoints() + " points";
                }
                int[] ink = rgb(font == null ? null : font.getXSSFColor(), new int[] {0, 0, 0});
                int[] paper = st.getFillPattern() == org.apache.poi.ss.usermodel.FillPatternType.SOLID_FOREGROUND
                        ? rgb(st.getFillForegroundColorColor(), new int[] {255, 255, 255}) : new int[] {255, 255, 255};
                int distance = Math.abs(ink[0] - paper[0]) + Math.abs(ink[1] - paper[1]) + Math.abs(ink[2] - paper[2]);
                if (distance < 120) {
                    return String.format(Locale.ROOT, "text colour #%02X%02X%02X on background #%02X%02X%02X", ink[0],
                            ink[1], ink[2], paper[0], paper[1], paper[2]);
                }
                return null;
            }
        }

        private static String sameFormat(String shownFormat, ShownCell e) {
            String want = Styles.formatCode(e.style(), e.decimals());
            String got = shownFormat == null ? "General" : shownFormat;
            if (got.equalsIgnoreCase(want) || normalise(got).equals(normalise(want))) {
                return null;
            }
            return "number format " + got;
        }

        /** Format codes as spreadsheet programs re-save them: quotes and backslash escapes may differ. */
        private static String normalise(String f) {
            return f.replace("\\", "").replace("\"", "").toLowerCase(Locale.ROOT);
        }

        private static int[] rgb(org.apache.poi.ss.usermodel.Color c, int[] dflt) {
            if (c instanceof org.apache.poi.xssf.usermodel.XSSFColor x) {
                byte[] b = x.getRGBWithTint();
                if (b == null) {
                    b = x.getRGB();
                }
                if (b != null && b.length >= 3) {
                    int o = b.length == 4 ? 1 : 0;
                    return new int[] {b[o] & 0xff, b[o + 1] & 0xff, b[o + 2] & 0xff};
                }
            }
            return dflt;
        }

        private static boolean close(double expected, String text) {
            try {
                double a = Double.parseDouble(text);
                return a == expected || Math.abs(a - expected) <= 1e-12 * Math.abs(expected);
            } catch (NumberFormatException ex) {
                return false;
            }
        }

        private static String shown(WrittenCellStream.Kind kind, String text, String formula) {
            if (formula != null) {
                return "formula =" + formula;
            }
            if (kind == null || text == null || text.isEmpty()) {
                return "(empty)";
            }
            return kind == WrittenCellStream.Kind.TEXT ? "\"" + text + "\"" : text;
        }

        private static String expectedText(Object v) {
            if (v == null || (v instanceof String s && s.isEmpty())) {
                return "(empty)";
            }
            if (v instanceof String s) {
                return "\"" + s + "\"";
            }
            double d = (Double) v;
            return d == Math.rint(d) && Math.abs(d) < 1e15 ? Long.toString((long) d) : String.format(Locale.ROOT,
                    "%s", Double.toString(d));
        }

        private static String ref(int row, int col) {
            return new CellReference(row, col).formatAsString();
        }
    }

    /** @return the record sheet's anchor */
    Anchor recordAnchor() {
        return recordAnchor;
    }

    @Override
    public String toString() {
        return "SignoffWorkbookReader[" + file + ", " + Arrays.toString(Arrays.copyOf(record, 2)) + "]";
    }
}
