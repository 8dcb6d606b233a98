package org.holdpoint.study;

import java.util.List;

/** The cautions shown with every result: window, command-line output, workbook and README. */
public final class Cautions {
    /** The cautions, one paragraph each. */
    public static final List<String> TEXT = List.of(
            "A statistical result supports, never replaces, the site's change-control and quality procedures, "
                    + "engineering judgement, customer notification and approval rules, and local regulations.",
            "It assumes the samples are representative of the process (random, independent, from a stable "
                    + "process), that the measurement system is adequate for the tolerance, and that the margin "
                    + "was fixed before the data were seen.",
            "Safety-critical characteristics need the reviews that licensed practice and the customer require.");

    private Cautions() {
    }
}
