package org.holdpoint.importer;

import java.util.Arrays;

/**
 * The non-blank cells of one sheet column, in row order, held in primitive arrays: per cell its
 * 1-based row, its {@link CellKind}, and a payload. For exact numbers the payload is the unscaled
 * integer and {@code scale} its decimal scale; for numbers known only as doubles the scale is −1 and the
 * payload holds the double's bits; for every other kind the payload is the id of its text in the
 * sheet's string table.
 */
final class SheetColumn {
    private int size;
    private int[] rows;
    private byte[] kinds;
    private byte[] scales;
    private long[] payloads;

    /**
     * @param capacity the number of cells expected (a hint; the column grows as needed)
     */
    SheetColumn(int capacity) {
        int n = Math.max(8, capacity);
        rows = new int[n];
        kinds = new byte[n];
        scales = new byte[n];
        payloads = new long[n];
    }

    /** @return the number of non-blank cells */
    int size() {
        return size;
    }

    void add(int row, CellKind kind, int scale, long payload) {
        if (size == rows.length) {
            int n = size + (size >> 1) + 8;
            rows = Arrays.copyOf(rows, n);
            kinds = Arrays.copyOf(kinds, n);
            scales = Arrays.copyOf(scales, n);
            payloads = Arrays.copyOf(payloads, n);
        }
        if (size > 0 && rows[size - 1] == row) {
            // a repeated cell address: the later one wins, as in a spreadsheet program
            size--;
        }
        rows[size] = row;
        kinds[size] = (byte) kind.ordinal();
        scales[size] = (byte) scale;
        payloads[size] = payload;
        size++;
    }

    /**
     * Appends the cells of the same column read from the next block of a sheet, as {@link #add} would one by one
     * (a repeated row at the seam: the later cell wins).
     *
     * @param next    the cells, rows after (or equal to the last of) this column's
     * @param textIds the id in this column's sheet of each text id of {@code next}'s sheet
     */
    void appendAll(SheetColumn next, int[] textIds) {
        int n = next.size;
        if (n == 0) {
            return;
        }
        if (size > 0 && rows[size - 1] == next.rows[0]) {
            size--;
        }
        if (size + n > rows.length) {
            int cap = Math.max(size + n, size + (size >> 1) + 8);
            rows = Arrays.copyOf(rows, cap);
            kinds = Arrays.copyOf(kinds, cap);
            scales = Arrays.copyOf(scales, cap);
            payloads = Arrays.copyOf(payloads, cap);
        }
        System.arraycopy(next.rows, 0, rows, size, n);
        System.arraycopy(next.kinds, 0, kinds, size, n);
        System.arraycopy(next.scales, 0, scales, size, n);
        int number = CellKind.NUMBER.ordinal();
        for (int i = 0; i < n; i++) {
            long p = next.payloads[i];
            payloads[size + i] = next.kinds[i] == number ? p : textIds[(int) p];
        }
        size += n;
    }

    /** Empties the column, keeping its arrays for the next block (ParallelSheetScan). */
    void clear() {
        size = 0;
    }

    /** Replaces the kind and payload of the i-th cell (a text re-read as a number). */
    void set(int i, CellKind kind, int scale, long payload) {
        kinds[i] = (byte) kind.ordinal();
        scales[i] = (byte) scale;
        payloads[i] = payload;
    }

    /** @return the 1-based row of the i-th cell */
    int row(int i) {
        return rows[i];
    }

    /** @return the kind of the i-th cell */
    CellKind kind(int i) {
        return CellKind.of(kinds[i]);
    }

    /** @return the scale of the i-th cell (−1: payload is double bits) */
    int scale(int i) {
        return scales[i];
    }

    /** @return the payload of the i-th cell */
    long payload(int i) {
        return payloads[i];
    }

    /** @return whether the i-th cell is a number known exactly */
    boolean exact(int i) {
        return scales[i] >= 0;
    }

    /** @return the double value of the i-th cell, which must be a number */
    double number(int i) {
        return scales[i] >= 0 ? DecimalParser.toDouble(payloads[i], scales[i]) : Double.longBitsToDouble(payloads[i]);
    }

    /**
     * @param row a 1-based row
     * @return the index of that row's cell, or −1 when the cell is blank
     */
    int indexOfRow(int row) {
        int i = Arrays.binarySearch(rows, 0, size, row);
        return i >= 0 ? i : -1;
    }

    /**
     * @param row a 1-based row
     * @return the index of the first cell at or below that row (size when none)
     */
    int firstAtOrAfter(int row) {
        int i = Arrays.binarySearch(rows, 0, size, row);
        return i >= 0 ? i : -i - 1;
    }

    /** Sorts the cells by row when a source delivered them out of order (rare: hand-made files). */
    void sortIfNeeded() {
        for (int i = 1; i < size; i++) {
            if (rows[i] <= rows[i - 1]) {
                sort();
                return;
            }
        }
    }

    private void sort() {
        Integer[] idx = new Integer[size];
        for (int i = 0; i < size; i++) {
            idx[i] = i;
        }
        Arrays.sort(idx, (a, b) -> Integer.compare(rows[a], rows[b]));
        int[] r = new int[size];
        byte[] k = new byte[size];
        byte[] s = new byte[size];
        long[] p = new long[size];
        int n = 0;
        for (int j = 0; j < size; j++) {
            int i = idx[j];
            if (n > 0 && r[n - 1] == rows[i]) {
                n--;
            }
            r[n] = rows[i];
            k[n] = kinds[i];
            s[n] = scales[i];
            p[n] = payloads[i];
            n++;
        }
        rows = r;
        kinds = k;
        scales = s;
        payloads = p;
        size = n;
    }
}
