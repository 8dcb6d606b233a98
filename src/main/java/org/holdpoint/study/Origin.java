package org.holdpoint.study;

/**
 * Where one value came from: a file, a sheet (null for text files) and a 1-based row and column.
 *
 * @param file   the file name as given by the user
 * @param sheet  the sheet name, or null for CSV/TSV/text files
 * @param row    1-based row number
 * @param column 1-based column number
 */
public record Origin(String file, String sheet, int row, int column) {

    /** @return the cell address in A1 notation, e.g. {@code C12} */
    public String cell() {
        return columnName(column) + row;
    }

    /**
     * Column letters of a 1-based column number (1 → A, 27 → AA).
     *
     * @param column 1-based column number
     * @return the letters
     */
    public static String columnName(int column) {
        StringBuilder sb = new StringBuilder();
        int c = column;
        while (c > 0) {
            int rem = (c - 1) % 26;
            sb.append((char) ('A' + rem));
            c = (c - 1) / 26;
        }
        return sb.reverse().toString();
    }

    /** @return "file, sheet S, cell C12" (sheet omitted for text files) */
    public String describe() {
        return file + (sheet == null ? "" : ", sheet " + sheet) + ", cell " + cell();
    }
}
