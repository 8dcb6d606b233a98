package org.holdpoint.archive;

import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.ResultSet;
import java.sql.SQLException;
import java.sql.Statement;
import java.time.Instant;
import java.util.List;
import java.util.UUID;
import org.holdpoint.study.NewStudyVersion;

/** Invented study versions and uniquely named throwaway databases for the archive tests. */
final class Fixtures {

    private Fixtures() {
    }

    /**
     * A fresh in-memory H2 database that vanishes when its last connection closes.
     *
     * @param label readable part of the name
     * @return the JDBC URL
     */
    static String memUrl(String label) {
        return "jdbc:h2:mem:" + label + "-" + UUID.randomUUID();
    }

    /**
     * An invented study version.
     *
     * @param changeId the change id
     * @param part     the part number
     * @param kind     the kind of change
     * @param verdict  the verdict in words
     * @param created  when it was made
     * @param names    characteristic names
     * @return the version
     */
    static NewStudyVersion study(String changeId, String part, String kind, String verdict, Instant created,
            String... names) {
        String json = "{\"schemaVersion\":1,\"changeId\":\"" + changeId + "\",\"part\":\"" + part
                + "\",\"note\":\"Bohrung Ø12 H7 – µm\"}";
        return NewStudyVersion.of(changeId, "Insert change on line 3 for " + part, kind, part, "C", List.of(names),
                verdict, "Petra Engineer", created, json);
    }

    /**
     * Runs one SQL statement directly, outside the archive (the tampering an administrator could do).
     *
     * @param url the database URL
     * @param sql the statement
     * @return rows changed
     * @throws SQLException when it fails
     */
    static int direct(String url, String sql) throws SQLException {
        try (Connection c = DriverManager.getConnection(url); Statement s = c.createStatement()) {
            return s.executeUpdate(sql);
        }
    }

    /**
     * Reads one number directly.
     *
     * @param url the database URL
     * @param sql a query returning one number
     * @return the number
     * @throws SQLException when it fails
     */
    static long directLong(String url, String sql) throws SQLException {
        try (Connection c = DriverManager.getConnection(url); Statement s = c.createStatement();
                ResultSet rs = s.executeQuery(sql)) {
            rs.next();
            return rs.getLong(1);
        }
    }
}
