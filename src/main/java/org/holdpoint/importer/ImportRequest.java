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
 */
public record ImportRequest(Path file, Path beforeFile, Path afterFile, String sheet, String beforeSheet,
        String afterSheet, Layout layout, boolean paired, String groupColumn, String valueColumn,
        String characteristicColumn, String beforeColumn, String afterColumn, String beforeLabel, String afterLabel,
        String unitIdColumn, String lotColumn, String subgroupColumn, String sequenceColumn, Character delimiter,
        Character decimalSeparator, Integer headerRow) {

    /**
     * A request with everything detected.
     *
     * @param file the one input file
     * @return the request
     */
    public static ImportRequest of(Path file) {
        return new ImportRequest(file, null, null, null, null, null, null, false, null, null, null, null, null, null,
                null, null, null, null, null, null, null, null);
    }
}
