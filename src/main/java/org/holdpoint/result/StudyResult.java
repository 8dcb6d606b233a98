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
}
