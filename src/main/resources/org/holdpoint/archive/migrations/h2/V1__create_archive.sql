-- Holdpoint change-record archive, schema version 1 (H2).
-- Append-only: the application never updates or deletes; audit_event rows form a hash chain (docs/archive.md).

CREATE TABLE study (
    id              BIGINT PRIMARY KEY,
    change_id       VARCHAR(200) NOT NULL,
    version         INTEGER NOT NULL CHECK (version >= 1),
    supersedes_id   BIGINT REFERENCES study (id),
    title           VARCHAR(2000) NOT NULL,
    change_kind     VARCHAR(200),
    part_number     VARCHAR(200) NOT NULL,
    revision        VARCHAR(200),
    verdict         VARCHAR(2000),
    author          VARCHAR(500) NOT NULL,
    created_at      TIMESTAMP(6) WITH TIME ZONE NOT NULL,
    archived_at     TIMESTAMP(6) WITH TIME ZONE NOT NULL,
    json_sha256     CHAR(64) NOT NULL,
    json_text       CHARACTER LARGE OBJECT NOT NULL,
    -- search keys (case-insensitive filters through an index); derived by the database, never written
    part_key        VARCHAR(200) GENERATED ALWAYS AS (LOWER(part_number)),
    change_kind_key VARCHAR(200) GENERATED ALWAYS AS (LOWER(change_kind)),
    CONSTRAINT study_change_version_uq UNIQUE (change_id, version),
    CONSTRAINT study_supersedes_uq UNIQUE (supersedes_id)
);
CREATE INDEX study_part_idx ON study (part_key);
CREATE INDEX study_change_kind_idx ON study (change_kind_key);
CREATE INDEX study_created_idx ON study (created_at);

CREATE TABLE study_characteristic (
    study_id        BIGINT NOT NULL REFERENCES study (id),
    ordinal         INTEGER NOT NULL,
    name            VARCHAR(500) NOT NULL,
    name_key        VARCHAR(500) GENERATED ALWAYS AS (LOWER(name)),
    PRIMARY KEY (study_id, ordinal)
);
CREATE INDEX study_characteristic_name_idx ON study_characteristic (name_key);

CREATE TABLE signature (
    id              BIGINT PRIMARY KEY,
    study_id        BIGINT NOT NULL REFERENCES study (id),
    signer          VARCHAR(500) NOT NULL,
    role            VARCHAR(500) NOT NULL,
    meaning         VARCHAR(2000) NOT NULL,
    signed_at       TIMESTAMP(6) WITH TIME ZONE NOT NULL,
    signer_key      VARCHAR(500) GENERATED ALWAYS AS (LOWER(signer))
);
CREATE INDEX signature_study_idx ON signature (study_id);
CREATE INDEX signature_signer_idx ON signature (signer_key);

CREATE TABLE audit_event (
    seq             BIGINT PRIMARY KEY,
    study_id        BIGINT NOT NULL REFERENCES study (id),
    kind            VARCHAR(20) NOT NULL
                    CHECK (kind IN ('CREATED', 'ANALYSED', 'EXCLUSION_ADDED', 'SIGNED', 'SUPERSEDED')),
    subject_id      BIGINT NOT NULL,
    actor           VARCHAR(500) NOT NULL,
    db_user         VARCHAR(500) NOT NULL,
    occurred_at     TIMESTAMP(6) WITH TIME ZONE NOT NULL,
    what            VARCHAR(4000) NOT NULL,
    why             VARCHAR(4000),
    subject_digest  CHAR(64) NOT NULL,
    prev_hash       CHAR(64) NOT NULL,
    hash            CHAR(64) NOT NULL,
    CONSTRAINT audit_event_hash_uq UNIQUE (hash)
);
CREATE INDEX audit_event_study_idx ON audit_event (study_id);
