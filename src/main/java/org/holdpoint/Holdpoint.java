package org.holdpoint;

import org.holdpoint.cli.HoldpointCommand;

/**
 * The launcher and composition root: runs the command line (and, with no arguments on a machine
 * with a display, the window). The only caller of {@link System#exit}.
 */
public final class Holdpoint {
    private Holdpoint() {
    }

    /**
     * Entry point.
     *
     * @param args command-line arguments
     */
    public static void main(String[] args) {
        int code = HoldpointCommand.create().execute(args);
        System.exit(code);
    }
}
