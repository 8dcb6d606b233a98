package org.holdpoint.stats;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.Collection;
import java.util.List;
import java.util.SortedSet;
import java.util.TreeSet;

/**
 * Shewhart control charts for a process change (ISO 7870-2:2013; docs/methods.md §16): limits from the before
 * phase, both phases judged against them, and the signals of the standard's eight tests (1–3 by default).
 *
 * <p><b>Individuals and moving range</b> (one value per point): σ̂ = MR̄/d₂ with MR̄ the mean of the moving ranges
 * |xᵢ − xᵢ₋₁| and d₂ = 2/√π ≈ 1.128 (the mean range of two standard normal values); limits centre ± 3σ̂; the
 * moving-range chart's upper limit D₄·MR̄ with D₄ = 1 + 3d₃/d₂ ≈ 3.267, d₃ = √(2 − 4/π) (the sd of that range). The
 * tables of the standard round d₂ and D₄ to 1.128 and 3.267; the exact constants are used here.
 *
 * <p><b>Means and standard deviations</b> (subgroups): σ̂ = (1/k)·Σ sᵢ/c₄(nᵢ) over the k subgroups with at least
 * two values; the centre is the mean of all values (the mean of the subgroup means when the sizes are equal); a
 * subgroup of m values has mean limits centre ± 3σ̂/√m and sd limits (c₄(m) ∓ 3√(1 − c₄(m)²))·σ̂, the lower one
 * not below 0. With equal sizes n these are the tables' X̿ ± A₃s̄, B₃s̄ and B₄s̄.
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
    /** Test 4: this many points in a row alternating up and down. */
    static final int ALTERNATING = 14;
    /** Test 7: this many points in a row within one σ̂ of the centre line. */
    static final int HUGGING = 15;
    /** Test 8: this many points in a row beyond one σ̂, on both sides of the centre line. */
    static final int MIXTURE = 8;
    /** The tests used unless the user names others: 1, 2 and 3. */
    public static final SortedSet<Integer> DEFAULT_TESTS = tests(List.of(1, 2, 3));
    /** All eight tests of ISO 7870-2. */
    public static final SortedSet<Integer> ALL_TESTS = tests(List.of(1, 2, 3, 4, 5, 6, 7, 8));

    private ControlChart() {
    }

    /**
     * @param numbers test numbers
     * @return them as an unmodifiable sorted set
     * @throws StatsException for a number outside 1–8 or an empty set
     */
    public static SortedSet<Integer> tests(Collection<Integer> numbers) {
        TreeSet<Integer> t = new TreeSet<>();
        for (Integer k : numbers) {
            if (k == null || k < 1 || k > 8) {
                throw new StatsException("ISO 7870-2 has the tests 1 to 8; %s is not one of them", k);
            }
            t.add(k);
        }
        if (t.isEmpty()) {
            throw new StatsException("name at least one control-chart test (1 to 8)");
        }
        return java.util.Collections.unmodifiableSortedSet(t);
    }

    /** The kind of chart. */
    public enum Kind {
        /** One value per point: individuals and moving-range charts. */
        INDIVIDUALS("individuals and moving range"),
        /** Subgroups: charts of subgroup means and standard deviations. */
        MEANS("subgroup mean and standard deviation");

        private final String words;

        Kind(String words) {
            this.words = words;
        }

        /** @return the chart's name in words */
        public String words() {
            return words;
        }
    }

    /** Which of a pair of charts a signal is on. */
    public enum Chart {
        /** The individuals or means chart. */
        LOCATION,
        /** The standard-deviation chart of subgroups (test 1 only). */
        SPREAD
    }

    /**
     * The limits of a chart.
     *
     * @param kind         individuals or subgroup means
     * @param size         the points' subgroup size the limits are stated for: 1 for individuals, the most frequent
     *                     size of the phase for subgroups (a subgroup of another size has its own, see
     *                     {@link #ucl(int)})
     * @param center       the centre line (the phase's mean)
     * @param sigma        σ̂, the within-process standard deviation
     * @param lcl          centre − 3σ̂/√size
     * @param ucl          centre + 3σ̂/√size
     * @param spreadCenter the spread chart's centre line: MR̄ for individuals, c₄(size)·σ̂ (= s̄ for equal sizes)
     * @param spreadLcl    the spread chart's lower limit: 0 for moving ranges, max(0, B₅)·σ̂ for subgroups
     * @param spreadUcl    the spread chart's upper limit: D₄·MR̄, or B₆·σ̂ for subgroups
     */
    public record Limits(Kind kind, int size, double center, double sigma, double lcl, double ucl, double spreadCenter,
            double spreadLcl, double spreadUcl) {
        /**
         * The limits of an individuals chart.
         *
         * @param center the centre
         * @param sigma  σ̂
         * @param lcl    centre − 3σ̂
         * @param ucl    centre + 3σ̂
         * @param mrBar  the mean moving range
         * @param mrUcl  D₄·MR̄
         */
        public Limits(double center, double sigma, double lcl, double ucl, double mrBar, double mrUcl) {
            this(Kind.INDIVIDUALS, 1, center, sigma, lcl, ucl, mrBar, 0, mrUcl);
        }

        /** @return the mean moving range (individuals) or the sd chart's centre (subgroups) */
        public double mrBar() {
            return spreadCenter;
        }

        /** @return the moving-range chart's upper limit (individuals) or the sd chart's (subgroups) */
        public double mrUcl() {
            return spreadUcl;
        }

        /**
         * @param m a subgroup size (1 for an individual value)
         * @return the lower limit of a point of m values
         */
        public double lcl(int m) {
            return m == size ? lcl : center - 3 * sigma / Math.sqrt(m);
        }

        /**
         * @param m a subgroup size (1 for an individual value)
         * @return the upper limit of a point of m values
         */
        public double ucl(int m) {
            return m == size ? ucl : center + 3 * sigma / Math.sqrt(m);
        }

        /**
         * @param m a subgroup size, at least 2
         * @return the sd chart's lower limit for a subgroup of m values, max(0, c₄(m) − 3√(1 − c₄(m)²))·σ̂
         */
        public double sdLcl(int m) {
            double c4 = Capability.c4(m);
            return Math.max(0, (c4 - 3 * Math.sqrt(1 - c4 * c4)) * sigma);
        }

        /**
         * @param m a subgroup size, at least 2
         * @return the sd chart's upper limit for a subgroup of m values, (c₄(m) + 3√(1 − c₄(m)²))·σ̂
         */
        public double sdUcl(int m) {
            double c4 = Capability.c4(m);
            return (c4 + 3 * Math.sqrt(1 - c4 * c4)) * sigma;
        }
    }

    /**
     * A point that completes a pattern of one of the tests.
     *
     * @param test  1 (beyond a limit), 2 (nine in a row on one side), 3 (six in a row rising or falling), 4 (fourteen
     *              in a row alternating up and down), 5 (two of three in a row beyond 2σ̂ on one side), 6 (four of
     *              five in a row beyond 1σ̂ on one side), 7 (fifteen in a row within 1σ̂), 8 (eight in a row beyond
     *              1σ̂ on both sides)
     * @param index the point's 1-based position in its phase's run order
     * @param chart the chart it is on (the spread chart has test 1 only)
     */
    public record Signal(int test, int index, Chart chart) {
        /**
         * A signal on the individuals or means chart.
         *
         * @param test  the test
         * @param index the point's 1-based position
         */
        public Signal(int test, int index) {
            this(test, index, Chart.LOCATION);
        }
    }

    /**
     * One phase judged against limits.
     *
     * @param limits   the limits it is judged against (the before phase's)
     * @param own      the phase's own limits, for comparison
     * @param signals  every point that completes a pattern, in run order (location before spread at a point)
     * @param location the plotted points in run order: the values, or the subgroup means
     * @param spread   the spread chart's points: the moving ranges (the first is NaN), or the subgroup sds (NaN for
     *                 a subgroup of one)
     * @param sizes    each point's number of values (1 for individuals)
     */
    public record Phase(Limits limits, Limits own, List<Signal> signals, double[] location, double[] spread,
            int[] sizes) {
        /** Copies the list and arrays. */
        public Phase {
            signals = List.copyOf(signals);
            location = location.clone();
            spread = spread.clone();
            sizes = sizes.clone();
        }

        @Override
        public double[] location() {
            return location.clone();
        }

        @Override
        public double[] spread() {
            return spread.clone();
        }

        @Override
        public int[] sizes() {
            return sizes.clone();
        }

        /** @return the number of points */
        public int points() {
            return location.length;
        }

        /**
         * @param i a 0-based point
         * @return its value or subgroup mean
         */
        public double point(int i) {
            return location[i];
        }

        /**
         * @param i a 0-based point
         * @return its moving range (NaN for the first) or subgroup sd (NaN for a subgroup of one)
         */
        public double spreadPoint(int i) {
            return spread[i];
        }

        /**
         * @param i a 0-based point
         * @return its number of values
         */
        public int size(int i) {
            return sizes[i];
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Phase p && limits.equals(p.limits) && java.util.Objects.equals(own, p.own)
                    && signals.equals(p.signals) && Arrays.equals(location, p.location)
                    && Arrays.equals(spread, p.spread) && Arrays.equals(sizes, p.sizes);
        }

        @Override
        public int hashCode() {
            return java.util.Objects.hash(limits, own, signals, Arrays.hashCode(location), Arrays.hashCode(spread),
                    Arrays.hashCode(sizes));
        }

        @Override
        public String toString() {
            return "Phase[limits=" + limits + ", own=" + own + ", signals=" + signals + ", points=" + location.length
                    + "]";
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
     * The limits of charts of subgroup means and standard deviations.
     *
     * @param subgroups the subgroups' values, subgroups in run order; at least one subgroup of two or more values
     * @return the limits, stated for the most frequent subgroup size (the smaller one at a tie)
     * @throws StatsException when no subgroup has two values or no subgroup varies
     */
    public static Limits subgroupLimits(double[][] subgroups) {
        CompensatedSum ratio = new CompensatedSum();
        CompensatedSum all = new CompensatedSum();
        int k = 0;
        long n = 0;
        java.util.TreeMap<Integer, Integer> counts = new java.util.TreeMap<>();
        for (double[] g : subgroups) {
            if (g.length == 0) {
                throw new StatsException("a subgroup has no value");
            }
            for (double v : g) {
                all.add(v);
            }
            n += g.length;
            counts.merge(g.length, 1, Integer::sum);
            if (g.length >= 2) {
                ratio.add(Descriptives.of(Sample.of(g)).sd() / Capability.c4(g.length));
                k++;
            }
        }
        if (k == 0) {
            throw new StatsException("charts of subgroup means need at least one subgroup of 2 or more values");
        }
        double sigma = ratio.value() / k;
        if (!(sigma > 0)) {
            throw new StatsException("no subgroup's values differ, so the within-subgroup sd is 0 and no limits exist; "
                    + "check the measurement resolution");
        }
        int size = counts.entrySet().stream().max((a, b) -> a.getValue().equals(b.getValue())
                ? Integer.compare(b.getKey(), a.getKey()) : Integer.compare(a.getValue(), b.getValue())).get().getKey();
        double center = all.value() / n;
        double half = 3 * sigma / Math.sqrt(size);
        double c4 = size >= 2 ? Capability.c4(size) : Double.NaN;
        double spreadLcl = size >= 2 ? Math.max(0, (c4 - 3 * Math.sqrt(1 - c4 * c4)) * sigma) : Double.NaN;
        double spreadUcl = size >= 2 ? (c4 + 3 * Math.sqrt(1 - c4 * c4)) * sigma : Double.NaN;
        return new Limits(Kind.MEANS, size, center, sigma, center - half, center + half, c4 * sigma, spreadLcl,
                spreadUcl);
    }

    /**
     * A phase of individual values judged against limits (the before phase's, for both phases), by tests 1–3.
     *
     * @param x      the phase's values in run order
     * @param limits the limits to judge against
     * @return the phase with its own limits and signals
     */
    public static Phase judge(double[] x, Limits limits) {
        return judge(x, limits, DEFAULT_TESTS);
    }

    /**
     * A phase of individual values judged against limits by the given tests.
     *
     * @param x      the phase's values in run order
     * @param limits the limits to judge against
     * @param tests  the tests to apply
     * @return the phase with its own limits and signals
     */
    public static Phase judge(double[] x, Limits limits, SortedSet<Integer> tests) {
        int[] ones = new int[x.length];
        Arrays.fill(ones, 1);
        double[] mr = new double[x.length];
        mr[0] = Double.NaN;
        for (int i = 1; i < x.length; i++) {
            mr[i] = Math.abs(x[i] - x[i - 1]);
        }
        return new Phase(limits, limits(x), signals(x, ones, limits, tests), x, mr, ones);
    }

    /**
     * A phase of subgroups judged against limits (the before phase's, for both phases): the means by the given
     * tests, the standard deviations by test 1.
     *
     * @param subgroups the subgroups' values, in run order
     * @param limits    the limits to judge against (of kind {@link Kind#MEANS})
     * @param tests     the tests to apply to the means
     * @return the phase with its own limits and signals
     */
    public static Phase judgeSubgroups(double[][] subgroups, Limits limits, SortedSet<Integer> tests) {
        int k = subgroups.length;
        double[] means = new double[k];
        double[] sds = new double[k];
        int[] sizes = new int[k];
        for (int i = 0; i < k; i++) {
            Descriptives d = Descriptives.of(Sample.of(subgroups[i]));
            means[i] = d.mean();
            sds[i] = subgroups[i].length >= 2 ? d.sd() : Double.NaN;
            sizes[i] = subgroups[i].length;
        }
        List<Signal> out = new ArrayList<>(signals(means, sizes, limits, tests));
        for (int i = 0; i < k; i++) {
            if (sizes[i] >= 2 && (sds[i] > limits.sdUcl(sizes[i]) || sds[i] < limits.sdLcl(sizes[i]))) {
                out.add(new Signal(1, i + 1, Chart.SPREAD));
            }
        }
        out.sort(java.util.Comparator.comparingInt(Signal::index).thenComparing(Signal::chart)
                .thenComparingInt(Signal::test));
        return new Phase(limits, subgroupLimits(subgroups), out, means, sds, sizes);
    }

    /**
     * The individual values that complete a pattern of ISO 7870-2 tests 1–3 against the limits.
     *
     * @param x      the values in run order
     * @param limits the limits
     * @return the signals
     * @see #signals(double[], int[], Limits, SortedSet)
     */
    public static List<Signal> signals(double[] x, Limits limits) {
        int[] ones = new int[x.length];
        Arrays.fill(ones, 1);
        return signals(x, ones, limits, DEFAULT_TESTS);
    }

    /**
     * The points that complete a pattern of the given ISO 7870-2 tests against the limits, each point with its own
     * σ̂ᵢ = σ̂/√mᵢ (mᵢ its number of values). Test 1: a point beyond centre ± 3σ̂ᵢ. 2: the ninth and each further
     * point of a run strictly on one side of the centre line (a point on the line ends a run). 3: the sixth and each
     * further point of a run steadily increasing or decreasing (equal neighbours end it). 4: the fourteenth and each
     * further point of a run alternating up and down (equal neighbours end it). 5: a point beyond 2σ̂ᵢ on one side
     * when at least one of the two points before it is beyond 2σ̂ on the same side. 6: a point beyond 1σ̂ᵢ on one side
     * when at least three of the four points before it are beyond 1σ̂ on the same side. 7: the fifteenth and each
     * further point of a run strictly within 1σ̂ of the centre. 8: the eighth and each further point of a run beyond
     * 1σ̂ that has points on both sides of the centre line in its last eight.
     *
     * @param x      the points in run order
     * @param sizes  each point's number of values
     * @param limits the limits
     * @param tests  the tests to apply
     * @return the signals, in run order, by test number at the same point
     */
    public static List<Signal> signals(double[] x, int[] sizes, Limits limits, SortedSet<Integer> tests) {
        int n = x.length;
        double c = limits.center();
        // zone of each point: its side (−1, 0, 1) and whether it lies beyond 1σ̂ᵢ and 2σ̂ᵢ
        int[] side = new int[n];
        boolean[] beyond1 = new boolean[n];
        boolean[] beyond2 = new boolean[n];
        for (int i = 0; i < n; i++) {
            double s = limits.sigma() / Math.sqrt(sizes[i]);
            side[i] = x[i] > c ? 1 : x[i] < c ? -1 : 0;
            beyond1[i] = x[i] > c + s || x[i] < c - s;
            beyond2[i] = x[i] > c + 2 * s || x[i] < c - 2 * s;
        }
        List<Signal> out = new ArrayList<>();
        int sideRun = 0;
        int dir = 0;
        int trend = 1;
        int alternating = 1;
        int hugging = 0;
        int outside = 0;
        for (int i = 0; i < n; i++) {
            if (tests.contains(1) && (x[i] > limits.ucl(sizes[i]) || x[i] < limits.lcl(sizes[i]))) {
                out.add(new Signal(1, i + 1));
            }
            sideRun = side[i] != 0 && i > 0 && side[i] == side[i - 1] ? sideRun + 1 : side[i] != 0 ? 1 : 0;
            if (tests.contains(2) && sideRun >= RUN) {
                out.add(new Signal(2, i + 1));
            }
            int d = 0;
            if (i > 0) {
                d = x[i] > x[i - 1] ? 1 : x[i] < x[i - 1] ? -1 : 0;
                trend = d != 0 && d == dir ? trend + 1 : d != 0 ? 2 : 1;
                alternating = d != 0 && d == -dir ? alternating + 1 : d != 0 ? 2 : 1;
                dir = d;
            }
            if (tests.contains(3) && trend >= TREND) {
                out.add(new Signal(3, i + 1));
            }
            if (tests.contains(4) && alternating >= ALTERNATING) {
                out.add(new Signal(4, i + 1));
            }
            if (tests.contains(5) && beyond2[i] && countSameSide(beyond2, side, i, 2) >= 1) {
                out.add(new Signal(5, i + 1));
            }
            if (tests.contains(6) && beyond1[i] && countSameSide(beyond1, side, i, 4) >= 3) {
                out.add(new Signal(6, i + 1));
            }
            hugging = beyond1[i] ? 0 : hugging + 1;
            if (tests.contains(7) && hugging >= HUGGING) {
                out.add(new Signal(7, i + 1));
            }
            outside = beyond1[i] ? outside + 1 : 0;
            if (tests.contains(8) && outside >= MIXTURE && bothSides(side, i, MIXTURE)) {
                out.add(new Signal(8, i + 1));
            }
        }
        return out;
    }

    /** How many of the {@code back} points before i are flagged on i's side. */
    private static int countSameSide(boolean[] flagged, int[] side, int i, int back) {
        int k = 0;
        for (int j = Math.max(0, i - back); j < i; j++) {
            if (flagged[j] && side[j] == side[i]) {
                k++;
            }
        }
        return k;
    }

    /** Whether the {@code len} points ending at i lie on both sides of the centre line. */
    private static boolean bothSides(int[] side, int i, int len) {
        boolean up = false;
        boolean down = false;
        for (int j = i - len + 1; j <= i; j++) {
            up |= side[j] > 0;
            down |= side[j] < 0;
        }
        return up && down;
    }
}
