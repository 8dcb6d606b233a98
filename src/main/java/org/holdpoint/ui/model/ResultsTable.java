package org.holdpoint.ui.model;

import java.util.List;
import org.holdpoint.stats.EquivalenceResult;
import org.holdpoint.stats.Margin;
import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.result.StudyResult;
import org.holdpoint.result.Verdict;
import org.holdpoint.result.Format;

/**
 * The Results step: one row per characteristic, a filter, the selected row, and the overall verdict.
 * Lives on the event thread.
 */
public final class ResultsTable {
    /** Which rows are shown. */
    public enum Filter {
        /** Every characteristic. */
        ALL("all characteristics"),
        /** Only those that did not pass (failed, inconclusive, not assessed). */
        NOT_PASSED("only those not passed");

        private final String words;

        Filter(String words) {
            this.words = words;
        }

        /** @return the choice in words */
        public String words() {
            return words;
        }

        @Override
        public String toString() {
            return words;
        }
    }

    /** The bound properties. */
    public enum Property {
        /** New results arrived (or were cleared). */
        RESULT,
        /** The filter changed. */
        FILTER,
        /** Another characteristic was selected. */
        SELECTED
    }

    private final Bound<Property> bound = new Bound<>(this, Property.class);
    private StudyResult result;
    private String staleBecause;
    private Filter filter = Filter.ALL;
    private String selected;

    /** @return the results shown, or null before the first analysis */
    public StudyResult result() {
        return result;
    }

    /**
     * Shows new results, keeping the selection when that characteristic is still present.
     *
     * @param r the results, or null to clear
     */
    public void show(StudyResult r) {
        show(r, null);
    }

    /**
     * Shows new results with the values in each characteristic's unit at its measurement resolution plus
     * two decimals (the same format as the text output and the workbook).
     *
     * @param r    the results, or null to clear
     * @param data the data they were computed from, or null (then six significant digits)
     */
    public void show(StudyResult r, org.holdpoint.study.Dataset data) {
        decimals.clear();
        if (data != null) {
            data.characteristics().forEach(c -> decimals.put(c.name(), Math.min(10, c.resolutionDecimals() + 2)));
        }
        result = r;
        staleBecause = null;
        bound.fireChanged(Property.RESULT);
        if (r == null || r.characteristics().stream().noneMatch(c -> c.name().equals(selected))) {
            select(r == null || r.characteristics().isEmpty() ? null : r.characteristics().get(0).name());
        }
    }

    /**
     * Marks the results out of date: what they were computed from changed. They stay on screen, marked, and
     * may not be written, signed or archived until analysed again.
     *
     * @param because what changed, e.g. "the criteria changed after the analysis"
     */
    public void markStale(String because) {
        if (result != null && staleBecause == null) {
            staleBecause = because;
            bound.fireChanged(Property.RESULT);
        }
    }

    /** @return why the results are out of date, or null while they are current (or there are none) */
    public String staleBecause() {
        return staleBecause;
    }

    /** @return the number of rows (before filtering) */
    public int rowCount() {
        return result == null ? 0 : result.characteristics().size();
    }

    /**
     * @param row the row
     * @return the characteristic's result
     */
    public CharacteristicResult row(int row) {
        return result.characteristics().get(row);
    }

    /**
     * Whether the filter lets a row through.
     *
     * @param row the row
     * @return true when it is shown
     */
    public boolean shows(int row) {
        return filter == Filter.ALL || row(row).verdict().status() != Verdict.Status.PASSED;
    }

    /** @return the number of rows the filter lets through */
    public int shownCount() {
        int n = 0;
        for (int i = 0; i < rowCount(); i++) {
            n += shows(i) ? 1 : 0;
        }
        return n;
    }

    /** @return the filter */
    public Filter filter() {
        return filter;
    }

    /**
     * @param f the filter
     */
    public void setFilter(Filter f) {
        Filter old = filter;
        filter = f;
        bound.fire(Property.FILTER, old, f);
    }

    /** @return the selected characteristic's name, or null */
    public String selected() {
        return selected;
    }

    /** @return the selected characteristic's result, or null */
    public CharacteristicResult selectedResult() {
        if (result == null || selected == null) {
            return null;
        }
        return result.characteristics().stream().filter(c -> c.name().equals(selected)).findFirst().orElse(null);
    }

    /**
     * @param name the characteristic to select, or null
     */
    public void select(String name) {
        String old = selected;
        selected = name;
        bound.fire(Property.SELECTED, old, name);
    }

    /**
     * The value of a cell, typed for sorting (numbers as Double, null when undefined).
     *
     * @param row the row
     * @param col the column
     * @return the value
     */
    private final java.util.Map<String, Integer> decimals = new java.util.HashMap<>();

    /**
     * @param name a characteristic
     * @return the decimals of values in its unit (its resolution plus two), or null when its data are unknown
     */
    public Integer decimals(String name) {
        return decimals.get(name);
    }

    /** A value in a characteristic's unit, at its resolution plus two decimals when known. */
    private String unit(String name, double v) {
        Integer d = decimals.get(name);
        return d == null ? Format.num(v) : Format.fixed(v, d);
    }

    /**
     * A number cell as shown: in the characteristic's unit with its decimals, a ratio to four significant
     * digits; the value itself (for sorting) is {@link #value}.
     *
     * @param row the row
     * @param col a number column
     * @return the text, or null when the cell holds no number
     */
    public String text(int row, ResultColumn col) {
        Object v = value(row, col);
        if (!(v instanceof Double d)) {
            return null;
        }
        return col == ResultColumn.SD_RATIO ? Format.num(d, 4) : unit(row(row).name(), d);
    }

    public Object value(int row, ResultColumn col) {
        CharacteristicResult r = row(row);
        EquivalenceResult eq = r.decidingTost();
        return switch (col) {
            case VERDICT -> VerdictLook.of(r.verdict().status());
            case CHARACTERISTIC -> r.name();
            case CONCLUSION -> VerdictLook.finding(r);
            case UNIT -> r.unit() == null ? "" : r.unit();
            case DIFFERENCE -> r.decidingTest() == null ? null : r.decidingTest().estimate();
            case INTERVAL -> eq == null ? "" : eq.ratio() ? "ratio (" + Format.ratioBound(eq.ciLower()) + ", "
                    + Format.ratioBound(eq.ciUpper()) + ")" : "(" + unit(r.name(), eq.ciLower()) + ", "
                    + unit(r.name(), eq.ciUpper()) + ")";
            case MARGIN -> margin(r.name(), r.margin());
            case SD_RATIO -> r.variance() == null ? null : Math.sqrt(r.variance().ratio());
        };
    }

    /**
     * The overall verdict in words, e.g. "Change verified: all 7 characteristics passed".
     *
     * @return the words, or a hint before the first analysis
     */
    public String overallWords() {
        if (result == null) {
            return "Not analysed yet: open the data on the Data step";
        }
        if (staleBecause != null) {
            return "Out of date: " + staleBecause + "; analyse again (F5)";
        }
        // the banner keeps to the verdict; the stability finding goes to the counts line below it
        return result.verdictSummary().replace("CHANGE NOT VERIFIED", "Change not verified")
                .replace("CHANGE VERIFIED", "Change verified");
    }

    /** @return the overall look: passed when verified, else the most urgent characteristic's look */
    public VerdictLook overallLook() {
        if (result == null || staleBecause != null) {
            return VerdictLook.NOT_ASSESSED;
        }
        if (result.changeVerified()) {
            return VerdictLook.PASSED;
        }
        return result.characteristics().stream().map(c -> VerdictLook.of(c.verdict().status()))
                .min(java.util.Comparator.comparingInt(VerdictLook::urgency)).orElse(VerdictLook.NOT_ASSESSED);
    }

    /** @return per look, how many characteristics have it, in words (e.g. "5 passed, 1 failed") */
    public String counts() {
        if (result == null) {
            return "";
        }
        StringBuilder sb = new StringBuilder();
        for (VerdictLook l : List.of(VerdictLook.PASSED, VerdictLook.FAILED, VerdictLook.INCONCLUSIVE,
                VerdictLook.NOT_ASSESSED, VerdictLook.NOT_ASSESSABLE)) {
            long n = result.characteristics().stream().filter(c -> VerdictLook.of(c.verdict().status()) == l).count();
            if (n > 0) {
                sb.append(sb.length() == 0 ? "" : ", ").append(n).append(' ').append(l.words());
            }
        }
        int unstable = result.notInControl().size();
        if (unstable > 0) {
            sb.append("; ").append(unstable).append(" not in control in run order (see the Control chart tab)");
        }
        return sb.toString();
    }

    /**
     * @param property the property
     * @param listener told of changes, on the event thread
     */
    public void addListener(Property property, java.beans.PropertyChangeListener listener) {
        bound.addListener(property, listener);
    }

    private String margin(String name, Margin m) {
        if (m == null) {
            return "";
        }
        if (m.ratio()) {
            return "ratio " + (m.lower() == null ? "≤ " + Format.num(m.upper()) : m.upper() == null ? "≥ "
                    + Format.num(m.lower()) : Format.num(m.lower()) + "–" + Format.num(m.upper()));
        }
        // as entered (shortest form): the column stays narrow and shows the numbers the user typed
        if (m.lower() != null && m.upper() != null && m.lower() == -m.upper()) {
            return "±" + Format.num(m.upper());
        }
        return "(" + (m.lower() == null ? "−∞" : Format.num(m.lower())) + ", "
                + (m.upper() == null ? "+∞" : Format.num(m.upper())) + ")";
    }
}
