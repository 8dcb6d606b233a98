package org.holdpoint.importer;

import org.holdpoint.study.SkipReason;

/** What a non-blank cell holds, as read from any source (blank cells are simply absent). */
enum CellKind {
    /** A finite number (from a numeric cell, or text that reads as a number). */
    NUMBER(null),
    /** Text that is not a number. */
    TEXT(SkipReason.TEXT),
    /** A true/false value. */
    BOOLEAN(SkipReason.BOOLEAN),
    /** A spreadsheet error value such as #DIV/0!. */
    ERROR(SkipReason.ERROR_VALUE),
    /** A date or time. */
    DATE(SkipReason.DATE),
    /** A formula whose result was never stored. */
    FORMULA_NO_VALUE(SkipReason.FORMULA_WITHOUT_VALUE),
    /** NaN or infinity written as text. */
    NOT_FINITE(SkipReason.NOT_FINITE),
    /** A number written with the other decimal separator than the one in force. */
    OTHER_SEPARATOR(SkipReason.TEXT);

    private static final CellKind[] VALUES = values();
    private final SkipReason skipReason;

    CellKind(SkipReason skipReason) {
        this.skipReason = skipReason;
    }

    /** @return why a value column does not use a cell of this kind (null for numbers) */
    SkipReason skipReason() {
        return skipReason;
    }

    /**
     * @param ordinal an ordinal as stored in a column
     * @return the kind
     */
    static CellKind of(int ordinal) {
        return VALUES[ordinal];
    }
}
