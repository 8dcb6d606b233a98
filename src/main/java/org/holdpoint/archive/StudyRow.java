package org.holdpoint.archive;

import java.sql.ResultSet;
import java.sql.SQLException;
import java.time.Instant;
import java.util.List;
import org.holdpoint.study.ArchivedSignature;
import org.holdpoint.study.StudyVersion;

/**
 * One row of the study table as stored, with its characteristics: exactly the fields its CREATED event
 * vouches for.
 */
record StudyRow(long id, String changeId, int version, Long supersedes, String title, String changeKind,
        String partNumber, String revision, List<String> characteristics, String verdict, String author,
        Instant created, Instant archivedAt, String jsonSha256, List<String> documentSigners) {

    /** Copies the lists. */
    StudyRow {
        characteristics = List.copyOf(characteristics);
        documentSigners = List.copyOf(documentSigners);
    }

    /** @return SHA-256 of the row's canonical form ({@link Canonical#STUDY}) */
    String digest() {
        return Canonical.of(Canonical.STUDY)
                .field("id", id)
                .field("changeId", changeId)
                .field("version", version)
                .field("supersedes", supersedes)
                .field("title", title)
                .field("changeKind", changeKind)
                .field("partNumber", partNumber)
                .field("revision", revision)
                .list("characteristics", characteristics)
                .field("verdict", verdict)
                .field("author", author)
                .field("created", created)
                .field("archivedAt", archivedAt)
                .field("jsonSha256", jsonSha256)
                // schema 2: only rows with signers carry the field, so rows written before keep their digest
                .listIfAny("documentSigners", documentSigners)
                .sha256();
    }

    /**
     * @param list the document's signers
     * @return a copy with them
     */
    StudyRow withDocumentSigners(List<String> list) {
        return new StudyRow(id, changeId, version, supersedes, title, changeKind, partNumber, revision,
                characteristics, verdict, author, created, archivedAt, jsonSha256, list);
    }

    /**
     * @param list the characteristics
     * @return a copy with them
     */
    StudyRow withCharacteristics(List<String> list) {
        return new StudyRow(id, changeId, version, supersedes, title, changeKind, partNumber, revision, list,
                verdict, author, created, archivedAt, jsonSha256, documentSigners);
    }

    /**
     * @param supersededBy the newer version's id, or null
     * @param signatures   the signatures
     * @return the public view of this row
     */
    StudyVersion toVersion(Long supersededBy, List<ArchivedSignature> signatures) {
        return new StudyVersion(id, changeId, version, supersedes, supersededBy, title, changeKind, partNumber,
                revision, characteristics, verdict, author, created, archivedAt, signatures, documentSigners,
                jsonSha256);
    }

    /**
     * Maps the study columns of the current row (characteristics left empty).
     *
     * @param rs the result set
     * @return the row
     * @throws SQLException when a column cannot be read
     */
    static StudyRow map(ResultSet rs) throws SQLException {
        return new StudyRow(rs.getLong("id"), rs.getString("change_id"), rs.getInt("version"),
                Jdbc.nullableLong(rs, "supersedes_id"), rs.getString("title"), rs.getString("change_kind"),
                rs.getString("part_number"), rs.getString("revision"), List.of(), rs.getString("verdict"),
                rs.getString("author"), Jdbc.instant(rs, "created_at"), Jdbc.instant(rs, "archived_at"),
                rs.getString("json_sha256").trim(), List.of());
    }

    /**
     * The canonical digest of a signature row ({@link Canonical#SIGNATURE}).
     *
     * @param s the signature
     * @return its SHA-256
     */
    static String digest(ArchivedSignature s) {
        return Canonical.of(Canonical.SIGNATURE)
                .field("id", s.id())
                .field("studyId", s.studyId())
                .field("signer", s.signer())
                .field("role", s.role())
                .field("meaning", s.meaning())
                .field("signedAt", s.signedAt())
                .sha256();
    }

    /**
     * Maps a signature row.
     *
     * @param rs the result set
     * @return the signature
     * @throws SQLException when a column cannot be read
     */
    static ArchivedSignature mapSignature(ResultSet rs) throws SQLException {
        return new ArchivedSignature(rs.getLong("id"), rs.getLong("study_id"), rs.getString("signer"),
                rs.getString("role"), rs.getString("meaning"), Jdbc.instant(rs, "signed_at"));
    }
}
