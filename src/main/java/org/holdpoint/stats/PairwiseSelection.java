package org.holdpoint.stats;

import java.util.SplittableRandom;

/**
 * The k-th smallest pairwise difference fl(a_i − b_j) or Walsh sum fl(d_i + d_j) (i ≤ j) without
 * building the K values, in O((m + n) log K) time and O(m + n) memory.
 *
 * <p>The values form a virtual matrix whose rows and columns never decrease (rounding is monotone,
 * so this holds for the computed doubles). Each row keeps a window of live columns. Each round counts
 * the live values below and at a pivot with one monotone two-pointer sweep (the count below a pivot
 * never increases from row to row) and keeps only the part that holds rank k. Pivots: two order
 * statistics of a seeded uniform sample of live values that bracket rank k (Floyd &amp; Rivest 1975,
 * CACM 18:165–172), which keeps about 7 % per round; after a round that kept more than three quarters,
 * one round uses the weighted median of the row-window medians, which always drops at least a quarter
 * (Johnson &amp; Mizoguchi 1978, "Selecting the Kth element in X+Y and X1+X2+…+Xm", SIAM J. Comput.
 * 7:147–153; the one-sample form is Monahan 1984, ACM TOMS 10:265–270). The split at a pivot is
 * three-way, so heavy ties end the search at once. Once at most m + n cells are live, a quickselect
 * finishes. All counts are {@code long}; nothing of size K is allocated.
 *
 * <p>Tied values are kept once with their multiplicity ({@link #differences}): a row then stands for as many equal
 * values of the first sample, a column for as many of the second, and every count is a sum of weights
 * (row weight × the columns' weight). Readings at a gauge's resolution repeat a few thousand distinct values over
 * hundreds of thousands of parts, so each round then walks the distinct values instead of every reading. The
 * k-th smallest value of the multiset is the same either way: only the work changes.
 */
abstract class PairwiseSelection {
    /**
     * Rounds stop and a quickselect finishes once at most LIVE_FACTOR·(m + n) values are live; the sampled rounds
     * are cheap, so this is lower than the 8(m + n) of docs/methods.md §5 (measured faster at 10⁵ × 10⁵).
     */
    private static final long LIVE_FACTOR = 1;
    /** Size of the pivot sample per round. */
    private static final int SAMPLE = 8192;
    /** Fixed seed: the result never depends on it, only the running time, which stays reproducible. */
    private static final long SEED = 0x5DEECE66DL;
    final int rows;
    final int cols;
    /** Multiplicity of each row's value, or null when every row is one value. */
    private final long[] rowWeight;
    /** colCum[j] = the weight of the columns before column j (length cols + 1), or null when every column is one. */
    private final long[] colCum;
    private final int[] lo;
    private final int[] hi;
    private final int[] ltCol;
    private final int[] leCol;
    private final int[] lt2Col;
    private final int[] le2Col;
    private final long[] prefix;
    private final double[] sample = new double[SAMPLE];
    private final double[] medians;
    private final long[] weights;
    /** Number of rounds of the last selection (for benchmarks). */
    int lastRounds;
    /** False forces the weighted-median pivot in every round (for tests of that path). */
    boolean samplePivots = true;

    PairwiseSelection(int rows, int cols) {
        this(rows, cols, null, null);
    }

    PairwiseSelection(int rows, int cols, long[] rowWeight, long[] colCum) {
        this.rows = rows;
        this.cols = cols;
        this.rowWeight = rowWeight;
        this.colCum = colCum;
        this.lo = new int[rows];
        this.hi = new int[rows];
        this.ltCol = new int[rows];
        this.leCol = new int[rows];
        this.lt2Col = new int[rows];
        this.le2Col = new int[rows];
        this.prefix = new long[rows + 1];
        this.medians = new double[rows];
        this.weights = new long[rows];
    }

    /** The value in row i, absolute column j. */
    abstract double value(int i, int j);

    /** The first column of row i (0 for differences, i for Walsh sums). */
    abstract int firstColumn(int i);

    /** The weight of row i (the number of equal values it stands for). */
    private long rowW(int i) {
        return rowWeight == null ? 1 : rowWeight[i];
    }

    /** The weight of the columns before column j. */
    private long colAt(int j) {
        return colCum == null ? j : colCum[j];
    }

    /** The number of values in row i, columns [from, to). */
    private long weight(int i, int from, int to) {
        return rowW(i) * (colAt(to) - colAt(from));
    }

    /** @return the number K of values in the matrix */
    long size() {
        long k = 0;
        for (int i = 0; i < rows; i++) {
            k += weight(i, firstColumn(i), cols);
        }
        return k;
    }

    /**
     * The differences fl(a_i − b_j) of two ascending arrays; row i, column j holds a_i − b_{n−1−j}. Equal values
     * (the same bits) of either array are taken once, with their number as weight.
     */
    static PairwiseSelection differences(double[] sortedA, double[] sortedB) {
        Distinct a = Distinct.of(sortedA);
        Distinct b = Distinct.of(sortedB);
        if (a.counts == null && b.counts == null) {
            return new Differences(sortedA, sortedB, null, null);
        }
        int nb = b.values.length;
        long[] colCum = new long[nb + 1];
        for (int j = 0; j < nb; j++) {
            colCum[j + 1] = colCum[j] + (b.counts == null ? 1 : b.counts[nb - 1 - j]);
        }
        return new Differences(a.values, b.values, a.counts, colCum);
    }

    /** The distinct values of an ascending array (by bits, so −0.0 and 0.0 stay apart) and their counts. */
    private record Distinct(double[] values, long[] counts) {
        /** @return the array itself with null counts when no two neighbours are equal */
        static Distinct of(double[] sorted) {
            int distinct = sorted.length == 0 ? 0 : 1;
            for (int i = 1; i < sorted.length; i++) {
                if (Double.doubleToRawLongBits(sorted[i]) != Double.doubleToRawLongBits(sorted[i - 1])) {
                    distinct++;
                }
            }
            if (distinct == sorted.length) {
                return new Distinct(sorted, null);
            }
            double[] values = new double[distinct];
            long[] counts = new long[distinct];
            int d = -1;
            for (int i = 0; i < sorted.length; i++) {
                if (i == 0 || Double.doubleToRawLongBits(sorted[i]) != Double.doubleToRawLongBits(sorted[i - 1])) {
                    values[++d] = sorted[i];
                }
                counts[d]++;
            }
            return new Distinct(values, counts);
        }
    }

    /** The Walsh sums fl(d_i + d_j), i ≤ j, of one ascending array (halve them for the averages). */
    static PairwiseSelection walshSums(double[] sortedD) {
        return new WalshSums(sortedD);
    }

    /**
     * For each row the absolute column of the first value ≥ p (strict = true) or &gt; p, found by one
     * pointer carried down the rows: the count below p never increases from row to row.
     */
    private void sweep(double p, boolean strict, int[] out) {
        int g = cols;
        for (int i = 0; i < rows; i++) {
            int first = firstColumn(i);
            if (g < first) {
                g = first;
            }
            if (g > cols) {
                g = cols;
            }
            if (strict) {
                while (g > first && value(i, g - 1) >= p) {
                    g--;
                }
            } else {
                while (g > first && value(i, g - 1) > p) {
                    g--;
                }
            }
            out[i] = g;
        }
    }

    /** Number of values ≤ p in the whole matrix. */
    long countAtMost(double p) {
        sweep(p, false, leCol);
        long c = 0;
        for (int i = 0; i < rows; i++) {
            c += weight(i, firstColumn(i), leCol[i]);
        }
        return c;
    }

    /** The smallest value &gt; v in the matrix, or NaN if none. */
    double smallestAbove(double v) {
        sweep(v, false, leCol);
        double best = Double.NaN;
        for (int i = 0; i < rows; i++) {
            if (leCol[i] < cols) {
                double x = value(i, leCol[i]);
                if (!(x >= best)) {
                    best = x;
                }
            }
        }
        return best;
    }

    /**
     * The k-th smallest value (1-based) of the matrix.
     *
     * @param k in [1, K]
     * @return that value, exactly one of the computed doubles
     */
    double select(long k) {
        long below = 0;
        if (startLo != null && k >= preparedMin && k <= preparedMax) {
            System.arraycopy(startLo, 0, lo, 0, rows);
            System.arraycopy(startHi, 0, hi, 0, rows);
            below = startBelow;
        } else {
            for (int i = 0; i < rows; i++) {
                lo[i] = firstColumn(i);
                hi[i] = cols;
            }
        }
        long limit = LIVE_FACTOR * ((long) rows + cols);
        lastRounds = 0;
        SplittableRandom rnd = new SplittableRandom(SEED);
        boolean sampled = samplePivots;
        long live = liveCount();
        while (liveCells > limit) {
            lastRounds++;
            double p1;
            double p2;
            if (sampled) {
                double[] pivots = samplePivots(rnd, live, k - below, k - below);
                p1 = pivots[0];
                p2 = pivots[1];
            } else {
                p1 = pivot();
                p2 = p1;
            }
            countWindows(p1, ltCol, leCol);
            long lt1 = countLt;
            long le1 = countLe;
            if (k <= below + lt1) {
                System.arraycopy(ltCol, 0, hi, 0, rows);
            } else if (k <= below + le1) {
                return p1;
            } else {
                if (p2 != p1) {
                    countWindows(p2, lt2Col, le2Col);
                }
                long lt2 = p2 == p1 ? lt1 : countLt;
                long le2 = p2 == p1 ? le1 : countLe;
                if (k <= below + lt2) {
                    // strictly between the two pivots
                    System.arraycopy(leCol, 0, lo, 0, rows);
                    System.arraycopy(lt2Col, 0, hi, 0, rows);
                    below += le1;
                } else if (k <= below + le2) {
                    return p2;
                } else {
                    System.arraycopy(p2 == p1 ? leCol : le2Col, 0, lo, 0, rows);
                    below += le2;
                }
            }
            long next = liveCount();
            // fall back to the guaranteed weighted-median pivot for one round when a sample did poorly
            sampled = samplePivots && (!sampled || next <= live - live / 4);
            live = next;
        }
        return selectFromLive((int) liveCells, k - below);
    }

    /** The window {@link #prepare} left, from which a selection of a rank inside its range starts. */
    private int[] startLo;
    private int[] startHi;
    private long startBelow;
    private long preparedMin;
    private long preparedMax;

    /**
     * Narrows the live windows to values that hold every rank in [kMin, kMax], with sampled pivot pairs
     * bracketing the range, while a round drops at least a quarter; later {@link #select} calls for ranks in the
     * range start from there instead of from the whole matrix. The rank-sum comparison selects its estimate and
     * its interval bounds, whose ranks lie within a small fraction of K of each other, so they share these rounds.
     * The values selected are the same either way (each is the k-th smallest); only the work changes.
     *
     * @param kMin the lowest rank that will be selected (1-based)
     * @param kMax the highest rank that will be selected
     */
    void prepare(long kMin, long kMax) {
        for (int i = 0; i < rows; i++) {
            lo[i] = firstColumn(i);
            hi[i] = cols;
        }
        long below = 0;
        long live = liveCount();
        long limit = LIVE_FACTOR * ((long) rows + cols);
        SplittableRandom rnd = new SplittableRandom(SEED);
        while (liveCells > limit && samplePivots) {
            double[] pivots = samplePivots(rnd, live, kMin - below, kMax - below);
            countWindows(pivots[0], ltCol, leCol);
            long lt1 = countLt;
            countWindows(pivots[1], lt2Col, le2Col);
            long le2 = countLe;
            long next = le2 - lt1;
            if (kMin <= below + lt1 || kMax > below + le2 || next > live - live / 4) {
                break; // the pair missed the range, or the range is too wide to shrink the windows much more
            }
            System.arraycopy(ltCol, 0, lo, 0, rows);
            System.arraycopy(le2Col, 0, hi, 0, rows);
            below += lt1;
            live = liveCount();
        }
        startLo = lo.clone();
        startHi = hi.clone();
        startBelow = below;
        preparedMin = kMin;
        preparedMax = kMax;
    }

    /** Live cells (distinct values) after the last {@link #liveCount}. */
    private long liveCells;

    /** @return the number of live values (sets {@link #liveCells}) */
    private long liveCount() {
        long live = 0;
        long cells = 0;
        boolean unit = rowWeight == null && colCum == null;
        for (int i = 0; i < rows; i++) {
            cells += hi[i] - lo[i];
            if (!unit) {
                live += weight(i, lo[i], hi[i]);
            }
        }
        liveCells = cells;
        return unit ? cells : live;
    }

    /** Live counts of the last {@link #countWindows}: values &lt; p and values ≤ p. */
    private long countLt;
    private long countLe;

    /**
     * Per row the window-clamped columns of the first value ≥ p (into lt) and of the first value &gt; p (into le),
     * in one pass down the rows (the column of the first value ≥ p is never right of that of the first value &gt; p,
     * and both never move right from row to row); sets {@link #countLt} and {@link #countLe}, the live values below.
     */
    private void countWindows(double p, int[] lt, int[] le) {
        int gle = cols;
        int glt = cols;
        long cLt = 0;
        long cLe = 0;
        // without weights a count is a column difference (the loop tests this once per row, always the same way)
        boolean unit = rowWeight == null && colCum == null;
        for (int i = 0; i < rows; i++) {
            int first = firstColumn(i);
            if (gle < first) {
                gle = first;
            }
            if (gle > cols) {
                gle = cols;
            }
            while (gle > first && value(i, gle - 1) > p) {
                gle--;
            }
            if (glt < first) {
                glt = first;
            }
            if (glt > gle) {
                glt = gle;
            }
            while (glt > first && value(i, glt - 1) >= p) {
                glt--;
            }
            int a = clamp(glt, lo[i], hi[i]);
            int b = clamp(gle, lo[i], hi[i]);
            lt[i] = a;
            le[i] = b;
            if (unit) {
                cLt += a - lo[i];
                cLe += b - lo[i];
            } else {
                cLt += weight(i, lo[i], a);
                cLe += weight(i, lo[i], b);
            }
        }
        countLt = cLt;
        countLe = cLe;
    }

    /**
     * Two pivots that bracket the r-th live value with high probability: the order statistics at r/live·s ∓ 3√s
     * of a sorted uniform sample of s live values (Floyd &amp; Rivest 1975, "Expected time bounds for selection",
     * CACM 18:165–172); the kept middle holds about 6/√s of the live values.
     */
    private double[] samplePivots(SplittableRandom rnd, long live, long r, long rHigh) {
        prefix[0] = 0;
        for (int i = 0; i < rows; i++) {
            prefix[i + 1] = prefix[i] + weight(i, lo[i], hi[i]);
        }
        // s ≈ live^(2/3) as Floyd and Rivest suggest, capped
        int size = (int) Math.min(SAMPLE, Math.max(64, Math.pow(live, 2.0 / 3)));
        for (int t = 0; t < size; t++) {
            long pos = rnd.nextLong(live);
            int row = rowOf(pos);
            sample[t] = value(row, columnAt(colAt(lo[row]) + (pos - prefix[row]) / rowW(row), lo[row], hi[row]));
        }
        java.util.Arrays.sort(sample, 0, size);
        double centre = (double) (r - 1) / live * size;
        double centreHigh = (double) (rHigh - 1) / live * size;
        int gap = (int) Math.ceil(3 * Math.sqrt(size));
        int i1 = (int) Math.max(0, Math.floor(centre - gap));
        int i2 = (int) Math.min(size - 1, Math.ceil(centreHigh + gap));
        return new double[] {sample[i1], sample[i2]};
    }

    /** The row whose window holds live position pos: the last row with prefix[row] ≤ pos and a non-empty window. */
    private int rowOf(long pos) {
        return lastAtMost(prefix, pos, 0, rows);
    }

    /** The column of [from, to) that holds column weight position target: the last j with colAt(j) ≤ target. */
    private int columnAt(long target, int from, int to) {
        return colCum == null ? (int) target : lastAtMost(colCum, target, from, to);
    }

    /** The last index j of [from, to) with ascending[j] ≤ key, given ascending[from] ≤ key. */
    private static int lastAtMost(long[] ascending, long key, int from, int to) {
        int a = from;
        int b = to;
        while (b - a > 1) {
            int mid = (a + b) >>> 1;
            if (ascending[mid] <= key) {
                a = mid;
            } else {
                b = mid;
            }
        }
        return a;
    }

    private static int clamp(int v, int min, int max) {
        return v < min ? min : Math.min(v, max);
    }

    /** The weighted median of the row-window medians, weights = window sizes. */
    private double pivot() {
        int r = 0;
        long total = 0;
        for (int i = 0; i < rows; i++) {
            if (hi[i] > lo[i]) {
                // the row window's (weighted) median: at least half its weight lies on either side of it
                long w = colAt(hi[i]) - colAt(lo[i]);
                medians[r] = value(i, columnAt(colAt(lo[i]) + (w - 1) / 2, lo[i], hi[i]));
                weights[r] = rowW(i) * w;
                total += weights[r];
                r++;
            }
        }
        return weightedMedian(medians, weights, r, (total + 1) / 2);
    }

    /** The value at which the cumulative weight (in ascending value order) first reaches target. */
    static double weightedMedian(double[] v, long[] w, int size, long target) {
        int left = 0;
        int right = size - 1;
        long need = target;
        while (true) {
            if (left == right) {
                return v[left];
            }
            double p = v[left + (right - left) / 2];
            // three-way partition of [left, right] into < p, == p, > p
            int lt = left;
            int gt = right;
            int i = left;
            while (i <= gt) {
                if (v[i] < p) {
                    swap(v, w, lt++, i++);
                } else if (v[i] > p) {
                    swap(v, w, i, gt--);
                } else {
                    i++;
                }
            }
            long wLess = 0;
            for (int j = left; j < lt; j++) {
                wLess += w[j];
            }
            long wEq = 0;
            for (int j = lt; j <= gt; j++) {
                wEq += w[j];
            }
            if (need <= wLess) {
                right = lt - 1;
            } else if (need <= wLess + wEq) {
                return p;
            } else {
                need -= wLess + wEq;
                left = gt + 1;
            }
        }
    }

    private static void swap(double[] v, long[] w, int a, int b) {
        double tv = v[a];
        v[a] = v[b];
        v[b] = tv;
        long tw = w[a];
        w[a] = w[b];
        w[b] = tw;
    }

    /** The value of live rank {@code rank} (1-based, in values, not cells) among the {@code cells} live cells. */
    private double selectFromLive(int cells, long rank) {
        double[] buf = new double[cells];
        long[] w = rowWeight == null && colCum == null ? null : new long[cells];
        int c = 0;
        for (int i = 0; i < rows; i++) {
            for (int j = lo[i]; j < hi[i]; j++) {
                if (w != null) {
                    w[c] = weight(i, j, j + 1);
                }
                buf[c++] = value(i, j);
            }
        }
        return w == null ? quickselect(buf, (int) (rank - 1)) : weightedMedian(buf, w, cells, rank);
    }

    /** The element of rank r (0-based) of v, by Hoare's selection with a three-way split; v is permuted. */
    static double quickselect(double[] v, int r) {
        int left = 0;
        int right = v.length - 1;
        while (left < right) {
            double p = median3(v[left], v[left + (right - left) / 2], v[right]);
            int lt = left;
            int gt = right;
            int i = left;
            while (i <= gt) {
                double x = v[i];
                if (x < p) {
                    v[i++] = v[lt];
                    v[lt++] = x;
                } else if (x > p) {
                    v[i] = v[gt];
                    v[gt--] = x;
                } else {
                    i++;
                }
            }
            if (r < lt) {
                right = lt - 1;
            } else if (r > gt) {
                left = gt + 1;
            } else {
                return p;
            }
        }
        return v[left];
    }

    private static double median3(double a, double b, double c) {
        return Math.max(Math.min(a, b), Math.min(Math.max(a, b), c));
    }

    /**
     * The lower median (K/2-th for even K, else the middle) and the upper median ((K/2+1)-th for even
     * K); the upper one follows from the lower v: v itself if #{≤ v} &gt; K/2, else the smallest value
     * above v.
     */
    double[] middlePair() {
        long k = size();
        long lowerRank = (k + 1) / 2;
        double v = select(lowerRank);
        if (k % 2 == 1) {
            return new double[] {v, v};
        }
        double upper = countAtMost(v) > k / 2 ? v : smallestAbove(v);
        return new double[] {v, upper};
    }

    private static final class Differences extends PairwiseSelection {
        private final double[] a;
        private final double[] b;
        private final int nb1;

        Differences(double[] a, double[] b, long[] rowWeight, long[] colCum) {
            super(a.length, b.length, rowWeight, colCum);
            this.a = a;
            this.b = b;
            this.nb1 = b.length - 1;
        }

        @Override
        double value(int i, int j) {
            return a[i] - b[nb1 - j];
        }

        @Override
        int firstColumn(int i) {
            return 0;
        }
    }

    private static final class WalshSums extends PairwiseSelection {
        private final double[] d;

        WalshSums(double[] d) {
            super(d.length, d.length);
            this.d = d;
        }

        @Override
        double value(int i, int j) {
            return d[i] + d[j];
        }

        @Override
        int firstColumn(int i) {
            return i;
        }
    }
}
