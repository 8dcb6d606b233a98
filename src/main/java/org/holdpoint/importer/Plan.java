package org.holdpoint.importer;

import java.util.List;
import org.holdpoint.study.Layout;

/**
 * How to read one sheet: the layout and the role of each column (0-based; −1 when absent).
 *
 * @param layout      the layout
 * @param paired      whether values are matched by unit id
 * @param role        which groups the sheet holds
 * @param header      the header
 * @param groupCol    the group (phase) column
 * @param charCol     the characteristic-name column (stacked)
 * @param targets     the value columns: one per characteristic, or before/after pairs
 * @param unitCol     unit/serial id column
 * @param lotCol      lot column
 * @param subgroupCol subgroup column
 * @param sequenceCol sequence/timestamp column
 * @param uomCol      unit-of-measure column (stacked with a characteristic column)
 * @param beforeKey   the before label's key
 * @param afterKey    the after label's key
 * @param setAside    columns recognised as trace columns (or left out by the user's choice) that are not read
 *                    as characteristics, with what each was taken as, in column order
 */
record Plan(Layout layout, boolean paired, Role role, Header header, int groupCol, int charCol, List<Target> targets,
        int unitCol, int lotCol, int subgroupCol, int sequenceCol, int uomCol, String beforeKey, String afterKey,
        java.util.SortedMap<Integer, String> setAside) {

    /** Which groups a sheet holds. */
    enum Role {
        /** Both groups (one file). */
        BOTH,
        /** Only the before group (the before file of two). */
        BEFORE,
        /** Only the after group. */
        AFTER,
        /**
         * The baseline, before a trial: every row is "before" when the sheet has no group column; with one,
         * the rows labelled before are the baseline (rows labelled after, if any, are kept apart).
         */
        BASELINE
    }

    /**
     * A characteristic's columns.
     *
     * @param name      the characteristic's name (null: taken from the characteristic column per row)
     * @param unit      unit of measure from the header, or null
     * @param column    the value column (stacked, wide), or −1
     * @param beforeCol the before column (side by side, paired), or −1
     * @param afterCol  the after column, or −1
     */
    record Target(String name, String unit, int column, int beforeCol, int afterCol) {
    }

    /** Copies the targets. */
    Plan {
        targets = List.copyOf(targets);
        setAside = java.util.Collections.unmodifiableSortedMap(new java.util.TreeMap<>(setAside));
    }

    /**
     * @param kept the targets to read
     * @param more further columns set aside, with why
     * @return this plan reading only {@code kept}
     */
    Plan withTargets(List<Target> kept, java.util.Map<Integer, String> more) {
        java.util.SortedMap<Integer, String> all = new java.util.TreeMap<>(setAside);
        all.putAll(more);
        return new Plan(layout, paired, role, header, groupCol, charCol, kept, unitCol, lotCol, subgroupCol,
                sequenceCol, uomCol, beforeKey, afterKey, all);
    }
}
