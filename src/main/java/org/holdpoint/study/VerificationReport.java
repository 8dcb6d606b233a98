package org.holdpoint.study;

import java.util.List;
import java.util.Objects;

/**
 * The result of checking an archive's hash chain and every record it vouches for.
 *
 * @param eventsChecked     number of audit events read
 * @param studiesChecked    number of study versions read
 * @param signaturesChecked number of signatures read
 * @param headSeq           the chain position of the last event (0 when empty)
 * @param headHash          the hash of the last event; record it outside the archive to detect a truncated tail
 * @param problems          what is wrong, each naming the record; empty when intact
 */
public record VerificationReport(long eventsChecked, long studiesChecked, long signaturesChecked, long headSeq,
        String headHash, List<Problem> problems) {

    /** Copies the problems. */
    public VerificationReport {
        Objects.requireNonNull(headHash, "headHash");
        problems = List.copyOf(problems);
    }

    /** @return whether the chain is unbroken and every record matches what the chain vouches for */
    public boolean intact() {
        return problems.isEmpty();
    }

    /**
     * One finding.
     *
     * @param record the record, e.g. {@code audit_event seq 17} or {@code study 5}
     * @param detail what is wrong with it
     */
    public record Problem(String record, String detail) {

        /** Validates the finding. */
        public Problem {
            Checks.notBlank(record, "record");
            Checks.notBlank(detail, "detail");
        }

        @Override
        public String toString() {
            return record + ": " + detail;
        }
    }
}
