package org.holdpoint.cli;

import java.nio.file.Files;
import java.nio.file.Path;
import org.holdpoint.study.Layout;
import org.holdpoint.workflow.ImportOptions;
import picocli.CommandLine;
import picocli.CommandLine.Option;

/** The import options shared by every command that reads a data file ({@code analyze}, {@code plan --from}). */
final class InputArguments {
    @Option(names = "--before", paramLabel = "FILE", description = "File of the before group (with --after).")
    Path before;
    @Option(names = "--after", paramLabel = "FILE", description = "File of the after group (with --before).")
    Path after;
    @Option(names = "--sheet", paramLabel = "NAME|INDEX", description = "Sheet to read (default: the first "
            + "sheet that holds data).")
    String sheet;
    @Option(names = "--before-sheet", paramLabel = "NAME|INDEX", description = "Sheet of the before file.")
    String beforeSheet;
    @Option(names = "--after-sheet", paramLabel = "NAME|INDEX", description = "Sheet of the after file.")
    String afterSheet;
    @Option(names = "--layout", paramLabel = "LAYOUT", description = "stacked, side-by-side, wide or paired "
            + "(default: detected and stated in the output).", converter = LayoutConverter.class)
    Layout layout;
    @Option(names = "--paired", description = "The same units were measured before and after: match the "
            + "before and after values by unit id and use the paired tests.")
    boolean paired;
    @Option(names = "--group-column", paramLabel = "COLUMN", description = "Header of the column that says "
            + "before or after.")
    String groupColumn;
    @Option(names = "--value-column", paramLabel = "COLUMN", description = "Header of the value column.")
    String valueColumn;
    @Option(names = {"--characteristic-column", "--characteristic"}, paramLabel = "COLUMN",
            description = "Header of the column naming the characteristic (stacked layout).")
    String characteristicColumn;
    @Option(names = "--before-column", paramLabel = "COLUMN", description = "Header of the before column.")
    String beforeColumn;
    @Option(names = "--after-column", paramLabel = "COLUMN", description = "Header of the after column.")
    String afterColumn;
    @Option(names = "--before-label", paramLabel = "TEXT", description = "Group label of before rows "
            + "(default: before).")
    String beforeLabel;
    @Option(names = "--after-label", paramLabel = "TEXT", description = "Group label of after rows "
            + "(default: after).")
    String afterLabel;
    @Option(names = "--unit-column", paramLabel = "COLUMN", description = "Header of the part unit or serial "
            + "id column (default: unit, when present).")
    String unitColumn;
    @Option(names = "--lot-column", paramLabel = "COLUMN", description = "Header of the lot or batch column.")
    String lotColumn;
    @Option(names = "--subgroup-column", paramLabel = "COLUMN", description = "Header of the subgroup column.")
    String subgroupColumn;
    @Option(names = "--sequence-column", paramLabel = "COLUMN", description = "Header of the sequence or "
            + "timestamp column.")
    String sequenceColumn;
    @Option(names = "--delimiter", paramLabel = "CHAR", description = "Field delimiter of a text file "
            + "(default: detected). Use 'tab' for a tab.")
    String delimiter;
    @Option(names = "--decimal", paramLabel = "CHAR", description = "Decimal separator of numbers written as "
            + "text, in any file kind: . or , (default: detected per text file, per column in a workbook).")
    Character decimal;
    @Option(names = "--header-row", paramLabel = "ROW", description = "1-based row of the header (default: "
            + "detected).")
    Integer headerRow;
    @Option(names = "--before-header-row", paramLabel = "ROW", description = "1-based header row of the before "
            + "file when it differs from the after file's (two-file input).")
    Integer beforeHeaderRow;
    @Option(names = "--after-header-row", paramLabel = "ROW", description = "1-based header row of the after file "
            + "(two-file input).")
    Integer afterHeaderRow;
    @Option(names = "--only", paramLabel = "NAME", description = "Analyse only this characteristic; repeatable. "
            + "(A settings file that lists characteristics already limits the analysis to them.)")
    java.util.List<String> only = new java.util.ArrayList<>();
    @Option(names = "--ignore-column", paramLabel = "NAME", description = "Leave this column out (not a "
            + "characteristic, or not part of this study); repeatable.")
    java.util.List<String> ignore = new java.util.ArrayList<>();
    @Option(names = "--settings", paramLabel = "FILE", description = "Per-characteristic criteria file (CSV "
            + "or JSON).")
    Path settings;

    /**
     * The import request these options describe.
     *
     * @param cl   the command line, for usage errors
     * @param file the single data file, or null for two-file input
     * @return the request
     */
    ImportOptions toImportOptions(CommandLine cl, Path file) {
        final InputArguments in = this;
        if (file == null && (in.before == null || in.after == null)) {
            throw new CommandLine.ParameterException(cl,
                    "give a data FILE, or both --before FILE and --after FILE");
        }
        if (file != null && (in.before != null || in.after != null)) {
            throw new CommandLine.ParameterException(cl,
                    "give either a data FILE or --before/--after files, not both");
        }
        for (Path p : new Path[] {file, in.before, in.after}) {
            if (p != null && !Files.exists(p)) {
                throw new UserInputException("%s: file not found; check the path", p);
            }
        }
        Character delim = null;
        if (in.delimiter != null) {
            String d = in.delimiter.equalsIgnoreCase("tab") ? "\t" : in.delimiter;
            if (d.length() != 1) {
                throw new CommandLine.ParameterException(cl,
                        "--delimiter must be one character or 'tab', got '" + in.delimiter + "'");
            }
            delim = d.charAt(0);
        }
        if (in.decimal != null && in.decimal != '.' && in.decimal != ',') {
            throw new CommandLine.ParameterException(cl, "--decimal must be . or ,");
        }
        ImportOptions o = file != null ? ImportOptions.file(file) : ImportOptions.files(in.before, in.after);
        return o.sheets(in.sheet, in.beforeSheet, in.afterSheet).layout(in.layout, in.paired)
                .columns(in.groupColumn, in.valueColumn, in.characteristicColumn, in.beforeColumn, in.afterColumn)
                .labels(in.beforeLabel, in.afterLabel)
                .traceColumns(in.unitColumn, in.lotColumn, in.subgroupColumn, in.sequenceColumn)
                .text(delim, in.decimal, in.headerRow).headerRows(headerRow(cl, "--before-header-row",
                        in.beforeHeaderRow, file), headerRow(cl, "--after-header-row", in.afterHeaderRow, file))
                .choose(in.only, in.ignore);
    }

    private static Integer headerRow(CommandLine cl, String option, Integer row, Path file) {
        if (row == null) {
            return null;
        }
        if (file != null) {
            throw new CommandLine.ParameterException(cl, option + " is for two-file input (--before and --after); "
                    + "with one file use --header-row");
        }
        if (row < 1) {
            throw new CommandLine.ParameterException(cl, option + " is counted from 1, got " + row);
        }
        return row;
    }

    /** Converts layout names such as side-by-side. */
    static final class LayoutConverter implements CommandLine.ITypeConverter<Layout> {
        @Override
        public Layout convert(String value) {
            String v = value.trim().toLowerCase(java.util.Locale.ROOT).replace('-', '_').replace(' ', '_');
            for (Layout l : Layout.values()) {
                if (l.name().toLowerCase(java.util.Locale.ROOT).equals(v) && l != Layout.SEPARATE) {
                    return l;
                }
            }
            throw new CommandLine.TypeConversionException("'" + value + "' is not a layout; use stacked, "
                    + "side-by-side, wide or paired");
        }
    }
}
