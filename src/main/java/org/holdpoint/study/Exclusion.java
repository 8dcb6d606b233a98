package org.holdpoint.study;

/**
 * A value the user excluded from the analysis, named by its origin, with a mandatory reason.
 *
 * @param characteristic the characteristic's name, or null for any characteristic at that cell
 * @param cell           the cell address, optionally with sheet: {@code C12} or {@code Data!C12}
 * @param reason         why it was excluded (required, not blank)
 */
public record Exclusion(String characteristic, String cell, String reason) {

    /** Validates the exclusion. */
    public Exclusion {
        if (cell == null || cell.isBlank()) {
            throw new IllegalArgumentException("an exclusion must name the cell of the value");
        }
        if (reason == null || reason.isBlank()) {
            throw new IllegalArgumentException("an exclusion needs a reason (cell " + cell + ")");
        }
    }
}
