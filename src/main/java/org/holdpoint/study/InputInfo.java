package org.holdpoint.study;

/**
 * Identifies one input file: its name, SHA-256 of its bytes, the sheet read and the layout used.
 *
 * @param file   the file name as given
 * @param sha256 lower-case hex SHA-256 of the file's bytes
 * @param sheet  the sheet read, or null for text files
 * @param layout the layout used
 * @param role   "data", "before" or "after"
 */
public record InputInfo(String file, String sha256, String sheet, Layout layout, String role) {
}
