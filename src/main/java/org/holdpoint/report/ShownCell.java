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
        if (value instanceof String t) {
            value = printable(t);
        }
    }

    /**
     * A text as a cell can hold it: control characters other than tab, line feed and carriage return
     * (which XML 1.0 cannot carry, so that a spreadsheet writer would turn them into '?') become their
     * visible Unicode control pictures (U+2400 + code, e.g. BEL as ␇), and a text longer than a cell's
     * 32,767 characters is cut with its length said. The writer writes and the verifier expects this same
     * text, so an odd character in a skipped cell is never a false alarm.
     *
     * @param t the text
     * @return the text as shown
     */
    static String printable(String t) {
        StringBuilder sb = null;
        for (int i = 0; i < t.length(); i++) {
            char c = t.charAt(i);
            boolean bad = c < 0x20 && c != '\t' && c != '\n' && c != '\r' || c == 0x7f || c == 0xFFFE || c == 0xFFFF
                    || Character.isSurrogate(c) && !(Character.isHighSurrogate(c) && i + 1 < t.length()
                            && Character.isLowSurrogate(t.charAt(i + 1)) || Character.isLowSurrogate(c) && i > 0
                                    && Character.isHighSurrogate(t.charAt(i - 1)));
            if (bad && sb == null) {
                sb = new StringBuilder(t.length()).append(t, 0, i);
            }
            if (sb != null) {
                sb.append(bad ? (c < 0x20 ? (char) (0x2400 + c) : c == 0x7f ? '\u2421' : '\uFFFD') : c);
            }
        }
        String out = sb == null ? t : sb.toString();
        if (out.length() > MAX_CELL) {
            String tail = String.format(java.util.Locale.ROOT, "… (%,d characters)", out.length());
            int end = MAX_CELL - tail.length();
            if (Character.isHighSurrogate(out.charAt(end - 1))) {
                end--;
            }
            out = out.substring(0, end) + tail;
        }
        return out;
    }

    /** The most characters a spreadsheet cell holds. */
    static final int MAX_CELL = 32_767;
}
