package org.holdpoint.ui.model;

import org.holdpoint.study.CharacteristicResult;
import org.holdpoint.study.Verdict;

/**
 * How a verdict is shown: always in words and with its own shape, so that colour never carries the
 * meaning alone; also the sort order (most urgent first).
 */
public enum VerdictLook {
    /** Passed: a disc with a tick. */
    PASSED(Shape.DISC_TICK, "passed", 3),
    /** Failed: a square with a cross. */
    FAILED(Shape.SQUARE_CROSS, "failed", 0),
    /** Inconclusive: a triangle with a question mark. */
    INCONCLUSIVE(Shape.TRIANGLE_QUERY, "inconclusive", 1),
    /** Not assessed (no margin): a hollow ring with a dash. */
    NOT_ASSESSED(Shape.RING_DASH, "not assessed", 2),
    /** Not assessable (the data cannot show a change): an unfilled square with a slash. */
    NOT_ASSESSABLE(Shape.SQUARE_SLASH, "not assessable", 0);

    /** The shapes drawn by the window; each differs in outline, not only in colour. */
    public enum Shape {
        /** A filled circle with a tick. */
        DISC_TICK,
        /** A filled square with a cross. */
        SQUARE_CROSS,
        /** A filled triangle with a question mark. */
        TRIANGLE_QUERY,
        /** An unfilled circle with a dash. */
        RING_DASH,
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
        if (r.sdGrowth() != null && !r.sdGrowth().met()) {
            failed.add("spread: sd ratio bound " + org.holdpoint.workflow.Format.ratio(r.sdGrowth().upperBound())
                    + " above " + org.holdpoint.workflow.Format.num(r.sdGrowth().limit()));
        }
        if (r.checks() != null && Boolean.FALSE.equals(r.checks().capabilityMet())) {
            var cap = r.checks().after().capability();
            failed.add("capability: Ppk bound " + (cap == null || cap.ppkLower() == null ? "undefined"
                    : org.holdpoint.workflow.Format.ratio(cap.ppkLower())) + " below "
                    + org.holdpoint.workflow.Format.num(r.settings().capabilityRequirement()));
        }
        var eq = r.decidingTost();
        failed.add("mean: " + (eq == null ? "no margin set" : eq.conclusion().words()));
        return String.join("; ", failed);
    }
}
