package org.holdpoint.workflow;

import org.holdpoint.files.AtomicFiles;
import com.fasterxml.jackson.databind.DeserializationFeature;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.math.BigDecimal;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.holdpoint.importer.SettingsReader;
import org.holdpoint.stats.Sample;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.StabilityOptions;
import org.holdpoint.study.ChangeDescription;
import org.holdpoint.study.ChangeKind;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.Exclusion;
import org.holdpoint.study.GroupData;
import org.holdpoint.study.Provenance;
import org.holdpoint.study.ImportReport;
import org.holdpoint.study.InputInfo;
import org.holdpoint.study.Layout;
import org.holdpoint.study.MarginSpec;
import org.holdpoint.study.Origin;
import org.holdpoint.study.Signature;
import org.holdpoint.study.SkipReason;
import org.holdpoint.study.SkippedCell;
import org.holdpoint.study.SpecLimits;
import org.holdpoint.result.StudyResult;

/**
 * The study file: one JSON document holding a whole change study (change, settings, raw values with
 * their origins, exclusions, signatures) and the results computed when it was saved. Its canonical
 * form (keys in fixed order, no spaces) is what the archive stores and the workbook embeds; its
 * SHA-256 identifies it. The format is documented in {@code docs/study-file.md}.
 */
public final class StudyFiles {
    /**
     * The schema version this code writes. 3 adds the {@code distribution} criterion (capability by a fitted
     * distribution) and the paired spread test; a study of schema 1 or 2 was computed with the methods of its
     * time and is read with {@code methods} 2, so that it re-computes as it was (docs/study-file.md).
     */
    public static final int SCHEMA_VERSION = 4;
    private static final JsonNodeFactory F = JsonNodeFactory.instance;
    private static final ObjectMapper CANONICAL = new ObjectMapper()
            .enable(com.fasterxml.jackson.core.JsonGenerator.Feature.WRITE_BIGDECIMAL_AS_PLAIN);
    private static final ObjectMapper PRETTY = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT)
            .enable(com.fasterxml.jackson.core.JsonGenerator.Feature.WRITE_BIGDECIMAL_AS_PLAIN);
    /**
     * Reads study files of any size analyze accepts: no limit on the length of a text or of the document
     * (a record of a million values is tens of millions of characters), the nesting kept at the default.
     */
    private static final ObjectMapper READER = new ObjectMapper(com.fasterxml.jackson.core.JsonFactory.builder()
            .streamReadConstraints(com.fasterxml.jackson.core.StreamReadConstraints.builder()
                    .maxStringLength(Integer.MAX_VALUE).maxDocumentLength(-1L).build()).build())
            .enable(DeserializationFeature.USE_BIG_DECIMAL_FOR_FLOATS)
            // decimals keep the digits written (25.0100 stays 25.0100), so a re-written text is the same text
            .configure(com.fasterxml.jackson.databind.cfg.JsonNodeFeature.STRIP_TRAILING_BIGDECIMAL_ZEROES, false);

    private StudyFiles() {
    }

    /**
     * The study and its results as a JSON tree.
     *
     * @param study  the study
     * @param result its results (stored for comparison; always re-computable)
     * @return the tree
     */
    public static ObjectNode toJson(ChangeStudy study, StudyResult result) {
        String signingKey = study.provenance().signingKey();
        ObjectNode root = F.objectNode();
        root.put("schemaVersion", SCHEMA_VERSION);
        ObjectNode tool = root.putObject("tool");
        tool.put("name", "holdpoint");
        tool.put("version", Version.get());
        if (signingKey != null) {
            root.put("signingKey", signingKey);
        }
        Provenance p = study.provenance();
        if (p.analyst() != null || p.analysedAt() != null) {
            ObjectNode a = root.putObject("analysis");
            a.put("analyst", p.analyst());
            a.put("at", p.analysedAt());
        }
        root.set("change", change(study.change()));
        root.set("settings", settings(study.settings()));
        ArrayNode inputs = root.putArray("inputs");
        for (InputInfo i : study.data().inputs()) {
            ObjectNode o = inputs.addObject();
            o.put("file", i.file());
            o.put("sha256", i.sha256());
            o.put("sheet", i.sheet());
            o.put("layout", i.layout() == null ? null : i.layout().name());
            o.put("role", i.role());
        }
        root.set("import", importReport(study.data().report()));
        ArrayNode chars = root.putArray("characteristics");
        for (CharacteristicData c : study.data().characteristics()) {
            chars.add(characteristic(c));
        }
        root.set("signatures", signatures(study.signatures()));
        if (result != null) {
            ObjectNode results = root.putObject("results");
            ArrayNode list = results.putArray("characteristics");
            result.characteristics().forEach(r -> list.add(ResultJson.characteristic(r)));
            results.put("changeVerified", result.changeVerified());
            results.put("summary", result.summary());
        }
        return root;
    }

    /**
     * The canonical text: compact, keys in the order written, UTF-8, every number written as the plain
     * text of its decimal (a double as the decimal of its shortest form: 1.0E-4 as 0.00010). A canonical
     * text read back with decimals for floats and written again is the same text, so a study file's record
     * can be re-derived from the file itself, whatever version of the program reads it.
     *
     * @param tree the study tree
     * @return the canonical bytes
     */
    public static byte[] canonical(JsonNode tree) {
        try {
            return CANONICAL.writeValueAsBytes(decimals(tree));
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new IllegalStateException("JSON serialisation failed", e);
        }
    }

    /** A copy of the tree with every binary floating-point number as the decimal of its shortest form. */
    private static JsonNode decimals(JsonNode n) {
        if (n.isDouble() || n.isFloat()) {
            return Double.isFinite(n.doubleValue()) ? F.numberNode(BigDecimal.valueOf(n.doubleValue())) : n;
        }
        if (n.isObject()) {
            ObjectNode o = F.objectNode();
            n.fields().forEachRemaining(e -> o.set(e.getKey(), decimals(e.getValue())));
            return o;
        }
        if (n.isArray()) {
            ArrayNode a = F.arrayNode(n.size());
            n.forEach(x -> a.add(decimals(x)));
            return a;
        }
        return n;
    }

    private static ArrayNode signatures(List<Signature> list) {
        ArrayNode sigs = F.arrayNode();
        for (Signature s : list) {
            ObjectNode o = sigs.addObject();
            o.put("stage", s.stage().name());
            o.put("name", s.name());
            o.put("role", s.role());
            o.put("meaning", s.meaning());
            o.put("timestamp", s.timestamp());
            if (s.record() != null) {
                o.put("record", s.record());
            }
        }
        return sigs;
    }

    /**
     * The sign-off entries as canonical JSON, as the workbook keeps them beside its record.
     *
     * @param list the signatures
     * @return the JSON array text
     */
    public static String signaturesJson(List<Signature> list) {
        return new String(canonical(signatures(list)), StandardCharsets.UTF_8);
    }

    /**
     * Reads sign-off entries written by {@link #signaturesJson}.
     *
     * @param text the JSON array text
     * @param name where it comes from, for messages
     * @return the signatures
     * @throws StudyFileException when the text is not such a list
     */
    public static List<Signature> parseSignatures(String text, String name) {
        JsonNode a = tree(text);
        if (!a.isArray()) {
            throw new StudyFileException("%s: the sign-off list is not a JSON array", name);
        }
        return readSignatures(a, name);
    }

    private static List<Signature> readSignatures(JsonNode a, String name) {
        List<Signature> sigs = new ArrayList<>();
        for (JsonNode s : a) {
            try {
                sigs.add(new Signature(Signature.Stage.valueOf(s.path("stage").asText()), text(s, "name"),
                        text(s, "role"), text(s, "meaning"), text(s, "timestamp"), text(s, "record")));
            } catch (IllegalArgumentException e) {
                throw new StudyFileException("%s: a sign-off entry is not valid (%s)", name, e.getMessage());
            }
        }
        return sigs;
    }

    /**
     * The record: the canonical text of a study tree without its signatures. Its SHA-256 identifies the
     * study everywhere (study file, workbook, archive) and is what a signature signs, so that adding a
     * sign-off stage later leaves the record, its hash and its Ed25519 seal unchanged (docs/study-file.md).
     *
     * @param tree the study tree (with or without signatures)
     * @return the canonical bytes of the record
     */
    public static byte[] record(JsonNode tree) {
        if (tree instanceof ObjectNode o && o.has("signatures")) {
            ObjectNode copy = o.deepCopy();
            copy.remove("signatures");
            return canonical(copy);
        }
        return canonical(tree);
    }

    /**
     * @param tree a study tree
     * @return the SHA-256 of its record ({@link #record})
     */
    public static String recordSha256(JsonNode tree) {
        return sha256(record(tree));
    }

    /**
     * Lower-case hex SHA-256 of bytes.
     *
     * @param bytes the bytes
     * @return the hash
     */
    public static String sha256(byte[] bytes) {
        return org.holdpoint.files.Sha256.of(bytes);
    }

    /**
     * Writes the study file atomically (indented for people; the hash is over the canonical form).
     *
     * @param study  the study
     * @param result its results
     * @param target the file
     * @throws IOException when it cannot be written
     */
    public static void write(ChangeStudy study, StudyResult result, Path target) throws IOException {
        ObjectNode tree = toJson(study, result);
        AtomicFiles.writeText(target, PRETTY.writeValueAsString(tree) + System.lineSeparator());
    }

    /**
     * Reads a study file of any supported schema version.
     *
     * @param file the file
     * @return the study
     * @throws StudyFileException when the file is not a readable study file
     */
    public static ChangeStudy read(Path file) {
        try {
            return fromJson(READER.readTree(Files.readAllBytes(file)), file.toString());
        } catch (IOException e) {
            throw new StudyFileException("%s: cannot read the study file (%s)", file, e.getMessage());
        }
    }

    /**
     * Parses a study from JSON text (e.g. embedded in a workbook or stored in the archive).
     *
     * @param text the JSON
     * @param name a name for messages
     * @return the study
     */
    public static ChangeStudy parse(String text, String name) {
        try {
            return fromJson(READER.readTree(text.getBytes(StandardCharsets.UTF_8)), name);
        } catch (IOException e) {
            throw new StudyFileException("%s: not valid JSON (%s)", name, e.getMessage());
        }
    }

    /**
     * Parses a JSON tree read with big decimals for floats.
     *
     * @param text JSON text
     * @return the tree
     */
    public static JsonNode tree(String text) {
        try {
            return READER.readTree(text);
        } catch (IOException e) {
            throw new StudyFileException("not valid JSON (%s)", e.getMessage());
        }
    }

    static ChangeStudy fromJson(JsonNode root, String name) {
        if (root == null || !root.isObject() || !root.has("schemaVersion")) {
            throw new StudyFileException("%s: not a Holdpoint study file (no schemaVersion)", name);
        }
        int version = root.get("schemaVersion").asInt();
        if (version < 1 || version > SCHEMA_VERSION) {
            throw new StudyFileException("%s: schema version %d is not supported by this version (reads 1 to %d)",
                    name, version, SCHEMA_VERSION);
        }
        StudyFileCheck.check(root, name);
        try {
            ChangeDescription change = readChange(root.path("change"));
            AnalysisSettings settings = readSettings(root.path("settings"), version, name);
            List<InputInfo> inputs = new ArrayList<>();
            for (JsonNode i : root.path("inputs")) {
                inputs.add(new InputInfo(text(i, "file"), text(i, "sha256"), text(i, "sheet"),
                        i.hasNonNull("layout") ? Layout.valueOf(i.get("layout").asText()) : null, text(i, "role")));
            }
            List<CharacteristicData> chars = new ArrayList<>();
            for (JsonNode c : root.path("characteristics")) {
                chars.add(readCharacteristic(c));
            }
            List<Signature> sigs = readSignatures(root.path("signatures"), name);
            return new ChangeStudy(change, new Dataset(chars, inputs, readImport(root.path("import"))), settings, sigs,
                    new Provenance(text(root.path("analysis"), "analyst"), text(root.path("analysis"), "at"),
                            text(root, "signingKey")));
        } catch (RuntimeException e) {
            if (e instanceof StudyFileException) {
                throw e;
            }
            throw new StudyFileException("%s: the study file is damaged or incomplete (%s)", name, e.getMessage());
        }
    }

    private static ObjectNode change(ChangeDescription c) {
        ObjectNode o = F.objectNode();
        o.put("id", c.id());
        o.put("title", c.title());
        o.put("kind", c.kind().name());
        o.put("partNumber", c.partNumber());
        o.put("revision", c.revision());
        o.put("reason", c.reason());
        o.put("requester", c.requester());
        o.put("requestDate", c.requestDate());
        o.put("studyDate", c.studyDate());
        return o;
    }

    private static ChangeDescription readChange(JsonNode o) {
        if (o.isMissingNode() || o.isNull()) {
            return ChangeDescription.NONE;
        }
        return new ChangeDescription(text(o, "id"), text(o, "title"),
                o.hasNonNull("kind") ? ChangeKind.parse(o.get("kind").asText()) : ChangeKind.OTHER,
                text(o, "partNumber"), text(o, "revision"), text(o, "reason"), text(o, "requester"),
                text(o, "requestDate"), text(o, "studyDate"));
    }

    private static ObjectNode settings(AnalysisSettings s) {
        ObjectNode o = F.objectNode();
        o.put("alpha", s.alpha());
        o.put("equalVariances", s.equalVariances());
        o.put("holm", s.holm());
        if (s.methods() != AnalysisSettings.METHODS) {
            o.put("methods", s.methods());
        }
        if (!s.stability().equals(StabilityOptions.DEFAULT)) {
            ObjectNode st = o.putObject("stability");
            st.put("rowOrderIsRunOrder", s.stability().rowOrderIsRunOrder());
            ArrayNode t = st.putArray("tests");
            s.stability().testList().forEach(t::add);
        }
        o.set("defaults", criteria(s.defaults()));
        ObjectNode per = o.putObject("perCharacteristic");
        s.perCharacteristic().forEach((k, v) -> per.set(k, criteria(v)));
        o.set("overrides", criteria(s.overrides()));
        ArrayNode ex = o.putArray("exclusions");
        for (Exclusion e : s.exclusions()) {
            ObjectNode x = ex.addObject();
            x.put("characteristic", e.characteristic());
            x.put("group", e.group() == null ? null : e.group().label());
            x.put("cell", e.cell());
            x.put("reason", e.reason());
        }
        return o;
    }

    private static AnalysisSettings readSettings(JsonNode o, int version, String name) {
        Map<String, CharacteristicSettings> per = new LinkedHashMap<>();
        o.path("perCharacteristic").fields().forEachRemaining(e -> per.put(e.getKey(),
                readCriteria(e.getValue(), version, name, e.getKey())));
        List<Exclusion> ex = new ArrayList<>();
        for (JsonNode x : o.path("exclusions")) {
            String group = text(x, "group");
            ex.add(new Exclusion(text(x, "characteristic"), group == null ? null
                    : Exclusion.Group.valueOf(group.toUpperCase(java.util.Locale.ROOT)), text(x, "cell"),
                    text(x, "reason")));
        }
        // a record of schema 1 or 2 was computed with the methods of its time (the normal model for capability, the
        // F-test for a paired design's spread) and is re-computed so; schema 3 names older methods when it keeps them
        // schema 3 wrote no generation for its current one (3: individuals charts in the sequence column's order)
        int methods = version < 3 ? 2 : o.path("methods").asInt(version == 3 ? 3 : AnalysisSettings.METHODS);
        if (methods < 2 || methods > AnalysisSettings.METHODS) {
            throw new StudyFileException("%s: the settings name method generation %d, which this version does not know "
                    + "(2 to %d)", name, methods, AnalysisSettings.METHODS);
        }
        return new AnalysisSettings(o.path("alpha").asDouble(0.05), o.path("equalVariances").asBoolean(false),
                o.path("holm").asBoolean(false), readCriteria(o.path("defaults"), version, name, "defaults"), per,
                readCriteria(o.path("overrides"), version, name, "overrides"), ex, methods, readStability(o, name));
    }

    private static StabilityOptions readStability(JsonNode o, String name) {
        JsonNode st = o.path("stability");
        if (st.isMissingNode() || st.isNull()) {
            return StabilityOptions.DEFAULT;
        }
        List<Integer> tests = new ArrayList<>();
        for (JsonNode t : st.path("tests")) {
            tests.add(t.asInt());
        }
        try {
            return new StabilityOptions(st.path("rowOrderIsRunOrder").asBoolean(false),
                    new java.util.TreeSet<>(tests.isEmpty() ? List.of(1, 2, 3) : tests));
        } catch (org.holdpoint.stats.StatsException e) {
            throw new StudyFileException("%s: the control-chart settings are damaged (%s)", name, e.getMessage());
        }
    }

    /** The criteria in a settings file's spelling (one spelling everywhere, docs/settings-file.md). */
    private static ObjectNode criteria(CharacteristicSettings s) {
        return SettingsReader.toJson(s);
    }

    private static CharacteristicSettings readCriteria(JsonNode o, int version, String name, String entry) {
        if (o.isMissingNode() || o.isNull()) {
            return CharacteristicSettings.EMPTY;
        }
        if (version >= 2) {
            try {
                return SettingsReader.fromJson(name, entry, o);
            } catch (org.holdpoint.importer.ImportException e) {
                throw new StudyFileException("%s: the criteria are damaged (%s)", name, e.getMessage());
            }
        }
        // schema 1 wrote its own spelling (margin {kind, lower, upper}, sdGrowthLimit, capabilityRequirement)
        JsonNode m = o.path("margin");
        MarginSpec margin = m.isObject() ? new MarginSpec(MarginSpec.Kind.valueOf(m.get("kind").asText()),
                dbl(m, "lower"), dbl(m, "upper")) : null;
        return new CharacteristicSettings(text(o, "unit"), new SpecLimits(dbl(o, "lsl"), dbl(o, "nominal"),
                dbl(o, "usl")), margin, dbl(o, "sdGrowthLimit"), dbl(o, "capabilityRequirement"),
                o.hasNonNull("paired") ? o.get("paired").asBoolean() : null);
    }

    private static ObjectNode importReport(ImportReport r) {
        ObjectNode o = F.objectNode();
        o.put("valuesUsed", r.valuesUsed());
        ObjectNode counts = o.putObject("skipCounts");
        r.skipCounts().forEach((k, v) -> counts.put(k.name(), v));
        ArrayNode cells = o.putArray("firstSkipped");
        for (SkippedCell c : r.firstSkipped()) {
            ObjectNode x = cells.addObject();
            x.put("file", c.origin().file());
            x.put("sheet", c.origin().sheet());
            x.put("row", c.origin().row());
            x.put("column", c.origin().column());
            x.put("reason", c.reason().name());
            x.put("text", c.text());
        }
        ArrayNode msgs = o.putArray("messages");
        r.messages().forEach(msgs::add);
        // per characteristic, so that a re-computation flags the same characteristics with many unusable cells
        if (!r.usedPerCharacteristic().isEmpty() || !r.skippedPerCharacteristic().isEmpty()) {
            ObjectNode used = o.putObject("usedPerCharacteristic");
            r.usedPerCharacteristic().forEach(used::put);
            ObjectNode skipped = o.putObject("skippedPerCharacteristic");
            r.skippedPerCharacteristic().forEach(skipped::put);
        }
        return o;
    }

    private static ImportReport readImport(JsonNode o) {
        Map<SkipReason, Long> counts = new EnumMap<>(SkipReason.class);
        o.path("skipCounts").fields().forEachRemaining(e -> counts.put(SkipReason.valueOf(e.getKey()),
                e.getValue().asLong()));
        List<SkippedCell> cells = new ArrayList<>();
        for (JsonNode x : o.path("firstSkipped")) {
            cells.add(new SkippedCell(new Origin(text(x, "file"), text(x, "sheet"), x.path("row").asInt(),
                    x.path("column").asInt()), SkipReason.valueOf(x.get("reason").asText()), text(x, "text")));
        }
        List<String> msgs = new ArrayList<>();
        o.path("messages").forEach(m -> msgs.add(m.asText()));
        Map<String, Long> used = new java.util.LinkedHashMap<>();
        o.path("usedPerCharacteristic").fields().forEachRemaining(e -> used.put(e.getKey(), e.getValue().asLong()));
        Map<String, Long> skipped = new java.util.LinkedHashMap<>();
        o.path("skippedPerCharacteristic").fields().forEachRemaining(e -> skipped.put(e.getKey(),
                e.getValue().asLong()));
        return new ImportReport(o.path("valuesUsed").asLong(), counts, cells, msgs, used, skipped);
    }

    private static ObjectNode characteristic(CharacteristicData c) {
        ObjectNode o = F.objectNode();
        o.put("name", c.name());
        o.put("unit", c.unit());
        o.put("paired", c.paired());
        ArrayNode un = o.putArray("unmatchedUnits");
        c.unmatchedUnits().forEach(un::add);
        o.set("before", group(c.before()));
        o.set("after", group(c.after()));
        return o;
    }

    private static CharacteristicData readCharacteristic(JsonNode o) {
        List<String> unmatched = new ArrayList<>();
        o.path("unmatchedUnits").forEach(u -> unmatched.add(u.asText()));
        return new CharacteristicData(text(o, "name"), text(o, "unit"), readGroup(o.get("before")),
                readGroup(o.get("after")), o.path("paired").asBoolean(false), unmatched);
    }

    private static ObjectNode group(GroupData g) {
        ObjectNode o = F.objectNode();
        o.put("file", g.file());
        o.put("sheet", g.sheet());
        int n = g.size();
        // whether the values were read as exact decimals: a value such as 0.0005999999999999999 (more digits
        // than a long holds) is read as its double, whose shortest decimal 0.0006 would read back as exact
        o.put("exactDecimals", g.sample().hasExactDecimals());
        ArrayNode values = o.putArray("values");
        ArrayNode rows = o.putArray("rows");
        ArrayNode cols = o.putArray("columns");
        for (int i = 0; i < n; i++) {
            values.add(g.sample().decimal(i));
            Origin origin = g.origin(i);
            rows.add(origin.row());
            cols.add(origin.column());
        }
        strings(o, "units", g.hasUnits(), n, g::unit);
        strings(o, "lots", g.hasLots(), n, g::lot);
        strings(o, "subgroups", g.hasSubgroups(), n, g::subgroup);
        strings(o, "sequence", g.hasSequence(), n, g::sequence);
        return o;
    }

    private static void strings(ObjectNode o, String key, boolean present, int n,
            java.util.function.IntFunction<String> get) {
        if (!present) {
            return;
        }
        ArrayNode a = o.putArray(key);
        for (int i = 0; i < n; i++) {
            a.add(get.apply(i));
        }
    }

    private static GroupData readGroup(JsonNode o) {
        JsonNode values = o.get("values");
        int n = values.size();
        BigDecimal[] decimals = new BigDecimal[n];
        int[] rows = new int[n];
        int[] cols = new int[n];
        for (int i = 0; i < n; i++) {
            decimals[i] = values.get(i).decimalValue();
            rows[i] = o.path("rows").path(i).asInt(i + 1);
            cols[i] = o.path("columns").path(i).asInt(1);
        }
        Sample sample = Sample.ofDecimals(decimals);
        if (o.has("exactDecimals") && !o.get("exactDecimals").asBoolean() && sample.hasExactDecimals()) {
            double[] d = new double[n];
            for (int i = 0; i < n; i++) {
                d[i] = decimals[i].doubleValue();
            }
            sample = Sample.of(d);
        }
        return new GroupData(sample, text(o, "file"), text(o, "sheet"), rows, cols,
                readStrings(o, "units", n), readStrings(o, "lots", n), readStrings(o, "subgroups", n),
                readStrings(o, "sequence", n));
    }

    private static String[] readStrings(JsonNode o, String key, int n) {
        JsonNode a = o.get(key);
        if (a == null || !a.isArray()) {
            return null;
        }
        String[] r = new String[n];
        for (int i = 0; i < n; i++) {
            JsonNode v = a.get(i);
            r[i] = v == null || v.isNull() ? null : v.asText();
        }
        return r;
    }

    private static String text(JsonNode o, String key) {
        JsonNode v = o.get(key);
        return v == null || v.isNull() ? null : v.asText();
    }

    private static Double dbl(JsonNode o, String key) {
        JsonNode v = o.get(key);
        return v == null || v.isNull() ? null : v.asDouble();
    }
}
