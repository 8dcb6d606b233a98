package org.holdpoint.archive;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.List;
import java.util.Locale;
import java.util.Properties;
import java.util.UUID;
import org.holdpoint.study.ArchiveException;
import org.holdpoint.study.ArchiveQuery;
import org.holdpoint.study.StudyVersion;
import org.holdpoint.study.VerificationReport;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledIfEnvironmentVariable;

/**
 * The archive on a real PostgreSQL server: roles enforced by the database, the append-only trigger, the
 * hash chain and two concurrent writers. Runs when HOLDPOINT_PG_URL holds an administrator's JDBC URL
 * (.ci/start-postgres.sh starts a throwaway cluster and prints it). Each test gets its own database and
 * login roles, dropped afterwards.
 */
@Tag("postgres")
@EnabledIfEnvironmentVariable(named = "HOLDPOINT_PG_URL", matches = ".+")
class PostgresArchiveTest {

    private static final Instant T = Instant.parse("2025-04-01T09:00:00Z");

    private final String admin = System.getenv("HOLDPOINT_PG_URL");
    private final String suffix = UUID.randomUUID().toString().replace("-", "").substring(0, 10);
    private final String db = "hp_test_" + suffix;
    private final String owner = "hp_owner_" + suffix;
    private final String author = "hp_author_" + suffix;
    private final String approver = "hp_approver_" + suffix;
    private final String auditor = "hp_auditor_" + suffix;
    private String url;

    @BeforeEach
    void createDatabaseAndRoles() throws SQLException, IOException {
        exec(admin, resource("postgresql-setup.sql"));
        exec(admin, "CREATE DATABASE " + db + " OWNER holdpoint_owner");
        url = admin.replaceFirst("/[^/?]*(\\?.*)?$", "/" + db);
        exec(adminOn(db), resource("postgresql-database.sql"));
        exec(admin, "CREATE ROLE " + owner + " LOGIN IN ROLE holdpoint_owner");
        exec(admin, "ALTER ROLE " + owner + " SET role = 'holdpoint_owner'");
        exec(admin, "CREATE ROLE " + author + " LOGIN IN ROLE holdpoint_author");
        exec(admin, "CREATE ROLE " + approver + " LOGIN IN ROLE holdpoint_approver");
        exec(admin, "CREATE ROLE " + auditor + " LOGIN IN ROLE holdpoint_auditor");
    }

    @AfterEach
    void dropDatabaseAndRoles() throws SQLException, InterruptedException {
        // every archive was closed, so the database has no sessions left and can be dropped
        assertThat(sessions()).isZero();
        exec(admin, "DROP DATABASE " + db);
        for (String role : List.of(owner, author, approver, auditor)) {
            exec(admin, "DROP ROLE " + role);
        }
    }

    @Test
    void rolesDoWhatTheyMayAndNoMore() throws Exception {
        assertThat(JdbcArchive.migrate(url, owner, null)).containsExactly(1, 2);
        long id;
        try (JdbcArchive asAuthor = JdbcArchive.open(url, author, null)) {
            // the author archives the study with the names signed in its own document
            id = asAuthor.add(Fixtures.study("CR-1", "4711", "tooling", "change verified", T, "Bore")
                    .withDocumentSigners(List.of("Petra Brandt")), "Petra", null).id();
            assertThatThrownBy(() -> asAuthor.sign(id, "Petra", "engineer", "approved", T))
                    .isInstanceOf(ArchiveException.class).hasMessageContaining("insert signature")
                    .extracting(e -> ((ArchiveException) e).reason())
                    .isEqualTo(ArchiveException.Reason.PERMISSION_DENIED);
        }
        try (JdbcArchive asApprover = JdbcArchive.open(url, approver, null)) {
            asApprover.sign(id, "Quinn", "quality manager", "approved for series production", T);
            assertThatThrownBy(() -> asApprover.add(Fixtures.study("CR-2", "4711", "t", "ok", T), "Quinn", null))
                    .extracting(e -> ((ArchiveException) e).reason())
                    .isEqualTo(ArchiveException.Reason.PERMISSION_DENIED);
        }
        try (JdbcArchive asAuditor = JdbcArchive.open(url, auditor, null)) {
            assertThat(asAuditor.list(ArchiveQuery.withDefaults().withSigner("Quinn"))).extracting(StudyVersion::id)
                    .containsExactly(id);
            assertThat(asAuditor.list(ArchiveQuery.withDefaults().withSigner("brandt"))).extracting(StudyVersion::id)
                    .containsExactly(id);
            assertThat(asAuditor.show(id)).isPresent();
            assertThat(asAuditor.verify().intact()).isTrue();
            assertThatThrownBy(() -> asAuditor.add(Fixtures.study("CR-3", "4711", "t", "ok", T), "Audrey", null))
                    .hasMessageContaining("permission denied")
                    .extracting(e -> ((ArchiveException) e).reason())
                    .isEqualTo(ArchiveException.Reason.PERMISSION_DENIED);
        }
        assertThat(sqlState(auditor, "INSERT INTO audit_event SELECT * FROM audit_event")).isEqualTo("42501");
        assertThat(sqlState(approver, "INSERT INTO study_signer (study_id, ordinal, name) VALUES (" + id
                + ", 5, 'x')")).isEqualTo("42501");
        for (String who : List.of(author, approver, auditor)) {
            assertThat(sqlState(who, "UPDATE study SET title = 'x'")).as(who).isEqualTo("42501");
            assertThat(sqlState(who, "DELETE FROM audit_event")).as(who).isEqualTo("42501");
            assertThat(sqlState(who, "TRUNCATE signature")).as(who).isEqualTo("42501");
            assertThat(sqlState(who, "UPDATE study_signer SET name = 'x'")).as(who).isEqualTo("42501");
        }
        // row-level security: each role appends only its own kinds of event, under its own database name
        String event = "INSERT INTO audit_event (seq, study_id, kind, subject_id, actor, db_user, occurred_at, what,"
                + " subject_digest, prev_hash, hash) VALUES (99, " + id + ", '%s', " + id + ", 'x', '%s', now(), 'x',"
                + " repeat('0', 64), repeat('0', 64), repeat('%s', 64))";
        assertThat(sqlState(approver, String.format(event, "CREATED", approver, "a"))).isEqualTo("42501");
        assertThat(sqlState(author, String.format(event, "SIGNED", author, "b"))).isEqualTo("42501");
        assertThat(sqlState(author, String.format(event, "CREATED", approver, "c"))).isEqualTo("42501");
        // the same row under the author's own name and kind passes the policy (and is then caught by verify)
        assertThat(sqlState(author, String.format(event, "CREATED", author, "d"))).isEqualTo("no error");
        try (JdbcArchive asAuditor = JdbcArchive.open(url, auditor, null)) {
            assertThat(asAuditor.verify().problems()).extracting(VerificationReport.Problem::record)
                    .contains("audit_event seq 99");
        }
        // even the owner is stopped by the append-only trigger
        assertThat(sqlState(owner, "UPDATE study SET title = 'x'")).isEqualTo("42501");
        assertThat(sqlState(owner, "DELETE FROM audit_event")).isEqualTo("42501");
    }

    /**
     * No role the program works as can switch the append-only trigger off: only a table's owner or a
     * superuser may ALTER TABLE … DISABLE TRIGGER (PostgreSQL manual, ALTER TABLE), and the program refuses
     * to do daily work connected as either.
     */
    @Test
    void noApplicationRoleCanDisableTheTriggerAndTheOwnerIsNotUsedForDailyWork() throws Exception {
        assertThat(JdbcArchive.migrate(url, owner, null)).containsExactly(1, 2);
        for (String who : List.of(author, approver, auditor)) {
            for (String table : List.of("study", "signature", "audit_event", "study_characteristic",
                    "study_signer")) {
                assertThat(sqlState(who, "ALTER TABLE " + table + " DISABLE TRIGGER ALL")).as(who + " " + table)
                        .isEqualTo("42501");
            }
            assertThat(sqlState(who, "SET session_replication_role = replica")).as(who).isEqualTo("42501");
        }
        assertThatThrownBy(() -> JdbcArchive.open(url, owner, null)).isInstanceOf(ArchiveException.class)
                .hasMessageContaining("owner of the archive tables")
                .extracting(e -> ((ArchiveException) e).reason()).isEqualTo(ArchiveException.Reason.PERMISSION_DENIED);
        String superuser = admin.replaceFirst(".*[?&]user=([^&]+).*", "$1");
        assertThatThrownBy(() -> JdbcArchive.open(url, superuser, null)).isInstanceOf(ArchiveException.class)
                .hasMessageContaining("a superuser or owner");
        try (JdbcArchive asAuthor = JdbcArchive.open(url, author, null)) {
            assertThat(asAuthor.list(ArchiveQuery.withDefaults())).isEmpty();
        }
    }

    @Test
    void aTamperingSuperuserIsCaughtByVerify() throws Exception {
        JdbcArchive.migrate(url, owner, null);
        long id;
        try (JdbcArchive asAuthor = JdbcArchive.open(url, author, null)) {
            id = asAuthor.add(Fixtures.study("CR-1", "4711", "tooling", "inconclusive", T, "Bore"), "Petra", null)
                    .id();
            asAuthor.add(Fixtures.study("CR-2", "4711", "tooling", "ok", T, "Bore"), "Petra", null);
        }
        // a superuser can switch triggers off for the session; the hash chain still shows the edit
        exec(adminOn(db), "SET session_replication_role = replica; UPDATE study SET verdict = 'change verified'"
                + " WHERE id = " + id + "; DELETE FROM audit_event WHERE seq = 2");
        try (JdbcArchive asAuditor = JdbcArchive.open(url, auditor, null)) {
            VerificationReport r = asAuditor.verify();
            assertThat(r.problems()).extracting(VerificationReport.Problem::record)
                    .contains("study " + id + " (CR-1 version 1)", "study 2 (CR-2 version 1)");
        }
    }

    @Test
    void aRoleThatMayNotMigrateGetsAClearMessageOnAnEmptyDatabase() {
        assertThatThrownBy(() -> JdbcArchive.open(url, author, null)).isInstanceOf(ArchiveException.class)
                .hasMessageContaining("ask the archive owner")
                .extracting(e -> ((ArchiveException) e).reason()).isEqualTo(ArchiveException.Reason.SCHEMA);
    }

    @Test
    void twoConcurrentWritersBothSucceedOrGetARetryableError() throws Exception {
        JdbcArchive.migrate(url, owner, null);
        try (JdbcArchive a = JdbcArchive.open(url, author, null); JdbcArchive b = JdbcArchive.open(url, author, null);
                JdbcArchive signA = JdbcArchive.open(url, approver, null);
                JdbcArchive signB = JdbcArchive.open(url, approver, null)) {
            ConcurrentWriters.Outcome o = ConcurrentWriters.race(a, signA, b, signB, 40);
            assertThat(o.report().problems()).isEmpty();
            assertThat(o.listed()).isEqualTo(o.stored());
            assertThat(o.report().studiesChecked()).isEqualTo(o.stored());
        }
    }

    @Test
    void anAuditorVerifiesAConsistentSnapshotWhileAnAuthorWrites() throws Exception {
        JdbcArchive.migrate(url, owner, null);
        try (JdbcArchive asAuthor = JdbcArchive.open(url, author, null);
                JdbcArchive asApprover = JdbcArchive.open(url, approver, null);
                JdbcArchive asAuditor = JdbcArchive.open(url, auditor, null)) {
            // the writer signs through its own archive, so give it author and approver rights for this test
            exec(admin, "GRANT holdpoint_approver TO " + author);
            int[] r = ConcurrentWriters.verifyWhileWriting(asAuthor, asAuditor, 100);
            assertThat(r[0]).as("problems over %d reports", r[1]).isZero();
            assertThat(asApprover.verify().intact()).isTrue();
        }
    }

    private String adminOn(String database) {
        return admin.replaceFirst("/[^/?]*(\\?|$)", "/" + database + "$1");
    }

    private long sessions() throws SQLException, InterruptedException {
        // a backend leaves pg_stat_activity a moment after its client closed the connection
        for (int i = 0; i < 100 && countSessions() > 0; i++) {
            Thread.sleep(50);
        }
        return countSessions();
    }

    private long countSessions() throws SQLException {
        try (Connection c = DriverManager.getConnection(admin); Statement s = c.createStatement();
                ResultSet rs = s.executeQuery("SELECT COUNT(*) FROM pg_stat_activity WHERE datname = '" + db + "'")) {
            rs.next();
            return rs.getLong(1);
        }
    }

    private String sqlState(String user, String sql) {
        Properties p = new Properties();
        p.setProperty("user", user);
        try (Connection c = DriverManager.getConnection(url, p); Statement s = c.createStatement()) {
            s.execute(sql);
            return "no error";
        } catch (SQLException e) {
            return e.getSQLState();
        }
    }

    static void exec(String jdbcUrl, String sql) throws SQLException {
        try (Connection c = DriverManager.getConnection(jdbcUrl); Statement s = c.createStatement()) {
            for (String statement : SqlScript.split(sql)) {
                s.execute(statement);
            }
        }
    }

    static String resource(String name) throws IOException {
        try (InputStream in = JdbcArchive.class.getResourceAsStream(name)) {
            assertThat(in).as(name.toLowerCase(Locale.ROOT)).isNotNull();
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        }
    }
}
