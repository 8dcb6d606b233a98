package org.holdpoint.importer;

import java.util.Arrays;
import org.holdpoint.stats.Sample;
import org.holdpoint.study.GroupData;

/**
 * Collects the values of one group in primitive arrays (exact decimals as unscaled integer + scale,
 * else doubles) with their cells and optional traceability texts, and builds the {@link GroupData}.
 */
final class GroupBuilder {
    private final String file;
    private final String sheet;
    private final boolean withUnits;
    private final boolean withLots;
    private final boolean withSubgroups;
    private final boolean withSequence;
    private int size;
    private long[] unscaled;
    private byte[] scales;
    private int[] rows;
    private int[] cols;
    private String[] units;
    private String[] lots;
    private String[] subgroups;
    private String[] sequence;

    /**
     * @param file          the file name
     * @param sheet         the sheet name or null
     * @param withUnits     keep a unit id per value
     * @param withLots      keep a lot per value
     * @param withSubgroups keep a subgroup per value
     * @param withSequence  keep a sequence text per value
     */
    GroupBuilder(String file, String sheet, boolean withUnits, boolean withLots, boolean withSubgroups,
            boolean withSequence) {
        this(file, sheet, withUnits, withLots, withSubgroups, withSequence, 16);
    }

    /**
     * @param capacity the number of values expected (a hint)
     */
    GroupBuilder(String file, String sheet, boolean withUnits, boolean withLots, boolean withSubgroups,
            boolean withSequence, int capacity) {
        int cap = Math.max(16, capacity);
        unscaled = new long[cap];
        scales = new byte[cap];
        rows = new int[cap];
        cols = new int[cap];
        this.file = file;
        this.sheet = sheet;
        this.withUnits = withUnits;
        this.withLots = withLots;
        this.withSubgroups = withSubgroups;
        this.withSequence = withSequence;
        units = withUnits ? new String[cap] : null;
        lots = withLots ? new String[cap] : null;
        subgroups = withSubgroups ? new String[cap] : null;
        sequence = withSequence ? new String[cap] : null;
    }

    /** @return a new empty builder with the same source and columns */
    GroupBuilder emptyCopy() {
        return new GroupBuilder(file, sheet, withUnits, withLots, withSubgroups, withSequence);
    }

    /** @return the number of values */
    int size() {
        return size;
    }

    /** @return the file name */
    String file() {
        return file;
    }

    /** @return the sheet name or null */
    String sheet() {
        return sheet;
    }

    /** @return whether unit ids are kept */
    boolean hasUnits() {
        return withUnits;
    }

    /**
     * Adds one value from cell i of a column.
     *
     * @param c   the column
     * @param i   the cell index
     * @param row 1-based row
     * @param col 0-based column
     */
    void add(SheetColumn c, int i, int row, int col) {
        grow();
        unscaled[size] = c.payload(i);
        scales[size] = (byte) c.scale(i);
        rows[size] = row;
        cols[size] = col + 1;
        size++;
    }

    /** Copies value i of another builder (same columns). */
    void addFrom(GroupBuilder o, int i) {
        grow();
        unscaled[size] = o.unscaled[i];
        scales[size] = o.scales[i];
        rows[size] = o.rows[i];
        cols[size] = o.cols[i];
        setTexts(o.unit(i), o.lots == null ? null : o.lots[i], o.subgroups == null ? null : o.subgroups[i],
                o.sequence == null ? null : o.sequence[i]);
        size++;
    }

    /** Sets the traceability texts of the value added last. */
    void setLastTexts(String unit, String lot, String subgroup, String seq) {
        size--;
        setTexts(unit, lot, subgroup, seq);
        size++;
    }

    private void setTexts(String unit, String lot, String subgroup, String seq) {
        if (units != null) {
            units[size] = unit;
        }
        if (lots != null) {
            lots[size] = lot;
        }
        if (subgroups != null) {
            subgroups[size] = subgroup;
        }
        if (sequence != null) {
            sequence[size] = seq;
        }
    }

    private void grow() {
        if (size < rows.length) {
            return;
        }
        int n = size + (size >> 1) + 16;
        unscaled = Arrays.copyOf(unscaled, n);
        scales = Arrays.copyOf(scales, n);
        rows = Arrays.copyOf(rows, n);
        cols = Arrays.copyOf(cols, n);
        if (units != null) {
            units = Arrays.copyOf(units, n);
        }
        if (lots != null) {
            lots = Arrays.copyOf(lots, n);
        }
        if (subgroups != null) {
            subgroups = Arrays.copyOf(subgroups, n);
        }
        if (sequence != null) {
            sequence = Arrays.copyOf(sequence, n);
        }
    }

    /** @return the unit id of value i, or null */
    String unit(int i) {
        return units == null ? null : units[i];
    }

    /** @return the 1-based row of value i */
    int row(int i) {
        return rows[i];
    }

    /** @return the 1-based column of value i */
    int column(int i) {
        return cols[i];
    }

    /** @return the cell address of value i, e.g. "B7" */
    String cell(int i) {
        return org.holdpoint.study.Origin.columnName(cols[i]) + rows[i];
    }

    private static int[] fit(int[] a, int n) {
        return a.length == n ? a : Arrays.copyOf(a, n);
    }

    /**
     * Builds the group: exact decimals at their largest common scale when every value is exact and
     * fits, else the correctly rounded doubles.
     *
     * @return the group
     */
    GroupData build() {
        int n = size;
        int common = 0;
        boolean exact = true;
        for (int i = 0; i < n; i++) {
            if (scales[i] < 0) {
                exact = false;
                break;
            }
            common = Math.max(common, scales[i]);
        }
        Sample sample = null;
        if (exact) {
            long[] u = new long[n];
            for (int i = 0; i < n && exact; i++) {
                if (DecimalParser.fitsRescale(unscaled[i], scales[i], common)) {
                    u[i] = DecimalParser.rescale(unscaled[i], scales[i], common);
                } else {
                    exact = false;
                }
            }
            if (exact) {
                sample = Sample.ofUnscaledTaken(u, common);
            }
        }
        if (sample == null) {
            double[] d = new double[n];
            for (int i = 0; i < n; i++) {
                d[i] = scales[i] >= 0 ? DecimalParser.toDouble(unscaled[i], scales[i])
                        : Double.longBitsToDouble(unscaled[i]);
            }
            sample = Sample.of(d);
        }
        return new GroupData(sample, file, sheet, fit(rows, n), fit(cols, n),
                units == null ? null : Arrays.copyOf(units, n), lots == null ? null : Arrays.copyOf(lots, n),
                subgroups == null ? null : Arrays.copyOf(subgroups, n),
                sequence == null ? null : Arrays.copyOf(sequence, n));
    }
}
