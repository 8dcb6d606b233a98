package org.holdpoint.study;

import java.time.Instant;
import java.util.List;
import java.util.Objects;

/**
 * A study version to be archived: the study file's canonical JSON text and the metadata the archive
 * indexes it by. The archive stores the JSON as given and keeps its SHA-256.
 *
 * @param changeId        the change record's identifier, shared by all its versions (e.g. {@code CR-2025-0113})
 * @param title           short description of the change
 * @param changeKind      kind of change (tooling, machine, material lot, supplier, measurement method, …), or null
 * @param partNumber      the part number the change concerns
 * @param revision        the part's drawing revision, or null
 * @param characteristics names of the characteristics in the study, in study order
 * @param verdict         the overall verdict in words (e.g. {@code change verified}), or null before analysis
 * @param author          who prepared the study
 * @param created         when the study was made
 * @param json            the study file's canonical JSON text
 * @param history         events from the study file's history (ANALYSED, EXCLUSION_ADDED), oldest first
 * @param documentSigners names of the people who signed the study in its own document before it was archived
 *                        (its sign-off entries), oldest first; searchable like the archive's signatures
 */
public record NewStudyVersion(String changeId, String title, String changeKind, String partNumber, String revision,
        List<String> characteristics, String verdict, String author, Instant created, String json,
        List<AuditEvent.Draft> history, List<String> documentSigners) {

    /** Validates the version: identifiers, title, part, author and JSON not blank; lists copied. */
    public NewStudyVersion {
        Checks.notBlank(changeId, "changeId");
        Checks.notBlank(title, "title");
        Checks.notBlank(partNumber, "partNumber");
        Checks.notBlank(author, "author");
        Objects.requireNonNull(created, "created");
        Checks.notBlank(json, "json");
        characteristics = Checks.names(characteristics, "characteristics");
        history = List.copyOf(Objects.requireNonNull(history, "history"));
        documentSigners = List.copyOf(Objects.requireNonNull(documentSigners, "documentSigners"));
        for (String name : documentSigners) {
            Checks.notBlank(name, "document signer");
        }
    }

    /**
     * A version without history events.
     *
     * @param changeId        the change record's identifier
     * @param title           short description of the change
     * @param changeKind      kind of change, or null
     * @param partNumber      the part number
     * @param revision        drawing revision, or null
     * @param characteristics characteristic names
     * @param verdict         overall verdict in words, or null
     * @param author          who prepared the study
     * @param created         when the study was made
     * @param json            the study JSON text
     * @return the version
     */
    public static NewStudyVersion of(String changeId, String title, String changeKind, String partNumber,
            String revision, List<String> characteristics, String verdict, String author, Instant created,
            String json) {
        return new NewStudyVersion(changeId, title, changeKind, partNumber, revision, characteristics, verdict,
                author, created, json, List.of(), List.of());
    }

    /**
     * A copy with the given history events.
     *
     * @param events the study file's history, oldest first
     * @return the copy
     */
    public NewStudyVersion withHistory(List<AuditEvent.Draft> events) {
        return new NewStudyVersion(changeId, title, changeKind, partNumber, revision, characteristics, verdict,
                author, created, json, events, documentSigners);
    }

    /**
     * A copy with the names of those who signed the study's own document.
     *
     * @param names the signers, oldest first
     * @return the copy
     */
    public NewStudyVersion withDocumentSigners(List<String> names) {
        return new NewStudyVersion(changeId, title, changeKind, partNumber, revision, characteristics, verdict,
                author, created, json, history, names);
    }
}
