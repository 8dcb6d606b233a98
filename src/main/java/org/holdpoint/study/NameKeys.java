package org.holdpoint.study;

import java.util.Locale;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * How names of characteristics and columns are compared everywhere (import, criteria, choices): case
 * does not matter, runs of spaces, underscores, hyphens, dots, colons and number signs count as one
 * space, and a unit of measure in trailing brackets is not part of the name ("Bore_Ø (mm)" and
 * "bore ø" are the same characteristic).
 */
public final class NameKeys {
    private static final Pattern UNIT = Pattern.compile("^(.*?)\\s*[\\(\\[]\\s*([^()\\[\\]]*?)\\s*[\\)\\]]\\s*$");
    private static final Pattern SEPARATORS = Pattern.compile("[\\s_\\-.:#]+");

    private NameKeys() {
    }

    /**
     * A name split into the name as shown and its unit.
     *
     * @param display the name without a trailing unit in brackets, spaces folded
     * @param unit    the unit in trailing brackets, or null
     */
    public record Split(String display, String unit) {
    }

    /**
     * @param raw a name as written
     * @return the name and its unit in trailing brackets
     */
    public static Split split(String raw) {
        String display = raw.strip().replaceAll("\\s+", " ");
        String unit = null;
        Matcher m = UNIT.matcher(display);
        if (m.matches() && !m.group(1).isEmpty()) {
            display = m.group(1);
            unit = m.group(2).isEmpty() ? null : m.group(2);
        }
        return new Split(display, unit);
    }

    /**
     * @param text any text
     * @return lower case, separators as single spaces, trimmed (a unit in brackets is kept)
     */
    public static String fold(String text) {
        return SEPARATORS.matcher(text.toLowerCase(Locale.ROOT)).replaceAll(" ").strip();
    }

    /**
     * @param name a characteristic's or column's name as written
     * @return its comparison key: folded, without a unit in trailing brackets
     */
    public static String key(String name) {
        return fold(split(name).display());
    }
}
