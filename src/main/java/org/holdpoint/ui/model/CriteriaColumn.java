package org.holdpoint.ui.model;

import java.util.List;

/** The columns of the Criteria step, in display order. */
public enum CriteriaColumn {
    /** The characteristic's name (not editable). */
    CHARACTERISTIC("Characteristic", null),
    /** Whether the characteristic is analysed (yes) or left out of this study (no). */
    ANALYSE("Analyse", List.of("yes", "no")),
    /** Unit of measure. */
    UNIT("Unit", null),
    /** Lower specification limit. */
    LSL("LSL", null),
    /** Nominal value. */
    NOMINAL("Nominal", null),
    /** Upper specification limit. */
    USL("USL", null),
    /** Equivalence margin: one number d for (−d, d), or "L / U" (either side may be left empty). */
    MARGIN("Margin", null),
    /** Whether the margin is in units or in percent of the tolerance width. */
    MARGIN_IN("Margin in", List.of(CriteriaTable.IN_UNITS, CriteriaTable.IN_PERCENT, CriteriaTable.IN_PERCENT_USL,
            CriteriaTable.IN_RATIO)),
    /** The largest acceptable sd(after)/sd(before). */
    SD_GROWTH("Max sd ratio", null),
    /** The minimum capability index required. */
    CAPABILITY("Min Ppk bound", null),
    /** Paired design: from the data, yes or no. */
    PAIRED("Paired", List.of(CriteriaTable.FROM_DATA, "yes", "no")),
    /** The distribution capability is judged by: by the default rule, auto, or one family. */
    DISTRIBUTION("Distribution", List.of(CriteriaTable.BY_RULE, "auto", "normal", "lognormal", "weibull", "gamma",
            "rayleigh")),
    /** A tolerance interval the after group must keep inside the limits: "coverage / confidence", e.g. 0.99 / 0.95. */
    TOLERANCE("Tolerance int.", null),
    /** Whether a control-chart signal of the after phase fails the characteristic, or is a finding only. */
    STABILITY("Stability", List.of(CriteriaTable.FINDING_ONLY, CriteriaTable.REQUIRED));

    private final String label;
    private final List<String> choices;

    CriteriaColumn(String label, List<String> choices) {
        this.label = label;
        this.choices = choices;
    }

    /** @return the column heading */
    public String label() {
        return label;
    }

    /** @return the allowed values of a choice column, or null for free text */
    public List<String> choices() {
        return choices;
    }

    /** @return whether the user may edit this column */
    public boolean editable() {
        return this != CHARACTERISTIC;
    }
}
