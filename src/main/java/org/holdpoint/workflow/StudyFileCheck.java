package org.holdpoint.workflow;

import com.fasterxml.jackson.databind.JsonNode;
import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Set;

/**
 * The rules a study file must meet before anything in it is used: every key of the right JSON type, every
 * enumeration one of its words, every raw value a finite decimal number, rows and columns positive whole
 * numbers, and the per-value lists as long as the values. A file that breaks one is refused with the JSON
 * path of the first problems (e.g. {@code characteristics[2].before.values[17]: "abc" is not a number}),
 * never read with a default in its place (docs/study-file.md, "Validation").
 */
final class StudyFileCheck {
    private static final int SHOWN = 5;
    private static final Set<String> STAGES = Set.of("PREPARED", "REVIEWED", "APPROVED");
    private static final Set<String> LAYOUTS = Set.of("STACKED", "SIDE_BY_SIDE", "WIDE", "PAIRED", "SEPARATE");
    private static final Set<String> GROUPS = Set.of("before", "after");
    private final List<String> problems = new ArrayList<>();

    private StudyFileCheck() {
    }

    /**
     * Checks a study tree.
     *
     * @param root the parsed file
     * @param name the file name for the message
     * @throws StudyFileException naming the JSON path of the first problems
     */
    static void check(JsonNode root, String name) {
        StudyFileCheck c = new StudyFileCheck();
        c.root(root);
        if (!c.problems.isEmpty()) {
            List<String> shown = c.problems.subList(0, Math.min(SHOWN, c.problems.size()));
            throw new StudyFileException("%s is not a valid study file: %s%s. The file was changed outside Holdpoint "
                    + "or is damaged; use the file as it was written", name, String.join("; ", shown),
                    c.problems.size() > SHOWN ? " and " + (c.problems.size() - SHOWN) + " more" : "");
        }
    }

    private void bad(String path, String what) {
        problems.add(path + ": " + what);
    }

    private static String show(JsonNode v) {
        String t = v.toString();
        return t.length() > 40 ? t.substring(0, 40) + "…" : t;
    }

    private boolean object(JsonNode o, String path, boolean required) {
        if (o == null || o.isMissingNode() || o.isNull()) {
            if (required) {
                bad(path, "is missing");
            }
            return false;
        }
        if (!o.isObject()) {
            bad(path, show(o) + " is not an object");
            return false;
        }
        return true;
    }

    private boolean array(JsonNode o, String path, boolean required) {
        if (o == null || o.isMissingNode() || o.isNull()) {
            if (required) {
                bad(path, "is missing");
            }
            return false;
        }
        if (!o.isArray()) {
            bad(path, show(o) + " is not a list");
            return false;
        }
        return true;
    }

    private void text(JsonNode o, String key, String path, boolean required) {
        JsonNode v = o.get(key);
        if (v == null || v.isNull()) {
            if (required) {
                bad(path + "." + key, "is missing");
            }
        } else if (!v.isTextual()) {
            bad(path + "." + key, show(v) + " is not a text");
        } else if (required && v.asText().isBlank()) {
            bad(path + "." + key, "is empty");
        }
    }

    private void bool(JsonNode o, String key, String path) {
        JsonNode v = o.get(key);
        if (v != null && !v.isNull() && !v.isBoolean()) {
            bad(path + "." + key, show(v) + " is not true or false");
        }
    }

    private void word(JsonNode o, String key, String path, Set<String> allowed, boolean required) {
        JsonNode v = o.get(key);
        if (v == null || v.isNull()) {
            if (required) {
                bad(path + "." + key, "is missing");
            }
        } else if (!v.isTextual() || !allowed.contains(v.asText())) {
            bad(path + "." + key, show(v) + " is not one of " + String.join(", ", new java.util.TreeSet<>(allowed)));
        }
    }

    private void finite(JsonNode v, String path) {
        if (!v.isNumber()) {
            bad(path, show(v) + " is not a number");
            return;
        }
        BigDecimal d = v.decimalValue();
        if (!Double.isFinite(d.doubleValue())) {
            bad(path, show(v) + " is too large to be a measurement");
        }
    }

    private void root(JsonNode root) {
        if (!object(root, "(the file)", true)) {
            return;
        }
        JsonNode sv = root.get("schemaVersion");
        if (sv == null || !sv.isInt()) {
            bad("schemaVersion", sv == null ? "is missing" : show(sv) + " is not a whole number");
        }
        if (object(root.get("change"), "change", false)) {
            JsonNode c = root.get("change");
            for (String k : new String[] {"id", "title", "kind", "partNumber", "revision", "reason", "requester",
                "requestDate", "studyDate"}) {
                text(c, k, "change", false);
            }
        }
        if (root.has("signingKey")) {
            JsonNode k = root.get("signingKey");
            if (!k.isTextual() || !k.asText().matches("[0-9a-f]{64}")) {
                bad("signingKey", show(k) + " is not a SHA-256 fingerprint");
            }
        }
        if (object(root.get("analysis"), "analysis", false)) {
            text(root.get("analysis"), "analyst", "analysis", false);
            text(root.get("analysis"), "at", "analysis", false);
        }
        settings(root.get("settings"));
        if (array(root.get("inputs"), "inputs", false)) {
            int i = 0;
            for (JsonNode in : root.get("inputs")) {
                String p = "inputs[" + i++ + "]";
                if (object(in, p, true)) {
                    text(in, "file", p, false);
                    text(in, "sha256", p, false);
                    word(in, "layout", p, LAYOUTS, false);
                }
            }
        }
        if (array(root.get("characteristics"), "characteristics", true)) {
            int i = 0;
            for (JsonNode c : root.get("characteristics")) {
                characteristic(c, "characteristics[" + i++ + "]");
            }
        }
        if (array(root.get("signatures"), "signatures", false)) {
            int i = 0;
            for (JsonNode g : root.get("signatures")) {
                String p = "signatures[" + i++ + "]";
                if (object(g, p, true)) {
                    word(g, "stage", p, STAGES, true);
                    text(g, "name", p, true);
                    text(g, "role", p, false);
                    text(g, "meaning", p, false);
                    text(g, "timestamp", p, false);
                    text(g, "record", p, false);
                }
            }
        }
    }

    private void settings(JsonNode s) {
        if (!object(s, "settings", true)) {
            return;
        }
        JsonNode alpha = s.get("alpha");
        if (alpha != null && !alpha.isNull()) {
            if (!alpha.isNumber() || !(alpha.asDouble() > 0 && alpha.asDouble() < 0.5)) {
                bad("settings.alpha", show(alpha) + " is not a level between 0 and 0.5");
            }
        }
        bool(s, "equalVariances", "settings");
        bool(s, "holm", "settings");
        object(s.get("defaults"), "settings.defaults", false);
        object(s.get("overrides"), "settings.overrides", false);
        if (object(s.get("perCharacteristic"), "settings.perCharacteristic", false)) {
            s.get("perCharacteristic").fields().forEachRemaining(e -> object(e.getValue(),
                    "settings.perCharacteristic." + e.getKey(), true));
        }
        if (array(s.get("exclusions"), "settings.exclusions", false)) {
            int i = 0;
            for (JsonNode x : s.get("exclusions")) {
                String p = "settings.exclusions[" + i++ + "]";
                if (object(x, p, true)) {
                    text(x, "characteristic", p, false);
                    text(x, "cell", p, true);
                    text(x, "reason", p, true);
                    word(x, "group", p, GROUPS, false);
                }
            }
        }
    }

    private void characteristic(JsonNode c, String path) {
        if (!object(c, path, true)) {
            return;
        }
        text(c, "name", path, true);
        text(c, "unit", path, false);
        bool(c, "paired", path);
        group(c.get("before"), path + ".before");
        group(c.get("after"), path + ".after");
    }

    private void group(JsonNode g, String path) {
        if (!object(g, path, true)) {
            return;
        }
        text(g, "file", path, false);
        text(g, "sheet", path, false);
        bool(g, "exactDecimals", path);
        if (!array(g.get("values"), path + ".values", true)) {
            return;
        }
        JsonNode values = g.get("values");
        int n = values.size();
        for (int i = 0; i < n; i++) {
            finite(values.get(i), path + ".values[" + i + "]");
        }
        for (String key : new String[] {"rows", "columns"}) {
            if (array(g.get(key), path + "." + key, true)) {
                JsonNode a = g.get(key);
                if (a.size() != n) {
                    bad(path + "." + key, String.format(Locale.ROOT, "has %d entries for %d values", a.size(), n));
                }
                for (int i = 0; i < a.size(); i++) {
                    JsonNode v = a.get(i);
                    if (!v.canConvertToInt() || !v.isIntegralNumber() || v.asInt() < 1) {
                        bad(path + "." + key + "[" + i + "]", show(v) + " is not a " + (key.equals("rows") ? "row"
                                : "column") + " number (1 or more)");
                    }
                }
            }
        }
        for (String key : new String[] {"units", "lots", "subgroups", "sequence"}) {
            if (array(g.get(key), path + "." + key, false)) {
                JsonNode a = g.get(key);
                if (a.size() != n) {
                    bad(path + "." + key, String.format(Locale.ROOT, "has %d entries for %d values", a.size(), n));
                }
                for (int i = 0; i < a.size(); i++) {
                    if (!a.get(i).isNull() && !a.get(i).isTextual()) {
                        bad(path + "." + key + "[" + i + "]", show(a.get(i)) + " is not a text");
                    }
                }
            }
        }
    }
}
