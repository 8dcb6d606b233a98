package org.holdpoint.archive;

import java.sql.Connection;
import java.sql.SQLException;
import java.time.Clock;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;
import java.util.Properties;
import java.util.concurrent.ConcurrentHashMap;
import java.util.concurrent.ThreadLocalRandom;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.locks.ReentrantLock;
import org.holdpoint.study.ArchiveException;
import org.holdpoint.study.ArchiveException.Reason;
import org.holdpoint.study.ArchiveQuery;
import org.holdpoint.study.ArchivedStudy;
import org.holdpoint.study.AuditEvent;
import org.holdpoint.study.ChangeRecordArchive;
import org.holdpoint.study.NewStudyVersion;
import org.holdpoint.study.ArchivedSignature;
import org.holdpoint.study.StudyVersion;
import org.holdpoint.study.VerificationReport;

/**
 * The change-record archive over JDBC: an embedded H2 file by default, or a shared PostgreSQL server. Each
 * write is one transaction that appends to the global audit hash chain; concurrent writers are serialised
 * (a PostgreSQL advisory lock, and a unique chain position everywhere) and a lost race is retried a few
 * times before it surfaces as a {@link Reason#RETRYABLE_CONFLICT}.
 */
public final class JdbcArchive implements ChangeRecordArchive {

    private static final long CHAIN_LOCK_KEY = 0x486f6c64_43686169L; // "HoldChai"
    private static final int MAX_ATTEMPTS = 6;

    private final String url;
    private final Dialect dialect;
    private final ConnectionPool pool;
    private final Clock clock;
    /** Embedded H2 is used by one process at a time, so its writers are serialised per URL in this JVM. */
    private static final Map<String, ReentrantLock> H2_WRITE_LOCKS = new ConcurrentHashMap<>();

    /**
     * Open archives per embedded URL in this JVM, guarded by itself: the last one to close an H2 file may
     * compact it.
     */
    private static final Map<String, Integer> H2_OPEN = new HashMap<>();
    /** Below this share of live data in an H2 file, closing compacts it. */
    private static final int H2_COMPACT_BELOW_FILL_PERCENT = 50;

    private final ReentrantLock writeLock;
    private final AtomicInteger conflictsRetried = new AtomicInteger();
    private final AtomicBoolean closed = new AtomicBoolean();

    private JdbcArchive(String url, Dialect dialect, ConnectionPool pool, Clock clock) {
        this.url = url;
        this.dialect = dialect;
        this.pool = pool;
        this.clock = clock;
        this.writeLock = dialect == Dialect.H2 ? H2_WRITE_LOCKS.computeIfAbsent(url, k -> new ReentrantLock())
                : new ReentrantLock();
    }

    @FunctionalInterface
    private interface Work<T> {
        T run(Connection c, Chain chain) throws ArchiveException;
    }

    /**
     * Opens the embedded archive in the user's data folder, creating it on first use.
     *
     * @return the archive
     * @throws ArchiveException when the folder or database cannot be created or opened
     */
    public static JdbcArchive openDefault() throws ArchiveException {
        return open(ArchiveLocation.defaultUrl());
    }

    /**
     * Opens the archive at a JDBC URL (credentials, if any, in the URL) and applies pending migrations.
     *
     * @param url {@code jdbc:h2:…} or {@code jdbc:postgresql:…}
     * @return the archive
     * @throws ArchiveException when the database cannot be reached or its schema cannot be brought up to date
     */
    public static JdbcArchive open(String url) throws ArchiveException {
        return open(url, new Properties(), Clock.systemUTC());
    }

    /**
     * Opens the archive as a database user.
     *
     * @param url      the JDBC URL
     * @param user     the database user (the person's own role on PostgreSQL)
     * @param password the password, or null
     * @return the archive
     * @throws ArchiveException as {@link #open(String)}
     */
    public static JdbcArchive open(String url, String user, String password) throws ArchiveException {
        return open(url, credentials(user, password), Clock.systemUTC());
    }

    /**
     * Opens the archive with driver properties and a clock for the archive's own timestamps.
     *
     * @param url        the JDBC URL
     * @param properties driver properties (user, password, ssl, …)
     * @param clock      the clock that stamps archiving and event times
     * @return the archive
     * @throws ArchiveException as {@link #open(String)}
     */
    public static JdbcArchive open(String url, Properties properties, Clock clock) throws ArchiveException {
        Dialect dialect = Dialect.of(url);
        if (dialect != Dialect.H2) {
            return openPool(url, dialect, properties, clock);
        }
        synchronized (H2_OPEN) {
            JdbcArchive archive = openPool(url, dialect, properties, clock);
            H2_OPEN.merge(url, 1, Integer::sum);
            return archive;
        }
    }

    private static JdbcArchive openPool(String url, Dialect dialect, Properties properties, Clock clock)
            throws ArchiveException {
        return openPool(url, dialect, properties, clock, false);
    }

    private static JdbcArchive openPool(String url, Dialect dialect, Properties properties, Clock clock,
            boolean maintenance) throws ArchiveException {
        ConnectionPool pool = new ConnectionPool(url, properties);
        try (ConnectionPool.Lease lease = pool.lease()) {
            if (dialect == Dialect.POSTGRESQL && !maintenance) {
                refuseOwner(lease.connection(), url);
            }
            Migrator.migrate(lease.connection(), dialect);
        } catch (ArchiveException | RuntimeException e) {
            pool.close();
            throw e;
        }
        return new JdbcArchive(url, dialect, pool, clock);
    }

    /**
     * Daily work never runs as a role that could switch the archive's protection off: a superuser, or the
     * owner of the tables (a member of holdpoint_owner), may ALTER TABLE … DISABLE TRIGGER. The owner's
     * login is for setting up and migrating only ({@link #migrate}).
     */
    private static void refuseOwner(java.sql.Connection c, String url) throws ArchiveException {
        boolean privileged;
        String who;
        try (java.sql.Statement st = c.createStatement();
                java.sql.ResultSet rs = st.executeQuery("SELECT session_user, (SELECT rolsuper FROM pg_roles WHERE "
                        + "rolname = session_user) OR EXISTS (SELECT 1 FROM pg_roles WHERE rolname = "
                        + "'holdpoint_owner' AND (pg_has_role(session_user, oid, 'MEMBER') OR pg_has_role("
                        + "current_user, oid, 'MEMBER')))")) {
            rs.next();
            who = rs.getString(1);
            privileged = rs.getBoolean(2);
        } catch (java.sql.SQLException e) {
            throw new ArchiveException(ArchiveException.Reason.DATABASE, "cannot read the role of the connection to "
                    + ConnectionPool.redact(url) + ": " + e.getMessage(), e);
        }
        if (privileged) {
            throw new ArchiveException(ArchiveException.Reason.PERMISSION_DENIED, "connected to the archive as "
                    + who + ", a superuser or owner of the archive tables: such a role can switch the archive's "
                    + "protection off, so it is used only to set up and migrate the archive (the owner's step in "
                    + "docs/archive.md). Connect with your own login in holdpoint_author, holdpoint_approver or "
                    + "holdpoint_auditor (docs/archive.md)");
        }
    }

    /**
     * Opens an archive for the owner's maintenance (checks and measurements by the owner or an administrator),
     * without the refusal of owner and superuser roles that protects daily work. No command of the program
     * uses it.
     *
     * @param url the JDBC URL with credentials
     * @return the archive
     * @throws ArchiveException as {@link #open(String)}
     */
    public static JdbcArchive openForMaintenance(String url) throws ArchiveException {
        return openPool(url, Dialect.of(url), new Properties(), Clock.systemUTC(), true);
    }

    /**
     * Applies pending migrations as the archive owner and closes the connection again.
     *
     * @param url      the JDBC URL
     * @param user     the owner's database user
     * @param password the password, or null
     * @return the schema versions applied now (empty when already current)
     * @throws ArchiveException when a migration fails
     */
    public static List<Integer> migrate(String url, String user, String password) throws ArchiveException {
        Dialect dialect = Dialect.of(url);
        try (ConnectionPool pool = new ConnectionPool(url, credentials(user, password));
                ConnectionPool.Lease lease = pool.lease()) {
            return Migrator.migrate(lease.connection(), dialect);
        }
    }

    private static Properties credentials(String user, String password) {
        Properties p = new Properties();
        if (user != null) {
            p.setProperty("user", user);
        }
        if (password != null) {
            p.setProperty("password", password);
        }
        return p;
    }

    /** @return the archive's JDBC URL with any password masked */
    public String url() {
        return ConnectionPool.redact(url);
    }

    /** @return connections currently open (idle or in use); 0 after {@link #close()} */
    int openConnections() {
        return pool.openConnections();
    }

    /** @return how many write transactions lost a race and were rerun since this archive was opened */
    int conflictsRetried() {
        return conflictsRetried.get();
    }

    @Override
    public StudyVersion add(NewStudyVersion study, String actor, String reason) throws ArchiveException {
        String who = required(actor, "actor");
        return write("add " + study.changeId(), (c, chain) -> {
            if (Jdbc.queryLong(c, Sql.COUNT_CHANGE, study.changeId()) > 0) {
                throw new ArchiveException(Reason.REJECTED, "change record " + study.changeId()
                        + " is already archived: archive a correction with supersede on its current version");
            }
            Instant now = now();
            StudyRow row = insertStudy(c, study, 1, null, now);
            chain.append(row.id(), AuditEvent.Kind.CREATED, row.id(), who, now, describe(row), reason, row.digest());
            appendHistory(chain, row, study);
            return row.toVersion(null, List.of());
        });
    }

    @Override
    public StudyVersion supersede(long oldId, NewStudyVersion newStudy, String actor, String reason)
            throws ArchiveException {
        String who = required(actor, "actor");
        String why = required(reason, "reason for the correction");
        return write("supersede study " + oldId, (c, chain) -> {
            StudyRow old = current(c, oldId, "supersede");
            if (!old.changeId().equals(newStudy.changeId())) {
                throw new ArchiveException(Reason.REJECTED, "study " + oldId + " belongs to change record "
                        + old.changeId() + ", the correction to " + newStudy.changeId()
                        + ": a correction must keep the change id");
            }
            Instant now = now();
            StudyRow row = insertStudy(c, newStudy, old.version() + 1, old.id(), now);
            chain.append(old.id(), AuditEvent.Kind.SUPERSEDED, row.id(), who, now, "superseded by study " + row.id()
                    + " (version " + row.version() + ")", why, row.digest());
            chain.append(row.id(), AuditEvent.Kind.CREATED, row.id(), who, now, describe(row), why, row.digest());
            appendHistory(chain, row, newStudy);
            return row.toVersion(null, List.of());
        });
    }

    @Override
    public ArchivedSignature sign(long studyId, String signer, String role, String meaning, Instant timestamp)
            throws ArchiveException {
        String name = required(signer, "signer");
        String as = required(role, "role");
        String means = required(meaning, "meaning of the signature");
        if (timestamp == null) {
            throw new ArchiveException(Reason.REJECTED, "a signature needs its date and time");
        }
        return write("sign study " + studyId, (c, chain) -> {
            current(c, studyId, "sign");
            long id = Jdbc.queryLong(c, Sql.NEXT_SIGNATURE_ID);
            ArchivedSignature s = new ArchivedSignature(id, studyId, name, as, means, timestamp.truncatedTo(ChronoUnit.MICROS));
            Jdbc.update(c, Sql.INSERT_SIGNATURE, s.id(), s.studyId(), s.signer(), s.role(), s.meaning(),
                    s.signedAt());
            chain.append(studyId, AuditEvent.Kind.SIGNED, id, name, now(), "signed as " + as, means,
                    StudyRow.digest(s));
            return s;
        });
    }

    @Override
    public List<StudyVersion> list(ArchiveQuery query) throws ArchiveException {
        ListFilter filter = ListFilter.of(query);
        try (ConnectionPool.Lease lease = pool.lease()) {
            Connection c = lease.connection();
            List<StudyRow> rows = new ArrayList<>();
            Map<Long, Long> supersededBy = new HashMap<>();
            Jdbc.stream(c, filter.studies(), rs -> {
                StudyRow row = StudyRow.map(rs);
                rows.add(row);
                supersededBy.put(row.id(), Jdbc.nullableLong(rs, "superseded_by"));
            }, filter.params());
            Map<Long, List<String>> names = new HashMap<>();
            Jdbc.stream(c, filter.characteristics(), rs -> names.computeIfAbsent(rs.getLong("study_id"),
                    k -> new ArrayList<>()).add(rs.getString("name")), filter.params());
            Map<Long, List<String>> signers = new HashMap<>();
            Jdbc.stream(c, filter.documentSigners(), rs -> signers.computeIfAbsent(rs.getLong("study_id"),
                    k -> new ArrayList<>()).add(rs.getString("name")), filter.params());
            Map<Long, List<ArchivedSignature>> sigs = new HashMap<>();
            Jdbc.stream(c, filter.signatures(), rs -> {
                ArchivedSignature s = StudyRow.mapSignature(rs);
                sigs.computeIfAbsent(s.studyId(), k -> new ArrayList<>()).add(s);
            }, filter.params());
            List<StudyVersion> out = new ArrayList<>(rows.size());
            for (StudyRow row : rows) {
                out.add(row.withCharacteristics(names.getOrDefault(row.id(), List.of()))
                        .withDocumentSigners(signers.getOrDefault(row.id(), List.of()))
                        .toVersion(supersededBy.get(row.id()), sigs.getOrDefault(row.id(), List.of())));
            }
            return out;
        }
    }

    @Override
    public Optional<ArchivedStudy> show(long id) throws ArchiveException {
        try (ConnectionPool.Lease lease = pool.lease()) {
            Connection c = lease.connection();
            Optional<StudyVersion> v = readVersion(c, id);
            if (v.isEmpty()) {
                return Optional.empty();
            }
            String json = Jdbc.queryOne(c, Sql.SELECT_STUDY_JSON, rs -> rs.getString("json_text"), id).orElse("");
            return Optional.of(new ArchivedStudy(v.get(), json));
        }
    }

    @Override
    public List<AuditEvent> events(long studyId) throws ArchiveException {
        try (ConnectionPool.Lease lease = pool.lease()) {
            return Jdbc.query(lease.connection(), Sql.SELECT_EVENTS_OF, Chain::map, studyId);
        }
    }

    @Override
    public VerificationReport verify() throws ArchiveException {
        try (ConnectionPool.Lease lease = pool.lease()) {
            Connection c = lease.connection();
            try {
                c.setAutoCommit(false);
                c.setReadOnly(true);
                c.setTransactionIsolation(dialect == Dialect.POSTGRESQL ? Connection.TRANSACTION_REPEATABLE_READ
                        : Connection.TRANSACTION_SERIALIZABLE);
                VerificationReport report = Verifier.run(c);
                c.commit();
                return report;
            } catch (SQLException e) {
                lease.discard();
                throw new ArchiveException(Reason.DATABASE, "cannot start a snapshot to verify the archive: "
                        + e.getMessage(), e);
            } finally {
                restore(c, lease);
            }
        }
    }

    /**
     * Closes the archive's connections. The last archive of an embedded H2 file to close compacts the file
     * when less than half of it is live data (bulk archiving leaves old page versions behind).
     */
    @Override
    public void close() {
        if (!closed.compareAndSet(false, true)) {
            return;
        }
        if (dialect != Dialect.H2) {
            pool.close();
            return;
        }
        synchronized (H2_OPEN) {
            Integer left = H2_OPEN.computeIfPresent(url, (k, n) -> n > 1 ? n - 1 : null);
            if (left == null && url.regionMatches(true, 0, "jdbc:h2:file:", 0, "jdbc:h2:file:".length())) {
                compactIfSparse();
            }
            pool.close();
        }
    }

    private void compactIfSparse() {
        try (ConnectionPool.Lease lease = pool.lease()) {
            long fill = Jdbc.queryLong(lease.connection(), Sql.H2_FILL_RATE);
            if (fill < H2_COMPACT_BELOW_FILL_PERCENT) {
                lease.discard();
                Jdbc.update(lease.connection(), Sql.H2_SHUTDOWN_COMPACT);
            }
        } catch (ArchiveException | RuntimeException e) {
            // compaction only saves disk space; every commit is already on disk, so a failure loses nothing
        }
    }

    // --- writing ------------------------------------------------------------------------------------

    private <T> T write(String operation, Work<T> work) throws ArchiveException {
        writeLock.lock();
        try {
            for (int attempt = 1;; attempt++) {
                try {
                    return inTransaction(work);
                } catch (ArchiveException e) {
                    if (connectionLost(e) && attempt < MAX_ATTEMPTS) {
                        // the database went away (a restart, an idle timeout): nothing was committed, the dead
                        // connection was dropped, and the transaction runs again on a fresh one
                        pause(attempt);
                        continue;
                    }
                    if (!e.isRetryable()) {
                        throw e;
                    }
                    if (attempt == MAX_ATTEMPTS) {
                        throw new ArchiveException(Reason.RETRYABLE_CONFLICT, operation + ": other writers kept"
                                + " appending at the same moment; nothing was stored after " + attempt
                                + " attempts, try again. Last failure: " + e.getMessage(), e);
                    }
                    conflictsRetried.incrementAndGet();
                    pause(attempt);
                }
            }
        } finally {
            writeLock.unlock();
        }
    }

    private <T> T inTransaction(Work<T> work) throws ArchiveException {
        try (ConnectionPool.Lease lease = pool.lease()) {
            Connection c = lease.connection();
            try {
                c.setAutoCommit(false);
                if (dialect == Dialect.POSTGRESQL) {
                    Jdbc.queryLong(c, Sql.PG_LOCK_CHAIN, CHAIN_LOCK_KEY);
                }
                T result = work.run(c, Chain.open(c));
                commit(c);
                return result;
            } catch (ArchiveException | RuntimeException e) {
                if (connectionLost(e)) {
                    lease.discard();
                }
                rollback(c, lease);
                throw e;
            } catch (SQLException e) {
                lease.discard();
                throw new ArchiveException(Reason.DATABASE, "cannot start a write transaction: " + e.getMessage()
                        + " (SQLSTATE " + e.getSQLState() + ")", e);
            } finally {
                restore(c, lease);
            }
        }
    }

    /**
     * Whether a failure means the connection itself was lost (SQLSTATE class 08, connection exception, or
     * 57P01–57P03, the server shutting down or not yet accepting connections): then nothing was committed and
     * the work may run again on a new connection.
     *
     * @param e a failure
     * @return true when a cause says the connection was lost
     */
    static boolean connectionLost(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause()) {
            if (t instanceof SQLException q && q.getSQLState() != null
                    && (q.getSQLState().startsWith("08") || q.getSQLState().startsWith("57P0"))) {
                return true;
            }
        }
        return false;
    }

    private static void commit(Connection c) throws ArchiveException {
        try {
            c.commit();
        } catch (SQLException e) {
            throw Jdbc.failure(new Stmt("commit", "COMMIT"), new Object[0], e);
        }
    }

    private static void rollback(Connection c, ConnectionPool.Lease lease) {
        try {
            c.rollback();
        } catch (SQLException e) {
            lease.discard();
        }
    }

    private static void restore(Connection c, ConnectionPool.Lease lease) {
        try {
            c.setAutoCommit(true);
            c.setReadOnly(false);
            c.setTransactionIsolation(Connection.TRANSACTION_READ_COMMITTED);
        } catch (SQLException e) {
            lease.discard();
        }
    }

    private static void pause(int attempt) throws ArchiveException {
        try {
            Thread.sleep(10L * attempt + ThreadLocalRandom.current().nextLong(20));
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new ArchiveException(Reason.RETRYABLE_CONFLICT, "interrupted while waiting to retry", e);
        }
    }

    private Instant now() {
        return clock.instant().truncatedTo(ChronoUnit.MICROS);
    }

    private StudyRow insertStudy(Connection c, NewStudyVersion s, int version, Long supersedes, Instant now)
            throws ArchiveException {
        long id = Jdbc.queryLong(c, Sql.NEXT_STUDY_ID);
        StudyRow row = new StudyRow(id, s.changeId(), version, supersedes, s.title(), s.changeKind(), s.partNumber(),
                s.revision(), s.characteristics(), s.verdict(), s.author(),
                s.created().truncatedTo(ChronoUnit.MICROS), now, Canonical.sha256Hex(s.json()),
                s.documentSigners());
        Jdbc.update(c, Sql.INSERT_STUDY, row.id(), row.changeId(), row.version(), row.supersedes(), row.title(),
                row.changeKind(), row.partNumber(), row.revision(), row.verdict(), row.author(), row.created(),
                row.archivedAt(), row.jsonSha256(), s.json());
        List<Object[]> names = new ArrayList<>();
        for (int i = 0; i < row.characteristics().size(); i++) {
            names.add(new Object[] {id, i, row.characteristics().get(i)});
        }
        Jdbc.batch(c, Sql.INSERT_CHARACTERISTIC, names);
        List<Object[]> signers = new ArrayList<>();
        for (int i = 0; i < row.documentSigners().size(); i++) {
            signers.add(new Object[] {id, i, row.documentSigners().get(i)});
        }
        if (!signers.isEmpty()) {
            Jdbc.batch(c, Sql.INSERT_DOCUMENT_SIGNER, signers);
        }
        return row;
    }

    private static void appendHistory(Chain chain, StudyRow row, NewStudyVersion s) throws ArchiveException {
        for (AuditEvent.Draft d : s.history()) {
            chain.append(row.id(), d.kind(), row.id(), d.who(), d.when().truncatedTo(ChronoUnit.MICROS), d.what(),
                    d.why(), row.digest());
        }
    }

    private static StudyRow current(Connection c, long id, String action) throws ArchiveException {
        StudyVersion v = readVersion(c, id).orElseThrow(() -> new ArchiveException(Reason.NOT_FOUND,
                "there is no study " + id + " in the archive"));
        if (v.supersededBy() != null) {
            throw new ArchiveException(Reason.REJECTED, "study " + id + " (" + v.changeId() + " version "
                    + v.version() + ") is superseded by study " + v.supersededBy() + ": " + action
                    + " the current version instead");
        }
        return new StudyRow(v.id(), v.changeId(), v.version(), v.supersedes(), v.title(), v.changeKind(),
                v.partNumber(), v.revision(), v.characteristics(), v.verdict(), v.author(), v.created(),
                v.archivedAt(), v.jsonSha256(), v.documentSigners());
    }

    private static Optional<StudyVersion> readVersion(Connection c, long id) throws ArchiveException {
        Long[] newer = new Long[1];
        Optional<StudyRow> row = Jdbc.queryOne(c, Sql.SELECT_STUDY, rs -> {
            newer[0] = Jdbc.nullableLong(rs, "superseded_by");
            return StudyRow.map(rs);
        }, id);
        if (row.isEmpty()) {
            return Optional.empty();
        }
        List<String> names = Jdbc.query(c, Sql.SELECT_CHARACTERISTICS_OF, rs -> rs.getString("name"), id);
        List<String> signers = Jdbc.query(c, Sql.SELECT_DOCUMENT_SIGNERS_OF, rs -> rs.getString("name"), id);
        List<ArchivedSignature> sigs = Jdbc.query(c, Sql.SELECT_SIGNATURES_OF, StudyRow::mapSignature, id);
        return Optional.of(row.get().withCharacteristics(names).withDocumentSigners(signers)
                .toVersion(newer[0], sigs));
    }

    private static String describe(StudyRow row) {
        return "archived " + row.changeId() + " version " + row.version() + " for part " + row.partNumber()
                + " (JSON SHA-256 " + row.jsonSha256() + ")";
    }

    private static String required(String value, String name) throws ArchiveException {
        if (value != null && !value.isBlank()) {
            return value;
        }
        throw new ArchiveException(Reason.REJECTED, "the " + name + " must not be blank");
    }
}
