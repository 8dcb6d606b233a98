package org.holdpoint.ui.model;

import java.nio.file.Path;
import java.time.Clock;
import java.util.List;
import java.util.Map;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.ChangeDescription;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.Exclusion;
import org.holdpoint.result.StudyResult;
import org.holdpoint.workflow.DataSources;
import org.holdpoint.workflow.StudyService;

/**
 * The presentation model of the whole window: the six steps' models and the archive view, the data and results, whether
 * there is unsaved work, and the use cases started from the window (each run through the
 * {@link TaskRunner}, never on the event thread). Knows no Swing component; views listen to its
 * bound properties. Every method is called on the event thread, and every listener runs there.
 */
public final class StudySession {
    /** The bound properties of the session. */
    public enum Property {
        /** New data were imported or opened. */
        DATA,
        /** Whether there is unsaved work. */
        DIRTY,
        /** The study file the work was last saved to or opened from. */
        STUDY_FILE,
        /** A problem to tell the user (a {@link UserMessage}). */
        PROBLEM,
        /** A one-line status of the last action. */
        STATUS,
        /** A step the window should show (a {@link Step}). */
        STEP,
        /** A task started or ended. */
        BUSY
    }

    /** The study-wide settings, taken on the event thread for a worker. */
    private record Study(double alpha, boolean equalVariances, boolean holm,
            org.holdpoint.study.StabilityOptions stability) {
    }

    private Study wide() {
        double alpha = criteria.alphaProblem() == null ? Double.parseDouble(criteria.alpha()) : 0.05;
        return new Study(alpha, equalVariances, holm, stability);
    }

    /** What the import job hands back to the event thread. */
    private record Loaded(DataSources sources, StudyService.Imported imported, PreviewGrid preview,
            StudyResult result, UserMessage analysisProblem, org.holdpoint.study.Provenance provenance) {
    }

    private final Bound<Property> bound = new Bound<>(this, Property.class);
    private final StudyService service;
    private final TaskRunner runner;
    private final RecentFiles recent;
    private final ChangeForm change = new ChangeForm();
    private final DataForm dataForm = new DataForm();
    private final CriteriaTable criteria = new CriteriaTable();
    private final ResultsTable results = new ResultsTable();
    private final SignOffForm signOff;
    private final PlanForm plan;
    private final ArchiveBrowser archive;
    private Dataset data;
    private PreviewGrid preview = PreviewGrid.EMPTY;
    private Path criteriaFile;
    private boolean equalVariances;
    private boolean holm;
    private org.holdpoint.study.StabilityOptions stability = org.holdpoint.study.StabilityOptions.DEFAULT;
    /** The method generation of the opened study (an older record is re-analysed as it was), else the current. */
    private int methods = AnalysisSettings.METHODS;
    private List<Exclusion> exclusions = List.of();
    private boolean dirty;
    private Path studyFile;
    /** Who ran the analysis on screen and when; kept from a study file opened, renewed by each analysis. */
    private org.holdpoint.study.Provenance provenance = org.holdpoint.study.Provenance.NONE;
    private final Clock clock;

    /**
     * @param service the window's use cases
     * @param runner  runs them off the event thread
     * @param recent  recent files and last folder
     * @param clock   stamps signatures
     */
    public StudySession(StudyService service, TaskRunner runner, RecentFiles recent, Clock clock) {
        this.service = service;
        this.runner = runner;
        this.recent = recent;
        this.clock = clock;
        this.signOff = new SignOffForm(clock);
        this.plan = new PlanForm(this);
        this.archive = new ArchiveBrowser(this, service);
        Runnable edited = () -> setDirty(true);
        // the change description is part of the record: a signature made before an edit no longer applies
        change.onEdit(() -> {
            setDirty(true);
            signOff.setCurrentRecord(null);
        });
        criteria.onEdit(() -> {
            setDirty(true);
            stale("the criteria changed after the analysis");
        });
        signOff.onEdit(edited);
    }

    /** @return the Change step */
    public ChangeForm change() {
        return change;
    }

    /** @return the Data step's file choice */
    public DataForm dataForm() {
        return dataForm;
    }

    /** @return the Criteria step */
    public CriteriaTable criteria() {
        return criteria;
    }

    /** @return the Results step */
    public ResultsTable results() {
        return results;
    }

    /** @return the Sign-off step */
    public SignOffForm signOff() {
        return signOff;
    }

    /** @return the Plan step */
    public PlanForm plan() {
        return plan;
    }

    /** @return the archive view (search, read-only opening, verification, saving) */
    public ArchiveBrowser archive() {
        return archive;
    }

    /** @return the recent files */
    public RecentFiles recent() {
        return recent;
    }

    /** @return the imported data, or null */
    public Dataset data() {
        return data;
    }

    /**
     * What the last import chose for the layout, header row and columns (detected or as named), in the
     * words of the import report, so the user can see it beside the mapping fields.
     *
     * @return the lines, empty before an import
     */
    public List<String> detectedLayout() {
        if (data == null) {
            return List.of();
        }
        return data.report().messages().stream().filter(m -> m.contains(": layout ") || m.contains(": header in row ")
                || m.contains("holds the units of measure") || m.contains("columns not read as characteristics")
                || m.startsWith("PAIRING HINT") || m.contains("reported as not assessable")).toList();
    }

    /** @return the preview of the imported data */
    public PreviewGrid preview() {
        return preview;
    }

    /** @return the criteria file read beside the data, or null */
    public Path criteriaFile() {
        return criteriaFile;
    }

    /**
     * @param name a characteristic's name
     * @return its data, or null
     */
    public CharacteristicData characteristic(String name) {
        if (data == null) {
            return null;
        }
        return data.characteristics().stream().filter(c -> c.name().equals(name)).findFirst().orElse(null);
    }

    /** @return whether there is work not saved to a study file */
    public boolean dirty() {
        return dirty;
    }

    /** @return the study file last saved or opened, or null */
    public Path studyFile() {
        return studyFile;
    }

    /** @return whether a task is running */
    public boolean busy() {
        return runner.busy();
    }

    /** @return whether equal variances are asserted (pooled tests decide) */
    public boolean equalVariances() {
        return equalVariances;
    }

    /** @param equal whether equal variances are asserted */
    public void setEqualVariances(boolean equal) {
        if (equal != equalVariances) {
            equalVariances = equal;
            setDirty(true);
            stale("the equal-variances setting changed after the analysis");
        }
    }

    /** @return whether difference p-values get a Holm adjustment */
    public boolean holm() {
        return holm;
    }

    /** @param h whether difference p-values get a Holm adjustment */
    public void setHolm(boolean h) {
        if (h != holm) {
            holm = h;
            setDirty(true);
            stale("the Holm setting changed after the analysis");
        }
    }

    /** @return the control charts' options: whether the rows are in run order, and the tests */
    public org.holdpoint.study.StabilityOptions stability() {
        return stability;
    }

    /** @param s the control charts' options */
    public void setStability(org.holdpoint.study.StabilityOptions s) {
        if (!s.equals(stability)) {
            stability = s;
            setDirty(true);
            stale("the control-chart settings changed after the analysis");
        }
    }

    /**
     * Opens the bundled demo study (an invented supplier change of a boring-bar insert) and analyses it.
     */
    public void openDemo() {
        Study wide = wide();
        start("Opening the demo study", p -> {
            DataSources s = service.extractDemo();
            return load(s, Map.of(), wide, p);
        }, l -> {
            apply(l);
            change.load(StudyService.DEMO_CHANGE);
            setDirty(false);
            status("Demo study opened: an invented example; change anything and analyse again.");
        });
    }

    /** Imports the files chosen on the Data step and analyses them; a failure leaves everything as it was. */
    public void importAndAnalyse() {
        DataSources sources;
        try {
            sources = dataForm.toSources();
        } catch (IllegalArgumentException e) {
            problem(new UserMessage("Choose the data", e.getMessage(), "Use Choose… or drop the file(s) on the window."));
            return;
        }
        Map<String, CharacteristicSettings> typed = typedCriteria();
        Study wide = wide();
        String shown = shownDataName();
        start("Importing " + sources.mainFile().getFileName(), p -> load(sources, typed, wide, p), l -> {
            apply(l);
            recent.add(sources.mainFile());
            setDirty(true);
        }, failed -> {
            // the window keeps the study it showed; say so, and which file that is
            UserMessage m = failed;
            problem(new UserMessage(m.title(), m.what(), m.whatToDo() + (shown == null
                    ? " Nothing was imported."
                    : " The data on screen are still those of " + shown + "; they were not changed.")));
        });
    }

    /** Analyses the current data with the criteria as typed. */
    public void analyse() {
        if (data == null) {
            problem(new UserMessage("No data yet", "There are no data to analyse.",
                    "Open the before and after data on the Data step."));
            return;
        }
        AnalysisSettings settings;
        try {
            settings = settings(criteria.toSettings());
        } catch (IllegalStateException | IllegalArgumentException e) {
            problem(new UserMessage("Criteria to correct", e.getMessage(),
                    "Correct the marked cells on the Criteria step (the reason is shown beside each), then analyse "
                            + "again."));
            step(Step.CRITERIA);
            return;
        }
        if (criteria.chosen().isEmpty()) {
            problem(new UserMessage("Nothing chosen", "Every characteristic is set to \"no\" in the Analyse column.",
                    "Choose at least one characteristic to analyse on the Criteria step."));
            step(Step.CRITERIA);
            return;
        }
        Dataset d = chosenData();
        ChangeDescription described = change.toDescription();
        List<org.holdpoint.study.Signature> signed = signOff.signatures();
        org.holdpoint.study.Provenance before = provenance;
        start("Analysing", p -> {
            StudyResult r = service.analyze(d, settings, p);
            if (!signed.isEmpty()) {
                // the signatures so far stay valid only when the record they signed is the record now: an analysis
                // that changes nothing keeps the record (and who ran it, and when) as it was
                String same = service.recordSha256(new ChangeStudy(described, d, settings, List.of(), before), r);
                if (signed.stream().anyMatch(g -> same.equals(g.record()))) {
                    return new Analysed(r, before, same);
                }
            }
            org.holdpoint.study.Provenance prov = ranNow();
            String record = signed.isEmpty() ? null : service.recordSha256(new ChangeStudy(described, d, settings,
                    List.of(), prov), r);
            return new Analysed(r, prov, record);
        }, a -> {
            provenance = a.provenance();
            results.show(a.result(), d);
            signOff.setCurrentRecord(a.record());
            setDirty(true);
            status("Analysed: " + results.counts() + "."
                    + (signOff.voidCount() > 0 ? " " + signOff.voidCount() + " signature(s) signed an earlier record "
                    + "and are void: see the Sign-off step." : ""));
            step(Step.RESULTS);
        });
    }

    /** What an analysis hands back: the results, who ran it and when, and the record's hash when needed. */
    private record Analysed(StudyResult result, org.holdpoint.study.Provenance provenance, String record) {
    }

    /** Who runs the analysis (the account's user name) and now, to the second, as the record keeps them. */
    private org.holdpoint.study.Provenance ranNow() {
        String who = System.getProperty("user.name", "");
        return new org.holdpoint.study.Provenance(who.isBlank() ? null : who.strip(),
                java.time.Instant.now(clock).truncatedTo(java.time.temporal.ChronoUnit.SECONDS).toString(), null);
    }

    private void stale(String because) {
        results.markStale(because);
    }

    /**
     * Why the results on screen may not be written, signed or archived now, or null when they may.
     *
     * @param action what the user wants to do, e.g. "write the sign-off workbook"
     * @return the message, or null
     */
    public UserMessage notCurrent(String action) {
        if (results.result() == null) {
            return new UserMessage("Not analysed yet", "There are no results to " + action + " yet.",
                    "Analyse the study first (F5).");
        }
        if (results.staleBecause() != null) {
            return new UserMessage("Results out of date", "The results on screen are out of date: "
                    + results.staleBecause() + ". They cannot be used to " + action + ".",
                    "Analyse again (F5), check the new results, then " + action + ".");
        }
        return null;
    }

    /**
     * Signs the record as it stands now: the signature is bound to the record's SHA-256, so that it is
     * void when the results, criteria, data or change description change afterwards.
     *
     * @param stage   the stage
     * @param name    printed name
     * @param role    role
     * @param meaning what the signature means
     */
    public void sign(org.holdpoint.study.Signature.Stage stage, String name, String role, String meaning) {
        String p = SignOffForm.problem(name, role, meaning);
        if (p != null) {
            problem(new UserMessage("Signature incomplete", p, "Fill in the field named, then add the signature."));
            return;
        }
        UserMessage m = notCurrent("sign the record");
        if (m != null) {
            problem(m);
            return;
        }
        ChangeStudy unsigned = unsignedStudy();
        StudyResult r = results.result();
        start("Signing", prog -> service.recordSha256(unsigned, r), hash -> {
            signOff.setCurrentRecord(hash);
            signOff.sign(stage, name, role, meaning, hash);
            status("Signed by " + name.trim() + " (" + stage.words() + "); the signature is bound to record "
                    + hash.substring(0, 12) + "….");
        });
    }

    /** The study as it would be written now, without its signatures (the record). */
    private ChangeStudy unsignedStudy() {
        ChangeStudy s = study();
        return new ChangeStudy(s.change(), s.data(), s.settings(), List.of(), s.provenance());
    }

    /**
     * Runs on a worker: the record's hash now; refuses when a signature signed another record.
     *
     * @param study  the study with its signatures
     * @param result its results
     * @return the record's SHA-256
     * @throws org.holdpoint.workflow.StudyProblem when a signature is void
     */
    String checkSignaturesOf(ChangeStudy study, StudyResult result) {
        return checkSignatures(study, result);
    }

    private String checkSignatures(ChangeStudy study, StudyResult result) {
        String hash = service.recordSha256(new ChangeStudy(study.change(), study.data(), study.settings(),
                List.of(), study.provenance()), result);
        long stale = study.signatures().stream().filter(x -> x.record() != null && !x.record().equals(hash)).count();
        if (stale > 0) {
            throw new org.holdpoint.workflow.StudyProblem(org.holdpoint.workflow.StudyProblem.Kind.RECORD_CHANGED,
                    null, "%d signature(s) signed an earlier version of this record (its results, criteria, data or "
                    + "change description have changed since), so they would not be true of what is written now", stale);
        }
        return hash;
    }

    /**
     * Leaves one value out of the analysis, with the reason the record keeps, then analyses again.
     *
     * @param characteristic the characteristic the value belongs to
     * @param cell           its cell, e.g. {@code D12} or {@code Data!D12}
     * @param reason         why it is left out (required)
     * @return null when accepted, else why not in plain words
     */
    public String exclude(String characteristic, String cell, String reason) {
        CharacteristicData c = characteristic(characteristic);
        if (c == null) {
            return "Choose a characteristic of the current data.";
        }
        Exclusion.Target t;
        try {
            t = Exclusion.target(cell == null ? "" : cell);
        } catch (IllegalArgumentException e) {
            return "Give the cell of the value as a column letter and row number, e.g. D12 (after:D12 when both "
                    + "files have that cell).";
        }
        Exclusion probe = new Exclusion(characteristic, t.group(), t.cell(), "probe");
        boolean inBefore = holds(c.before(), probe, true);
        boolean inAfter = holds(c.after(), probe, false);
        if (!inBefore && !inAfter) {
            return "Cell " + probe.reference() + " holds no value of \"" + characteristic
                    + "\"; see the Data step for the cells read.";
        }
        if (inBefore && inAfter) {
            return "Cell " + t.cell() + " is in both files: write before:" + t.cell() + " or after:" + t.cell() + ".";
        }
        if (reason == null || reason.isBlank()) {
            return "Say why the value is left out; the record keeps the reason.";
        }
        List<Exclusion> l = new java.util.ArrayList<>(exclusions);
        l.add(new Exclusion(characteristic, t.group(), t.cell(), reason.trim()));
        exclusions = List.copyOf(l);
        setDirty(true);
        stale("a value was excluded after the analysis");
        analyse();
        return null;
    }

    /** @return the values left out so far, each with its reason */
    public List<Exclusion> exclusions() {
        return exclusions;
    }

    /** Takes every exclusion back and analyses again. */
    public void clearExclusions() {
        if (!exclusions.isEmpty()) {
            exclusions = List.of();
            setDirty(true);
            stale("the exclusions were taken back after the analysis");
            analyse();
        }
    }

    private static boolean holds(org.holdpoint.study.GroupData g, Exclusion e, boolean before) {
        for (int i = 0; i < g.size(); i++) {
            if (e.matches(g.origin(i), before)) {
                return true;
            }
        }
        return false;
    }

    /**
     * Saves the study (change, data, criteria, signatures, results) to a study file.
     *
     * @param target the file
     * @param then   run on the event thread after a successful save (e.g. close the window), or null
     */
    public void save(Path target, Runnable then) {
        ChangeStudy study;
        try {
            study = study();
        } catch (IllegalStateException | IllegalArgumentException e) {
            problem(new UserMessage("Cannot save yet", e.getMessage(), data == null
                    ? "Open data and set the criteria first." : "Correct what is named, then save again."));
            return;
        }
        // a study file never holds results that do not belong to its criteria: out-of-date results are left
        // out (the file keeps the criteria; opening it analyses again)
        StudyResult r = results.staleBecause() == null ? results.result() : null;
        start("Saving " + target.getFileName(), p -> {
            if (r != null) {
                checkSignatures(study, r);
            }
            service.save(study, r, target);
            return target;
        }, t -> {
            Path old = studyFile;
            studyFile = t;
            bound.fire(Property.STUDY_FILE, old, t);
            recent.add(t);
            setDirty(false);
            status("Saved " + t.getFileName() + ".");
            if (then != null) {
                then.run();
            }
        });
    }

    /**
     * Writes the sign-off workbook of the analysed study (charts, results, raw data, record and hash).
     *
     * @param target the .xlsx file
     */
    public void writeWorkbook(Path target) {
        StudyResult r = results.result();
        ChangeStudy study;
        try {
            study = study();
        } catch (IllegalStateException | IllegalArgumentException e) {
            problem(new UserMessage("Cannot write yet", e.getMessage(), data == null
                    ? "Open data and analyse them first." : "Correct what is named, then write again."));
            return;
        }
        UserMessage m = notCurrent("write the sign-off workbook");
        if (m != null) {
            problem(m);
            return;
        }
        start("Writing " + target.getFileName(), p -> {
            String hash = checkSignatures(study, r);
            service.writeWorkbook(study, r, target, p);
            return java.util.Map.entry(target, hash);
        }, written -> {
            Path t = written.getKey();
            signOff.setCurrentRecord(written.getValue());
            recent.setLastFolder(t.toAbsolutePath().getParent());
            lastWorkbook = t;
            status("Wrote the sign-off workbook " + t.getFileName() + ".");
        });
    }

    private Path lastWorkbook;

    /** @return the workbook last written in this session, or null */
    public Path lastWorkbook() {
        return lastWorkbook;
    }

    /**
     * Opens a saved study file and analyses it again from its stored raw data.
     *
     * @param file the study file
     */
    public void openStudy(Path file) {
        start("Opening " + file.getFileName(), p -> {
            ChangeStudy s = service.open(file);
            StudyResult r = null;
            UserMessage problem = null;
            String record = null;
            try {
                r = service.analyze(s.data(), s.settings(), p);
                record = service.recordSha256(new ChangeStudy(s.change(), s.data(), s.settings(), List.of(),
                        s.provenance()), r);
            } catch (org.holdpoint.workflow.StudyProblem e) {
                problem = UserMessage.of(e);
            }
            return new Object[] {s, r, problem, PreviewGrid.of(s.data(), PreviewGrid.LIMIT), record};
        }, o -> {
            ChangeStudy s = (ChangeStudy) o[0];
            change.load(s.change());
            Map<String, CharacteristicSettings> resolved = new java.util.LinkedHashMap<>();
            s.data().characteristics().forEach(c -> resolved.put(c.name(), s.settings().resolve(c.name())));
            showData(s.data(), (PreviewGrid) o[3], null);
            criteria.load(s.data().characteristics(), resolved, s.settings().alpha());
            equalVariances = s.settings().equalVariances();
            holm = s.settings().holm();
            stability = s.settings().stability();
            methods = s.settings().methods();
            exclusions = s.settings().exclusions();
            signOff.load(s.signatures());
            provenance = s.provenance();
            results.show((StudyResult) o[1], s.data());
            signOff.setCurrentRecord((String) o[4]);
            Path old = studyFile;
            studyFile = file;
            bound.fire(Property.STUDY_FILE, old, file);
            recent.add(file);
            setDirty(false);
            if (o[2] != null) {
                problem((UserMessage) o[2]);
            }
            status("Opened " + file.getFileName() + ".");
            step(Step.RESULTS);
        });
    }

    /**
     * The study as it would be saved now.
     *
     * @return the study
     * @throws IllegalStateException when there are no data or a criterion is not valid
     */
    public ChangeStudy study() {
        if (data == null) {
            throw new IllegalStateException("there are no data yet");
        }
        return new ChangeStudy(change.toDescription(), chosenData(), settings(criteria.toSettings()),
                signOff.signatures(), provenance);
    }

    /** The data of the characteristics chosen on the Criteria step (all of them while nothing is chosen). */
    private Dataset chosenData() {
        List<String> chosen = criteria.chosen();
        return chosen.isEmpty() || criteria.rowCount() == 0 ? data
                : StudyService.only(data, chosen, "set to \"no\" in the Analyse column of the Criteria step");
    }

    /**
     * @param property the property
     * @param listener told of changes, on the event thread
     */
    public void addListener(Property property, java.beans.PropertyChangeListener listener) {
        bound.addListener(property, listener);
    }

    /**
     * Tells the user about a problem (through the view listening to {@link Property#PROBLEM}).
     *
     * @param m the message
     */
    public void problem(UserMessage m) {
        lastProblem = m;
        bound.fire(Property.PROBLEM, null, m);
    }

    private UserMessage lastProblem;

    /** @return the last problem told, or null */
    public UserMessage lastProblem() {
        return lastProblem;
    }

    private String lastStatus = "";

    /** @return the last status line */
    public String lastStatus() {
        return lastStatus;
    }

    void status(String s) {
        String old = lastStatus;
        lastStatus = s;
        bound.fire(Property.STATUS, old, s);
    }

    private void step(Step s) {
        bound.fire(Property.STEP, null, s);
    }

    private void setDirty(boolean d) {
        boolean old = dirty;
        dirty = d;
        bound.fire(Property.DIRTY, old, d);
    }

    private AnalysisSettings settings(Map<String, CharacteristicSettings> per) {
        String ap = criteria.alphaProblem();
        if (ap != null) {
            throw new IllegalStateException(ap);
        }
        return new AnalysisSettings(Double.parseDouble(criteria.alpha()), equalVariances, holm, null, per, null,
                exclusions, methods, stability);
    }

    /**
     * The analysis settings as typed now.
     *
     * @return the settings
     * @throws IllegalStateException when a criterion is not valid
     */
    AnalysisSettings currentSettings() {
        return settings(criteria.toSettings());
    }

    private Map<String, CharacteristicSettings> typedCriteria() {
        Map<String, CharacteristicSettings> m = new java.util.LinkedHashMap<>();
        for (int r = 0; r < criteria.rowCount(); r++) {
            if (criteria.rowProblem(r) == null) {
                m.put(criteria.name(r), CriteriaRules.settings(rowOf(r)));
            }
        }
        return m;
    }

    private String[] rowOf(int r) {
        String[] a = new String[CriteriaColumn.values().length];
        for (CriteriaColumn c : CriteriaColumn.values()) {
            a[c.ordinal()] = criteria.get(r, c);
        }
        return a;
    }

    /** Runs on the worker thread: import, then analyse with typed criteria winning over the file's. */
    private Loaded load(DataSources sources, Map<String, CharacteristicSettings> typed, Study wide,
            org.holdpoint.study.Progress p) {
        StudyService.Imported imported = service.importData(sources, p);
        Map<String, CharacteristicSettings> per = new java.util.LinkedHashMap<>(imported.criteria());
        per.putAll(typed);
        StudyResult r = null;
        UserMessage problem = null;
        Dataset chosenData = imported.data();
        if (imported.criteria().keySet().stream().anyMatch(k -> !"*".equals(k)) && typed.isEmpty()) {
            // a criteria file beside the data lists characteristics: only those are analysed at first
            chosenData = StudyService.only(chosenData, imported.criteria().keySet(), "not in the criteria file");
        }
        try {
            r = service.analyze(chosenData, new AnalysisSettings(wide.alpha(), wide.equalVariances(),
                    wide.holm(), null, per, null, List.of()).withStability(wide.stability()), p);
        } catch (org.holdpoint.workflow.StudyProblem e) {
            problem = UserMessage.of(e);
        }
        return new Loaded(sources, imported, PreviewGrid.of(imported.data(), PreviewGrid.LIMIT), r, problem,
                ranNow());
    }

    private void apply(Loaded l) {
        methods = AnalysisSettings.METHODS;
        dataForm.show(l.sources());
        criteriaFile = l.imported().criteriaFile();
        exclusions = List.of();
        showData(l.imported().data(), l.preview(), l.imported().criteria());
        provenance = l.provenance();
        results.show(l.result(), l.imported().data());
        // new data make a new record: signatures of the study on screen before no longer apply
        signOff.setCurrentRecord(null);
        if (l.analysisProblem() != null) {
            problem(l.analysisProblem());
            step(Step.CRITERIA);
        } else {
            status("Imported and analysed: " + results.counts() + ".");
            step(Step.RESULTS);
        }
    }

    private void showData(Dataset d, PreviewGrid grid, Map<String, CharacteristicSettings> found) {
        data = d;
        preview = grid;
        if (found != null) {
            criteria.showData(d.characteristics(), found);
        }
        bound.fireChanged(Property.DATA);
    }

    /** @return the file name of the data shown (the before file, then the after file), or null */
    public String shownDataName() {
        if (data == null || data.inputs().isEmpty()) {
            return null;
        }
        return String.join(" and ", data.inputs().stream().map(i -> java.nio.file.Path.of(i.file()).getFileName()
                .toString()).distinct().toList());
    }

    <T> void start(String title, TaskRunner.Job<T> job, java.util.function.Consumer<T> onDone) {
        start(title, job, onDone, this::problem);
    }

    <T> void start(String title, TaskRunner.Job<T> job, java.util.function.Consumer<T> onDone,
            java.util.function.Consumer<UserMessage> onFailed) {
        if (runner.busy()) {
            problem(new UserMessage("Please wait", "Another task is still running.",
                    "Wait for it to finish, or press Cancel."));
            return;
        }
        bound.fire(Property.BUSY, false, true);
        runner.run(title, job, o -> {
            bound.fire(Property.BUSY, true, false);
            switch (o.status()) {
                case COMPLETED -> onDone.accept(o.value());
                case CANCELLED -> status(title + ": cancelled; nothing was changed.");
                case FAILED -> onFailed.accept(o.problem());
            }
        });
    }
}
