package org.holdpoint.archive;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.sql.DriverManager;
import java.sql.SQLException;
import java.time.Instant;
import java.util.List;
import org.holdpoint.study.ArchiveException;
import org.holdpoint.study.ArchiveQuery;
import org.holdpoint.study.ArchivedStudy;
import org.holdpoint.study.AuditEvent;
import org.holdpoint.study.NewStudyVersion;
import org.holdpoint.study.ArchivedSignature;
import org.holdpoint.study.StudyVersion;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

/** Adding, listing, filtering, opening, superseding and signing on a fresh in-memory H2 archive per test. */
class JdbcArchiveTest {

    private static final Instant JAN = Instant.parse("2025-01-15T08:30:00Z");
    private static final Instant MAR = Instant.parse("2025-03-02T14:00:00.123456789Z");
    private static final Instant JUN = Instant.parse("2025-06-20T10:00:00Z");

    private String url;
    private JdbcArchive archive;

    @BeforeEach
    void open() throws ArchiveException {
        url = Fixtures.memUrl("archive");
        archive = JdbcArchive.open(url);
    }

    @AfterEach
    void close() {
        archive.close();
        assertThat(archive.openConnections()).isZero();
    }

    @Test
    void addThenShowReturnsTheJsonExactlyAndTheMetadata() throws ArchiveException {
        NewStudyVersion s = Fixtures.study("CR-1", "4711", "tooling", "change verified", MAR, "Bore", "Wall");
        StudyVersion v = archive.add(s, "Petra Engineer", "new insert");

        ArchivedStudy shown = archive.show(v.id()).orElseThrow();
        assertThat(shown.json()).isEqualTo(s.json());
        assertThat(shown.version()).isEqualTo(v);
        assertThat(v.version()).isEqualTo(1);
        assertThat(v.supersedes()).isNull();
        assertThat(v.characteristics()).containsExactly("Bore", "Wall");
        // timestamps are kept to the microsecond (PostgreSQL's resolution)
        assertThat(v.created()).isEqualTo(Instant.parse("2025-03-02T14:00:00.123456Z"));
        assertThat(archive.show(v.id() + 100)).isEmpty();
    }

    @Test
    void theSha256OfTheJsonIsThatOfItsUtf8Bytes() throws ArchiveException {
        NewStudyVersion s = NewStudyVersion.of("CR-9", "t", null, "P", null, List.of(), null, "a", JAN, "abc");
        // FIPS 180-2, Appendix B.1: SHA-256("abc")
        assertThat(archive.add(s, "a", null).jsonSha256())
                .isEqualTo("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
    }

    @Test
    void listFiltersByEveryCriterion() throws ArchiveException {
        StudyVersion a = archive.add(Fixtures.study("CR-1", "4711", "tooling", "change verified", JAN, "Bore"),
                "p", null);
        StudyVersion b = archive.add(Fixtures.study("CR-2", "4711", "material lot", "not verified", MAR, "Wall"),
                "p", null);
        StudyVersion c = archive.add(Fixtures.study("CR-3", "0815", "tooling", "change verified", JUN, "Bore",
                "Torque"), "p", null);
        archive.sign(c.id(), "Quinn Manager", "quality manager", "approved for series production", JUN);

        assertThat(ids(ArchiveQuery.withDefaults())).containsExactly(c.id(), b.id(), a.id());
        assertThat(ids(ArchiveQuery.withDefaults().withPartNumber("4711"))).containsExactly(b.id(), a.id());
        assertThat(ids(ArchiveQuery.withDefaults().withCharacteristic("bore"))).containsExactly(c.id(), a.id());
        assertThat(ids(ArchiveQuery.withDefaults().withChangeKind("Tooling"))).containsExactly(c.id(), a.id());
        assertThat(ids(ArchiveQuery.withDefaults().withVerdict("not verified"))).containsExactly(b.id());
        assertThat(ids(ArchiveQuery.withDefaults().withCreatedBetween(MAR, JUN))).containsExactly(b.id());
        assertThat(ids(ArchiveQuery.withDefaults().withCreatedBetween(MAR, null))).containsExactly(c.id(), b.id());
        assertThat(ids(ArchiveQuery.withDefaults().withSigner("quinn manager"))).containsExactly(c.id());
        assertThat(ids(ArchiveQuery.withDefaults().withPartNumber("4711").withCharacteristic("Wall")))
                .containsExactly(b.id());
        assertThat(ids(ArchiveQuery.withDefaults().withPartNumber("9999"))).isEmpty();
        // people search by part of a name, in any case, or with * for any run of characters
        assertThat(ids(ArchiveQuery.withDefaults().withSigner("QUINN"))).containsExactly(c.id());
        assertThat(ids(ArchiveQuery.withDefaults().withPartNumber("47"))).containsExactly(b.id(), a.id());
        assertThat(ids(ArchiveQuery.withDefaults().withPartNumber("0*5"))).containsExactly(c.id());
        assertThat(ids(ArchiveQuery.withDefaults().withPartNumber("7*"))).isEmpty();
        assertThat(ids(ArchiveQuery.withDefaults().withCharacteristic("orq"))).containsExactly(c.id());
        // LIKE wildcards typed by the user are taken literally
        assertThat(ids(ArchiveQuery.withDefaults().withPartNumber("4_11"))).isEmpty();
        assertThat(ids(ArchiveQuery.withDefaults().withPartNumber("%"))).isEmpty();

        StudyVersion listed = archive.list(ArchiveQuery.withDefaults().withChangeId("CR-3")).get(0);
        assertThat(listed.characteristics()).containsExactly("Bore", "Torque");
        assertThat(listed.signers()).containsExactly("Quinn Manager");
    }

    @Test
    void whoSignedTheDocumentBeforeArchivingIsFoundLikeAnArchiveSigner() throws ArchiveException {
        StudyVersion a = archive.add(Fixtures.study("CR-1", "4711", "tooling", "change verified", JAN, "Bore")
                .withDocumentSigners(List.of("R. Brandt", "K. Osei")), "p", null);
        StudyVersion b = archive.add(Fixtures.study("CR-2", "4712", "tooling", "change verified", MAR, "Bore"),
                "p", null);
        archive.sign(b.id(), "Karl Osei-Brandt", "quality manager", "approved", MAR);

        assertThat(ids(ArchiveQuery.withDefaults().withSigner("brandt"))).containsExactly(b.id(), a.id());
        assertThat(ids(ArchiveQuery.withDefaults().withSigner("r. b*"))).containsExactly(a.id());
        assertThat(ids(ArchiveQuery.withDefaults().withSigner("osei").withPartNumber("4711")))
                .containsExactly(a.id());
        StudyVersion shown = archive.show(a.id()).orElseThrow().version();
        assertThat(shown.signers()).containsExactly("R. Brandt", "K. Osei");
        assertThat(shown.signatures()).isEmpty();
        assertThat(archive.verify().intact()).isTrue();
    }

    @Test
    void aFilterValueIsAParameterNotSql() throws ArchiveException {
        archive.add(Fixtures.study("CR-1", "4711", "tooling", "ok", JAN), "p", null);
        assertThat(ids(ArchiveQuery.withDefaults().withPartNumber("4711' OR '1'='1"))).isEmpty();
    }

    @Test
    void supersedeMakesANewVersionThatPointsToTheOld() throws ArchiveException {
        StudyVersion v1 = archive.add(Fixtures.study("CR-1", "4711", "tooling", "inconclusive", JAN, "Bore"),
                "p", null);
        StudyVersion v2 = archive.supersede(v1.id(), Fixtures.study("CR-1", "4711", "tooling", "change verified",
                MAR, "Bore"), "Petra Engineer", "added 20 parts after the first run was inconclusive");

        assertThat(v2.version()).isEqualTo(2);
        assertThat(v2.supersedes()).isEqualTo(v1.id());
        assertThat(archive.show(v1.id()).orElseThrow().version().supersededBy()).isEqualTo(v2.id());
        assertThat(ids(ArchiveQuery.withDefaults().withVersions(ArchiveQuery.Versions.CURRENT)))
                .containsExactly(v2.id());
        assertThat(ids(ArchiveQuery.withDefaults().withChangeId("CR-1"))).containsExactly(v2.id(), v1.id());
        assertThat(archive.currentVersion("CR-1")).map(StudyVersion::id).contains(v2.id());
        assertThat(archive.currentVersion("CR-404")).isEmpty();
        assertThat(archive.events(v1.id())).extracting(AuditEvent::kind)
                .containsExactly(AuditEvent.Kind.CREATED, AuditEvent.Kind.SUPERSEDED);
        AuditEvent superseded = archive.events(v1.id()).get(1);
        assertThat(superseded.subjectId()).isEqualTo(v2.id());
        assertThat(superseded.why()).isEqualTo("added 20 parts after the first run was inconclusive");
    }

    @Test
    void archiveRulesAreEnforcedWithClearMessages() throws ArchiveException {
        StudyVersion v1 = archive.add(Fixtures.study("CR-1", "4711", "tooling", "ok", JAN), "p", null);
        NewStudyVersion again = Fixtures.study("CR-1", "4711", "tooling", "ok", MAR);

        assertThatThrownBy(() -> archive.add(again, "p", null)).isInstanceOf(ArchiveException.class)
                .hasMessageContaining("CR-1 is already archived").extracting(e -> ((ArchiveException) e).reason())
                .isEqualTo(ArchiveException.Reason.REJECTED);
        assertThatThrownBy(() -> archive.supersede(v1.id(), again, "p", " "))
                .hasMessageContaining("reason for the correction");
        assertThatThrownBy(() -> archive.supersede(v1.id(), Fixtures.study("CR-2", "4711", "t", "ok", MAR), "p",
                "fix")).hasMessageContaining("must keep the change id");
        StudyVersion v2 = archive.supersede(v1.id(), again, "p", "fix");
        assertThatThrownBy(() -> archive.supersede(v1.id(), again, "p", "fix"))
                .hasMessageContaining("superseded by study " + v2.id());
        assertThatThrownBy(() -> archive.sign(v1.id(), "Q", "qm", "approved", MAR))
                .hasMessageContaining("superseded by study " + v2.id());
        assertThatThrownBy(() -> archive.sign(999, "Q", "qm", "approved", MAR))
                .extracting(e -> ((ArchiveException) e).reason()).isEqualTo(ArchiveException.Reason.NOT_FOUND);
        assertThatThrownBy(() -> archive.sign(v2.id(), "Q", "", "approved", MAR)).hasMessageContaining("role");
        // nothing of the refused calls reached the chain: 1 CREATED + SUPERSEDED + CREATED
        assertThat(archive.verify().eventsChecked()).isEqualTo(3);
    }

    @Test
    void signAndHistoryAppearInTheStudysEventsInChainOrder() throws ArchiveException {
        NewStudyVersion s = Fixtures.study("CR-1", "4711", "tooling", "ok", JAN, "Bore").withHistory(List.of(
                new AuditEvent.Draft(AuditEvent.Kind.ANALYSED, "Petra", JAN, "analysed 1 characteristic", null),
                new AuditEvent.Draft(AuditEvent.Kind.EXCLUSION_ADDED, "Petra", JAN, "excluded Data!C12",
                        "gauge dropped")));
        StudyVersion v = archive.add(s, "Petra", "first release");
        ArchivedSignature sig = archive.sign(v.id(), "Quinn", "quality manager", "approved", MAR);

        List<AuditEvent> events = archive.events(v.id());
        assertThat(events).extracting(AuditEvent::kind).containsExactly(AuditEvent.Kind.CREATED,
                AuditEvent.Kind.ANALYSED, AuditEvent.Kind.EXCLUSION_ADDED, AuditEvent.Kind.SIGNED);
        assertThat(events).extracting(AuditEvent::seq).containsExactly(1L, 2L, 3L, 4L);
        assertThat(events.get(0).prevHash()).isEqualTo("0".repeat(64));
        for (int i = 1; i < events.size(); i++) {
            assertThat(events.get(i).prevHash()).isEqualTo(events.get(i - 1).hash());
        }
        assertThat(events.get(2).why()).isEqualTo("gauge dropped");
        assertThat(events.get(3).subjectId()).isEqualTo(sig.id());
        assertThat(events.get(3).dbUser()).isNotBlank();
        assertThat(archive.show(v.id()).orElseThrow().version().signatures()).containsExactly(sig);
        assertThat(archive.verify().intact()).isTrue();
    }

    @Test
    void aLargeStudyJsonIsStoredAndReturnedWhole() throws ArchiveException {
        String json = "{\"values\":[" + "12.0031,".repeat(250_000) + "12.0]}"; // about 2 MB
        NewStudyVersion s = NewStudyVersion.of("CR-BIG", "t", null, "P", null, List.of("Bore"), null, "a", JAN, json);
        assertThat(archive.show(archive.add(s, "a", null).id()).orElseThrow().json()).isEqualTo(json);
    }

    @Test
    void aDatabaseFailureNamesTheStatementAndItsParameters() {
        NewStudyVersion s = NewStudyVersion.of("CR-LONG", "x".repeat(3000), null, "P-1", null, List.of(), null, "a",
                JAN, "{}");
        // the H2 schema limits a title to 2000 characters
        assertThatThrownBy(() -> archive.add(s, "a", null)).isInstanceOf(ArchiveException.class)
                .hasMessageContaining("statement 'insert study' failed with parameters [1, 'CR-LONG', 1, null, 'xxx")
                .hasMessageContaining("…(3000 chars)")
                .hasMessageContaining("'P-1'")
                .extracting(e -> ((ArchiveException) e).reason()).isEqualTo(ArchiveException.Reason.DATABASE);
    }

    @Test
    void closingReleasesEveryConnectionSoTheInMemoryDatabaseIsGone() throws ArchiveException, SQLException {
        archive.add(Fixtures.study("CR-1", "4711", "tooling", "ok", JAN), "p", null);
        archive.list(ArchiveQuery.withDefaults());
        archive.verify();
        assertThat(archive.openConnections()).isPositive();
        archive.close();
        assertThat(archive.openConnections()).isZero();
        // an H2 in-memory database is dropped when its last connection closes, so a fresh connection finds
        // no tables: proof that the archive left none open
        try (var c = DriverManager.getConnection(url); var rs = c.getMetaData().getTables(null, null, "STUDY",
                null)) {
            assertThat(rs.next()).isFalse();
        }
        assertThatThrownBy(() -> archive.list(ArchiveQuery.withDefaults())).hasMessageContaining("closed");
    }

    private List<Long> ids(ArchiveQuery q) throws ArchiveException {
        return archive.list(q).stream().map(StudyVersion::id).toList();
    }
}
