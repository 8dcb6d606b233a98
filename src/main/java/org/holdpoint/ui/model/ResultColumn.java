package org.holdpoint.ui.model;

/** The columns of the Results step, in display order. */
public enum ResultColumn {
    /** The verdict's look (shape and words); sorts the most urgent first. */
    VERDICT("Verdict"),
    /** The characteristic's name. */
    CHARACTERISTIC("Characteristic"),
    /** What the tests found, in words. */
    CONCLUSION("Finding"),
    /** Unit of measure. */
    UNIT("Unit"),
    /** The estimated difference after − before. */
    DIFFERENCE("Difference"),
    /** The (1 − 2α) equivalence interval, with its level. */
    INTERVAL("Equivalence interval"),
    /** The margin in units. */
    MARGIN("Margin"),
    /** sd(after)/sd(before). */
    SD_RATIO("sd ratio");

    private final String label;

    ResultColumn(String label) {
        this.label = label;
    }

    /** @return the column heading */
    public String label() {
        return label;
    }

    /** @return the class of the column's values, for sorting */
    public Class<?> type() {
        return switch (this) {
            case VERDICT -> VerdictLook.class;
            case DIFFERENCE, SD_RATIO -> Double.class;
            default -> String.class;
        };
    }
}
