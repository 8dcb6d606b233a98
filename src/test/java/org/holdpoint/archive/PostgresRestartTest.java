package org.holdpoint.archive;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.util.Map;
import java.util.concurrent.TimeUnit;
import org.holdpoint.study.ArchiveException;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The archive outlives a database restart: a PostgreSQL cluster of its own (started and stopped by the
 * scripts CI uses) is restarted between two additions in one process, and the second addition succeeds —
 * the pool replaces the connections the restart killed instead of lending them. Needs the PostgreSQL server
 * binaries (the Debian package postgresql, installed by .ci/run); skipped without them.
 */
@Tag("postgres")
class PostgresRestartTest {
    private static final String PORT = "55437";

    @TempDir
    Path dir;

    @Test
    void anAdditionAfterARestartSucceeds() throws Exception {
        assumeTrue(Files.isDirectory(Path.of("/usr/lib/postgresql")), "no PostgreSQL server binaries");
        Map<String, String> env = Map.of("HOLDPOINT_PG_PORT", PORT, "HOLDPOINT_PG_DIR", dir.resolve("pg").toString());
        if ("root".equals(System.getProperty("user.name"))) {
            // the cluster runs as the postgres user, who must be able to enter the folder
            Files.setPosixFilePermissions(dir, java.nio.file.attribute.PosixFilePermissions.fromString("rwxrwxrwx"));
        }
        script(".ci/start-postgres.sh", env);
        String admin = "jdbc:postgresql://127.0.0.1:" + PORT + "/postgres?user=postgres";
        // the archive's own set-up, as an administrator does it (docs/archive.md)
        PostgresArchiveTest.exec(admin, PostgresArchiveTest.resource("postgresql-setup.sql"));
        PostgresArchiveTest.exec(admin, "CREATE DATABASE hp_restart OWNER holdpoint_owner");
        String url = "jdbc:postgresql://127.0.0.1:" + PORT + "/hp_restart?user=postgres";
        PostgresArchiveTest.exec(url, PostgresArchiveTest.resource("postgresql-database.sql"));
        try (JdbcArchive archive = JdbcArchive.openForMaintenance(url)) {
            archive.add(Fixtures.study("CR-1", "4711", "tooling", "change verified", Instant.parse(
                    "2026-12-01T08:00:00Z"), "Bore"), "p", null);
            assertThat(archive.openConnections()).isPositive();
            script(".ci/stop-postgres.sh", env);
            script(".ci/start-postgres.sh", env);
            archive.add(Fixtures.study("CR-2", "4711", "tooling", "change verified", Instant.parse(
                    "2026-12-02T08:00:00Z"), "Bore"), "p", null);
            assertThat(archive.verify().intact()).isTrue();
            assertThat(archive.list(org.holdpoint.study.ArchiveQuery.withDefaults())).hasSize(2);
        } catch (ArchiveException e) {
            throw new AssertionError("the archive did not survive the restart: " + e.getMessage(), e);
        } finally {
            script(".ci/stop-postgres.sh", env);
        }
    }

    private static void script(String path, Map<String, String> env) throws IOException, InterruptedException {
        ProcessBuilder pb = new ProcessBuilder("bash", path).redirectErrorStream(true);
        pb.environment().putAll(env);
        Process p = pb.start();
        String out = new String(p.getInputStream().readAllBytes());
        assertThat(p.waitFor(120, TimeUnit.SECONDS)).as(path + " finished").isTrue();
        assertThat(p.exitValue()).as(path + ": " + out).isZero();
    }
}
