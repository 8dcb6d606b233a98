package org.holdpoint.importer;

import java.util.Locale;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Header names: the comparison key (case-insensitive, trimmed, separators as spaces, a unit of
 * measure in trailing brackets removed, as in "Bore (mm)" → key "bore", unit "mm") and the names
 * that mark the roles of columns.
 */
final class ColumnNames {
    private static final Pattern UNIT = Pattern.compile("^(.*?)\\s*[\\(\\[]\\s*([^()\\[\\]]*?)\\s*[\\)\\]]\\s*$");
    private static final Pattern SEPARATORS = Pattern.compile("[\\s_\\-.:#]+");

    static final Set<String> GROUP = Set.of("phase", "group", "condition", "period", "state", "before after",
            "before/after");
    static final Set<String> VALUE = Set.of("value", "values", "measurement", "measured value", "measured", "result",
            "reading");
    static final Set<String> CHARACTERISTIC = Set.of("characteristic", "characteristic name", "feature",
            "parameter", "property");
    static final Set<String> UNIT_ID = Set.of("unit", "unit id", "unitid", "serial", "serial no", "serial number",
            "serial nr", "sn", "s/n", "part id", "part no", "part number", "piece id", "specimen", "id");
    static final Set<String> LOT = Set.of("lot", "lot no", "lot number", "lot id", "batch", "batch no",
            "batch number", "batch id");
    static final Set<String> SUBGROUP = Set.of("subgroup", "sub group", "subgroup id", "subgroup no");
    static final Set<String> SEQUENCE = Set.of("sequence", "seq", "sequence no", "sequence number", "run order",
            "run no", "timestamp", "time stamp", "date", "date time", "datetime", "measured at");
    static final Set<String> MEASUREMENT_UNIT = Set.of("uom", "unit of measure", "units", "measurement unit");

    private ColumnNames() {
    }

    /** A header split into its comparison key and unit of measure (null when none). */
    record Name(String raw, String display, String key, String unit) {
    }

    /**
     * @param raw the header text as found
     * @return key and unit
     */
    static Name parse(String raw) {
        String display = raw.strip().replaceAll("\\s+", " ");
        String unit = null;
        Matcher m = UNIT.matcher(display);
        if (m.matches() && !m.group(1).isEmpty()) {
            display = m.group(1);
            unit = m.group(2).isEmpty() ? null : m.group(2);
        }
        return new Name(raw, display, key(display), unit);
    }

    /**
     * @param text any name
     * @return its comparison key: lower case, separators as single spaces, trimmed
     */
    static String key(String text) {
        return SEPARATORS.matcher(text.toLowerCase(Locale.ROOT)).replaceAll(" ").strip();
    }

    /**
     * For a side-by-side header such as "bore before", "before bore" or "bore_after": the characteristic
     * part, or null when the key does not carry the label.
     *
     * @param key   the header key
     * @param label the label key ("before" or "after")
     * @return "" for the bare label, the characteristic's key part, or null
     */
    static String stripLabel(String key, String label) {
        if (key.equals(label)) {
            return "";
        }
        if (key.endsWith(" " + label)) {
            return key.substring(0, key.length() - label.length() - 1).strip();
        }
        if (key.startsWith(label + " ")) {
            return key.substring(label.length() + 1).strip();
        }
        return null;
    }
}
