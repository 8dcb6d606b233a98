package org.holdpoint.stats;

/** Small validations shared by the planning records: "return if valid, else throw", so NaN fails. */
final class Checks {
    private Checks() {
    }

    /** Returns p if it lies in [0, 1], else throws. */
    static double probability(double p, String name) {
        if (p >= 0 && p <= 1) {
            return p;
        }
        throw new StatsException("%s must be a probability in [0, 1], got %s", name, p);
    }

    /** Returns x if it is positive and finite, else throws. */
    static double positive(double x, String name) {
        if (x > 0 && Double.isFinite(x)) {
            return x;
        }
        throw new StatsException("%s must be positive and finite, got %s", name, x);
    }

    /** Returns n if n ≥ min, else throws. */
    static int atLeast(int n, int min, String name) {
        if (n >= min) {
            return n;
        }
        throw new StatsException("%s must be at least %d, got %d", name, min, n);
    }
}
