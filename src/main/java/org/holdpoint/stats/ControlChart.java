package org.holdpoint.stats;

import java.util.ArrayList;
import java.util.List;

/**
 * Individuals and moving-range charts (Shewhart; ISO 7870-2:2013) for a process change: limits from the before
 * phase, both phases judged against them, and the signals of the ISO 7870-2 tests 1–3 (docs/methods.md §16).
 *
 * <p>σ̂ = MR̄/d₂ with MR̄ the mean of the moving ranges |xᵢ − xᵢ₋₁| and d₂ = 2/√π ≈ 1.128 (the mean range of two
 * standard normal values); limits centre ± 3σ̂; the moving-range chart's upper limit D₄·MR̄ with
 * D₄ = 1 + 3d₃/d₂ ≈ 3.267, d₃ = √(2 − 4/π) (the sd of that range). The tables of the standard round d₂ and D₄ to
 * 1.128 and 3.267; the exact constants are used here.
 */
public final class ControlChart {
    /** d₂ for moving ranges of two: 2/√π. */
    public static final double D2 = 2 / Math.sqrt(Math.PI);
    /** D₄ for moving ranges of two: 1 + 3·√(2 − 4/π)/d₂. */
    public static final double D4 = 1 + 3 * Math.sqrt(2 - 4 / Math.PI) / D2;
    /** Test 2: this many points in a row on one side of the centre line. */
    static final int RUN = 9;
    /** Test 3: this many points in a row steadily increasing or decreasing. */
    static final int TREND = 6;

    private ControlChart() {
    }

    /**
     * The limits of an individuals chart.
     *
     * @param center the centre line (the phase's mean)
     * @param sigma  σ̂ = MR̄/d₂
     * @param lcl    centre − 3σ̂
     * @param ucl    centre + 3σ̂
     * @param mrBar  the mean moving range
     * @param mrUcl  D₄·MR̄, the moving-range chart's upper limit
     */
    public record Limits(double center, double sigma, double lcl, double ucl, double mrBar, double mrUcl) {
    }

    /**
     * A point that completes a pattern of one of the tests.
     *
     * @param test  1 (beyond a limit), 2 (nine in a row on one side), 3 (six in a row rising or falling)
     * @param index the point's 1-based position in its phase's run order
     */
    public record Signal(int test, int index) {
    }

    /**
     * One phase judged against limits.
     *
     * @param limits  the limits it is judged against (the before phase's)
     * @param own     the phase's own limits, for comparison
     * @param signals every point that completes a pattern, in run order
     */
    public record Phase(Limits limits, Limits own, List<Signal> signals) {
        /** Copies the list. */
        public Phase {
            signals = List.copyOf(signals);
        }
    }

    /**
     * The individuals-chart limits of values in run order.
     *
     * @param x the values in run order, at least 2
     * @return the limits
     * @throws StatsException with fewer than 2 values or no variation between neighbours
     */
    public static Limits limits(double[] x) {
        if (x.length < 2) {
            throw new StatsException("an individuals chart needs at least 2 values in run order, got %d", x.length);
        }
        CompensatedSum mr = new CompensatedSum();
        for (int i = 1; i < x.length; i++) {
            mr.add(Math.abs(x[i] - x[i - 1]));
        }
        double center = Descriptives.of(Sample.of(x)).mean();
        double mrBar = mr.value() / (x.length - 1);
        if (!(mrBar > 0)) {
            throw new StatsException("neighbouring values never differ, so the moving range is 0 and no limits exist; "
                    + "check the measurement resolution");
        }
        double sigma = mrBar / D2;
        return new Limits(center, sigma, center - 3 * sigma, center + 3 * sigma, mrBar, D4 * mrBar);
    }

    /**
     * A phase judged against limits (the before phase's, for both phases).
     *
     * @param x      the phase's values in run order
     * @param limits the limits to judge against
     * @return the phase with its own limits and signals
     */
    public static Phase judge(double[] x, Limits limits) {
        return new Phase(limits, limits(x), signals(x, limits));
    }

    /**
     * The points that complete a pattern of ISO 7870-2 tests 1–3 against the limits: a point beyond a limit; the
     * ninth and each further point of a run on one side of the centre line (a point on the line ends a run); the
     * sixth and each further point of a run steadily increasing or decreasing (equal neighbours end it).
     *
     * @param x      the values in run order
     * @param limits the limits
     * @return the signals, in run order, test 1 before 2 before 3 at the same point
     */
    public static List<Signal> signals(double[] x, Limits limits) {
        List<Signal> out = new ArrayList<>();
        int side = 0;
        int sideRun = 0;
        int dir = 0;
        int trend = 1;
        for (int i = 0; i < x.length; i++) {
            if (x[i] > limits.ucl() || x[i] < limits.lcl()) {
                out.add(new Signal(1, i + 1));
            }
            int s = Double.compare(x[i], limits.center());
            s = x[i] == limits.center() ? 0 : s;
            sideRun = s != 0 && s == side ? sideRun + 1 : s != 0 ? 1 : 0;
            side = s;
            if (sideRun >= RUN) {
                out.add(new Signal(2, i + 1));
            }
            if (i > 0) {
                int d = x[i] > x[i - 1] ? 1 : x[i] < x[i - 1] ? -1 : 0;
                trend = d != 0 && d == dir ? trend + 1 : d != 0 ? 2 : 1;
                dir = d;
                if (trend >= TREND) {
                    out.add(new Signal(3, i + 1));
                }
            }
        }
        return out;
    }
}
