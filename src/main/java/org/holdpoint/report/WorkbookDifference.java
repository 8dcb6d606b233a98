package org.holdpoint.report;

/**
 * One shown value that no longer matches the record: where it is, what it is, what the workbook shows
 * and what the fresh computation from the embedded raw data gives.
 *
 * @param sheet    the sheet
 * @param cell     the cell address in A1 notation
 * @param what     what the value is, e.g. "Bore diameter: TOST p"
 * @param shown    the value the workbook shows ("(empty)" when the cell is empty)
 * @param expected the value re-computed from the record ("(empty)" when the cell should be empty)
 */
public record WorkbookDifference(String sheet, String cell, String what, String shown, String expected) {

    /** @return one line for people, e.g. "Summary!Q15 (Bore diameter: F-test p): shows 0.5, recomputed 0.25" */
    public String describe() {
        return sheet + "!" + cell + " (" + what + "): shows " + shown + ", recomputed " + expected;
    }
}
