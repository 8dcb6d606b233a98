package org.holdpoint.workflow;

import java.util.Locale;

/**
 * A failure of a window use case told in plain words: what went wrong (the message names the file,
 * sheet, cell or characteristic) and, by its {@link Kind}, what the user can do about it.
 */
public final class StudyProblem extends RuntimeException {
    private static final long serialVersionUID = 1L;
    private final Kind kind;

    /** What kind of failure it is; each kind carries the advice shown beside the message. */
    public enum Kind {
        /** The data or criteria file cannot be read as a change study. */
        BAD_INPUT("The data could not be read",
                "Correct the file at the place named above, or choose another file or sheet, then import again. "
                        + "Nothing you typed has been lost."),
        /** A characteristic cannot be analysed with the criteria given. */
        CANNOT_ANALYSE("The study could not be analysed",
                "Correct the criteria of the characteristic named above on the Criteria step, then analyse again."),
        /** An output file cannot be written. */
        CANNOT_WRITE("The file could not be written",
                "Choose another folder or name, or close the file if another program has it open, then try again."),
        /** A signature signed an earlier version of the record than the one to be written. */
        RECORD_CHANGED("Signatures of an earlier record",
                "On the Sign-off step, remove the void signatures (they signed results that have since changed); "
                        + "the people concerned sign the record again, then write it."),
        /** A saved study file cannot be read. */
        CANNOT_READ_STUDY("The study file could not be opened",
                "Choose a study file saved by Holdpoint (*.holdpoint.json).");

        private final String title;
        private final String advice;

        Kind(String title, String advice) {
            this.title = title;
            this.advice = advice;
        }

        /** @return a short heading in plain words */
        public String title() {
            return title;
        }

        /** @return what the user can do, in plain words */
        public String advice() {
            return advice;
        }
    }

    /**
     * @param kind     what kind of failure
     * @param cause    the underlying failure (kept for debugging, never shown as a trace)
     * @param template a message template, formatted with {@link Locale#ROOT}
     * @param args     its values
     */
    public StudyProblem(Kind kind, Throwable cause, String template, Object... args) {
        super(String.format(Locale.ROOT, template, args), cause);
        this.kind = kind;
    }

    /** @return what kind of failure this is */
    public Kind kind() {
        return kind;
    }
}
