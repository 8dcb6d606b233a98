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
 * @param provenance who analysed it and when, and the key that signs its record
 */
public record ChangeStudy(ChangeDescription change, Dataset data, AnalysisSettings settings,
        List<Signature> signatures, Provenance provenance) {

    /** Copies and normalises. */
    public ChangeStudy {
        change = change == null ? ChangeDescription.NONE : change;
        signatures = signatures == null ? List.of() : List.copyOf(signatures);
        provenance = provenance == null ? Provenance.NONE : provenance;
    }

    /**
     * A study without recorded provenance.
     *
     * @param change     what changed
     * @param data       the data
     * @param settings   the criteria
     * @param signatures the sign-off entries
     */
    public ChangeStudy(ChangeDescription change, Dataset data, AnalysisSettings settings, List<Signature> signatures) {
        this(change, data, settings, signatures, Provenance.NONE);
    }

    /**
     * @param p the provenance
     * @return a copy with it
     */
    public ChangeStudy withProvenance(Provenance p) {
        return new ChangeStudy(change, data, settings, signatures, p);
    }
}
