package org.holdpoint.study;

import java.util.List;

/**
 * A whole change study as saved, archived and embedded in the sign-off workbook: the change, the data
 * with their origins, the settings (exclusions included) and the signatures. Results are derived from
 * these by the analysis and can always be re-computed.
 *
 * @param change     what changed
 * @param data       the imported data with origins
 * @param settings   the criteria and exclusions
 * @param signatures the sign-off entries so far
 */
public record ChangeStudy(ChangeDescription change, Dataset data, AnalysisSettings settings,
        List<Signature> signatures) {

    /** Copies and normalises. */
    public ChangeStudy {
        change = change == null ? ChangeDescription.NONE : change;
        signatures = signatures == null ? List.of() : List.copyOf(signatures);
    }
}
