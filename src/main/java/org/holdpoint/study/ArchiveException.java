package org.holdpoint.study;

/**
 * A change-record archive could not do what was asked; the message says what, on which record or
 * statement, and what to do.
 */
public class ArchiveException extends Exception {

    private static final long serialVersionUID = 1L;

    /** Why an archive operation failed, so callers can choose an exit code or offer a retry. */
    public enum Reason {
        /** The named record does not exist. */
        NOT_FOUND,
        /** The request breaks an archive rule (e.g. superseding a version that is already superseded). */
        REJECTED,
        /** Another writer appended at the same moment; the operation changed nothing and may be retried. */
        RETRYABLE_CONFLICT,
        /** The database refused the operation for the connected role. */
        PERMISSION_DENIED,
        /** The database schema is missing, too old or too new for this tool. */
        SCHEMA,
        /** Any other failure of the database or its connection. */
        DATABASE
    }

    private final Reason reason;

    /**
     * Creates the exception.
     *
     * @param reason  why it failed
     * @param message what failed and what to do
     */
    public ArchiveException(Reason reason, String message) {
        super(message);
        this.reason = reason;
    }

    /**
     * Creates the exception with its cause.
     *
     * @param reason  why it failed
     * @param message what failed and what to do
     * @param cause   the underlying failure
     */
    public ArchiveException(Reason reason, String message, Throwable cause) {
        super(message, cause);
        this.reason = reason;
    }

    /** @return why it failed */
    public Reason reason() {
        return reason;
    }

    /** @return whether repeating the same call may succeed (it changed nothing) */
    public boolean isRetryable() {
        return reason == Reason.RETRYABLE_CONFLICT;
    }
}
