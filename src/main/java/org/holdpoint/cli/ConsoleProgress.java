package org.holdpoint.cli;

import java.io.PrintWriter;
import org.holdpoint.study.Progress;

/** Progress on the console (stderr): one line per step when verbose, nothing otherwise; never cancelled. */
final class ConsoleProgress implements Progress {
    private final PrintWriter err;
    private final boolean verbose;

    /**
     * @param err     where to write
     * @param verbose whether to print the steps
     */
    ConsoleProgress(PrintWriter err, boolean verbose) {
        this.err = err;
        this.verbose = verbose;
    }

    @Override
    public void step(String what, double fraction) {
        if (verbose) {
            err.println(fraction >= 0 ? String.format(java.util.Locale.ROOT, "[%3.0f%%] %s", fraction * 100, what)
                    : what);
            err.flush();
        }
    }

    @Override
    public boolean cancelled() {
        return false;
    }
}
