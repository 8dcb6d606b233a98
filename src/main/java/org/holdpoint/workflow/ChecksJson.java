package org.holdpoint.workflow;

import java.util.List;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.holdpoint.stats.ControlChart;
import org.holdpoint.stats.CapabilityResult;
import org.holdpoint.stats.FamilySelection;
import org.holdpoint.stats.PercentileCapabilityResult;
import org.holdpoint.stats.EsdResult;
import org.holdpoint.stats.GrubbsResult;
import org.holdpoint.stats.NormalityResult;
import org.holdpoint.stats.RankEquivalence;
import org.holdpoint.stats.RankInterval;
import org.holdpoint.stats.RankSumResult;
import org.holdpoint.stats.SignedRankResult;
import org.holdpoint.result.AssumptionChecks;
import org.holdpoint.result.FlaggedValue;
import org.holdpoint.result.GroupChecks;

/** The JSON blocks of the further checks: rankSum, signedRank, normality, capability, outliers, order. */
final class ChecksJson {
    private static final JsonNodeFactory F = JsonNodeFactory.instance;

    private ChecksJson() {
    }

    static void put(ObjectNode n, AssumptionChecks c) {
        if (c == null) {
            return;
        }
        if (c.rankSum() != null) {
            n.set("rankSum", rankSum(c.rankSum()));
        }
        if (c.signedRank() != null) {
            n.set("signedRank", signedRank(c.signedRank()));
        }
        ObjectNode normality = n.putObject("normality");
        normality.set("before", normality(c.before().normality()));
        normality.set("after", normality(c.after().normality()));
        if (c.before().hasCapability() || c.after().hasCapability()) {
            ObjectNode cap = n.putObject("capability");
            cap.set("before", capability(c.before()));
            cap.set("after", capability(c.after()));
            if (c.capabilityMet() != null) {
                cap.put("requirementMet", c.capabilityMet());
            }
            if (c.distribution() != null) {
                cap.set("model", model(c.distribution()));
            }
        }
        ObjectNode outliers = n.putObject("outliers");
        outliers.set("before", outliers(c.before()));
        outliers.set("after", outliers(c.after()));
        if (c.before().lag1() != null || c.after().lag1() != null || c.before().lots() != null) {
            ObjectNode order = n.putObject("independence");
            order.set("before", order(c.before()));
            order.set("after", order(c.after()));
        }
        n.put("recommendation", c.recommendation());
        if (c.before().tolerance() != null || c.after().tolerance() != null) {
            ObjectNode ti = n.putObject("toleranceInterval");
            ti.set("before", tolerance(c.before().tolerance()));
            ti.set("after", tolerance(c.after().tolerance()));
        }
        if (c.stability() != null) {
            ObjectNode st = n.putObject("stability");
            st.put("runOrder", c.stability().runOrder());
            var tests = c.stability().tests();
            st.set("before", phase(c.stability().before(), c.stability().beforeOrigins(), false, tests));
            st.set("after", phase(c.stability().after(), c.stability().afterOrigins(), true, tests));
        }
    }

    private static ObjectNode phase(ControlChart.Phase p, List<String> origins, boolean after,
            java.util.SortedSet<Integer> tests) {
        ObjectNode o = F.objectNode();
        // the limits the phase is judged against: the before phase's own for both phases
        limits(o, after ? p.limits() : p.own());
        o.put("method", p.limits().kind().words() + " (ISO 7870-2), limits from the before phase");
        o.put("points", p.points());
        ArrayNode t = o.putArray("tests");
        tests.forEach(t::add);
        if (after) {
            limits(o.putObject("own"), p.own());
        }
        ArrayNode signals = o.putArray("signals");
        for (ControlChart.Signal sig : p.signals()) {
            ObjectNode x = signals.addObject();
            x.put("test", sig.test());
            x.put("chart", sig.chart() == ControlChart.Chart.SPREAD ? "sd"
                    : p.limits().kind() == ControlChart.Kind.MEANS ? "means" : "individuals");
            x.put("index", sig.index());
            x.put("origin", origins.get(sig.index() - 1));
        }
        return o;
    }

    private static com.fasterxml.jackson.databind.JsonNode tolerance(org.holdpoint.stats.ToleranceInterval t) {
        if (t == null) {
            return F.nullNode();
        }
        ObjectNode o = F.objectNode();
        o.put("coverage", t.coverage());
        o.put("confidence", t.confidence());
        o.put("sides", t.sides().key());
        ResultJson.numOrNull(o, "k", t.k());
        ResultJson.numOrNull(o, "lower", t.lower());
        ResultJson.numOrNull(o, "upper", t.upper());
        o.put("method", t.method().key());
        ResultJson.num(o, "achievedConfidence", t.achievedConfidence());
        o.put("n", t.n());
        return o;
    }

    private static void limits(ObjectNode o, ControlChart.Limits l) {
        ResultJson.num(o, "center", l.center());
        ResultJson.num(o, "sigma", l.sigma());
        ResultJson.num(o, "lcl", l.lcl());
        ResultJson.num(o, "ucl", l.ucl());
        if (l.kind() == ControlChart.Kind.MEANS) {
            // the limits above are those of a subgroup of the most frequent size; other sizes have their own
            o.put("subgroupSize", l.size());
            ResultJson.num(o, "sdCenter", l.spreadCenter());
            ResultJson.num(o, "sdLcl", l.spreadLcl());
            ResultJson.num(o, "sdUcl", l.spreadUcl());
        } else {
            ResultJson.num(o, "mrBar", l.mrBar());
            ResultJson.num(o, "mrUcl", l.mrUcl());
        }
    }

    private static ObjectNode rankSum(RankSumResult r) {
        ObjectNode o = F.objectNode();
        ResultJson.num(o, "u", r.u());
        ResultJson.numOrNull(o, "p", r.p());
        ResultJson.num(o, "shift", r.shift());
        interval(o, r.ci());
        o.put("method", r.method().name().toLowerCase(java.util.Locale.ROOT));
        equivalence(o, r.equivalence());
        return o;
    }

    private static ObjectNode signedRank(SignedRankResult r) {
        ObjectNode o = F.objectNode();
        ResultJson.num(o, "v", r.v());
        ResultJson.numOrNull(o, "p", r.p());
        ResultJson.num(o, "shift", r.shift());
        interval(o, r.ci());
        o.put("method", r.method().name().toLowerCase(java.util.Locale.ROOT));
        o.put("zeros", r.zeros());
        equivalence(o, r.equivalence());
        return o;
    }

    private static void interval(ObjectNode o, RankInterval ci) {
        ResultJson.num(o, "ciLower", ci.lower());
        ResultJson.num(o, "ciUpper", ci.upper());
        ResultJson.num(o, "level", ci.requestedLevel());
        ResultJson.num(o, "achievedLevel", ci.achievedLevel());
        o.put("levelReached", ci.levelReached());
    }

    private static void equivalence(ObjectNode o, RankEquivalence e) {
        if (e == null) {
            return;
        }
        ObjectNode q = o.putObject("equivalence");
        ResultJson.numOrNull(q, "lowerMargin", e.margin().lower());
        ResultJson.numOrNull(q, "upperMargin", e.margin().upper());
        interval(q, e.interval());
        q.put("equivalent", e.equivalent());
        q.put("conclusion", e.conclusion().words());
    }

    private static ObjectNode normality(NormalityResult r) {
        ObjectNode o = F.objectNode();
        if (r.shapiro() != null) {
            ResultJson.num(o, "shapiroW", r.shapiro().w());
            ResultJson.num(o, "shapiroP", r.shapiro().p());
        }
        if (r.anderson() != null) {
            ResultJson.num(o, "andersonA2", r.anderson().a2());
            ResultJson.num(o, "andersonP", r.anderson().p());
        }
        return o;
    }

    private static ObjectNode model(FamilySelection m) {
        ObjectNode o = F.objectNode();
        o.put("distribution", m.chosen().key());
        o.put("chosenBy", m.automatic() ? "aic" : "setting or rule");
        o.put("reason", m.reason());
        ArrayNode candidates = o.putArray("candidates");
        for (FamilySelection.Candidate c : m.candidates()) {
            ObjectNode x = candidates.addObject();
            x.put("distribution", c.family().key());
            ResultJson.numOrNull(x, "aic", c.aic());
            ArrayNode ad = x.putArray("andersonDarling");
            c.ad().forEach(v -> ResultJson.addNum(ad, v));
            x.put("notFitted", c.refusal());
        }
        return o;
    }

    private static ObjectNode capability(GroupChecks g) {
        if (g.percentile() != null) {
            return percentile(g.percentile());
        }
        CapabilityResult c = g.capability();
        ObjectNode o = F.objectNode();
        if (c == null) {
            return o;
        }
        o.put("method", "normal");
        o.put("distribution", "normal");
        ObjectNode p = o.putObject("parameters");
        ResultJson.num(p, "mean", c.mean());
        ResultJson.num(p, "sd", c.sd());
        // the normal model's indices rest on x̄ ± 3s: those are its "quantiles"
        quantilesAndIndices(o, c.mean() - 3 * c.sd(), c.mean(), c.mean() + 3 * c.sd(), c.pp(), c.ppk(), c.ppkLower());
        ResultJson.numOrNull(o, "ppLower", c.ppLower());
        ResultJson.numOrNull(o, "cp", c.cp());
        ResultJson.numOrNull(o, "cpk", c.cpk());
        ResultJson.numOrNull(o, "cpkLower", c.cpkLower());
        ResultJson.numOrNull(o, "ppmBelow", c.ppmBelow());
        ResultJson.numOrNull(o, "ppmAbove", c.ppmAbove());
        o.put("withinEstimator", c.estimator() == null ? null : c.estimator().description());
        ResultJson.num(o, "level", 1 - c.alpha());
        return o;
    }

    /** The three points the indices rest on and the overall indices, in the order of the JSON contract. */
    private static void quantilesAndIndices(ObjectNode o, double x00135, double x50, double x99865, Double pp, Double ppk,
            Double ppkLower) {
        ResultJson.num(o, "x00135", x00135);
        ResultJson.num(o, "x50", x50);
        ResultJson.num(o, "x99865", x99865);
        ResultJson.numOrNull(o, "pp", pp);
        ResultJson.numOrNull(o, "ppk", ppk);
        ResultJson.numOrNull(o, "ppkLower", ppkLower);
    }

    private static ObjectNode percentile(PercentileCapabilityResult c) {
        ObjectNode o = F.objectNode();
        o.put("method", "percentile");
        o.put("distribution", c.fit().family().key());
        ObjectNode p = o.putObject("parameters");
        c.fit().parameters().forEach((k, v) -> ResultJson.num(p, k, v));
        quantilesAndIndices(o, c.x00135(), c.x50(), c.x99865(), c.pp(), c.ppk(), c.ppkLower());
        ResultJson.numOrNull(o, "ppmBelow", c.ppmBelow());
        ResultJson.numOrNull(o, "ppmAbove", c.ppmAbove());
        ResultJson.num(o, "level", 1 - c.alpha());
        ObjectNode b = o.putObject("bootstrap");
        b.put("seed", c.seed());
        b.put("resamples", c.resamples());
        b.put("bound", "Ppk - z(1-alpha) * sd of the resampled Ppk");
        return o;
    }

    private static ObjectNode outliers(GroupChecks g) {
        ObjectNode o = F.objectNode();
        o.put("testedOn", g.outliersOn());
        GrubbsResult gr = g.grubbs();
        if (gr != null) {
            ObjectNode x = o.putObject("grubbs");
            ResultJson.num(x, "g", gr.g());
            ResultJson.num(x, "critical", gr.critical());
            ResultJson.num(x, "p", gr.p());
            ResultJson.num(x, "value", gr.value());
            x.put("outlier", gr.outlier());
        }
        EsdResult esd = g.esd();
        if (esd != null) {
            ObjectNode x = o.putObject("esd");
            x.put("maxTested", esd.maxTests());
            x.put("count", esd.count());
        }
        ArrayNode flagged = o.putArray("flagged");
        for (FlaggedValue f : g.flagged()) {
            ObjectNode x = flagged.addObject();
            ResultJson.num(x, "value", f.value());
            x.put("file", f.origin().file());
            x.put("sheet", f.origin().sheet());
            x.put("cell", f.origin().cell());
            x.put("test", f.test());
        }
        return o;
    }

    private static ObjectNode order(GroupChecks g) {
        ObjectNode o = F.objectNode();
        if (g.lag1() != null) {
            ResultJson.num(o, "lag1", g.lag1().r1());
            ResultJson.num(o, "lag1P", g.lag1().pRefined());
        }
        if (g.runs() != null) {
            o.put("runs", g.runs().runs());
            ResultJson.num(o, "runsExpected", g.runs().expected());
            ResultJson.num(o, "runsP", g.runs().p());
        }
        if (g.lots() != null) {
            o.put("lots", g.lots());
        }
        return o;
    }
}
