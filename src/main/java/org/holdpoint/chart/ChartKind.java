package org.holdpoint.chart;

/** The kinds of chart Holdpoint draws, with the suffix of their file names. */
public enum ChartKind {
    /** Box plot of one characteristic, before and after, with every value. */
    BOX_PLOT("box"),
    /** Histograms of one characteristic's groups with fitted normal curves. */
    HISTOGRAM("histogram"),
    /** Normal probability plot of one characteristic's groups. */
    NORMAL_PROBABILITY("normal-plot"),
    /** Individuals chart of one characteristic in run order, before and after (when a run order is known). */
    RUN_CHART("control"),
    /** Equivalence picture of all characteristics (one page of rows). */
    EQUIVALENCE("equivalence"),
    /** Power curve of a planned trial. */
    POWER_CURVE("power");

    private final String fileSuffix;

    ChartKind(String fileSuffix) {
        this.fileSuffix = fileSuffix;
    }

    /** @return the part of the file name that names the kind, e.g. "box" */
    public String fileSuffix() {
        return fileSuffix;
    }
}
