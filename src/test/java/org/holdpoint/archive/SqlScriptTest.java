package org.holdpoint.archive;

import static org.assertj.core.api.Assertions.assertThat;

import org.junit.jupiter.api.Test;

/** Splitting migration scripts into statements. */
class SqlScriptTest {

    @Test
    void splitsAtSemicolonsOutsideQuotesCommentsAndDollarBodies() {
        String script = """
                -- a comment; with a semicolon
                CREATE TABLE t (a text DEFAULT 'x;y');
                CREATE FUNCTION f() RETURNS trigger LANGUAGE plpgsql AS $$
                BEGIN RAISE EXCEPTION 'no; never'; END
                $$;
                DO $body$ BEGIN PERFORM 1; END $body$;
                SELECT "odd;name" FROM t
                """;
        assertThat(SqlScript.split(script)).containsExactly(
                "CREATE TABLE t (a text DEFAULT 'x;y')",
                "CREATE FUNCTION f() RETURNS trigger LANGUAGE plpgsql AS $$\n"
                        + "BEGIN RAISE EXCEPTION 'no; never'; END\n$$",
                "DO $body$ BEGIN PERFORM 1; END $body$",
                "SELECT \"odd;name\" FROM t");
    }

    @Test
    void theShippedMigrationsSplitIntoTheExpectedNumberOfStatements() throws Exception {
        // counted by hand in the V1 scripts: H2 4 tables + 7 indexes; PostgreSQL adds the role check,
        // 1 function, 8 triggers, 1 REVOKE, 3 GRANTs, and row-level security with 3 policies
        assertThat(SqlScript.split(Migrator.load(Dialect.H2).get(0).text())).hasSize(11);
        assertThat(SqlScript.split(Migrator.load(Dialect.POSTGRESQL).get(0).text())).hasSize(29);
    }
}
