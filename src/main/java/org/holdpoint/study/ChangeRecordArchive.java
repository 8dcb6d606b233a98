package org.holdpoint.study;

import java.time.Instant;
import java.util.List;
import java.util.Optional;

/**
 * The change-record archive: an append-only store of immutable study versions, their signatures and a
 * hash-chained audit trail. There is deliberately no way to update or delete a record: a correction is a
 * new version that supersedes the old one.
 *
 * <p>Implementations are safe for use from several threads; each method is one transaction.
 */
public interface ChangeRecordArchive extends AutoCloseable {

    /**
     * Archives the first version of a change record and appends its CREATED event (then its history).
     *
     * @param study  the new version; its change id must not be in the archive yet
     * @param actor  who archives it
     * @param reason why, or null
     * @return the archived version (version 1)
     * @throws ArchiveException REJECTED when the change id already exists (use {@link #supersede}),
     *                          RETRYABLE_CONFLICT when another writer won a race, or a database failure
     */
    StudyVersion add(NewStudyVersion study, String actor, String reason) throws ArchiveException;

    /**
     * Archives a correction: a new version of the same change record that replaces {@code oldId}; appends
     * SUPERSEDED on the old version and CREATED on the new one.
     *
     * @param oldId    the version being replaced; it must be current
     * @param newStudy the corrected study; its change id must equal the old one's
     * @param actor    who archives it
     * @param reason   why it is corrected (required)
     * @return the new version
     * @throws ArchiveException NOT_FOUND, REJECTED (already superseded, other change id, no reason),
     *                          RETRYABLE_CONFLICT or a database failure
     */
    StudyVersion supersede(long oldId, NewStudyVersion newStudy, String actor, String reason)
            throws ArchiveException;

    /**
     * Signs a current study version and appends its SIGNED event.
     *
     * @param studyId   the version to sign
     * @param signer    the signer's name
     * @param role      the signer's role
     * @param meaning   what the signature means
     * @param timestamp when it was signed
     * @return the signature
     * @throws ArchiveException NOT_FOUND, REJECTED (superseded version, blank field), RETRYABLE_CONFLICT,
     *                          PERMISSION_DENIED or a database failure
     */
    ArchivedSignature sign(long studyId, String signer, String role, String meaning, Instant timestamp)
            throws ArchiveException;

    /**
     * Lists the versions matching the query, newest creation first.
     *
     * @param query the filters
     * @return the matching versions (without their JSON)
     * @throws ArchiveException on a database failure
     */
    List<StudyVersion> list(ArchiveQuery query) throws ArchiveException;

    /**
     * Opens one version in full.
     *
     * @param id the version's identifier
     * @return the version with its JSON, or empty when there is none
     * @throws ArchiveException on a database failure
     */
    Optional<ArchivedStudy> show(long id) throws ArchiveException;

    /**
     * The audit trail of one version, in chain order.
     *
     * @param studyId the version's identifier
     * @return its events (empty when there is no such version)
     * @throws ArchiveException on a database failure
     */
    List<AuditEvent> events(long studyId) throws ArchiveException;

    /**
     * The current (not superseded) version of a change record, e.g. to supersede it with a correction.
     *
     * @param changeId the change record's identifier
     * @return its current version, or empty when the change id is not archived
     * @throws ArchiveException on a database failure
     */
    default Optional<StudyVersion> currentVersion(String changeId) throws ArchiveException {
        return list(ArchiveQuery.withDefaults().withChangeId(changeId).withVersions(ArchiveQuery.Versions.CURRENT))
                .stream().findFirst();
    }

    /**
     * Re-checks the whole hash chain and every study, JSON text and signature against it.
     *
     * @return the findings; {@link VerificationReport#intact()} when nothing was altered
     * @throws ArchiveException when the archive cannot be read
     */
    VerificationReport verify() throws ArchiveException;

    /**
     * Releases the archive's connections.
     *
     * @throws ArchiveException when closing fails
     */
    @Override
    void close() throws ArchiveException;
}
