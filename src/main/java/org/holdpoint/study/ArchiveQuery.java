package org.holdpoint.study;

import java.time.Instant;

/**
 * Filters for listing archived study versions; a null filter matches everything. All set filters must
 * hold (logical AND). Text filters compare exactly, ignoring case.
 *
 * @param partNumber     the part number, or null
 * @param characteristic a characteristic name the study must contain, or null
 * @param changeKind     the kind of change, or null
 * @param verdict        the overall verdict in words, or null
 * @param createdFrom    earliest creation time, inclusive, or null
 * @param createdTo      latest creation time, exclusive, or null
 * @param signer         a name that must have signed the version, or null
 * @param changeId       the change record's identifier, or null
 * @param versions       all versions, or only those not superseded
 */
public record ArchiveQuery(String partNumber, String characteristic, String changeKind, String verdict,
        Instant createdFrom, Instant createdTo, String signer, String changeId, Versions versions) {

    private static final ArchiveQuery DEFAULTS =
            new ArchiveQuery(null, null, null, null, null, null, null, null, Versions.ALL);

    /** Which versions of a change record a listing includes. */
    public enum Versions {
        /** Every version, superseded ones too. */
        ALL,
        /** Only versions that no newer version replaced. */
        CURRENT
    }

    /** Validates the query: blank text filters become null, the date range must not be reversed. */
    public ArchiveQuery {
        partNumber = blankToNull(partNumber);
        characteristic = blankToNull(characteristic);
        changeKind = blankToNull(changeKind);
        verdict = blankToNull(verdict);
        signer = blankToNull(signer);
        changeId = blankToNull(changeId);
        if (versions == null) {
            throw new IllegalArgumentException("versions must be ALL or CURRENT");
        }
        if (createdFrom != null && createdTo != null && createdTo.isBefore(createdFrom)) {
            throw new IllegalArgumentException(
                    "date range is reversed: from " + createdFrom + " is after to " + createdTo);
        }
    }

    /**
     * The query that matches everything: no filters, all versions.
     *
     * @return the default query
     */
    public static ArchiveQuery withDefaults() {
        return DEFAULTS;
    }

    /**
     * A copy filtering on the part number.
     *
     * @param value the part number, or null for any
     * @return the copy
     */
    public ArchiveQuery withPartNumber(String value) {
        return new ArchiveQuery(value, characteristic, changeKind, verdict, createdFrom, createdTo, signer, changeId,
                versions);
    }

    /**
     * A copy filtering on the characteristic name.
     *
     * @param value the characteristic name, or null for any
     * @return the copy
     */
    public ArchiveQuery withCharacteristic(String value) {
        return new ArchiveQuery(partNumber, value, changeKind, verdict, createdFrom, createdTo, signer, changeId,
                versions);
    }

    /**
     * A copy filtering on the kind of change.
     *
     * @param value the kind of change, or null for any
     * @return the copy
     */
    public ArchiveQuery withChangeKind(String value) {
        return new ArchiveQuery(partNumber, characteristic, value, verdict, createdFrom, createdTo, signer, changeId,
                versions);
    }

    /**
     * A copy filtering on the verdict in words.
     *
     * @param value the verdict in words, or null for any
     * @return the copy
     */
    public ArchiveQuery withVerdict(String value) {
        return new ArchiveQuery(partNumber, characteristic, changeKind, value, createdFrom, createdTo, signer,
                changeId, versions);
    }

    /**
     * A copy filtering on the creation time.
     *
     * @param from earliest, inclusive, or null
     * @param to   latest, exclusive, or null
     * @return the copy
     */
    public ArchiveQuery withCreatedBetween(Instant from, Instant to) {
        return new ArchiveQuery(partNumber, characteristic, changeKind, verdict, from, to, signer, changeId,
                versions);
    }

    /**
     * A copy filtering on the signer's name.
     *
     * @param value the signer's name, or null for any
     * @return the copy
     */
    public ArchiveQuery withSigner(String value) {
        return new ArchiveQuery(partNumber, characteristic, changeKind, verdict, createdFrom, createdTo, value,
                changeId, versions);
    }

    /**
     * A copy filtering on the change record identifier.
     *
     * @param value the change record identifier, or null for any
     * @return the copy
     */
    public ArchiveQuery withChangeId(String value) {
        return new ArchiveQuery(partNumber, characteristic, changeKind, verdict, createdFrom, createdTo, signer,
                value, versions);
    }

    /**
     * A copy including all versions or only current ones.
     *
     * @param value which versions to include
     * @return the copy
     */
    public ArchiveQuery withVersions(Versions value) {
        return new ArchiveQuery(partNumber, characteristic, changeKind, verdict, createdFrom, createdTo, signer,
                changeId, value);
    }

    private static String blankToNull(String s) {
        return s == null || s.isBlank() ? null : s.strip();
    }
}
