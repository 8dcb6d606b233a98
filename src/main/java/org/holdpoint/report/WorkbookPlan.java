package org.holdpoint.report;

import java.math.BigDecimal;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.holdpoint.stats.EquivalenceResult;
import org.holdpoint.study.ChangeDescription;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.study.Signature;
import org.holdpoint.result.StudyResult;
import org.holdpoint.result.Verdict;

/**
 * Where every shown value of a sign-off workbook goes, given the template's anchors. The writer writes
 * this plan; the verifier builds it again from a fresh computation and compares it with the file.
 */
final class WorkbookPlan {
    static final String[] SUMMARY_HEADERS = {"#", "Characteristic", "Unit", "n before / after", "Mean before",
        "Mean after", "Difference (after \u2212 before)", "%s CI of the difference", "Margin (L, U)",
        "%s CI (equivalence)", "Equivalence conclusion", "Variance ratio (after / before)", "F-test p",
        "Brown\u2013Forsythe p", "Sd growth", "Capability: after-group Ppk lower bound vs required", "Verdict"};
    static final int[] SUMMARY_WIDTHS = {3, 22, 5, 8, 10, 10, 10, 22, 21, 22, 13, 9, 8, 10, 27, 20, 15};
    /** The widest a Summary column grows to fit its content (longer text wraps or is cut). */
    static final int MAX_SUMMARY_WIDTH = 44;

    final ReportInput input;
    final Map<TemplateName, Anchor> anchors;
    final Map<String, SheetContent> sheets = new LinkedHashMap<>();
    final double alpha;
    private final Map<String, Integer> chartCounts;

    private final int layout;

    private WorkbookPlan(ReportInput input, Map<TemplateName, Anchor> anchors, Map<String, Integer> chartCounts,
            int layout) {
        this.layout = layout;
        this.input = input;
        this.anchors = anchors;
        this.chartCounts = chartCounts;
        this.alpha = input.study().settings().alpha();
    }

    /**
     * The plan of a workbook.
     *
     * @param input   what to show
     * @param anchors where the template's names point
     * @param chartCounts the number of charts per characteristic as laid out (null: count the input's charts)
     * @param layout      the layout to plan (the one written now, or the one a workbook being verified names)
     * @return the plan (the raw data rows are produced separately by {@link RawDataRows})
     */
    static WorkbookPlan of(ReportInput input, Map<TemplateName, Anchor> anchors, Map<String, Integer> chartCounts,
            int layout) {
        if (layout != 1 && layout != 2) {
            throw new ReportException("unknown workbook layout %d", layout);
        }
        WorkbookPlan p = new WorkbookPlan(input, anchors, chartCounts, layout);
        p.header();
        if (layout == 1) {
            p.summary();
        } else {
            p.summary2();
        }
        new DetailPlan(p).build();
        new TextBlocks(p).build();
        p.rawHeader();
        return p;
    }

    /** @return the layout being planned (1 or 2, see {@link RecordSheet#FORMAT}) */
    int layout() {
        return layout;
    }

    int chartCount(String characteristic) {
        return chartCounts != null ? chartCounts.getOrDefault(characteristic, 0)
                : input.chartsOf(characteristic).size();
    }

    SheetContent sheet(TemplateName name) {
        return sheets.computeIfAbsent(anchors.get(name).sheet(), SheetContent::new);
    }

    Anchor at(TemplateName name) {
        return anchors.get(name);
    }

    private void single(TemplateName name, String value, Style style) {
        Anchor a = at(name);
        sheet(name).text(a.row(), a.column(), value == null ? "" : value, style, name.description());
    }

    private void header() {
        ChangeDescription c = input.study().change();
        single(TemplateName.CHANGE_ID, c.id(), Style.HEADING);
        single(TemplateName.TITLE, c.title(), Style.TEXT);
        single(TemplateName.KIND, c.kind().words(), Style.TEXT);
        single(TemplateName.PART_NUMBER, c.partNumber(), Style.TEXT);
        single(TemplateName.REVISION, c.revision(), Style.TEXT);
        single(TemplateName.REASON, c.reason(), Style.TEXT);
        single(TemplateName.REQUESTER, c.requester(), Style.TEXT);
        single(TemplateName.REQUEST_DATE, c.requestDate(), Style.TEXT);
        single(TemplateName.STUDY_DATE, c.studyDate(), Style.TEXT);
        single(TemplateName.GENERATED_AT, input.generatedAt(), Style.TEXT);
        StudyResult r = input.result();
        Verdict.Status overall = r.changeVerified() ? Verdict.Status.PASSED : Verdict.Status.FAILED;
        single(TemplateName.OVERALL_MARK, Texts.mark(overall), overall == Verdict.Status.PASSED ? Style.MARK_PASSED
                : Style.MARK_FAILED);
        single(TemplateName.OVERALL_VERDICT, r.changeVerified() ? "CHANGE VERIFIED" : "CHANGE NOT VERIFIED",
                Style.VERDICT);
        single(TemplateName.OVERALL_DETAIL, detail(r), Style.TEXT);
        single(TemplateName.RECORD_HASH, "SHA-256 " + input.sha256(), Style.MONO);
    }

    /** The overall sentence without the verdict words that the verdict cell already shows. */
    static String detail(StudyResult r) {
        String s = r.summary();
        int colon = s.indexOf(": ");
        return colon > 0 && s.substring(0, colon).startsWith("CHANGE") ? s.substring(colon + 2) : s;
    }

    private void summary() {
        Anchor a = at(TemplateName.SUMMARY_TABLE);
        SheetContent s = sheet(TemplateName.SUMMARY_TABLE);
        String ci = Texts.percent(1 - alpha);
        String eq = Texts.percent(1 - 2 * alpha);
        int r0 = a.row();
        int c0 = a.column();
        String[] headers = SUMMARY_HEADERS;
        int[] widths = SUMMARY_WIDTHS;
        for (int i = 0; i < headers.length; i++) {
            String h = headers[i];
            h = i == 7 ? String.format(Locale.ROOT, h, ci) : i == 9 ? String.format(Locale.ROOT, h, eq) : h;
            h = i == 15 && anyTolerance() ? h + "; tolerance interval (after) vs limits" : h;
            s.text(r0, c0 + i, h, Style.HEADER, "summary table header");
            s.width(c0 + i, widths[i]);
        }
        s.height(r0, 40f);
        s.printTitleRows = new int[] {r0, r0};
        int row = r0 + 1;
        int k = 1;
        for (CharacteristicResult c : input.result().characteristics()) {
            summaryRow(s, row++, c0, k++, c);
        }
        int[] need = contentWidths(s, r0, Integer.MAX_VALUE, c0, widths);
        for (int i = 0; i < need.length; i++) {
            s.width(c0 + i, need[i]);
        }
        // a name longer than its column wraps: its row gets the height of its lines (9-point text)
        int r = r0 + 1;
        for (CharacteristicResult c : input.result().characteristics()) {
            int lines = (int) Math.ceil(c.name().length() / (double) Math.max(1, need[1] - 2));
            if (lines > 1) {
                s.height(r, 11.5f * lines + 2f);
            }
            r++;
        }
        String legend = "Marks: " + Texts.status(Verdict.Status.PASSED) + " \u00b7 " + Texts.status(
                Verdict.Status.FAILED) + " \u00b7 " + Texts.status(Verdict.Status.INCONCLUSIVE) + " \u00b7 "
                + Texts.status(Verdict.Status.NOT_ASSESSED) + ". Difference = after \u2212 before. Difference "
                + "intervals are " + ci + ", equivalence intervals " + eq + " (two one-sided tests at \u03b1 = "
                + Texts.num(alpha) + "). Capability: the after group's lower confidence bound of Ppk against the "
                + "required value. An empty cell means the value does not apply or is undefined; the "
                + "Details sheet says why.";
        s.text(row + 1, c0, legend, Style.NOTE, "summary legend");
        s.merge(row + 1, row + 1, c0, c0 + headers.length - 1);
        s.height(row + 1, 26f);
    }

    /**
     * The widths a table's columns need for their content (a long name, a wide interval, sizes of four digits), so
     * that nothing is cut or shown as ### when printed; a column never narrows, and grows to at most
     * {@link #MAX_SUMMARY_WIDTH}.
     *
     * @param s      the sheet
     * @param r0     the table's header row (its cells are not measured)
     * @param rEnd   the row after the table's last
     * @param c0     the table's first column
     * @param widths the columns' widths as laid out
     * @return the widths needed
     */
    private static int[] contentWidths(SheetContent s, int r0, int rEnd, int c0, int[] widths) {
        int[] need = widths.clone();
        for (ShownCell cell : s.cells) {
            int i = cell.column() - c0;
            if (cell.row() > r0 && cell.row() < rEnd && i >= 0 && i < need.length && cell.value() != null) {
                int len = cell.value() instanceof String t ? t.length() : String.format(Locale.ROOT, "%." + cell
                        .decimals() + "f", (Double) cell.value()).length();
                need[i] = Math.max(need[i], Math.min(MAX_SUMMARY_WIDTH, len + 2));
            }
        }
        return need;
    }

    /**
     * The first seven cells of a characteristic's Summary row, the same in both layouts: index, name, unit, n,
     * the two means and the difference.
     *
     * @return the deciding difference test, or null
     */
    private static org.holdpoint.stats.TTestResult leadingCells(SheetContent s, int row, int c0, int index,
            CharacteristicResult c, int d) {
        String n = c.name();
        s.number(row, c0, (double) index, Style.INTEGER, 0, n + ": index");
        s.text(row, c0 + 1, n, Style.CELL_WRAP, n + ": name");
        s.text(row, c0 + 2, c.unit() == null ? "" : c.unit(), Style.CELL, n + ": unit");
        s.text(row, c0 + 3, (c.before() == null ? 0 : c.before().n()) + " / " + (c.after() == null ? 0 : c.after().n()),
                Style.CELL, n + ": n before / after");
        s.number(row, c0 + 4, c.before() == null ? null : c.before().mean(), Style.NUMBER, d, n + ": mean before");
        s.number(row, c0 + 5, c.after() == null ? null : c.after().mean(), Style.NUMBER, d, n + ": mean after");
        var t = c.decidingTest();
        s.number(row, c0 + 6, t == null ? null : t.estimate(), Style.NUMBER, d, n + ": difference");
        return t;
    }

    private void summaryRow(SheetContent s, int row, int c0, int index, CharacteristicResult c) {
        int d = statDecimals(data(c.name()));
        String n = c.name();
        var t = leadingCells(s, row, c0, index, c, d);
        s.text(row, c0 + 7, t == null ? "" : interval(t.ciLower(), t.ciUpper(), d), Style.CELL,
                n + ": CI of the difference");
        s.text(row, c0 + 8, c.margin() == null ? "not set" : margin(c.margin(), d), Style.CELL, n + ": margin");
        EquivalenceResult eq = c.decidingTost();
        s.text(row, c0 + 9, eq == null ? "" : equivalenceInterval(eq, d), Style.CELL, n + ": equivalence CI");
        s.text(row, c0 + 10, c.verdict().status() == org.holdpoint.result.Verdict.Status.NOT_ASSESSABLE
                ? "not assessable" : eq == null ? "not assessed" : eq.conclusion().words(), Style.CELL,
                n + ": equivalence conclusion");
        s.number(row, c0 + 11, c.variance() == null ? null : c.variance().ratio(), Style.NUMBER, 3,
                n + ": variance ratio");
        s.number(row, c0 + 12, c.variance() == null ? null : c.variance().p(), Style.P_VALUE, 0, n + ": F-test p");
        s.number(row, c0 + 13, c.levene() == null ? null : c.levene().p(), Style.P_VALUE, 0,
                n + ": Brown-Forsythe p");
        s.text(row, c0 + 14, sdGrowth(c), Style.CELL, n + ": sd growth");
        s.text(row, c0 + 15, capability(c), c.settings().tolerance() != null ? Style.CELL_WRAP : Style.CELL,
                n + ": capability");
        s.text(row, c0 + 16, Texts.status(c.verdict().status()), Texts.style(c.verdict().status()),
                n + ": verdict");
    }

    /** Layout 2, the means: ten columns, intervals on two lines, so that the page prints near 100 %. */
    static final String[] MEANS_HEADERS = {"#", "Characteristic", "Unit", "n before / after", "Mean before",
        "Mean after", "Difference (after \u2212 before)", "Margin (L, U)", "%s interval (equivalence)",
        "Mean: equivalence"};
    static final int[] MEANS_WIDTHS = {3, 18, 5, 8, 10, 10, 10, 13, 13, 13};
    /** Layout 2, spread, capability and the verdict: merged over the same columns (first column of each). */
    static final String[] VERDICT_HEADERS = {"#", "Characteristic", "Spread: sd ratio bound vs limit",
        "Capability: Ppk bound (after) vs required", "Verdict", "Decided by"};
    private static final int[][] VERDICT_SPANS = {{0, 0}, {1, 1}, {2, 4}, {5, 6}, {7, 7}, {8, 9}};

    /**
     * Layout 2: the Summary as two tables one above the other, the means and then the other criteria with the
     * verdict, each no wider than a landscape page at about 100 %; the columns of the header block at the right
     * are narrow.
     */
    private void summary2() {
        Anchor a = at(TemplateName.SUMMARY_TABLE);
        SheetContent s = sheet(TemplateName.SUMMARY_TABLE);
        String eq = Texts.percent(1 - 2 * alpha);
        int r0 = a.row();
        int c0 = a.column();
        for (int i = 0; i < MEANS_HEADERS.length; i++) {
            s.text(r0, c0 + i, i == 8 ? String.format(Locale.ROOT, MEANS_HEADERS[i], eq) : MEANS_HEADERS[i],
                    Style.HEADER, "summary table header");
            s.width(c0 + i, MEANS_WIDTHS[i]);
        }
        // the header block's columns beside the tables (part number and the like sit in columns M and O)
        int[] rest = {2, 2, 13, 2, 16};
        for (int i = 0; i < rest.length; i++) {
            s.width(c0 + MEANS_HEADERS.length + i, rest[i]);
        }
        s.height(r0, 40f);
        int row = r0 + 1;
        int k = 1;
        List<CharacteristicResult> all = input.result().characteristics();
        for (CharacteristicResult c : all) {
            meansRow(s, row++, c0, k++, c);
        }
        // the means table's cells are single-line numbers and sizes (names and intervals wrap): widen the sizes'
        // and numbers' columns to their content, e.g. "1499 / 1500"
        int[] measured = contentWidths(s, r0, row, c0, MEANS_WIDTHS);
        for (int i : new int[] {3, 4, 5, 6}) {
            s.width(c0 + i, measured[i]);
        }
        // the second table starts on a page of its own unless both fit under the header block (about 330 pt of
        // rows on a landscape A4 page): a table is never split from its header row by the page end
        float used = 0;
        for (int r = r0; r < row; r++) {
            used += s.rowHeights.getOrDefault(r, 15f);
        }
        if (used + 60 + 20f * all.size() > 330f) {
            s.rowBreaks.add(row);
        }
        row++;
        s.text(row, c0, "Spread, capability and the verdict", Style.LABEL, "summary verdict table title");
        row++;
        for (int i = 0; i < VERDICT_HEADERS.length; i++) {
            // with a tolerance-interval criterion in the study its column names it too
            spanned(s, row, c0, i, i == 3 && anyTolerance() ? "Capability and tolerance interval (after) vs "
                    + "requirements" : VERDICT_HEADERS[i], Style.HEADER, "summary verdict header");
        }
        s.height(row, anyTolerance() ? 42f : 28f);
        row++;
        k = 1;
        // the verdict's cell lies in one column of the means table: wide enough for the longest mark shown (bold,
        // e.g. "not assessable" with its sign), which the interval column's width did not always give
        int verdictColumn = c0 + VERDICT_SPANS[4][0];
        int verdictWidth = MEANS_WIDTHS[VERDICT_SPANS[4][0]];
        for (CharacteristicResult c : all) {
            verdictWidth = Math.max(verdictWidth, Texts.status(c.verdict().status()).length() + 3);
        }
        s.width(verdictColumn, Math.max(verdictWidth, s.columnWidths.getOrDefault(verdictColumn, 0) / 256));
        for (CharacteristicResult c : all) {
            String n = c.name();
            s.number(row, c0, (double) k++, Style.INTEGER, 0, n + ": verdict table index");
            spanned(s, row, c0, 1, n, Style.CELL_WRAP, n + ": verdict table name");
            spanned(s, row, c0, 2, sdGrowth(c, 2), Style.CELL, n + ": sd growth");
            // a tolerance-interval criterion adds its words to the capability cell, which then wraps
            boolean tol = c.settings().tolerance() != null;
            spanned(s, row, c0, 3, capability(c), tol ? Style.CELL_WRAP : Style.CELL, n + ": capability");
            spanned(s, row, c0, 4, Texts.status(c.verdict().status()), Texts.style(c.verdict().status()),
                    n + ": verdict");
            spanned(s, row, c0, 5, decidedBy(c), Style.CELL_WRAP, n + ": decided by");
            s.height(row, Math.max(tol ? 4 * 11.5f + 3f : 14f, 11.5f * (int) Math.ceil(n.length() / 16.0) + 3f));
            row++;
        }
        String legend = "Marks: " + Texts.status(Verdict.Status.PASSED) + " \u00b7 " + Texts.status(
                Verdict.Status.FAILED) + " \u00b7 " + Texts.status(Verdict.Status.INCONCLUSIVE) + " \u00b7 "
                + Texts.status(Verdict.Status.NOT_ASSESSED) + ". Difference = after \u2212 before. Equivalence "
                + "intervals " + eq + " (two one-sided tests at \u03b1 = " + Texts.num(alpha) + "). Spread: the "
                + "upper confidence bound of sd(after)/sd(before) against the limit. Capability: the after "
                + "group's lower confidence bound of Ppk against the required value. An empty cell means the "
                + "value does not apply or is undefined; the Details sheet gives every number and why.";
        s.text(row + 1, c0, legend, Style.NOTE, "summary legend");
        s.merge(row + 1, row + 1, c0, c0 + MEANS_HEADERS.length - 1);
        s.height(row + 1, 52f);
    }

    /** A cell of the verdict table, merged over its span, the other cells of the span written empty. */
    private static void spanned(SheetContent s, int row, int c0, int i, String text, Style style, String what) {
        int from = c0 + VERDICT_SPANS[i][0];
        int to = c0 + VERDICT_SPANS[i][1];
        if (text != null) {
            s.text(row, from, text, style, what);
        }
        for (int c = from + 1; c <= to; c++) {
            s.text(row, c, "", style, what);
        }
        if (to > from && text != null) {
            s.merge(row, row, from, to);
        }
    }

    private void meansRow(SheetContent s, int row, int c0, int index, CharacteristicResult c) {
        int d = statDecimals(data(c.name()));
        String n = c.name();
        var t = leadingCells(s, row, c0, index, c, d);
        s.text(row, c0 + 7, c.margin() == null ? "not set" : margin(c.margin(), d), Style.CELL_WRAP, n + ": margin");
        EquivalenceResult eq = c.decidingTost();
        s.text(row, c0 + 8, eq == null ? "" : equivalenceInterval(eq, d), Style.CELL_WRAP, n + ": equivalence CI");
        s.text(row, c0 + 9, c.verdict().status() == org.holdpoint.result.Verdict.Status.NOT_ASSESSABLE
                ? "not assessable" : eq == null ? "not assessed" : eq.conclusion().words(), Style.CELL_WRAP,
                n + ": equivalence conclusion");
        // an interval wraps after its comma: two lines; a long name more
        s.height(row, Math.max(25f, 11.5f * (int) Math.ceil(n.length() / 16.0) + 3f));
    }

    /**
     * The criteria that decided a characteristic's verdict, in words: those that failed, or what was missing.
     *
     * @param c the result
     * @return e.g. "spread; capability", "mean (inconclusive)", "all criteria met"
     */
    static String decidedBy(CharacteristicResult c) {
        Verdict.Status st = c.verdict().status();
        if (st == Verdict.Status.NOT_ASSESSABLE) {
            return "data cannot show a change";
        }
        List<String> failed = new java.util.ArrayList<>();
        EquivalenceResult eq = c.decidingTost();
        if (eq == null) {
            failed.add("no margin set");
        } else if (!eq.conclusion().claimHolds()) {
            failed.add("mean (" + eq.conclusion().words() + ")");
        }
        if (c.spreadFailed()) {
            failed.add("spread");
        }
        if (c.capabilityFailed()) {
            failed.add("capability");
        }
        if (c.toleranceFailed()) {
            failed.add("tolerance interval");
        }
        if (c.stabilityFailed()) {
            failed.add("stability");
        } else if (c.stabilityNotShown()) {
            failed.add("stability not shown");
        }
        return failed.isEmpty() ? "all criteria met" : String.join("; ", failed);
    }

    /**
     * An interval as text with fixed decimals; an absent bound is "none", an undefined one "undefined".
     *
     * @param lower    the lower end or null
     * @param upper    the upper end or null
     * @param decimals decimals
     * @return e.g. "(-0.00044, 0.00074)"
     */
    static String interval(Double lower, Double upper, int decimals) {
        return "(" + fixed(lower, decimals) + ", " + fixed(upper, decimals) + ")";
    }

    /** A margin's bounds: in units with the characteristic's decimals, a ratio margin as "ratio (0.8, 1.25)". */
    static String margin(org.holdpoint.stats.Margin m, int decimals) {
        return m.ratio() ? "ratio " + interval(m.lower(), m.upper(), 4) : interval(m.lower(), m.upper(), decimals);
    }

    /** An equivalence interval: in units, or as a ratio after/before with four decimals. */
    static String equivalenceInterval(EquivalenceResult eq, int decimals) {
        return eq.ratio() ? "ratio " + interval(eq.ciLower(), eq.ciUpper(), 4)
                : interval(eq.ciLower(), eq.ciUpper(), decimals);
    }

    static String fixed(Double v, int decimals) {
        if (v == null) {
            return "none";
        }
        if (!Double.isFinite(v)) {
            return "undefined";
        }
        return String.format(Locale.ROOT, "%." + decimals + "f", v).replace('-', '\u2212');
    }

    static String sdGrowth(CharacteristicResult c) {
        return sdGrowth(c, 1);
    }

    /**
     * @param c      the result
     * @param layout 1: the bound to six significant digits (as written until layout 2); 2: three decimals
     * @return the sd-growth cell
     */
    static String sdGrowth(CharacteristicResult c, int layout) {
        var g = c.sdGrowth();
        if (layout >= 2 && g != null) {
            return (g.met() ? "met: " : "not met: ") + fixed(g.upperBound(), 3) + (g.met() ? " < " : " \u2265 ")
                    + Texts.num(g.limit());
        }
        if (g == null) {
            return "no limit set";
        }
        return (g.met() ? "met: " : "not met: ") + "bound " + Texts.num(g.upperBound()) + (g.met() ? " < " : " \u2265 ")
                + Texts.num(g.limit());
    }

    /**
     * The Summary's capability cell: the after group's lower confidence bound of Ppk against the requirement.
     *
     * @param c the result
     * @return e.g. "met: 1.520 > 1.33", or "" without specification limits
     */
    /** @return whether any characteristic's criteria ask for a tolerance interval (docs/methods.md §17) */
    private boolean anyTolerance() {
        return input.result().characteristics().stream().anyMatch(c -> c.settings().tolerance() != null);
    }

    static String capability(CharacteristicResult c) {
        String cap = ppkCell(c);
        var t = c.settings().tolerance();
        if (t == null || c.checks() == null) {
            return cap;
        }
        // the tolerance-interval criterion sits with the capability it belongs to (only in records that set one)
        String tol = "tolerance interval " + t.words() + ": " + c.toleranceState().words();
        return cap.isEmpty() ? tol : cap + "; " + tol;
    }

    private static String ppkCell(CharacteristicResult c) {
        var k = c.checks();
        if (k == null || k.after() == null || !k.after().hasCapability()) {
            return "";
        }
        Double req = c.settings().capabilityRequirement();
        Double lb = k.after().ppkLower();
        if (lb == null || !Double.isFinite(lb)) {
            return "undefined (see Details)";
        }
        if (req == null) {
            return fixed(lb, 3) + " (no requirement)";
        }
        Boolean met = k.capabilityMet();
        if (met == null) {
            return "not judged (see Details)";
        }
        return (met ? "met: " : "not met: ") + fixed(lb, 3) + (met ? " > " : " \u2264 ") + Texts.num(req);
    }

    private void rawHeader() {
        Anchor a = at(TemplateName.RAW_DATA);
        SheetContent s = sheet(TemplateName.RAW_DATA);
        for (int i = 0; i < RawDataRows.HEADERS.length; i++) {
            s.text(a.row(), a.column() + i, RawDataRows.HEADERS[i], Style.HEADER, "raw data header");
            s.width(a.column() + i, RawDataRows.WIDTHS[i]);
        }
        s.height(a.row(), 28f);
        s.printTitleRows = new int[] {a.row(), a.row()};
    }

    CharacteristicData data(String name) {
        for (CharacteristicData c : input.study().data().characteristics()) {
            if (c.name().equals(name)) {
                return c;
            }
        }
        return null;
    }

    /**
     * The decimals of the raw values: the common decimal scale of the data (at most 8), read from the first values.
     *
     * @param c the data, or null
     * @return 0..8
     */
    static int dataDecimals(CharacteristicData c) {
        return c == null ? 4 : c.resolutionDecimals();
    }

    /**
     * @param c the data
     * @return decimals for means, differences and intervals: two more than the data's
     */
    static int statDecimals(CharacteristicData c) {
        return Math.min(10, dataDecimals(c) + 2);
    }

    static Double finite(double v) {
        return Double.isFinite(v) ? v : null;
    }

    /** @return the latest signature of each stage, in stage order; absent stages are missing */
    Map<Signature.Stage, Signature> signatures() {
        Map<Signature.Stage, Signature> m = new LinkedHashMap<>();
        for (Signature s : input.study().signatures()) {
            m.put(s.stage(), s);
        }
        return m;
    }

    /** @return every sheet's content */
    List<SheetContent> contents() {
        return new ArrayList<>(sheets.values());
    }
}
