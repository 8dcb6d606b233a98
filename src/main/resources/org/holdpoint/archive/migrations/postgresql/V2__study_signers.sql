-- Holdpoint change-record archive, schema version 2 (PostgreSQL).
-- The names of the people who signed a study inside its own document (the sign-off entries of the study
-- file or workbook, made before it was archived), so that a search by signer finds them as it finds the
-- archive's own signatures. Written with the study by its author, vouched for by its CREATED event
-- (docs/archive.md); append-only like every other table.

CREATE TABLE study_signer (
    study_id        bigint NOT NULL REFERENCES study (id),
    ordinal         integer NOT NULL,
    name            text NOT NULL,
    name_key        text GENERATED ALWAYS AS (lower(name)) STORED,
    PRIMARY KEY (study_id, ordinal)
);
CREATE INDEX study_signer_name_idx ON study_signer (name_key);

CREATE TRIGGER study_signer_append_only BEFORE UPDATE OR DELETE ON study_signer
    FOR EACH ROW EXECUTE FUNCTION holdpoint_reject_change();
CREATE TRIGGER study_signer_no_truncate BEFORE TRUNCATE ON study_signer
    FOR EACH STATEMENT EXECUTE FUNCTION holdpoint_reject_change();

REVOKE ALL ON study_signer FROM PUBLIC;
GRANT SELECT ON study_signer TO holdpoint_author, holdpoint_approver, holdpoint_auditor;
GRANT INSERT ON study_signer TO holdpoint_author;
