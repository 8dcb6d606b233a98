package org.holdpoint.archive;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.SQLException;
import java.time.Instant;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.holdpoint.study.ArchiveException;
import org.holdpoint.study.ArchiveException.Reason;

/**
 * Applies the versioned plain-SQL migrations of one dialect ({@code migrations/<dialect>/V<n>__<name>.sql},
 * listed in {@code index.txt}) and records each in {@code schema_version} with the SHA-256 of its text.
 */
final class Migrator {

    /** One migration script. */
    record Migration(int version, String description, String file, String text, String sha256) {
    }

    private static final Pattern NAME = Pattern.compile("V(\\d+)__([A-Za-z0-9_]+)\\.sql");
    private static final long MIGRATION_LOCK_KEY = 0x486f6c64_4d696772L; // "HoldMigr"

    private Migrator() {
    }

    /**
     * Brings the schema up to date in one transaction; on PostgreSQL one migrator runs at a time.
     *
     * @param c       a connection in auto-commit mode
     * @param dialect the database's dialect
     * @return the versions applied now (empty when the schema was current)
     * @throws ArchiveException when a script fails, an applied script was edited, the schema is newer than
     *                          this tool, or the connected role may not create tables
     */
    static List<Integer> migrate(Connection c, Dialect dialect) throws ArchiveException {
        List<Migration> known = load(dialect);
        try {
            c.setAutoCommit(false);
            try {
                List<Integer> applied = migrateInTransaction(c, dialect, known);
                c.commit();
                return applied;
            } catch (ArchiveException | RuntimeException e) {
                c.rollback();
                throw e;
            } finally {
                c.setAutoCommit(true);
            }
        } catch (SQLException e) {
            throw new ArchiveException(Reason.DATABASE, "schema migration failed: " + e.getMessage(), e);
        }
    }

    private static List<Integer> migrateInTransaction(Connection c, Dialect dialect, List<Migration> known)
            throws ArchiveException {
        if (dialect == Dialect.POSTGRESQL) {
            Jdbc.queryLong(c, Sql.PG_LOCK_MIGRATION, MIGRATION_LOCK_KEY);
        }
        if (Jdbc.queryLong(c, Sql.SCHEMA_VERSION_EXISTS) == 0) {
            ownerOnly(() -> Jdbc.update(c, Sql.CREATE_SCHEMA_VERSION), 0, known);
        }
        Map<Integer, String> applied = new HashMap<>();
        for (Object[] row : Jdbc.query(c, Sql.SELECT_SCHEMA_VERSIONS,
                rs -> new Object[] {rs.getInt("version"), rs.getString("script_sha256")})) {
            applied.put((Integer) row[0], ((String) row[1]).trim());
        }
        int newest = known.get(known.size() - 1).version();
        int current = applied.keySet().stream().mapToInt(Integer::intValue).max().orElse(0);
        if (current > newest) {
            throw new ArchiveException(Reason.SCHEMA, "the archive has schema version " + current
                    + ", newer than this Holdpoint knows (" + newest + "): use a newer Holdpoint");
        }
        List<Integer> done = new ArrayList<>();
        for (Migration m : known) {
            String sha = applied.get(m.version());
            if (sha != null) {
                if (!sha.equals(m.sha256())) {
                    throw new ArchiveException(Reason.SCHEMA, "migration " + m.file() + " differs from the one"
                            + " applied to this archive (SHA-256 " + sha + "): applied migrations must never change");
                }
                continue;
            }
            ownerOnly(() -> apply(c, m), current, known);
            done.add(m.version());
        }
        return done;
    }

    @FunctionalInterface
    private interface Step {
        void run() throws ArchiveException;
    }

    private static void ownerOnly(Step step, int current, List<Migration> known) throws ArchiveException {
        try {
            step.run();
        } catch (ArchiveException e) {
            if (e.reason() == Reason.PERMISSION_DENIED) {
                throw new ArchiveException(Reason.SCHEMA, "the archive schema is at version " + current
                        + " but this Holdpoint needs version " + known.get(known.size() - 1).version()
                        + ", and the connected role may not change the schema: ask the archive owner to open it"
                        + " once (JdbcArchive.migrate) — " + e.getMessage(), e);
            }
            throw e;
        }
    }

    private static void apply(Connection c, Migration m) throws ArchiveException {
        List<String> statements = SqlScript.split(m.text());
        for (int i = 0; i < statements.size(); i++) {
            String sql = statements.get(i);
            try (PreparedStatement s = c.prepareStatement(sql)) {
                s.execute();
            } catch (SQLException e) {
                throw Jdbc.failure(new Stmt("migration " + m.file() + " statement " + (i + 1), sql),
                        new Object[0], e);
            }
        }
        Jdbc.update(c, Sql.INSERT_SCHEMA_VERSION, m.version(), m.description(), m.sha256(), Instant.now());
    }

    /**
     * Reads the migrations of a dialect from the class path, in index order.
     *
     * @param dialect the dialect
     * @return the migrations, versions 1, 2, … without gaps
     * @throws ArchiveException when the index or a script is missing or misnamed (a packaging error)
     */
    static List<Migration> load(Dialect dialect) throws ArchiveException {
        String folder = dialect.migrationsFolder();
        List<Migration> list = new ArrayList<>();
        for (String line : read(folder + "index.txt").split("\\R")) {
            String file = line.strip();
            if (file.isEmpty() || file.startsWith("#")) {
                continue;
            }
            Matcher m = NAME.matcher(file);
            if (!m.matches() || Integer.parseInt(m.group(1)) != list.size() + 1) {
                throw new ArchiveException(Reason.SCHEMA, "migration index " + folder + "index.txt lists '" + file
                        + "'; expected V" + (list.size() + 1) + "__name.sql");
            }
            String text = read(folder + file);
            list.add(new Migration(list.size() + 1, m.group(2).replace('_', ' '), file, text,
                    Canonical.sha256Hex(text)));
        }
        if (list.isEmpty()) {
            throw new ArchiveException(Reason.SCHEMA, "no migrations listed in " + folder + "index.txt");
        }
        return list;
    }

    private static String read(String resource) throws ArchiveException {
        try (InputStream in = Migrator.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new ArchiveException(Reason.SCHEMA, "migration resource " + resource + " is missing");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new ArchiveException(Reason.SCHEMA, "cannot read migration resource " + resource, e);
        }
    }
}
