package org.holdpoint.stats;

import java.util.Locale;

/**
 * The one exception type of the numerics core: an input a statistical method cannot accept
 * (too few values, zero spread, a level outside its range, a margin that excludes zero, ...).
 * Messages are built from templates with {@link Locale#ROOT} and name the offending value.
 */
public final class StatsException extends IllegalArgumentException {
    private static final long serialVersionUID = 1L;

    /**
     * Creates an exception whose message is {@code String.format(Locale.ROOT, template, args)}.
     *
     * @param template a {@link String#format} template
     * @param args     the values named in the message
     */
    public StatsException(String template, Object... args) {
        super(String.format(Locale.ROOT, template, args));
    }
}
