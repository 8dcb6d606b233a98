package org.holdpoint.ui.model;

/** How a background task ended. */
public enum TaskStatus {
    /** It ran to the end and produced its value. */
    COMPLETED,
    /** The user cancelled it; nothing was changed or written. */
    CANCELLED,
    /** It failed; the outcome carries the problem in plain words. */
    FAILED
}
