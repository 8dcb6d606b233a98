package org.holdpoint.result;

import java.util.List;

/**
 * The analysis of a whole change study: one result per characteristic and the overall verdict.
 *
 * <p>"Change verified" is an intersection–union claim (Berger 1982, Technometrics 24:295–300): it
 * holds only when every characteristic passes, so it needs no multiplicity adjustment.
 *
 * @param characteristics the results, in input order
 * @param changeVerified  whether every characteristic passed
 * @param summary         the overall verdict in words
 * @param failing         for each characteristic that did not pass: "name: reason"
 */
public record StudyResult(List<CharacteristicResult> characteristics, boolean changeVerified, String summary,
        List<String> failing) {

    /** Copies the lists. */
    public StudyResult {
        characteristics = List.copyOf(characteristics);
        failing = List.copyOf(failing);
    }

    /** @return the characteristics whose control charts show a signal in either phase */
    public List<String> notInControl() {
        return characteristics.stream().filter(r -> r.checks() != null && r.checks().stability() != null
                && (r.checks().stability().finding(false) != null || r.checks().stability().finding(true) != null))
                .map(CharacteristicResult::name).toList();
    }

    /**
     * The sentence the summary ends with when control charts show signals.
     *
     * @param names the characteristics not in control
     * @return the sentence with its leading space, or "" for none
     */
    static String stabilityNote(List<String> names) {
        return names.isEmpty() ? "" : " Not in control in run order: " + String.join(", ", names)
                + " (control chart signals; the results assume stable processes).";
    }

    /** @return the summary without its stability sentence: the verdict alone */
    public String verdictSummary() {
        String note = stabilityNote(notInControl());
        return summary.endsWith(note) ? summary.substring(0, summary.length() - note.length()) : summary;
    }
}
