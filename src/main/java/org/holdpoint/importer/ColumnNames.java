package org.holdpoint.importer;

import java.util.Set;

/**
 * Header names: the comparison key (case-insensitive, trimmed, separators as spaces, a unit of
 * measure in trailing brackets removed, as in "Bore (mm)" → key "bore", unit "mm") and the names
 * that mark the roles of columns.
 */
final class ColumnNames {

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

    /** What a trace (non-measurement) column is taken as. */
    enum Trace {
        /** The part's unit or serial id. */
        UNIT_ID("unit id"),
        /** A lot, batch or heat. */
        LOT("lot"),
        /** A rational subgroup. */
        SUBGROUP("subgroup"),
        /** An explicit sequence number (run order). */
        SEQUENCE("sequence"),
        /** A date or time of measurement (run order when no sequence column exists). */
        DATE("date or time"),
        /** A grouping of the process: cavity, nest, spindle, fixture, machine, operator, shift. */
        GROUPING("process grouping"),
        /** A unit of measure per row (stacked layouts). */
        MEASUREMENT_UNIT("unit of measure");

        private final String words;

        Trace(String words) {
            this.words = words;
        }

        /** @return the role in words */
        String words() {
            return words;
        }
    }

    /** Words after a trace word that make it an id column: "cavity no", "lot nr", "machine id". */
    private static final Set<String> ID_SUFFIX = Set.of("no", "nr", "number", "id", "num", "nummer", "code", "#");
    private static final Set<String> SERIAL_WORDS = Set.of("serial", "serialno", "serialnumber", "seriennummer",
            "seriennr", "serien", "sn", "s/n");
    private static final Set<String> UNIT_ID_KEYS = Set.of("unit", "unit id", "unitid", "id", "part id", "piece id",
            "piece no", "piece", "specimen", "specimen id", "sample id", "sample no", "part serial", "teil id",
            "bauteil id", "probe", "probe nr", "probennummer", "stück nr", "stueck nr", "teil nr");
    private static final Set<String> LOT_WORDS = Set.of("lot", "batch", "charge", "los", "heat", "chargennummer",
            "chargen", "losnummer", "schmelze");
    private static final Set<String> SEQUENCE_KEYS = Set.of("sequence", "seq", "sequence no", "sequence number",
            "run order", "run no", "run", "order", "measurement no", "meas no", "reihenfolge", "lfd nr",
            "laufende nummer", "messung nr", "mess nr", "sample order");
    private static final Set<String> DATE_WORDS = Set.of("date", "datum", "timestamp", "zeitstempel", "datetime",
            "date/time");
    private static final Set<String> DATE_KEYS = Set.of("time", "time stamp", "date time", "uhrzeit", "zeit",
            "measured at", "meas time", "measurement time", "messzeit", "prüfzeit", "pruefzeit");
    private static final Set<String> SUBGROUP_KEYS = Set.of("subgroup", "sub group", "subgroup id", "subgroup no",
            "untergruppe", "stichprobe", "stichprobe nr");
    private static final Set<String> GROUPING_WORDS = Set.of("cavity", "kavität", "kavitaet", "kavitat", "nest",
            "spindle", "spindel", "fixture", "vorrichtung", "machine", "maschine", "operator", "bediener", "werker",
            "prüfer", "pruefer", "inspector", "shift", "schicht", "station", "pallet", "palette", "mould", "mold",
            "werkzeug nr", "tool no", "head", "gauge", "messmittel", "line", "linie");

    /**
     * Recognises a trace column by its name, in English and German: unit/serial ids, lots and batches,
     * sequence numbers, dates and times, subgroups, and process groupings (cavity, nest, spindle,
     * fixture, machine, operator, shift). Such a column is never a characteristic.
     *
     * @param key a header's comparison key
     * @return the trace role, or null for a column that may hold measurements
     */
    static Trace trace(String key) {
        if (key == null || key.isEmpty()) {
            return null;
        }
        String[] t = key.split(" ");
        String first = t[0];
        String last = t[t.length - 1];
        boolean idForm = t.length == 1 || t.length == 2 && ID_SUFFIX.contains(last);
        if (SEQUENCE_KEYS.contains(key) || SEQUENCE.contains(key) && !DATE_WORDS.contains(last)
                && !DATE_KEYS.contains(key)) {
            return Trace.SEQUENCE;
        }
        if (SUBGROUP_KEYS.contains(key) || SUBGROUP.contains(key)) {
            return Trace.SUBGROUP;
        }
        if (MEASUREMENT_UNIT.contains(key)) {
            return Trace.MEASUREMENT_UNIT;
        }
        for (String w : t) {
            if (SERIAL_WORDS.contains(w)) {
                return Trace.UNIT_ID;
            }
        }
        if (UNIT_ID_KEYS.contains(key) || UNIT_ID.contains(key) || key.startsWith("seriennummer") || key.startsWith("serial")) {
            return Trace.UNIT_ID;
        }
        if (LOT.contains(key) || LOT_WORDS.contains(last) || idForm && LOT_WORDS.contains(first)
                || t.length <= 3 && (LOT_WORDS.contains(first) && ID_SUFFIX.contains(last))) {
            return Trace.LOT;
        }
        if (DATE_WORDS.contains(last) || DATE_KEYS.contains(key) || t.length == 1 && (first.endsWith("datum")
                || first.endsWith("zeitstempel"))) {
            return Trace.DATE;
        }
        if (idForm && GROUPING_WORDS.contains(first) || GROUPING_WORDS.contains(key)) {
            return Trace.GROUPING;
        }
        return null;
    }

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
        org.holdpoint.study.NameKeys.Split s = org.holdpoint.study.NameKeys.split(raw);
        return new Name(raw, s.display(), key(s.display()), s.unit());
    }

    /**
     * @param text any name
     * @return its comparison key: lower case, separators as single spaces, trimmed
     */
    static String key(String text) {
        return org.holdpoint.study.NameKeys.fold(text);
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
