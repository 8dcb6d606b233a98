package org.holdpoint;

import java.awt.GraphicsEnvironment;
import org.holdpoint.archive.JdbcArchive;
import org.holdpoint.cli.HoldpointCommand;
import org.holdpoint.ui.swing.MainWindow;
import org.holdpoint.workflow.ArchiveAccess;
import org.holdpoint.workflow.WindowLauncher;

/**
 * The launcher and composition root: with no arguments on a machine with a display it opens the
 * window; otherwise it runs the command line, whose {@code gui} subcommand opens the window through
 * the {@link WindowLauncher} wired here. The only caller of {@link System#exit}.
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
        boolean[] opened = {false};
        WindowLauncher launcher = () -> {
            MainWindow.launch();
            opened[0] = true;
        };
        if (args.length == 0 && !GraphicsEnvironment.isHeadless()) {
            launcher.open();
            return;
        }
        int code;
        try {
            code = HoldpointCommand.create(launcher).execute(args);
        } catch (OutOfMemoryError e) {
            // one line, exit 3: never a stack trace, never the "edited" code of verify
            System.err.println("holdpoint: out of memory (the Java heap of " + (Runtime.getRuntime().maxMemory() >> 20)
                    + " MB is too small for this input); run it again with more, e.g. HOLDPOINT_JAVA_OPTS=-Xmx2g");
            code = 3;
        } catch (StackOverflowError e) {
            System.err.println("holdpoint: internal error (the input is nested too deeply to be processed); please "
                    + "report it with the command you ran");
            code = 3;
        }
        if (!opened[0] || code != 0) {
            System.exit(code);
        }
    }
}
