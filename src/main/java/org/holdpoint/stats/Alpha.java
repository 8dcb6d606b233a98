package org.holdpoint.stats;

/** Validation of significance levels shared by every test. */
final class Alpha {
    private Alpha() {
    }

    /** Returns α if it lies in (0, 1), else throws; NaN fails. */
    static double check(double alpha) {
        if (alpha > 0 && alpha < 1) {
            return alpha;
        }
        throw new StatsException("alpha must lie strictly between 0 and 1, got %s", alpha);
    }

    /** Returns α if it lies in (0, 0.5), as the equivalence and interval methods need, else throws. */
    static double checkBelowHalf(double alpha) {
        if (alpha > 0 && alpha < 0.5) {
            return alpha;
        }
        throw new StatsException("alpha must lie strictly between 0 and 0.5, got %s", alpha);
    }
}
