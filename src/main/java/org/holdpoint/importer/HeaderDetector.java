package org.holdpoint.importer;

import java.util.ArrayList;
import java.util.List;

/**
 * Finds the header row: the last row without numbers above the first run of three data rows (rows
 * holding a number) whose texts occur only once in their columns (repeated texts are
 * group labels or text values, i.e. data); title rows above the header are passed over. Merged header cells lend their text to
 * every column they span. A merged cell spanning several columns in the row above the header names
 * the characteristic only over group labels ("Bore (mm)" over "before" and "after" gives "Bore before"
 * and "Bore after", unit mm); over real names ("Dimensions" over "Overall length" and "Width") it is a
 * band and is not part of the names. A row of units of measure directly under the header (cells that
 * are all units or blank, such as "mm", "g", "°C", "µm") is recognised, not read as data, and lends
 * its unit to every name that carries none.
 */
final class HeaderDetector {
    /** How many rows from the top are searched for the header. */
    static final int SEARCH_ROWS = 500;
    private static final int RUN = 3;

    private HeaderDetector() {
    }

    /**
     * @param data  the sheet
     * @param given the 1-based header row the user named, or null to detect
     * @return the header
     * @throws ImportException for an empty sheet or one without a header
     */
    static Header detect(SheetData data, Integer given) {
        return detect(data, given, "before", "after");
    }

    /**
     * @param data        the sheet
     * @param given       the 1-based header row the user named, or null to detect
     * @param beforeLabel the comparison key of the before label
     * @param afterLabel  the comparison key of the after label
     * @return the header
     * @throws ImportException for an empty sheet or one without a header
     */
    static Header detect(SheetData data, Integer given, String beforeLabel, String afterLabel) {
        if (data.cellCount() == 0) {
            throw new ImportException("%s holds no data (it is empty). Choose the sheet or file that holds the "
                    + "measurements", data.where());
        }
        int limit = Math.min(data.lastRow(), SEARCH_ROWS);
        boolean[] nonBlank = new boolean[limit + 2];
        boolean[] number = new boolean[limit + 2];
        for (int c = 0; c < data.columnCount(); c++) {
            SheetColumn col = data.column(c);
            if (col == null) {
                continue;
            }
            for (int i = 0; i < col.size() && col.row(i) <= limit; i++) {
                nonBlank[col.row(i)] = true;
                if (col.kind(i) == CellKind.NUMBER) {
                    number[col.row(i)] = true;
                }
            }
        }
        int row;
        if (given != null) {
            if (given < 1 || given > data.lastRow()) {
                throw new ImportException("%s: header row %d is outside the sheet, which has rows 1 to %d", data.where(),
                        given, data.lastRow());
            }
            row = given;
        } else {
            int start = firstDataRun(nonBlank, number, limit);
            if (start < 0) {
                row = firstNonBlank(nonBlank, limit);
            } else {
                boolean[] recurring = recurring(data, limit);
                row = -1;
                int fallback = -1;
                for (int r = start - 1; r >= 1 && row < 0; r--) {
                    if (nonBlank[r] && !number[r]) {
                        if (fallback < 0) {
                            fallback = r;
                        }
                        if (!recurring[r]) {
                            row = r;
                        }
                    }
                }
                if (row < 0) {
                    row = fallback;
                }
                if (row < 1) {
                    throw new ImportException("%s has no header row: row %d already holds numbers. Add a header "
                            + "row naming the columns (for example phase,value or before,after) above the data",
                            data.where(), start);
                }
            }
        }
        int unitsRow = 0;
        if (given == null && row > 1 && unitsRow(data, row) && nonBlank[row - 1] && !number[row - 1]) {
            unitsRow = row;
            row = row - 1;
        } else if (row < data.lastRow() && unitsRow(data, row + 1)) {
            unitsRow = row + 1;
        }
        List<ColumnNames.Name> names = names(data, row, beforeLabel, afterLabel);
        if (unitsRow > 0) {
            names = withUnits(data, names, unitsRow);
        }
        int limitsEnd = 0;
        for (int r = Math.max(row, unitsRow) + 1; r <= data.lastRow() && limitRow(data, r); r++) {
            limitsEnd = r;
        }
        return new Header(row, names, unitsRow, limitsEnd);
    }

    /**
     * Labels of the rows of nominal values and tolerances that measuring-machine exports put between the
     * header and the measurements (English and German); such rows are not measurements.
     */
    private static final java.util.Set<String> LIMIT_ROW_LABELS = java.util.Set.of("nominal", "nom", "target",
            "usl", "lsl", "upper limit", "lower limit", "upper tol", "lower tol", "upper tolerance", "lower tolerance",
            "tol+", "tol-", "+tol", "-tol", "tol +", "tol -", "utol", "ltol", "max limit", "min limit", "soll",
            "sollwert", "nennmaß", "nennmass", "ogw", "ugw", "obere toleranz", "untere toleranz", "ot", "ut",
            "oberer grenzwert", "unterer grenzwert", "spec", "specification", "upper spec", "lower spec");

    /** Whether a row's first text cell (left of any number) labels it as nominal values or limits. */
    static boolean limitRow(SheetData data, int row) {
        for (String t : texts(data, row)) {
            if (t == null) {
                return false;
            }
            if (!t.isBlank()) {
                String k = t.strip().toLowerCase(java.util.Locale.ROOT).replace(":", "").replace(".", "").strip();
                return LIMIT_ROW_LABELS.contains(k) || LIMIT_ROW_LABELS.contains(ColumnNames.key(t));
            }
        }
        return false;
    }

    /**
     * The cells of a row from left to right: each text ("" when blank), and null for a number (and
     * nothing after it, since a row with a number is neither a units row nor a labelled limit row).
     */
    private static List<String> texts(SheetData data, int row) {
        List<String> out = new ArrayList<>();
        for (int c = 0; c < data.columnCount(); c++) {
            SheetColumn col = data.column(c);
            int i = col == null ? -1 : col.indexOfRow(row);
            if (i < 0) {
                continue;
            }
            if (col.kind(i) == CellKind.NUMBER) {
                out.add(null);
                return out;
            }
            String t = data.display(col, i);
            out.add(t == null ? "" : t);
        }
        return out;
    }

    /** Words that are units of measure (compared in lower case), for recognising a units row. */
    private static final java.util.Set<String> UNIT_WORDS = java.util.Set.of("mm", "cm", "m", "km", "µm", "μm", "um",
            "nm", "in", "inch", "ft", "mil", "µin", "uin", "g", "kg", "mg", "t", "n", "kn", "mn", "knm", "pa",
            "kpa", "mpa", "gpa", "bar", "mbar", "psi", "ksi", "hrc", "hrb", "hra", "hv", "hv10", "hv30", "hb", "hbw",
            "s", "ms", "µs", "min", "h", "hz", "khz", "rpm", "1/min", "v", "mv", "a", "ma", "w", "kw", "ω", "ohm",
            "°", "deg", "°c", "°f", "k", "c", "f", "%", "‰", "ppm", "l", "ml", "db", "lux", "j", "kj", "rad", "mrad",
            "gf", "kgf", "lbf", "lb", "oz", "ra", "rz", "mm2", "mm3", "mm²", "mm³", "cm²", "cm³", "m²", "m³", "n·m",
            "n m", "-", "—", "–", "1", "pcs", "stk");
    /** Placeholders for missing values that read like quotients of units ("n/a": newton per ampere). */
    private static final java.util.Set<String> NOT_UNITS = java.util.Set.of("n/a", "n.a.", "n.a", "na", "k.a.",
            "n/v", "nv", "n/m");
    /** Labels that may open a units row in its first cell. */
    private static final java.util.Set<String> UNIT_ROW_LABELS = java.util.Set.of("unit", "units", "uom", "einheit",
            "einheiten", "unit of measure", "dimension");

    /** Whether a row holds only units of measure (and blanks), at least one of them, and no number. */
    static boolean unitsRow(SheetData data, int row) {
        int units = 0;
        for (String t : texts(data, row)) {
            if (t == null) {
                return false;
            }
            if (t.isBlank()) {
                continue;
            }
            if (isUnit(t)) {
                units++;
            } else if (!UNIT_ROW_LABELS.contains(ColumnNames.key(t).replace(":", "").strip())) {
                return false;
            }
        }
        return units > 0;
    }

    /** A unit of measure, bare or in brackets, possibly a quotient or product of units ("N·m", "mm/s", "l/min"). */
    static boolean isUnit(String text) {
        String t = text.strip().toLowerCase(java.util.Locale.ROOT);
        if (t.length() >= 2 && (t.startsWith("(") && t.endsWith(")") || t.startsWith("[") && t.endsWith("]"))) {
            t = t.substring(1, t.length() - 1).strip();
        }
        if (t.isEmpty() || t.length() > 16 || NOT_UNITS.contains(t)) {
            return false;
        }
        if (UNIT_WORDS.contains(t)) {
            return true;
        }
        for (String part : t.split("[/·*]")) {
            String p = part.strip();
            if (!UNIT_WORDS.contains(p) && !UNIT_WORDS.contains(p.replaceAll("[\\^]?[0-9²³]+$", ""))) {
                return false;
            }
        }
        return true;
    }

    private static List<ColumnNames.Name> withUnits(SheetData data, List<ColumnNames.Name> names, int unitsRow) {
        List<ColumnNames.Name> out = new ArrayList<>();
        for (int c = 0; c < names.size(); c++) {
            ColumnNames.Name n = names.get(c);
            String u = data.display(unitsRow, c);
            if (n != null && n.unit() == null && u != null && isUnit(u)) {
                String unit = u.strip();
                if (unit.length() >= 2 && (unit.startsWith("(") || unit.startsWith("["))) {
                    unit = unit.substring(1, unit.length() - 1).strip();
                }
                n = new ColumnNames.Name(n.raw(), n.display(), n.key(), unit);
            }
            out.add(n);
        }
        return out;
    }

    /** Whether a header text is a group label, alone or with a unit ("before", "After (mm)"). */
    private static boolean isLabel(String text, String beforeLabel, String afterLabel) {
        String k = ColumnNames.parse(text).key();
        return k.equals(beforeLabel) || k.equals(afterLabel);
    }

    /**
     * Rows holding a text that occurs more than once in the same column: such a row is data (a group
     * label, a text value), not the header, whose names do not repeat in their columns.
     */
    private static boolean[] recurring(SheetData data, int limit) {
        boolean[] rec = new boolean[limit + 2];
        for (int c = 0; c < data.columnCount(); c++) {
            SheetColumn col = data.column(c);
            if (col == null) {
                continue;
            }
            java.util.Map<Long, Integer> seen = new java.util.HashMap<>();
            for (int i = 0; i < col.size() && col.row(i) <= limit; i++) {
                if (col.kind(i) == CellKind.NUMBER) {
                    continue;
                }
                Integer prev = seen.put(col.payload(i), col.row(i));
                if (prev != null) {
                    rec[prev] = true;
                    rec[col.row(i)] = true;
                }
            }
        }
        return rec;
    }

    private static int firstNonBlank(boolean[] nonBlank, int limit) {
        for (int r = 1; r <= limit; r++) {
            if (nonBlank[r]) {
                return r;
            }
        }
        return 1;
    }

    /** The first row of the first run of RUN non-blank rows that all hold a number (or of the longest run). */
    private static int firstDataRun(boolean[] nonBlank, boolean[] number, int limit) {
        int bestStart = -1;
        int bestLen = 0;
        int r = 1;
        while (r <= limit) {
            if (!number[r]) {
                r++;
                continue;
            }
            int start = r;
            int len = 0;
            while (r <= limit && (number[r] || !nonBlank[r])) {
                if (number[r]) {
                    len++;
                }
                r++;
            }
            if (len >= RUN) {
                return start;
            }
            if (len > bestLen) {
                bestLen = len;
                bestStart = start;
            }
        }
        return bestStart;
    }

    private static List<ColumnNames.Name> names(SheetData data, int row, String beforeLabel, String afterLabel) {
        int width = 0;
        String[] texts = new String[data.columnCount()];
        for (int c = 0; c < data.columnCount(); c++) {
            texts[c] = data.display(row, c);
        }
        for (int[] m : data.merged()) {
            if (m[0] <= row && row <= m[1]) {
                String t = data.display(m[0], m[2]);
                for (int c = m[2]; c <= m[3] && c < texts.length; c++) {
                    if (texts[c] == null || texts[c].isBlank()) {
                        texts[c] = t;
                    }
                }
            } else if (m[1] == row - 1 && m[3] > m[2]) {
                String prefix = data.display(m[0], m[2]);
                if (prefix != null && !prefix.isBlank()) {
                    ColumnNames.Name p = ColumnNames.parse(prefix);
                    for (int c = m[2]; c <= m[3] && c < texts.length; c++) {
                        String lower = texts[c];
                        if (lower == null || lower.isBlank()) {
                            texts[c] = prefix;
                        } else if (isLabel(lower, beforeLabel, afterLabel)) {
                            ColumnNames.Name l = ColumnNames.parse(lower);
                            String unit = l.unit() != null ? l.unit() : p.unit();
                            texts[c] = p.display() + " " + l.display() + (unit == null ? "" : " (" + unit + ")");
                        }
                    }
                }
            }
        }
        List<ColumnNames.Name> names = new ArrayList<>();
        for (int c = 0; c < texts.length; c++) {
            if (texts[c] != null && !texts[c].isBlank()) {
                width = c + 1;
            }
        }
        for (int c = 0; c < width; c++) {
            names.add(texts[c] == null || texts[c].isBlank() ? null : ColumnNames.parse(texts[c]));
        }
        return names;
    }
}
