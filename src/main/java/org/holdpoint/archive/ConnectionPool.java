package org.holdpoint.archive;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.SQLException;
import java.util.ArrayDeque;
import java.util.Deque;
import java.util.Properties;
import java.util.concurrent.atomic.AtomicInteger;
import org.holdpoint.study.ArchiveException;

/**
 * A tiny pool of JDBC connections to one URL: a few idle connections are kept for reuse (which also keeps
 * an embedded database open between calls) and all are closed by {@link #close()}.
 */
final class ConnectionPool implements AutoCloseable {

    private static final int MAX_IDLE = 4;

    private final String url;
    private final Properties properties;
    private final Deque<Connection> idle = new ArrayDeque<>();
    private final AtomicInteger open = new AtomicInteger();
    private boolean closed;

    /**
     * @param url        the JDBC URL
     * @param properties driver properties (user, password, …)
     */
    ConnectionPool(String url, Properties properties) {
        this.url = url;
        this.properties = new Properties();
        this.properties.putAll(properties);
    }

    /** A borrowed connection, returned to the pool on close. */
    final class Lease implements AutoCloseable {
        private final Connection connection;
        private boolean broken;

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
            release(connection, broken);
        }
    }

    /** H2's error code for a database file locked by another process. */
    private static final int H2_ALREADY_OPEN = 90020;

    /**
     * Borrows a connection.
     *
     * @return the lease
     * @throws ArchiveException when the pool is closed or the database cannot be reached
     */
    Lease lease() throws ArchiveException {
        synchronized (this) {
            if (closed) {
                throw new ArchiveException(ArchiveException.Reason.DATABASE, "the archive is closed");
            }
            Connection c = idle.pollFirst();
            if (c != null) {
                return new Lease(c);
            }
        }
        try {
            Connection c = DriverManager.getConnection(url, properties);
            open.incrementAndGet();
            return new Lease(c);
        } catch (SQLException e) {
            if (e.getErrorCode() == H2_ALREADY_OPEN || "90020".equals(e.getSQLState())) {
                // H2's own text advises its server mode: speak of the archive instead
                throw new ArchiveException(ArchiveException.Reason.DATABASE, "the archive at " + redact(url)
                        + " is open in another Holdpoint program or window; the embedded archive serves one "
                        + "program at a time. Close the other one and try again, or keep a shared archive on "
                        + "PostgreSQL (docs/archive.md)", e);
            }
            throw new ArchiveException(ArchiveException.Reason.DATABASE, "cannot open the archive at "
                    + redact(url) + ": " + e.getMessage() + " (SQLSTATE " + e.getSQLState() + ")", e);
        }
    }

    private void release(Connection c, boolean broken) {
        boolean keep;
        try {
            keep = !broken && !c.isClosed() && c.getAutoCommit();
        } catch (SQLException e) {
            keep = false;
        }
        synchronized (this) {
            if (keep && !closed && idle.size() < MAX_IDLE) {
                idle.addFirst(c);
                return;
            }
        }
        closeQuietly(c);
    }

    /** @return the number of connections this pool has open (idle and leased) */
    int openConnections() {
        return open.get();
    }

    /** Closes every idle connection; leased ones are closed when they come back. */
    @Override
    public void close() {
        Deque<Connection> toClose;
        synchronized (this) {
            closed = true;
            toClose = new ArrayDeque<>(idle);
            idle.clear();
        }
        toClose.forEach(this::closeQuietly);
    }

    private void closeQuietly(Connection c) {
        try {
            c.close();
        } catch (SQLException e) {
            // closing a broken connection cannot be helped; the driver has already released it
        } finally {
            open.decrementAndGet();
        }
    }

    /**
     * @param url a JDBC URL
     * @return the URL without a password parameter, for messages
     */
    static String redact(String url) {
        return url.replaceAll("(?i)(password=)[^&;]*", "$1***");
    }
}
