package org.holdpoint.archive;

import com.zaxxer.hikari.HikariConfig;
import com.zaxxer.hikari.HikariDataSource;
import java.sql.Connection;
import java.sql.SQLException;
import java.util.Properties;
import org.holdpoint.study.ArchiveException;

/**
 * The archive's JDBC connections to one URL, pooled by HikariCP: a connection is checked before it is lent
 * (so a connection that died with a database restart or an idle timeout is replaced, not handed out), the
 * pool is bounded, and a lease returns its connection once however often it is closed. Idle connections
 * also keep an embedded database open between calls; all are closed by {@link #close()}.
 */
final class ConnectionPool implements AutoCloseable {
    /** At most this many connections to one archive (a desktop program or one command needs two or three). */
    static final int MAX_CONNECTIONS = 4;
    /** How long a lease waits for a connection before it is refused. */
    static final long CONNECT_TIMEOUT_MS = 10_000;

    private final String url;
    private final HikariDataSource pool;
    private volatile boolean closed;

    /**
     * @param url        the JDBC URL
     * @param properties driver properties (user, password, …)
     */
    ConnectionPool(String url, Properties properties) {
        this.url = url;
        HikariConfig c = new HikariConfig();
        c.setJdbcUrl(url);
        Properties p = new Properties();
        p.putAll(properties);
        if (p.getProperty("user") != null) {
            c.setUsername(p.getProperty("user"));
            p.remove("user");
        }
        if (p.getProperty("password") != null) {
            c.setPassword(p.getProperty("password"));
            p.remove("password");
        }
        c.setDataSourceProperties(p);
        c.setMaximumPoolSize(MAX_CONNECTIONS);
        c.setMinimumIdle(0);
        c.setConnectionTimeout(CONNECT_TIMEOUT_MS);
        // no connection at construction: the first lease says what is wrong, in the archive's words
        c.setInitializationFailTimeout(-1);
        c.setPoolName("holdpoint-archive");
        // every connection is lent in auto-commit mode; a transaction sets it off and back itself
        c.setAutoCommit(true);
        this.pool = new HikariDataSource(c);
    }

    /** A borrowed connection, returned to the pool on close (once, however often close is called). */
    final class Lease implements AutoCloseable {
        private final Connection connection;
        private boolean broken;
        private boolean returned;

        private Lease(Connection connection) {
            this.connection = connection;
        }

        /** @return the connection, in auto-commit mode unless the caller changed it */
        Connection connection() {
            return connection;
        }

        /** Marks the connection as unusable so it is closed, not reused. */
        void discard() {
            broken = true;
        }

        @Override
        public void close() {
            if (returned) {
                return;
            }
            returned = true;
            if (broken) {
                pool.evictConnection(connection);
                return;
            }
            try {
                connection.close();
            } catch (SQLException e) {
                // the pool's proxy reports a connection that broke while lent; the pool drops it itself
                pool.evictConnection(connection);
            }
        }
    }

    /** H2's error code for a database file locked by another process. */
    private static final int H2_ALREADY_OPEN = 90020;

    /**
     * Borrows a connection, checked alive by the pool.
     *
     * @return the lease
     * @throws ArchiveException when the pool is closed or the database cannot be reached
     */
    Lease lease() throws ArchiveException {
        if (closed) {
            throw new ArchiveException(ArchiveException.Reason.DATABASE, "the archive is closed");
        }
        try {
            return new Lease(pool.getConnection());
        } catch (SQLException e) {
            SQLException cause = e.getCause() instanceof SQLException s ? s : e;
            if (cause.getErrorCode() == H2_ALREADY_OPEN || "90020".equals(cause.getSQLState())) {
                // H2's own text advises its server mode: speak of the archive instead
                throw new ArchiveException(ArchiveException.Reason.DATABASE, "the archive at " + redact(url)
                        + " is open in another Holdpoint program or window; the embedded archive serves one "
                        + "program at a time. Close the other one and try again, or keep a shared archive on "
                        + "PostgreSQL (docs/archive.md)", cause);
            }
            throw new ArchiveException(ArchiveException.Reason.DATABASE, "cannot open the archive at "
                    + redact(url) + ": " + cause.getMessage() + " (SQLSTATE " + cause.getSQLState() + ")", cause);
        }
    }

    /** @return the number of connections this pool has open (idle and leased); 0 once closed */
    int openConnections() {
        if (closed || pool.getHikariPoolMXBean() == null) {
            return 0;
        }
        return pool.getHikariPoolMXBean().getTotalConnections();
    }

    /** Closes every connection (leased ones are closed when they come back). */
    @Override
    public void close() {
        closed = true;
        pool.close();
    }

    /**
     * @param url a JDBC URL
     * @return the URL without a password parameter, for messages
     */
    static String redact(String url) {
        return url.replaceAll("(?i)(password=)[^&;]*", "$1***");
    }
}
