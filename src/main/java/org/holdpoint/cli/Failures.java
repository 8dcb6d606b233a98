package org.holdpoint.cli;

import java.io.PrintWriter;
import org.holdpoint.stats.StatsException;
import org.holdpoint.workflow.AnalysisException;
import picocli.CommandLine;

/**
 * Maps failures to one clear message on stderr and an exit code: bad options and bad input give 2,
 * anything unexpected gives 3 with a one-line summary (no stack trace unless HOLDPOINT_DEBUG is set).
 */
final class Failures implements CommandLine.IExecutionExceptionHandler, CommandLine.IParameterExceptionHandler {

    @Override
    public int handleExecutionException(Exception ex, CommandLine cl, CommandLine.ParseResult parse) {
        PrintWriter err = cl.getErr();
        if (ex instanceof StatsException) {
            err.println("holdpoint: " + OptionWords.of(ex.getMessage()));
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        if (ex instanceof AnalysisException a) {
            if (a.problems().size() == 1) {
                err.println("holdpoint: " + OptionWords.of(a.problems().get(0)));
            } else {
                err.println("holdpoint: the study cannot be analysed as given:");
                a.problems().forEach(p -> err.println("  - " + OptionWords.of(p)));
            }
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        if (ex instanceof org.holdpoint.workflow.SignoffException
                || ex instanceof org.holdpoint.workflow.StudyFileException) {
            err.println("holdpoint: " + OptionWords.of(ex.getMessage()));
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        if (ex instanceof UserInputException u) {
            err.println("holdpoint: " + OptionWords.of(u.getMessage()));
            err.flush();
            return ExitCodes.BAD_INPUT;
        }
        err.println("holdpoint: internal error (" + ex.getClass().getSimpleName() + ": " + ex.getMessage()
                + "). Please report it with the command you ran.");
        if (System.getenv("HOLDPOINT_DEBUG") != null) {
            ex.printStackTrace(err);
        }
        err.flush();
        return ExitCodes.INTERNAL;
    }

    @Override
    public int handleParseException(CommandLine.ParameterException ex, String[] args) {
        CommandLine cl = ex.getCommandLine();
        PrintWriter err = cl.getErr();
        err.println("holdpoint: " + OptionWords.of(ex.getMessage()));
        if (!CommandLine.UnmatchedArgumentException.printSuggestions(ex, err)) {
            err.println("Run '" + cl.getCommandSpec().qualifiedName() + " --help' for the options.");
        }
        err.flush();
        return ExitCodes.BAD_INPUT;
    }
}
