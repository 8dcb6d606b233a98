package org.holdpoint.study;

/**
 * A cell the import did not use, with the reason.
 *
 * @param origin where it is
 * @param reason why it was not used
 * @param text   the cell's text as found (may be empty)
 */
public record SkippedCell(Origin origin, SkipReason reason, String text) {
}
