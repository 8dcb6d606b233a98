package org.holdpoint.ui.model;

/** One optional field of the Data step's column mapping; left blank, the import detects it. */
public enum MappingField {
    /** The group column (holds the before and after labels). */
    GROUP("Group column", "the column saying which rows are before and which after (stacked layout)"),
    /** The value column. */
    VALUE("Value column", "the column of measured values (stacked layout)"),
    /** The characteristic column. */
    CHARACTERISTIC("Characteristic column", "the column naming the characteristic of each row"),
    /** The before column. */
    BEFORE("Before column", "the column of before values (side-by-side or paired layout)"),
    /** The after column. */
    AFTER("After column", "the column of after values (side-by-side or paired layout)"),
    /** The before label. */
    BEFORE_LABEL("Before label", "the word in the group column that marks before rows (default: before)"),
    /** The after label. */
    AFTER_LABEL("After label", "the word in the group column that marks after rows (default: after)"),
    /** The unit id column. */
    UNIT_ID("Unit id column", "the serial or unit id column (needed to match pairs)"),
    /** The lot column. */
    LOT("Lot column", "the lot or batch column"),
    /** The subgroup column. */
    SUBGROUP("Subgroup column", "the subgroup column"),
    /** The sequence column. */
    SEQUENCE("Sequence column", "the sequence number or time column"),
    /** The header row. */
    HEADER_ROW("Header row", "the row number of the column headers, counted from 1");

    private final String label;
    private final String hint;

    MappingField(String label, String hint) {
        this.label = label;
        this.hint = hint;
    }

    /** @return the field's label on the form */
    public String label() {
        return label;
    }

    /** @return what the field means, for the tooltip; blank means detected */
    public String hint() {
        return hint + "; header text or column letters (A, B, …); leave blank to detect it";
    }
}
