package org.holdpoint.result;

import java.util.List;

/**
 * The verdict on one characteristic: whether it passes, in words, with the reasons.
 *
 * @param status  the outcome
 * @param reasons plain-language reasons; empty when it passes without remarks
 */
public record Verdict(Status status, List<String> reasons) {

    /** Copies the list. */
    public Verdict {
        reasons = List.copyOf(reasons);
    }

    /** The outcome for one characteristic. */
    public enum Status {
        /** Equivalent (or non-inferior/non-superior) and every limit that was set is met. */
        PASSED("passed"),
        /** Not equivalent, or a limit is not met. */
        FAILED("failed"),
        /** Equivalence could not be shown either way: more data are needed. */
        INCONCLUSIVE("inconclusive"),
        /** No margin was set, so equivalence was not assessed. */
        NOT_ASSESSED("not assessed"),
        /**
         * The data cannot be assessed at all (no variation at the measurement resolution, too few values,
         * no usable value in a group); the reasons say why. The other characteristics are analysed.
         */
        NOT_ASSESSABLE("not assessable");

        private final String words;

        Status(String words) {
            this.words = words;
        }

        /** @return the status in words */
        public String words() {
            return words;
        }
    }
}
