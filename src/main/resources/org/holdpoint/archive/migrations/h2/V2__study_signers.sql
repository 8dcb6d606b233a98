-- Holdpoint change-record archive, schema version 2 (H2).
-- The names of the people who signed a study inside its own document (the sign-off entries of the study
-- file or workbook, made before it was archived), so that a search by signer finds them as it finds the
-- archive's own signatures. Written with the study, vouched for by its CREATED event (docs/archive.md).

CREATE TABLE study_signer (
    study_id        BIGINT NOT NULL REFERENCES study (id),
    ordinal         INTEGER NOT NULL,
    name            VARCHAR(500) NOT NULL,
    name_key        VARCHAR(500) GENERATED ALWAYS AS (LOWER(name)),
    PRIMARY KEY (study_id, ordinal)
);
CREATE INDEX study_signer_name_idx ON study_signer (name_key);
