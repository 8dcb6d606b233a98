package org.holdpoint.archive;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.sql.SQLException;
import org.holdpoint.study.ArchiveException;
import org.junit.jupiter.api.Test;

/** Versioned plain-SQL migrations, applied on open and recorded in schema_version. */
class MigrationTest {

    @Test
    void aFreshDatabaseGetsTheNewestVersionAndReopeningAppliesNothing() throws ArchiveException, SQLException {
        String url = Fixtures.memUrl("migrate");
        try (JdbcArchive keepAlive = JdbcArchive.open(url)) {
            assertThat(Fixtures.directLong(url, "SELECT MAX(version) FROM schema_version")).isEqualTo(2);
            for (String table : Sql.TABLES) {
                assertThat(Fixtures.directLong(url, "SELECT COUNT(*) FROM " + table)).isNotNegative();
            }
            assertThat(Fixtures.directLong(url, "SELECT COUNT(*) FROM schema_version WHERE script_sha256 = '"
                    + Migrator.load(Dialect.H2).get(0).sha256() + "'")).isEqualTo(1);
            assertThat(JdbcArchive.migrate(url, null, null)).isEmpty();
            try (JdbcArchive again = JdbcArchive.open(url)) {
                assertThat(again.verify().intact()).isTrue();
            }
        }
    }

    @Test
    void migrateReportsTheVersionsItApplied() throws ArchiveException, SQLException {
        String url = Fixtures.memUrl("migrate-report") + ";DB_CLOSE_DELAY=-1";
        assertThat(JdbcArchive.migrate(url, null, null)).containsExactly(1, 2);
        Fixtures.direct(url, "SHUTDOWN");
    }

    @Test
    void anArchiveOfSchema1IsBroughtUpToDateAndItsRecordsStillVerify() throws ArchiveException, SQLException {
        String url = Fixtures.memUrl("migrate-from-1");
        try (JdbcArchive keepAlive = JdbcArchive.open(url)) {
            long id = keepAlive.add(Fixtures.study("CR-1", "4711", "tooling", "change verified",
                    java.time.Instant.parse("2026-01-05T08:00:00Z"), "Bore"), "p", null).id();
            keepAlive.sign(id, "Quinn", "quality manager", "approved", java.time.Instant.parse("2026-01-06T08:00:00Z"));
            // back to what schema 1 had: no study_signer table, version 1 recorded
            Fixtures.direct(url, "DROP TABLE study_signer");
            Fixtures.direct(url, "DELETE FROM schema_version WHERE version = 2");
            try (JdbcArchive reopened = JdbcArchive.open(url)) {
                assertThat(Fixtures.directLong(url, "SELECT MAX(version) FROM schema_version")).isEqualTo(2);
                assertThat(reopened.verify().problems()).isEmpty();
                assertThat(reopened.show(id).orElseThrow().version().signers()).containsExactly("Quinn");
            }
        }
    }

    @Test
    void anEditedAppliedMigrationIsRefused() throws ArchiveException, SQLException {
        String url = Fixtures.memUrl("migrate-edited");
        try (JdbcArchive keepAlive = JdbcArchive.open(url)) {
            Fixtures.direct(url, "UPDATE schema_version SET script_sha256 = '" + "f".repeat(64) + "'");
            assertThatThrownBy(() -> JdbcArchive.open(url)).isInstanceOf(ArchiveException.class)
                    .hasMessageContaining("V1__create_archive.sql differs from the one applied")
                    .extracting(e -> ((ArchiveException) e).reason()).isEqualTo(ArchiveException.Reason.SCHEMA);
        }
    }

    @Test
    void aNewerSchemaIsRefused() throws ArchiveException, SQLException {
        String url = Fixtures.memUrl("migrate-newer");
        try (JdbcArchive keepAlive = JdbcArchive.open(url)) {
            Fixtures.direct(url, "INSERT INTO schema_version VALUES (3, 'future', '" + "0".repeat(64)
                    + "', CURRENT_TIMESTAMP)");
            assertThatThrownBy(() -> JdbcArchive.open(url)).hasMessageContaining("schema version 3, newer than");
        }
    }

    @Test
    void anUnknownDatabaseUrlIsRefusedWithTheSupportedForms() {
        assertThatThrownBy(() -> JdbcArchive.open("jdbc:mysql://x/y"))
                .hasMessageContaining("jdbc:h2:file:PATH").hasMessageContaining("jdbc:postgresql://");
    }
}
