package org.holdpoint.workflow;

/**
 * The columns and labels the user named for an import; every part may be null, meaning "detect it"
 * (the import report then states what was found). Columns are named by header text or column letters.
 *
 * @param group          the group (phase) column holding the before and after labels
 * @param value          the value column
 * @param characteristic the characteristic column
 * @param before         the before column (side by side, paired)
 * @param after          the after column
 * @param beforeLabel    the label of before rows in the group column
 * @param afterLabel     the label of after rows in the group column
 * @param unitId         the unit or serial id column
 * @param lot            the lot or batch column
 * @param subgroup       the subgroup column
 * @param sequence       the sequence number or time column
 * @param headerRow      the 1-based header row, or null to detect it
 */
public record ColumnMapping(String group, String value, String characteristic, String before, String after,
        String beforeLabel, String afterLabel, String unitId, String lot, String subgroup, String sequence,
        Integer headerRow) {
    /** Nothing named: everything detected. */
    public static final ColumnMapping NONE = new ColumnMapping(null, null, null, null, null, null, null, null, null,
            null, null, null);

    /** Trims each name, turns blanks into null and checks that a header row is 1 or more. */
    public ColumnMapping {
        group = clean(group);
        value = clean(value);
        characteristic = clean(characteristic);
        before = clean(before);
        after = clean(after);
        beforeLabel = clean(beforeLabel);
        afterLabel = clean(afterLabel);
        unitId = clean(unitId);
        lot = clean(lot);
        subgroup = clean(subgroup);
        sequence = clean(sequence);
        if (headerRow != null && headerRow < 1) {
            throw new IllegalArgumentException("the header row is counted from 1; " + headerRow + " is not a row");
        }
    }

    /** @return whether nothing was named */
    public boolean isEmpty() {
        return equals(NONE);
    }

    private static String clean(String s) {
        return s == null || s.isBlank() ? null : s.strip();
    }
}
