package org.holdpoint.report;

import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.result.StudyResult;

/**
 * Everything the sign-off workbook shows and embeds. The caller builds the canonical study record
 * (JSON text) and its hash; the report stores them as given and never re-serialises the study.
 *
 * @param study           the change study (change, data with origins, settings, signatures)
 * @param result          its analysis
 * @param studyJson       the canonical study record, embedded verbatim in the hidden record sheet
 * @param sha256          lower-case hex SHA-256 of {@code studyJson}'s UTF-8 bytes
 * @param charts          chart PNGs per characteristic name (a characteristic may have none)
 * @param softwareVersion the version of the software that computed the results
 * @param generatedAt     ISO-8601 date and time the workbook is written
 * @param signaturesJson the sign-off entries as JSON (kept apart from the hashed record), or "" for a
 *                       record that holds them itself (workbooks written before they were kept apart)
 * @param seal            an optional signature of the record, or null
 */
public record ReportInput(ChangeStudy study, StudyResult result, String studyJson, String sha256,
        Map<String, List<NamedImage>> charts, String softwareVersion, String generatedAt, RecordSeal seal,
        String signaturesJson) {

    /** Validates and copies. */
    public ReportInput {
        if (study == null || result == null) {
            throw new ReportException("a report needs a study and its result");
        }
        if (studyJson == null || studyJson.isEmpty()) {
            throw new ReportException("a report needs the canonical study record");
        }
        if (sha256 == null || !sha256.matches("[0-9a-f]{64}")) {
            throw new ReportException("the record hash must be 64 lower-case hex digits, got %s", sha256);
        }
        Map<String, List<NamedImage>> copy = new LinkedHashMap<>();
        if (charts != null) {
            charts.forEach((k, v) -> copy.put(k, List.copyOf(v)));
        }
        charts = java.util.Collections.unmodifiableMap(copy);
        softwareVersion = softwareVersion == null ? "unknown" : softwareVersion;
        generatedAt = generatedAt == null ? "" : generatedAt;
        signaturesJson = signaturesJson == null ? "" : signaturesJson;
        if (signaturesJson.length() > SheetContent.MAX_TEXT) {
            throw new ReportException("the sign-off list is longer than a cell holds (%d characters); a record "
                    + "carries at most a few dozen signatures", signaturesJson.length());
        }
    }

    /**
     * @param characteristic the characteristic's name
     * @return its charts, possibly empty
     */
    public List<NamedImage> chartsOf(String characteristic) {
        return charts.getOrDefault(characteristic, List.of());
    }
}
