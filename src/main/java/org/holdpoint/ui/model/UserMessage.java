package org.holdpoint.ui.model;

import org.holdpoint.study.Progress;
import org.holdpoint.workflow.StudyProblem;

/**
 * A problem told to the user: a heading, what happened (naming file, sheet, cell or characteristic)
 * and what to do. Never a stack trace.
 *
 * @param title   a short heading
 * @param what    what happened
 * @param whatToDo what the user can do about it
 */
public record UserMessage(String title, String what, String whatToDo) {

    /**
     * Tells a failure in plain words.
     *
     * @param failure the failure of a task
     * @return the message
     */
    public static UserMessage of(Throwable failure) {
        if (failure instanceof StudyProblem p) {
            return new UserMessage(p.kind().title(), p.getMessage(), p.kind().advice());
        }
        if (failure instanceof org.holdpoint.study.ArchiveException a) {
            return new UserMessage("The archive refused or failed", a.getMessage(), switch (a.reason()) {
                case RETRYABLE_CONFLICT -> "Someone else saved at the same moment; nothing was changed. Try again.";
                case PERMISSION_DENIED -> "Your database role may not do this; ask the archive's administrator.";
                case NOT_FOUND -> "Search again; the list may be out of date.";
                case REJECTED -> "Correct what the message names, then try again.";
                default -> "Check the archive address (empty = the archive on this computer) and that the database "
                        + "is reachable, then try again.";
            });
        }
        if (failure instanceof Progress.CancelledException) {
            return new UserMessage("Stopped", "The task was cancelled; nothing was changed.", "");
        }
        if (failure instanceof OutOfMemoryError) {
            return new UserMessage("Not enough memory", "The data do not fit into the memory given to Holdpoint.",
                    "Start Holdpoint with more memory (for example java -Xmx4g -jar holdpoint.jar), or split the "
                            + "file by characteristic.");
        }
        // a fault of the program, not of the input: said as one, with the details in the fault log
        String m = failure.getClass().getSimpleName() + (failure.getMessage() == null ? "" : ": "
                + failure.getMessage());
        java.nio.file.Path log = FaultLog.write("task failed", failure);
        return new UserMessage("Internal error", "Holdpoint met a fault of its own (" + m + "). Your data and "
                + "criteria are not the cause.", "Save your work under a new name, then try again. If it happens "
                + "again, report the steps that led to it" + (log == null ? "" : " with the file " + log)
                + " and the data file.");
    }
}
