package org.holdpoint.report;

import java.util.List;
import java.util.Map;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.Cautions;
import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.Exclusion;
import org.holdpoint.study.ImportReport;
import org.holdpoint.study.InputInfo;
import org.holdpoint.study.Signature;
import org.holdpoint.study.SkippedCell;

/** The method, import report, cautions and sign-off blocks. */
final class TextBlocks {
    /** The password of the sheet protection, stated openly: protection prevents slips, it is not security. */
    static final String PROTECTION_PASSWORD = "holdpoint";
    static final String HONESTY = "Sheet protection in this workbook is a convenience against slips, not security: "
            + "it is easily removed (the password is '" + PROTECTION_PASSWORD + "'). The typed names of the sign-off "
            + "block are not an electronic signature in the sense of regulated-industry electronic-record rules. "
            + "What the workbook does give is tamper evidence: the SHA-256 of the embedded study record, an optional "
            + "digital signature of that record with a key pair, and 'holdpoint verify', which re-computes every "
            + "result from the embedded raw data and lists every shown value that no longer matches.";
    /** Layout 2: the same without the password (a printed password invites removing the protection). */
    static final String HONESTY_2 = "Sheet protection in this workbook is a convenience against slips, not "
            + "security: it is easily removed. The typed names of the sign-off block are not an electronic signature "
            + "in the sense of regulated-industry electronic-record rules. What the workbook does give is tamper "
            + "evidence: the SHA-256 of the embedded study record, an optional digital signature of that record with "
            + "a key pair, and 'holdpoint verify', which re-computes every result from the embedded raw data and "
            + "lists every shown value that no longer matches.";
    static final String SIGN_MEANING = "Prepared: the study was planned, measured and analysed as recorded. "
            + "Reviewed: the method, criteria and data were checked. Approved: the change is released on the basis "
            + "of this record. Write the meaning of your signature in its own words if it differs.";
    private final WorkbookPlan plan;

    TextBlocks(WorkbookPlan plan) {
        this.plan = plan;
    }

    void build() {
        method();
        importReport();
        cautions();
        signOff();
    }

    private void method() {
        Anchor a = plan.at(TemplateName.METHOD);
        SheetContent s = plan.sheet(TemplateName.METHOD);
        s.width(a.column(), 30);
        s.width(a.column() + 1, 92);
        AnalysisSettings set = plan.input.study().settings();
        double alpha = set.alpha();
        String ci = Texts.percent(1 - alpha);
        String eq = Texts.percent(1 - 2 * alpha);
        int[] row = {a.row()};
        java.util.function.BiConsumer<String, String> put = (label, text) -> {
            s.text(row[0], a.column(), label, Style.LABEL, "method: " + label + " label");
            s.text(row[0], a.column() + 1, text, Style.WRAP, "method: " + label);
            s.height(row[0], DetailPlan.lines(text, plan.layout() >= 2 ? 88 : 105) * (plan.layout() >= 2 ? 12.5f
                    : 11.5f) + 3);
            row[0]++;
        };
        s.text(row[0]++, a.column(), "Method and settings", Style.HEADING, "method heading");
        put.accept("Software", "Holdpoint " + plan.input.softwareVersion());
        put.accept("Significance level \u03b1", Texts.num(alpha));
        put.accept("Direction", "Difference = after \u2212 before; variance ratio = var(after) / var(before).");
        put.accept("Difference test", "Welch two-sample t with Welch\u2013Satterthwaite degrees of freedom (Welch "
                + "1947) unless equal variances are asserted, then the pooled two-sample t (Student); paired t on the "
                + "differences for paired designs. Two-sided p and the " + ci + " confidence interval of the "
                + "difference.");
        put.accept("Variances", set.equalVariances() ? "equal variances asserted by the user: the pooled tests decide"
                : "not assumed equal: Welch's tests decide");
        put.accept("Equivalence", "Two one-sided tests, TOST (Schuirmann 1987), each at \u03b1 = " + Texts.num(alpha)
                + ": equivalent when the " + eq + " interval of the difference lies inside the margin (L, U), not "
                + "equivalent when it lies entirely outside, inconclusive when it straddles or touches a bound. A "
                + "non-significant difference test is never taken as evidence of sameness.");
        put.accept("Spread", "F-test of the variance ratio with its " + ci + " interval; Brown\u2013Forsythe test "
                + "(Levene's test on absolute deviations from the group medians, Brown & Forsythe 1974); "
                + "sd growth: the upper one-sided " + ci + " confidence bound of \u03c3 after / \u03c3 before must "
                + "lie below the limit." + (set.since(3) ? " Paired designs: the Pitman\u2013Morgan test (the "
                + "correlation of sums and differences, Pitman 1939, Morgan 1939) and the interval and bound that "
                + "invert it, since paired values are not independent." : ""));
        put.accept("Overall verdict", "CHANGE VERIFIED only when every characteristic passes (intersection\u2013union "
                + "test, Berger 1982), so that claim needs no multiplicity adjustment. Holm adjustment of the "
                + "difference p-values: " + (set.holm() ? "applied" : "not requested") + ".");
        put.accept("Quantiles", "Medians and quartiles by linear interpolation between order statistics "
                + "(Hyndman & Fan 1996, type 7).");
        put.accept("Descriptives", "Standard deviation with divisor n \u2212 1, from a compensated two-pass "
                + "algorithm on the exact decimals of the data.");
        put.accept("Shape and outliers", "Shapiro\u2013Wilk W with Royston's approximation (AS R94, 1995), for 3 to "
                + "5000 values; Anderson\u2013Darling A\u00b2 with estimated mean and sd, its p from the adjusted "
                + "A\u00b2(1 + 0.75/n + 2.25/n\u00b2) (D'Agostino & Stephens 1986). Outliers: Grubbs' two-sided test "
                + "and the generalized ESD (Rosner 1983); flagged values are shown with their cell and never dropped.");
        put.accept("Distribution-free comparison", "Wilcoxon\u2013Mann\u2013Whitney rank sum (independent samples) or "
                + "Wilcoxon signed rank (paired): two-sided p, exact for small samples without ties, otherwise the "
                + "normal approximation with tie and continuity corrections; the Hodges\u2013Lehmann shift (median of "
                + "the pairwise differences, or of the Walsh averages when paired) with its " + ci + " interval from "
                + "order statistics and the level achieved; the rank-based equivalence conclusion from the " + eq
                + " interval against the same margin.");
        put.accept("Capability", "When limits are set: Pp and Ppk from the overall sd with the lower confidence "
                + "bound of Ppk (Bissell 1990); Cp and Cpk from the within-subgroup sd only with a subgroup column "
                + "(the estimator is named); expected parts per million outside each limit under a normal model. A "
                + "capability requirement is judged on the after group's lower bound of Ppk, not on the estimate."
                + (set.since(3) ? " A characteristic bounded at zero with an upper limit, one whose shape "
                + "departs strongly from normal, or one whose criteria name a family is judged by a fitted "
                + "distribution instead (lognormal, Weibull, gamma or Rayleigh by maximum likelihood, chosen by AIC "
                + "unless named; the normal model is kept within 2 of the lowest AIC): Pp and Ppk from its 0.135 %, "
                + "50 % and 99.865 % points (ISO 22514-2:2017 percentile method), ppm from its tails, and the lower "
                + "bound of Ppk by a parametric bootstrap with a recorded seed." : ""));
        if (set.since(4)) {
            // generation 4 states its control charts (earlier records keep the text they were signed with)
            put.accept("Stability", "Control charts in run order (ISO 7870-2:2013) with the limits of the before "
                    + "phase: individuals and moving ranges (\u03c3\u0302 = mean moving range / d\u2082), or with a "
                    + "subgroup column the subgroup means and standard deviations (\u03c3\u0302 = mean of s/c\u2084(n), "
                    + "each subgroup judged against the limits for its own size). Run order from "
                    + (set.stability().rowOrderIsRunOrder() ? "the sequence or date column, else the file's row order "
                            + "(the user said the rows are in run order)" : "the sequence or date column")
                    + "; tests " + set.stability().testWords() + " on the individuals or means chart, test 1 on the sd "
                    + "chart. A signal is a finding of the verdict; where the criteria require stability, a signal "
                    + "of the after phase fails the characteristic.");
        }
        if (plan.input.result().characteristics().stream().anyMatch(c -> c.settings().tolerance() != null)) {
            // only in a record whose criteria ask for a tolerance interval (earlier records keep their text)
            put.accept("Tolerance intervals", "Where the criteria ask for one: the interval that covers the stated "
                    + "proportion of parts with the stated confidence (ISO 16269-6:2014). Normal: x\u0304 \u00b1 k\u00b7s "
                    + "with the exact factor (one-sided: the noncentral t quantile; two-sided: the Odeh\u2013Owen "
                    + "integral); lognormal: the normal interval of the logarithms, transformed back; other fitted "
                    + "families: the smallest and largest values (Wilks 1941) with the confidence they reach. The after "
                    + "group's interval must lie inside the specification limits; one limit gives a one-sided bound.");
        }
        for (CharacteristicResult c : plan.input.result().characteristics()) {
            put.accept("Margin: " + c.name(), marginText(set, c));
        }
        if (set.exclusions().isEmpty()) {
            put.accept("Exclusions", "none");
        }
        for (Exclusion e : set.exclusions()) {
            put.accept("Exclusion " + e.reference(), (e.characteristic() == null ? "" : e.characteristic() + ": ")
                    + e.reason());
        }
        put.accept("Study record", "The canonical study record (JSON, with every raw value and its origin, the "
                + "settings and the signatures) is embedded in the hidden sheet of this workbook with its SHA-256 "
                + plan.input.sha256() + ".");
        RecordSeal seal = plan.input.seal();
        put.accept("Digital signature", seal == null ? "none (the record was not signed with a key)"
                : seal.algorithm() + " signature of the record; key fingerprint SHA-256 " + seal.keyFingerprint());
        put.accept("What this proves", honesty());
    }

    private static String marginText(AnalysisSettings set, CharacteristicResult c) {
        CharacteristicSettings s = c.settings();
        if (s.margin() == null) {
            return "not set: equivalence was not assessed";
        }
        String source = set.overrides().margin() != null ? "given on the command line for every characteristic"
                : set.perCharacteristic().get(c.name()) != null && set.perCharacteristic().get(c.name()).margin()
                        != null ? "from the per-characteristic settings file" : "study default";
        String units = c.margin() == null ? "" : c.margin().ratio() ? "; tested on the logarithms of the values (the "
                + "ratio of the geometric means)" : " = (" + (c.margin().lower() == null ? "none" : Texts.num(
                c.margin().lower())) + ", " + (c.margin().upper() == null ? "none" : Texts.num(c.margin().upper()))
                + ")" + (c.unit() == null ? "" : " " + c.unit());
        return s.margin().describe() + units + "; " + source + "; fixed before the data were seen, as the "
                + "cautions require.";
    }

    private void importReport() {
        Anchor a = plan.at(TemplateName.IMPORT_REPORT);
        SheetContent s = plan.sheet(TemplateName.IMPORT_REPORT);
        boolean two = plan.layout() >= 2;
        int[] widths = two ? new int[] {40, 10, 14, 22, 6, 14} : new int[] {34, 10, 14, 18, 12, 60};
        for (int i = 0; i < widths.length; i++) {
            s.width(a.column() + i, widths[i]);
        }
        int c = a.column();
        int r = a.row();
        s.text(r++, c, "Import report", Style.HEADING, "import heading");
        if (two) {
            // no blank column; the file's SHA-256 on a row of its own, so the page is read at a normal size
            header(s, r, c, "import inputs header", "File", "Role", "Sheet", "Layout", "", "");
            s.merge(r, r, c + 3, c + 5);
            r++;
            for (InputInfo in : plan.input.study().data().inputs()) {
                String w = "input " + in.file();
                s.text(r, c, in.file(), Style.CELL_WRAP, w + ": file");
                s.text(r, c + 1, nz(in.role()), Style.CELL, w + ": role");
                s.text(r, c + 2, nz(in.sheet()), Style.CELL, w + ": sheet");
                s.text(r, c + 3, in.layout() == null ? "" : in.layout().words(), Style.CELL, w + ": layout");
                s.text(r, c + 4, "", Style.CELL, w);
                s.text(r, c + 5, "", Style.CELL, w);
                s.merge(r, r, c + 3, c + 5);
                s.height(r, DetailPlan.lines(in.file(), 38) * 12f + 3);
                r++;
                s.text(r, c, "SHA-256 of the file", Style.LABEL, w + ": SHA-256 label");
                s.text(r, c + 1, nz(in.sha256()), Style.MONO, w + ": SHA-256");
                s.merge(r, r, c + 1, c + 5);
                r++;
            }
        } else {
            header(s, r++, c, "import inputs header", "File", "Role", "Sheet", "Layout", "", "SHA-256 of the file");
            for (InputInfo in : plan.input.study().data().inputs()) {
                String w = "input " + in.file();
                s.text(r, c, in.file(), Style.CELL, w + ": file");
                s.text(r, c + 1, nz(in.role()), Style.CELL, w + ": role");
                s.text(r, c + 2, nz(in.sheet()), Style.CELL, w + ": sheet");
                s.text(r, c + 3, in.layout() == null ? "" : in.layout().words(), Style.CELL, w + ": layout");
                s.text(r, c + 4, "", Style.CELL, w);
                s.text(r, c + 5, nz(in.sha256()), Style.MONO, w + ": SHA-256");
                r++;
            }
        }
        ImportReport rep = plan.input.study().data().report();
        r++;
        s.text(r, c, "Values used", Style.LABEL, "values used label");
        s.number(r++, c + 1, (double) rep.valuesUsed(), Style.INTEGER, 0, "values used");
        s.text(r, c, "Cells skipped", Style.LABEL, "cells skipped label");
        s.number(r++, c + 1, (double) rep.skippedTotal(), Style.INTEGER, 0, "cells skipped");
        r++;
        if (!rep.skipCounts().isEmpty()) {
            header(s, r++, c, "skip counts header", "Reason skipped", "Count");
            for (Map.Entry<org.holdpoint.study.SkipReason, Long> e : rep.skipCounts().entrySet()) {
                s.text(r, c, e.getKey().words(), Style.CELL, "skip reason " + e.getKey().words());
                s.number(r++, c + 1, (double) e.getValue(), Style.INTEGER, 0, "skip count " + e.getKey().words());
            }
            r++;
        }
        if (!rep.firstSkipped().isEmpty()) {
            s.text(r++, c, "Skipped cells" + (rep.skippedTotal() > rep.firstSkipped().size() ? " (the first "
                    + rep.firstSkipped().size() + ")" : ""), Style.LABEL, "skipped cells label");
            header(s, r, c, "skipped cells header", "File", "Sheet", "Cell", "Reason", two ? "Cell text" : "",
                    two ? "" : "Cell text");
            if (two) {
                s.merge(r, r, c + 4, c + 5);
            }
            r++;
            for (SkippedCell k : rep.firstSkipped()) {
                String w = "skipped " + k.origin().describe();
                s.text(r, c, k.origin().file(), two ? Style.CELL_WRAP : Style.CELL, w + ": file");
                s.text(r, c + 1, nz(k.origin().sheet()), Style.CELL, w + ": sheet");
                s.text(r, c + 2, k.origin().cell(), Style.CELL, w + ": cell");
                s.text(r, c + 3, k.reason().words(), Style.CELL, w + ": reason");
                if (two) {
                    s.text(r, c + 4, nz(k.text()), Style.CELL, w + ": text");
                    s.text(r, c + 5, "", Style.CELL, w);
                    s.merge(r, r, c + 4, c + 5);
                    s.height(r, DetailPlan.lines(k.origin().file(), 38) * 12f + 3);
                } else {
                    s.text(r, c + 4, "", Style.CELL, w);
                    s.text(r, c + 5, nz(k.text()), Style.CELL, w + ": text");
                }
                r++;
            }
            r++;
        }
        if (!rep.messages().isEmpty()) {
            s.text(r++, c, "Remarks of the import", Style.LABEL, "import remarks label");
            for (String m : rep.messages()) {
                s.text(r, c, m, Style.WRAP, "import remark");
                s.merge(r, r, c, c + 5);
                s.height(r, DetailPlan.lines(m, two ? 95 : 130) * 12f + 3);
                r++;
            }
        }
    }

    private static void header(SheetContent s, int r, int c, String what, String... labels) {
        for (int i = 0; i < labels.length; i++) {
            s.text(r, c + i, labels[i], Style.HEADER, what);
        }
    }

    private static String nz(String s) {
        return s == null ? "" : s;
    }

    private void cautions() {
        Anchor a = plan.at(TemplateName.CAUTIONS);
        SheetContent s = plan.sheet(TemplateName.CAUTIONS);
        for (int i = 0; i < 8; i++) {
            s.width(a.column() + i, 13);
        }
        int r = a.row();
        int c = a.column();
        s.text(r++, c, "Cautions", Style.HEADING, "cautions heading");
        s.height(r - 1, 20f);
        s.text(r, c, "These cautions belong to every result in this workbook.", Style.TEXT, "cautions intro");
        r += 2;
        List<String> text = Cautions.TEXT;
        for (String p : text) {
            s.text(r, c, p, Style.WRAP, "caution");
            s.merge(r, r, c, c + 7);
            s.height(r, DetailPlan.lines(p, 120) * 12f + 8);
            r++;
        }
    }

    private void signOff() {
        Anchor a = plan.at(TemplateName.SIGN_OFF);
        SheetContent s = plan.sheet(TemplateName.SIGN_OFF);
        int[] widths = {12, 24, 20, 20, 34, 22};
        for (int i = 0; i < widths.length; i++) {
            s.width(a.column() + i, widths[i]);
        }
        int c = a.column();
        int r = a.row();
        s.text(r++, c, "Sign-off", Style.HEADING, "sign-off heading");
        var result = plan.input.result();
        s.text(r++, c, "Change " + plan.input.study().change().id() + ": " + (result.changeVerified()
                ? "CHANGE VERIFIED" : "CHANGE NOT VERIFIED") + " \u2013 " + WorkbookPlan.detail(result)
                + " Read the Summary, the Details and the Cautions before signing.", Style.TEXT, "sign-off context");
        if (plan.layout() >= 2) {
            // what is signed, beside the signature rows: the part, its revision and the record's hash
            var change = plan.input.study().change();
            s.text(r++, c, "Part " + (change.partNumber().isBlank() ? "(not given)" : change.partNumber())
                    + ", revision " + (change.revision() == null || change.revision().isBlank() ? "(not given)"
                    : change.revision()) + ". The signatures below sign the study record with SHA-256 "
                    + plan.input.sha256() + ".", Style.WRAP, "sign-off record");
            s.merge(r - 1, r - 1, c, c + 5);
            s.height(r - 1, 26f);
        }
        r++;
        header(s, r, c, "sign-off header", "Stage", "Printed name", "Role", "Date and time", "Meaning of the "
                + "signature", "Signature");
        s.height(r++, 26f);
        Map<Signature.Stage, Signature> sigs = plan.signatures();
        for (Signature.Stage stage : Signature.Stage.values()) {
            Signature g = sigs.get(stage);
            String w = "sign-off " + stage.words();
            s.text(r, c, stage.words(), Style.HEADER, w + ": stage");
            if (g == null) {
                for (int i = 1; i <= 4; i++) {
                    s.text(r, c + i, "", Style.FILLABLE, w + ": " + SIGN_FIELDS[i - 1]);
                }
            } else {
                s.text(r, c + 1, g.name(), Style.CELL_WRAP, w + ": printed name");
                s.text(r, c + 2, nz(g.role()), Style.CELL_WRAP, w + ": role");
                s.text(r, c + 3, nz(g.timestamp()), Style.CELL_WRAP, w + ": date and time");
                s.text(r, c + 4, nz(g.meaning()), Style.CELL_WRAP, w + ": meaning");
            }
            s.text(r, c + 5, "", Style.FILLABLE, w + ": signature");
            s.height(r++, 34f);
        }
        r++;
        s.text(r, c, SIGN_MEANING, Style.WRAP, "sign-off meanings");
        s.merge(r, r, c, c + 5);
        s.height(r++, 40f);
        String note = "Entries typed into the empty fields after the workbook was written are not part of the "
                + "embedded record; 'holdpoint verify' lists them as added by hand. " + honesty();
        s.text(r, c, note, Style.NOTE, "sign-off statement");
        s.merge(r, r, c, c + 5);
        s.height(r, 66f);
    }

    private String honesty() {
        return plan.layout() >= 2 ? HONESTY_2 : HONESTY;
    }

    static final String[] SIGN_FIELDS = {"printed name", "role", "date and time", "meaning"};
}
