package org.holdpoint.archive;

import static org.assertj.core.api.Assertions.assertThat;

import java.sql.SQLException;
import java.time.Instant;
import java.util.List;
import org.holdpoint.study.ArchiveException;
import org.holdpoint.study.AuditEvent;
import org.holdpoint.study.StudyVersion;
import org.holdpoint.study.VerificationReport;
import org.holdpoint.study.VerificationReport.Problem;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

/**
 * Edits and deletions made directly in the database, bypassing Holdpoint, are found by verify(), which names
 * the altered record. Each test tampers with its own fresh archive of three studies (one superseded, one
 * signed; 6 events).
 */
class TamperDetectionTest {

    private static final Instant T = Instant.parse("2025-04-01T09:00:00Z");

    private String url;
    private JdbcArchive archive;
    private StudyVersion first;
    private StudyVersion second;
    private StudyVersion correction;

    @BeforeEach
    void fill() throws ArchiveException {
        url = Fixtures.memUrl("tamper");
        archive = JdbcArchive.open(url);
        first = archive.add(Fixtures.study("CR-1", "4711", "tooling", "change verified", T, "Bore")
                .withDocumentSigners(List.of("R. Brandt")), "p", null);
        second = archive.add(Fixtures.study("CR-2", "4711", "machine", "inconclusive", T, "Wall"), "p", null);
        correction = archive.supersede(second.id(), Fixtures.study("CR-2", "4711", "machine", "change verified", T,
                "Wall"), "p", "more parts measured");
        archive.sign(first.id(), "Quinn", "quality manager", "approved", T);
        // chain: 1 CREATED first, 2 CREATED second, 3 SUPERSEDED second, 4 CREATED correction, 5 SIGNED first
    }

    @AfterEach
    void close() {
        archive.close();
        assertThat(archive.openConnections()).isZero();
    }

    @Test
    void anUntouchedArchiveIsIntact() throws ArchiveException {
        VerificationReport r = archive.verify();
        assertThat(r.problems()).isEmpty();
        assertThat(r.intact()).isTrue();
        assertThat(r.eventsChecked()).isEqualTo(5);
        assertThat(r.studiesChecked()).isEqualTo(3);
        assertThat(r.signaturesChecked()).isEqualTo(1);
        assertThat(r.headSeq()).isEqualTo(5);
        List<AuditEvent> ev = archive.events(first.id());
        assertThat(r.headHash()).isEqualTo(ev.get(ev.size() - 1).hash());
    }

    @Test
    void anEditedStudyFieldIsNamed() throws SQLException, ArchiveException {
        Fixtures.direct(url, "UPDATE study SET verdict = 'change verified' WHERE id = " + second.id());
        assertThat(records(archive.verify())).containsExactly("study " + second.id() + " (CR-2 version 1)");
    }

    @Test
    void anEditedJsonTextIsNamed() throws SQLException, ArchiveException {
        Fixtures.direct(url, "UPDATE study SET json_text = REPLACE(json_text, '4711', '4712') WHERE id = "
                + first.id());
        VerificationReport r = archive.verify();
        assertThat(r.intact()).isFalse();
        assertThat(r.problems()).anySatisfy(p -> {
            assertThat(p.record()).isEqualTo("study " + first.id() + " (CR-1 version 1)");
            assertThat(p.detail()).contains("JSON text was changed");
        });
    }

    @Test
    void anEditedJsonTextWithItsHashRecomputedIsStillFound() throws SQLException, ArchiveException {
        String json = "{\"forged\":true}";
        // SHA-256 of the forged text, computed with python3 -c "import hashlib;print(hashlib.sha256(
        // b'{\"forged\":true}').hexdigest())" (Python 3.11 hashlib)
        String sha = "094aec33c6d2a18c34f94e8ede16500d3ef3ed157ec77e26cf7876816559d59b";
        Fixtures.direct(url, "UPDATE study SET json_text = '" + json + "', json_sha256 = '" + sha + "' WHERE id = "
                + first.id());
        assertThat(records(archive.verify())).containsExactly("study " + first.id() + " (CR-1 version 1)");
    }

    @Test
    void anEditedCharacteristicIsNamedAsItsStudy() throws SQLException, ArchiveException {
        Fixtures.direct(url, "UPDATE study_characteristic SET name = 'Bore2' WHERE study_id = " + first.id());
        assertThat(records(archive.verify())).containsExactly("study " + first.id() + " (CR-1 version 1)");
    }

    @Test
    void anEditedDocumentSignerIsNamedAsItsStudy() throws SQLException, ArchiveException {
        Fixtures.direct(url, "UPDATE study_signer SET name = 'Someone Else' WHERE study_id = " + first.id());
        assertThat(records(archive.verify())).containsExactly("study " + first.id() + " (CR-1 version 1)");
    }

    @Test
    void aDocumentSignerAddedOrRemovedBehindHoldpointsBackIsNamed() throws SQLException, ArchiveException {
        Fixtures.direct(url, "INSERT INTO study_signer (study_id, ordinal, name) VALUES (" + correction.id()
                + ", 0, 'Quinn')");
        Fixtures.direct(url, "DELETE FROM study_signer WHERE study_id = " + first.id());
        assertThat(records(archive.verify())).containsExactlyInAnyOrder("study " + first.id() + " (CR-1 version 1)",
                "study " + correction.id() + " (CR-2 version 2)");
    }

    @Test
    void anEditedAuditEventIsNamed() throws SQLException, ArchiveException {
        Fixtures.direct(url, "UPDATE audit_event SET why = 'nobody asked' WHERE seq = 3");
        VerificationReport r = archive.verify();
        assertThat(r.problems()).extracting(Problem::record).containsExactly("audit_event seq 3");
        assertThat(r.problems().get(0).detail()).contains("changed after it was written");
    }

    @Test
    void anEditedEventWhoseHashWasRecomputedBreaksTheNextLink() throws SQLException, ArchiveException {
        AuditEvent e = archive.events(second.id()).get(1);
        AuditEvent forged = new AuditEvent(e.seq(), e.studyId(), e.kind(), e.subjectId(), "someone else",
                e.dbUser(), e.when(), e.what(), e.why(), e.subjectDigest(), e.prevHash(), "");
        Fixtures.direct(url, "UPDATE audit_event SET actor = 'someone else', hash = '" + Chain.hashOf(forged)
                + "' WHERE seq = " + e.seq());
        VerificationReport r = archive.verify();
        assertThat(r.problems()).extracting(Problem::record).containsExactly("audit_event seq 4");
        assertThat(r.problems().get(0).detail()).contains("prev_hash does not match");
    }

    @Test
    void aDeletedAuditEventIsNamed() throws SQLException, ArchiveException {
        Fixtures.direct(url, "DELETE FROM audit_event WHERE seq = 2");
        VerificationReport r = archive.verify();
        assertThat(r.problems()).extracting(Problem::toString).contains(
                "audit_event seq 3: entry seq 2 is missing (deleted)",
                "audit_event seq 3: its prev_hash does not match the hash of the entry before it"
                        + " (an earlier entry was changed or removed)",
                "study " + second.id() + " (CR-2 version 1): no CREATED audit event vouches for it (inserted"
                        + " outside Holdpoint, or its event was deleted)");
    }

    @Test
    void aDeletedSignatureIsNamed() throws SQLException, ArchiveException {
        long sig = Fixtures.directLong(url, "SELECT id FROM signature");
        Fixtures.direct(url, "DELETE FROM signature");
        assertThat(records(archive.verify())).containsExactly("signature " + sig);
    }

    @Test
    void anEditedSignatureIsNamed() throws SQLException, ArchiveException {
        Fixtures.direct(url, "UPDATE signature SET meaning = 'reviewed only'");
        assertThat(records(archive.verify())).singleElement().asString().startsWith("signature ")
                .endsWith("(study " + first.id() + ", Quinn)");
    }

    @Test
    void aDeletedStudyWithItsEventsIsFoundThroughTheChain() throws SQLException, ArchiveException {
        Fixtures.direct(url, "DELETE FROM audit_event WHERE study_id = " + correction.id()
                + " OR subject_id = " + correction.id());
        Fixtures.direct(url, "DELETE FROM study_characteristic WHERE study_id = " + correction.id());
        Fixtures.direct(url, "DELETE FROM study WHERE id = " + correction.id());
        VerificationReport r = archive.verify();
        assertThat(r.problems()).extracting(Problem::toString)
                .contains("audit_event seq 5: entries seq 3 to 4 are missing (deleted)");
    }

    @Test
    void aStudyInsertedBehindHoldpointsBackIsNamed() throws SQLException, ArchiveException {
        Fixtures.direct(url, "INSERT INTO study (id, change_id, version, title, part_number, author, created_at,"
                + " archived_at, json_sha256, json_text) VALUES (99, 'CR-X', 1, 'forged', '4711', 'x',"
                + " CURRENT_TIMESTAMP, CURRENT_TIMESTAMP, '" + Canonical.sha256Hex("{}") + "', '{}')");
        assertThat(records(archive.verify())).containsExactly("study 99 (CR-X version 1)");
    }

    @Test
    void deletingTheNewestEventLeavesItsSignatureUnvouched() throws SQLException, ArchiveException {
        Fixtures.direct(url, "DELETE FROM audit_event WHERE seq = 5");
        assertThat(records(archive.verify())).containsExactly("signature 1 (study " + first.id() + ", Quinn)");
    }

    @Test
    void aTailCutWithItsRowsIsVisibleOnlyAgainstAHeadHashKeptElsewhere() throws SQLException, ArchiveException {
        String head = archive.verify().headHash();
        // the known limit of any hash chain: remove the newest entry together with the row it vouches for
        Fixtures.direct(url, "DELETE FROM audit_event WHERE seq = 5");
        Fixtures.direct(url, "DELETE FROM signature");
        VerificationReport r = archive.verify();
        assertThat(r.intact()).isTrue();
        assertThat(r.headSeq()).isEqualTo(4);
        assertThat(r.headHash()).isNotEqualTo(head); // so a head hash recorded outside the archive exposes it
    }

    private static List<String> records(VerificationReport r) {
        return r.problems().stream().map(Problem::record).distinct().toList();
    }
}
