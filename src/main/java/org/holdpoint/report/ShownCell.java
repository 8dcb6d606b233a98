package org.holdpoint.report;

/**
 * One value the workbook shows: where, what and how. The writer writes these cells and the reader
 * compares the same cells with a fresh computation, so what is shown and what is verified cannot drift.
 *
 * @param row      0-based row
 * @param column   0-based column
 * @param value    a {@link String}, a {@link Double}, or null for an empty styled cell
 * @param style    the cell style
 * @param decimals decimals of a {@link Style#NUMBER}, else 0
 * @param label    what the value is, for difference messages, or null (derived from the position)
 */
record ShownCell(int row, int column, Object value, Style style, int decimals, String label) {

    /** Validates. */
    ShownCell {
        if (value != null && !(value instanceof String) && !(value instanceof Double)) {
            throw new IllegalArgumentException("a shown value is text or a number");
        }
        if (value instanceof Double d && !Double.isFinite(d)) {
            throw new IllegalArgumentException("a shown number must be finite: " + label);
        }
    }
}
