package org.holdpoint.archive;

/**
 * A named SQL statement; the name appears in every failure message.
 *
 * @param name short name, e.g. {@code insert study}
 * @param sql  the SQL text with {@code ?} placeholders
 */
record Stmt(String name, String sql) {
}
