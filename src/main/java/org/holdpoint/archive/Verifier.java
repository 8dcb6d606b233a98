package org.holdpoint.archive;

import java.sql.Connection;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.HashSet;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Map;
import java.util.Set;
import org.holdpoint.study.ArchiveException;
import org.holdpoint.study.AuditEvent;
import org.holdpoint.study.ArchivedSignature;
import org.holdpoint.study.VerificationReport;
import org.holdpoint.study.VerificationReport.Problem;

/**
 * Re-checks an archive from a consistent snapshot: the audit chain link by link, then every study, its
 * JSON text and every signature against the event that vouches for it.
 */
final class Verifier {

    /** An audit event as read, kind kept as text so a tampered value is reported, not thrown. */
    private record EventRow(AuditEvent event, String kindText) {
    }

    private final Set<Problem> problems = new LinkedHashSet<>();
    private final Map<Long, StudyRow> studies = new HashMap<>();
    private final Map<Long, ArchivedSignature> signatures = new HashMap<>();
    private final List<EventRow> events = new ArrayList<>();
    private long headSeq;
    private String headHash = Canonical.GENESIS;

    private Verifier() {
    }

    /**
     * Verifies everything reachable through the connection, which must be in a snapshot transaction.
     *
     * @param c the connection
     * @return the report
     * @throws ArchiveException when the archive cannot be read
     */
    static VerificationReport run(Connection c) throws ArchiveException {
        Verifier v = new Verifier();
        v.readEvents(c);
        v.readStudies(c);
        v.readSignatures(c);
        v.checkChain();
        v.checkSubjects();
        v.checkCoverage();
        return new VerificationReport(v.events.size(), v.studies.size(), v.signatures.size(), v.headSeq,
                v.headHash, new ArrayList<>(v.problems));
    }

    private void problem(String record, String detail) {
        problems.add(new Problem(record, detail));
    }

    private void readEvents(Connection c) throws ArchiveException {
        Jdbc.stream(c, Sql.ALL_EVENTS, rs -> {
            String kindText = rs.getString("kind");
            AuditEvent.Kind kind = kindOf(kindText);
            AuditEvent e = new AuditEvent(rs.getLong("seq"), rs.getLong("study_id"),
                    kind == null ? AuditEvent.Kind.CREATED : kind, rs.getLong("subject_id"), text(rs, "actor"),
                    text(rs, "db_user"), Jdbc.instant(rs, "occurred_at"), text(rs, "what"), rs.getString("why"),
                    trim(rs.getString("subject_digest")), trim(rs.getString("prev_hash")), trim(rs.getString("hash")));
            events.add(new EventRow(e, kind == null ? kindText : null));
        });
    }

    private static String text(ResultSet rs, String column) throws SQLException {
        String s = rs.getString(column);
        return s == null ? "" : s;
    }

    private static String trim(String s) {
        return s == null ? "" : s.trim();
    }

    private static AuditEvent.Kind kindOf(String text) {
        for (AuditEvent.Kind k : AuditEvent.Kind.values()) {
            if (k.name().equals(text)) {
                return k;
            }
        }
        return null;
    }

    private void readStudies(Connection c) throws ArchiveException {
        Jdbc.stream(c, Sql.ALL_STUDIES, rs -> {
            StudyRow row = StudyRow.map(rs);
            String json = rs.getString("json_text");
            String actual = Canonical.sha256Hex(json == null ? "" : json);
            if (!actual.equals(row.jsonSha256())) {
                problem(studyName(row), "its JSON text was changed after archiving (SHA-256 of the text is "
                        + actual + ", recorded " + row.jsonSha256() + ")");
            }
            studies.put(row.id(), row);
        });
        attach(c, Sql.ALL_CHARACTERISTICS, StudyRow::withCharacteristics);
        // the document's signers are part of the row its CREATED event vouches for
        attach(c, Sql.ALL_DOCUMENT_SIGNERS, StudyRow::withDocumentSigners);
    }

    /** Reads (study_id, name) rows in order and gives each study row its list of names. */
    private void attach(Connection c, Stmt all, java.util.function.BiFunction<StudyRow, List<String>, StudyRow> with)
            throws ArchiveException {
        Map<Long, List<String>> names = new HashMap<>();
        Jdbc.stream(c, all, rs -> names.computeIfAbsent(rs.getLong("study_id"), k -> new ArrayList<>())
                .add(rs.getString("name")));
        for (Map.Entry<Long, List<String>> e : names.entrySet()) {
            StudyRow row = studies.get(e.getKey());
            if (row != null) {
                studies.put(row.id(), with.apply(row, e.getValue()));
            }
        }
    }

    private void readSignatures(Connection c) throws ArchiveException {
        Jdbc.stream(c, Sql.ALL_SIGNATURES, rs -> {
            ArchivedSignature s = StudyRow.mapSignature(rs);
            signatures.put(s.id(), s);
        });
    }

    private void checkChain() {
        long expected = 1;
        String prev = Canonical.GENESIS;
        for (EventRow r : events) {
            AuditEvent e = r.event();
            String name = eventName(e);
            if (e.seq() != expected) {
                problem(name, expected == e.seq() - 1 ? "entry seq " + expected + " is missing (deleted)"
                        : "entries seq " + expected + " to " + (e.seq() - 1) + " are missing (deleted)");
            }
            if (!e.prevHash().equals(prev)) {
                problem(name, "its prev_hash does not match the hash of the entry before it"
                        + " (an earlier entry was changed or removed)");
            }
            if (r.kindText() != null || !Chain.hashOf(e).equals(e.hash())) {
                problem(name, "the entry was changed after it was written (its fields no longer match its hash)");
            }
            prev = e.hash();
            expected = e.seq() + 1;
            headSeq = e.seq();
            headHash = e.hash();
        }
    }

    private void checkSubjects() {
        for (EventRow r : events) {
            AuditEvent e = r.event();
            if (r.kindText() != null) {
                continue;
            }
            switch (e.kind()) {
                case SIGNED -> checkSignatureSubject(e);
                case SUPERSEDED -> checkStudySubject(e, studies.get(e.subjectId()), "superseding ");
                default -> checkStudySubject(e, studies.get(e.studyId()), "");
            }
        }
    }

    private void checkStudySubject(AuditEvent e, StudyRow row, String role) {
        if (row == null) {
            long id = e.kind() == AuditEvent.Kind.SUPERSEDED ? e.subjectId() : e.studyId();
            problem("study " + id, "the " + role + "study that " + eventName(e) + " vouches for is missing (deleted)");
        } else if (e.kind() == AuditEvent.Kind.SUPERSEDED && !Long.valueOf(e.studyId()).equals(row.supersedes())) {
            problem(studyName(row), "it no longer names study " + e.studyId() + " as the version it supersedes ("
                    + eventName(e) + ")");
        } else if (!row.digest().equals(e.subjectDigest())) {
            problem(studyName(row), "its stored fields were changed after archiving (they no longer match "
                    + eventName(e) + ")");
        }
    }

    private void checkSignatureSubject(AuditEvent e) {
        ArchivedSignature s = signatures.get(e.subjectId());
        if (s == null) {
            problem("signature " + e.subjectId(), "the signature that " + eventName(e)
                    + " vouches for is missing (deleted)");
        } else if (!StudyRow.digest(s).equals(e.subjectDigest()) || s.studyId() != e.studyId()) {
            problem(signatureName(s), "the signature was changed after signing (it no longer matches "
                    + eventName(e) + ")");
        }
    }

    private void checkCoverage() {
        Set<Long> created = new HashSet<>();
        Set<Long> supersededFor = new HashSet<>();
        Set<Long> signed = new HashSet<>();
        for (EventRow r : events) {
            AuditEvent e = r.event();
            switch (e.kind()) {
                case CREATED -> created.add(e.studyId());
                case SUPERSEDED -> supersededFor.add(e.subjectId());
                case SIGNED -> signed.add(e.subjectId());
                default -> { }
            }
        }
        for (StudyRow row : studies.values()) {
            if (!created.contains(row.id())) {
                problem(studyName(row), "no CREATED audit event vouches for it (inserted outside Holdpoint, or its"
                        + " event was deleted)");
            }
            if (row.supersedes() != null && !supersededFor.contains(row.id())) {
                problem(studyName(row), "it claims to supersede study " + row.supersedes()
                        + " but no SUPERSEDED audit event records that");
            }
        }
        for (ArchivedSignature s : signatures.values()) {
            if (!signed.contains(s.id())) {
                problem(signatureName(s), "no SIGNED audit event vouches for it (inserted outside Holdpoint, or its"
                        + " event was deleted)");
            }
        }
    }

    private static String eventName(AuditEvent e) {
        return "audit_event seq " + e.seq();
    }

    private static String studyName(StudyRow row) {
        return "study " + row.id() + " (" + row.changeId() + " version " + row.version() + ")";
    }

    private static String signatureName(ArchivedSignature s) {
        return "signature " + s.id() + " (study " + s.studyId() + ", " + s.signer() + ")";
    }
}
