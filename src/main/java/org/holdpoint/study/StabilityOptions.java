package org.holdpoint.study;

import java.util.List;
import java.util.SortedSet;
import org.holdpoint.stats.ControlChart;

/**
 * Study-wide choices for the control charts (docs/methods.md §16).
 *
 * @param rowOrderIsRunOrder whether the user says each file's rows are in the order the parts were made (used for
 *                           a characteristic without a sequence column)
 * @param tests              the ISO 7870-2 tests applied to the individuals or means chart (1–3 unless named)
 */
public record StabilityOptions(boolean rowOrderIsRunOrder, SortedSet<Integer> tests) {
    /** Row order not known; tests 1–3. */
    public static final StabilityOptions DEFAULT = new StabilityOptions(false, ControlChart.DEFAULT_TESTS);

    /** Validates and copies the tests. */
    public StabilityOptions {
        tests = ControlChart.tests(tests == null ? ControlChart.DEFAULT_TESTS : tests);
    }

    /**
     * Reads a list of tests as written by a user: "1,2,3,5", "1-8" or "all".
     *
     * @param text the list
     * @return the tests
     * @throws IllegalArgumentException when it is not such a list, with what to write instead
     */
    public static SortedSet<Integer> parseTests(String text) {
        String t = text == null ? "" : text.strip().toLowerCase(java.util.Locale.ROOT);
        if (t.equals("all")) {
            return ControlChart.ALL_TESTS;
        }
        java.util.List<Integer> out = new java.util.ArrayList<>();
        try {
            for (String part : t.split("[,;\\s]+")) {
                if (part.isEmpty()) {
                    continue;
                }
                int dash = part.indexOf('-');
                if (dash > 0) {
                    int a = Integer.parseInt(part.substring(0, dash));
                    int b = Integer.parseInt(part.substring(dash + 1));
                    for (int k = a; k <= b; k++) {
                        out.add(k);
                    }
                } else {
                    out.add(Integer.parseInt(part));
                }
            }
            return ControlChart.tests(out);
        } catch (NumberFormatException | org.holdpoint.stats.StatsException e) {
            throw new IllegalArgumentException("'" + text + "' is not a list of control-chart tests; write numbers "
                    + "from 1 to 8 such as 1,2,3,5 or 1-8, or all");
        }
    }

    /** @return the tests as a list, e.g. for a file */
    public List<Integer> testList() {
        return List.copyOf(tests);
    }

    /** @return the tests in words, e.g. "1, 2, 3" */
    public String testWords() {
        return String.join(", ", tests.stream().map(String::valueOf).toList());
    }
}
