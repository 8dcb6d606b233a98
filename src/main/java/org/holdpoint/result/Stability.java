package org.holdpoint.result;

import java.util.List;
import org.holdpoint.stats.ControlChart;
import org.holdpoint.study.Origin;

/**
 * Stability of one characteristic in run order (docs/methods.md §16): individuals / moving-range charts with the
 * limits of the before phase, the before phase judged against its own limits and the after phase against the
 * before limits (its own shown for comparison), with every signal of ISO 7870-2 tests 1–3.
 *
 * @param before        the before phase
 * @param after         the after phase (its {@code limits} are the before phase's)
 * @param beforeOrigins the origin of each before point, in run order
 * @param afterOrigins  the origin of each after point, in run order
 * @param runOrder      how the run order was known, e.g. "the sequence column"
 * @param beforeRun     the before values in run order
 * @param afterRun      the after values in run order
 */
public record Stability(ControlChart.Phase before, ControlChart.Phase after, List<Origin> beforeOrigins,
        List<Origin> afterOrigins, String runOrder, List<Double> beforeRun, List<Double> afterRun) {

    /** Copies the lists. */
    public Stability {
        beforeOrigins = List.copyOf(beforeOrigins);
        afterOrigins = List.copyOf(afterOrigins);
        beforeRun = List.copyOf(beforeRun);
        afterRun = List.copyOf(afterRun);
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
        StringBuilder sb = new StringBuilder((after ? "after" : "before") + " phase not in control"
                + (after ? " against the before limits" : "") + ": " + p.signals().size() + " signal"
                + (p.signals().size() == 1 ? "" : "s") + " (");
        int shown = 0;
        for (ControlChart.Signal s : p.signals()) {
            if (shown++ == 3) {
                sb.append(", …");
                break;
            }
            sb.append(shown > 1 ? ", " : "").append("test ").append(s.test()).append(" at point ").append(s.index());
        }
        return sb.append(")").toString();
    }
}
