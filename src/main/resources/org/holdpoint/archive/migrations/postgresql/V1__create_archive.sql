-- Holdpoint change-record archive, schema version 1 (PostgreSQL).
-- Run as the archive owner (holdpoint_owner). The group roles must exist first: postgresql-setup.sql.
-- Append-only: no role but the owner holds UPDATE/DELETE/TRUNCATE, and a trigger rejects them even for
-- the owner; audit_event rows form a hash chain that verify() re-checks (docs/archive.md).

DO $$
BEGIN
    IF NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = 'holdpoint_author')
            OR NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = 'holdpoint_approver')
            OR NOT EXISTS (SELECT 1 FROM pg_roles WHERE rolname = 'holdpoint_auditor') THEN
        RAISE EXCEPTION 'roles holdpoint_author, holdpoint_approver and holdpoint_auditor must exist: '
            'run org/holdpoint/archive/postgresql-setup.sql as an administrator first';
    END IF;
END
$$;

CREATE TABLE study (
    id              bigint PRIMARY KEY,
    change_id       text NOT NULL,
    version         integer NOT NULL CHECK (version >= 1),
    supersedes_id   bigint REFERENCES study (id),
    title           text NOT NULL,
    change_kind     text,
    part_number     text NOT NULL,
    revision        text,
    verdict         text,
    author          text NOT NULL,
    created_at      timestamptz NOT NULL,
    archived_at     timestamptz NOT NULL,
    json_sha256     char(64) NOT NULL,
    json_text       text NOT NULL,
    -- search keys (case-insensitive filters through an index); derived by the database, never written
    part_key        text GENERATED ALWAYS AS (lower(part_number)) STORED,
    change_kind_key text GENERATED ALWAYS AS (lower(change_kind)) STORED,
    CONSTRAINT study_change_version_uq UNIQUE (change_id, version),
    CONSTRAINT study_supersedes_uq UNIQUE (supersedes_id)
);
CREATE INDEX study_part_idx ON study (part_key);
CREATE INDEX study_change_kind_idx ON study (change_kind_key);
CREATE INDEX study_created_idx ON study (created_at);

CREATE TABLE study_characteristic (
    study_id        bigint NOT NULL REFERENCES study (id),
    ordinal         integer NOT NULL,
    name            text NOT NULL,
    name_key        text GENERATED ALWAYS AS (lower(name)) STORED,
    PRIMARY KEY (study_id, ordinal)
);
CREATE INDEX study_characteristic_name_idx ON study_characteristic (name_key);

CREATE TABLE signature (
    id              bigint PRIMARY KEY,
    study_id        bigint NOT NULL REFERENCES study (id),
    signer          text NOT NULL,
    role            text NOT NULL,
    meaning         text NOT NULL,
    signed_at       timestamptz NOT NULL,
    signer_key      text GENERATED ALWAYS AS (lower(signer)) STORED
);
CREATE INDEX signature_study_idx ON signature (study_id);
CREATE INDEX signature_signer_idx ON signature (signer_key);

CREATE TABLE audit_event (
    seq             bigint PRIMARY KEY,
    study_id        bigint NOT NULL REFERENCES study (id),
    kind            varchar(20) NOT NULL
                    CHECK (kind IN ('CREATED', 'ANALYSED', 'EXCLUSION_ADDED', 'SIGNED', 'SUPERSEDED')),
    subject_id      bigint NOT NULL,
    actor           text NOT NULL,
    db_user         text NOT NULL,
    occurred_at     timestamptz NOT NULL,
    what            text NOT NULL,
    why             text,
    subject_digest  char(64) NOT NULL,
    prev_hash       char(64) NOT NULL,
    hash            char(64) NOT NULL,
    CONSTRAINT audit_event_hash_uq UNIQUE (hash)
);
CREATE INDEX audit_event_study_idx ON audit_event (study_id);

-- Append-only, enforced by the database: rejects UPDATE, DELETE and TRUNCATE for every role.
CREATE FUNCTION holdpoint_reject_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
    RAISE EXCEPTION 'the Holdpoint archive is append-only: % on % is not allowed', TG_OP, TG_TABLE_NAME
        USING ERRCODE = 'insufficient_privilege';
END
$$;
CREATE TRIGGER study_append_only BEFORE UPDATE OR DELETE ON study
    FOR EACH ROW EXECUTE FUNCTION holdpoint_reject_change();
CREATE TRIGGER study_characteristic_append_only BEFORE UPDATE OR DELETE ON study_characteristic
    FOR EACH ROW EXECUTE FUNCTION holdpoint_reject_change();
CREATE TRIGGER signature_append_only BEFORE UPDATE OR DELETE ON signature
    FOR EACH ROW EXECUTE FUNCTION holdpoint_reject_change();
CREATE TRIGGER audit_event_append_only BEFORE UPDATE OR DELETE ON audit_event
    FOR EACH ROW EXECUTE FUNCTION holdpoint_reject_change();
CREATE TRIGGER study_no_truncate BEFORE TRUNCATE ON study
    FOR EACH STATEMENT EXECUTE FUNCTION holdpoint_reject_change();
CREATE TRIGGER study_characteristic_no_truncate BEFORE TRUNCATE ON study_characteristic
    FOR EACH STATEMENT EXECUTE FUNCTION holdpoint_reject_change();
CREATE TRIGGER signature_no_truncate BEFORE TRUNCATE ON signature
    FOR EACH STATEMENT EXECUTE FUNCTION holdpoint_reject_change();
CREATE TRIGGER audit_event_no_truncate BEFORE TRUNCATE ON audit_event
    FOR EACH STATEMENT EXECUTE FUNCTION holdpoint_reject_change();

-- Roles, enforced by the database. Nobody but the owner holds anything beyond SELECT and INSERT.
REVOKE ALL ON study, study_characteristic, signature, audit_event, schema_version FROM PUBLIC;
GRANT SELECT ON study, study_characteristic, signature, audit_event, schema_version
    TO holdpoint_author, holdpoint_approver, holdpoint_auditor;
GRANT INSERT ON study, study_characteristic, audit_event TO holdpoint_author;
GRANT INSERT ON signature, audit_event TO holdpoint_approver;

-- Which role may append which kind of audit event, and only under its own name (row-level security; the
-- owner is exempt, as table owners are unless FORCE is set).
ALTER TABLE audit_event ENABLE ROW LEVEL SECURITY;
CREATE POLICY audit_event_read ON audit_event FOR SELECT
    TO holdpoint_author, holdpoint_approver, holdpoint_auditor USING (true);
CREATE POLICY audit_event_author_append ON audit_event FOR INSERT TO holdpoint_author
    WITH CHECK (kind IN ('CREATED', 'ANALYSED', 'EXCLUSION_ADDED', 'SUPERSEDED') AND db_user = current_user);
CREATE POLICY audit_event_approver_append ON audit_event FOR INSERT TO holdpoint_approver
    WITH CHECK (kind = 'SIGNED' AND db_user = current_user);
