package org.holdpoint.study;

import java.util.Objects;

/**
 * One archived study version opened in full: its metadata and the JSON text exactly as archived.
 *
 * @param version the metadata and signatures
 * @param json    the study file's JSON text
 */
public record ArchivedStudy(StudyVersion version, String json) {

    /** Validates the record. */
    public ArchivedStudy {
        Objects.requireNonNull(version, "version");
        Objects.requireNonNull(json, "json");
    }
}
