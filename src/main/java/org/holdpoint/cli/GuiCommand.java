package org.holdpoint.cli;

import java.util.concurrent.Callable;
import org.holdpoint.workflow.WindowLauncher;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** {@code holdpoint gui}: opens the desktop window (on the bundled demo study). */
@Command(name = "gui", mixinStandardHelpOptions = true, usageHelpAutoWidth = true,
        header = "Open the desktop window (it starts on the bundled demo study).",
        description = {"Opens the window with the whole job, from describing the change to sign-off. "
                + "Needs a display; 'holdpoint' without arguments does the same on a machine with a display."})
final class GuiCommand implements Callable<Integer> {
    private final WindowLauncher launcher;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    GuiCommand(WindowLauncher launcher) {
        this.launcher = launcher;
    }

    @Override
    public Integer call() {
        try {
            launcher.open();
            return ExitCodes.OK;
        } catch (IllegalStateException e) {
            spec.commandLine().getErr().println("holdpoint: " + e.getMessage());
            spec.commandLine().getErr().flush();
            return ExitCodes.BAD_INPUT;
        }
    }
}
