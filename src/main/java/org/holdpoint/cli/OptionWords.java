package org.holdpoint.cli;

import java.util.LinkedHashMap;
import java.util.Map;

/**
 * The program's messages name choices in plain words that fit the window and the command line alike ("the
 * paired choice"); on the command line those words are followed by the option that makes the choice.
 */
final class OptionWords {
    private static final Map<String, String> WORDS = new LinkedHashMap<>();

    static {
        WORDS.put("analyse them as paired (the paired choice)", "analyse them as paired (--paired)");
        WORDS.put("the before file is the one measured before the change",
                "--before is the file measured before the change");
        WORDS.put("name the labels that mean before and after",
                "name the labels that mean before and after with --before-label and --after-label");
        WORDS.put("choose the decimal mark the numbers use", "give the decimal mark the numbers use with --decimal");
        WORDS.put("(the group column and its before and after labels)",
                "(--group-column, --before-label, --after-label)");
        WORDS.put("Name the columns that hold the before and the after values",
                "Name the columns that hold the before and the after values (--before-column, --after-column)");
        WORDS.put("Check the layout, header row and column choices",
                "Check --layout, --header-row and the column options");
    }

    private OptionWords() {
    }

    /**
     * @param message a message of the program
     * @return the message with each plain-word choice followed by its option
     */
    static String of(String message) {
        if (message == null) {
            return null;
        }
        String m = message;
        for (Map.Entry<String, String> e : WORDS.entrySet()) {
            m = m.replace(e.getKey(), e.getValue());
        }
        return m;
    }
}
