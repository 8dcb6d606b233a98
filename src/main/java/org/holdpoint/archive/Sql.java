package org.holdpoint.archive;

import java.util.List;

/**
 * Every SQL statement the archive runs, in one place. All are parameterised; the only text assembled at
 * run time is the list filter, from the fixed fragments below.
 */
final class Sql {

    // --- schema migration ---------------------------------------------------------------------------

    static final Stmt SCHEMA_VERSION_EXISTS = new Stmt("find schema_version table", """
            SELECT COUNT(*) FROM information_schema.tables
            WHERE LOWER(table_name) = 'schema_version' AND LOWER(table_schema) = LOWER(CURRENT_SCHEMA)""");

    static final Stmt CREATE_SCHEMA_VERSION = new Stmt("create schema_version table", """
            CREATE TABLE schema_version (
                version       INTEGER PRIMARY KEY,
                description   VARCHAR(200) NOT NULL,
                script_sha256 CHAR(64) NOT NULL,
                applied_at    TIMESTAMP WITH TIME ZONE NOT NULL)""");

    static final Stmt SELECT_SCHEMA_VERSIONS = new Stmt("read schema versions",
            "SELECT version, description, script_sha256 FROM schema_version ORDER BY version");

    static final Stmt INSERT_SCHEMA_VERSION = new Stmt("record schema version",
            "INSERT INTO schema_version (version, description, script_sha256, applied_at) VALUES (?, ?, ?, ?)");

    /** PostgreSQL: one migrator at a time (transaction-scoped advisory lock). */
    static final Stmt PG_LOCK_MIGRATION = new Stmt("lock migration",
            "SELECT COUNT(*) FROM (SELECT pg_advisory_xact_lock(?)) AS locked");

    // --- the chain ----------------------------------------------------------------------------------

    /** PostgreSQL: serialises chain appends across sessions; needs no table privilege beyond the inserts. */
    static final Stmt PG_LOCK_CHAIN = new Stmt("lock audit chain",
            "SELECT COUNT(*) FROM (SELECT pg_advisory_xact_lock(?)) AS locked");

    static final Stmt SELECT_HEAD = new Stmt("read chain head",
            "SELECT seq, hash FROM audit_event ORDER BY seq DESC FETCH FIRST 1 ROWS ONLY");

    static final Stmt CURRENT_DB_USER = new Stmt("read database user", "SELECT CURRENT_USER");

    static final Stmt NEXT_STUDY_ID = new Stmt("next study id", "SELECT COALESCE(MAX(id), 0) + 1 FROM study");

    static final Stmt NEXT_SIGNATURE_ID = new Stmt("next signature id",
            "SELECT COALESCE(MAX(id), 0) + 1 FROM signature");

    static final Stmt COUNT_CHANGE = new Stmt("find change id", "SELECT COUNT(*) FROM study WHERE change_id = ?");

    static final Stmt INSERT_STUDY = new Stmt("insert study", """
            INSERT INTO study (id, change_id, version, supersedes_id, title, change_kind, part_number, revision,
                               verdict, author, created_at, archived_at, json_sha256, json_text)
            VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)""");

    static final Stmt INSERT_CHARACTERISTIC = new Stmt("insert study characteristic",
            "INSERT INTO study_characteristic (study_id, ordinal, name) VALUES (?, ?, ?)");

    static final Stmt INSERT_DOCUMENT_SIGNER = new Stmt("insert study signer",
            "INSERT INTO study_signer (study_id, ordinal, name) VALUES (?, ?, ?)");

    static final Stmt INSERT_SIGNATURE = new Stmt("insert signature", """
            INSERT INTO signature (id, study_id, signer, role, meaning, signed_at)
            VALUES (?, ?, ?, ?, ?, ?)""");

    static final Stmt INSERT_EVENT = new Stmt("insert audit event", """
            INSERT INTO audit_event (seq, study_id, kind, subject_id, actor, db_user, occurred_at, what, why,
                                     subject_digest, prev_hash, hash)
            VALUES (?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?, ?)""");

    // --- reading ------------------------------------------------------------------------------------

    private static final String STUDY_COLUMNS = """
            s.id, s.change_id, s.version, s.supersedes_id, n.id AS superseded_by,
            s.title, s.change_kind, s.part_number, s.revision, s.verdict, s.author, s.created_at, s.archived_at,
            s.json_sha256""";

    /** A study with the version that superseded it, if any (supersedes_id is unique, so at most one). */
    private static final String STUDY_FROM = " FROM study s LEFT JOIN study n ON n.supersedes_id = s.id";

    static final Stmt SELECT_STUDY = new Stmt("read study",
            "SELECT " + STUDY_COLUMNS + STUDY_FROM + " WHERE s.id = ?");

    static final Stmt SELECT_STUDY_JSON = new Stmt("read study JSON",
            "SELECT json_text FROM study WHERE id = ?");

    static final Stmt SELECT_CHARACTERISTICS_OF = new Stmt("read study characteristics",
            "SELECT study_id, name FROM study_characteristic WHERE study_id = ? ORDER BY ordinal");

    static final Stmt SELECT_DOCUMENT_SIGNERS_OF = new Stmt("read study signers",
            "SELECT study_id, name FROM study_signer WHERE study_id = ? ORDER BY ordinal");

    static final Stmt SELECT_SIGNATURES_OF = new Stmt("read study signatures", """
            SELECT id, study_id, signer, role, meaning, signed_at FROM signature
            WHERE study_id = ? ORDER BY signed_at, id""");

    private static final String EVENT_COLUMNS = """
            seq, study_id, kind, subject_id, actor, db_user, occurred_at, what, why, subject_digest, prev_hash,
            hash""";

    static final Stmt SELECT_EVENTS_OF = new Stmt("read study events",
            "SELECT " + EVENT_COLUMNS + " FROM audit_event WHERE study_id = ? ORDER BY seq");

    // --- listing: a fixed head, fixed filter fragments, a fixed tail --------------------------------

    static final String LIST_HEAD = "SELECT " + STUDY_COLUMNS + STUDY_FROM;
    static final String LIST_TAIL = " ORDER BY s.created_at DESC, s.id DESC";
    static final String LIST_CHARACTERISTICS_HEAD = "SELECT c.study_id, c.name FROM study_characteristic c"
            + " JOIN study s ON s.id = c.study_id";
    static final String LIST_CHARACTERISTICS_TAIL = " ORDER BY c.study_id, c.ordinal";
    static final String LIST_DOCUMENT_SIGNERS_HEAD = "SELECT d.study_id, d.name FROM study_signer d"
            + " JOIN study s ON s.id = d.study_id";
    static final String LIST_DOCUMENT_SIGNERS_TAIL = " ORDER BY d.study_id, d.ordinal";
    static final String LIST_SIGNATURES_HEAD = "SELECT g.id, g.study_id, g.signer, g.role, g.meaning, g.signed_at"
            + " FROM signature g JOIN study s ON s.id = g.study_id";
    static final String LIST_SIGNATURES_TAIL = " ORDER BY g.study_id, g.signed_at, g.id";

    static final String WHERE_PART = "s.part_key LIKE ? ESCAPE '!'";
    static final String WHERE_CHARACTERISTIC = "EXISTS (SELECT 1 FROM study_characteristic c2"
            + " WHERE c2.study_id = s.id AND c2.name_key LIKE ? ESCAPE '!')";
    static final String WHERE_CHANGE_KIND = "s.change_kind_key = LOWER(?)";
    static final String WHERE_VERDICT = "LOWER(s.verdict) = LOWER(?)";
    static final String WHERE_CREATED_FROM = "s.created_at >= ?";
    static final String WHERE_CREATED_TO = "s.created_at < ?";
    /** Two placeholders, the same pattern: a signature in the archive or a signer of the document itself. */
    static final String WHERE_SIGNER = "(EXISTS (SELECT 1 FROM signature g2"
            + " WHERE g2.study_id = s.id AND g2.signer_key LIKE ? ESCAPE '!')"
            + " OR EXISTS (SELECT 1 FROM study_signer d2 WHERE d2.study_id = s.id AND d2.name_key LIKE ? ESCAPE '!'))";
    static final String WHERE_CHANGE_ID = "s.change_id = ?";
    static final String WHERE_CURRENT = "NOT EXISTS (SELECT 1 FROM study n2 WHERE n2.supersedes_id = s.id)";

    // --- verification: everything, in a fixed order -------------------------------------------------

    static final Stmt ALL_EVENTS = new Stmt("read all audit events",
            "SELECT " + EVENT_COLUMNS + " FROM audit_event ORDER BY seq");

    static final Stmt ALL_STUDIES = new Stmt("read all studies", """
            SELECT id, change_id, version, supersedes_id, title, change_kind, part_number, revision, verdict,
                   author, created_at, archived_at, json_sha256, json_text
            FROM study ORDER BY id""");

    static final Stmt ALL_CHARACTERISTICS = new Stmt("read all characteristics",
            "SELECT study_id, name FROM study_characteristic ORDER BY study_id, ordinal");

    static final Stmt ALL_DOCUMENT_SIGNERS = new Stmt("read all study signers",
            "SELECT study_id, name FROM study_signer ORDER BY study_id, ordinal");

    static final Stmt ALL_SIGNATURES = new Stmt("read all signatures",
            "SELECT id, study_id, signer, role, meaning, signed_at FROM signature ORDER BY id");

    // --- H2 maintenance --------------------------------------------------------------------------------

    /** Percent of live data: in the file (after a restart) or in its chunks (within a session), whichever is lower. */
    static final Stmt H2_FILL_RATE = new Stmt("read H2 file fill rate", """
            SELECT MIN(CAST(SETTING_VALUE AS INTEGER)) FROM INFORMATION_SCHEMA.SETTINGS
            WHERE SETTING_NAME IN ('info.FILL_RATE', 'info.CHUNKS_FILL_RATE')""");

    /** Closes the embedded database for every session and rewrites its file without dead pages. */
    static final Stmt H2_SHUTDOWN_COMPACT = new Stmt("compact H2 file", "SHUTDOWN COMPACT");

    /** Tables the archive owns, for diagnostics and tests. */
    static final List<String> TABLES = List.of("study", "study_characteristic", "study_signer", "signature",
            "audit_event", "schema_version");

    private Sql() {
    }
}
