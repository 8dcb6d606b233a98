package org.holdpoint.workflow;

import java.util.Locale;

/** A study file (or an embedded study record) that cannot be read. */
public final class StudyFileException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /**
     * @param template a message template, formatted with {@link Locale#ROOT}
     * @param args     its values
     */
    public StudyFileException(String template, Object... args) {
        super(String.format(Locale.ROOT, template, args));
    }
}
