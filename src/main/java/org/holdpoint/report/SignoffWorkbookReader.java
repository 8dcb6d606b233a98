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
            if (!RecordSheet.FORMAT.equals(values[0])) {
                throw new ReportException("%s is not a Holdpoint sign-off workbook: the record sheet '%s' does not "
                        + "start with the record format marker", file, a.sheet());
            }
            int chunks = parseInt(values[3]);
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

    private static boolean readSheet(XSSFReader reader, String sheet, SheetCells.Sink sink) throws Exception {
        SharedStrings strings = reader.getSharedStringsTable();
        XSSFReader.SheetIterator it = (XSSFReader.SheetIterator) reader.getSheetsData();
        while (it.hasNext()) {
            try (InputStream in = it.next()) {
                if (it.getSheetName().equals(sheet)) {
                    SheetCells.read(in, strings, sink);
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

    /**
     * Compares every value the workbook shows with the values a workbook written from {@code expected} would
     * show: the same plan of cells, streamed sheet by sheet. Numbers must agree to 12 significant digits,
     * text exactly; a formula anywhere in a planned cell is a difference; entries typed into the empty
     * sign-off fields are listed apart (they are not part of the record).
     *
     * @param expected the report input re-computed from the record
     * @return the differences and the hand entries
     * @throws ReportException when the file cannot be read
     */
    public Comparison compare(ReportInput expected) {
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
            anchors.put(t, Template.parse(ref, file.toString(), t.definedName()));
        }
        if (anchors.size() < TemplateName.values().length) {
            return new Comparison(diffs, hand);
        }
        Map<String, Integer> counts = new LinkedHashMap<>();
        List<Integer> stored = chartCounts();
        for (int i = 0; i < expected.result().characteristics().size(); i++) {
            counts.put(expected.result().characteristics().get(i).name(), i < stored.size() ? stored.get(i) : 0);
        }
        WorkbookPlan plan = WorkbookPlan.of(expected, anchors, counts);
        Anchor raw = anchors.get(TemplateName.RAW_DATA);
        Map<String, Iterator<ShownCell>> bySheet = new LinkedHashMap<>();
        for (SheetContent c : plan.contents()) {
            Iterator<ShownCell> it = c.sorted().iterator();
            if (c.sheet.equals(raw.sheet())) {
                it = concat(it, new Flat(new RawDataRows(expected, raw)));
            }
            bySheet.put(c.sheet, it);
        }
        RawDataRows labeller = new RawDataRows(expected, raw);
        try (OPCPackage pkg = OPCPackage.open(file.toFile(), PackageAccess.READ)) {
            XSSFReader reader = new XSSFReader(pkg);
            for (Map.Entry<String, Iterator<ShownCell>> e : bySheet.entrySet()) {
                Merge m = new Merge(e.getKey(), e.getValue(), diffs, hand,
                        e.getKey().equals(raw.sheet()) ? labeller : null);
                if (!readSheet(reader, e.getKey(), m)) {
                    diffs.add(new WorkbookDifference(e.getKey(), "-", "sheet", "(missing)", "present"));
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

    /** Merges the expected cells (row-major) with the file's cells (row-major). */
    private static final class Merge implements SheetCells.Sink {
        private final String sheet;
        private final Iterator<ShownCell> expected;
        private final List<WorkbookDifference> diffs;
        private final List<String> hand;
        private final RawDataRows labeller;
        private ShownCell next;

        Merge(String sheet, Iterator<ShownCell> expected, List<WorkbookDifference> diffs, List<String> hand,
                RawDataRows labeller) {
            this.sheet = sheet;
            this.expected = expected;
            this.diffs = diffs;
            this.hand = hand;
            this.labeller = labeller;
            this.next = expected.hasNext() ? expected.next() : null;
        }

        @Override
        public void cell(int row, int col, SheetCells.Kind kind, String text, String formula) {
            while (next != null && before(next, row, col)) {
                check(next, null, null, null);
                advance();
            }
            if (next != null && next.row() == row && next.column() == col) {
                check(next, kind, text, formula);
                advance();
            } else if (formula != null) {
                diffs.add(new WorkbookDifference(sheet, ref(row, col), "a cell outside the written values",
                        "formula =" + formula, "(no formula; the workbook is written without formulas)"));
            }
        }

        void finish() {
            while (next != null) {
                check(next, null, null, null);
                advance();
            }
        }

        private void advance() {
            next = expected.hasNext() ? expected.next() : null;
        }

        private static boolean before(ShownCell c, int row, int col) {
            return c.row() < row || (c.row() == row && c.column() < col);
        }

        private void check(ShownCell e, SheetCells.Kind kind, String text, String formula) {
            String shown = shown(kind, text, formula);
            Object v = e.value();
            boolean empty = kind == null || (kind == SheetCells.Kind.TEXT && text.isEmpty());
            boolean ok;
            if (formula != null) {
                ok = false;
            } else if (v == null || (v instanceof String s && s.isEmpty())) {
                ok = empty;
                if (!ok && e.style() == Style.FILLABLE) {
                    hand.add(sheet + "!" + ref(e.row(), e.column()) + " (" + e.label() + "): " + shown);
                    return;
                }
            } else if (v instanceof String s) {
                ok = kind == SheetCells.Kind.TEXT && s.equals(text);
            } else {
                ok = kind == SheetCells.Kind.NUMBER && close((Double) v, text);
            }
            if (!ok) {
                String what = e.label() != null ? e.label() : labeller != null ? labeller.label(e.row(), e.column())
                        : "value";
                diffs.add(new WorkbookDifference(sheet, ref(e.row(), e.column()), what, shown, expectedText(v)));
            }
        }

        private static boolean close(double expected, String text) {
            try {
                double a = Double.parseDouble(text);
                return a == expected || Math.abs(a - expected) <= 1e-12 * Math.abs(expected);
            } catch (NumberFormatException ex) {
                return false;
            }
        }

        private static String shown(SheetCells.Kind kind, String text, String formula) {
            if (formula != null) {
                return "formula =" + formula;
            }
            if (kind == null || text == null || text.isEmpty()) {
                return "(empty)";
            }
            return kind == SheetCells.Kind.TEXT ? "\"" + text + "\"" : text;
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
