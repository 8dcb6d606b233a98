package org.holdpoint.workflow;

import java.util.List;

/**
 * What {@code verify} found in a sign-off workbook.
 *
 * @param status         intact or edited
 * @param changeId       the change id of the embedded record, or null when it cannot be read
 * @param sha256         the SHA-256 of the embedded record as found
 * @param hashMatches    whether it equals the hash stored beside the record
 * @param seal           the state of the optional digital signature
 * @param keyFingerprint the fingerprint of the key that signed the record, or null
 * @param differences    every shown value that no longer matches (empty when intact)
 * @param handEntries    sign-off fields filled in by hand after writing (not part of the record)
 * @param notes          other remarks (e.g. the current version computes slightly different results)
 */
public record VerifyResult(Status status, String changeId, String sha256, boolean hashMatches, SealState seal,
        String keyFingerprint, List<Difference> differences, List<String> handEntries, List<String> notes,
        List<String> signOff) {

    /** Copies the lists. */
    public VerifyResult {
        differences = List.copyOf(differences);
        handEntries = List.copyOf(handEntries);
        notes = List.copyOf(notes);
        signOff = signOff == null ? List.of() : List.copyOf(signOff);
    }

    /**
     * A result without sign-off entries.
     *
     * @param status         intact or edited
     * @param changeId       the change id
     * @param sha256         the record hash
     * @param hashMatches    whether it matches the stored one
     * @param seal           the seal state
     * @param keyFingerprint the sealing key
     * @param differences    the differences
     * @param handEntries    hand entries
     * @param notes          notes
     */
    public VerifyResult(Status status, String changeId, String sha256, boolean hashMatches, SealState seal,
            String keyFingerprint, List<Difference> differences, List<String> handEntries, List<String> notes) {
        this(status, changeId, sha256, hashMatches, seal, keyFingerprint, differences, handEntries, notes, List.of());
    }

    /**
     * One shown value that no longer matches the record.
     *
     * @param sheet    the sheet
     * @param cell     the cell (A1), or "-" for the record as a whole
     * @param what     what the value is
     * @param shown    what the workbook shows
     * @param expected what the re-computation gives
     */
    public record Difference(String sheet, String cell, String what, String shown, String expected) {
        /** @return one line, e.g. "Summary!M15 (Bore diameter: F-test p): shows 0.5, recomputed 0.25" */
        public String describe() {
            return sheet + "!" + cell + " (" + what + "): shows " + shown + ", recomputed " + expected;
        }
    }

    /** The verdict on the workbook. */
    public enum Status {
        /** The record's hash matches and every shown value matches the re-computation. */
        INTACT,
        /** Something was edited. */
        EDITED
    }

    /** The state of the record's digital signature. */
    public enum SealState {
        /** The record was not signed. */
        UNSIGNED,
        /** No signature, although a key was given or the record names the key that signed it. */
        MISSING,
        /** Signed, the signature is valid for the stored key, and that key is the trusted one (when given). */
        VALID,
        /** Signed and valid, but by another key than the trusted one given. */
        OTHER_KEY,
        /** The signature does not match the record. */
        INVALID
    }
}
