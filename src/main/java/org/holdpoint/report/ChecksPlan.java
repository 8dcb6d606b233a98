package org.holdpoint.report;

import java.util.ArrayList;
import java.util.List;
import org.holdpoint.stats.CapabilityResult;
import org.holdpoint.stats.PercentileCapabilityResult;
import org.holdpoint.stats.NormalityResult;
import org.holdpoint.stats.RankEquivalence;
import org.holdpoint.stats.RankInterval;
import org.holdpoint.stats.RankMethod;
import org.holdpoint.stats.RankSumResult;
import org.holdpoint.stats.SignedRankResult;
import org.holdpoint.result.AssumptionChecks;
import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.result.FlaggedValue;
import org.holdpoint.result.GroupChecks;

/**
 * The second page of a characteristic's detail section: shape and outliers (Shapiro–Wilk, Anderson–Darling,
 * flagged values with their cells), the distribution-free comparison (Wilcoxon–Mann–Whitney or signed rank with
 * the Hodges–Lehmann shift), capability against the specification limits and the recommendation line. An
 * undefined value is an empty cell and the notes of the page say why.
 */
final class ChecksPlan {
    private static final float ROW = DetailPlan.ROW;
    private final WorkbookPlan plan;
    private final SheetContent s;
    private final int c0;

    ChecksPlan(WorkbookPlan plan, SheetContent sheet, int firstColumn) {
        this.plan = plan;
        this.s = sheet;
        this.c0 = firstColumn;
    }

    /**
     * Lays out the page.
     *
     * @param r     the first row
     * @param index the characteristic's number
     * @param c     the result
     * @return the first row after the page
     */
    int section(int r, int index, CharacteristicResult c) {
        String n = c.name();
        int d = WorkbookPlan.statDecimals(plan.data(n));
        for (int i = 0; i < 36; i++) {
            s.height(r + i, ROW);
        }
        s.text(r, c0, index + ". " + n + ": shape, distribution-free comparison and capability", Style.HEADING,
                n + ": checks title");
        s.merge(r, r, c0, c0 + 5);
        s.height(r, 20f);
        AssumptionChecks k = c.checks();
        if (k == null) {
            s.text(r + 2, c0, "These checks were not computed for this characteristic.", Style.WRAP,
                    n + ": checks absent");
            s.merge(r + 2, r + 2, c0, c0 + 5);
            return r + 4;
        }
        List<String> notes = new ArrayList<>();
        for (String x : c.notes()) {
            String l = x.toLowerCase(java.util.Locale.ROOT);
            if (l.contains("outlier") || l.contains("order checks") || l.contains("independence")
                    || l.contains("single lot") || l.contains("capability not computed")) {
                notes.add(x);
            }
        }
        int row = shape(r + 2, n, k, notes);
        rank(r + 2, n, k, d, notes);
        row = Math.max(row, r + 15) + 1;
        row = capability(row, n, c, k, d, notes);
        if (c.settings().tolerance() != null) {
            row = toleranceInterval(row, n, c, k, d);
        }
        s.text(row, c0, "Recommendation", Style.HEADER, n + ": recommendation header");
        s.merge(row, row, c0, c0 + 5);
        String rec = k.recommendation() == null ? "none" : k.recommendation();
        s.text(row + 1, c0, rec, Style.WRAP, n + ": recommendation");
        s.merge(row + 1, row + 1, c0, c0 + 5);
        s.height(row + 1, DetailPlan.lines(rec, 110) * 12f + 4);
        s.text(row + 3, c0, "Notes on these checks", Style.HEADER, n + ": checks notes header");
        s.merge(row + 3, row + 3, c0, c0 + 5);
        String text = notes.isEmpty() ? "none" : String.join("\n", notes);
        s.text(row + 4, c0, text, Style.WRAP, n + ": checks notes");
        s.merge(row + 4, row + 4, c0, c0 + 5);
        s.height(row + 4, DetailPlan.lines(text, 110) * 12f + 4);
        return row + 6;
    }

    private int shape(int r, String n, AssumptionChecks k, List<String> notes) {
        s.text(r, c0, "Shape and outliers", Style.HEADER, n + ": shape header");
        s.text(r, c0 + 1, "Before", Style.HEADER, n + ": shape before header");
        s.text(r, c0 + 2, "After", Style.HEADER, n + ": shape after header");
        NormalityResult b = k.before().normality();
        NormalityResult a = k.after().normality();
        addNotes(notes, "before", b == null ? List.of() : b.notes());
        addNotes(notes, "after", a == null ? List.of() : a.notes());
        row(r + 1, "Shapiro\u2013Wilk W", b == null ? null : b.shapiroW(), a == null ? null : a.shapiroW(),
                Style.NUMBER, 4, n + ": Shapiro-Wilk W");
        row(r + 2, "Shapiro\u2013Wilk p", b == null ? null : b.shapiroP(), a == null ? null : a.shapiroP(),
                Style.P_VALUE, 0, n + ": Shapiro-Wilk p");
        row(r + 3, "Anderson\u2013Darling A\u00b2 (unadjusted)", b == null ? null : b.andersonA2(),
                a == null ? null : a.andersonA2(), Style.NUMBER, 4, n + ": Anderson-Darling A2");
        row(r + 4, "Anderson\u2013Darling p", b == null ? null : b.andersonP(), a == null ? null : a.andersonP(),
                Style.P_VALUE, 0, n + ": Anderson-Darling p");
        row(r + 5, "Values flagged as possible outliers", (double) k.before().flagged().size(),
                (double) k.after().flagged().size(), Style.INTEGER, 0, n + ": flagged count");
        s.text(r + 6, c0, "Flagged values (never dropped)", Style.HEADER, n + ": flagged header");
        s.text(r + 6, c0 + 1, "", Style.HEADER, n + ": flagged header");
        s.text(r + 6, c0 + 2, "", Style.HEADER, n + ": flagged header");
        s.merge(r + 6, r + 6, c0 + 1, c0 + 2);
        int row = r + 7;
        row = flagged(row, n, "before", k.before());
        row = flagged(row, n, "after", k.after());
        GroupChecks gb = k.before();
        GroupChecks ga = k.after();
        if (gb.lag1() != null || ga.lag1() != null || gb.runs() != null || ga.runs() != null) {
            row(row++, "Lag-1 autocorrelation (run order)", gb.lag1() == null ? null : gb.lag1().r1(),
                    ga.lag1() == null ? null : ga.lag1().r1(), Style.NUMBER, 4, n + ": lag-1 autocorrelation");
            row(row++, "Lag-1 p (approximate)", gb.lag1() == null ? null : gb.lag1().pRefined(),
                    ga.lag1() == null ? null : ga.lag1().pRefined(), Style.P_VALUE, 0, n + ": lag-1 p");
            row(row++, "Runs about the median", gb.runs() == null ? null : (double) gb.runs().runs(),
                    ga.runs() == null ? null : (double) ga.runs().runs(), Style.INTEGER, 0, n + ": runs");
            row(row++, "Runs test p", gb.runs() == null ? null : gb.runs().p(),
                    ga.runs() == null ? null : ga.runs().p(), Style.P_VALUE, 0, n + ": runs p");
        }
        if (gb.lots() != null || ga.lots() != null) {
            row(row++, "Lots", gb.lots() == null ? null : (double) gb.lots(),
                    ga.lots() == null ? null : (double) ga.lots(), Style.INTEGER, 0, n + ": lots");
        }
        return row;
    }

    private int flagged(int row, String n, String group, GroupChecks g) {
        List<String> lines = new ArrayList<>();
        for (FlaggedValue f : g.flagged()) {
            lines.add(Texts.num(f.value()) + " at " + (f.origin() == null ? "unknown cell" : f.origin().describe())
                    + "; " + f.test());
        }
        String text = lines.isEmpty() ? "none" : String.join("\n", lines);
        s.text(row, c0, group.substring(0, 1).toUpperCase(java.util.Locale.ROOT) + group.substring(1), Style.LABEL,
                n + ": flagged " + group + " label");
        s.text(row, c0 + 1, text, Style.CELL_WRAP, n + ": flagged " + group);
        s.text(row, c0 + 2, "", Style.CELL_WRAP, n + ": flagged " + group);
        s.merge(row, row, c0 + 1, c0 + 2);
        s.height(row, DetailPlan.lines(text, 28) * 12f + 4);
        return row + 1;
    }

    private void rank(int r, String n, AssumptionChecks k, int d, List<String> notes) {
        int col = c0 + 4;
        s.text(r, col, "Distribution-free comparison", Style.HEADER, n + ": rank header");
        s.text(r, col + 1, "", Style.HEADER, n + ": rank header");
        RankSumResult rs = k.rankSum();
        SignedRankResult sr = k.signedRank();
        if (rs == null && sr == null) {
            pairText(r + 1, col, "Test", "not computed (see the notes)", n + ": rank test");
            notes.add("Distribution-free comparison: not computed for these samples.");
            return;
        }
        boolean paired = rs == null;
        pairText(r + 1, col, paired ? "Test (Wilcoxon, paired)" : "Test (Wilcoxon\u2013Mann\u2013Whitney)",
                paired ? "signed rank" : "rank sum", n + ": rank test");
        pair(r + 2, col, paired ? "V (sum of positive ranks)" : "U of the after sample",
                paired ? sr.v() : rs.u(), Style.NUMBER, 1, n + (paired ? ": V" : ": U"));
        Double p = paired ? sr.p() : rs.p();
        pair(r + 3, col, "p (two-sided)", p, Style.P_VALUE, 0, n + ": rank p");
        RankMethod m = paired ? sr.method() : rs.method();
        pairText(r + 4, col, "Method of p and interval", m == RankMethod.NORMAL ? "normal approx." : m.word(),
                n + ": rank method");
        if (m == RankMethod.NORMAL) {
            notes.add("Rank comparison: p and interval from the normal approximation with tie and continuity "
                    + "corrections (exact only for small samples without ties).");
        }
        pair(r + 5, col, "Hodges\u2013Lehmann shift", paired ? sr.shift() : rs.shift(), Style.NUMBER, d,
                n + ": Hodges-Lehmann shift");
        RankInterval ci = paired ? sr.ci() : rs.ci();
        String lvl = Texts.percent(ci.requestedLevel());
        pair(r + 6, col, lvl + " CI of the shift, lower", ci.lower(), Style.NUMBER, d, n + ": shift CI lower");
        pair(r + 7, col, lvl + " CI of the shift, upper", ci.upper(), Style.NUMBER, d, n + ": shift CI upper");
        pair(r + 8, col, "Level achieved", ci.achievedLevel(), Style.NUMBER, 4, n + ": shift CI level achieved");
        RankEquivalence e = paired ? sr.equivalence() : rs.equivalence();
        addNotes(notes, "rank comparison", paired ? sr.notes() : rs.notes());
        if (p == null) {
            notes.add("Rank comparison: p is undefined for these samples (all values equal).");
        }
        if (e == null) {
            pairText(r + 9, col, "Rank-based equivalence", "not assessed", n + ": rank equivalence conclusion");
            notes.add("Rank-based equivalence: not assessed, no margin set.");
            return;
        }
        pairText(r + 9, col, "Rank-based equivalence", e.conclusion().words(), n + ": rank equivalence conclusion");
        String el = Texts.percent(e.interval().requestedLevel());
        pair(r + 10, col, el + " interval, lower", e.interval().lower(), Style.NUMBER, d,
                n + ": rank equivalence CI lower");
        pair(r + 11, col, el + " interval, upper", e.interval().upper(), Style.NUMBER, d,
                n + ": rank equivalence CI upper");
        pair(r + 12, col, "Level achieved", e.interval().achievedLevel(), Style.NUMBER, 4,
                n + ": rank equivalence level achieved");
        if (!e.interval().levelReached()) {
            notes.add("Rank-based equivalence: the " + el + " level cannot be reached with these sample sizes, "
                    + "so no claim is made.");
        }
    }

    /**
     * The tolerance interval block (docs/methods.md §17), only when the criteria ask for one: the sentence that
     * decides, then the interval of each group, its method, factor and the confidence it reaches.
     */
    private int toleranceInterval(int r, String n, CharacteristicResult c, AssumptionChecks k, int d) {
        var t = c.settings().tolerance();
        var b = k.before().tolerance();
        var a = k.after().tolerance();
        s.text(r, c0, "Tolerance interval, " + t.words(), Style.HEADER, n + ": tolerance interval header");
        s.text(r, c0 + 1, "Before", Style.HEADER, n + ": tolerance interval before header");
        s.text(r, c0 + 2, "After", Style.HEADER, n + ": tolerance interval after header");
        row(r + 1, "Lower end", b == null ? null : b.lower(), a == null ? null : a.lower(), Style.NUMBER, d,
                n + ": tolerance interval lower");
        row(r + 2, "Upper end", b == null ? null : b.upper(), a == null ? null : a.upper(), Style.NUMBER, d,
                n + ": tolerance interval upper");
        row(r + 3, "Factor k", b == null ? null : b.k(), a == null ? null : a.k(), Style.NUMBER, 4,
                n + ": tolerance interval k");
        row(r + 4, "Confidence reached", b == null ? null : b.achievedConfidence(),
                a == null ? null : a.achievedConfidence(), Style.NUMBER, 4, n + ": tolerance interval confidence");
        var any = a != null ? a : b;
        s.text(r + 5, c0, "Method", Style.LABEL, n + ": tolerance interval method label");
        s.text(r + 5, c0 + 1, any == null ? "not computed (see the notes)" : any.method().words() + ", "
                + any.sides().key(), Style.CELL_WRAP, n + ": tolerance interval method");
        s.merge(r + 5, r + 5, c0 + 1, c0 + 2);
        String decides = org.holdpoint.result.Verdicts.toleranceFinding(c, v -> org.holdpoint.result.Format.fixed(v, d));
        int col = c0 + 4;
        s.text(r, col, "Decides", Style.HEADER, n + ": tolerance decides header");
        s.text(r, col + 1, "", Style.HEADER, n + ": tolerance decides header");
        s.text(r + 1, col, decides, Style.CELL_WRAP, n + ": tolerance decides");
        s.merge(r + 1, r + 5, col, col + 1);
        for (int i = 1; i <= 5; i++) {
            if (i > 1) {
                s.text(r + i, col, "", Style.CELL_WRAP, n + ": tolerance decides");
            }
            s.text(r + i, col + 1, "", Style.CELL_WRAP, n + ": tolerance decides");
        }
        return r + 7;
    }

    private int capability(int r, String n, CharacteristicResult c, AssumptionChecks k, int d, List<String> notes) {
        if (k.distribution() != null && k.distribution().automatic()) {
            notes.add("Capability model: " + k.distribution().chosen().key() + " (" + k.distribution().reason() + ").");
        }
        if (k.before().percentile() != null || k.after().percentile() != null) {
            return fitted(r, n, c, k, d, notes);
        }
        CapabilityResult b = k.before().capability();
        CapabilityResult a = k.after().capability();
        if (b == null && a == null) {
            s.text(r, c0, "Capability", Style.HEADER, n + ": capability header");
            s.merge(r, r, c0, c0 + 5);
            s.text(r + 1, c0, "not assessed: no specification limits set", Style.WRAP, n + ": capability absent");
            s.merge(r + 1, r + 1, c0, c0 + 5);
            return r + 3;
        }
        addNotes(notes, "capability before", b == null ? List.of() : b.notes());
        addNotes(notes, "capability after", a == null ? List.of() : a.notes());
        CapabilityResult any = a != null ? a : b;
        if (any.lsl() == null || any.usl() == null) {
            notes.add("Capability: one-sided specification (only " + (any.lsl() == null ? "USL" : "LSL")
                    + "), so Pp and the expected ppm " + (any.lsl() == null ? "below LSL" : "above USL")
                    + " do not exist; Ppk is " + (any.lsl() == null ? "Ppu" : "Ppl") + ".");
        }
        String lvl = Texts.percent(1 - any.alpha());
        if (plan.layout() >= 2) {
            return tolerance(r, n, c, k, b, a, any, lvl, notes);
        }
        s.text(r, c0, "Capability (normal model)", Style.HEADER, n + ": capability header");
        s.text(r, c0 + 1, "Before", Style.HEADER, n + ": capability before header");
        s.text(r, c0 + 2, "After", Style.HEADER, n + ": capability after header");
        capRow(r + 1, "Pp (overall sd)", b, a, CapabilityResult::pp, n + ": Pp");
        capRow(r + 2, "Ppk (overall sd)", b, a, CapabilityResult::ppk, n + ": Ppk");
        capRow(r + 3, lvl + " lower bound of Ppk (Bissell)", b, a, CapabilityResult::ppkLower, n + ": Ppk lower bound");
        capRow(r + 4, "Cp (within subgroups)", b, a, CapabilityResult::cp, n + ": Cp");
        capRow(r + 5, "Cpk (within subgroups)", b, a, CapabilityResult::cpk, n + ": Cpk");
        row(r + 6, "Expected ppm below LSL", b == null ? null : b.ppmBelow(), a == null ? null : a.ppmBelow(),
                Style.NUMBER, 2, n + ": ppm below LSL");
        row(r + 7, "Expected ppm above USL", b == null ? null : b.ppmAbove(), a == null ? null : a.ppmAbove(),
                Style.NUMBER, 2, n + ": ppm above USL");
        int col = c0 + 4;
        s.text(r, col, "Capability requirement", Style.HEADER, n + ": requirement header");
        s.text(r, col + 1, "", Style.HEADER, n + ": requirement header");
        Double req = c.settings().capabilityRequirement();
        pair(r + 1, col, "Required Ppk (on the lower bound)", req, Style.NUMBER, 2, n + ": capability requirement");
        pairText(r + 2, col, "After group's lower bound", met(k.capabilityMet(), req), n + ": capability met");
        if (req != null && k.capabilityMet() == null) {
            notes.add("Capability requirement: not judged, the after group's lower bound of Ppk is undefined.");
        }
        String est = any.estimator() == null ? "none: Cp and Cpk need a subgroup column"
                : any.estimator().description();
        s.text(r + 3, col, "Within-subgroup sd estimator", Style.LABEL, n + ": within estimator label");
        s.text(r + 3, col + 1, est, Style.CELL_WRAP, n + ": within estimator");
        s.merge(r + 3, r + 5, col + 1, col + 1);
        s.text(r + 4, col + 1, "", Style.CELL_WRAP, n + ": within estimator");
        s.text(r + 5, col + 1, "", Style.CELL_WRAP, n + ": within estimator");
        return r + 9;
    }

    /**
     * Layout 2: how the parts sit in the tolerance, in the project's own order: the sentence that decides,
     * then the indices before and after (the one that decides first), then the expected share outside.
     */
    private int tolerance(int r, String n, CharacteristicResult c, AssumptionChecks k, CapabilityResult b,
            CapabilityResult a, CapabilityResult any, String lvl, List<String> notes) {
        s.text(r, c0, "In the tolerance (normal model)", Style.HEADER, n + ": capability header");
        s.merge(r, r, c0, c0 + 5);
        Double req = c.settings().capabilityRequirement();
        if (decides(r, n, a == null ? null : a.ppkLower(), req, k.capabilityMet(), lvl) && req != null) {
            notes.add("Capability requirement: not judged, the after group's lower bound of Ppk is undefined.");
        }
        capRow(r + 3, "Ppk (overall sd)", b, a, CapabilityResult::ppk, n + ": Ppk");
        capRow(r + 4, lvl + " lower bound of Ppk (Bissell)", b, a, CapabilityResult::ppkLower, n + ": Ppk lower bound");
        capRow(r + 5, "Pp (overall sd)", b, a, CapabilityResult::pp, n + ": Pp");
        capRow(r + 6, "Cpk (within subgroups)", b, a, CapabilityResult::cpk, n + ": Cpk");
        capRow(r + 7, "Cp (within subgroups)", b, a, CapabilityResult::cp, n + ": Cp");
        row(r + 8, "Expected ppm below LSL", b == null ? null : b.ppmBelow(), a == null ? null : a.ppmBelow(),
                Style.NUMBER, 2, n + ": ppm below LSL");
        row(r + 9, "Expected ppm above USL", b == null ? null : b.ppmAbove(), a == null ? null : a.ppmAbove(),
                Style.NUMBER, 2, n + ": ppm above USL");
        int col = c0 + 4;
        s.text(r + 2, col, "Within-subgroup sd", Style.HEADER, n + ": within header");
        s.text(r + 2, col + 1, "", Style.HEADER, n + ": within header");
        String est = any.estimator() == null ? "none: Cp and Cpk need a subgroup column"
                : any.estimator().description();
        s.text(r + 3, col, est, Style.CELL_WRAP, n + ": within estimator");
        s.merge(r + 3, r + 5, col, col + 1);
        s.text(r + 3, col + 1, "", Style.CELL_WRAP, n + ": within estimator");
        for (int i = 4; i <= 5; i++) {
            s.text(r + i, col, "", Style.CELL_WRAP, n + ": within estimator");
            s.text(r + i, col + 1, "", Style.CELL_WRAP, n + ": within estimator");
        }
        return r + 11;
    }

    /**
     * How the parts sit in the tolerance when capability is judged by a fitted distribution (percentile method,
     * docs/methods.md §14): the sentence that decides, the indices and the fitted quantiles before and after, the
     * expected share outside, and the model with its parameters.
     */
    private int fitted(int r, String n, CharacteristicResult c, AssumptionChecks k, int d, List<String> notes) {
        PercentileCapabilityResult b = k.before().percentile();
        PercentileCapabilityResult a = k.after().percentile();
        PercentileCapabilityResult any = a != null ? a : b;
        addNotes(notes, "capability before", b == null ? List.of() : b.notes());
        addNotes(notes, "capability after", a == null ? List.of() : a.notes());
        String family = any.fit().family().key();
        String lvl = Texts.percent(1 - any.alpha());
        s.text(r, c0, "In the tolerance (" + family + " fit, percentile method)", Style.HEADER, n + ": capability header");
        s.merge(r, r, c0, c0 + 5);
        Double req = c.settings().capabilityRequirement();
        decides(r, n, a == null ? null : a.ppkLower(), req, k.capabilityMet(), lvl);
        pcRow(r + 3, "Ppk (percentile)", b, a, PercentileCapabilityResult::ppk, 3, n + ": Ppk");
        pcRow(r + 4, lvl + " lower bound of Ppk (bootstrap)", b, a, PercentileCapabilityResult::ppkLower, 3,
                n + ": Ppk lower bound");
        pcRow(r + 5, "Pp (percentile)", b, a, PercentileCapabilityResult::pp, 3, n + ": Pp");
        int qd = d;
        pcRow(r + 6, "X0.135 % of the fit", b, a, PercentileCapabilityResult::x00135, qd, n + ": X0.135");
        pcRow(r + 7, "X50 % of the fit", b, a, PercentileCapabilityResult::x50, qd, n + ": X50");
        pcRow(r + 8, "X99.865 % of the fit", b, a, PercentileCapabilityResult::x99865, qd, n + ": X99.865");
        pcRow(r + 9, "Expected ppm below LSL", b, a, PercentileCapabilityResult::ppmBelow, 2, n + ": ppm below LSL");
        pcRow(r + 10, "Expected ppm above USL", b, a, PercentileCapabilityResult::ppmAbove, 2, n + ": ppm above USL");
        int col = c0 + 4;
        s.text(r + 2, col, "Fitted " + family, Style.HEADER, n + ": fit header");
        s.text(r + 2, col + 1, "", Style.HEADER, n + ": fit header");
        StringBuilder params = new StringBuilder();
        for (PercentileCapabilityResult p : new PercentileCapabilityResult[] {b, a}) {
            if (p == null) {
                continue;
            }
            params.append(params.length() == 0 ? "before: " : "; after: ");
            StringBuilder one = new StringBuilder();
            p.fit().parameters().forEach((key, v) -> one.append(one.length() == 0 ? "" : ", ").append(key)
                    .append(" ").append(Texts.num(v)));
            params.append(one);
        }
        params.append(". Bootstrap bound: seed ").append(any.seed()).append(", ").append(any.resamples())
                .append(" resamples.");
        s.text(r + 3, col, params.toString(), Style.CELL_WRAP, n + ": fit parameters");
        s.merge(r + 3, r + 8, col, col + 1);
        s.text(r + 3, col + 1, "", Style.CELL_WRAP, n + ": fit parameters");
        for (int i = 4; i <= 8; i++) {
            s.text(r + i, col, "", Style.CELL_WRAP, n + ": fit parameters");
            s.text(r + i, col + 1, "", Style.CELL_WRAP, n + ": fit parameters");
        }
        if (req != null && k.capabilityMet() == null) {
            notes.add("Capability requirement: not judged, the after group's lower bound of Ppk is undefined.");
        }
        return r + 12;
    }

    /**
     * The sentence that decides (row r + 1) and the index table's header (row r + 2).
     *
     * @return whether the after group's bound is undefined
     */
    private boolean decides(int r, String n, Double bound, Double req, Boolean met, String lvl) {
        boolean undefined = bound == null || !Double.isFinite(bound);
        String decides = undefined ? "The after group's lower bound of Ppk is undefined" + (req == null
                ? "; no requirement set." : ", so the requirement of " + Texts.num(req) + " is not judged.")
                : "Decides: the after group's " + lvl + " lower bound of Ppk, " + WorkbookPlan.fixed(bound, 3)
                        + (req == null ? "; no requirement set." : Boolean.TRUE.equals(met) ? ", meets the required "
                        + Texts.num(req) + "." : ", does NOT meet the required " + Texts.num(req) + ".");
        s.text(r + 1, c0, decides, Style.WRAP, n + ": capability decides");
        s.merge(r + 1, r + 1, c0, c0 + 5);
        s.height(r + 1, 16f);
        s.text(r + 2, c0, "Index", Style.HEADER, n + ": capability index header");
        s.text(r + 2, c0 + 1, "Before", Style.HEADER, n + ": capability before header");
        s.text(r + 2, c0 + 2, "After", Style.HEADER, n + ": capability after header");
        return undefined;
    }

    private void pcRow(int r, String label, PercentileCapabilityResult b, PercentileCapabilityResult a,
            java.util.function.Function<PercentileCapabilityResult, Double> f, int d, String what) {
        row(r, label, b == null ? null : f.apply(b), a == null ? null : f.apply(a), Style.NUMBER, d, what);
    }

    static String met(Boolean met, Double requirement) {
        if (requirement == null) {
            return "no requirement set";
        }
        if (met == null) {
            return "not judged";
        }
        return met ? "meets it" : "does not meet it";
    }

    private void capRow(int r, String label, CapabilityResult b, CapabilityResult a,
            java.util.function.Function<CapabilityResult, Double> f, String what) {
        row(r, label, b == null ? null : f.apply(b), a == null ? null : f.apply(a), Style.NUMBER, 3, what);
    }

    private static void addNotes(List<String> notes, String where, List<String> add) {
        for (String x : add) {
            String line = where.substring(0, 1).toUpperCase(java.util.Locale.ROOT) + where.substring(1) + ": " + x;
            if (!notes.contains(line)) {
                notes.add(line);
            }
        }
    }

    private void row(int r, String label, Double before, Double after, Style style, int d, String what) {
        s.text(r, c0, label, Style.LABEL, what + " label");
        s.number(r, c0 + 1, finite(before), style, d, what + " before");
        s.number(r, c0 + 2, finite(after), style, d, what + " after");
    }

    private void pair(int row, int col, String label, Double value, Style style, int d, String what) {
        s.text(row, col, label, Style.LABEL, what + " label");
        s.number(row, col + 1, finite(value), style, d, what);
    }

    private void pairText(int row, int col, String label, String value, String what) {
        s.text(row, col, label, Style.LABEL, what + " label");
        s.text(row, col + 1, value, Style.CELL_WRAP, what);
        int lines = DetailPlan.lines(value, DetailPlan.WIDTHS[5] - 2);
        if (lines > 1) {
            s.height(row, lines * 12f + 2);
        }
    }

    private static Double finite(Double v) {
        return v == null || !Double.isFinite(v) ? null : v;
    }
}
