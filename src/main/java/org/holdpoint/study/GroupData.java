package org.holdpoint.study;

import java.util.Arrays;
import org.holdpoint.stats.Sample;

/**
 * The values of one group (before or after) of one characteristic, in run order, with the origin
 * of each value and the optional traceability columns, held column-wise so that a million values
 * stay small in memory.
 */
public final class GroupData {
    private final Sample sample;
    private final String file;
    private final String sheet;
    private final int[] rows;
    private final int[] columns;
    private final String[] units;
    private final String[] lots;
    private final String[] subgroups;
    private final String[] sequence;

    /**
     * Creates the group; arrays are taken as they are (not copied) and must all have the sample's size.
     *
     * @param sample    the values in run order
     * @param file      the source file name
     * @param sheet     the sheet name, or null for text files
     * @param rows      1-based row of each value
     * @param columns   1-based column of each value
     * @param units     unit or serial id per value, or null
     * @param lots      lot or batch per value, or null
     * @param subgroups subgroup per value, or null
     * @param sequence  sequence number or timestamp text per value, or null
     */
    public GroupData(Sample sample, String file, String sheet, int[] rows, int[] columns, String[] units,
            String[] lots, String[] subgroups, String[] sequence) {
        int n = sample.size();
        check(rows, n, "rows");
        check(columns, n, "columns");
        check(units, n, "units");
        check(lots, n, "lots");
        check(subgroups, n, "subgroups");
        check(sequence, n, "sequence");
        this.sample = sample;
        this.file = file;
        this.sheet = sheet;
        this.rows = rows;
        this.columns = columns;
        this.units = units;
        this.lots = lots;
        this.subgroups = subgroups;
        this.sequence = sequence;
    }

    /**
     * A group without origins, e.g. built from typed values.
     *
     * @param sample the values
     * @param label  a name for the source, e.g. "typed values"
     * @return the group with rows numbered 1..n in column 1
     */
    public static GroupData typed(Sample sample, String label) {
        int[] rows = new int[sample.size()];
        int[] cols = new int[sample.size()];
        for (int i = 0; i < rows.length; i++) {
            rows[i] = i + 1;
            cols[i] = 1;
        }
        return new GroupData(sample, label, null, rows, cols, null, null, null, null);
    }

    private static void check(Object array, int n, String name) {
        if (array == null) {
            return;
        }
        int len = array instanceof int[] a ? a.length : ((Object[]) array).length;
        if (len != n) {
            throw new IllegalArgumentException(name + " has " + len + " entries for " + n + " values");
        }
    }

    /** @return the values */
    public Sample sample() {
        return sample;
    }

    /** @return the number of values */
    public int size() {
        return sample.size();
    }

    /** @return the source file name */
    public String file() {
        return file;
    }

    /** @return the sheet name or null */
    public String sheet() {
        return sheet;
    }

    /**
     * @param i 0-based position in run order
     * @return the origin of that value
     */
    public Origin origin(int i) {
        return new Origin(file, sheet, rows[i], columns[i]);
    }

    /**
     * @param i 0-based position
     * @return the unit/serial id or null
     */
    public String unit(int i) {
        return units == null ? null : units[i];
    }

    /** @return whether unit ids are present */
    public boolean hasUnits() {
        return units != null;
    }

    /** @return whether lots are present */
    public boolean hasLots() {
        return lots != null;
    }

    /** @return whether subgroups are present */
    public boolean hasSubgroups() {
        return subgroups != null;
    }

    /** @return whether a sequence/timestamp column is present */
    public boolean hasSequence() {
        return sequence != null;
    }

    /**
     * @param i 0-based position
     * @return the lot or null
     */
    public String lot(int i) {
        return lots == null ? null : lots[i];
    }

    /**
     * @param i 0-based position
     * @return the subgroup or null
     */
    public String subgroup(int i) {
        return subgroups == null ? null : subgroups[i];
    }

    /**
     * @param i 0-based position
     * @return the sequence text or null
     */
    public String sequence(int i) {
        return sequence == null ? null : sequence[i];
    }

    /**
     * The group without the values at the given 0-based positions (user exclusions).
     *
     * @param excluded positions to leave out
     * @return a new group, run order kept
     */
    public GroupData without(int... excluded) {
        if (excluded.length == 0) {
            return this;
        }
        boolean[] drop = new boolean[size()];
        for (int i : excluded) {
            drop[i] = true;
        }
        int[] keep = new int[size() - (int) Arrays.stream(excluded).distinct().count()];
        int k = 0;
        for (int i = 0; i < drop.length; i++) {
            if (!drop[i]) {
                keep[k++] = i;
            }
        }
        return new GroupData(sample.without(excluded), file, sheet, pickInt(rows, keep), pickInt(columns, keep),
                pick(units, keep), pick(lots, keep), pick(subgroups, keep), pick(sequence, keep));
    }

    private static int[] pickInt(int[] a, int[] keep) {
        int[] r = new int[keep.length];
        for (int i = 0; i < keep.length; i++) {
            r[i] = a[keep[i]];
        }
        return r;
    }

    private static String[] pick(String[] a, int[] keep) {
        if (a == null) {
            return null;
        }
        String[] r = new String[keep.length];
        for (int i = 0; i < keep.length; i++) {
            r[i] = a[keep[i]];
        }
        return r;
    }
}
