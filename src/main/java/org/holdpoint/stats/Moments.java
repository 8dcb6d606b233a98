package org.holdpoint.stats;

import java.math.BigDecimal;

/**
 * First and second moments of one group, computed on residuals from a reference shared by every
 * group of a comparison, so that the mean difference and the variance keep their digits even when
 * the values carry a large common offset.
 *
 * <p>Residuals: with exact decimals known, x − r is formed exactly in integer arithmetic at a common
 * scale and converted with one correctly rounded division; otherwise r is a double and x − r is
 * exact whenever x and r lie within a factor 2 (Sterbenz 1974). The mean is a Neumaier-compensated
 * sum refined once (Neumaier 1974; Higham 2002, ch. 4); the sum of squares is the corrected
 * two-pass formula Σd² − (Σd)²/n (Chan, Golub &amp; LeVeque 1983, Am. Statist. 37:242–247).
 */
final class Moments {
    final int n;
    /** Mean of the residuals x − reference. */
    final double meanResidual;
    /** Σ(x − x̄)², corrected two-pass. */
    final double sumSquares;
    /** The exact reference r. */
    final BigDecimal reference;

    private Moments(int n, double meanResidual, double sumSquares, BigDecimal reference) {
        this.n = n;
        this.meanResidual = meanResidual;
        this.sumSquares = sumSquares;
        this.reference = reference;
    }

    /** The mean x̄ = r + mean residual, rounded once from the exact sum. */
    double mean() {
        return reference.add(new BigDecimal(meanResidual)).doubleValue();
    }

    /** The sample variance s² with divisor n − 1 (NaN for n &lt; 2). */
    double variance() {
        return n < 2 ? Double.NaN : sumSquares / (n - 1);
    }

    /** The reference common to a set of samples: exact decimal when every sample has decimals. */
    static final class Reference {
        final boolean decimal;
        final int scale;
        final long unscaled;
        final double value;

        private Reference(boolean decimal, int scale, long unscaled, double value) {
            this.decimal = decimal;
            this.scale = scale;
            this.unscaled = unscaled;
            this.value = value;
        }

        BigDecimal exact() {
            return decimal ? BigDecimal.valueOf(unscaled, scale) : new BigDecimal(value);
        }

        @Override
        public boolean equals(Object o) {
            return o instanceof Reference r && r.decimal == decimal && r.scale == scale && r.unscaled == unscaled
                    && Double.compare(r.value, value) == 0;
        }

        @Override
        public int hashCode() {
            return java.util.Objects.hash(decimal, scale, unscaled, value);
        }

        /**
         * The reference of a pair of samples, kept with the first one: every test of a characteristic asks for it
         * again, and finding it is a pass over both samples.
         */
        static Reference common(Sample a, Sample b) {
            Object[] memo = a.pairMemo();
            if (memo != null && memo[0] == b) {
                return (Reference) memo[1];
            }
            Reference r = common(new Sample[] {a, b});
            a.pairMemo(new Object[] {b, r});
            return r;
        }

        /** The reference of one sample, kept with it. */
        static Reference common(Sample a) {
            Reference r = a.ownReference();
            if (r == null) {
                r = common(new Sample[] {a});
                a.ownReference(r);
            }
            return r;
        }

        /** The first value of the first non-empty sample, exact decimal when all samples allow it. */
        static Reference common(Sample... samples) {
            Sample first = null;
            int scale = 0;
            boolean decimal = true;
            for (Sample s : samples) {
                if (first == null && s.size() > 0) {
                    first = s;
                }
                decimal &= s.hasExactDecimals();
                scale = Math.max(scale, s.scale());
            }
            if (first == null) {
                return new Reference(false, 0, 0, 0);
            }
            if (decimal) {
                long u = rescale(first.unscaled()[0], scale - first.scale());
                if (u != Long.MIN_VALUE && fitsAll(samples, scale, u)) {
                    return new Reference(true, scale, u, first.value(0));
                }
            }
            return new Reference(false, 0, 0, first.value(0));
        }

        private static boolean fitsAll(Sample[] samples, int scale, long ref) {
            for (Sample s : samples) {
                long[] u = s.unscaled();
                int up = scale - s.scale();
                for (long v : u) {
                    long r = rescale(v, up);
                    if (r == Long.MIN_VALUE) {
                        return false;
                    }
                    long diff = r - ref;
                    if (((r ^ ref) & (r ^ diff)) < 0) {
                        return false;
                    }
                }
            }
            return true;
        }
    }

    /** v·10^up, or Long.MIN_VALUE on overflow. */
    static long rescale(long v, int up) {
        long r = v;
        for (int i = 0; i < up; i++) {
            long next = r * 10;
            if (next / 10 != r || next == Long.MIN_VALUE) {
                return Long.MIN_VALUE;
            }
            r = next;
        }
        return r;
    }

    /** The residuals x_i − r of a sample, as doubles. */
    static double[] residuals(Sample s, Reference ref) {
        return residuals(s.unscaled(), s.raw(), s.scale(), ref);
    }

    /**
     * The residuals of a sample's values in ascending order: the same values as {@link #residuals(Sample,
     * Reference)} sorted, without sorting them (a residual is a non-decreasing function of the value: an exact
     * integer difference correctly rounded, or a correctly rounded binary difference).
     */
    static double[] sortedResiduals(Sample s, Reference ref) {
        double[] sorted = s.sorted();
        return residuals(s.sortedUnscaled(), sorted, s.scale(), ref);
    }

    private static double[] residuals(long[] u, double[] x, int sampleScale, Reference ref) {
        int n = x.length;
        double[] d = new double[n];
        if (ref.decimal) {
            int up = ref.scale - sampleScale;
            long factor = 1;
            for (int i = 0; i < up; i++) {
                factor *= 10;
            }
            Sample.toDoubles(u, factor, ref.unscaled, ref.scale, d);
        } else {
            for (int i = 0; i < n; i++) {
                d[i] = x[i] - ref.value;
            }
        }
        return d;
    }

    static Moments of(Sample s, Reference ref) {
        // kept with the sample: a characteristic's tests ask for the same moments again and again, and each is a
        // pass over every value (a large part of the analysis of a million values)
        Object[] memo = s.momentsMemo();
        if (memo != null && ref.equals(memo[0])) {
            return (Moments) memo[1];
        }
        Moments m = compute(s, ref);
        s.momentsMemo(new Object[] {ref, m});
        return m;
    }

    private static Moments compute(Sample s, Reference ref) {
        double[] r = residuals(s, ref);
        int n = r.length;
        if (n == 0) {
            return new Moments(0, Double.NaN, Double.NaN, ref.exact());
        }
        double m1 = neumaierSum(r) / n;
        double correction = 0;
        for (double v : r) {
            correction += v - m1;
        }
        double m = m1 + correction / n;
        double sumD = 0;
        double sumD2 = 0;
        for (double v : r) {
            double dv = v - m;
            sumD += dv;
            sumD2 += dv * dv;
        }
        double ss = Math.max(0, sumD2 - sumD * sumD / n);
        return new Moments(n, m, ss, ref.exact());
    }

    /** Neumaier's improved Kahan summation (Neumaier 1974, ZAMM 54:39–51). */
    static double neumaierSum(double[] x) {
        return CompensatedSum.of(x);
    }
}
