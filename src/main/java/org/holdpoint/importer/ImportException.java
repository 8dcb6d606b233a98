package org.holdpoint.importer;

import java.util.Locale;

/**
 * The importer's one exception type: input that cannot be read as a change study. The message says
 * what is wrong, where (file, sheet, cell or row/column) and what to do; it never carries a stack
 * trace to the user.
 */
public final class ImportException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /**
     * @param template a {@link String#format} template, formatted with {@link Locale#ROOT}
     * @param args     the values named in the message
     */
    public ImportException(String template, Object... args) {
        super(String.format(Locale.ROOT, template, args));
    }

    /**
     * @param cause    the underlying failure (kept for debugging, never shown as a trace)
     * @param template a {@link String#format} template
     * @param args     the values named in the message
     */
    public ImportException(Throwable cause, String template, Object... args) {
        super(String.format(Locale.ROOT, template, args), cause);
    }
}
