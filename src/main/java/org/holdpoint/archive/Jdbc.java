package org.holdpoint.archive;

import java.sql.Connection;
import java.sql.PreparedStatement;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Types;
import java.time.Instant;
import java.time.OffsetDateTime;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.Optional;
import java.util.Set;
import java.util.stream.Collectors;
import org.holdpoint.study.ArchiveException;
import org.holdpoint.study.ArchiveException.Reason;

/**
 * Runs prepared statements and maps rows, separately; every failure is rethrown as an
 * {@link ArchiveException} naming the statement and its parameters.
 */
final class Jdbc {

    /** Maps the current row of a result set to a value; must not advance the cursor. */
    @FunctionalInterface
    interface RowMapper<T> {
        /**
         * @param rs the result set positioned on a row
         * @return the value of that row
         * @throws SQLException when a column cannot be read
         */
        T map(ResultSet rs) throws SQLException;
    }

    /** Receives each row of a streamed query. */
    @FunctionalInterface
    interface RowHandler {
        /**
         * @param rs the result set positioned on a row
         * @throws SQLException when a column cannot be read
         */
        void handle(ResultSet rs) throws SQLException;
    }

    /** SQLSTATEs that mean "another writer got there first": the transaction changed nothing and may rerun. */
    private static final Set<String> RETRYABLE = Set.of(
            "23505", // unique violation: two writers took the same chain position or id
            "40001", // serialization failure / H2 deadlock
            "40P01", // PostgreSQL deadlock
            "55P03", // PostgreSQL lock not available
            "HYT00", // H2 lock timeout
            "90131"); // H2 concurrent update

    private static final Set<String> MISSING_TABLE = Set.of("42P01", "42S02", "42102");

    private static final int SHOWN_PARAMETER_CHARS = 60;

    private Jdbc() {
    }

    /**
     * Runs a query and maps every row.
     *
     * @param c      the connection
     * @param st     the statement
     * @param mapper the row mapper
     * @param params the parameters, in placeholder order
     * @param <T>    the row type
     * @return the rows
     * @throws ArchiveException when the statement fails
     */
    static <T> List<T> query(Connection c, Stmt st, RowMapper<T> mapper, Object... params) throws ArchiveException {
        List<T> rows = new ArrayList<>();
        stream(c, st, rs -> rows.add(mapper.map(rs)), params);
        return rows;
    }

    /**
     * Runs a query expected to return at most one row.
     *
     * @param c      the connection
     * @param st     the statement
     * @param mapper the row mapper
     * @param params the parameters
     * @param <T>    the row type
     * @return the first row, or empty
     * @throws ArchiveException when the statement fails
     */
    static <T> Optional<T> queryOne(Connection c, Stmt st, RowMapper<T> mapper, Object... params)
            throws ArchiveException {
        List<T> rows = query(c, st, mapper, params);
        return rows.isEmpty() ? Optional.empty() : Optional.of(rows.get(0));
    }

    /**
     * Runs a query returning one number (e.g. a count).
     *
     * @param c      the connection
     * @param st     the statement
     * @param params the parameters
     * @return the value of the first column of the first row
     * @throws ArchiveException when the statement fails or returns no row
     */
    static long queryLong(Connection c, Stmt st, Object... params) throws ArchiveException {
        return queryOne(c, st, rs -> rs.getLong(1), params).orElseThrow(() -> new ArchiveException(
                Reason.DATABASE, "statement '" + st.name() + "' returned no row"));
    }

    /**
     * Runs a query and hands each row to a handler without collecting them (for large reads).
     *
     * @param c       the connection
     * @param st      the statement
     * @param handler the row handler
     * @param params  the parameters
     * @throws ArchiveException when the statement fails
     */
    static void stream(Connection c, Stmt st, RowHandler handler, Object... params) throws ArchiveException {
        try (PreparedStatement ps = c.prepareStatement(st.sql())) {
            bind(ps, params);
            try (ResultSet rs = ps.executeQuery()) {
                while (rs.next()) {
                    handler.handle(rs);
                }
            }
        } catch (SQLException e) {
            throw failure(st, params, e);
        }
    }

    /**
     * Runs an INSERT or DDL statement.
     *
     * @param c      the connection
     * @param st     the statement
     * @param params the parameters
     * @return the number of rows changed
     * @throws ArchiveException when the statement fails
     */
    static int update(Connection c, Stmt st, Object... params) throws ArchiveException {
        try (PreparedStatement ps = c.prepareStatement(st.sql())) {
            bind(ps, params);
            return ps.executeUpdate();
        } catch (SQLException e) {
            throw failure(st, params, e);
        }
    }

    /**
     * Runs one INSERT statement for many parameter rows as a batch.
     *
     * @param c    the connection
     * @param st   the statement
     * @param rows one parameter array per row
     * @throws ArchiveException when the batch fails (the message names the first row)
     */
    static void batch(Connection c, Stmt st, List<Object[]> rows) throws ArchiveException {
        if (rows.isEmpty()) {
            return;
        }
        try (PreparedStatement ps = c.prepareStatement(st.sql())) {
            for (Object[] row : rows) {
                bind(ps, row);
                ps.addBatch();
            }
            ps.executeBatch();
        } catch (SQLException e) {
            throw failure(st, rows.get(0), e);
        }
    }

    /**
     * Reads a timestamp column as an instant.
     *
     * @param rs     the result set
     * @param column the column label
     * @return the instant, or null
     * @throws SQLException when the column cannot be read
     */
    static Instant instant(ResultSet rs, String column) throws SQLException {
        OffsetDateTime t = rs.getObject(column, OffsetDateTime.class);
        return t == null ? null : t.toInstant();
    }

    /**
     * Reads a nullable BIGINT column.
     *
     * @param rs     the result set
     * @param column the column label
     * @return the value, or null
     * @throws SQLException when the column cannot be read
     */
    static Long nullableLong(ResultSet rs, String column) throws SQLException {
        long v = rs.getLong(column);
        return rs.wasNull() ? null : v;
    }

    private static void bind(PreparedStatement ps, Object... params) throws SQLException {
        for (int i = 0; i < params.length; i++) {
            Object p = params[i];
            int n = i + 1;
            if (p == null) {
                ps.setNull(n, Types.NULL);
            } else if (p instanceof String s) {
                ps.setString(n, s);
            } else if (p instanceof Long l) {
                ps.setLong(n, l);
            } else if (p instanceof Integer k) {
                ps.setInt(n, k);
            } else if (p instanceof Instant t) {
                ps.setObject(n, OffsetDateTime.ofInstant(t, ZoneOffset.UTC));
            } else {
                throw new IllegalArgumentException("unsupported parameter type " + p.getClass().getName());
            }
        }
    }

    /**
     * Wraps a driver failure with the statement's name and parameters and a reason callers can act on.
     *
     * @param st     the statement
     * @param params its parameters
     * @param e      the driver's exception
     * @return the archive exception
     */
    static ArchiveException failure(Stmt st, Object[] params, SQLException e) {
        String state = e.getSQLState() == null ? "" : e.getSQLState();
        Reason reason = reasonOf(state);
        String advice = switch (reason) {
            case RETRYABLE_CONFLICT -> " Another writer changed the archive at the same moment; nothing was"
                    + " stored, try again.";
            case PERMISSION_DENIED -> " The connected database role may not do this; ask the archive owner"
                    + " for the right role (author, approver or auditor).";
            case SCHEMA -> " The archive schema is missing; open the archive once as its owner to create it.";
            default -> "";
        };
        String message = String.format(Locale.ROOT, "statement '%s' failed with parameters %s: %s (SQLSTATE %s).%s",
                st.name(), describe(params), firstLine(e.getMessage()), state, advice);
        return new ArchiveException(reason, message, e);
    }

    /**
     * @param state a SQLSTATE
     * @return whether it means a write conflict that a rerun may resolve
     */
    static boolean isRetryable(String state) {
        return state != null && RETRYABLE.contains(state);
    }

    private static Reason reasonOf(String state) {
        if (isRetryable(state)) {
            return Reason.RETRYABLE_CONFLICT;
        }
        if ("42501".equals(state)) {
            return Reason.PERMISSION_DENIED;
        }
        if (MISSING_TABLE.contains(state)) {
            return Reason.SCHEMA;
        }
        return Reason.DATABASE;
    }

    private static String describe(Object[] params) {
        return Arrays.stream(params).map(Jdbc::shorten).collect(Collectors.joining(", ", "[", "]"));
    }

    private static String shorten(Object p) {
        if (p == null) {
            return "null";
        }
        String s = p.toString();
        String shown = s.length() <= SHOWN_PARAMETER_CHARS ? s : s.substring(0, SHOWN_PARAMETER_CHARS)
                + "…(" + s.length() + " chars)";
        return p instanceof String ? "'" + shown + "'" : shown;
    }

    private static String firstLine(String message) {
        if (message == null) {
            return "no message";
        }
        int nl = message.indexOf('\n');
        return nl < 0 ? message : message.substring(0, nl);
    }
}
