package org.holdpoint.chart;

import org.jfree.data.Range;

/** Axis ranges that contain every value and limit with a little room. */
final class ChartRanges {
    private ChartRanges() {
    }

    /**
     * @param loHi     the smallest and largest value to show
     * @param fraction the room on each side as a fraction of the span
     * @return [lo − room, hi + room]; a zero span gets room of 1 % of the magnitude (or 1 at zero)
     */
    static Range padded(double[] loHi, double fraction) {
        double lo = loHi[0];
        double hi = loHi[1];
        double span = hi - lo;
        double room = span > 0 ? span * fraction : Math.max(Math.abs(lo) * 0.01, lo == 0 ? 1 : 0);
        return new Range(lo - room, hi + room);
    }
}
