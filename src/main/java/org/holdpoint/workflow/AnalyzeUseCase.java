package org.holdpoint.workflow;

import java.io.IOException;
import java.nio.file.Path;
import java.util.Map;
import org.holdpoint.importer.DataImporter;
import org.holdpoint.importer.ImportRequest;
import org.holdpoint.importer.SettingsReader;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.Progress;
import org.holdpoint.study.StudyResult;

/**
 * Import, then analyse: the use case behind {@code holdpoint analyze} and the window's analysis.
 * Runs on the caller's thread (a worker thread in the window).
 */
public final class AnalyzeUseCase {
    private final StudyAnalyzer analyzer = new StudyAnalyzer();

    /**
     * Reads the data and the settings, and analyses every characteristic.
     *
     * @param request      what to import
     * @param settingsFile an explicit settings file, or null to look beside the data file
     * @param settings     study-wide settings and command-line overrides
     * @param progress     progress and cancel port
     * @return the outcome
     * @throws org.holdpoint.importer.ImportException when the input cannot be read
     * @throws AnalysisException                      when a characteristic cannot be analysed
     */
    public AnalysisOutcome run(ImportRequest request, Path settingsFile, AnalysisSettings settings,
            Progress progress) {
        progress.step("reading the data", 0);
        Dataset data = new DataImporter().read(request);
        progress.checkCancelled();
        Path found = settingsFile;
        if (found == null && request.file() != null) {
            found = SettingsReader.findBeside(request.file()).orElse(null);
        }
        AnalysisSettings merged = settings;
        if (found != null) {
            Map<String, CharacteristicSettings> per = new SettingsReader().read(found);
            merged = new AnalysisSettings(settings.alpha(), settings.equalVariances(), settings.holm(),
                    settings.defaults(), per, settings.overrides(), settings.exclusions());
        }
        StudyResult result = analyzer.analyze(data, merged, progress);
        progress.step("done", 1);
        return new AnalysisOutcome(data, merged, result, found);
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
