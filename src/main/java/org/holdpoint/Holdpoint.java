package org.holdpoint;

import org.holdpoint.archive.JdbcArchive;
import org.holdpoint.cli.HoldpointCommand;
import org.holdpoint.workflow.ArchiveAccess;

/**
 * The launcher and composition root: runs the command line (and, with no arguments on a machine
 * with a display, the window). The only caller of {@link System#exit}.
 */
public final class Holdpoint {
    private Holdpoint() {
    }

    /** Connects the adapters to the use cases: the JDBC archive behind the archive port. */
    public static void wire() {
        ArchiveAccess.install(url -> url == null ? JdbcArchive.openDefault() : JdbcArchive.open(url));
    }

    /**
     * Entry point.
     *
     * @param args command-line arguments
     */
    public static void main(String[] args) {
        wire();
        int code = HoldpointCommand.create().execute(args);
        System.exit(code);
    }
}
