package org.holdpoint.importer;

import java.util.Locale;
import java.util.Set;
import java.util.regex.Pattern;

/** Sorts text that is not a number into the kinds a value column reports. */
final class TextClassifier {
    private static final Set<String> NOT_FINITE = Set.of("nan", "+nan", "-nan", "inf", "+inf", "-inf", "infinity",
            "+infinity", "-infinity", "∞", "-∞", "+∞", "1.#inf", "-1.#inf", "1.#qnan", "-1.#ind");
    private static final Set<String> BOOLEANS = Set.of("true", "false", "wahr", "falsch", "vrai", "faux");
    private static final Set<String> ERRORS = Set.of("#div/0!", "#n/a", "#name?", "#null!", "#num!", "#ref!",
            "#value!", "#getting_data", "#spill!", "#calc!", "#field!", "#blocked!", "#connect!", "#busy!");
    private static final Pattern DATE = Pattern.compile(
            "\\d{4}-\\d{1,2}-\\d{1,2}([ T]\\d{1,2}:\\d{2}(:\\d{2}([.,]\\d+)?)?(Z|[+-]\\d{2}:?\\d{2})?)?"
                    + "|\\d{1,2}[./]\\d{1,2}[./]\\d{2,4}( \\d{1,2}:\\d{2}(:\\d{2})?)?"
                    + "|\\d{1,2}:\\d{2}(:\\d{2}([.,]\\d+)?)?");
    private static final Pattern COMMA_NUMBER = Pattern.compile("[+\\-\u2212]?\\d*,\\d+([eE][+-]?\\d+)?");
    private static final Pattern POINT_NUMBER = Pattern.compile("[+\\-\u2212]?\\d*\\.\\d+([eE][+-]?\\d+)?");

    private TextClassifier() {
    }

    /**
     * @param text      stripped, non-empty text that did not read as a number
     * @param separator the decimal separator in force
     * @return its kind
     */
    static CellKind classify(String text, char separator) {
        String lower = text.toLowerCase(Locale.ROOT);
        if (NOT_FINITE.contains(lower)) {
            return CellKind.NOT_FINITE;
        }
        if (BOOLEANS.contains(lower)) {
            return CellKind.BOOLEAN;
        }
        if (lower.startsWith("#") && ERRORS.contains(lower)) {
            return CellKind.ERROR;
        }
        if (separator == '.' ? COMMA_NUMBER.matcher(text).matches() : POINT_NUMBER.matcher(text).matches()) {
            return CellKind.OTHER_SEPARATOR;
        }
        if (DATE.matcher(text).matches()) {
            return CellKind.DATE;
        }
        return CellKind.TEXT;
    }

    /** @return whether the text is a number written with a decimal comma */
    static boolean isCommaNumber(String text) {
        return COMMA_NUMBER.matcher(text).matches();
    }
}
