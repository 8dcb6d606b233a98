package org.holdpoint.cli;

import java.util.List;
import org.holdpoint.workflow.ArchiveAccess;
import org.holdpoint.workflow.Version;
import org.holdpoint.workflow.WindowLauncher;
import picocli.CommandLine;
import picocli.CommandLine.Command;

/** The root command {@code holdpoint}; its subcommands do the work. */
@Command(name = "holdpoint", mixinStandardHelpOptions = true, versionProvider = HoldpointCommand.VersionInfo.class,
        sortOptions = false, usageHelpAutoWidth = true,
        header = "Verify a manufacturing process change from before and after samples.",
        description = {
            "Holdpoint compares a before and an after sample of every critical characteristic, proves "
                    + "equivalence against an agreed margin with two one-sided tests, checks spread against an "
                    + "optional limit, and gives one verdict per characteristic and for the change.",
            "",
            "Difference = after - before. A statistical result supports, never replaces, the site's "
                    + "change-control procedures and engineering judgement."},
        footer = {"", "Exit codes: 0 analysed, 1 altered (verify), 2 bad input, 3 internal error.",
            "Run 'holdpoint demo' for a finished example on bundled sample data."})
public final class HoldpointCommand implements Runnable {
    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    private ArchiveAccess archives;

    /**
     * @param spec the spec of any command of this command line
     * @return the archive access the command line was built with
     */
    static ArchiveAccess archives(CommandLine.Model.CommandSpec spec) {
        return ((HoldpointCommand) spec.root().userObject()).archives;
    }

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** Supplies {@code --version}. */
    public static final class VersionInfo implements CommandLine.IVersionProvider {
        @Override
        public String[] getVersion() {
            return new String[] {"holdpoint " + Version.get(), "Java " + System.getProperty("java.version")};
        }
    }

    /**
     * The configured command line with the {@code gui} subcommand opening the window through {@code launcher}
     * and the archive commands reaching the archive through {@code archives}; output through its writers,
     * exit codes mapped.
     *
     * @param launcher opens the window (supplied by the composition root)
     * @param archives opens the change-record archive (supplied by the composition root)
     * @return the command line
     */
    public static CommandLine create(WindowLauncher launcher, ArchiveAccess archives) {
        return create(launcher, archives, null);
    }

    /** The subcommands in the order the usage lists them, {@code gui} after them. */
    private static final List<Class<?>> SUBCOMMANDS = List.of(AnalyzeCommand.class, PlanCommand.class,
            DemoCommand.class, VerifyCommand.class, SignCommand.class, ArchiveCommand.class, KeygenCommand.class,
            CommandLine.HelpCommand.class);

    /**
     * As {@link #create(WindowLauncher, ArchiveAccess)}, for running {@code args}: when their first word names a
     * subcommand other than {@code help}, only that subcommand is built (the model of every subcommand took about
     * 30 ms of each start; docs/performance.md); otherwise all of them, for the usage, help and suggestions.
     *
     * @param launcher opens the window
     * @param archives opens the change-record archive
     * @param args     the arguments to be run, or null
     * @return the command line
     */
    public static CommandLine create(WindowLauncher launcher, ArchiveAccess archives, String[] args) {
        HoldpointCommand root = new HoldpointCommand();
        root.archives = java.util.Objects.requireNonNull(archives, "archives");
        CommandLine cl = new CommandLine(root);
        String first = args == null || args.length == 0 ? null : args[0];
        Class<?> only = null;
        for (Class<?> c : SUBCOMMANDS) {
            String name = c.getAnnotation(Command.class).name();
            if (name.equals(first) && !"help".equals(name)) {
                only = c;
            }
        }
        if (only != null) {
            cl.addSubcommand(only);
        } else if (!"gui".equals(first)) {
            SUBCOMMANDS.forEach(cl::addSubcommand);
        }
        if (only == null) {
            cl.addSubcommand("gui", new GuiCommand(launcher));
        }
        cl.setExecutionExceptionHandler(new Failures());
        cl.setParameterExceptionHandler(new Failures());
        // every number option is a finite number: 1e400 is refused in the user's words, never "Infinity"
        cl.registerConverter(Double.class, HoldpointCommand::finite);
        cl.registerConverter(Double.TYPE, HoldpointCommand::finite);
        return cl;
    }

    static Double finite(String text) {
        double v;
        try {
            v = Double.parseDouble(text.strip());
        } catch (NumberFormatException e) {
            throw new CommandLine.TypeConversionException("'" + text + "' is not a number");
        }
        if (!Double.isFinite(v)) {
            throw new CommandLine.TypeConversionException("'" + text + "' is not a finite number"
                    + (Double.isInfinite(v) && !text.toLowerCase(java.util.Locale.ROOT).contains("inf")
                            ? " (too large for a measurement)" : ""));
        }
        return v;
    }
}
