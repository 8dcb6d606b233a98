package org.holdpoint.study;

/**
 * One entry of the sign-off block. This is a record of who signed and what the signature means; it
 * is not an electronic signature in the sense of regulated electronic-record rules.
 *
 * @param stage     prepared, reviewed or approved
 * @param name      printed name
 * @param role      role or title
 * @param meaning   what the signature means, e.g. "approved for production"
 * @param timestamp ISO-8601 date and time
 */
public record Signature(Stage stage, String name, String role, String meaning, String timestamp) {

    /** The stage of the sign-off. */
    public enum Stage {
        /** Prepared the study. */
        PREPARED("prepared"),
        /** Reviewed it. */
        REVIEWED("reviewed"),
        /** Approved the change. */
        APPROVED("approved");

        private final String words;

        Stage(String words) {
            this.words = words;
        }

        /** @return the stage in words */
        public String words() {
            return words;
        }
    }

    /** Validates. */
    public Signature {
        if (stage == null) {
            throw new IllegalArgumentException("a signature needs a stage");
        }
        if (name == null || name.isBlank()) {
            throw new IllegalArgumentException("a signature needs a printed name");
        }
    }
}
