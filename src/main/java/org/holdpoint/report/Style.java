package org.holdpoint.report;

/** The cell styles of the sign-off workbook; {@link Styles} builds each once per workbook. */
enum Style {
    /** Document title. */
    TITLE,
    /** Section heading. */
    HEADING,
    /** A label beside a value. */
    LABEL,
    /** Plain text. */
    TEXT,
    /** Wrapped text. */
    WRAP,
    /** Table header, bold, wrapped, shaded, bordered. */
    HEADER,
    /** A text cell of a table, bordered. */
    CELL,
    /** A wrapped text cell of a table, bordered. */
    CELL_WRAP,
    /** A number with a fixed count of decimals, bordered. */
    NUMBER,
    /** A whole number, bordered. */
    INTEGER,
    /** A p-value: four decimals, "&lt; 0.0001" below. */
    P_VALUE,
    /** The overall verdict in words. */
    VERDICT,
    /** Status "passed": shape, words and a light fill (never colour alone). */
    PASSED,
    /** Status "failed". */
    FAILED,
    /** Status "inconclusive". */
    INCONCLUSIVE,
    /** Status "not assessed". */
    NOT_ASSESSED,
    /** The large shape of the overall verdict "verified". */
    MARK_PASSED,
    /** The large shape of the overall verdict "not verified". */
    MARK_FAILED,
    /** An unlocked, bordered cell for hand entry (sign-off). */
    FILLABLE,
    /** Fixed-width text (hashes, keys). */
    MONO,
    /** Small grey remark. */
    NOTE
}
