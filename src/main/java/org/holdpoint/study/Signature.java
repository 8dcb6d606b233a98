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
 * @param record    the SHA-256 of the study record this signature signs (null for entries written before
 *                  signatures named their record); links the signature to exactly one record
 */
public record Signature(Stage stage, String name, String role, String meaning, String timestamp, String record) {

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

        /**
         * @param text a stage in words, any case ("reviewed")
         * @return the stage, or null when the text names none
         */
        public static Stage parse(String text) {
            for (Stage s : values()) {
                if (text != null && s.words().equalsIgnoreCase(text.strip())) {
                    return s;
                }
            }
            return null;
        }
    }

    /**
     * A signature not yet linked to a record (the record hash is added when it is stamped).
     *
     * @param stage     the stage
     * @param name      printed name
     * @param role      role
     * @param meaning   meaning
     * @param timestamp time
     */
    public Signature(Stage stage, String name, String role, String meaning, String timestamp) {
        this(stage, name, role, meaning, timestamp, null);
    }

    /**
     * @param time       when it was signed
     * @param recordHash the SHA-256 of the record it signs
     * @return a copy stamped with both
     */
    public Signature stamped(String time, String recordHash) {
        return new Signature(stage, name, role, meaning, timestamp == null || timestamp.isBlank() ? time : timestamp,
                recordHash);
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
