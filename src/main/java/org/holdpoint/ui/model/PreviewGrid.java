package org.holdpoint.ui.model;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.GroupData;
import org.holdpoint.study.ImportReport;
import org.holdpoint.study.Origin;
import org.holdpoint.study.SkipReason;
import org.holdpoint.study.SkippedCell;

/**
 * The preview of the Data step: what was read, cell by cell in file order — each value used with its
 * characteristic and group, and each cell not used with its reason — cut to the first rows so that a
 * million-value file stays quick to show.
 *
 * @param rows  the rows shown
 * @param total the number of values and listed skipped cells in the whole import
 */
public record PreviewGrid(List<Row> rows, long total) {
    /** The default number of rows shown. */
    public static final int LIMIT = 2000;

    /** The columns of the preview. */
    public enum Column {
        /** File, sheet and cell address. */
        CELL("Cell"),
        /** The characteristic. */
        CHARACTERISTIC("Characteristic"),
        /** Before or after. */
        GROUP("Group"),
        /** The unit/serial id, when present. */
        UNIT_ID("Unit id"),
        /** The value or the cell's text. */
        VALUE("Value"),
        /** "used", or the reason the cell was not used. */
        STATUS("Status");

        private final String label;

        Column(String label) {
            this.label = label;
        }

        /** @return the heading */
        public String label() {
            return label;
        }
    }

    /**
     * One cell of the source.
     *
     * @param origin         where it is
     * @param characteristic the characteristic, or "" for a skipped cell
     * @param group          "before", "after" or ""
     * @param unitId         the unit id or ""
     * @param text           the value as read, or the cell's text
     * @param skipped        why it was not used, or null when it was used
     */
    public record Row(Origin origin, String characteristic, String group, String unitId, String text,
            SkipReason skipped) {
        /**
         * @param c the column
         * @return the text shown in that column
         */
        public String cell(Column c) {
            return switch (c) {
                case CELL -> (origin.sheet() == null ? "" : origin.sheet() + "!") + origin.cell();
                case CHARACTERISTIC -> characteristic;
                case GROUP -> group;
                case UNIT_ID -> unitId;
                case VALUE -> text;
                case STATUS -> skipped == null ? "used" : "not used: " + skipped.words();
            };
        }
    }

    /** Copies the rows. */
    public PreviewGrid {
        rows = List.copyOf(rows);
    }

    /** An empty preview. */
    public static final PreviewGrid EMPTY = new PreviewGrid(List.of(), 0);

    /**
     * Builds the preview of an import.
     *
     * @param data  the import
     * @param limit the most rows to show
     * @return the preview, sorted by file, row and column
     */
    public static PreviewGrid of(Dataset data, int limit) {
        List<Row> rows = new ArrayList<>();
        long total = 0;
        for (CharacteristicData c : data.characteristics()) {
            total += c.before().size() + c.after().size();
            add(rows, c.name(), "before", c.before(), limit);
            add(rows, c.name(), "after", c.after(), limit);
        }
        ImportReport report = data.report();
        for (SkippedCell s : report.firstSkipped()) {
            rows.add(new Row(s.origin(), "", "", "", s.text() == null ? "" : s.text(), s.reason()));
        }
        total += report.firstSkipped().size();
        rows.sort(Comparator.comparing((Row r) -> r.origin().file() == null ? "" : r.origin().file())
                .thenComparing(r -> r.origin().sheet() == null ? "" : r.origin().sheet())
                .thenComparingInt(r -> r.origin().row()).thenComparingInt(r -> r.origin().column()));
        return new PreviewGrid(rows.size() > limit ? rows.subList(0, limit) : rows, total);
    }

    private static String shortName(Origin o) {
        String f = o.file() == null ? "" : java.nio.file.Path.of(o.file()).getFileName().toString();
        return f + (o.sheet() == null ? "" : ", sheet " + o.sheet()) + ", cell " + o.cell();
    }

    private static void add(List<Row> rows, String name, String group, GroupData g, int limit) {
        int n = Math.min(g.size(), limit);
        for (int i = 0; i < n; i++) {
            String unit = g.unit(i);
            rows.add(new Row(g.origin(i), name, group, unit == null ? "" : unit, g.sample().decimal(i).toPlainString(),
                    null));
        }
    }

    /**
     * The import report in words: counts per reason, then the listed problem cells and remarks.
     *
     * @param report the report
     * @return the lines
     */
    public static List<String> reportLines(ImportReport report) {
        List<String> l = new ArrayList<>();
        l.add(String.format(java.util.Locale.ROOT, "%,d values used; %,d cells not used.", report.valuesUsed(),
                report.skippedTotal()));
        report.skipCounts().forEach((k, v) -> l.add(String.format(java.util.Locale.ROOT, "  %s: %,d", k.words(), v)));
        for (SkippedCell s : report.firstSkipped()) {
            l.add("  " + shortName(s.origin()) + ": " + s.reason().words()
                    + (s.text() == null || s.text().isEmpty() ? "" : " (\"" + s.text() + "\")"));
        }
        if (report.skippedTotal() > report.firstSkipped().size()) {
            l.add(String.format(java.util.Locale.ROOT, "  … the first %d are listed.", report.firstSkipped().size()));
        }
        report.messages().forEach(m -> l.add(m));
        return l;
    }
}
