package org.holdpoint.study;

/** How before/after values are arranged in a sheet. */
public enum Layout {
    /** A group column (before/after labels) and a value column, optionally a characteristic column. */
    STACKED("stacked"),
    /** A before column and an after column; lengths may differ. */
    SIDE_BY_SIDE("side by side"),
    /** A group column and one value column per characteristic. */
    WIDE("wide"),
    /** A unit id column, a before column and an after column; matched by unit id. */
    PAIRED("paired"),
    /** Before and after read from two separate files or sheets. */
    SEPARATE("separate before and after sources");

    private final String words;

    Layout(String words) {
        this.words = words;
    }

    /** @return the layout as named in outputs */
    public String words() {
        return words;
    }
}
