package org.holdpoint.study;

/**
 * Where a study record comes from: who ran the analysis and when (one timestamp for the run, shared by
 * every output of that run), and the key whose signature seals the record, if any. Part of the record,
 * so it is hashed and signed with it (docs/study-file.md).
 *
 * @param analyst    who ran the analysis (the user name, or as given), or null when not recorded
 * @param analysedAt when, ISO-8601 UTC to the second, or null when not recorded
 * @param signingKey the SHA-256 fingerprint of the public key that signs the record, or null
 */
public record Provenance(String analyst, String analysedAt, String signingKey) {

    /** Nothing recorded (records written before provenance was kept). */
    public static final Provenance NONE = new Provenance(null, null, null);

    /** Normalises blanks to null. */
    public Provenance {
        analyst = blankToNull(analyst);
        analysedAt = blankToNull(analysedAt);
        signingKey = blankToNull(signingKey);
    }

    private static String blankToNull(String s) {
        return s == null || s.isBlank() ? null : s.strip();
    }

    /**
     * @param key the signing key's fingerprint, or null
     * @return a copy naming that key
     */
    public Provenance withSigningKey(String key) {
        return new Provenance(analyst, analysedAt, key);
    }
}
