package org.holdpoint.workflow;

import org.holdpoint.files.AtomicFiles;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.holdpoint.importer.ColumnChoice;
import org.holdpoint.importer.DataImporter;
import org.holdpoint.importer.ImportException;
import org.holdpoint.importer.ImportRequest;
import org.holdpoint.importer.SettingsReader;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.Progress;
import org.holdpoint.result.StudyResult;

/**
 * Import, then analyse: the use case behind {@code holdpoint analyze} and the window's analysis.
 * Runs on the caller's thread (a worker thread in the window).
 */
public final class AnalyzeUseCase {
    private final StudyAnalyzer analyzer = new StudyAnalyzer();

    /**
     * Reads the data and the settings, and analyses every characteristic.
     *
     * @param options      what to import
     * @param settingsFile an explicit settings file, or null to look beside the data file
     * @param settings     study-wide settings and command-line overrides
     * @param progress     progress and cancel port
     * @return the outcome
     * @throws AnalysisException when the input cannot be read or a characteristic cannot be analysed
     */
    public AnalysisOutcome run(ImportOptions options, Path settingsFile, AnalysisSettings settings,
            Progress progress) {
        return run(options.toRequest(), settingsFile, settings, progress);
    }

    /**
     * The settings file that is read for a data file when none is named (NAME.settings.csv or .json
     * beside it), so that callers can protect it like any other input.
     *
     * @param dataFile the data file
     * @return the settings file, or null when there is none
     */
    public static Path settingsBeside(Path dataFile) {
        return SettingsReader.findBeside(dataFile).orElse(null);
    }

    /**
     * Reads the data and the criteria without analysing (for planning from data).
     *
     * @param options      what to import
     * @param settingsFile an explicit settings file, or null to look beside the data file
     * @param settings     study-wide settings
     * @return the data and merged settings; the result is null
     */
    public AnalysisOutcome importOnly(ImportOptions options, Path settingsFile, AnalysisSettings settings) {
        return read(options.toRequest(), settingsFile, settings, Progress.NONE, false);
    }

    /**
     * Reads the baseline that exists before a trial, for planning: one file whose rows are all before values
     * when it has no group column (or whose rows labelled before are the baseline), or the before file of two.
     *
     * @param options      what to import
     * @param settingsFile criteria file, or null to look beside the data
     * @param settings     the analysis settings the criteria are merged into
     * @return the data (after groups empty for a baseline-only file) and the merged criteria
     */
    public AnalysisOutcome importBaseline(ImportOptions options, Path settingsFile, AnalysisSettings settings) {
        return read(options.toRequest(), settingsFile, settings, Progress.NONE, true);
    }

    AnalysisOutcome run(ImportRequest request, Path settingsFile, AnalysisSettings settings, Progress progress) {
        AnalysisOutcome read = read(request, settingsFile, settings, progress, false);
        List<String> bad = Exclusions.problems(read.data(), read.settings().exclusions());
        if (!bad.isEmpty()) {
            throw new AnalysisException(bad);
        }
        StudyResult result = analyzer.analyze(read.data(), read.settings(), progress);
        progress.step("done", 1);
        return new AnalysisOutcome(read.data(), read.settings(), result, read.settingsFile());
    }

    private AnalysisOutcome read(ImportRequest request, Path settingsFile, AnalysisSettings settings,
            Progress progress, boolean baseline) {
        Path main = request.file() != null ? request.file() : request.beforeFile();
        Path found = settingsFile;
        if (found == null && main != null) {
            found = SettingsReader.findBeside(main).orElse(null);
        }
        AnalysisSettings merged = settings;
        ImportRequest effective = request;
        if (found != null) {
            Map<String, CharacteristicSettings> per;
            try {
                per = new java.util.LinkedHashMap<>(new SettingsReader().read(found));
            } catch (ImportException e) {
                throw new AnalysisException(List.of(e.getMessage()));
            }
            CharacteristicSettings fileDefaults = per.remove(SettingsReader.DEFAULTS);
            CharacteristicSettings defaults = settings.defaults().overriddenBy(fileDefaults);
            merged = settings.withCriteria(defaults, per, settings.overrides());
            if (!per.isEmpty() && request.choice().only().isEmpty()) {
                // the criteria list the characteristics: only those are analysed, and a row that matches no
                // column is refused (with the closest names) instead of leaving a characteristic unjudged
                effective = effective.withChoice(new ColumnChoice(List.copyOf(per.keySet()),
                        request.choice().ignore(), "the settings file " + found));
            }
            boolean pairedWanted = Boolean.TRUE.equals(defaults.paired())
                    || per.values().stream().anyMatch(c -> Boolean.TRUE.equals(c.paired()));
            if (pairedWanted && !request.paired()) {
                // the criteria say the same units were measured twice: match them by unit id when reading
                effective = effective.withPaired(true);
            }
        }
        progress.step("reading the data", 0);
        Dataset data;
        try {
            // once the cells of a large file are read, the layout takes one core: the analysis' one-time costs are
            // paid on the other
            DataImporter importer = new DataImporter(AnalysisWarmUp::startFor);
            data = baseline && effective.file() != null ? importer.readBaseline(effective) : importer.read(effective);
        } catch (ImportException e) {
            throw new AnalysisException(List.of(e.getMessage()));
        }
        progress.checkCancelled();
        return new AnalysisOutcome(data, merged, null, found);
    }

    /**
     * Writes the JSON contract atomically.
     *
     * @param outcome the analysis
     * @param target  the file
     * @throws IOException when it cannot be written
     */
    public static void writeJson(AnalysisOutcome outcome, Path target) throws IOException {
        AtomicFiles.writeText(target, ResultJson.text(ResultJson.of(outcome.data(), outcome.settings(),
                outcome.result())));
    }
}
