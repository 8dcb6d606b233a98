package org.holdpoint.workflow;

import java.nio.file.Path;
import java.util.List;
import org.holdpoint.importer.ColumnChoice;
import org.holdpoint.importer.ImportRequest;
import org.holdpoint.study.Layout;

/**
 * How the shells describe what to import, without knowing the importer: set what the user gave,
 * leave the rest to detection. Not thread-safe; build, then hand to a use case.
 */
public final class ImportOptions {
    private Path file;
    private Path beforeFile;
    private Path afterFile;
    private String sheet;
    private String beforeSheet;
    private String afterSheet;
    private Layout layout;
    private boolean paired;
    private String groupColumn;
    private String valueColumn;
    private String characteristicColumn;
    private String beforeColumn;
    private String afterColumn;
    private String beforeLabel;
    private String afterLabel;
    private String unitIdColumn;
    private String lotColumn;
    private String subgroupColumn;
    private String sequenceColumn;
    private Character delimiter;
    private Character decimalSeparator;
    private Integer headerRow;
    private Integer beforeHeaderRow;
    private Integer afterHeaderRow;
    private List<String> only = List.of();
    private List<String> ignore = List.of();

    /**
     * One file holding both groups.
     *
     * @param file the file
     * @return the options
     */
    public static ImportOptions file(Path file) {
        ImportOptions o = new ImportOptions();
        o.file = file;
        return o;
    }

    /**
     * A before file and an after file.
     *
     * @param before the before file
     * @param after  the after file
     * @return the options
     */
    public static ImportOptions files(Path before, Path after) {
        ImportOptions o = new ImportOptions();
        o.beforeFile = before;
        o.afterFile = after;
        return o;
    }

    /** @return the one data file, or null for two files */
    public Path mainFile() {
        return file;
    }

    /**
     * @param one    sheet of the one file (name or 1-based index)
     * @param before sheet of the before file
     * @param after  sheet of the after file
     * @return this
     */
    public ImportOptions sheets(String one, String before, String after) {
        sheet = one;
        beforeSheet = before;
        afterSheet = after;
        return this;
    }

    /**
     * @param l      the layout, or null to detect
     * @param isPair whether before and after are pairs matched by unit id
     * @return this
     */
    public ImportOptions layout(Layout l, boolean isPair) {
        layout = l;
        paired = isPair;
        return this;
    }

    /**
     * Column headers; each may be null (detected).
     *
     * @param group          the group (phase) column
     * @param value          the value column
     * @param characteristic the characteristic column
     * @param before         the before column
     * @param after          the after column
     * @return this
     */
    public ImportOptions columns(String group, String value, String characteristic, String before, String after) {
        groupColumn = group;
        valueColumn = value;
        characteristicColumn = characteristic;
        beforeColumn = before;
        afterColumn = after;
        return this;
    }

    /**
     * @param before label of before rows, or null for "before"
     * @param after  label of after rows, or null for "after"
     * @return this
     */
    public ImportOptions labels(String before, String after) {
        beforeLabel = before;
        afterLabel = after;
        return this;
    }

    /**
     * Traceability columns; each may be null.
     *
     * @param unitId   unit or serial id
     * @param lot      lot or batch
     * @param subgroup subgroup
     * @param sequence sequence number or timestamp
     * @return this
     */
    public ImportOptions traceColumns(String unitId, String lot, String subgroup, String sequence) {
        unitIdColumn = unitId;
        lotColumn = lot;
        subgroupColumn = subgroup;
        sequenceColumn = sequence;
        return this;
    }

    /**
     * @param before 1-based header row of the before file in a two-file study (null: detect or as the common one)
     * @param after  1-based header row of the after file (null: detect or as the common one)
     * @return this builder
     */
    public ImportOptions headerRows(Integer before, Integer after) {
        beforeHeaderRow = before;
        afterHeaderRow = after;
        return this;
    }

    /**
     * @param onlyNames   analyse only these characteristics (empty: all)
     * @param ignoreNames leave these columns out
     * @return this builder
     */
    public ImportOptions choose(List<String> onlyNames, List<String> ignoreNames) {
        only = List.copyOf(onlyNames);
        ignore = List.copyOf(ignoreNames);
        return this;
    }

    /**
     * Text-file details; each may be null (detected).
     *
     * @param delim   field delimiter
     * @param decimal decimal separator
     * @param header  1-based header row
     * @return this
     */
    public ImportOptions text(Character delim, Character decimal, Integer header) {
        delimiter = delim;
        decimalSeparator = decimal;
        headerRow = header;
        return this;
    }

    ImportRequest toRequest() {
        return new ImportRequest(file, beforeFile, afterFile, sheet, beforeSheet, afterSheet, layout, paired,
                groupColumn, valueColumn, characteristicColumn, beforeColumn, afterColumn, beforeLabel, afterLabel,
                unitIdColumn, lotColumn, subgroupColumn, sequenceColumn, delimiter, decimalSeparator, headerRow,
                beforeHeaderRow, afterHeaderRow, new ColumnChoice(only, ignore, only.isEmpty() ? null : "--only"));
    }
}
