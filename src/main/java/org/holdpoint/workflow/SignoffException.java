package org.holdpoint.workflow;

import java.util.Locale;

/**
 * A sign-off workbook or template that cannot be used: a template without a required name, a file that
 * is not a Holdpoint sign-off workbook, an output that exists and may not be replaced. The message names
 * the file and what to do.
 */
public final class SignoffException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /**
     * @param cause    the underlying failure (kept for debugging, never shown as a trace)
     * @param template a message template, formatted with {@link Locale#ROOT}
     * @param args     its values
     */
    public SignoffException(Throwable cause, String template, Object... args) {
        super(String.format(Locale.ROOT, template, args), cause);
    }
}
