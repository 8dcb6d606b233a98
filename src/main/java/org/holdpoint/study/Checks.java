package org.holdpoint.study;

import java.util.List;

/** Small argument checks shared by the archive records. */
final class Checks {

    private Checks() {
    }

    /**
     * Returns the text if it is not blank, else throws.
     *
     * @param value the text
     * @param name  the field name for the message
     * @return the text
     * @throws IllegalArgumentException when the text is null or blank
     */
    static String notBlank(String value, String name) {
        if (value != null && !value.isBlank()) {
            return value;
        }
        throw new IllegalArgumentException(name + " must not be blank");
    }

    /**
     * Copies a list of names, each not blank.
     *
     * @param values the names
     * @param name   the field name for the message
     * @return an unmodifiable copy
     * @throws IllegalArgumentException when the list is null or holds a blank name
     */
    static List<String> names(List<String> values, String name) {
        if (values == null) {
            throw new IllegalArgumentException(name + " must not be null");
        }
        for (String v : values) {
            notBlank(v, name + " entry");
        }
        return List.copyOf(values);
    }
}
