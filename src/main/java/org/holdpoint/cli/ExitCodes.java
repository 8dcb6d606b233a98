package org.holdpoint.cli;

/** The documented exit codes of every command. */
public final class ExitCodes {
    /** Analysed (or verified intact). */
    public static final int OK = 0;
    /** A check found something altered (verify commands). */
    public static final int ALTERED = 1;
    /** Bad input: unreadable file, bad layout, bad option value, a characteristic that cannot be analysed. */
    public static final int BAD_INPUT = 2;
    /** An unexpected internal failure; please report it. */
    public static final int INTERNAL = 3;

    private ExitCodes() {
    }
}
