package org.holdpoint.report;

/**
 * Where a defined name points: a sheet and a 0-based row and column.
 *
 * @param sheet  the sheet name
 * @param row    0-based row
 * @param column 0-based column
 */
public record Anchor(String sheet, int row, int column) {

    /** Validates. */
    public Anchor {
        if (sheet == null || row < 0 || column < 0) {
            throw new ReportException("a template name must point at one cell of a sheet");
        }
    }

    /**
     * The anchor moved by rows and columns.
     *
     * @param dr rows down
     * @param dc columns right
     * @return the moved anchor
     */
    public Anchor offset(int dr, int dc) {
        return new Anchor(sheet, row + dr, column + dc);
    }
}
