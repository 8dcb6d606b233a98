package org.holdpoint.importer;

import java.util.BitSet;
import java.util.EnumMap;
import java.util.LinkedHashSet;
import java.util.Map;
import java.util.Set;
import org.holdpoint.study.Origin;
import org.holdpoint.study.SkipReason;

/**
 * Reads the values of a sheet as a {@link Plan} says, into one {@link Accum} per characteristic, and
 * records every cell of a value column that it does not use.
 */
final class LayoutReader {
    private final SheetData data;
    private final Plan plan;
    private final SkipLog log;
    private final Map<String, Accum> accums;
    private final Set<String> unknownLabels = new LinkedHashSet<>();
    private final BitSet rows;
    private final int first;
    private int capacityHint = 16;

    /** The values of one characteristic found so far, with what was skipped per group. */
    static final class Accum {
        final String name;
        String unit;
        GroupBuilder before;
        GroupBuilder after;
        final EnumMap<SkipReason, Long> skippedBefore = new EnumMap<>(SkipReason.class);
        final EnumMap<SkipReason, Long> skippedAfter = new EnumMap<>(SkipReason.class);
        String firstSkipBefore;
        String firstSkipAfter;
        final Set<String> where = new LinkedHashSet<>();
        final Set<String> unknownLabels = new LinkedHashSet<>();

        Accum(String name) {
            this.name = name;
        }
    }

    private LayoutReader(SheetData data, Plan plan, SkipLog log, Map<String, Accum> accums) {
        this.data = data;
        this.plan = plan;
        this.log = log;
        this.accums = accums;
        this.first = plan.header().dataStart();
        this.rows = rowsWithData();
    }

    /**
     * Reads the sheet into {@code accums} (keyed by the characteristic's name key).
     *
     * @param data   the sheet
     * @param plan   how to read it
     * @param log    receives skipped cells
     * @param accums the characteristics found so far (two files share one map)
     * @return the labels found in the group column that matched neither label
     */
    static Set<String> read(SheetData data, Plan plan, SkipLog log, Map<String, Accum> accums) {
        LayoutReader r = new LayoutReader(data, plan, log, accums);
        if (r.rows.isEmpty()) {
            throw new ImportException("%s holds only a header row (row %d) and no data below it. Add the measurements "
                    + "below the header", data.where(), plan.header().row());
        }
        for (Plan.Target t : plan.targets()) {
            if (t.beforeCol() >= 0) {
                r.readColumn(t, t.beforeCol(), true);
                r.readColumn(t, t.afterCol(), false);
            } else {
                r.readLabelled(t);
            }
        }
        return r.unknownLabels;
    }

    /** Rows below the header with a cell in any column the plan reads. */
    private BitSet rowsWithData() {
        java.util.List<SheetColumn> read = new java.util.ArrayList<>();
        mark(read, plan.groupCol());
        mark(read, plan.charCol());
        mark(read, plan.unitCol());
        for (Plan.Target t : plan.targets()) {
            mark(read, t.column());
            mark(read, t.beforeCol());
            mark(read, t.afterCol());
        }
        // the bits set in the words directly (a million rows: a BitSet.set call per cell was a tenth of the layout)
        int last = -1;
        for (SheetColumn c : read) {
            last = Math.max(last, c.row(c.size() - 1));
        }
        long[] words = new long[(last >> 6) + 1];
        for (SheetColumn c : read) {
            for (int i = c.firstAtOrAfter(first); i < c.size(); i++) {
                int r = c.row(i);
                words[r >> 6] |= 1L << r;
            }
        }
        return BitSet.valueOf(words);
    }

    private void mark(java.util.List<SheetColumn> read, int col) {
        SheetColumn c = col < 0 ? null : data.column(col);
        if (c != null && c.size() > 0) {
            read.add(c);
        }
    }

    /** Stacked and wide: the group of each row comes from its label (or from the file's role). */
    private void readLabelled(Plan.Target t) {
        int vc = t.column();
        SheetColumn column = data.column(vc);
        // two groups share the column; one builder per characteristic per group
        capacityHint = plan.charCol() >= 0 || column == null ? 16 : column.size() / 2 + 16;
        Cursor group = new Cursor(plan.groupCol());
        Cursor value = new Cursor(vc);
        Cursor chars = new Cursor(plan.charCol());
        Cursor uom = new Cursor(plan.uomCol());
        Traceability trace = new Traceability();
        Accum fixed = t.name() == null ? null : accum(t.name(), t.unit());
        Map<Long, Accum> byTextId = new java.util.HashMap<>();
        for (int r = rows.nextSetBit(first); r >= 0; r = rows.nextSetBit(r + 1)) {
            int vi = value.at(r);
            Boolean before = groupOf(group, r, vi, vc, t.name());
            if (before == null) {
                continue;
            }
            Accum a = fixed;
            if (a == null) {
                int ci = chars.at(r);
                if (ci < 0) {
                    if (vi >= 0) {
                        log.skip(null, origin(r, vc), SkipReason.NO_CHARACTERISTIC, data.display(value.col, vi));
                    }
                    continue;
                }
                if (chars.col.kind(ci) == CellKind.NUMBER) {
                    a = accum(data.display(chars.col, ci), t.unit());
                } else {
                    a = byTextId.get(chars.col.payload(ci));
                    if (a == null) {
                        a = accum(data.text(chars.col.payload(ci)), t.unit());
                        byTextId.put(chars.col.payload(ci), a);
                    }
                }
            }
            if (a.unit == null && plan.uomCol() >= 0) {
                int ui = uom.at(r);
                if (ui >= 0) {
                    a.unit = data.display(uom.col, ui);
                }
            }
            take(a, before, value, vi, r, vc, trace);
        }
    }

    private static final byte BEFORE_LABEL = 1;
    private static final byte AFTER_LABEL = 2;
    private static final byte OTHER_LABEL = 3;
    /** Per text id of the group column: 0 not yet seen, else which group the label names (one plan at a time). */
    private byte[] groupOfText = new byte[16];

    /**
     * The group of row r: true before, false after, null when the row is not used (unknown or missing
     * label, recorded as a skip when the row has a value).
     */
    private Boolean groupOf(Cursor group, int r, int vi, int vc, String name) {
        if (plan.groupCol() < 0) {
            return plan.role() == Plan.Role.BEFORE || plan.role() == Plan.Role.BASELINE;
        }
        int gi = group.at(r);
        boolean text = gi >= 0 && group.col.kind(gi) != CellKind.NUMBER;
        int id = text ? (int) group.col.payload(gi) : -1;
        // a label's group is decided once per distinct text (a million rows share two labels)
        byte known = text && id < groupOfText.length ? groupOfText[id] : 0;
        if (known == BEFORE_LABEL) {
            return true;
        }
        if (known == AFTER_LABEL) {
            return false;
        }
        if (known == 0) {
            String key = gi < 0 ? null : text ? data.key(id) : data.display(group.col, gi);
            Boolean decided = null;
            if (key != null && plan.role() != Plan.Role.AFTER && key.equals(plan.beforeKey())) {
                decided = true;
            } else if (key != null && plan.role() != Plan.Role.BEFORE && key.equals(plan.afterKey())) {
                decided = false;
            }
            if (text) {
                if (id >= groupOfText.length) {
                    groupOfText = java.util.Arrays.copyOf(groupOfText, Math.max(id + 1, groupOfText.length * 2));
                }
                groupOfText[id] = decided == null ? OTHER_LABEL : decided ? BEFORE_LABEL : AFTER_LABEL;
            }
            if (decided != null) {
                return decided;
            }
        }
        if (vi >= 0) {
            String label = gi < 0 ? "" : data.display(group.col, gi);
            if (unknownLabels.size() < 8 && !label.isEmpty()) {
                unknownLabels.add(label);
            }
            log.skip(name, origin(r, vc), SkipReason.UNKNOWN_GROUP, label.isEmpty() ? "(no group label)" : label);
        }
        return null;
    }

    /** Side by side and paired: a whole column is one group. */
    private void readColumn(Plan.Target t, int col, boolean before) {
        Cursor value = new Cursor(col);
        capacityHint = value.col == null ? 16 : value.col.size() + 1;
        Traceability trace = new Traceability();
        Accum a = accum(t.name(), t.unit());
        if (value.col == null) {
            return;
        }
        int last = value.col.size() == 0 ? 0 : value.col.row(value.col.size() - 1);
        for (int r = rows.nextSetBit(first); r >= 0 && r <= last; r = rows.nextSetBit(r + 1)) {
            int vi = value.at(r);
            if (vi < 0 && plan.paired()) {
                continue;
            }
            take(a, before, value, vi, r, col, trace);
        }
    }

    private void take(Accum a, boolean before, Cursor value, int vi, int r, int col, Traceability trace) {
        if (vi < 0) {
            skip(a, before, r, col, SkipReason.BLANK, "");
            return;
        }
        SheetColumn vcol = value.col;
        CellKind kind = vcol.kind(vi);
        if (kind == CellKind.OTHER_SEPARATOR) {
            throw mixedSeparators(col);
        }
        if (kind != CellKind.NUMBER) {
            skip(a, before, r, col, kind.skipReason(), data.text(vcol.payload(vi)));
            return;
        }
        String unitId = trace.unit(r);
        if (plan.paired() && unitId == null) {
            skip(a, before, r, col, SkipReason.NO_UNIT_ID, data.display(vcol, vi));
            return;
        }
        GroupBuilder g = group(a, before);
        g.add(vcol, vi, r, col);
        if (plan.unitCol() >= 0 || plan.lotCol() >= 0 || plan.subgroupCol() >= 0 || plan.sequenceCol() >= 0) {
            g.setLastTexts(unitId, trace.lot(r), trace.subgroup(r), trace.sequence(r));
        }
    }

    private ImportException mixedSeparators(int col) {
        char sep = data.decimalSeparator();
        return new ImportException("%s, column %s: numbers are written %s (mixed decimal separators; '%s' is in "
                + "force). Correct those cells to one decimal separator, or choose the decimal mark the numbers use", data.where(), Origin.columnName(col + 1), data.separatorCells(col), sep);
    }

    private void skip(Accum a, boolean before, int r, int col, SkipReason reason, String text) {
        log.skip(a.name, origin(r, col), reason, text);
        EnumMap<SkipReason, Long> m = before ? a.skippedBefore : a.skippedAfter;
        m.merge(reason, 1L, Long::sum);
        if (before && a.firstSkipBefore == null) {
            a.firstSkipBefore = Origin.columnName(col + 1) + r;
        } else if (!before && a.firstSkipAfter == null) {
            a.firstSkipAfter = Origin.columnName(col + 1) + r;
        }
    }

    private GroupBuilder group(Accum a, boolean before) {
        GroupBuilder g = before ? a.before : a.after;
        if (g == null) {
            g = new GroupBuilder(data.file(), data.sheet(), plan.unitCol() >= 0, plan.lotCol() >= 0,
                    plan.subgroupCol() >= 0, plan.sequenceCol() >= 0, capacityHint);
            if (before) {
                a.before = g;
            } else {
                a.after = g;
            }
        }
        return g;
    }

    private Accum accum(String name, String unit) {
        String key = ColumnNames.key(name);
        Accum a = accums.get(key);
        if (a == null) {
            a = new Accum(name);
            accums.put(key, a);
        }
        if (a.unit == null) {
            a.unit = unit;
        }
        if (a.where.size() < 2) {
            a.where.add(data.where());
        }
        return a;
    }

    private Origin origin(int row, int col) {
        return new Origin(data.file(), data.sheet(), row, col + 1);
    }

    /** Walks one column in row order; {@link #at} must be called with non-decreasing rows. */
    private final class Cursor {
        final SheetColumn col;
        private int i;

        Cursor(int column) {
            col = column < 0 ? null : data.column(column);
            i = col == null ? 0 : col.firstAtOrAfter(first);
        }

        int at(int row) {
            if (col == null) {
                return -1;
            }
            while (i < col.size() && col.row(i) < row) {
                i++;
            }
            return i < col.size() && col.row(i) == row ? i : -1;
        }

        String text(int row) {
            int k = at(row);
            if (k < 0) {
                return null;
            }
            String s = data.display(col, k);
            return s.isBlank() ? null : s.strip();
        }
    }

    /** The unit, lot, subgroup and sequence texts of a row. */
    private final class Traceability {
        private final Cursor unit = new Cursor(plan.unitCol());
        private final Cursor lot = new Cursor(plan.lotCol());
        private final Cursor subgroup = new Cursor(plan.subgroupCol());
        private final Cursor sequence = new Cursor(plan.sequenceCol());

        String unit(int r) {
            return unit.text(r);
        }

        String lot(int r) {
            return lot.text(r);
        }

        String subgroup(int r) {
            return subgroup.text(r);
        }

        String sequence(int r) {
            return sequence.text(r);
        }
    }
}
