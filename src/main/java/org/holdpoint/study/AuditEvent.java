package org.holdpoint.study;

import java.time.Instant;
import java.util.Objects;

/**
 * One entry of the archive's audit trail: who did what to which study, when and why, chained to the
 * entry before it by hash.
 *
 * <p>{@code hash = SHA-256(canonical(seq, studyId, kind, subjectId, who, dbUser, when, what, why,
 * subjectDigest, prevHash))}; {@code prevHash} is the hash of entry {@code seq − 1} (64 zeros for the first), so the
 * trail is one global chain in insertion order.
 *
 * @param seq           position in the global chain, 1, 2, 3, …
 * @param studyId       the study version the event belongs to
 * @param kind          what happened
 * @param subjectId     the row the event vouches for: the study itself, the signature (SIGNED) or the
 *                      superseding study (SUPERSEDED)
 * @param who           the person who did it, as the caller named them
 * @param dbUser        the database user the archive was connected as when it was recorded
 * @param when          when it happened
 * @param what          what happened, in words
 * @param why           the reason given, or null
 * @param subjectDigest lower-case hex SHA-256 of the canonical form of the subject row
 * @param prevHash      lower-case hex SHA-256 of the previous entry
 * @param hash          lower-case hex SHA-256 of this entry
 */
public record AuditEvent(long seq, long studyId, Kind kind, long subjectId, String who, String dbUser, Instant when, String what,
        String why, String subjectDigest, String prevHash, String hash) {

    /** Validates the entry. */
    public AuditEvent {
        Objects.requireNonNull(kind, "kind");
        Objects.requireNonNull(who, "who");
        Objects.requireNonNull(dbUser, "dbUser");
        Objects.requireNonNull(when, "when");
        Objects.requireNonNull(what, "what");
    }

    /** What an audit event records. */
    public enum Kind {
        /** A study version was archived. */
        CREATED,
        /** The study was analysed (carried over from the study file's history). */
        ANALYSED,
        /** A value was excluded with a reason (carried over from the study file's history). */
        EXCLUSION_ADDED,
        /** Someone signed the study version. */
        SIGNED,
        /** A newer version replaced this one. */
        SUPERSEDED
    }

    /**
     * An event from a study file's own history, handed to the archive with a new version.
     *
     * @param kind ANALYSED or EXCLUSION_ADDED
     * @param who  who did it
     * @param when when it happened
     * @param what what happened, in words
     * @param why  the reason given, or null
     */
    public record Draft(Kind kind, String who, Instant when, String what, String why) {

        /** Validates the draft: only history kinds, who and what not blank. */
        public Draft {
            if (kind != Kind.ANALYSED && kind != Kind.EXCLUSION_ADDED) {
                throw new IllegalArgumentException(
                        "a study's history may hold only ANALYSED or EXCLUSION_ADDED events, not " + kind);
            }
            Checks.notBlank(who, "who");
            Objects.requireNonNull(when, "when");
            Checks.notBlank(what, "what");
        }
    }
}
