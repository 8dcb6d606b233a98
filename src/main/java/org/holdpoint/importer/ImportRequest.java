package org.holdpoint.importer;

import java.nio.file.Path;
import org.holdpoint.study.Layout;

/**
 * What to import and how. Every field but one source may be null (detect or use the default).
 * Either {@code file} is set, or both {@code beforeFile} and {@code afterFile}.
 *
 * @param file                 one file holding both groups
 * @param beforeFile           the file of the before group (with {@code afterFile})
 * @param afterFile            the file of the after group
 * @param sheet                sheet name or 1-based index for {@code file}; default: first sheet with data
 * @param beforeSheet          sheet of {@code beforeFile}
 * @param afterSheet           sheet of {@code afterFile}
 * @param layout               the layout; null to detect (the detected layout is stated in the report)
 * @param paired               read before/after columns as pairs matched by unit id
 * @param groupColumn          header of the group (phase) column
 * @param valueColumn          header of the value column (stacked)
 * @param characteristicColumn header of the characteristic column (stacked with several characteristics)
 * @param beforeColumn         header of the before column (side by side, paired)
 * @param afterColumn          header of the after column (side by side, paired)
 * @param beforeLabel          group label of before rows; default "before"
 * @param afterLabel           group label of after rows; default "after"
 * @param unitIdColumn         header of the unit/serial id column; default "unit" when present
 * @param lotColumn            header of the lot/batch column
 * @param subgroupColumn       header of the subgroup column
 * @param sequenceColumn       header of the sequence number or timestamp column
 * @param delimiter            text field delimiter; null to detect
 * @param decimalSeparator     '.' or ','; null to detect
 * @param headerRow            1-based header row; null to detect
 * @param beforeHeaderRow      1-based header row of the before file (two-file input); null: as headerRow
 * @param afterHeaderRow       1-based header row of the after file (two-file input); null: as headerRow
 * @param choice               which characteristics to analyse; null means every characteristic column
 */
public record ImportRequest(Path file, Path beforeFile, Path afterFile, String sheet, String beforeSheet,
        String afterSheet, Layout layout, boolean paired, String groupColumn, String valueColumn,
        String characteristicColumn, String beforeColumn, String afterColumn, String beforeLabel, String afterLabel,
        String unitIdColumn, String lotColumn, String subgroupColumn, String sequenceColumn, Character delimiter,
        Character decimalSeparator, Integer headerRow, Integer beforeHeaderRow, Integer afterHeaderRow,
        ColumnChoice choice) {

    /** A request with no column choice means every column; the header rows are validated here. */
    public ImportRequest {
        choice = choice == null ? ColumnChoice.ALL : choice;
        for (Integer h : new Integer[] {headerRow, beforeHeaderRow, afterHeaderRow}) {
            if (h != null && h < 1) {
                throw new ImportException("a header row is counted from 1, got %d", h);
            }
        }
    }

    /**
     * The header row to use for one group's file.
     *
     * @param role which file: the one file, the before file or the after file
     * @return the 1-based row, or null to detect
     */
    Integer headerRowFor(Plan.Role role) {
        return switch (role) {
            case BEFORE -> beforeHeaderRow != null ? beforeHeaderRow : headerRow;
            case AFTER -> afterHeaderRow != null ? afterHeaderRow : headerRow;
            case BOTH, BASELINE -> headerRow;
        };
    }

    /**
     * @param beforeRow the 1-based header row of the before file (null: as the common header row)
     * @param afterRow  the 1-based header row of the after file (null: as the common header row)
     * @return this request with the per-file header rows replaced
     */
    public ImportRequest withHeaderRows(Integer beforeRow, Integer afterRow) {
        return new ImportRequest(file, beforeFile, afterFile, sheet, beforeSheet, afterSheet, layout, paired, groupColumn, valueColumn, characteristicColumn, beforeColumn, afterColumn, beforeLabel, afterLabel, unitIdColumn, lotColumn, subgroupColumn, sequenceColumn, delimiter, decimalSeparator, headerRow, beforeRow, afterRow, choice);
    }

    /**
     * @param newChoice which characteristics to analyse
     * @return this request with the column choice replaced
     */
    public ImportRequest withChoice(ColumnChoice newChoice) {
        return new ImportRequest(file, beforeFile, afterFile, sheet, beforeSheet, afterSheet, layout, paired, groupColumn, valueColumn, characteristicColumn, beforeColumn, afterColumn, beforeLabel, afterLabel, unitIdColumn, lotColumn, subgroupColumn, sequenceColumn, delimiter, decimalSeparator, headerRow, beforeHeaderRow, afterHeaderRow, newChoice);
    }

    /**
     * A request with everything detected.
     *
     * @param file the one input file
     * @return the request
     */
    public static ImportRequest of(Path file) {
        return new ImportRequest(file, null, null, null, null, null, null, false, null, null, null, null, null, null,
                null, null, null, null, null, null, null, null, null, null, null);
    }

    /**
     * @param sheet the sheet (name or 1-based index) of the one file
     * @return this request with sheet replaced
     */
    public ImportRequest withSheet(String sheet) {
        return new ImportRequest(file, beforeFile, afterFile, sheet, beforeSheet, afterSheet, layout, paired, groupColumn, valueColumn, characteristicColumn, beforeColumn, afterColumn, beforeLabel, afterLabel, unitIdColumn, lotColumn, subgroupColumn, sequenceColumn, delimiter, decimalSeparator, headerRow, beforeHeaderRow, afterHeaderRow, choice);
    }

    /**
     * @param beforeSheet the sheet of the before file
     * @return this request with beforeSheet replaced
     */
    public ImportRequest withBeforeSheet(String beforeSheet) {
        return new ImportRequest(file, beforeFile, afterFile, sheet, beforeSheet, afterSheet, layout, paired, groupColumn, valueColumn, characteristicColumn, beforeColumn, afterColumn, beforeLabel, afterLabel, unitIdColumn, lotColumn, subgroupColumn, sequenceColumn, delimiter, decimalSeparator, headerRow, beforeHeaderRow, afterHeaderRow, choice);
    }

    /**
     * @param afterSheet the sheet of the after file
     * @return this request with afterSheet replaced
     */
    public ImportRequest withAfterSheet(String afterSheet) {
        return new ImportRequest(file, beforeFile, afterFile, sheet, beforeSheet, afterSheet, layout, paired, groupColumn, valueColumn, characteristicColumn, beforeColumn, afterColumn, beforeLabel, afterLabel, unitIdColumn, lotColumn, subgroupColumn, sequenceColumn, delimiter, decimalSeparator, headerRow, beforeHeaderRow, afterHeaderRow, choice);
    }

    /**
     * @param layout the layout (null: detect)
     * @return this request with layout replaced
     */
    public ImportRequest withLayout(Layout layout) {
        return new ImportRequest(file, beforeFile, afterFile, sheet, beforeSheet, afterSheet, layout, paired, groupColumn, valueColumn, characteristicColumn, beforeColumn, afterColumn, beforeLabel, afterLabel, unitIdColumn, lotColumn, subgroupColumn, sequenceColumn, delimiter, decimalSeparator, headerRow, beforeHeaderRow, afterHeaderRow, choice);
    }

    /**
     * @param paired whether pairs are matched by unit id
     * @return this request with paired replaced
     */
    public ImportRequest withPaired(boolean paired) {
        return new ImportRequest(file, beforeFile, afterFile, sheet, beforeSheet, afterSheet, layout, paired, groupColumn, valueColumn, characteristicColumn, beforeColumn, afterColumn, beforeLabel, afterLabel, unitIdColumn, lotColumn, subgroupColumn, sequenceColumn, delimiter, decimalSeparator, headerRow, beforeHeaderRow, afterHeaderRow, choice);
    }

    /**
     * @param groupColumn the header of the group column
     * @return this request with groupColumn replaced
     */
    public ImportRequest withGroupColumn(String groupColumn) {
        return new ImportRequest(file, beforeFile, afterFile, sheet, beforeSheet, afterSheet, layout, paired, groupColumn, valueColumn, characteristicColumn, beforeColumn, afterColumn, beforeLabel, afterLabel, unitIdColumn, lotColumn, subgroupColumn, sequenceColumn, delimiter, decimalSeparator, headerRow, beforeHeaderRow, afterHeaderRow, choice);
    }

    /**
     * @param valueColumn the header of the value column
     * @return this request with valueColumn replaced
     */
    public ImportRequest withValueColumn(String valueColumn) {
        return new ImportRequest(file, beforeFile, afterFile, sheet, beforeSheet, afterSheet, layout, paired, groupColumn, valueColumn, characteristicColumn, beforeColumn, afterColumn, beforeLabel, afterLabel, unitIdColumn, lotColumn, subgroupColumn, sequenceColumn, delimiter, decimalSeparator, headerRow, beforeHeaderRow, afterHeaderRow, choice);
    }

    /**
     * @param characteristicColumn the header of the characteristic column
     * @return this request with characteristicColumn replaced
     */
    public ImportRequest withCharacteristicColumn(String characteristicColumn) {
        return new ImportRequest(file, beforeFile, afterFile, sheet, beforeSheet, afterSheet, layout, paired, groupColumn, valueColumn, characteristicColumn, beforeColumn, afterColumn, beforeLabel, afterLabel, unitIdColumn, lotColumn, subgroupColumn, sequenceColumn, delimiter, decimalSeparator, headerRow, beforeHeaderRow, afterHeaderRow, choice);
    }

    /**
     * @param beforeColumn the header of the before column
     * @return this request with beforeColumn replaced
     */
    public ImportRequest withBeforeColumn(String beforeColumn) {
        return new ImportRequest(file, beforeFile, afterFile, sheet, beforeSheet, afterSheet, layout, paired, groupColumn, valueColumn, characteristicColumn, beforeColumn, afterColumn, beforeLabel, afterLabel, unitIdColumn, lotColumn, subgroupColumn, sequenceColumn, delimiter, decimalSeparator, headerRow, beforeHeaderRow, afterHeaderRow, choice);
    }

    /**
     * @param afterColumn the header of the after column
     * @return this request with afterColumn replaced
     */
    public ImportRequest withAfterColumn(String afterColumn) {
        return new ImportRequest(file, beforeFile, afterFile, sheet, beforeSheet, afterSheet, layout, paired, groupColumn, valueColumn, characteristicColumn, beforeColumn, afterColumn, beforeLabel, afterLabel, unitIdColumn, lotColumn, subgroupColumn, sequenceColumn, delimiter, decimalSeparator, headerRow, beforeHeaderRow, afterHeaderRow, choice);
    }

    /**
     * @param unitIdColumn the header of the unit id column
     * @return this request with unitIdColumn replaced
     */
    public ImportRequest withUnitIdColumn(String unitIdColumn) {
        return new ImportRequest(file, beforeFile, afterFile, sheet, beforeSheet, afterSheet, layout, paired, groupColumn, valueColumn, characteristicColumn, beforeColumn, afterColumn, beforeLabel, afterLabel, unitIdColumn, lotColumn, subgroupColumn, sequenceColumn, delimiter, decimalSeparator, headerRow, beforeHeaderRow, afterHeaderRow, choice);
    }

    /**
     * @param lotColumn the header of the lot column
     * @return this request with lotColumn replaced
     */
    public ImportRequest withLotColumn(String lotColumn) {
        return new ImportRequest(file, beforeFile, afterFile, sheet, beforeSheet, afterSheet, layout, paired, groupColumn, valueColumn, characteristicColumn, beforeColumn, afterColumn, beforeLabel, afterLabel, unitIdColumn, lotColumn, subgroupColumn, sequenceColumn, delimiter, decimalSeparator, headerRow, beforeHeaderRow, afterHeaderRow, choice);
    }

    /**
     * @param subgroupColumn the header of the subgroup column
     * @return this request with subgroupColumn replaced
     */
    public ImportRequest withSubgroupColumn(String subgroupColumn) {
        return new ImportRequest(file, beforeFile, afterFile, sheet, beforeSheet, afterSheet, layout, paired, groupColumn, valueColumn, characteristicColumn, beforeColumn, afterColumn, beforeLabel, afterLabel, unitIdColumn, lotColumn, subgroupColumn, sequenceColumn, delimiter, decimalSeparator, headerRow, beforeHeaderRow, afterHeaderRow, choice);
    }

    /**
     * @param sequenceColumn the header of the sequence column
     * @return this request with sequenceColumn replaced
     */
    public ImportRequest withSequenceColumn(String sequenceColumn) {
        return new ImportRequest(file, beforeFile, afterFile, sheet, beforeSheet, afterSheet, layout, paired, groupColumn, valueColumn, characteristicColumn, beforeColumn, afterColumn, beforeLabel, afterLabel, unitIdColumn, lotColumn, subgroupColumn, sequenceColumn, delimiter, decimalSeparator, headerRow, beforeHeaderRow, afterHeaderRow, choice);
    }

    /**
     * @param delimiter the text delimiter (null: detect)
     * @return this request with delimiter replaced
     */
    public ImportRequest withDelimiter(Character delimiter) {
        return new ImportRequest(file, beforeFile, afterFile, sheet, beforeSheet, afterSheet, layout, paired, groupColumn, valueColumn, characteristicColumn, beforeColumn, afterColumn, beforeLabel, afterLabel, unitIdColumn, lotColumn, subgroupColumn, sequenceColumn, delimiter, decimalSeparator, headerRow, beforeHeaderRow, afterHeaderRow, choice);
    }

    /**
     * @param decimalSeparator the decimal separator (null: detect)
     * @return this request with decimalSeparator replaced
     */
    public ImportRequest withDecimalSeparator(Character decimalSeparator) {
        return new ImportRequest(file, beforeFile, afterFile, sheet, beforeSheet, afterSheet, layout, paired, groupColumn, valueColumn, characteristicColumn, beforeColumn, afterColumn, beforeLabel, afterLabel, unitIdColumn, lotColumn, subgroupColumn, sequenceColumn, delimiter, decimalSeparator, headerRow, beforeHeaderRow, afterHeaderRow, choice);
    }

    /**
     * @param headerRow the 1-based header row (null: detect)
     * @return this request with headerRow replaced
     */
    public ImportRequest withHeaderRow(Integer headerRow) {
        return new ImportRequest(file, beforeFile, afterFile, sheet, beforeSheet, afterSheet, layout, paired, groupColumn, valueColumn, characteristicColumn, beforeColumn, afterColumn, beforeLabel, afterLabel, unitIdColumn, lotColumn, subgroupColumn, sequenceColumn, delimiter, decimalSeparator, headerRow, beforeHeaderRow, afterHeaderRow, choice);
    }

    /**
     * @param beforeLabel the group label of before rows
     * @param afterLabel  the group label of after rows
     * @return this request with the labels replaced
     */
    public ImportRequest withLabels(String beforeLabel, String afterLabel) {
        return new ImportRequest(file, beforeFile, afterFile, sheet, beforeSheet, afterSheet, layout, paired, groupColumn, valueColumn, characteristicColumn, beforeColumn, afterColumn, beforeLabel, afterLabel, unitIdColumn, lotColumn, subgroupColumn, sequenceColumn, delimiter, decimalSeparator, headerRow, beforeHeaderRow, afterHeaderRow, choice);
    }

    /**
     * A request for a before file and an after file, everything else detected.
     *
     * @param beforeFile the file of the before group
     * @param afterFile  the file of the after group
     * @return the request
     */
    public static ImportRequest ofTwo(Path beforeFile, Path afterFile) {
        return new ImportRequest(null, beforeFile, afterFile, null, null, null, null, false, null, null, null, null,
                null, null, null, null, null, null, null, null, null, null, null, null, null);
    }
}
