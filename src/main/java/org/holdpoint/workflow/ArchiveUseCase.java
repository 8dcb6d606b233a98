package org.holdpoint.workflow;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.time.Instant;
import java.util.ArrayList;
import java.util.List;
import org.holdpoint.study.ArchiveException;
import org.holdpoint.study.ArchiveQuery;
import org.holdpoint.study.ArchivedStudy;
import org.holdpoint.study.AuditEvent;
import org.holdpoint.study.ChangeRecordArchive;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.Exclusion;
import org.holdpoint.study.Progress;
import org.holdpoint.result.StudyResult;
import org.holdpoint.study.StudyVersion;

/**
 * The archive use cases behind {@code holdpoint archive ...} and the window's archive view: add a
 * study file as an immutable version (a correction supersedes the current version), list, show,
 * sign and verify. Every study is re-analysed from its raw data before it is archived, so the
 * verdict stored is the one the data give.
 */
public final class ArchiveUseCase {
    private final ChangeRecordArchive archive;

    /**
     * @param archive the open archive (the caller closes it)
     */
    public ArchiveUseCase(ChangeRecordArchive archive) {
        this.archive = archive;
    }

    /**
     * Archives a study file: a new change id becomes version 1; an existing one is superseded by this
     * version, which then needs a reason.
     *
     * @param studyFile the study file
     * @param actor     who archives it
     * @param reason    why (required for a correction)
     * @return the stored version
     * @throws ArchiveException when the archive refuses it
     */
    public StudyVersion add(Path studyFile, String actor, String reason) throws ArchiveException {
        ChangeStudy study = StudyFiles.read(studyFile);
        StudyResult result = new StudyAnalyzer().analyze(study.data(), study.settings(), Progress.NONE);
        com.fasterxml.jackson.databind.JsonNode fileTree;
        try {
            fileTree = StudyFiles.tree(java.nio.file.Files.readString(studyFile));
        } catch (java.io.IOException e) {
            throw new StudyFileException("%s cannot be read (%s)", studyFile, e.getMessage());
        }
        // the archive keeps the whole study, its sign-off entries included (an author may not add archive
        // signatures: on a shared archive only approvers sign); every output shows the record's hash
        // the document as the study file holds it (its results and the version that wrote it), so the archived
        // record has the hash the study file and its workbook show, whatever version archives it
        String json = new String(StudyFiles.canonical(fileTree), StandardCharsets.UTF_8);
        lastRecordSha256 = StudyFiles.recordSha256(fileTree);
        var change = study.change();
        if (change.partNumber().isBlank() || change.title().isBlank()) {
            throw new ArchiveException(ArchiveException.Reason.REJECTED, studyFile + ": the study has no "
                    + (change.partNumber().isBlank() ? "part number" : "title")
                    + "; describe the change (--part, --title) when you analyse it, then save the study again");
        }
        List<String> names = new ArrayList<>();
        for (CharacteristicData c : study.data().characteristics()) {
            names.add(c.name());
        }
        Instant now = Instant.now();
        List<AuditEvent.Draft> history = new ArrayList<>();
        // the analysis is attributed to who ran it and when, as the record says; older records lack it
        var prov = study.provenance();
        Instant analysedAt = now;
        if (prov.analysedAt() != null) {
            try {
                analysedAt = Instant.parse(prov.analysedAt());
            } catch (java.time.format.DateTimeParseException e) {
                throw new ArchiveException(ArchiveException.Reason.REJECTED, studyFile + ": the analysis time \""
                        + prov.analysedAt() + "\" is not an ISO-8601 instant such as 2026-12-03T14:05:00Z");
            }
        }
        history.add(new AuditEvent.Draft(AuditEvent.Kind.ANALYSED, prov.analyst() != null ? prov.analyst() : actor,
                analysedAt, "analysed " + names.size() + " characteristic(s) with holdpoint " + Version.get() + ": "
                        + result.summary(), prov.analyst() != null ? "recorded in the study" : "archiving"));
        for (Exclusion e : study.settings().exclusions()) {
            history.add(new AuditEvent.Draft(AuditEvent.Kind.EXCLUSION_ADDED, actor, now, "excluded the value at "
                    + e.reference() + (e.characteristic() == null ? "" : " of " + e.characteristic()), e.reason()));
        }
        var version = org.holdpoint.study.NewStudyVersion.of(change.id(), change.title(), change.kind().words(),
                change.partNumber(), change.revision(), names, result.changeVerified() ? "verified" : "not verified",
                actor, now, json).withHistory(history)
                .withDocumentSigners(study.signatures().stream().map(org.holdpoint.study.Signature::name).toList());
        var current = archive.currentVersion(change.id());
        if (current.isPresent()) {
            if (reason == null || reason.isBlank()) {
                throw new ArchiveException(ArchiveException.Reason.REJECTED, "change " + change.id()
                        + " is already archived (version " + current.get().version() + "); a correction needs "
                        + "--reason saying why it supersedes that version");
            }
            return archive.supersede(current.get().id(), version, actor, reason);
        }
        return archive.add(version, actor, reason == null || reason.isBlank() ? "archived" : reason);
    }

    private String lastRecordSha256;

    /** @return the record SHA-256 of the study last added (the hash the workbook and the study file show) */
    public String lastRecordSha256() {
        return lastRecordSha256;
    }

    /**
     * The archive keeps a signature's stage as the start of its meaning ("reviewed: method and data checked").
     *
     * @param stage   the stage
     * @param meaning the meaning, or null
     * @return the archived meaning
     */
    public static String stageMeaning(org.holdpoint.study.Signature.Stage stage, String meaning) {
        return stage.words() + ": " + (meaning == null || meaning.isBlank() ? stage.words() : meaning.strip());
    }

    /**
     * The sign-off entry of an archived signature: its stage read from the start of its meaning (an entry
     * without one, from before stages were kept, counts as approved: the archive's sign was for approval).
     *
     * @param s the archived signature
     * @return the entry
     */
    static org.holdpoint.study.Signature entry(org.holdpoint.study.ArchivedSignature s, String recordSha) {
        for (org.holdpoint.study.Signature.Stage st : org.holdpoint.study.Signature.Stage.values()) {
            String prefix = st.words() + ": ";
            if (s.meaning().startsWith(prefix)) {
                return new org.holdpoint.study.Signature(st, s.signer(), s.role(), s.meaning().substring(prefix
                        .length()), s.signedAt().toString(), recordSha);
            }
        }
        return new org.holdpoint.study.Signature(org.holdpoint.study.Signature.Stage.APPROVED, s.signer(), s.role(),
                s.meaning(), s.signedAt().toString(), recordSha);
    }

    /**
     * @param query the filters
     * @return matching versions, newest first
     * @throws ArchiveException on a database failure
     */
    public List<StudyVersion> list(ArchiveQuery query) throws ArchiveException {
        return archive.list(query);
    }

    /**
     * @param id the version id
     * @return the version with its JSON and audit events
     * @throws ArchiveException when it does not exist
     */
    public Shown show(long id) throws ArchiveException {
        ArchivedStudy s = archive.show(id).orElseThrow(() -> new ArchiveException(ArchiveException.Reason.NOT_FOUND,
                "no archived study has id " + id + "; run 'holdpoint archive list' to see the ids"));
        return new Shown(s, archive.events(id));
    }

    /** A version as shown: metadata, JSON and its events. */
    public record Shown(ArchivedStudy study, List<AuditEvent> events) {
        /** Copies the list. */
        public Shown {
            events = List.copyOf(events);
        }

        /** @return the study re-read from its stored JSON */
        public ChangeStudy changeStudy() {
            return StudyFiles.parse(study.json(), "archived study " + study.version().id());
        }
    }

    /**
     * Writes the sign-off workbook of an archived record, re-computed from its stored raw data (the
     * sign-off block shows the archive's signatures of the record).
     *
     * @param id        the record's id
     * @param target    the workbook
     * @param overwrite whether an existing file may be replaced
     * @return what was written
     * @throws ArchiveException when the record does not exist
     * @throws java.io.IOException when the file cannot be written
     */
    public ReportUseCase.Written export(long id, Path target, boolean overwrite) throws ArchiveException,
            java.io.IOException {
        Shown shown = show(id);
        ChangeStudy stored = shown.changeStudy();
        // the workbook shows the study's sign-off entries and the archive's signatures of this record
        List<org.holdpoint.study.Signature> sigs = new ArrayList<>(stored.signatures());
        StudyResult storedResult = new StudyAnalyzer().analyze(stored.data(), stored.settings(), Progress.NONE);
        String recordSha = StudyFiles.recordSha256(StudyFiles.tree(shown.study().json()));
        for (org.holdpoint.study.ArchivedSignature a : shown.study().version().signatures()) {
            sigs.add(entry(a, recordSha));
        }
        ChangeStudy study = new ChangeStudy(stored.change(), stored.data(), stored.settings(), sigs,
                stored.provenance());
        StudyResult result = storedResult;
        ReportOptions options = ReportOptions.withDefaults().withCharts(new StudyChartSource())
                .withExisting(overwrite ? ReportOptions.ExistingFile.REPLACE : ReportOptions.ExistingFile.REFUSE);
        return new ReportUseCase().write(study, result, options, target);
    }

    /**
     * Adds a signature to the current version of a study.
     *
     * @param id      the version id
     * @param signer  printed name
     * @param role    role
     * @param meaning meaning of the signature
     * @return the signature stored
     * @throws ArchiveException when the archive refuses it
     */
    public org.holdpoint.study.ArchivedSignature sign(long id, String signer, String role, String meaning)
            throws ArchiveException {
        return archive.sign(id, signer, role, meaning, Instant.now());
    }

    /**
     * Checks the whole chain and every record it covers.
     *
     * @return the report
     * @throws ArchiveException on a database failure
     */
    public org.holdpoint.study.VerificationReport verify() throws ArchiveException {
        return archive.verify();
    }
}
