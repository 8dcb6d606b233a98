package org.holdpoint.study;

import java.time.Instant;
import java.util.List;
import java.util.Objects;

/**
 * An archived, immutable study version as listed: its metadata, signatures and the SHA-256 of its JSON.
 *
 * @param id              the version's archive identifier
 * @param changeId        the change record's identifier, shared by all its versions
 * @param version         1 for the first version, +1 for each correction
 * @param supersedes      the identifier of the version this one replaces, or null for version 1
 * @param supersededBy    the identifier of the version that replaced this one, or null while current
 * @param title           short description of the change
 * @param changeKind      kind of change, or null
 * @param partNumber      the part number
 * @param revision        drawing revision, or null
 * @param characteristics characteristic names, in study order
 * @param verdict         overall verdict in words, or null
 * @param author          who prepared the study
 * @param created         when the study was made
 * @param archivedAt      when it was archived
 * @param signatures      its sign-offs made in the archive, oldest first
 * @param documentSigners who signed the study's own document before it was archived, oldest first
 * @param jsonSha256      lower-case hex SHA-256 of the UTF-8 bytes of the study JSON
 */
public record StudyVersion(long id, String changeId, int version, Long supersedes, Long supersededBy, String title,
        String changeKind, String partNumber, String revision, List<String> characteristics, String verdict,
        String author, Instant created, Instant archivedAt, List<ArchivedSignature> signatures, List<String> documentSigners,
        String jsonSha256) {

    /** Validates the version and copies its lists. */
    public StudyVersion {
        Checks.notBlank(changeId, "changeId");
        if (version < 1) {
            throw new IllegalArgumentException("version must be at least 1, was " + version);
        }
        characteristics = List.copyOf(characteristics);
        signatures = List.copyOf(signatures);
        documentSigners = List.copyOf(documentSigners);
        Objects.requireNonNull(created, "created");
        Objects.requireNonNull(archivedAt, "archivedAt");
        Checks.notBlank(jsonSha256, "jsonSha256");
    }

    /**
     * @return everyone who signed: first those who signed the document before it was archived, then the
     *         archive's signatures, each oldest first
     */
    public List<String> signers() {
        List<String> all = new java.util.ArrayList<>(documentSigners);
        signatures.forEach(s -> all.add(s.signer()));
        return List.copyOf(all);
    }

    /** @return whether no newer version replaced this one */
    public boolean isCurrent() {
        return supersededBy == null;
    }
}
