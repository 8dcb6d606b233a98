package org.holdpoint.importer;

import java.util.ArrayList;
import java.util.List;

/**
 * Finds the header row: the last row without numbers above the first run of three data rows (rows
 * holding a number) whose texts occur only once in their columns (repeated texts are
 * group labels or text values, i.e. data); title rows above the header are passed over. Merged header cells lend their text to
 * every column they span; a merged cell spanning several columns in the row above the header becomes
 * a prefix ("Bore (mm)" over "before" and "after" gives "Bore before" and "Bore after", unit mm).
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
        return new Header(row, names(data, row));
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

    private static List<ColumnNames.Name> names(SheetData data, int row) {
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
                        } else {
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
