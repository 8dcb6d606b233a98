package org.holdpoint.stats;

import java.math.BigDecimal;
import java.util.Arrays;

/**
 * One group's measured values in their input (run) order, immutable.
 *
 * <p>Each value is the correctly rounded binary64 of its decimal text. When the decimals are known
 * exactly (as unscaled integers at one common scale) the sample keeps them too, so that moments can
 * be computed from exact decimal residuals (see {@link Descriptives}); otherwise only the doubles are
 * kept. −0.0 is normalised to 0.0 and NaN or infinite values are rejected.
 */
public final class Sample {
    private static final long MAX_EXACT = 1L << 53;
    private static final double[] POW10 = new double[23];

    static {
        double p = 1;
        for (int i = 0; i < POW10.length; i++) {
            POW10[i] = p;
            p *= 10;
        }
    }

    private final double[] values;
    private final long[] unscaled;
    private final int scale;
    /** The values in ascending order, computed once on first use. */
    private volatile double[] sorted;
    /** With exact decimals, the unscaled integers in ascending order (written before {@link #sorted}). */
    private long[] sortedUnscaled;
    /** {reference, moments}: the last moments computed (Moments.of); replaced whole, so a reader sees a pair. */
    private volatile Object[] momentsMemo;
    /** {other sample, reference}: the last pair reference computed with this sample first. */
    private volatile Object[] pairMemo;
    /** The reference of this sample alone, once computed. */
    private volatile Moments.Reference ownReference;

    private Sample(double[] values, long[] unscaled, int scale) {
        this.values = values;
        this.unscaled = unscaled;
        this.scale = scale;
    }

    /**
     * A sample of binary64 values (no exact decimals known).
     *
     * @param values the values in run order; copied
     * @return the sample
     * @throws StatsException if a value is NaN or infinite
     */
    public static Sample of(double... values) {
        return ofTaken(values.clone());
    }

    /**
     * As {@link #of(double...)}, keeping the given array instead of a copy (its values are checked and −0.0 made
     * 0.0 in place); for arrays made by this package and not used otherwise afterwards.
     */
    static Sample ofTaken(double[] values) {
        for (int i = 0; i < values.length; i++) {
            values[i] = checkFinite(values[i], i) + 0.0;
        }
        return new Sample(values, null, 0);
    }

    /**
     * A sample parsed from decimal texts; the exact decimals are kept when they fit a common scale.
     *
     * @param texts decimal numbers such as {@code "10000000.2"} or {@code "-1.5E-3"}
     * @return the sample
     * @throws StatsException if a text is not a finite decimal number
     */
    public static Sample ofDecimals(String... texts) {
        BigDecimal[] decimals = new BigDecimal[texts.length];
        for (int i = 0; i < texts.length; i++) {
            try {
                decimals[i] = new BigDecimal(texts[i].trim());
            } catch (NumberFormatException e) {
                throw new StatsException("value %d (\"%s\") is not a decimal number", i + 1, texts[i]);
            }
        }
        return ofDecimals(decimals);
    }

    /**
     * A sample of exact decimals; the doubles are their correctly rounded values.
     *
     * @param decimals the values in run order
     * @return the sample
     */
    public static Sample ofDecimals(BigDecimal... decimals) {
        int commonScale = 0;
        for (BigDecimal d : decimals) {
            commonScale = Math.max(commonScale, d.scale());
        }
        double[] doubles = new double[decimals.length];
        long[] units = commonScale <= 18 ? new long[decimals.length] : null;
        for (int i = 0; i < decimals.length; i++) {
            doubles[i] = checkFinite(decimals[i].doubleValue(), i) + 0.0;
            if (units != null) {
                try {
                    units[i] = decimals[i].setScale(commonScale).unscaledValue().longValueExact();
                } catch (ArithmeticException e) {
                    units = null;
                }
            }
        }
        return new Sample(doubles, units, units == null ? 0 : commonScale);
    }

    /**
     * A sample of exact decimals given as unscaled integers at one scale (value = unscaled·10^−scale),
     * the fast door used by the importers; the doubles are computed correctly rounded.
     *
     * @param unscaled the unscaled integers, copied
     * @param scale    the common number of decimal places, 0..18
     * @return the sample
     */
    public static Sample ofUnscaled(long[] unscaled, int scale) {
        return ofUnscaledTaken(unscaled.clone(), scale);
    }

    /**
     * As {@link #ofUnscaled}, but the sample keeps the given array instead of a copy (an importer that has just
     * made the array saves a copy of every value); the caller must not change the array afterwards.
     *
     * @param units the unscaled integers, taken over by the sample
     * @param scale the common number of decimal places, 0..18
     * @return the sample
     */
    public static Sample ofUnscaledTaken(long[] units, int scale) {
        if (scale < 0 || scale > 18) {
            throw new StatsException("decimal scale must lie in 0..18, got %d", scale);
        }
        double[] doubles = new double[units.length];
        toDoubles(units, 1, 0, scale, doubles);
        return new Sample(doubles, units, scale);
    }

    /**
     * The correctly rounded double of unscaled·10^−scale: one IEEE division of exact operands when
     * |unscaled| &lt; 2⁵³ (Clinger 1990, the fast path), otherwise through {@link BigDecimal}.
     */
    static double toDouble(long unscaled, int scale) {
        if (Math.abs(unscaled) < MAX_EXACT && scale < POW10.length) {
            return scale == 0 ? (double) unscaled : (double) unscaled / POW10[scale];
        }
        return BigDecimal.valueOf(unscaled, scale).doubleValue();
    }

    /**
     * out[i] = {@link #toDouble}(units[i]·factor − offset, scale) for every i (the caller keeps the products within
     * the long range): the same doubles, through a table of each integer's double when many values span a narrow
     * range, otherwise with the power of ten read once and an integer equal to the one before it taking that one's
     * double (sorted readings at a gauge's resolution repeat a few thousand values).
     */
    static void toDoubles(long[] units, long factor, long offset, int scale, double[] out) {
        if (units.length >= TABLE_FROM) {
            long min = Long.MAX_VALUE;
            long max = Long.MIN_VALUE;
            for (long u : units) {
                min = Math.min(min, u);
                max = Math.max(max, u);
            }
            long range = max - min;
            if (range >= 0 && range < TABLE_MAX && range < units.length / 4) {
                // a narrow range (readings at a gauge's resolution): each integer in it converted once, then looked
                // up (in the values' own order a division per value was most of a pass's time)
                double[] table = new double[(int) range + 1];
                for (int k = 0; k < table.length; k++) {
                    table[k] = toDouble((min + k) * factor - offset, scale);
                }
                for (int i = 0; i < units.length; i++) {
                    out[i] = table[(int) (units[i] - min)];
                }
                return;
            }
        }
        double p = scale < POW10.length ? POW10[scale] : Double.NaN;
        boolean fast = scale < POW10.length;
        long previous = 0;
        for (int i = 0; i < units.length; i++) {
            long u = units[i] * factor - offset;
            if (i > 0 && u == previous) {
                out[i] = out[i - 1];
            } else {
                // the fast path of toDouble, inline; at scale 0 the division by 1.0 is exact, as its cast is
                out[i] = fast && Math.abs(u) < MAX_EXACT ? u / p : toDouble(u, scale);
                previous = u;
            }
        }
    }

    /** From this many values a narrow range of integers is converted through a table ({@link #toDoubles}). */
    static final int TABLE_FROM = 4096;
    /** The widest range of integers converted through a table (64 K doubles, 512 KB). */
    private static final long TABLE_MAX = 1 << 16;

    private static double checkFinite(double v, int index) {
        if (Double.isNaN(v) || Double.isInfinite(v)) {
            throw new StatsException("value %d is not a finite number (%s)", index + 1, v);
        }
        return v;
    }

    Object[] momentsMemo() {
        return momentsMemo;
    }

    void momentsMemo(Object[] m) {
        momentsMemo = m;
    }

    Moments.Reference ownReference() {
        return ownReference;
    }

    void ownReference(Moments.Reference r) {
        ownReference = r;
    }

    Object[] pairMemo() {
        return pairMemo;
    }

    void pairMemo(Object[] m) {
        pairMemo = m;
    }

    /** @return the number of values */
    public int size() {
        return values.length;
    }

    /**
     * @param i the 0-based position in run order
     * @return the value at that position
     */
    public double value(int i) {
        return values[i];
    }

    /** @return a copy of the values in run order */
    public double[] values() {
        return values.clone();
    }

    /** @return the values without copying; callers in this package must not modify them */
    double[] raw() {
        return values;
    }

    /**
     * The exact decimal of one value when known, else the shortest decimal that reads back as the double.
     *
     * @param i the 0-based position
     * @return the decimal
     */
    public BigDecimal decimal(int i) {
        return unscaled != null ? BigDecimal.valueOf(unscaled[i], scale) : BigDecimal.valueOf(values[i]);
    }

    /**
     * The values in ascending order, sorted once and shared; callers in this package must not modify
     * the array (copy it first).
     *
     * @return the sorted values
     */
    double[] sorted() {
        double[] s = sorted;
        if (s == null) {
            // two threads asking at once (the rank comparison runs beside the other methods) sort once
            synchronized (this) {
                s = sorted;
                if (s == null) {
                    if (unscaled != null) {
                        // the integers sorted, their doubles then in the same order (the correctly rounded double
                        // is a non-decreasing function of the decimal): the same array as the doubles sorted, and
                        // the sorted decimals come with it
                        long[] su = unscaled.clone();
                        sortIntegers(su);
                        s = new double[su.length];
                        toDoubles(su, 1, 0, scale, s);
                        sortedUnscaled = su;
                    } else {
                        s = values.clone();
                        Arrays.sort(s);
                    }
                    sorted = s;
                }
            }
        }
        return s;
    }

    /** Values from which integers in a narrow range are sorted by counting (below it the library's sort is quick). */
    private static final int COUNTING_FROM = 1024;
    /** The widest range (largest − smallest) sorted by counting: a count array of at most 16 MB. */
    private static final long COUNTING_MAX_RANGE = 1L << 22;

    /**
     * Sorts integers ascending. Readings at a gauge's resolution lie in a narrow range (a few thousand steps for
     * half a million values): those are counted per value and written back in order, one pass each way instead of
     * a comparison sort; a wide range (more than four steps per value, or more than 2²² steps) goes to
     * {@link Arrays#sort(long[])}. The result is the same array either way.
     *
     * @param v the integers, sorted in place
     */
    static void sortIntegers(long[] v) {
        int n = v.length;
        if (n < COUNTING_FROM) {
            Arrays.sort(v);
            return;
        }
        long min = v[0];
        long max = v[0];
        for (long x : v) {
            min = Math.min(min, x);
            max = Math.max(max, x);
        }
        long range = max - min;
        // a negative range is a difference beyond the long range: not narrow
        if (range < 0 || range >= Math.min(4L * n, COUNTING_MAX_RANGE)) {
            Arrays.sort(v);
            return;
        }
        int[] count = new int[(int) range + 1];
        for (long x : v) {
            count[(int) (x - min)]++;
        }
        int k = 0;
        for (int i = 0; i < count.length; i++) {
            for (int c = count[i]; c > 0; c--) {
                v[k++] = min + i;
            }
        }
    }

    /**
     * The unscaled decimals in ascending order, in the order of {@link #sorted()}; callers in this package must not
     * modify the array.
     *
     * @return the sorted unscaled integers, or null without exact decimals
     */
    long[] sortedUnscaled() {
        sorted();
        return sortedUnscaled;
    }

    /** @return whether exact decimals are known for every value */
    public boolean hasExactDecimals() {
        return unscaled != null;
    }

    /** @return the unscaled decimals (not copied) or null; package use only */
    long[] unscaled() {
        return unscaled;
    }

    /** @return the common decimal scale of {@link #unscaled()} */
    int scale() {
        return scale;
    }

    /**
     * The sample without the values at the given 0-based positions (for user exclusions).
     *
     * @param excluded positions to leave out
     * @return a new sample, run order kept
     */
    public Sample without(int... excluded) {
        boolean[] drop = new boolean[values.length];
        for (int i : excluded) {
            if (i < 0 || i >= values.length) {
                throw new StatsException("position %d is outside the sample of %d values", i, values.length);
            }
            drop[i] = true;
        }
        int kept = 0;
        for (boolean d : drop) {
            kept += d ? 0 : 1;
        }
        double[] v = new double[kept];
        long[] u = unscaled == null ? null : new long[kept];
        int k = 0;
        for (int i = 0; i < values.length; i++) {
            if (!drop[i]) {
                v[k] = values[i];
                if (u != null) {
                    u[k] = unscaled[i];
                }
                k++;
            }
        }
        return new Sample(v, u, scale);
    }

    @Override
    public String toString() {
        return "Sample" + Arrays.toString(values.length > 10 ? Arrays.copyOf(values, 10) : values)
                + (values.length > 10 ? "… (" + values.length + ")" : "");
    }
}
