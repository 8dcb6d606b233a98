package org.holdpoint.workflow;

import java.nio.file.Path;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.Dataset;
import org.holdpoint.result.StudyResult;

/**
 * What one analysis produced: the data as imported, the settings in force and the results.
 *
 * @param data         the imported data
 * @param settings     the settings used (with the settings file merged in)
 * @param result       the results
 * @param settingsFile the per-characteristic settings file read, or null
 */
public record AnalysisOutcome(Dataset data, AnalysisSettings settings, StudyResult result, Path settingsFile) {
}
