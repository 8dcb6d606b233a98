package org.holdpoint.study;

/** Why a cell in a value column was not used. */
public enum SkipReason {
    /** The cell is empty. */
    BLANK("blank"),
    /** The cell holds text that is not a number (e.g. "n/a"). */
    TEXT("text, not a number"),
    /** The cell holds a spreadsheet error value such as #DIV/0!. */
    ERROR_VALUE("error value"),
    /** A formula without a cached value. */
    FORMULA_WITHOUT_VALUE("formula without a stored result"),
    /** A date or time in a value column. */
    DATE("date or time, not a measurement"),
    /** A boolean in a value column. */
    BOOLEAN("true/false, not a measurement"),
    /** NaN or infinity. */
    NOT_FINITE("not a finite number (NaN or infinity)"),
    /** A group label that is neither the before nor the after label. */
    UNKNOWN_GROUP("group label is neither before nor after"),
    /** A unit present in only one group of a paired layout. */
    UNPAIRED("unit present in only one group"),
    /** A cell outside the header's column set. */
    OUTSIDE_COLUMNS("outside the header's columns"),
    /** A value whose row names no characteristic (stacked layout with a characteristic column). */
    NO_CHARACTERISTIC("no characteristic named in its row"),
    /** A value whose row has no unit id (paired layouts). */
    NO_UNIT_ID("no unit id in its row (paired)"),
    /** Excluded by the user, with a reason. */
    EXCLUDED("excluded by the user");

    private final String words;

    SkipReason(String words) {
        this.words = words;
    }

    /** @return the reason in words */
    public String words() {
        return words;
    }
}
