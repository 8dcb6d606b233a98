package org.holdpoint.report;

import java.util.Locale;

/**
 * The report's one exception type: a template that lacks a required name, a workbook that is not a
 * sign-off workbook, a file that cannot be read. The message names the file, sheet or name and what to do.
 */
public final class ReportException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /**
     * @param template a {@link String#format} template, formatted with {@link Locale#ROOT}
     * @param args     the values named in the message
     */
    public ReportException(String template, Object... args) {
        super(String.format(Locale.ROOT, template, args));
    }

    /**
     * @param cause    the underlying failure (kept for debugging, never shown as a trace)
     * @param template a {@link String#format} template
     * @param args     the values named in the message
     */
    public ReportException(Throwable cause, String template, Object... args) {
        super(String.format(Locale.ROOT, template, args), cause);
    }
}
