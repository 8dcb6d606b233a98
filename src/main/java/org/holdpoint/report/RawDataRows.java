package org.holdpoint.report;

import java.util.HashMap;
import java.util.Iterator;
import java.util.List;
import java.util.Map;
import java.util.NoSuchElementException;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.Exclusion;
import org.holdpoint.study.GroupData;
import org.holdpoint.study.Origin;

/**
 * The raw data rows, produced one at a time (a million values never sit in memory as cells): every
 * value with its characteristic, group, run order, origin (file, sheet, cell), traceability columns
 * and the user's exclusion reason.
 */
final class RawDataRows implements Iterator<ShownCell[]> {
    static final String[] HEADERS = {"Characteristic", "Group", "Run order", "Value", "Unit", "File", "Sheet",
        "Cell", "Unit id", "Lot", "Subgroup", "Sequence", "Excluded (reason)"};
    static final int[] WIDTHS = {24, 8, 8, 12, 6, 22, 12, 7, 12, 10, 9, 12, 26};
    private final List<CharacteristicData> data;
    private final List<Exclusion> exclusions;
    private final int r0;
    private final int c0;
    private int ci;
    private int group;
    private int i;
    private int row;
    private int decimals;
    private final Map<String, Integer> decimalsByName = new HashMap<>();
    private final int layout;
    private final org.holdpoint.study.AnalysisSettings settings;

    /**
     * @param input  what is written
     * @param anchor where the raw data start
     * @param layout 1: the unit column shows the unit read with the data and the file its full path; 2: the unit
     *               in force (the criteria's, else the data's) and the file's name (its path is on the Import
     *               report)
     */
    RawDataRows(ReportInput input, Anchor anchor, int layout) {
        this.layout = layout;
        this.settings = input.study().settings();
        this.data = input.study().data().characteristics();
        this.exclusions = input.study().settings().exclusions();
        this.r0 = anchor.row() + 1;
        this.c0 = anchor.column();
        this.row = r0;
        skipEmpty();
    }

    private GroupData current() {
        CharacteristicData c = data.get(ci);
        return group == 0 ? c.before() : c.after();
    }

    private void skipEmpty() {
        while (ci < data.size() && i >= current().size()) {
            i = 0;
            if (group == 0) {
                group = 1;
            } else {
                group = 0;
                ci++;
            }
        }
        if (ci < data.size()) {
            CharacteristicData c = data.get(ci);
            decimals = decimalsByName.computeIfAbsent(c.name(), n -> WorkbookPlan.dataDecimals(c));
        }
    }

    @Override
    public boolean hasNext() {
        return ci < data.size();
    }

    /** @return the 0-based row the next call of {@link #next()} fills */
    int nextRow() {
        return row;
    }

    @Override
    public ShownCell[] next() {
        if (!hasNext()) {
            throw new NoSuchElementException();
        }
        CharacteristicData c = data.get(ci);
        GroupData g = current();
        Origin o = g.origin(i);
        ShownCell[] cells = {
            text(0, c.name()), text(1, group == 0 ? "before" : "after"),
            new ShownCell(row, c0 + 2, (double) (i + 1), Style.INTEGER, 0, null),
            new ShownCell(row, c0 + 3, g.sample().value(i), Style.NUMBER, decimals, null),
            text(4, unit(c)), text(5, file(o)), text(6, o.sheet()), text(7, o.cell()), text(8, g.unit(i)),
            text(9, g.lot(i)), text(10, g.subgroup(i)), text(11, g.sequence(i)), text(12, exclusion(c.name(), o, group == 0))};
        row++;
        i++;
        skipEmpty();
        return cells;
    }

    private String unit(CharacteristicData c) {
        if (layout < 2) {
            return c.unit();
        }
        String set = settings.resolve(c.name()).unit();
        return set != null && !set.isBlank() ? set : c.unit();
    }

    private String file(Origin o) {
        if (layout < 2 || o.file() == null) {
            return o.file();
        }
        int slash = Math.max(o.file().lastIndexOf('/'), o.file().lastIndexOf('\\'));
        return o.file().substring(slash + 1);
    }

    private ShownCell text(int col, String value) {
        return new ShownCell(row, c0 + col, value == null ? "" : value, Style.CELL, 0, null);
    }

    private String exclusion(String name, Origin o, boolean before) {
        for (Exclusion e : exclusions) {
            if (e.characteristic() != null
                    && !org.holdpoint.study.NameKeys.key(e.characteristic()).equals(
                            org.holdpoint.study.NameKeys.key(name))) {
                continue;
            }
            if (e.matches(o, before)) {
                return e.reason();
            }
        }
        return "";
    }

    /**
     * A label for a raw data cell, for difference messages.
     *
     * @param sheetRow  the 0-based row
     * @param sheetCol  the 0-based column
     * @return e.g. "raw data row 12, column Value"
     */
    String label(int sheetRow, int sheetCol) {
        int col = sheetCol - c0;
        return "raw data row " + (sheetRow - r0 + 1) + ", " + (col >= 0 && col < HEADERS.length ? HEADERS[col]
                : "column " + (col + 1));
    }
}
