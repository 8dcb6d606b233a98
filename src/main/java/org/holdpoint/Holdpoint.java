package org.holdpoint;

import java.awt.GraphicsEnvironment;
import org.holdpoint.archive.JdbcArchive;
import org.holdpoint.cli.HoldpointCommand;
import org.holdpoint.importer.WorkbookWarmUp;
import org.holdpoint.ui.swing.MainWindow;
import org.holdpoint.workflow.ArchiveAccess;
import org.holdpoint.workflow.WindowLauncher;
import picocli.CommandLine;

/**
 * The launcher and composition root: with no arguments on a machine with a display it opens the
 * window; otherwise it runs the command line, whose {@code gui} subcommand opens the window through
 * the {@link WindowLauncher} wired here. The only caller of {@link System#exit}.
 */
public final class Holdpoint {
    private Holdpoint() {
    }

    /** @return the archive port with the JDBC adapter behind it (H2 embedded by default, PostgreSQL by URL) */
    public static ArchiveAccess archives() {
        return new ArchiveAccess(url -> url == null ? JdbcArchive.openDefault() : JdbcArchive.open(url));
    }

    /**
     * The command line wired to its adapters.
     *
     * @param launcher opens the window for {@code holdpoint gui}
     * @return the command line
     */
    public static CommandLine commandLine(WindowLauncher launcher) {
        return HoldpointCommand.create(launcher, archives());
    }

    /**
     * The command line wired to its adapters, built for running {@code args} as {@link #main} runs them (only the
     * subcommand they name, when they name one).
     *
     * @param launcher opens the window for {@code holdpoint gui}
     * @param args     the arguments to be run
     * @return the command line
     */
    public static CommandLine commandLine(WindowLauncher launcher, String[] args) {
        return HoldpointCommand.create(launcher, archives(), args);
    }

    /**
     * Entry point.
     *
     * @param args command-line arguments
     */
    public static void main(String[] args) {
        ArchiveAccess archives = archives();
        boolean[] opened = {false};
        WindowLauncher launcher = () -> {
            MainWindow.launch(archives);
            opened[0] = true;
        };
        if (args.length == 0 && !GraphicsEnvironment.isHeadless()) {
            launcher.open();
            return;
        }
        if (args.length > 0 && args[0].equals("analyze") && WorkbookWarmUp.namesWorkbook(args)) {
            WorkbookWarmUp.start();
        }
        int code;
        try {
            code = HoldpointCommand.create(launcher, archives, args).execute(args);
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
