package org.holdpoint.study;

import java.util.Locale;

/**
 * A value the user excluded from the analysis, named by the one cell of the one file that holds it,
 * with a mandatory reason. Written {@code [before:|after:][SHEET!]CELL=REASON} (docs/import.md,
 * "Leaving a value out"): the group prefix says which file when the same cell exists in both files
 * of a two-file study; the sheet is needed only when the workbook has several sheets with data.
 *
 * @param characteristic the characteristic's name, or null for whichever characteristic has a value there
 * @param group          the group whose file holds the cell, or null when the cell is named without one
 * @param cell           the cell address, optionally with sheet: {@code C12} or {@code Data!C12}
 * @param reason         why it was excluded (required, not blank)
 */
public record Exclusion(String characteristic, Group group, String cell, String reason) {

    /** The group (and so the file, in a two-file study) the cell belongs to. */
    public enum Group {
        /** The before group. */
        BEFORE,
        /** The after group. */
        AFTER;

        /** @return "before" or "after" */
        public String label() {
            return name().toLowerCase(Locale.ROOT);
        }
    }

    /** Validates the exclusion. */
    public Exclusion {
        if (cell == null || cell.isBlank()) {
            throw new IllegalArgumentException("an exclusion must name the cell of the value");
        }
        if (reason == null || reason.isBlank()) {
            throw new IllegalArgumentException("an exclusion needs a reason (cell " + cell + ")");
        }
    }

    /**
     * An exclusion without a group (the cell exists in one file only, or a study file written before
     * groups were recorded).
     *
     * @param characteristic the characteristic or null
     * @param cell           the cell
     * @param reason         the reason
     */
    public Exclusion(String characteristic, String cell, String reason) {
        this(characteristic, null, cell, reason);
    }

    /**
     * Reads {@code [before:|after:][SHEET!]CELL=REASON}.
     *
     * @param characteristic the characteristic it is for, or null
     * @param text           what the user wrote
     * @return the exclusion
     * @throws IllegalArgumentException with a message saying what to write
     */
    public static Exclusion parse(String characteristic, String text) {
        int eq = text.indexOf('=');
        if (eq <= 0 || text.substring(eq + 1).isBlank()) {
            throw new IllegalArgumentException("write the cell and the reason as [before:|after:][SHEET!]CELL=REASON, "
                    + "e.g. after:J31=gauge dropped (a reason is required); got '" + text + "'");
        }
        Target t = target(text.substring(0, eq));
        return new Exclusion(characteristic, t.group(), t.cell(), text.substring(eq + 1).trim());
    }

    /**
     * Reads {@code [before:|after:][SHEET!]CELL} (no reason).
     *
     * @param text what the user wrote
     * @return the group (or null) and the cell in upper case, without '$'
     * @throws IllegalArgumentException when it is not a cell reference
     */
    public static Target target(String text) {
        String t = text.trim();
        Group group = null;
        String lower = t.toLowerCase(Locale.ROOT);
        for (Group g : Group.values()) {
            if (lower.startsWith(g.label() + ":")) {
                group = g;
                t = t.substring(g.label().length() + 1).trim();
            }
        }
        int bang = t.lastIndexOf('!');
        String sheet = bang < 0 ? null : t.substring(0, bang).trim();
        String ref = (bang < 0 ? t : t.substring(bang + 1)).replace("$", "").trim().toUpperCase(Locale.ROOT);
        if (!ref.matches("[A-Z]{1,3}[1-9][0-9]{0,6}") || sheet != null && unquote(sheet).isEmpty()) {
            throw new IllegalArgumentException("'" + text.trim() + "' is not a cell: write a column letter and a row "
                    + "number, e.g. J31, with before: or after: in front when both files have that cell and "
                    + "SHEET! when the workbook has several sheets (before:Data!J31)");
        }
        return new Target(group, sheet == null ? ref : sheet + "!" + ref);
    }

    /**
     * A parsed cell reference.
     *
     * @param group the group, or null
     * @param cell  the cell with its optional sheet
     */
    public record Target(Group group, String cell) {
    }

    /**
     * Whether this exclusion names the value at an origin.
     *
     * @param o      where the value was read
     * @param before whether the value is in the before group
     * @return true when group (if given), sheet (if given) and cell agree
     */
    public boolean matches(Origin o, boolean before) {
        if (group != null && (group == Group.BEFORE) != before) {
            return false;
        }
        String r = cell.trim();
        int bang = r.lastIndexOf('!');
        if (bang >= 0) {
            String sheet = unquote(r.substring(0, bang).trim());
            if (o.sheet() == null || !o.sheet().equalsIgnoreCase(sheet)) {
                return false;
            }
            r = r.substring(bang + 1);
        }
        return o.cell().equalsIgnoreCase(r.replace("$", "").trim());
    }

    /** @return the cell as the user writes it, e.g. "after:Data!J31" */
    public String reference() {
        return (group == null ? "" : group.label() + ":") + cell;
    }

    private static String unquote(String sheet) {
        String s = sheet;
        if (s.length() >= 2 && s.startsWith("'") && s.endsWith("'")) {
            s = s.substring(1, s.length() - 1).replace("''", "'");
        }
        return s.trim();
    }
}
