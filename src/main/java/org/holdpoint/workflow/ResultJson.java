package org.holdpoint.workflow;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.util.List;
import java.util.Map;
import org.holdpoint.stats.Descriptives;
import org.holdpoint.stats.EquivalenceResult;
import org.holdpoint.stats.LeveneResult;
import org.holdpoint.stats.Quantiles;
import org.holdpoint.stats.SdGrowthResult;
import org.holdpoint.stats.TTestResult;
import org.holdpoint.stats.VarianceRatioResult;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.Cautions;
import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.ImportReport;
import org.holdpoint.study.InputInfo;
import org.holdpoint.study.SkipReason;
import org.holdpoint.study.SkippedCell;
import org.holdpoint.result.StudyResult;

/**
 * The machine-readable result of {@code holdpoint analyze --json}: the contract described in the README
 * ("Outputs"). A block that does not apply is absent; an undefined value is null,
 * never 0 or NaN; numbers carry full double precision (shortest round-trip text).
 */
public final class ResultJson {
    private static final JsonNodeFactory F = JsonNodeFactory.instance;
    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private ResultJson() {
    }

    /**
     * The whole result as a JSON tree.
     *
     * @param data     the imported data
     * @param settings the settings used
     * @param result   the analysis
     * @return the JSON object
     */
    public static ObjectNode of(Dataset data, AnalysisSettings settings, StudyResult result) {
        ObjectNode root = F.objectNode();
        ObjectNode tool = root.putObject("tool");
        tool.put("name", "holdpoint");
        tool.put("version", Version.get());
        root.set("input", input(data.inputs()));
        root.set("settings", settings(settings));
        root.set("import", importBlock(data.report()));
        ArrayNode list = root.putArray("characteristics");
        for (CharacteristicResult r : result.characteristics()) {
            list.add(characteristic(r));
        }
        ObjectNode verdict = root.putObject("verdict");
        verdict.put("changeVerified", result.changeVerified());
        verdict.put("summary", result.summary());
        ArrayNode failing = verdict.putArray("failing");
        result.failing().forEach(failing::add);
        ArrayNode exclusions = root.putArray("exclusions");
        // exactly what was left out: one entry per value, with its file, sheet, cell and value
        for (Exclusions.Hit h : Exclusions.hits(data, settings.exclusions())) {
            ObjectNode o = exclusions.addObject();
            o.put("characteristic", h.characteristic());
            o.put("group", h.before() ? "before" : "after");
            o.put("file", h.origin().file());
            o.put("sheet", h.origin().sheet());
            o.put("cell", h.origin().cell());
            o.put("value", h.value());
            o.put("reason", h.exclusion().reason());
        }
        ArrayNode cautions = root.putArray("cautions");
        Cautions.TEXT.forEach(cautions::add);
        return root;
    }

    /**
     * Serialises a tree with indentation.
     *
     * @param node the tree
     * @return the JSON text
     */
    public static String text(ObjectNode node) {
        try {
            return MAPPER.writeValueAsString(node) + System.lineSeparator();
        } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
            throw new IllegalStateException("JSON serialisation failed", e);
        }
    }

    private static ObjectNode input(List<InputInfo> inputs) {
        ObjectNode in = F.objectNode();
        if (inputs.size() == 1) {
            fillInput(in, inputs.get(0));
            return in;
        }
        in.putNull("file");
        in.putNull("sha256");
        in.putNull("sheet");
        in.put("layout", org.holdpoint.study.Layout.SEPARATE.words());
        for (InputInfo i : inputs) {
            fillInput(in.putObject(i.role()), i);
        }
        return in;
    }

    private static void fillInput(ObjectNode n, InputInfo i) {
        n.put("file", i.file());
        n.put("sha256", i.sha256());
        n.put("sheet", i.sheet());
        n.put("layout", i.layout() == null ? null : i.layout().words());
    }

    private static ObjectNode settings(AnalysisSettings s) {
        ObjectNode n = F.objectNode();
        n.put("alpha", s.alpha());
        n.put("equalVariances", s.equalVariances());
        n.put("holm", s.holm());
        n.put("difference", "after - before");
        n.put("varianceRatio", "var(after) / var(before)");
        n.put("differenceInterval", 1 - s.alpha());
        n.put("equivalenceInterval", 1 - 2 * s.alpha());
        n.put("quantiles", Quantiles.METHOD);
        ArrayNode ex = n.putArray("exclusions");
        s.exclusions().forEach(e -> {
            ObjectNode o = ex.addObject();
            o.put("characteristic", e.characteristic());
            o.put("cell", e.reference());
            o.put("reason", e.reason());
        });
        return n;
    }

    private static ObjectNode importBlock(ImportReport report) {
        ObjectNode n = F.objectNode();
        n.put("valuesUsed", report.valuesUsed());
        n.put("cellsSkipped", report.skippedTotal());
        ObjectNode counts = n.putObject("skippedByReason");
        for (Map.Entry<SkipReason, Long> e : report.skipCounts().entrySet()) {
            counts.put(e.getKey().words(), e.getValue());
        }
        ArrayNode problems = n.putArray("problems");
        int k = 0;
        for (SkippedCell c : report.firstSkipped()) {
            if (k++ >= ImportReport.MAX_LISTED) {
                break;
            }
            ObjectNode p = problems.addObject();
            p.put("file", c.origin().file());
            p.put("sheet", c.origin().sheet());
            p.put("cell", c.origin().cell());
            p.put("reason", c.reason().words());
            p.put("text", c.text());
        }
        ArrayNode messages = n.putArray("messages");
        report.messages().forEach(messages::add);
        return n;
    }

    static ObjectNode characteristic(CharacteristicResult r) {
        ObjectNode n = F.objectNode();
        n.put("name", r.name());
        n.put("unit", r.unit());
        n.put("design", r.paired() ? "paired" : "independent");
        n.put("method", r.method().description());
        n.set("criteria", criteria(r.settings(), r));
        n.set("before", descriptives(r.before()));
        n.set("after", descriptives(r.after()));
        putIf(n, "welch", r.welch());
        putIf(n, "pooled", r.pooled());
        putIf(n, "paired", r.pairedTest());
        putIf(n, "tost", r.tost());
        putIf(n, "tostPooled", r.tostPooled());
        if (r.variance() != null) {
            n.set("variance", variance(r.variance()));
        }
        if (r.levene() != null) {
            n.set("levene", levene(r.levene()));
        }
        if (r.sdGrowth() != null) {
            n.set("sdGrowth", sdGrowth(r.sdGrowth()));
        }
        if (r.holmP() != null) {
            num(n, "holmP", r.holmP());
        }
        ChecksJson.put(n, r.checks());
        ObjectNode v = n.putObject("verdict");
        v.put("status", r.verdict().status().words());
        v.put("passed", r.verdict().status() == org.holdpoint.result.Verdict.Status.PASSED);
        ArrayNode reasons = v.putArray("reasons");
        r.verdict().reasons().forEach(reasons::add);
        ArrayNode notes = n.putArray("notes");
        r.notes().forEach(notes::add);
        return n;
    }

    private static ObjectNode criteria(CharacteristicSettings s, CharacteristicResult r) {
        ObjectNode n = F.objectNode();
        numOrNull(n, "lsl", s.spec().lsl());
        numOrNull(n, "nominal", s.spec().nominal());
        numOrNull(n, "usl", s.spec().usl());
        if (s.margin() != null) {
            ObjectNode m = n.putObject("margin");
            m.put("entered", switch (s.margin().kind()) {
                case ABSOLUTE -> "units";
                case PERCENT_OF_TOLERANCE -> "percent of tolerance";
                case PERCENT_OF_UPPER_LIMIT -> "percent of the USL";
                case RATIO -> "ratio after/before";
            });
            m.put("description", s.margin().describe());
            numOrNull(m, "lower", r.margin().lower());
            numOrNull(m, "upper", r.margin().upper());
        } else {
            n.putNull("margin");
        }
        numOrNull(n, "sd_growth_limit", s.sdGrowthLimit());
        numOrNull(n, "capability_min", s.capabilityRequirement());
        return n;
    }

    private static void putIf(ObjectNode n, String key, TTestResult t) {
        if (t == null) {
            return;
        }
        ObjectNode o = n.putObject(key);
        num(o, "t", t.t());
        num(o, "df", t.df());
        num(o, "p", t.p());
        num(o, "estimate", t.estimate());
        num(o, "ciLower", t.ciLower());
        num(o, "ciUpper", t.ciUpper());
        num(o, "confidenceLevel", t.confidenceLevel());
        o.put("method", t.method().description());
    }

    private static void putIf(ObjectNode n, String key, EquivalenceResult e) {
        if (e == null) {
            return;
        }
        ObjectNode o = n.putObject(key);
        if (e.ratio()) {
            // estimate, interval and margins are ratios after/before; df and p those of the test on the logarithms
            o.put("scale", "ratio");
        }
        numOrNull(o, "lowerMargin", e.lowerMargin());
        numOrNull(o, "upperMargin", e.upperMargin());
        num(o, "estimate", e.estimate());
        num(o, "df", e.df());
        numOrNull(o, "pLower", e.pLower());
        numOrNull(o, "pUpper", e.pUpper());
        num(o, "p", e.p());
        num(o, "ciLower", e.ciLower());
        num(o, "ciUpper", e.ciUpper());
        num(o, "level", e.level());
        o.put("equivalent", e.equivalent());
        o.put("conclusion", e.conclusion().words());
        o.put("method", e.method().description());
    }

    private static ObjectNode descriptives(Descriptives d) {
        ObjectNode o = F.objectNode();
        if (d == null) {
            // a group without a usable value (a characteristic that is not assessable)
            o.put("n", 0);
            for (String k : new String[] {"mean", "sd", "median", "min", "max"}) {
                o.putNull(k);
            }
            return o;
        }
        o.put("n", d.n());
        num(o, "mean", d.mean());
        num(o, "sd", d.sd());
        num(o, "median", d.median());
        num(o, "min", d.min());
        num(o, "max", d.max());
        return o;
    }

    private static ObjectNode variance(VarianceRatioResult v) {
        ObjectNode o = F.objectNode();
        num(o, "ratio", v.ratio());
        num(o, "f", v.f());
        num(o, "df1", v.df1());
        num(o, "df2", v.df2());
        num(o, "p", v.p());
        num(o, "ciLower", v.ciLower());
        num(o, "ciUpper", v.ciUpper());
        num(o, "confidenceLevel", v.confidenceLevel());
        o.put("method", v.method().words());
        if (v.r() != null) {
            num(o, "sumDifferenceCorrelation", v.r());
            num(o, "t", v.t());
        }
        return o;
    }

    private static ObjectNode levene(LeveneResult l) {
        ObjectNode o = F.objectNode();
        num(o, "f", l.f());
        num(o, "df1", l.df1());
        num(o, "df2", l.df2());
        num(o, "p", l.p());
        o.put("method", "Brown-Forsythe (Levene on absolute deviations from group medians)");
        return o;
    }

    private static ObjectNode sdGrowth(SdGrowthResult g) {
        ObjectNode o = F.objectNode();
        num(o, "limit", g.limit());
        num(o, "sdRatio", g.sdRatio());
        num(o, "upperBound", g.upperBound());
        num(o, "p", g.p());
        num(o, "level", g.level());
        o.put("met", g.met());
        o.put("method", g.method().words());
        return o;
    }

    /** Puts a number, or null when it is NaN or infinite. */
    static void num(ObjectNode o, String key, double v) {
        if (Double.isFinite(v)) {
            o.put(key, v);
        } else {
            o.putNull(key);
        }
    }

    /** Adds a number to an array, or null when it is NaN or infinite. */
    static void addNum(com.fasterxml.jackson.databind.node.ArrayNode a, double v) {
        if (Double.isFinite(v)) {
            a.add(v);
        } else {
            a.addNull();
        }
    }

    static void numOrNull(ObjectNode o, String key, Double v) {
        if (v == null) {
            o.putNull(key);
        } else {
            num(o, key, v);
        }
    }
}
