package org.holdpoint.cli;

import java.util.Locale;

/** A known problem with what the user gave (a file that cannot be written, a bad combination). */
final class UserInputException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    UserInputException(String template, Object... args) {
        super(String.format(Locale.ROOT, template, args));
    }
}
