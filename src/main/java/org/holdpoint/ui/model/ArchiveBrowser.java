package org.holdpoint.ui.model;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeParseException;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import org.holdpoint.study.ArchiveException;
import org.holdpoint.study.ArchiveQuery;
import org.holdpoint.study.AuditEvent;
import org.holdpoint.study.ChangeRecordArchive;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.result.StudyResult;
import org.holdpoint.study.StudyVersion;
import org.holdpoint.study.VerificationReport;
import org.holdpoint.workflow.ArchiveUseCase;
import org.holdpoint.workflow.StudyFiles;
import org.holdpoint.workflow.StudyProblem;
import org.holdpoint.workflow.StudyService;

/**
 * The archive view: search the change-record archive with the same filters as {@code holdpoint archive
 * list}, open a version read-only (re-analysed from its stored raw data), verify the whole chain, and
 * save the current study as a new version. Every archive access runs through the session's task
 * runner and opens and closes the archive itself. Lives on the event thread.
 */
public final class ArchiveBrowser {
    /** The search filters and the archive's address. */
    public enum Field {
        /** The archive's database address; blank for the archive on this computer (or the settings file's). */
        URL("Archive address"),
        /** The part number. */
        PART("Part number"),
        /** A characteristic the study contains. */
        CHARACTERISTIC("Characteristic"),
        /** The kind of change in words; blank for any. */
        KIND("Kind of change"),
        /** The verdict in words; blank for any. */
        VERDICT("Verdict"),
        /** Earliest creation date, inclusive (yyyy-mm-dd, UTC). */
        FROM("Created from"),
        /** Latest creation date, inclusive (yyyy-mm-dd, UTC). */
        TO("Created to"),
        /** A name that signed the version. */
        SIGNER("Signed by");

        private final String label;

        Field(String label) {
            this.label = label;
        }

        /** @return the field's label */
        public String label() {
            return label;
        }
    }

    /** The columns of the list of versions. */
    public enum Column {
        /** Archive id. */
        ID("Id"),
        /** Change id and version. */
        CHANGE("Change (version)"),
        /** Part number and revision. */
        PART("Part"),
        /** Title. */
        TITLE("Title"),
        /** Kind of change. */
        KIND("Kind"),
        /** Verdict. */
        VERDICT("Verdict"),
        /** Signers. */
        SIGNED("Signed by"),
        /** When it was archived. */
        ARCHIVED("Archived (UTC)"),
        /** Current or superseded. */
        STATE("State");

        private final String label;

        Column(String label) {
            this.label = label;
        }

        /** @return the column heading */
        public String label() {
            return label;
        }
    }

    /** The bound properties. */
    public enum Property {
        /** A filter changed (its problem may have changed). */
        FILTERS,
        /** A new list of versions. */
        ROWS,
        /** A version was opened (or closed). */
        OPENED,
        /** A verification finished. */
        VERIFIED
    }

    /**
     * An archived version opened read-only.
     *
     * @param version the version as listed
     * @param study   the study re-read from its stored JSON
     * @param events  its audit trail
     * @param result  the results re-computed from its raw data, or null when it cannot be analysed
     */
    public record Opened(StudyVersion version, ChangeStudy study, List<AuditEvent> events, StudyResult result) {
        /** Copies the list. */
        public Opened {
            events = List.copyOf(events);
        }
    }

    private static final DateTimeFormatter SHOWN = DateTimeFormatter.ofPattern("yyyy-MM-dd HH:mm")
            .withZone(ZoneOffset.UTC);
    private final Bound<Property> bound = new Bound<>(this, Property.class);
    private final StudySession session;
    private final StudyService service;
    private final Map<Field, String> values = new EnumMap<>(Field.class);
    private final ResultsTable openedResults = new ResultsTable();
    private ArchiveQuery.Versions versions = ArchiveQuery.Versions.ALL;
    private List<StudyVersion> rows = List.of();
    private Opened opened;
    private VerificationReport verified;

    ArchiveBrowser(StudySession session, StudyService service) {
        this.session = session;
        this.service = service;
        for (Field f : Field.values()) {
            values.put(f, "");
        }
    }

    /**
     * @param f the field
     * @return its text
     */
    public String get(Field f) {
        return values.get(f);
    }

    /**
     * @param f    the field
     * @param text its new text
     */
    public void set(Field f, String text) {
        String t = text == null ? "" : text;
        if (!t.equals(values.get(f))) {
            values.put(f, t);
            bound.fireChanged(Property.FILTERS);
        }
    }

    /** @return all versions, or only current ones */
    public ArchiveQuery.Versions versions() {
        return versions;
    }

    /** @param v all versions, or only current ones */
    public void setVersions(ArchiveQuery.Versions v) {
        versions = v;
    }

    /**
     * Why a field's text cannot be used, or null when it can.
     *
     * @param f the field
     * @return the reason in plain words, or null
     */
    public String problem(Field f) {
        String t = values.get(f).trim();
        return switch (f) {
            case URL -> t.isEmpty() || t.startsWith("jdbc:") ? null
                    : "An archive address starts with jdbc:, e.g. jdbc:postgresql://host/holdpoint (ask the archive's "
                            + "administrator); leave it empty for the archive on this computer.";
            case FROM, TO -> dateProblem(f, t);
            default -> null;
        };
    }

    private String dateProblem(Field f, String t) {
        if (t.isEmpty()) {
            return null;
        }
        LocalDate d = date(t);
        if (d == null) {
            return "Enter a date as year-month-day, e.g. 2026-03-31.";
        }
        LocalDate from = f == Field.TO ? date(values.get(Field.FROM).trim()) : null;
        return from != null && d.isBefore(from) ? "The end date is before the start date." : null;
    }

    private static LocalDate date(String t) {
        try {
            return LocalDate.parse(t);
        } catch (DateTimeParseException e) {
            return null;
        }
    }

    /**
     * The query the filters give.
     *
     * @return the query
     * @throws IllegalStateException when a filter has a problem
     */
    public ArchiveQuery toQuery() {
        for (Field f : Field.values()) {
            if (problem(f) != null) {
                throw new IllegalStateException(f.label() + ": " + problem(f));
            }
        }
        LocalDate from = date(values.get(Field.FROM).trim());
        LocalDate to = date(values.get(Field.TO).trim());
        return ArchiveQuery.withDefaults().withPartNumber(values.get(Field.PART))
                .withCharacteristic(values.get(Field.CHARACTERISTIC)).withChangeKind(values.get(Field.KIND))
                .withVerdict(values.get(Field.VERDICT)).withSigner(values.get(Field.SIGNER))
                .withCreatedBetween(from == null ? null : from.atStartOfDay().toInstant(ZoneOffset.UTC),
                        to == null ? null : to.plusDays(1).atStartOfDay().toInstant(ZoneOffset.UTC))
                .withVersions(versions);
    }

    private String url() {
        String u = values.get(Field.URL).trim();
        return u.isEmpty() ? null : u;
    }

    /** Lists the versions that match the filters, newest first. */
    public void search() {
        ArchiveQuery q;
        try {
            q = toQuery();
        } catch (IllegalStateException e) {
            session.problem(new UserMessage("Filters to correct", e.getMessage(),
                    "Correct the marked filter (the reason is shown beside it), then search again."));
            return;
        }
        String url = url();
        session.start("Searching the archive", p -> {
            try (ChangeRecordArchive a = service.archives().open(url)) {
                return new ArchiveUseCase(a).list(q);
            }
        }, l -> {
            rows = List.copyOf(l);
            bound.fireChanged(Property.ROWS);
            session.status("Archive: " + rows.size() + " version(s) found.");
        });
    }

    /** @return the versions last found */
    public List<StudyVersion> rows() {
        return rows;
    }

    /**
     * @param row a row of {@link #rows}
     * @param col the column
     * @return the text shown
     */
    public String value(int row, Column col) {
        StudyVersion v = rows.get(row);
        return switch (col) {
            case ID -> Long.toString(v.id());
            case CHANGE -> v.changeId() + " (" + v.version() + ")";
            case PART -> v.partNumber() + (v.revision() == null || v.revision().isBlank() ? "" : " rev " + v.revision());
            case TITLE -> v.title();
            case KIND -> v.changeKind() == null ? "" : v.changeKind();
            case VERDICT -> v.verdict() == null ? "" : v.verdict();
            case SIGNED -> String.join(", ", v.signers());
            case ARCHIVED -> SHOWN.format(v.archivedAt());
            case STATE -> v.isCurrent() ? "current" : "superseded by " + v.supersededBy();
        };
    }

    /**
     * Opens a listed version read-only: its stored study, re-analysed from the raw data, and its audit trail.
     *
     * @param row a row of {@link #rows}
     */
    public void open(int row) {
        StudyVersion v = rows.get(row);
        String url = url();
        session.start("Opening archived version " + v.id(), p -> {
            ArchiveUseCase.Shown shown;
            try (ChangeRecordArchive a = service.archives().open(url)) {
                shown = new ArchiveUseCase(a).show(v.id());
            }
            ChangeStudy s = shown.changeStudy();
            StudyResult r;
            try {
                r = service.analyze(s.data(), s.settings(), p);
            } catch (StudyProblem e) {
                r = null;
            }
            return new Opened(shown.study().version(), s, shown.events(), r);
        }, o -> {
            opened = o;
            openedResults.show(o.result(), o.study().data());
            bound.fireChanged(Property.OPENED);
            session.status("Opened archived version " + o.version().id() + " read-only.");
        });
    }

    /** @return the version opened read-only, or null */
    public Opened opened() {
        return opened;
    }

    /** @return the results of the opened version, for a read-only results table */
    public ResultsTable openedResults() {
        return openedResults;
    }

    /**
     * The opened version as labelled lines: marked read-only, its header, signatures and audit trail.
     *
     * @return the lines; empty when nothing is opened
     */
    public List<String> openedLines() {
        List<String> l = new ArrayList<>();
        Opened o = opened;
        if (o == null) {
            return l;
        }
        StudyVersion v = o.version();
        l.add("READ-ONLY — archived version " + v.version() + " of " + v.changeId() + " (archive id " + v.id()
                + "); it cannot be changed here. A correction is a new version: open the study file, correct it, "
                + "and save it to the archive with a reason.");
        var c = o.study().change();
        l.add("Title: " + c.title());
        l.add("Part: " + c.partNumber() + (c.revision() == null || c.revision().isBlank() ? "" : " rev "
                + c.revision()) + "    Kind of change: " + c.kind().words());
        if (c.reason() != null && !c.reason().isBlank()) {
            l.add("Reason: " + c.reason());
        }
        l.add("Archived: " + SHOWN.format(v.archivedAt()) + " UTC by " + v.author() + "    Verdict stored: "
                + (v.verdict() == null ? "none" : v.verdict()) + "    Now: " + openedResults.overallWords());
        l.add("State: " + (v.isCurrent() ? "current version" : "superseded by archive id " + v.supersededBy())
                + (v.supersedes() == null ? "" : "; supersedes archive id " + v.supersedes()));
        l.add("SHA-256 of the stored study: " + v.jsonSha256());
        for (var s : v.signatures()) {
            l.add("Signed in the archive: " + s.signer() + ", " + s.role() + ", " + s.meaning());
        }
        for (var s : o.study().signatures()) {
            l.add("Signed in the study: " + s.stage().words() + " by " + s.name() + " (" + s.role() + "), "
                    + s.meaning() + ", " + s.timestamp());
        }
        int k = 0;
        for (AuditEvent e : o.events()) {
            // numbered within this record; the archive-wide position is kept for the verification report
            k++;
            l.add(k + ".  " + SHOWN.format(e.when()) + "  " + e.kind().name().toLowerCase(java.util.Locale.ROOT)
                    .replace('_', ' ') + " by " + e.who() + ": " + e.what() + (e.why() == null || e.why().isBlank()
                    ? "" : " (" + e.why() + ")") + "  [archive entry " + e.seq() + "]");
        }
        return l;
    }

    /** Checks the whole hash chain and every record it vouches for. */
    public void verify() {
        if (problem(Field.URL) != null) {
            session.problem(new UserMessage("Address to correct", problem(Field.URL), "Correct it, then verify again."));
            return;
        }
        String url = url();
        session.start("Verifying the archive", p -> {
            try (ChangeRecordArchive a = service.archives().open(url)) {
                return new ArchiveUseCase(a).verify();
            }
        }, r -> {
            verified = r;
            bound.fireChanged(Property.VERIFIED);
            session.status(r.intact() ? "Archive verified: intact." : "Archive verified: "
                    + r.problems().size() + " record(s) altered.");
        });
    }

    /** @return the last verification, or null */
    public VerificationReport verified() {
        return verified;
    }

    /**
     * The last verification in words: intact, or the altered records.
     *
     * @return the lines; empty before the first verification
     */
    public List<String> verifiedLines() {
        List<String> l = new ArrayList<>();
        VerificationReport r = verified;
        if (r == null) {
            return l;
        }
        if (r.intact()) {
            l.add("Intact: the hash chain is unbroken and every record matches it (" + r.studiesChecked()
                    + " studies, " + r.signaturesChecked() + " signatures, " + r.eventsChecked() + " events).");
            l.add("Last entry #" + r.headSeq() + ", hash " + r.headHash()
                    + " — note it outside the archive to detect a removed tail later.");
        } else {
            l.add("ALTERED: " + r.problems().size() + " record(s) do not match the hash chain:");
            r.problems().forEach(p -> l.add("  " + p));
        }
        return l;
    }

    /**
     * Why the current study cannot be saved to the archive, or null when it can.
     *
     * @param actor who archives it
     * @return the reason in plain words, or null
     */
    public String saveProblem(String actor) {
        if (session.data() == null) {
            return "There are no data yet; open the data first.";
        }
        var c = session.change().toDescription();
        if (c.partNumber() == null || c.partNumber().isBlank()) {
            return "Enter the part number on the Change step; the archive is searched by it.";
        }
        if (c.title() == null || c.title().isBlank()) {
            return "Enter a title on the Change step.";
        }
        if (actor == null || actor.isBlank()) {
            return "Enter who archives the study.";
        }
        return problem(Field.URL);
    }

    /**
     * Saves the current study to the archive as a new version (a correction of an archived change
     * supersedes its current version and needs a reason).
     *
     * @param actor  who archives it
     * @param reason why (required for a correction)
     */
    public void save(String actor, String reason) {
        String why = saveProblem(actor);
        ChangeStudy study;
        try {
            study = why == null ? session.study() : null;
        } catch (IllegalStateException | IllegalArgumentException e) {
            why = e.getMessage();
            study = null;
        }
        if (why != null) {
            session.problem(new UserMessage("Cannot archive yet", why, "Correct it, then save to the archive again."));
            return;
        }
        UserMessage notCurrent = session.notCurrent("save the study to the archive");
        if (notCurrent != null) {
            session.problem(notCurrent);
            return;
        }
        ChangeStudy s = study;
        StudyResult r = session.results().result();
        String url = url();
        String a = actor.trim();
        String because = reason == null ? "" : reason.trim();
        session.start("Saving to the archive", p -> {
            Path tmp = Files.createTempFile("holdpoint-archive-", ".study.json");
            try (ChangeRecordArchive ar = service.archives().open(url)) {
                session.checkSignaturesOf(s, r);
                StudyFiles.write(s, r, tmp);
                var current = ar.currentVersion(s.change().id());
                if (current.isPresent() && because.isEmpty()) {
                    throw new ArchiveException(ArchiveException.Reason.REJECTED, "Change " + s.change().id()
                            + " is already archived (version " + current.get().version() + "); saving it again "
                            + "makes a correction, which needs a reason saying why it supersedes that version.");
                }
                return new ArchiveUseCase(ar).add(tmp, a, because);
            } finally {
                Files.deleteIfExists(tmp);
            }
        }, v -> {
            session.status("Saved to the archive as version " + v.version() + " of " + v.changeId() + " (archive id "
                    + v.id() + ").");
            lastSaved = v;
            bound.fireChanged(Property.ROWS);
        });
    }

    private StudyVersion lastSaved;

    /** @return the version last saved from this window, or null */
    public StudyVersion lastSaved() {
        return lastSaved;
    }

    /**
     * @param property the property
     * @param listener told of changes, on the event thread
     */
    public void addListener(Property property, java.beans.PropertyChangeListener listener) {
        bound.addListener(property, listener);
    }
}
