package org.holdpoint.stats;

/**
 * The Anderson–Darling test of normality with mean and sd estimated from the data (Anderson &amp; Darling
 * 1952, Ann. Math. Stat. 23:193–212; 1954, JASA 49:765–769; Stephens 1974, JASA 69:730–737), for n ≥ 8.
 *
 * <p>z_(i) = (x_(i) − x̄)/s (divisor n − 1) and A² = −n − (1/n)Σ(2i − 1)[ln Φ(z_(i)) + ln Φ(−z_(n+1−i))], with
 * ln(1 − Φ(z)) taken as ln Φ(−z) and the asymptotic series where Φ underflows. The p-value comes from
 * AA = A²(1 + 0.75/n + 2.25/n²) by the piecewise exponential fit of D'Agostino &amp; Stephens (1986,
 * Goodness-of-Fit Techniques, Table 4.9): 1 − exp(−13.436 + 101.14AA − 223.73AA²) below 0.2,
 * 1 − exp(−8.318 + 42.796AA − 59.938AA²) below 0.34, exp(0.9177 − 4.279AA − 1.38AA²) below 0.6,
 * exp(1.2937 − 5.709AA + 0.0186AA²) below 10, and 3.7e-24 beyond.
 */
public final class AndersonDarling {
    /** The smallest n the test is computed for. */
    public static final int MIN_N = 8;

    private AndersonDarling() {
    }

    /**
     * The Anderson–Darling normality test of one sample.
     *
     * @param sample at least 8 values, not all equal
     * @return A², adjusted A² and p
     * @throws StatsException if n &lt; 8 or the sd is zero
     */
    public static AndersonDarlingResult test(Sample sample) {
        int n = sample.size();
        if (n < MIN_N) {
            throw new StatsException("Anderson-Darling needs at least 8 values, got %d", n);
        }
        Descriptives d = Descriptives.of(sample);
        if (!(d.sd() > 0)) {
            throw new StatsException("all %d values are equal, so Anderson-Darling A2 is undefined", n);
        }
        double[] z = Deviations.ofSorted(sample);
        for (int i = 0; i < n; i++) {
            z[i] /= d.sd();
        }
        // ln Φ(z_(i)) in place of z_(i), ln Φ(−z_(i)) beside it: both from the one tail Φ(−|z|), computed once per
        // value (the sum needs both for every value: the first at i, the second at n + 1 − i)
        // equal readings (a gauge's resolution: a few thousand distinct values in half a million) have equal z: the
        // logarithms of the previous value are taken again, the same doubles without evaluating Φ once more
        double[] upper = new double[n];
        long previous = 0;
        for (int j = 0; j < n; j++) {
            long bits = Double.doubleToRawLongBits(z[j]);
            if (j > 0 && bits == previous) {
                z[j] = z[j - 1];
                upper[j] = upper[j - 1];
            } else {
                previous = bits;
                logPhiBoth(z, upper, j);
            }
        }
        double sum = 0;
        for (int i = 0; i < n; i++) {
            sum += (2.0 * i + 1) * (z[i] + upper[n - 1 - i]);
        }
        double a2 = -n - sum / n;
        double aa = a2 * (1 + 0.75 / n + 2.25 / ((double) n * n));
        return new AndersonDarlingResult(n, a2, aa, pValue(aa));
    }

    /**
     * Replaces {@code z[j]} by ln Φ(z[j]) and sets {@code upper[j]} to ln Φ(−z[j]), each exactly as {@link #logPhi}
     * gives it, with Φ evaluated once: both logarithms are of the one tail Φ(−|z|) (one as ln, the other as log1p of
     * its negative), except beyond the asymptotic series' bound, where that side is taken from the series.
     */
    static void logPhiBoth(double[] z, double[] upper, int j) {
        double x = z[j];
        if (x > 0) {
            double tail = Normal.cdf(-x);
            z[j] = Math.log1p(-tail);
            upper[j] = -x > Normal.SERIES_BELOW ? Math.log(tail) : Normal.logCdf(-x);
        } else if (x > Normal.SERIES_BELOW) {
            double tail = Normal.cdf(x);
            z[j] = Math.log(tail);
            // at x = ±0, −x > 0 is false and ln Φ(−x) is ln Φ(0) = ln(tail)
            upper[j] = -x > 0 ? Math.log1p(-tail) : Math.log(tail);
        } else {
            upper[j] = Math.log1p(-Normal.cdf(x));
            z[j] = Normal.logCdf(x);
        }
    }

    /** ln Φ(z), as log1p(−Φ(−z)) for z &gt; 0 so that the upper side keeps its digits. */
    static double logPhi(double z) {
        return z > 0 ? Math.log1p(-Normal.cdf(-z)) : Normal.logCdf(z);
    }

    /** The D'Agostino–Stephens p-value of the adjusted statistic AA. */
    static double pValue(double aa) {
        double p;
        if (aa < 0.2) {
            p = -Math.expm1(-13.436 + 101.14 * aa - 223.73 * aa * aa);
        } else if (aa < 0.34) {
            p = -Math.expm1(-8.318 + 42.796 * aa - 59.938 * aa * aa);
        } else if (aa < 0.6) {
            p = Math.exp(0.9177 - 4.279 * aa - 1.38 * aa * aa);
        } else if (aa < 10) {
            p = Math.exp(1.2937 - 5.709 * aa + 0.0186 * aa * aa);
        } else {
            p = 3.7e-24;
        }
        return Math.max(0, Math.min(1, p));
    }
}
