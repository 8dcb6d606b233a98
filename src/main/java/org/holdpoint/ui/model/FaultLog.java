package org.holdpoint.ui.model;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardOpenOption;
import java.time.Instant;

/**
 * Where a fault of the program (not a problem with the user's input) is written in full, so that the user
 * sees one plain sentence and a file to send with a report: {@code holdpoint-faults.log} in the system's
 * temporary folder, appended to.
 */
public final class FaultLog {
    private FaultLog() {
    }

    /** @return the log file */
    public static Path file() {
        return Path.of(System.getProperty("java.io.tmpdir"), "holdpoint-faults.log");
    }

    /**
     * Appends a fault with its stack trace.
     *
     * @param what  what was being done
     * @param fault the fault
     * @return the log file, or null when it could not be written (then the trace went to standard error)
     */
    public static Path write(String what, Throwable fault) {
        StringWriter trace = new StringWriter();
        fault.printStackTrace(new PrintWriter(trace));
        String entry = Instant.now() + " " + what + "\n" + trace + "\n";
        try {
            Files.writeString(file(), entry, StandardCharsets.UTF_8, StandardOpenOption.CREATE,
                    StandardOpenOption.APPEND);
            return file();
        } catch (IOException e) {
            System.err.print("holdpoint: the fault log " + file() + " cannot be written (" + e.getMessage()
                    + "); the fault was:\n" + entry);
            return null;
        }
    }
}
