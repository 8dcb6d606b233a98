package org.holdpoint.ui.model;

import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.result.Verdict;

/**
 * How a verdict is shown: words first, then a mark of the project's own design whose outline and sign tell
 * the verdicts apart without colour (an equals sign for "the same", an unequal sign for "changed", an
 * ellipsis for "not enough data yet"); also the sort order (most urgent first).
 */
public enum VerdictLook {
    /** Passed: a filled hexagon with an equals sign. */
    PASSED(Shape.HEXAGON_EQUALS, "passed", 3),
    /** Failed: a filled diamond with an unequal sign. */
    FAILED(Shape.DIAMOND_UNEQUAL, "failed", 0),
    /** Inconclusive: an unfilled hexagon with an ellipsis. */
    INCONCLUSIVE(Shape.OPEN_HEXAGON_ELLIPSIS, "inconclusive", 1),
    /** Not assessed (no margin): an unfilled bar with a dash. */
    NOT_ASSESSED(Shape.BAR_DASH, "not assessed", 2),
    /** Not assessable (the data cannot show a change): an unfilled square with a slash. */
    NOT_ASSESSABLE(Shape.SQUARE_SLASH, "not assessable", 0);

    /** The marks drawn by the window; each differs in outline and sign, not only in colour. */
    public enum Shape {
        /** A filled hexagon with an equals sign. */
        HEXAGON_EQUALS,
        /** A filled diamond with an unequal sign. */
        DIAMOND_UNEQUAL,
        /** An unfilled hexagon with three dots. */
        OPEN_HEXAGON_ELLIPSIS,
        /** An unfilled wide rounded bar with a dash. */
        BAR_DASH,
        /** An unfilled square with a diagonal slash. */
        SQUARE_SLASH
    }

    private final Shape shape;
    private final String words;
    private final int urgency;

    VerdictLook(Shape shape, String words, int urgency) {
        this.shape = shape;
        this.words = words;
        this.urgency = urgency;
    }

    /**
     * @param status a verdict status
     * @return its look
     */
    public static VerdictLook of(Verdict.Status status) {
        return switch (status) {
            case PASSED -> PASSED;
            case FAILED -> FAILED;
            case INCONCLUSIVE -> INCONCLUSIVE;
            case NOT_ASSESSED -> NOT_ASSESSED;
            case NOT_ASSESSABLE -> NOT_ASSESSABLE;
        };
    }

    /** @return the shape to draw */
    public Shape shape() {
        return shape;
    }

    /** @return the status in words */
    public String words() {
        return words;
    }

    /** @return 0 for the most urgent (failed) up to 3 (passed); sorts the worst first */
    public int urgency() {
        return urgency;
    }

    /**
     * The conclusion of one characteristic in words, e.g. "passed: equivalent" or "failed: spread grew".
     *
     * @param r the result
     * @return the words
     */
    public static String conclusion(CharacteristicResult r) {
        return of(r.verdict().status()).words() + ": " + finding(r);
    }

    /**
     * What decided, in a few words, every criterion that failed first: e.g. "capability: Ppk bound 0.978
     * below 1; mean: inconclusive" or "spread: sd ratio bound 3.020 above 1.8; mean: equivalent". A
     * characteristic that failed on spread or capability never reads as merely "equivalent".
     *
     * @param r the result
     * @return the words
     */
    public static String finding(CharacteristicResult r) {
        if (r.verdict().status() == Verdict.Status.NOT_ASSESSABLE) {
            return String.join("; ", r.verdict().reasons());
        }
        java.util.List<String> failed = new java.util.ArrayList<>();
        if (r.spreadFailed()) {
            failed.add("spread: sd ratio bound " + org.holdpoint.result.Format.ratio(r.sdGrowth().upperBound())
                    + " above " + org.holdpoint.result.Format.num(r.sdGrowth().limit()));
        }
        if (r.capabilityFailed()) {
            var cap = r.checks().after();
            failed.add("capability: Ppk bound " + (cap.ppkLower() == null ? "undefined"
                    : org.holdpoint.result.Format.ratio(cap.ppkLower())) + " below "
                    + org.holdpoint.result.Format.num(r.settings().capabilityRequirement()));
        }
        if (r.toleranceFailed()) {
            failed.add("tolerance interval outside the limits");
        }
        if (r.stabilityFailed()) {
            failed.add("stability: " + r.checks().stability().after().signals().size() + " after-phase signal"
                    + (r.checks().stability().after().signals().size() == 1 ? "" : "s"));
        } else if (r.stabilityNotShown()) {
            failed.add("stability: not shown (no control chart)");
        }
        var eq = r.decidingTost();
        failed.add("mean: " + (eq == null ? "no margin set" : eq.conclusion().words()));
        return String.join("; ", failed);
    }
}
