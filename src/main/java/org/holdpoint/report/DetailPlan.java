package org.holdpoint.report;

import java.util.List;
import org.holdpoint.stats.Descriptives;
import org.holdpoint.stats.EquivalenceResult;
import org.holdpoint.stats.TTestResult;
import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.result.Verdict;

/**
 * The detail sections: one printed page per characteristic with descriptives, criteria, the difference
 * test, the equivalence test, the spread checks, notes and the charts.
 */
final class DetailPlan {
    /** The end of a chart caption's label: its text is the chart's name, which verify does not compare. */
    static final String CAPTION = ": chart caption";

    /** Columns of a section: label, value, value, gap, label, value. */
    static final int[] WIDTHS = {34, 15, 15, 2, 32, 20};
    static final float ROW = 12.75f;
    static final int CHART_ROWS = 18;
    static final double CHART_WIDTH_POINTS = 250;
    private final WorkbookPlan plan;
    private final SheetContent s;
    private final int c0;

    DetailPlan(WorkbookPlan plan) {
        this.plan = plan;
        this.s = plan.sheet(TemplateName.DETAILS);
        this.c0 = plan.at(TemplateName.DETAILS).column();
    }

    void build() {
        for (int i = 0; i < WIDTHS.length; i++) {
            s.width(c0 + i, WIDTHS[i]);
        }
        int row = plan.at(TemplateName.DETAILS).row();
        int k = 1;
        for (CharacteristicResult c : plan.input.result().characteristics()) {
            if (k > 1) {
                s.rowBreaks.add(row - 1);
            }
            row = section(row, k++, c);
        }
    }

    private int section(int r, int index, CharacteristicResult c) {
        String n = c.name();
        int d = WorkbookPlan.statDecimals(plan.data(n));
        for (int i = 0; i < 37; i++) {
            s.height(r + i, ROW);
        }
        s.text(r, c0, index + ". " + n + (c.unit() == null ? "" : " (" + c.unit() + ")"), Style.HEADING,
                n + ": section title");
        s.merge(r, r, c0, c0 + 5);
        s.height(r, 20f);
        s.text(r + 1, c0, Texts.status(c.verdict().status()), Texts.style(c.verdict().status()), n + ": verdict");
        String reasons = c.verdict().reasons().isEmpty() ? "passed without remarks"
                : String.join("; ", c.verdict().reasons());
        s.text(r + 1, c0 + 1, reasons, Style.WRAP, n + ": verdict reasons");
        s.merge(r + 1, r + 1, c0 + 1, c0 + 5);
        s.height(r + 1, lines(reasons, 80) * 12f + 4);
        descriptives(r + 3, n, c, d);
        criteria(r + 3, n, c, d);
        if (c.verdict().status() == org.holdpoint.result.Verdict.Status.NOT_ASSESSABLE) {
            s.text(r + 13, c0, "No test was computed: the data of this characteristic cannot show a change (see the "
                    + "verdict above). The other characteristics were analysed.", Style.WRAP, n + ": not assessable");
            s.merge(r + 13, r + 13, c0, c0 + 5);
            s.height(r + 13, 28f);
            notes(r + 15, n, c);
            return r + 18;
        }
        difference(r + 13, n, c, d);
        equivalence(r + 13, n, c, d);
        spread(r + 23, n, c);
        design(r + 23, n, c);
        notes(r + 34, n, c);
        int row = r + 37;
        List<NamedImage> charts = plan.input.chartsOf(n);
        int count = plan.chartCount(n);
        if (plan.layout() >= 2) {
            return layout2(row, index, n, c, charts, count);
        }
        for (int i = 0; i < count; i += 2) {
            // the first page holds the blocks and one row of two charts; each further page three rows
            if (i >= 2 && (i - 2) % 6 == 0) {
                s.rowBreaks.add(row - 1);
            }
            for (int j = i; j < Math.min(i + 2, count); j++) {
                int col = c0 + (j % 2 == 0 ? 0 : 3);
                String caption = j < charts.size() ? charts.get(j).name() : "";
                s.captions.add(new ShownCell(row, col, caption, Style.LABEL, 0, n + CAPTION));
                if (j < charts.size()) {
                    s.images.add(new SheetContent.PlacedImage(charts.get(j), row + 1, col, CHART_WIDTH_POINTS));
                }
            }
            for (int k = 0; k < CHART_ROWS; k++) {
                s.height(row + k, ROW);
            }
            row += CHART_ROWS;
        }
        s.rowBreaks.add(row);
        return new ChecksPlan(plan, s, c0).section(row + 1, index, c);
    }

    /** Rows a full-width chart takes on the first page (its caption row included). */
    static final int WIDE_CHART_ROWS = 24;
    /** The width of the box plot on the first page, in points. */
    static final double WIDE_CHART_WIDTH_POINTS = 400;

    /**
     * Layout 2: the first page holds the numbers and the box plot (the first chart); the second the shape
     * and capability checks with the other charts two to a row below them. Captions say what a chart shows.
     */
    private int layout2(int row, int index, String n, CharacteristicResult c, List<NamedImage> charts, int count) {
        if (count > 0) {
            s.captions.add(new ShownCell(row, c0, caption(charts, 0, n, fittedFamily(c), means(c)), Style.LABEL, 0, n + CAPTION));
            if (!charts.isEmpty()) {
                s.images.add(new SheetContent.PlacedImage(charts.get(0), row + 1, c0, WIDE_CHART_WIDTH_POINTS));
            }
            for (int k = 0; k < WIDE_CHART_ROWS; k++) {
                s.height(row + k, ROW);
            }
            row += WIDE_CHART_ROWS;
        }
        s.rowBreaks.add(row);
        row = new ChecksPlan(plan, s, c0).section(row + 1, index, c);
        for (int i = 1; i < count; i += 2) {
            for (int j = i; j < Math.min(i + 2, count); j++) {
                int col = c0 + ((j - 1) % 2 == 0 ? 0 : 3);
                s.captions.add(new ShownCell(row, col, caption(charts, j, n, fittedFamily(c), means(c)), Style.LABEL, 0, n + CAPTION));
                if (j < charts.size()) {
                    s.images.add(new SheetContent.PlacedImage(charts.get(j), row + 1, col, CHART_WIDTH_POINTS));
                }
            }
            for (int k = 0; k < CHART_ROWS; k++) {
                s.height(row + k, ROW);
            }
            row += CHART_ROWS;
        }
        return row + 1;
    }

    private static boolean means(CharacteristicResult c) {
        return c.checks() != null && c.checks().stability() != null
                && c.checks().stability().kind() == org.holdpoint.stats.ControlChart.Kind.MEANS;
    }

    /**
     * A chart's caption in words, from the kind its file name ends with (the names are NNN-name-kind.png).
     *
     * @param charts the characteristic's charts
     * @param j      the chart's position
     * @param n      the characteristic's name
     * @return e.g. "Box plot of Bore diameter: before and after, every value shown"
     */
    static String caption(List<NamedImage> charts, int j, String n) {
        return caption(charts, j, n, null, false);
    }

    /** The family the charts draw when capability is judged by a fitted distribution, else null (normal). */
    static String fittedFamily(CharacteristicResult c) {
        var k = c.checks();
        if (k == null || k.before().percentile() == null || k.after().percentile() == null) {
            return null;
        }
        return k.after().percentile().fit().family().key();
    }

    /**
     * @param charts the characteristic's charts
     * @param j      the chart's position
     * @param n      the characteristic's name
     * @param family the fitted family the histogram and probability plot draw, or null for the normal model
     * @param means  whether the control chart is of subgroup means and sds
     * @return the caption
     */
    static String caption(List<NamedImage> charts, int j, String n, String family, boolean means) {
        String file = j < charts.size() ? charts.get(j).name() : "";
        String what;
        if (file.endsWith("-box.png")) {
            what = "Box plot of " + n + ": before and after, every value shown, with the specification limits";
        } else if (file.endsWith("-histogram.png")) {
            what = "Histograms on common bins, fitted " + (family == null ? "normal" : family) + " curve";
        } else if (file.endsWith("-control.png")) {
            what = (means ? "Charts of the subgroup means and sds of " : "Individuals chart of ") + n
                    + " in run order, with the limits of the before phase";
        } else if (file.endsWith("-normal-plot.png")) {
            what = family == null ? "Normal probability plot" : "Probability plot against the fitted " + family
                    + " distribution";
        } else {
            what = file.isEmpty() ? "" : "Chart of " + n + " (" + file + ")";
        }
        return what.isEmpty() ? "" : "Figure " + (j + 1) + ". " + what;
    }

    /** The notes heading at row r and the notes below it. */
    private void notes(int r, String n, CharacteristicResult c) {
        s.text(r, c0, "Notes", Style.HEADER, n + ": notes header");
        s.merge(r, r, c0, c0 + 5);
        List<String> list = plan.layout() >= 2 ? collapse(c.notes()) : c.notes();
        String notes = list.isEmpty() ? "none" : String.join("\n", list);
        s.text(r + 1, c0, notes, Style.WRAP, n + ": notes");
        s.merge(r + 1, r + 1, c0, c0 + 5);
        s.height(r + 1, lines(notes, 110) * 12f + 4);
    }

    /**
     * Notes said once: a "before …" and an "after …" note with the same words become one "before and after …".
     *
     * @param notes the notes
     * @return the notes without such repetition, in their order
     */
    static List<String> collapse(List<String> notes) {
        List<String> out = new java.util.ArrayList<>(notes);
        for (int i = 0; i < out.size(); i++) {
            String a = out.get(i);
            if (!a.startsWith("before ")) {
                continue;
            }
            String rest = a.substring("before ".length());
            int j = out.indexOf("after " + rest);
            if (j > i) {
                out.set(i, "before and after " + rest);
                out.remove(j);
            }
        }
        return out;
    }

    static int lines(String text, int perLine) {
        int lines = 0;
        for (String part : text.split("\n", -1)) {
            lines += Math.max(1, (part.length() + perLine - 1) / perLine);
        }
        return lines;
    }

    private void pair(int row, int col, String label, Double value, Style style, int d, String what) {
        s.text(row, col, label, Style.LABEL, what + " label");
        s.number(row, col + 1, value, style, d, what);
    }

    private void pairText(int row, int col, String label, String value, String what) {
        s.text(row, col, label, Style.LABEL, what + " label");
        s.text(row, col + 1, value, Style.CELL, what);
    }

    private void descriptives(int r, String n, CharacteristicResult c, int d) {
        s.text(r, c0, "Descriptive statistics", Style.HEADER, n + ": descriptives header");
        s.text(r, c0 + 1, "Before", Style.HEADER, n + ": before header");
        s.text(r, c0 + 2, "After", Style.HEADER, n + ": after header");
        Descriptives b = c.before();
        Descriptives a = c.after();
        int dd = WorkbookPlan.dataDecimals(plan.data(n));
        row(r + 1, "n", b == null ? 0.0 : b.n(), a == null ? 0.0 : a.n(), Style.INTEGER, 0, n + ": n");
        row(r + 2, "Mean", b == null ? null : b.mean(), a == null ? null : a.mean(), Style.NUMBER, d, n + ": mean");
        row(r + 3, "Standard deviation (n \u2212 1)", b == null ? null : WorkbookPlan.finite(b.sd()),
                a == null ? null : WorkbookPlan.finite(a.sd()), Style.NUMBER, d, n + ": sd");
        row(r + 4, "Median (quantile type 7)", b == null ? null : b.median(), a == null ? null : a.median(),
                Style.NUMBER, d, n + ": median");
        row(r + 5, "Minimum", b == null ? null : b.min(), a == null ? null : a.min(), Style.NUMBER, dd,
                n + ": minimum");
        row(r + 6, "Maximum", b == null ? null : b.max(), a == null ? null : a.max(), Style.NUMBER, dd,
                n + ": maximum");
    }

    private void row(int r, String label, Double before, Double after, Style style, int d, String what) {
        s.text(r, c0, label, Style.LABEL, what + " label");
        s.number(r, c0 + 1, before, style, d, what + " before");
        s.number(r, c0 + 2, after, style, d, what + " after");
    }

    private void criteria(int r, String n, CharacteristicResult c, int d) {
        int col = c0 + 4;
        CharacteristicSettings set = c.settings();
        s.text(r, col, "Criteria", Style.HEADER, n + ": criteria header");
        s.text(r, col + 1, "", Style.HEADER, n + ": criteria header");
        pairText(r + 1, col, "Unit", c.unit() == null ? "" : c.unit(), n + ": unit");
        pair(r + 2, col, "Lower specification limit (LSL)", set.spec().lsl(), Style.NUMBER, d, n + ": LSL");
        pair(r + 3, col, "Nominal", set.spec().nominal(), Style.NUMBER, d, n + ": nominal");
        pair(r + 4, col, "Upper specification limit (USL)", set.spec().usl(), Style.NUMBER, d, n + ": USL");
        s.text(r + 5, col, "Margin as set", Style.LABEL, n + ": margin as set label");
        s.text(r + 5, col + 1, set.margin() == null ? "not set" : set.margin().describe(), Style.CELL_WRAP,
                n + ": margin as set");
        s.height(r + 5, 24f);
        boolean ratio = c.margin() != null && c.margin().ratio();
        pair(r + 6, col, ratio ? "Margin L (ratio after/before)" : "Margin L (in units)", c.margin() == null ? null
                : c.margin().lower(), Style.NUMBER, ratio ? 4 : d, n + ": margin L");
        pair(r + 7, col, ratio ? "Margin U (ratio after/before)" : "Margin U (in units)", c.margin() == null ? null
                : c.margin().upper(), Style.NUMBER, ratio ? 4 : d, n + ": margin U");
        pair(r + 8, col, "Sd growth limit (sd after / sd before)", set.sdGrowthLimit(), Style.NUMBER, 3,
                n + ": sd growth limit");
    }

    private void difference(int r, String n, CharacteristicResult c, int d) {
        TTestResult t = c.decidingTest();
        s.text(r, c0, "Difference test (two-sided)", Style.HEADER, n + ": difference header");
        s.text(r, c0 + 1, "", Style.HEADER, n + ": difference header");
        s.text(r + 1, c0, "Method", Style.LABEL, n + ": difference method label");
        s.text(r + 1, c0 + 1, t.method().description(), Style.CELL_WRAP, n + ": difference method");
        s.text(r + 1, c0 + 2, "", Style.CELL_WRAP, n + ": difference method");
        s.merge(r + 1, r + 1, c0 + 1, c0 + 2);
        s.height(r + 1, 24f);
        pair(r + 2, c0, "Difference (after \u2212 before)", t.estimate(), Style.NUMBER, d, n + ": difference");
        pair(r + 3, c0, "Standard error", WorkbookPlan.finite(t.se()), Style.NUMBER, d, n + ": standard error");
        pair(r + 4, c0, "t", WorkbookPlan.finite(t.t()), Style.NUMBER, 4, n + ": t");
        pair(r + 5, c0, "Degrees of freedom", WorkbookPlan.finite(t.df()), Style.NUMBER, 2, n + ": df");
        pair(r + 6, c0, "p (no difference)", t.p(), Style.P_VALUE, 0, n + ": difference p");
        String lvl = Texts.percent(t.confidenceLevel());
        pair(r + 7, c0, lvl + " CI lower", WorkbookPlan.finite(t.ciLower()), Style.NUMBER, d, n + ": CI lower");
        pair(r + 8, c0, lvl + " CI upper", WorkbookPlan.finite(t.ciUpper()), Style.NUMBER, d, n + ": CI upper");
        if (c.holmP() != null) {
            pair(r + 9, c0, "Holm-adjusted p", c.holmP(), Style.P_VALUE, 0, n + ": Holm p");
        }
    }

    private void equivalence(int r, String n, CharacteristicResult c, int d) {
        int col = c0 + 4;
        EquivalenceResult e = c.decidingTost();
        s.text(r, col, "Equivalence (two one-sided tests)", Style.HEADER, n + ": equivalence header");
        s.text(r, col + 1, "", Style.HEADER, n + ": equivalence header");
        if (e == null) {
            pairText(r + 1, col, "Conclusion", "not assessed (no margin set)", n + ": equivalence conclusion");
            return;
        }
        pairText(r + 1, col, "Conclusion", e.conclusion().words(), n + ": equivalence conclusion");
        pair(r + 2, col, "p of H0: \u03b4 \u2264 L", e.pLower(), Style.P_VALUE, 0, n + ": TOST lower p");
        pair(r + 3, col, "p of H0: \u03b4 \u2265 U", e.pUpper(), Style.P_VALUE, 0, n + ": TOST upper p");
        pair(r + 4, col, "TOST p (the larger)", e.p(), Style.P_VALUE, 0, n + ": TOST p");
        String lvl = Texts.percent(e.level()) + (e.ratio() ? " CI of the ratio" : " CI");
        pair(r + 5, col, lvl + " lower", WorkbookPlan.finite(e.ciLower()), Style.NUMBER, e.ratio() ? 4 : d,
                n + ": equivalence CI lower");
        pair(r + 6, col, lvl + " upper", WorkbookPlan.finite(e.ciUpper()), Style.NUMBER, e.ratio() ? 4 : d,
                n + ": equivalence CI upper");
        pair(r + 7, col, "Degrees of freedom", WorkbookPlan.finite(e.df()), Style.NUMBER, 2, n + ": TOST df");
        EquivalenceResult pooled = c.tostPooled();
        if (pooled != null && pooled != e) {
            pairText(r + 8, col, "Pooled-based conclusion", pooled.conclusion().words(),
                    n + ": pooled equivalence conclusion");
        } else if (c.tost() != null && c.tost() != e) {
            pairText(r + 8, col, "Welch-based conclusion", c.tost().conclusion().words(),
                    n + ": Welch equivalence conclusion");
        }
    }

    private void spread(int r, String n, CharacteristicResult c) {
        s.text(r, c0, "Spread", Style.HEADER, n + ": spread header");
        s.text(r, c0 + 1, "", Style.HEADER, n + ": spread header");
        var v = c.variance();
        pair(r + 1, c0, "Variance ratio (after / before)", v == null ? null : v.ratio(), Style.NUMBER, 4,
                n + ": variance ratio");
        pair(r + 2, c0, (v == null ? "F-test" : v.method().words()) + " p (two-sided)", v == null ? null : v.p(),
                Style.P_VALUE, 0, n + ": F-test p");
        String lvl = Texts.percent(1 - plan.alpha);
        pair(r + 3, c0, lvl + " CI of the ratio, lower", v == null ? null : v.ciLower(), Style.NUMBER, 4,
                n + ": variance ratio CI lower");
        pair(r + 4, c0, lvl + " CI of the ratio, upper", v == null ? null : v.ciUpper(), Style.NUMBER, 4,
                n + ": variance ratio CI upper");
        var l = c.levene();
        pair(r + 5, c0, "Brown\u2013Forsythe F", l == null ? null : l.f(), Style.NUMBER, 4, n + ": Brown-Forsythe F");
        pair(r + 6, c0, "Brown\u2013Forsythe p", l == null ? null : l.p(), Style.P_VALUE, 0,
                n + ": Brown-Forsythe p");
        var g = c.sdGrowth();
        pair(r + 7, c0, "Sd ratio (after / before)", g == null ? null : g.sdRatio(), Style.NUMBER, 4,
                n + ": sd ratio");
        pair(r + 8, c0, (g == null ? "" : Texts.percent(g.level()) + " ") + "upper bound of the sd ratio",
                g == null ? null : g.upperBound(), Style.NUMBER, 4, n + ": sd ratio upper bound");
        pairText(r + 9, c0, "Sd growth limit", WorkbookPlan.sdGrowth(c, plan.layout()), n + ": sd growth result");
        s.text(r + 9, c0 + 2, "", Style.CELL, n + ": sd growth result");
        s.merge(r + 9, r + 9, c0 + 1, c0 + 2);
    }

    private void design(int r, String n, CharacteristicResult c) {
        int col = c0 + 4;
        s.text(r, col, "Design", Style.HEADER, n + ": design header");
        s.text(r, col + 1, "", Style.HEADER, n + ": design header");
        pairText(r + 1, col, "Samples", c.paired() ? "paired (same units)" : "independent", n + ": design");
        pairText(r + 2, col, "Verdict rests on", c.method().name().toLowerCase(java.util.Locale.ROOT) + " t",
                n + ": deciding method");
    }
}
