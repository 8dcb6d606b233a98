package org.holdpoint.result;

import java.util.List;
import java.util.SortedSet;
import org.holdpoint.stats.ControlChart;

/**
 * Stability of one characteristic in run order (docs/methods.md §16): control charts (individuals and moving
 * range, or subgroup means and sds) with the limits of the before phase, the before phase judged against its own
 * limits and the after phase against the before limits (its own shown for comparison), with every signal of the
 * ISO 7870-2 tests in use.
 *
 * @param before        the before phase
 * @param after         the after phase (its {@code limits} are the before phase's)
 * @param beforeOrigins where each before point comes from, in run order: a cell, or a subgroup and its first cell
 * @param afterOrigins  where each after point comes from, in run order
 * @param runOrder      how the run order was known, e.g. "the sequence column (numbers)"
 * @param tests         the ISO 7870-2 tests applied
 */
public record Stability(ControlChart.Phase before, ControlChart.Phase after, List<String> beforeOrigins,
        List<String> afterOrigins, String runOrder, SortedSet<Integer> tests) {

    /** Copies the lists. */
    public Stability {
        beforeOrigins = List.copyOf(beforeOrigins);
        afterOrigins = List.copyOf(afterOrigins);
        tests = ControlChart.tests(tests);
    }

    /** @return the tests in words, e.g. "1, 2, 3" */
    public String testWords() {
        return String.join(", ", tests.stream().map(String::valueOf).toList());
    }

    /** @return individuals or subgroup means */
    public ControlChart.Kind kind() {
        return before.limits().kind();
    }

    /**
     * @param after true for the after phase
     * @return the phase's signals in words, e.g. "before phase not in control: 2 signals (test 1 at point 7, ...)",
     *         or null when it has none
     */
    public String finding(boolean after) {
        ControlChart.Phase p = after ? this.after : before;
        if (p.signals().isEmpty()) {
            return null;
        }
        String point = kind() == ControlChart.Kind.MEANS ? "subgroup" : "point";
        StringBuilder sb = new StringBuilder((after ? "after" : "before") + " phase not in control"
                + (after ? " against the before limits" : "") + ": " + p.signals().size() + " signal"
                + (p.signals().size() == 1 ? "" : "s") + " (");
        int shown = 0;
        for (ControlChart.Signal s : p.signals()) {
            if (shown++ == 3) {
                sb.append(", …");
                break;
            }
            sb.append(shown > 1 ? ", " : "").append("test ").append(s.test())
                    .append(s.chart() == ControlChart.Chart.SPREAD ? " on the sd chart" : "").append(" at ")
                    .append(point).append(" ").append(s.index());
        }
        return sb.append(")").toString();
    }
}
