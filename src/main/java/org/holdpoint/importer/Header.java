package org.holdpoint.importer;

import java.util.ArrayList;
import java.util.List;

/**
 * The header row of a sheet: its 1-based row and the parsed name of each 0-based column (null for a
 * column without a header).
 *
 * @param row      the 1-based header row
 * @param names    the names per column
 * @param unitsRow the 1-based row of units of measure directly under the header, or 0 when there is none
 * @param limitRowsEnd the last 1-based row of the rows of nominal values and limits under the header (and
 *                 its units row), or 0 when there are none
 */
record Header(int row, List<ColumnNames.Name> names, int unitsRow, int limitRowsEnd) {

    /** Copies the list (nulls allowed). */
    Header {
        names = java.util.Collections.unmodifiableList(new ArrayList<>(names));
    }

    /**
     * A header without a units row.
     *
     * @param row   the 1-based header row
     * @param names the names per column
     */
    Header(int row, List<ColumnNames.Name> names) {
        this(row, names, 0, 0);
    }

    /** @return the first row that may hold data: below the header, its units row and its limit rows */
    int dataStart() {
        return Math.max(limitRowsEnd, unitsRow > 0 ? unitsRow : row) + 1;
    }

    /** @return the number of columns the header spans (up to its last named column) */
    int width() {
        return names.size();
    }

    /**
     * @param col 0-based column
     * @return the name, or null
     */
    ColumnNames.Name name(int col) {
        return col < names.size() ? names.get(col) : null;
    }

    /**
     * @param key a comparison key
     * @return the first column with that key, or −1
     */
    int find(String key) {
        for (int c = 0; c < names.size(); c++) {
            ColumnNames.Name n = names.get(c);
            if (n != null && n.key().equals(key)) {
                return c;
            }
        }
        return -1;
    }

    /** @return "phase (A), value (B), …" for messages, at most 12 names */
    String describe() {
        StringBuilder sb = new StringBuilder();
        int shown = 0;
        int total = 0;
        for (int c = 0; c < names.size(); c++) {
            ColumnNames.Name n = names.get(c);
            if (n == null) {
                continue;
            }
            total++;
            if (shown < 12) {
                if (shown > 0) {
                    sb.append(", ");
                }
                sb.append('"').append(n.raw().strip()).append("\" (").append(org.holdpoint.study.Origin.columnName(c + 1))
                        .append(')');
                shown++;
            }
        }
        if (total > shown) {
            sb.append(String.format(java.util.Locale.ROOT, " and %,d more", total - shown));
        }
        return total == 0 ? "no named columns" : sb.toString();
    }
}
