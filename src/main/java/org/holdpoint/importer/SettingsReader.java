package org.holdpoint.importer;

import com.fasterxml.jackson.core.JacksonException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.DistributionSetting;
import org.holdpoint.study.CriteriaCheck;
import org.holdpoint.study.MarginSpec;
import org.holdpoint.study.SpecLimits;

/**
 * Reads per-characteristic settings (unit, specification limits, equivalence margin, sd-growth limit,
 * capability requirement, paired) from a small settings file, {@code NAME.settings.csv} or
 * {@code NAME.settings.json}; the format is documented in docs/settings-file.md. The entry named
 * {@value #DEFAULTS} applies to every characteristic without an entry of its own. Bad values are
 * refused with the file, row and column.
 */
public final class SettingsReader {
    /** The name of the entry that holds defaults for every characteristic. */
    public static final String DEFAULTS = "*";

    /** Larger than any real settings file (one line per characteristic). */
    private static final long MAX_BYTES = 16L << 20;

    /** The columns (CSV) or keys (JSON) a settings file may use. */
    public static final List<String> COLUMNS = List.of("characteristic", "unit", "lsl", "nominal", "usl", "margin",
            "margin_lower", "margin_upper", "margin_percent", "margin_percent_lower", "margin_percent_upper",
            "margin_percent_of_usl", "margin_ratio", "margin_ratio_lower", "margin_ratio_upper",
            "sd_growth_limit", "capability_min", "paired", "distribution", "require_stability", "ti_coverage", "ti_confidence");

    /** Creates a reader. */
    public SettingsReader() {
    }

    /**
     * The settings file beside a data file: {@code NAME.settings.csv}, else {@code NAME.settings.json},
     * for a data file {@code NAME.xlsx} (any extension).
     *
     * @param dataFile the data file
     * @return the settings file when one exists
     */
    public static Optional<Path> findBeside(Path dataFile) {
        Path name = dataFile.getFileName();
        if (name == null) {
            return Optional.empty();
        }
        String s = name.toString();
        int dot = s.lastIndexOf('.');
        String stem = dot > 0 ? s.substring(0, dot) : s;
        for (String ext : new String[] {".settings.csv", ".settings.json"}) {
            Path p = dataFile.resolveSibling(stem + ext);
            if (Files.isRegularFile(p)) {
                return Optional.of(p);
            }
        }
        return Optional.empty();
    }

    /**
     * Reads a settings file (JSON when its name ends in .json or its text starts with '{', else CSV).
     *
     * @param file the settings file
     * @return settings per characteristic name, in file order ({@value #DEFAULTS} for the defaults)
     * @throws ImportException when the file cannot be read or holds a bad value (naming row and column)
     */
    public Map<String, CharacteristicSettings> read(Path file) {
        String name = file.toString();
        FileKind.sniff(file, name);
        byte[] bytes;
        try {
            if (Files.size(file) > MAX_BYTES) {
                throw new ImportException("settings file %s is larger than %d MB; a settings file has one line per "
                        + "characteristic. Check that the right file was given", name, MAX_BYTES >> 20);
            }
            bytes = Files.readAllBytes(file);
        } catch (IOException e) {
            throw new ImportException(e, "settings file %s cannot be read (%s); check that it exists and is readable",
                    name, e.getMessage());
        }
        String text = TextEncoding.decode(bytes, name).text();
        if (name.toLowerCase(Locale.ROOT).endsWith(".json") || text.stripLeading().startsWith("{")) {
            return readJson(name, text);
        }
        return readCsv(name, text);
    }

    private Map<String, CharacteristicSettings> readCsv(String name, String text) {
        char delim = CsvReader.detectDelimiter(text);
        char dec = delim == ',' ? '.' : CsvReader.detectDecimal(text, delim);
        CSVFormat format = CSVFormat.DEFAULT.builder().setDelimiter(delim).setCommentMarker('#')
                .setIgnoreSurroundingSpaces(true).setIgnoreEmptyLines(true).get();
        Map<String, CharacteristicSettings> out = new LinkedHashMap<>();
        try (Reader reader = new java.io.StringReader(text);
                CSVParser parser = CSVParser.builder().setReader(reader).setFormat(format).get()) {
            String[] header = null;
            for (CSVRecord rec : parser) {
                long line = parser.getCurrentLineNumber();
                if (header == null) {
                    header = new String[rec.size()];
                    for (int i = 0; i < rec.size(); i++) {
                        header[i] = ColumnNames.key(rec.get(i)).replace(' ', '_');
                        if (!COLUMNS.contains(header[i])) {
                            throw new ImportException("settings file %s, line %d: unknown column \"%s\"; the columns "
                                    + "are %s", name, line, rec.get(i), String.join(", ", COLUMNS));
                        }
                    }
                    if (!List.of(header).contains("characteristic")) {
                        throw new ImportException("settings file %s: the first line must be a header with a column "
                                + "named characteristic (the columns are %s)", name, String.join(", ", COLUMNS));
                    }
                    continue;
                }
                Map<String, String> values = new LinkedHashMap<>();
                for (int i = 0; i < rec.size(); i++) {
                    String v = rec.get(i).strip();
                    if (i >= header.length) {
                        if (!v.isEmpty()) {
                            throw new ImportException("settings file %s, line %d, column %d: a value beyond the "
                                    + "header's %d columns", name, line, i + 1, header.length);
                        }
                        continue;
                    }
                    if (!v.isEmpty()) {
                        values.put(header[i], v);
                    }
                }
                add(out, values, new Where(name, "line " + line), dec);
            }
        } catch (IOException | IllegalStateException | java.io.UncheckedIOException e) {
            throw new ImportException(e, "settings file %s cannot be read as delimited text: %s", name, e.getMessage());
        }
        return out;
    }

    private Map<String, CharacteristicSettings> readJson(String name, String text) {
        JsonNode root;
        try {
            root = new ObjectMapper().readTree(text);
        } catch (JacksonException e) {
            throw new ImportException(e, "settings file %s is not valid JSON: %s", name,
                    e.getOriginalMessage());
        }
        if (root == null || !root.isObject()) {
            throw new ImportException("settings file %s must hold one JSON object with \"characteristics\" (and "
                    + "optionally \"defaults\")", name);
        }
        Map<String, CharacteristicSettings> out = new LinkedHashMap<>();
        for (Iterator<String> it = root.fieldNames(); it.hasNext();) {
            String f = it.next();
            if (!f.equals("defaults") && !f.equals("characteristics")) {
                throw new ImportException("settings file %s: unknown key \"%s\"; expected \"defaults\" and "
                        + "\"characteristics\"", name, f);
            }
        }
        if (root.has("defaults")) {
            Map<String, String> values = jsonValues(name, "defaults", root.get("defaults"));
            values.put("characteristic", DEFAULTS);
            add(out, values, new Where(name, "\"defaults\""), '.');
        }
        JsonNode chars = root.get("characteristics");
        if (chars != null) {
            if (!chars.isObject()) {
                throw new ImportException("settings file %s: \"characteristics\" must be an object keyed by "
                        + "characteristic name", name);
            }
            for (Iterator<Map.Entry<String, JsonNode>> it = chars.fields(); it.hasNext();) {
                Map.Entry<String, JsonNode> e = it.next();
                Map<String, String> values = jsonValues(name, e.getKey(), e.getValue());
                values.put("characteristic", e.getKey());
                add(out, values, new Where(name, "characteristic \"" + e.getKey() + "\""), '.');
            }
        }
        return out;
    }

    /**
     * One characteristic's criteria as a settings file's JSON entry: the same keys as a settings file
     * (docs/settings-file.md), so the criteria have one spelling wherever they are written (settings
     * files, study files). Absent values are left out.
     *
     * @param s the criteria
     * @return the entry, e.g. {"lsl": 9.95, "usl": 10.05, "margin": 0.01}
     */
    public static ObjectNode toJson(CharacteristicSettings s) {
        ObjectNode o = JsonNodeFactory.instance.objectNode();
        if (s.unit() != null) {
            o.put("unit", s.unit());
        }
        putIf(o, "lsl", s.spec().lsl());
        putIf(o, "nominal", s.spec().nominal());
        putIf(o, "usl", s.spec().usl());
        MarginSpec m = s.margin();
        if (m != null && m.kind() == MarginSpec.Kind.PERCENT_OF_UPPER_LIMIT) {
            o.put("margin_percent_of_usl", m.upper());
        } else if (m != null && m.kind() == MarginSpec.Kind.RATIO) {
            // the ratio bounds as entered (a symmetric 1/R to R is written as its two bounds)
            putIf(o, "margin_ratio_lower", m.lower());
            putIf(o, "margin_ratio_upper", m.upper());
        } else if (m != null) {
            boolean abs = m.kind() == MarginSpec.Kind.ABSOLUTE;
            boolean symmetric = m.lower() != null && m.upper() != null
                    && (abs ? -m.lower() == m.upper() : m.lower().equals(m.upper()));
            if (symmetric) {
                o.put(abs ? "margin" : "margin_percent", m.upper());
            } else {
                putIf(o, abs ? "margin_lower" : "margin_percent_lower", m.lower());
                putIf(o, abs ? "margin_upper" : "margin_percent_upper", m.upper());
            }
        }
        putIf(o, "sd_growth_limit", s.sdGrowthLimit());
        putIf(o, "capability_min", s.capabilityRequirement());
        if (s.paired() != null) {
            o.put("paired", s.paired());
        }
        if (s.distribution() != null) {
            o.put("distribution", s.distribution().key());
        }
        if (s.requireStability() != null) {
            o.put("require_stability", s.requireStability());
        }
        if (s.tolerance() != null) {
            o.put("ti_coverage", s.tolerance().coverage());
            o.put("ti_confidence", s.tolerance().confidence());
        }
        return o;
    }

    /**
     * Reads one JSON entry written by {@link #toJson} (or by hand, as in a settings file), with the
     * settings file's rules.
     *
     * @param file  the file name for messages
     * @param entry the entry's name for messages (a characteristic or "defaults")
     * @param node  the entry
     * @return the criteria
     * @throws ImportException naming file, entry and key for a bad value
     */
    public static CharacteristicSettings fromJson(String file, String entry, JsonNode node) {
        Map<String, String> values = jsonValues(file, entry, node);
        values.put("characteristic", entry);
        Map<String, CharacteristicSettings> out = new LinkedHashMap<>();
        add(out, values, new Where(file, "entry \"" + entry + "\""), '.');
        return out.get(entry);
    }

    private static void putIf(ObjectNode o, String key, Double v) {
        if (v != null) {
            o.put(key, v);
        }
    }

    private static Map<String, String> jsonValues(String name, String entry, JsonNode node) {
        if (!node.isObject()) {
            throw new ImportException("settings file %s, entry \"%s\": must be an object such as {\"lsl\": 9.95}", name,
                    entry);
        }
        Map<String, String> values = new LinkedHashMap<>();
        for (Iterator<Map.Entry<String, JsonNode>> it = node.fields(); it.hasNext();) {
            Map.Entry<String, JsonNode> e = it.next();
            String key = ColumnNames.key(e.getKey()).replace(' ', '_');
            if (!COLUMNS.contains(key) || key.equals("characteristic")) {
                throw new ImportException("settings file %s, entry \"%s\": unknown key \"%s\"; the keys are %s", name,
                        entry, e.getKey(), String.join(", ", COLUMNS.subList(1, COLUMNS.size())));
            }
            JsonNode v = e.getValue();
            if (v.isNull()) {
                continue;
            }
            if (!v.isValueNode()) {
                throw new ImportException("settings file %s, entry \"%s\", key \"%s\": must be a number, text or "
                        + "true/false", name, entry, e.getKey());
            }
            values.put(key, v.isNumber() ? v.decimalValue().toString() : v.asText().strip());
        }
        return values;
    }

    private record Where(String file, String place) {
        ImportException bad(String column, String value, String what) {
            return new ImportException("settings file %s, %s, column %s: \"%s\" %s", file, place, column, value, what);
        }
    }

    private static void add(Map<String, CharacteristicSettings> out, Map<String, String> v, Where w, char dec) {
        String name = v.get("characteristic");
        if (name == null) {
            throw new ImportException("settings file %s, %s: the characteristic is missing (use %s for defaults)",
                    w.file(), w.place(), DEFAULTS);
        }
        for (String existing : out.keySet()) {
            if (ColumnNames.key(existing).equals(ColumnNames.key(name))) {
                throw new ImportException("settings file %s, %s: characteristic \"%s\" is given twice; keep one entry",
                        w.file(), w.place(), name);
            }
        }
        Double lsl = number(v, "lsl", w, dec);
        Double nominal = number(v, "nominal", w, dec);
        Double usl = number(v, "usl", w, dec);
        MarginSpec margin = margin(v, w, dec);
        Double sdGrowth = number(v, "sd_growth_limit", w, dec);
        Double capMin = number(v, "capability_min", w, dec);
        // the one set of criteria rules (study.CriteriaCheck), reported on the column that holds the value
        for (CriteriaCheck.Problem p : CriteriaCheck.check(lsl, nominal, usl, margin, sdGrowth, capMin)) {
            String col = switch (p.field()) {
                case LSL -> "lsl";
                case NOMINAL -> "nominal";
                case USL -> "usl";
                case MARGIN -> marginColumn(v);
                case SD_GROWTH_LIMIT -> "sd_growth_limit";
                case CAPABILITY_REQUIREMENT -> "capability_min";
                default -> throw new IllegalStateException("not a settings-file field: " + p.field());
            };
            throw w.bad(col, v.get(col), "is not accepted: " + p.message());
        }
        Boolean paired = bool(v, "paired", w);
        DistributionSetting distribution = null;
        String d = v.get("distribution");
        if (d != null && !d.isBlank()) {
            distribution = DistributionSetting.parse(d);
            if (distribution == null) {
                throw w.bad("distribution", d, "is not a distribution; use " + DistributionSetting.words()
                        + ", or leave it empty for the default rule");
            }
        }
        Boolean requireStability = bool(v, "require_stability", w);
        Double tiCoverage = number(v, "ti_coverage", w, dec);
        Double tiConfidence = number(v, "ti_confidence", w, dec);
        if ((tiCoverage == null) != (tiConfidence == null)) {
            String missing = tiCoverage == null ? "ti_coverage" : "ti_confidence";
            throw new ImportException("settings file %s, %s, column %s: it is empty, but %s is given; give both the "
                    + "coverage and the confidence of the tolerance interval (e.g. 0.99 and 0.95)", w.file(), w.place(),
                    missing, tiCoverage == null ? "ti_confidence" : "ti_coverage");
        }
        org.holdpoint.study.ToleranceRequirement tolerance = null;
        if (tiCoverage != null) {
            try {
                tolerance = new org.holdpoint.study.ToleranceRequirement(tiCoverage, tiConfidence);
            } catch (IllegalArgumentException e) {
                String col = tiCoverage > 0 && tiCoverage < 1 ? "ti_confidence" : "ti_coverage";
                throw w.bad(col, v.get(col), "is not accepted: " + e.getMessage());
            }
        }
        try {
            out.put(name, new CharacteristicSettings(v.get("unit"), new SpecLimits(lsl, nominal, usl), margin, sdGrowth,
                    capMin, paired, distribution, requireStability, tolerance));
        } catch (IllegalArgumentException e) {
            throw new ImportException(e, "settings file %s, %s: %s", w.file(), w.place(), e.getMessage());
        }
    }

    private static MarginSpec margin(Map<String, String> v, Where w, char dec) {
        Double sym = number(v, "margin", w, dec);
        Double lo = number(v, "margin_lower", w, dec);
        Double hi = number(v, "margin_upper", w, dec);
        Double pct = number(v, "margin_percent", w, dec);
        Double pctLo = number(v, "margin_percent_lower", w, dec);
        Double pctHi = number(v, "margin_percent_upper", w, dec);
        Double pctUsl = number(v, "margin_percent_of_usl", w, dec);
        Double ratio = number(v, "margin_ratio", w, dec);
        Double ratioLo = number(v, "margin_ratio_lower", w, dec);
        Double ratioHi = number(v, "margin_ratio_upper", w, dec);
        boolean abs = sym != null || lo != null || hi != null;
        boolean rel = pct != null || pctLo != null || pctHi != null;
        if (ratio != null || ratioLo != null || ratioHi != null) {
            String col = ratio != null ? "margin_ratio" : ratioLo != null ? "margin_ratio_lower" : "margin_ratio_upper";
            if (abs || rel || pctUsl != null) {
                throw w.bad(col, v.get(col), "cannot be combined with another margin; give the margin one way");
            }
            if (ratio != null && (ratioLo != null || ratioHi != null)) {
                throw w.bad("margin_ratio", v.get("margin_ratio"), "is symmetric (1/R to R); give either it or the "
                        + "lower/upper ratio margins, not both");
            }
            if (ratio != null) {
                if (!(ratio > 1)) {
                    throw w.bad("margin_ratio", v.get("margin_ratio"), "must be above 1: after/before may lie between "
                            + "1/R and R, e.g. 1.25 for 0.8 to 1.25");
                }
                return new MarginSpec(MarginSpec.Kind.RATIO, 1 / ratio, ratio);
            }
            return new MarginSpec(MarginSpec.Kind.RATIO, ratioLo, ratioHi);
        }
        if (pctUsl != null) {
            if (abs || rel) {
                throw w.bad("margin_percent_of_usl", v.get("margin_percent_of_usl"), "cannot be combined with another "
                        + "margin; give the margin one way");
            }
            return new MarginSpec(MarginSpec.Kind.PERCENT_OF_UPPER_LIMIT, null, pctUsl);
        }
        if (abs && rel) {
            throw w.bad(sym != null ? "margin" : lo != null ? "margin_lower" : "margin_upper",
                    v.getOrDefault("margin", v.getOrDefault("margin_lower", v.get("margin_upper"))),
                    "cannot be combined with a margin in percent of tolerance; give the margin one way");
        }
        if (sym != null && (lo != null || hi != null) || pct != null && (pctLo != null || pctHi != null)) {
            throw w.bad(sym != null ? "margin" : "margin_percent", v.getOrDefault("margin", v.get("margin_percent")),
                    "is symmetric; give either it or the lower/upper margins, not both");
        }
        if (sym != null) {
            if (!(sym > 0)) {
                throw w.bad("margin", v.get("margin"), "must be positive (the margin is ± this amount in the "
                        + "characteristic's unit)");
            }
            return new MarginSpec(MarginSpec.Kind.ABSOLUTE, -sym, sym);
        }
        if (lo != null || hi != null) {
            return new MarginSpec(MarginSpec.Kind.ABSOLUTE, lo, hi);
        }
        if (pct != null) {
            return new MarginSpec(MarginSpec.Kind.PERCENT_OF_TOLERANCE, pct, pct);
        }
        if (pctLo != null || pctHi != null) {
            return new MarginSpec(MarginSpec.Kind.PERCENT_OF_TOLERANCE, pctLo, pctHi);
        }
        return null;
    }

    /** The margin column the row uses (for messages). */
    private static String marginColumn(Map<String, String> v) {
        for (String c : List.of("margin", "margin_lower", "margin_upper", "margin_percent", "margin_percent_lower",
                "margin_percent_upper", "margin_percent_of_usl", "margin_ratio", "margin_ratio_lower",
                "margin_ratio_upper")) {
            if (v.get(c) != null) {
                return c;
            }
        }
        return "margin";
    }

    private static Double number(Map<String, String> v, String col, Where w, char dec) {
        String s = v.get(col);
        if (s == null) {
            return null;
        }
        String t = s.endsWith("%") && col.startsWith("margin_percent") ? s.substring(0, s.length() - 1).strip() : s;
        DecimalParser p = new DecimalParser(dec);
        int r = p.parse(t);
        if (r == DecimalParser.NOT_A_NUMBER && dec == '.') {
            p = new DecimalParser(',');
            r = t.indexOf('.') < 0 ? p.parse(t) : DecimalParser.NOT_A_NUMBER;
        }
        if (r == DecimalParser.NOT_A_NUMBER || !Double.isFinite(p.value)) {
            throw w.bad(col, s, "is not a number");
        }
        return p.value + 0.0;
    }

    private static Boolean bool(Map<String, String> v, String col, Where w) {
        String s = v.get(col);
        if (s == null) {
            return null;
        }
        switch (s.toLowerCase(Locale.ROOT)) {
            case "true", "yes", "y", "1":
                return Boolean.TRUE;
            case "false", "no", "n", "0":
                return Boolean.FALSE;
            default:
                throw w.bad(col, s, "must be true or false (or yes/no)");
        }
    }
}
