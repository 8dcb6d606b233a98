package org.holdpoint.cli;

import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import org.holdpoint.stats.Descriptives;
import org.holdpoint.stats.EquivalenceResult;
import org.holdpoint.stats.TTestResult;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.Cautions;
import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.ImportReport;
import org.holdpoint.study.InputInfo;
import org.holdpoint.result.StudyResult;
import org.holdpoint.result.Verdict;
import org.holdpoint.result.Format;
import org.holdpoint.workflow.Version;

/** The readable text result of {@code holdpoint analyze}: a summary table, details, verdict, cautions. */
final class TextOutput {
    private final PrintWriter out;

    TextOutput(PrintWriter out) {
        this.out = out;
    }

    /** The mark shown beside a status, so that no verdict relies on colour. */
    static String mark(Verdict.Status s) {
        return switch (s) {
            case PASSED -> "[=]";
            case FAILED -> "[x]";
            case INCONCLUSIVE -> "[?]";
            case NOT_ASSESSED -> "[-]";
            case NOT_ASSESSABLE -> "[/]";
        };
    }

    private final java.util.Map<String, Integer> decimals = new java.util.HashMap<>();

    /** A value in the unit of a characteristic, with its decimals (6 significant digits when unknown). */
    private String u(String characteristic, Double v) {
        if (v == null) {
            return "-";
        }
        Integer d = decimals.get(characteristic);
        return d == null ? Format.num(v) : Format.fixed(v, d);
    }

    /** A raw value (min, max) with the characteristic's resolution. */
    private String raw(String characteristic, double v) {
        Integer d = decimals.get(characteristic);
        return d == null ? Format.num(v) : Format.fixed(v, d - 2);
    }

    void print(Dataset data, AnalysisSettings settings, StudyResult result) {
        out.printf(Locale.ROOT, "Holdpoint %s - change study analysis%n", Version.get());
        for (InputInfo in : data.inputs()) {
            out.printf(Locale.ROOT, "%s: %s%s, layout %s, SHA-256 %s%n", cap(in.role()), in.file(),
                    in.sheet() == null ? "" : " (sheet " + in.sheet() + ")",
                    in.layout() == null ? "?" : in.layout().words(), in.sha256());
        }
        printImport(data.report());
        out.printf(Locale.ROOT, "Difference = after - before; variance ratio = var(after)/var(before). Difference "
                + "intervals %s, equivalence intervals %s (two one-sided tests, each at alpha = %s).%n",
                Format.percent(1 - settings.alpha()), Format.percent(1 - 2 * settings.alpha()),
                Format.num(settings.alpha()));
        out.println();
        // values in a characteristic's unit are shown with its resolution plus two decimals
        decimals.clear();
        data.characteristics().forEach(c -> decimals.put(c.name(), Math.min(10, c.resolutionDecimals() + 2)));
        printTable(result.characteristics());
        for (CharacteristicResult r : result.characteristics()) {
            out.println();
            printDetail(r, settings);
        }
        out.println();
        printVerdict(result);
    }

    /** The overall verdict, the characteristics that did not pass, and the cautions. */
    void printVerdict(StudyResult result) {
        out.println(result.summary());
        for (String f : result.failing()) {
            out.println("  - " + f);
        }
        out.println("The overall claim needs every characteristic to pass (intersection-union principle, "
                + "Berger 1982), so it needs no multiplicity adjustment.");
        out.println();
        out.println("Cautions:");
        for (String c : Cautions.TEXT) {
            out.println("  * " + c);
        }
        out.flush();
    }

    private void printImport(ImportReport report) {
        out.printf(Locale.ROOT, "Import: %d values used, %d cells not used", report.valuesUsed(),
                report.skippedTotal());
        if (report.skippedTotal() > 0) {
            StringBuilder sb = new StringBuilder(" (");
            report.skipCounts().forEach((k, v) -> sb.append(sb.length() > 2 ? ", " : "").append(k.words())
                    .append(": ").append(v));
            out.print(sb.append(")"));
        }
        out.println();
        for (String m : report.messages()) {
            out.println("  " + OptionWords.of(m));
        }
        int shown = 0;
        for (var cell : report.firstSkipped()) {
            if (shown++ >= 5) {
                out.printf(Locale.ROOT, "  ... see the JSON import block for up to %d listed cells%n",
                        ImportReport.MAX_LISTED);
                break;
            }
            out.printf(Locale.ROOT, "  not used: %s - %s%s%n", cell.origin().describe(), cell.reason().words(),
                    cell.text() == null || cell.text().isEmpty() ? "" : " (\"" + cell.text() + "\")");
        }
    }

    private void printTable(List<CharacteristicResult> results) {
        String fmt = "%-3s %-24s %-5s %-9s %12s %12s %11s %-24s %-22s %s%n";
        out.printf(Locale.ROOT, fmt, "", "Characteristic", "Unit", "n bef/aft", "Mean before", "Mean after",
                "Difference", "Equivalence interval", "Margin", "Conclusion");
        for (CharacteristicResult r : results) {
            EquivalenceResult eq = r.decidingTost();
            TTestResult t = r.decidingTest();
            String interval = eq == null ? "-" : eq.ratio() ? "ratio (" + Format.ratioBound(eq.ciLower()) + ", "
                    + Format.ratioBound(eq.ciUpper()) + ")" : "(" + u(r.name(), eq.ciLower()) + ", "
                    + u(r.name(), eq.ciUpper()) + ")";
            String margin = eq == null ? "none set" : marginText(r.name(), eq);
            boolean unassessable = r.verdict().status() == Verdict.Status.NOT_ASSESSABLE;
            String conclusion = unassessable ? "not assessable (see below)" : eq == null ? "not assessed"
                    : eq.conclusion().words();
            if (unassessable && r.margin() != null && r.margin().ratio()) {
                margin = "ratio " + r.margin().lower() + " to " + r.margin().upper();
            } else if (unassessable && r.margin() != null) {
                margin = r.margin().lower() != null && r.margin().upper() != null ? "(" + u(r.name(), r.margin()
                        .lower()) + ", " + u(r.name(), r.margin().upper()) + ")" : "one-sided";
            }
            out.printf(Locale.ROOT, fmt, mark(r.verdict().status()), clip(r.name(), 24),
                    clip(r.unit() == null ? "" : r.unit(), 6), (r.before() == null ? 0 : r.before().n()) + "/"
                            + (r.after() == null ? 0 : r.after().n()),
                    r.before() == null ? "-" : u(r.name(), r.before().mean()),
                    r.after() == null ? "-" : u(r.name(), r.after().mean()), t == null ? "-" : u(r.name(), t.estimate()),
                    interval, margin, conclusion + (r.verdict().status() == Verdict.Status.FAILED && eq != null
                            && eq.conclusion().claimHolds() ? " (limit not met)" : ""));
        }
        out.println("Marks: [=] passed  [x] failed  [?] inconclusive  [-] not assessed  [/] not assessable");
    }

    private String marginText(String name, EquivalenceResult eq) {
        if (eq.ratio()) {
            return eq.lowerMargin() != null && eq.upperMargin() != null ? "ratio (" + Format.ratioBound(eq.lowerMargin())
                    + ", " + Format.ratioBound(eq.upperMargin()) + ")" : eq.lowerMargin() != null ? "ratio > "
                    + Format.ratioBound(eq.lowerMargin()) : "ratio < " + Format.ratioBound(eq.upperMargin());
        }
        if (eq.lowerMargin() != null && eq.upperMargin() != null) {
            return "(" + u(name, eq.lowerMargin()) + ", " + u(name, eq.upperMargin()) + ")";
        }
        return eq.lowerMargin() != null ? "> " + u(name, eq.lowerMargin()) : "< " + u(name, eq.upperMargin());
    }

    private void printDetail(CharacteristicResult r, AnalysisSettings settings) {
        String unit = r.unit() == null ? "" : " (" + r.unit() + ")";
        out.println("== " + r.name() + unit + " " + "=".repeat(Math.max(3, 60 - r.name().length() - unit.length())));
        printGroup(r.name(), "before", r.before());
        printGroup(r.name(), "after ", r.after());
        TTestResult t = r.decidingTest();
        if (t != null) {
            out.printf(Locale.ROOT, "  %s: t = %s, df = %s, p = %s%s; difference %s, %s CI (%s, %s)%n",
                t.method().description(), Format.num(t.t()), Format.num(t.df()), Format.p(t.p()),
                r.holmP() == null ? "" : " (Holm-adjusted " + Format.p(r.holmP()) + ")", u(r.name(), t.estimate()),
                Format.percent(t.confidenceLevel()), u(r.name(), t.ciLower()), u(r.name(), t.ciUpper()));
        }
        if (!r.paired() && r.method() != org.holdpoint.stats.LocationMethod.POOLED && r.pooled() != null) {
            out.printf(Locale.ROOT, "  (for reference, pooled two-sample t: t = %s, df = %s, p = %s; not used for "
                    + "the verdict because equal variances were not asserted)%n", Format.num(r.pooled().t()),
                    Format.num(r.pooled().df()), Format.p(r.pooled().p()));
        }
        EquivalenceResult eq = r.decidingTost();
        if (eq != null) {
            out.printf(Locale.ROOT, "  Equivalence, two one-sided tests (%s%s): %s; p lower = %s, p upper = %s; "
                    + "%s interval%s (%s, %s) -> %s%n", eq.method().description(), eq.ratio() ? ", on the logarithms"
                            : "", Format.margin(eq, decimals.getOrDefault(r.name(), -1)),
                    eq.pLower() == null ? "-" : Format.p(eq.pLower()), eq.pUpper() == null ? "-" : Format.p(eq.pUpper()),
                    Format.percent(eq.level()), eq.ratio() ? " of the ratio after/before (geometric means " + Format
                            .ratioBound(eq.estimate()) + ")" : "", eq.ratio() ? Format.ratioBound(eq.ciLower())
                            : u(r.name(), eq.ciLower()), eq.ratio() ? Format.ratioBound(eq.ciUpper())
                            : u(r.name(), eq.ciUpper()), eq.conclusion().words());
        }
        if (r.variance() != null) {
            var v = r.variance();
            out.printf(Locale.ROOT, "  Spread: variance ratio %s, %s CI (%s, %s), %s p = %s%s", Format.ratio(
                    v.ratio()), Format.percent(v.confidenceLevel()), Format.ratio(v.ciLower()), Format.ratio(v.ciUpper()),
                    v.method().words(), Format.p(v.p()), v.r() == null ? "" : " (correlation of sums and differences r = "
                            + Format.num(v.r()) + ", t = " + Format.num(v.t()) + ", df = " + Format.num(v.df1()) + ")");
            if (r.levene() != null) {
                out.printf(Locale.ROOT, "; Brown-Forsythe F = %s, p = %s", Format.num(r.levene().f()),
                        Format.p(r.levene().p()));
            }
            out.println();
        }
        if (r.sdGrowth() != null) {
            out.printf(Locale.ROOT, "  sd-growth limit %s: %s upper bound of sd(after)/sd(before) = %s%s -> %s%n",
                    Format.num(r.sdGrowth().limit()), Format.percent(r.sdGrowth().level()),
                    Format.ratio(r.sdGrowth().upperBound()), r.sdGrowth().method()
                            == org.holdpoint.stats.VarianceRatioResult.SpreadMethod.PITMAN_MORGAN
                            ? " (paired: from the Pitman-Morgan test)" : "", r.sdGrowth().met() ? "met" : "NOT met");
        }
        if (r.checks() != null) {
            printChecks(r.name(), r.checks());
        }
        out.printf(Locale.ROOT, "  Verdict: %s %s%n", mark(r.verdict().status()), r.verdict().status().words());
        for (String reason : r.verdict().reasons()) {
            out.println("    " + reason);
        }
        for (String note : r.notes()) {
            out.println("  Note: " + note);
        }
    }

    private void printChecks(String name, org.holdpoint.result.AssumptionChecks c) {
        if (c.rankSum() != null) {
            var r = c.rankSum();
            out.printf(Locale.ROOT, "  Rank sum (Wilcoxon-Mann-Whitney, %s): U = %s, p = %s; Hodges-Lehmann shift %s, %s "
                    + "CI (%s, %s)%s%n", r.method().name().toLowerCase(Locale.ROOT), Format.num(r.u()),
                    r.p() == null ? "undefined" : Format.p(r.p()), u(name, r.shift()),
                    Format.percent(r.ci().achievedLevel()), u(name, r.ciLower()), u(name, r.ciUpper()),
                    rankEquivalence(name, r.equivalence()));
        }
        if (c.signedRank() != null) {
            var r = c.signedRank();
            out.printf(Locale.ROOT, "  Signed rank (Wilcoxon, %s): V = %s, p = %s; Hodges-Lehmann shift %s, %s CI "
                    + "(%s, %s)%s%n", r.method().name().toLowerCase(Locale.ROOT), Format.num(r.v()),
                    r.p() == null ? "undefined" : Format.p(r.p()), u(name, r.shift()),
                    Format.percent(r.ci().achievedLevel()), u(name, r.ciLower()), u(name, r.ciUpper()),
                    rankEquivalence(name, r.equivalence()));
        }
        out.printf(Locale.ROOT, "  Shape: before %s; after %s%n", shape(c.before().normality()),
                shape(c.after().normality()));
        if (c.distribution() != null && (c.distribution().automatic()
                || c.distribution().chosen() != org.holdpoint.stats.DistributionFamily.NORMAL)) {
            out.printf(Locale.ROOT, "  Capability model: %s (%s)%n", c.distribution().chosen().key(),
                    c.distribution().reason());
        }
        for (var g : new org.holdpoint.result.GroupChecks[] {c.before(), c.after()}) {
            var pc = g.percentile();
            if (pc != null) {
                StringBuilder params = new StringBuilder();
                pc.fit().parameters().forEach((k, v) -> params.append(params.length() == 0 ? "" : ", ").append(k)
                        .append(" = ").append(Format.num(v)));
                out.printf(Locale.ROOT, "  Capability %s (%s fit: %s; percentile method): X0.135%% = %s, X50%% = %s, "
                        + "X99.865%% = %s; Pp = %s, Ppk = %s (%s lower bound %s, bootstrap seed %d, %d resamples), "
                        + "expected out of spec %s ppm below, %s ppm above%n", g == c.before() ? "before" : "after ",
                        pc.fit().family().key(), params, Format.num(pc.x00135()), Format.num(pc.x50()),
                        Format.num(pc.x99865()), opt(pc.pp()), opt(pc.ppk()), Format.percent(1 - pc.alpha()),
                        opt(pc.ppkLower()), pc.seed(), pc.resamples(), opt(pc.ppmBelow()), opt(pc.ppmAbove()));
            }
            var cap = g.capability();
            if (cap != null) {
                out.printf(Locale.ROOT, "  Capability %s: Pp = %s, Ppk = %s (%s lower bound %s)%s, expected out of "
                        + "spec %s ppm below, %s ppm above%n", g == c.before() ? "before" : "after ",
                        opt(cap.pp()), opt(cap.ppk()), Format.percent(1 - cap.alpha()), opt(cap.ppkLower()),
                        cap.cpk() == null ? "" : ", Cp = " + opt(cap.cp()) + ", Cpk = " + opt(cap.cpk()) + " ("
                                + cap.estimator().description() + ")", opt(cap.ppmBelow()), opt(cap.ppmAbove()));
            }
        }
        for (var g : new org.holdpoint.result.GroupChecks[] {c.before(), c.after()}) {
            var ti = g.tolerance();
            if (ti != null) {
                out.printf(Locale.ROOT, "  Tolerance interval %s: %s coverage, %s confidence%s, %s, %s: %s%s%n",
                        g == c.before() ? "before" : "after ", Format.percent(ti.coverage()),
                        Format.percent(ti.achievedConfidence()), ti.confident() ? "" : " (asked: "
                                + Format.percent(ti.confidence()) + ")", ti.sides().key(), ti.method().words(),
                        Format.interval(ti, v -> u(name, v)),
                        ti.k() == null ? "" : String.format(Locale.ROOT, ", k = %s", Format.num(ti.k(), 6)));
            }
        }
        if (c.stability() != null) {
            var st = c.stability();
            var l = st.before().own();
            boolean means = st.kind() == org.holdpoint.stats.ControlChart.Kind.MEANS;
            String spread = means ? String.format(Locale.ROOT, "sd chart centre %s (limits %s, %s)",
                    u(name, l.spreadCenter()), u(name, l.spreadLcl()), u(name, l.spreadUcl()))
                    : String.format(Locale.ROOT, "moving range %s (limit %s)", u(name, l.mrBar()), u(name, l.mrUcl()));
            out.printf(Locale.ROOT, "  Stability (%s charts in run order from %s, limits from the before phase, "
                    + "ISO 7870-2 tests %s): centre %s, limits%s (%s, %s), %s; before: %s; after: %s%n",
                    st.kind().words(), st.runOrder(), st.testWords(), u(name, l.center()),
                    means ? " for subgroups of " + l.size() : "", u(name, l.lcl()), u(name, l.ucl()), spread,
                    st.finding(false) == null ? "no signal" : st.before().signals().size() + " signal(s)",
                    st.finding(true) == null ? "no signal against the before limits"
                            : st.after().signals().size() + " signal(s) against the before limits");
        }
        out.println("  Recommended reading: " + c.recommendation());
    }

    private String rankEquivalence(String name, org.holdpoint.stats.RankEquivalence e) {
        if (e == null) {
            return "";
        }
        return String.format(Locale.ROOT, "; rank-based equivalence: %s interval (%s, %s) -> %s",
                Format.percent(e.interval().achievedLevel()), u(name, e.interval().lower()),
                u(name, e.interval().upper()), e.conclusion().words());
    }

    private static String shape(org.holdpoint.stats.NormalityResult n) {
        StringBuilder sb = new StringBuilder();
        if (n.shapiro() != null) {
            sb.append("Shapiro-Wilk W = ").append(Format.num(n.shapiro().w())).append(", p = ")
                    .append(Format.p(n.shapiro().p()));
        }
        if (n.anderson() != null) {
            sb.append(sb.length() > 0 ? ", " : "").append("Anderson-Darling A2 = ").append(Format.num(n.anderson().a2()))
                    .append(", p = ").append(Format.p(n.anderson().p()));
        }
        return sb.length() == 0 ? "not checked (see notes)" : sb.toString();
    }

    private static String opt(Double v) {
        return v == null ? "-" : Format.num(v, 4);
    }

    private void printGroup(String name, String label, Descriptives d) {
        if (d == null) {
            out.printf(Locale.ROOT, "  %s n = 0 (no usable value)%n", label);
            return;
        }
        out.printf(Locale.ROOT, "  %s n = %d, mean = %s, sd = %s, median = %s, min = %s, max = %s%n", label, d.n(),
                u(name, d.mean()), u(name, d.sd()), u(name, d.median()), raw(name, d.min()), raw(name, d.max()));
    }

    private static String clip(String s, int w) {
        return s.length() <= w ? s : s.substring(0, w - 1) + "~";
    }

    private static String cap(String s) {
        return s.isEmpty() ? s : Character.toUpperCase(s.charAt(0)) + s.substring(1);
    }
}
