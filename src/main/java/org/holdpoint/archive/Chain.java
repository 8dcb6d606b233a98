package org.holdpoint.archive;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import org.holdpoint.study.ArchiveException;
import org.holdpoint.study.AuditEvent;

/**
 * Appends audit events to the global hash chain inside one write transaction; the caller has already
 * serialised writers (PostgreSQL advisory lock; the unique chain position catches any other race).
 */
final class Chain {

    private final Connection connection;
    private final String dbUser;
    private long headSeq;
    private String headHash;

    private Chain(Connection connection, String dbUser, long headSeq, String headHash) {
        this.connection = connection;
        this.dbUser = dbUser;
        this.headSeq = headSeq;
        this.headHash = headHash;
    }

    /**
     * Reads the chain head in the current transaction.
     *
     * @param c the connection, in a transaction
     * @return the chain positioned after its last event
     * @throws ArchiveException on a database failure
     */
    static Chain open(Connection c) throws ArchiveException {
        String user = Jdbc.queryOne(c, Sql.CURRENT_DB_USER, rs -> rs.getString(1)).orElse("");
        if (user.isBlank()) {
            // an embedded database opened without a user: record the operating-system account instead
            user = "os:" + System.getProperty("user.name", "unknown");
        }
        long[] seq = {0};
        String[] hash = {Canonical.GENESIS};
        Jdbc.stream(c, Sql.SELECT_HEAD, rs -> {
            seq[0] = rs.getLong("seq");
            hash[0] = rs.getString("hash").trim();
        });
        return new Chain(c, user, seq[0], hash[0]);
    }

    /**
     * The hash of an event: SHA-256 of its canonical form ({@link Canonical#EVENT}) including prevHash.
     *
     * @param e the event (its own hash is ignored)
     * @return the hash
     */
    static String hashOf(AuditEvent e) {
        return Canonical.of(Canonical.EVENT)
                .field("seq", e.seq())
                .field("studyId", e.studyId())
                .field("kind", e.kind().name())
                .field("subjectId", e.subjectId())
                .field("who", e.who())
                .field("dbUser", e.dbUser())
                .field("when", e.when())
                .field("what", e.what())
                .field("why", e.why())
                .field("subjectDigest", e.subjectDigest())
                .field("prevHash", e.prevHash())
                .sha256();
    }

    /**
     * Appends one event after the current head.
     *
     * @param studyId       the study the event belongs to
     * @param kind          what happened
     * @param subjectId     the row the event vouches for
     * @param who           who did it
     * @param when          when (already truncated to microseconds)
     * @param what          what happened
     * @param why           why, or null
     * @param subjectDigest the subject row's canonical digest
     * @return the stored event
     * @throws ArchiveException on a database failure (RETRYABLE_CONFLICT when another writer took the position)
     */
    AuditEvent append(long studyId, AuditEvent.Kind kind, long subjectId, String who, Instant when, String what,
            String why, String subjectDigest) throws ArchiveException {
        AuditEvent draft = new AuditEvent(headSeq + 1, studyId, kind, subjectId, who, dbUser, when, what, why,
                subjectDigest, headHash, "");
        String hash = hashOf(draft);
        Jdbc.update(connection, Sql.INSERT_EVENT, draft.seq(), studyId, kind.name(), subjectId, who, dbUser, when,
                what, why, subjectDigest, headHash, hash);
        headSeq = draft.seq();
        headHash = hash;
        return new AuditEvent(draft.seq(), studyId, kind, subjectId, who, dbUser, when, what, why, subjectDigest,
                draft.prevHash(), hash);
    }

    /**
     * Maps an audit event row.
     *
     * @param rs the result set
     * @return the event
     * @throws SQLException when a column cannot be read
     */
    static AuditEvent map(ResultSet rs) throws SQLException {
        return new AuditEvent(rs.getLong("seq"), rs.getLong("study_id"), AuditEvent.Kind.valueOf(rs.getString("kind")),
                rs.getLong("subject_id"), rs.getString("actor"), rs.getString("db_user"),
                Jdbc.instant(rs, "occurred_at"), rs.getString("what"), rs.getString("why"),
                rs.getString("subject_digest").trim(), rs.getString("prev_hash").trim(), rs.getString("hash").trim());
    }
}
