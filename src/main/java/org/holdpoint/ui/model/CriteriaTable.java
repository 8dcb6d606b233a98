package org.holdpoint.ui.model;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.MarginSpec;
import org.holdpoint.study.SpecLimits;

/**
 * The Criteria step: one row per characteristic, values kept exactly as typed, each cell validated as
 * it is typed (the reason for a bad cell is available beside it), with fill-down and copy-from, and
 * the study-wide α. Lives on the event thread.
 */
public final class CriteriaTable {
    /** Choice of {@link CriteriaColumn#MARGIN_IN}: the margin is in the characteristic's unit. */
    public static final String IN_UNITS = "units";
    /** Choice of {@link CriteriaColumn#MARGIN_IN}: the margin is in percent of USL − LSL. */
    public static final String IN_PERCENT = "% of tolerance";
    /** Choice of {@link CriteriaColumn#MARGIN_IN}: an upper margin in percent of the USL (upper limit only). */
    public static final String IN_PERCENT_USL = "% of USL";
    /** Choice of {@link CriteriaColumn#MARGIN_IN}: bounds of the ratio after/before (tested on the logarithms). */
    public static final String IN_RATIO = "ratio";
    /** Choice of {@link CriteriaColumn#PAIRED}: take the design from the data layout. */
    public static final String FROM_DATA = "from data";
    /** Choice of {@link CriteriaColumn#STABILITY}: a control-chart signal is a finding only. */
    public static final String FINDING_ONLY = "finding";
    /** Choice of {@link CriteriaColumn#STABILITY}: a signal of the after phase fails the characteristic. */
    public static final String REQUIRED = "required";
    /** Choice of {@link CriteriaColumn#DISTRIBUTION}: the default rule decides (docs/methods.md §14). */
    public static final String BY_RULE = "by rule";

    /** The bound properties. */
    public enum Property {
        /** Rows were added, removed or edited. */
        ROWS,
        /** The study-wide α changed. */
        ALPHA
    }

    private final Bound<Property> bound = new Bound<>(this, Property.class);
    private final List<String[]> rows = new ArrayList<>();
    private String alpha = "0.05";
    private Runnable onEdit = () -> { };

    /** @return the number of rows */
    public int rowCount() {
        return rows.size();
    }

    /**
     * @param row the row
     * @param col the column
     * @return the text as typed
     */
    public String get(int row, CriteriaColumn col) {
        return rows.get(row)[col.ordinal()];
    }

    /**
     * @param row the row
     * @return the characteristic's name
     */
    public String name(int row) {
        return get(row, CriteriaColumn.CHARACTERISTIC);
    }

    /**
     * Stores a cell as typed (even when it is not valid, so nothing typed is lost).
     *
     * @param row  the row
     * @param col  an editable column
     * @param text the text
     * @throws IllegalArgumentException for the characteristic column
     */
    public void set(int row, CriteriaColumn col, String text) {
        if (!col.editable()) {
            throw new IllegalArgumentException("the characteristic's name comes from the data");
        }
        String t = text == null ? "" : text.trim();
        if (!t.equals(rows.get(row)[col.ordinal()])) {
            rows.get(row)[col.ordinal()] = t;
            bound.fireChanged(Property.ROWS);
            onEdit.run();
        }
    }

    /**
     * Why a cell is not valid, in plain words, or null when it is.
     *
     * @param row the row
     * @param col the column
     * @return the reason, or null
     */
    public String problem(int row, CriteriaColumn col) {
        return CriteriaRules.problem(rows.get(row), col);
    }

    /**
     * The first problem of a row, named by its column, or null when the row is valid.
     *
     * @param row the row
     * @return e.g. "USL: must be above LSL (25)"
     */
    public String rowProblem(int row) {
        for (CriteriaColumn c : CriteriaColumn.values()) {
            String p = problem(row, c);
            if (p != null) {
                return c.label() + ": " + p;
            }
        }
        return null;
    }

    /** @return the number of rows with a problem */
    public int rowsWithProblems() {
        int n = 0;
        for (int r = 0; r < rows.size(); r++) {
            n += rowProblem(r) == null ? 0 : 1;
        }
        return n;
    }

    /**
     * Copies one column's value of the first selected row into the other rows.
     *
     * @param col      the column
     * @param fromRow  the row whose value is copied
     * @param intoRows the rows that receive it
     */
    public void fillDown(CriteriaColumn col, int fromRow, int... intoRows) {
        String v = get(fromRow, col);
        for (int r : intoRows) {
            if (r != fromRow) {
                set(r, col, v);
            }
        }
    }

    /**
     * Copies every criterion (all columns but the name) from one characteristic to others.
     *
     * @param fromRow  the source row
     * @param intoRows the target rows
     */
    public void copyFrom(int fromRow, int... intoRows) {
        for (CriteriaColumn c : CriteriaColumn.values()) {
            if (c.editable()) {
                fillDown(c, fromRow, intoRows);
            }
        }
    }

    /** @return the study-wide α as typed */
    public String alpha() {
        return alpha;
    }

    /**
     * Sets the study-wide α as typed.
     *
     * @param text the text
     */
    public void setAlpha(String text) {
        String old = alpha;
        alpha = text == null ? "" : text.trim();
        if (!alpha.equals(old)) {
            bound.fire(Property.ALPHA, old, alpha);
            onEdit.run();
        }
    }

    /** @return why α is not valid, or null */
    public String alphaProblem() {
        Double a = CriteriaRules.number(alpha);
        if (a == null) {
            return CriteriaRules.isNumber(alpha) ? "α is required" : "α must be a number such as 0.05";
        }
        return org.holdpoint.study.CriteriaCheck.alpha(a);
    }

    /**
     * Shows the characteristics of new data: rows already present keep what was typed; new rows take
     * the criteria found beside the data file; rows of characteristics no longer present are dropped.
     *
     * @param data  the characteristics, in file order
     * @param found criteria from a settings file, by name (may be empty)
     */
    public void showData(List<CharacteristicData> data, Map<String, CharacteristicSettings> found) {
        Map<String, String[]> typed = new LinkedHashMap<>();
        rows.forEach(r -> typed.put(r[0], r));
        rows.clear();
        for (CharacteristicData c : data) {
            String[] kept = typed.get(c.name());
            CharacteristicSettings own = found.get(c.name());
            if (own == null) {
                String key = org.holdpoint.study.NameKeys.key(c.name());
                own = found.entrySet().stream().filter(e -> org.holdpoint.study.NameKeys.key(e.getKey()).equals(key))
                        .map(Map.Entry::getValue).findFirst().orElse(null);
            }
            String[] row = kept != null ? kept : fromSettings(c.name(), c.unit(), own);
            if (kept == null && own == null && found.keySet().stream().anyMatch(k -> !"*".equals(k))) {
                // the criteria file lists characteristics and this is not one of them: not analysed unless chosen
                row[CriteriaColumn.ANALYSE.ordinal()] = "no";
            }
            rows.add(row);
        }
        bound.fireChanged(Property.ROWS);
    }

    /**
     * Replaces every row by stored criteria (opening a study file).
     *
     * @param data     the characteristics
     * @param settings the resolved criteria per name
     * @param alphaValue the study's α
     */
    public void load(List<CharacteristicData> data, Map<String, CharacteristicSettings> settings, double alphaValue) {
        rows.clear();
        showData(data, settings);
        alpha = CriteriaRules.text(alphaValue);
        bound.fireChanged(Property.ALPHA);
    }

    /**
     * The criteria as the analysis takes them.
     *
     * @return criteria per characteristic name, in row order
     * @throws IllegalStateException naming the first bad cell when any cell is not valid
     */
    public Map<String, CharacteristicSettings> toSettings() {
        Map<String, CharacteristicSettings> m = new LinkedHashMap<>();
        for (int r = 0; r < rows.size(); r++) {
            String p = rowProblem(r);
            if (p != null) {
                throw new IllegalStateException("\"" + name(r) + "\", " + p);
            }
            m.put(name(r), CriteriaRules.settings(rows.get(r)));
        }
        return m;
    }

    /**
     * @return the names of the characteristics chosen for the analysis (column "Analyse" is yes), in row order
     */
    public List<String> chosen() {
        List<String> out = new ArrayList<>();
        for (String[] r : rows) {
            if (!"no".equals(r[CriteriaColumn.ANALYSE.ordinal()])) {
                out.add(r[CriteriaColumn.CHARACTERISTIC.ordinal()]);
            }
        }
        return out;
    }

    /**
     * @param property the property
     * @param listener told of changes, on the event thread
     */
    public void addListener(Property property, java.beans.PropertyChangeListener listener) {
        bound.addListener(property, listener);
    }

    void onEdit(Runnable r) {
        onEdit = r;
    }

    private static String[] fromSettings(String name, String dataUnit, CharacteristicSettings s) {
        String[] r = new String[CriteriaColumn.values().length];
        java.util.Arrays.fill(r, "");
        r[CriteriaColumn.CHARACTERISTIC.ordinal()] = name;
        r[CriteriaColumn.MARGIN_IN.ordinal()] = IN_UNITS;
        r[CriteriaColumn.PAIRED.ordinal()] = FROM_DATA;
        r[CriteriaColumn.DISTRIBUTION.ordinal()] = BY_RULE;
        r[CriteriaColumn.STABILITY.ordinal()] = FINDING_ONLY;
        r[CriteriaColumn.ANALYSE.ordinal()] = "yes";
        String unit = s != null && s.unit() != null ? s.unit() : dataUnit;
        r[CriteriaColumn.UNIT.ordinal()] = unit == null ? "" : unit;
        if (s == null) {
            return r;
        }
        SpecLimits spec = s.spec();
        r[CriteriaColumn.LSL.ordinal()] = CriteriaRules.text(spec.lsl());
        r[CriteriaColumn.NOMINAL.ordinal()] = CriteriaRules.text(spec.nominal());
        r[CriteriaColumn.USL.ordinal()] = CriteriaRules.text(spec.usl());
        MarginSpec m = s.margin();
        if (m != null) {
            r[CriteriaColumn.MARGIN.ordinal()] = CriteriaRules.marginText(m);
            r[CriteriaColumn.MARGIN_IN.ordinal()] = m.kind() == MarginSpec.Kind.ABSOLUTE ? IN_UNITS
                    : m.kind() == MarginSpec.Kind.PERCENT_OF_UPPER_LIMIT ? IN_PERCENT_USL
                    : m.kind() == MarginSpec.Kind.RATIO ? IN_RATIO : IN_PERCENT;
        }
        r[CriteriaColumn.SD_GROWTH.ordinal()] = CriteriaRules.text(s.sdGrowthLimit());
        r[CriteriaColumn.CAPABILITY.ordinal()] = CriteriaRules.text(s.capabilityRequirement());
        r[CriteriaColumn.PAIRED.ordinal()] = s.paired() == null ? FROM_DATA : s.paired() ? "yes" : "no";
        r[CriteriaColumn.DISTRIBUTION.ordinal()] = s.distribution() == null ? BY_RULE : s.distribution().key();
        r[CriteriaColumn.STABILITY.ordinal()] = Boolean.TRUE.equals(s.requireStability()) ? REQUIRED : FINDING_ONLY;
        r[CriteriaColumn.TOLERANCE.ordinal()] = s.tolerance() == null ? "" : CriteriaRules.text(s.tolerance().coverage())
                + " / " + CriteriaRules.text(s.tolerance().confidence());
        return r;
    }

    static String lower(String s) {
        return s.toLowerCase(Locale.ROOT);
    }
}
