package org.holdpoint.stats;

import java.util.Arrays;

/**
 * The Shapiro–Wilk W test of normality for 3 ≤ n ≤ 5000 by Royston's algorithm (Shapiro &amp; Wilk 1965,
 * Biometrika 52:591–611; Royston 1992, Stat. Comput. 2:117–119; Royston 1995, "Remark AS R94", Appl. Statist.
 * 44:547–551), in double precision throughout.
 *
 * <p>m_i = Φ⁻¹((i − 3/8)/(n + 1/4)) (Blom 1958, AS 241 quantile); the two outer coefficients are Royston's
 * polynomials in u = 1/√n, the others m_i/√φ. The values are centred on their mean before being divided by the
 * range, and 1 − W = (√(SaaSxx) − Sax)(√(SaaSxx) + Sax)/(SaaSxx) is computed directly. p: n = 3 exact,
 * (6/π)(asin√W − asin√¾); 4 ≤ n ≤ 11 from −ln(γ − ln(1 − W)), γ = −2.273 + 0.459n; n ≥ 12 from ln(1 − W); both
 * as an upper normal tail with Royston's polynomial mean and log-sd.
 */
public final class ShapiroWilk {
    /** The largest n the approximation is valid for. */
    public static final int MAX_N = 5000;
    private static final double[] C1 = {0, 0.221157, -0.147981, -2.07119, 4.434685, -2.706056};
    private static final double[] C2 = {0, 0.042981, -0.293762, -1.752461, 5.682633, -3.582633};
    private static final double[] C3 = {0.544, -0.39978, 0.025054, -6.714e-4};
    private static final double[] C4 = {1.3822, -0.77857, 0.062767, -0.0020322};
    private static final double[] C5 = {-1.5861, -0.31082, -0.083751, 0.0038915};
    private static final double[] C6 = {-0.4803, -0.082676, 0.0030302};

    private ShapiroWilk() {
    }

    /**
     * The Shapiro–Wilk test of one sample.
     *
     * @param sample 3 to 5000 values, not all equal
     * @return W and its p-value
     * @throws StatsException if n is outside 3..5000 or all values are equal
     */
    public static ShapiroWilkResult test(Sample sample) {
        int n = sample.size();
        if (n < 3 || n > MAX_N) {
            throw new StatsException("Shapiro-Wilk is defined for 3 to 5000 values, got %d", n);
        }
        double[] x = sample.values();
        Arrays.sort(x);
        double range = x[n - 1] - x[0];
        if (!(range > 0)) {
            throw new StatsException("all %d values are equal, so Shapiro-Wilk W is undefined", n);
        }
        double[] a = coefficients(n);
        double[] y = Deviations.of(sample);
        Arrays.sort(y);
        double sy = 0;
        for (int i = 0; i < n; i++) {
            y[i] /= range;
            sy += y[i];
        }
        sy /= n;
        double saa = 0;
        double syy = 0;
        double say = 0;
        for (int i = 0; i < n; i++) {
            double ai = coefficient(a, i, n);
            double yi = y[i] - sy;
            saa += ai * ai;
            syy += yi * yi;
            say += ai * yi;
        }
        double root = Math.sqrt(saa * syy);
        double w1 = (root - say) * (root + say) / (saa * syy);
        double w = 1 - w1;
        return new ShapiroWilkResult(n, w, pValue(n, w, w1));
    }

    /** The full antisymmetric coefficient a_i (0-based i) from the upper-half values a[1..n/2]. */
    private static double coefficient(double[] a, int i, int n) {
        int j = n - 1 - i;
        if (i == j) {
            return 0;
        }
        return i < j ? -a[i + 1] : a[j + 1];
    }

    /**
     * The upper-half coefficients a[1..n/2] (a[1] for the extreme pair) of AS R94, 1-based, positive.
     *
     * @param n sample size, 3..5000
     * @return the array, index 0 unused
     */
    static double[] coefficients(int n) {
        int half = n / 2;
        double[] a = new double[half + 1];
        if (n == 3) {
            a[1] = Math.sqrt(0.5);
            return a;
        }
        double an25 = n + 0.25;
        double summ2 = 0;
        for (int i = 1; i <= half; i++) {
            a[i] = Normal.quantile((i - 0.375) / an25);
            summ2 += a[i] * a[i];
        }
        summ2 *= 2;
        double ssumm2 = Math.sqrt(summ2);
        double rsn = 1 / Math.sqrt(n);
        double a1 = poly(C1, rsn) - a[1] / ssumm2;
        int first;
        double fac;
        if (n > 5) {
            first = 3;
            double a2 = -a[2] / ssumm2 + poly(C2, rsn);
            fac = Math.sqrt((summ2 - 2 * (a[1] * a[1]) - 2 * (a[2] * a[2])) / (1 - 2 * (a1 * a1) - 2 * (a2 * a2)));
            a[2] = a2;
        } else {
            first = 2;
            fac = Math.sqrt((summ2 - 2 * (a[1] * a[1])) / (1 - 2 * (a1 * a1)));
        }
        a[1] = a1;
        for (int i = first; i <= half; i++) {
            a[i] /= -fac;
        }
        return a;
    }

    private static double pValue(int n, double w, double w1) {
        if (n == 3) {
            double p = 6 / Math.PI * (Math.asin(Math.sqrt(w)) - Math.PI / 3);
            return Math.max(0, Math.min(1, p));
        }
        double y = Math.log(w1);
        double m;
        double s;
        if (n <= 11) {
            double gamma = -2.273 + 0.459 * n;
            if (y >= gamma) {
                return 1e-99;
            }
            y = -Math.log(gamma - y);
            m = poly(C3, n);
            s = Math.exp(poly(C4, n));
        } else {
            double ln = Math.log(n);
            m = poly(C5, ln);
            s = Math.exp(poly(C6, ln));
        }
        return Normal.cdf(-(y - m) / s);
    }

    /** c[0] + c[1]x + c[2]x² + … by Horner's rule. */
    private static double poly(double[] c, double x) {
        double r = 0;
        for (int i = c.length - 1; i >= 0; i--) {
            r = r * x + c[i];
        }
        return r;
    }
}
