package org.holdpoint.workflow;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.List;
import java.util.Map;
import org.holdpoint.importer.DataImporter;
import org.holdpoint.importer.ImportException;
import org.holdpoint.importer.SettingsReader;
import org.holdpoint.stats.StatsException;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.Progress;
import org.holdpoint.result.StudyResult;

/**
 * The use cases of the window, step by step (import, analyse, save, open), each run on the caller's
 * thread (a worker thread in the window) against the {@link Progress} port. Every failure the user
 * can act on arrives as a {@link StudyProblem}; a cancel arrives as {@link Progress.CancelledException}.
 */
public final class StudyService {
    /**
     * The invented change behind the bundled demo study, the same in the command line's demo and the window's:
     * a second-source boring-bar insert on a pump housing bore.
     */
    public static final org.holdpoint.study.ChangeDescription DEMO_CHANGE = new org.holdpoint.study.ChangeDescription(
            "CR-DEMO-0412", "Second-source boring-bar insert for the pump housing bore (demo)",
            org.holdpoint.study.ChangeKind.SUPPLIER, "PH-2210", "C",
            "second source for the carbide inserts of cell 4 (invented demo study)", "process engineering, cell 4",
            "2026-11-16", "2026-11-27");

    /** The name of the bundled demo study (files {@code NAME.csv} and {@code NAME.settings.csv}). */
    public static final String DEMO_STUDY = "boring-bar-insert";
    private final StudyAnalyzer analyzer = new StudyAnalyzer();
    private final ArchiveAccess archives;

    /**
     * @param archives how the window reaches the change-record archive (from the composition root)
     */
    public StudyService(ArchiveAccess archives) {
        this.archives = java.util.Objects.requireNonNull(archives, "archives");
    }

    /** @return how the window reaches the change-record archive */
    public ArchiveAccess archives() {
        return archives;
    }

    /**
     * What an import produced: the data, and the criteria found in a settings file beside the data.
     *
     * @param data         the imported data
     * @param criteria     criteria per characteristic name from the settings file (empty when none)
     * @param criteriaFile the settings file read, or null
     */
    public record Imported(Dataset data, Map<String, CharacteristicSettings> criteria, Path criteriaFile) {
        /** Copies the map. */
        public Imported {
            criteria = Map.copyOf(criteria);
        }
    }

    /**
     * Reads the data and, when present beside the data file, its criteria file.
     *
     * @param sources  the files
     * @param progress progress and cancel port
     * @return the import
     * @throws StudyProblem of kind {@link StudyProblem.Kind#BAD_INPUT} naming file, sheet and cell
     */
    public Imported importData(DataSources sources, Progress progress) {
        progress.step("reading " + sources.mainFile().getFileName(), -1);
        try {
            Dataset data = new DataImporter().read(sources.toRequest());
            progress.checkCancelled();
            Path found = sources.file() == null ? null : SettingsReader.findBeside(sources.file()).orElse(null);
            Map<String, CharacteristicSettings> criteria = found == null ? Map.of() : new SettingsReader().read(found);
            checkCriteriaNames(data, criteria, found);
            return new Imported(data, criteria, found);
        } catch (ImportException | StatsException e) {
            throw new StudyProblem(StudyProblem.Kind.BAD_INPUT, e, "%s", e.getMessage());
        } catch (java.io.UncheckedIOException e) {
            throw new StudyProblem(StudyProblem.Kind.BAD_INPUT, e, "%s cannot be read: %s", sources.mainFile(),
                    e.getCause().getMessage());
        }
    }

    /** A criteria row that names no characteristic of the data is refused, with the closest names. */
    private static void checkCriteriaNames(Dataset data, Map<String, CharacteristicSettings> criteria, Path file) {
        java.util.Set<String> keys = new java.util.HashSet<>();
        List<String> names = new java.util.ArrayList<>();
        for (org.holdpoint.study.CharacteristicData c : data.characteristics()) {
            keys.add(org.holdpoint.study.NameKeys.key(c.name()));
            names.add(c.name());
        }
        List<String> problems = new java.util.ArrayList<>();
        for (String n : criteria.keySet()) {
            if (!SettingsReader.DEFAULTS.equals(n) && !keys.contains(org.holdpoint.study.NameKeys.key(n))) {
                problems.add("the characteristic \"" + n + "\" matches no characteristic in the data"
                        + org.holdpoint.importer.Closest.describe(n, names));
            }
        }
        if (!problems.isEmpty()) {
            throw new ImportException("the criteria file %s: %s. Correct the name%s in the criteria file (case, spaces "
                    + "and a unit in brackets do not matter) or remove %s", file, String.join("; ", problems),
                    problems.size() == 1 ? "" : "s", problems.size() == 1 ? "it" : "them");
        }
    }

    /**
     * The data restricted to the chosen characteristics (matched by their comparison key); the others are
     * named in the import report as not analysed.
     *
     * @param data   the data
     * @param chosen the names to keep
     * @param why    why the others are left out, in words
     * @return the restricted data (the same object when nothing is left out)
     */
    public static Dataset only(Dataset data, java.util.Collection<String> chosen, String why) {
        java.util.Set<String> keys = new java.util.HashSet<>();
        chosen.forEach(n -> keys.add(org.holdpoint.study.NameKeys.key(n)));
        List<org.holdpoint.study.CharacteristicData> kept = new java.util.ArrayList<>();
        List<String> left = new java.util.ArrayList<>();
        for (org.holdpoint.study.CharacteristicData c : data.characteristics()) {
            if (keys.contains(org.holdpoint.study.NameKeys.key(c.name()))) {
                kept.add(c);
            } else {
                left.add("\"" + c.name() + "\"");
            }
        }
        if (left.isEmpty() || kept.isEmpty()) {
            return data;
        }
        var r = data.report();
        List<String> messages = new java.util.ArrayList<>(r.messages());
        messages.add("not analysed (" + why + "): " + String.join(", ", left));
        return new Dataset(kept, data.inputs(), new org.holdpoint.study.ImportReport(r.valuesUsed(), r.skipCounts(),
                r.firstSkipped(), messages, r.usedPerCharacteristic(), r.skippedPerCharacteristic()));
    }

    /**
     * Analyses every characteristic.
     *
     * @param data     the data
     * @param settings the criteria
     * @param progress progress and cancel port
     * @return the results
     * @throws StudyProblem of kind {@link StudyProblem.Kind#CANNOT_ANALYSE} listing the characteristics concerned
     */
    public StudyResult analyze(Dataset data, AnalysisSettings settings, Progress progress) {
        try {
            StudyResult result = analyzer.analyze(data, settings, progress);
            progress.step("done", 1);
            return result;
        } catch (AnalysisException e) {
            throw new StudyProblem(StudyProblem.Kind.CANNOT_ANALYSE, e, "%s", String.join("\n", e.problems()));
        } catch (StatsException e) {
            throw new StudyProblem(StudyProblem.Kind.CANNOT_ANALYSE, e, "%s", e.getMessage());
        }
    }

    /**
     * The SHA-256 of the study's record: the study without its signatures, with these results, in the
     * canonical form every output embeds (what a signature signs).
     *
     * @param unsigned the study (its signatures are ignored)
     * @param result   its results
     * @return the lower-case hex SHA-256
     */
    public String recordSha256(ChangeStudy unsigned, StudyResult result) {
        return StudyFiles.recordSha256(StudyFiles.toJson(unsigned, result));
    }

    /**
     * Saves the study file atomically.
     *
     * @param study  the study
     * @param result its results, or null
     * @param target the file
     * @throws StudyProblem of kind {@link StudyProblem.Kind#CANNOT_WRITE}
     */
    public void save(ChangeStudy study, StudyResult result, Path target) {
        try {
            StudyFiles.write(study, result, target);
        } catch (IOException e) {
            throw new StudyProblem(StudyProblem.Kind.CANNOT_WRITE, e, "%s could not be written (%s)", target,
                    e.getMessage());
        }
    }

    /**
     * Writes the sign-off workbook atomically: charts per characteristic (box plot, histograms, normal
     * probability plot) rendered to PNG, the canonical study record and its SHA-256 embedded.
     *
     * @param study    the study (with its signatures)
     * @param result   its analysis
     * @param target   the .xlsx file
     * @param progress progress and cancel port (checked between characteristics)
     * @throws StudyProblem of kind {@link StudyProblem.Kind#CANNOT_WRITE}
     */
    public void writeWorkbook(ChangeStudy study, StudyResult result, Path target, Progress progress) {
        progress.step("drawing the charts", 0);
        ReportOptions options = ReportOptions.withDefaults().withExisting(ReportOptions.ExistingFile.REPLACE)
                .withCharts(new StudyChartSource(progress));
        try {
            new ReportUseCase().write(study, result, options, target);
        } catch (IOException | SignoffException | org.holdpoint.report.ReportException
                | org.holdpoint.chart.ChartException e) {
            throw new StudyProblem(StudyProblem.Kind.CANNOT_WRITE, e, "%s could not be written (%s)", target,
                    e.getMessage());
        }
        progress.step("done", 1);
    }

    /**
     * Opens a saved study file.
     *
     * @param file the file
     * @return the study
     * @throws StudyProblem of kind {@link StudyProblem.Kind#CANNOT_READ_STUDY}
     */
    public ChangeStudy open(Path file) {
        try {
            return StudyFiles.read(file);
        } catch (StudyFileException e) {
            throw new StudyProblem(StudyProblem.Kind.CANNOT_READ_STUDY, e, "%s", e.getMessage());
        }
    }

    /**
     * Copies the bundled demo study (data and criteria) into a new temporary folder.
     *
     * @return the sources of the copied data file
     * @throws StudyProblem of kind {@link StudyProblem.Kind#CANNOT_WRITE} when the copy fails
     */
    public DataSources extractDemo() {
        try {
            Path dir = Files.createTempDirectory("holdpoint-demo");
            // the copies serve this session only: removed when the program ends (files first, then the folder)
            dir.toFile().deleteOnExit();
            Path data = copyResource(DEMO_STUDY + ".csv", dir);
            data.toFile().deleteOnExit();
            copyResource(DEMO_STUDY + ".settings.csv", dir).toFile().deleteOnExit();
            return DataSources.of(data);
        } catch (IOException e) {
            throw new StudyProblem(StudyProblem.Kind.CANNOT_WRITE, e,
                    "the demo study could not be copied to a temporary folder (%s)", e.getMessage());
        }
    }

    private static Path copyResource(String name, Path dir) throws IOException {
        try (InputStream in = StudyService.class.getResourceAsStream("/org/holdpoint/sample-data/" + name)) {
            if (in == null) {
                throw new IOException("the bundled sample file " + name + " is missing from this build");
            }
            Path target = dir.resolve(name);
            Files.copy(in, target, StandardCopyOption.REPLACE_EXISTING);
            return target;
        }
    }
}
