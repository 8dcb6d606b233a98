package org.holdpoint.importer;

import java.util.ArrayList;
import java.util.HashSet;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Set;
import org.holdpoint.study.Layout;
import org.holdpoint.study.Origin;

/**
 * Chooses the layout of a sheet and the role of each column, from the options of the request and,
 * where they are silent, from the header (see docs/import.md, "Layout detection"):
 * <ol>
 * <li>a layout given in the request is used as given;</li>
 * <li>columns named before and after (or "X before" / "X after" per characteristic) are read side
 *     by side, or as pairs matched by the unit id column when pairing is requested;</li>
 * <li>otherwise a group column (named phase/group/condition, or any column whose texts are exactly
 *     the two labels) makes the sheet stacked when a value column is named value or only one column
 *     holds numbers, or wide when several columns hold numbers;</li>
 * <li>anything else is refused with the headers found and the options that would help.</li>
 * </ol>
 */
final class LayoutResolver {
    private final SheetData data;
    private final Header header;
    private final ImportRequest req;
    private final Plan.Role role;
    private final String defaultName;
    private final Set<Integer> reserved = new HashSet<>();
    private final java.util.SortedMap<Integer, String> setAside = new java.util.TreeMap<>();

    private LayoutResolver(SheetData data, Header header, ImportRequest req, Plan.Role role, String defaultName) {
        this.data = data;
        this.header = header;
        this.req = req;
        this.role = role;
        this.defaultName = defaultName;
    }

    /**
     * @param data        the sheet
     * @param header      its header
     * @param req         the request
     * @param role        which groups the sheet holds
     * @param defaultName the characteristic name when the header gives none (the file's stem)
     * @return the plan
     */
    static Plan resolve(SheetData data, Header header, ImportRequest req, Plan.Role role, String defaultName) {
        return new LayoutResolver(data, header, req, role, defaultName).resolve();
    }

    private Plan resolve() {
        String bKey = ColumnNames.key(req.beforeLabel() == null ? "before" : req.beforeLabel());
        String aKey = ColumnNames.key(req.afterLabel() == null ? "after" : req.afterLabel());
        if (bKey.isEmpty() || aKey.isEmpty() || bKey.equals(aKey)) {
            throw new ImportException("the before label \"%s\" and the after label \"%s\" must be two different, "
                    + "non-blank texts", req.beforeLabel(), req.afterLabel());
        }
        int unitCol = role(req.unitIdColumn(), ColumnNames.Trace.UNIT_ID, "unit id");
        int lotCol = role(req.lotColumn(), ColumnNames.Trace.LOT, "lot");
        int subgroupCol = role(req.subgroupColumn(), ColumnNames.Trace.SUBGROUP, "subgroup");
        int sequenceCol = role(req.sequenceColumn(), ColumnNames.Trace.SEQUENCE, "sequence");
        if (sequenceCol < 0) {
            sequenceCol = role(null, ColumnNames.Trace.DATE, "date");
        }
        int uomCol = role(null, ColumnNames.Trace.MEASUREMENT_UNIT, "unit of measure");
        int charCol = named(req.characteristicColumn(), "characteristic");
        if (charCol < 0) {
            charCol = findAny(ColumnNames.CHARACTERISTIC);
        }
        if (charCol >= 0) {
            reserved.add(charCol);
        }
        int groupCol = named(req.groupColumn(), "group");
        for (int c = 0; c < header.width(); c++) {
            ColumnNames.Name n = header.name(c);
            ColumnNames.Trace t = n == null ? null : ColumnNames.trace(n.key());
            if (t != null && !reserved.contains(c) && c != groupCol) {
                reserved.add(c);
                setAside.put(c, t.words() + " (a trace column, not a characteristic)");
            }
        }
        boolean groupNamed = groupCol >= 0;
        if (groupCol < 0) {
            groupCol = findAny(ColumnNames.GROUP);
        }
        if (groupCol < 0) {
            groupCol = labelColumn(bKey, aKey);
        }
        if (groupCol >= 0) {
            reserved.add(groupCol);
        }
        List<Plan.Target> pairs = role == Plan.Role.BOTH ? pairs(bKey, aKey) : List.of();
        Layout layout = req.layout();
        if (layout == Layout.SEPARATE) {
            throw new ImportException("the layout \"separate\" means two files: give a before file and an after file "
                    + "instead of one file");
        }
        if (layout == null) {
            if (!pairs.isEmpty() && !groupNamed) {
                layout = req.paired() ? Layout.PAIRED : Layout.SIDE_BY_SIDE;
                groupCol = -1;
            } else if (groupCol >= 0 || role != Plan.Role.BOTH) {
                layout = null;
            } else {
                throw new ImportException("%s: cannot tell the layout from the header in row %d (%s). Name the columns "
                        + "before and after (side by side), or add a group column such as phase with the labels before "
                        + "and after next to a value column (stacked); or say which column holds the group and which "
                        + "labels mean before and after (the group column and its before and after labels)",
                        data.where(), header.row(), header.describe());
            }
        }
        boolean paired = req.paired() || layout == Layout.PAIRED;
        if (layout == Layout.SIDE_BY_SIDE || layout == Layout.PAIRED) {
            if (pairs.isEmpty()) {
                throw new ImportException("%s: the %s layout needs a before column and an after column, but the header "
                        + "in row %d has %s. Name the columns that hold the before and the after values",
                        data.where(), layout.words(), header.row(), header.describe());
            }
            return plan(layout, paired, -1, -1, pairs, unitCol, lotCol, subgroupCol, sequenceCol, uomCol, bKey, aKey);
        }
        if (groupCol < 0 && role == Plan.Role.BOTH) {
            throw new ImportException("%s: the %s layout needs a group column holding the labels %s and %s, but none "
                    + "was found in the header in row %d (%s). Name it with the group column option",
                    data.where(), layout.words(), quote(bKey), quote(aKey), header.row(), header.describe());
        }
        int valueCol = named(req.valueColumn(), "value");
        if (valueCol < 0 && charCol >= 0) {
            valueCol = findAny(ColumnNames.VALUE);
        }
        List<Plan.Target> targets = new ArrayList<>();
        if (valueCol >= 0 || layout == Layout.STACKED && charCol >= 0) {
            if (valueCol < 0) {
                valueCol = findAny(ColumnNames.VALUE);
            }
            if (valueCol < 0) {
                throw new ImportException("%s: no value column (named value or measurement) in the header in row %d "
                        + "(%s); name it with the value column option", data.where(), header.row(), header.describe());
            }
            targets.add(target(valueCol, charCol >= 0));
        } else {
            int valueByName = findAny(ColumnNames.VALUE);
            if (valueByName >= 0 && (layout == null || layout == Layout.STACKED)) {
                targets.add(target(valueByName, false));
            } else {
                for (int c = 0; c < header.width(); c++) {
                    if (!reserved.contains(c) && header.name(c) != null && holdsNumbers(c)) {
                        targets.add(target(c, false));
                    }
                }
            }
            if (targets.isEmpty()) {
                throw new ImportException("%s: no column below the header in row %d holds numbers (%s). Check that "
                        + "the measurements are below the header, or name the value column", data.where(),
                        header.row(), header.describe());
            }
            if (layout == Layout.STACKED && targets.size() > 1) {
                throw new ImportException("%s: the stacked layout needs one value column, but %d columns hold numbers "
                        + "(%s); name the value column, or choose the wide layout", data.where(), targets.size(),
                        header.describe());
            }
        }
        if (layout == null) {
            layout = targets.size() > 1 ? Layout.WIDE : Layout.STACKED;
        }
        return plan(layout, paired, groupCol, charCol, targets, unitCol, lotCol, subgroupCol, sequenceCol, uomCol, bKey,
                aKey);
    }

    private Plan plan(Layout layout, boolean paired, int groupCol, int charCol, List<Plan.Target> targets, int unitCol,
            int lotCol, int subgroupCol, int sequenceCol, int uomCol, String bKey, String aKey) {
        Map<String, Plan.Target> seen = new LinkedHashMap<>();
        for (Plan.Target t : targets) {
            if (t.name() == null) {
                continue;
            }
            Plan.Target prev = seen.putIfAbsent(ColumnNames.key(t.name()), t);
            if (prev != null) {
                throw new ImportException("%s: characteristic \"%s\" has two columns (%s and %s) in the header in row "
                        + "%d; rename one of them so that every characteristic has one column per group", data.where(),
                        t.name(), letter(first(prev)), letter(first(t)), header.row());
            }
        }
        if (paired && unitCol < 0) {
            throw new ImportException("%s: pairs are matched by unit id, but the header in row %d has no unit id "
                    + "column (%s). Add a column named unit holding each part's id, or name it with the unit id "
                    + "column option; pairs are never matched by row position", data.where(), header.row(),
                    header.describe());
        }
        setAside.remove(groupCol);
        return new Plan(layout, paired, role, header, groupCol, charCol, targets, unitCol, lotCol, subgroupCol,
                sequenceCol, uomCol, bKey, aKey, setAside);
    }

    private Plan.Target target(int col, boolean perRowName) {
        ColumnNames.Name n = header.name(col);
        String name = perRowName ? null : n == null || ColumnNames.VALUE.contains(n.key()) ? defaultName : n.display();
        return new Plan.Target(name, n == null ? null : n.unit(), col, -1, -1);
    }

    /** Before/after column pairs: the named ones, or every "X before" with its "X after". */
    private List<Plan.Target> pairs(String bKey, String aKey) {
        int b = named(req.beforeColumn(), "before");
        int a = named(req.afterColumn(), "after");
        if (b >= 0 || a >= 0) {
            if (b < 0) {
                b = header.find(bKey);
            }
            if (a < 0) {
                a = header.find(aKey);
            }
            if (a < 0 || b < 0) {
                throw new ImportException("%s: both a before and an after column are needed; found %s in row %d",
                        data.where(), header.describe(), header.row());
            }
            return List.of(pair("", b, a, bKey));
        }
        Map<String, Integer> before = new LinkedHashMap<>();
        Map<String, Integer> after = new LinkedHashMap<>();
        for (int c = 0; c < header.width(); c++) {
            ColumnNames.Name n = header.name(c);
            if (n == null || reserved.contains(c)) {
                continue;
            }
            String sb = ColumnNames.stripLabel(n.key(), bKey);
            String sa = ColumnNames.stripLabel(n.key(), aKey);
            if (sb != null) {
                before.putIfAbsent(sb, c);
            } else if (sa != null) {
                after.putIfAbsent(sa, c);
            }
        }
        List<Plan.Target> out = new ArrayList<>();
        for (Map.Entry<String, Integer> e : before.entrySet()) {
            Integer ac = after.remove(e.getKey());
            if (ac == null) {
                throw new ImportException("%s: column \"%s\" (%s) has no matching after column; name the after column "
                        + "\"%s\"", data.where(), header.name(e.getValue()).raw().strip(),
                        org.holdpoint.study.Origin.columnName(e.getValue() + 1),
                        e.getKey().isEmpty() ? aKey : e.getKey() + " " + aKey);
            }
            out.add(pair(e.getKey(), e.getValue(), ac, bKey));
        }
        if (!before.isEmpty() && !after.isEmpty()) {
            Map.Entry<String, Integer> e = after.entrySet().iterator().next();
            throw new ImportException("%s: column \"%s\" (%s) has no matching before column", data.where(),
                    header.name(e.getValue()).raw().strip(), org.holdpoint.study.Origin.columnName(e.getValue() + 1));
        }
        return out;
    }

    private Plan.Target pair(String key, int b, int a, String bKey) {
        ColumnNames.Name nb = header.name(b);
        ColumnNames.Name na = header.name(a);
        String unit = nb.unit() != null ? nb.unit() : na.unit();
        String name = key.isEmpty() ? defaultName : stripLabelWord(nb.display(), bKey);
        reserved.add(a);
        reserved.add(b);
        return new Plan.Target(name, unit, -1, b, a);
    }

    /** The original spelling of the characteristic part of a header such as "Bore before". */
    private static String stripLabelWord(String display, String labelKey) {
        String sep = "[\\s_\\-.:#]+";
        String label = java.util.regex.Pattern.quote(labelKey).replace(" ", "\\E" + sep + "\\Q");
        String out = display.replaceFirst("(?i)^\\s*" + label + sep, "").replaceFirst("(?i)" + sep + label + "\\s*$", "");
        return out.isBlank() ? display : out.strip();
    }

    private int role(String given, ColumnNames.Trace trace, String what) {
        int c = named(given, what);
        if (c < 0) {
            for (int k = 0; k < header.width() && c < 0; k++) {
                ColumnNames.Name n = header.name(k);
                if (n != null && !reserved.contains(k) && ColumnNames.trace(n.key()) == trace) {
                    c = k;
                }
            }
        }
        if (c >= 0) {
            reserved.add(c);
        }
        return c;
    }

    private int findAny(Set<String> keys) {
        for (int c = 0; c < header.width(); c++) {
            ColumnNames.Name n = header.name(c);
            if (n != null && !reserved.contains(c) && keys.contains(n.key())) {
                refuseTwin(c, "");
                return c;
            }
        }
        return -1;
    }

    /** Two columns with the same name for one role: which one holds the data cannot be guessed. */
    private void refuseTwin(int c, String option) {
        String key = header.name(c).key();
        for (int d = c + 1; d < header.width(); d++) {
            ColumnNames.Name m = header.name(d);
            if (m != null && m.key().equals(key)) {
                throw new ImportException("%s: columns %s and %s are both named \"%s\" (header row %d); rename one, or "
                        + "name the column to use by its letter%s", data.where(), Origin.columnName(c + 1),
                        Origin.columnName(d + 1), header.name(c).display(), header.row(), option);
            }
        }
    }

    /** The column the user named (by header text or column letters), −1 when not given. */
    private int named(String given, String what) {
        if (given == null || given.isBlank()) {
            return -1;
        }
        int c = header.find(ColumnNames.parse(given).key());
        if (c < 0 && given.strip().matches("[A-Za-z]{1,3}")) {
            c = letters(given.strip().toUpperCase(Locale.ROOT));
        }
        if (c < 0) {
            throw new ImportException("%s: no %s column \"%s\" in the header in row %d; the columns are %s. Check the "
                    + "spelling", data.where(), what, given, header.row(), header.describe());
        }
        if (!given.strip().matches("[A-Za-z]{1,3}") || header.name(c) != null
                && header.name(c).key().equals(ColumnNames.parse(given).key())) {
            refuseTwin(c, " (e.g. the " + what + " column as " + Origin.columnName(c + 1) + ")");
        }
        return c;
    }

    private static int letters(String s) {
        // column letters as the spreadsheet writes them (A = 0, AA = 26), by POI's own rule
        return org.apache.poi.ss.util.CellReference.convertColStringToIndex(s);
    }

    /** A column whose text cells below the header are exactly the two labels (case-insensitive). */
    private int labelColumn(String bKey, String aKey) {
        for (int c = 0; c < data.columnCount(); c++) {
            SheetColumn col = data.column(c);
            if (col == null || reserved.contains(c) && !setAside.containsKey(c)) {
                continue;
            }
            boolean seenB = false;
            boolean seenA = false;
            boolean other = false;
            for (int i = col.firstAtOrAfter(header.dataStart()); i < col.size() && !other; i++) {
                if (col.kind(i) == CellKind.NUMBER) {
                    other = true;
                    break;
                }
                String k = data.key(col.payload(i));
                if (k.equals(bKey)) {
                    seenB = true;
                } else if (k.equals(aKey)) {
                    seenA = true;
                } else {
                    other = true;
                }
            }
            if (!other && seenA && seenB) {
                return c;
            }
        }
        return -1;
    }

    /** Whether a column holds at least one number (or number-like cell) below the header. */
    private boolean holdsNumbers(int c) {
        SheetColumn col = data.column(c);
        if (col == null) {
            return false;
        }
        for (int i = col.firstAtOrAfter(header.dataStart()); i < col.size(); i++) {
            CellKind k = col.kind(i);
            if (k == CellKind.NUMBER || k == CellKind.OTHER_SEPARATOR || k == CellKind.NOT_FINITE) {
                return true;
            }
        }
        return false;
    }

    private static int first(Plan.Target t) {
        return t.column() >= 0 ? t.column() : t.beforeCol();
    }

    private static String letter(int col) {
        return org.holdpoint.study.Origin.columnName(col + 1);
    }

    static String quote(String s) {
        return "\"" + s + "\"";
    }
}
