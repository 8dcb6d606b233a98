package org.holdpoint.chart;

import java.util.Locale;

/**
 * The one exception type of the chart layer: data a chart cannot show, or an image that cannot be written.
 * Messages are built with {@link Locale#ROOT} and name the characteristic, file or value concerned.
 */
public final class ChartException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /**
     * Creates an exception whose message is {@code String.format(Locale.ROOT, template, args)}.
     *
     * @param template a {@link String#format} template
     * @param args     the values named in the message
     */
    public ChartException(String template, Object... args) {
        super(String.format(Locale.ROOT, template, args));
    }

    /**
     * Creates an exception with a cause.
     *
     * @param cause    the underlying failure
     * @param template a {@link String#format} template
     * @param args     the values named in the message
     */
    public ChartException(Throwable cause, String template, Object... args) {
        super(String.format(Locale.ROOT, template, args), cause);
    }
}
