package org.holdpoint.stats;

import java.util.function.DoubleUnaryOperator;

/**
 * Adaptive 7/15-point Gauss–Kronrod quadrature on a partition of a finite interval.
 *
 * <p>Each piece [a, b] is estimated by the 15-point Kronrod rule K15 with error |K15 − G7| against the
 * embedded 7-point Gauss rule (Kronrod 1965; nodes and weights as in QUADPACK's QK15, Piessens et al.
 * 1983) and bisected until that error is below its share of the requested tolerance. Since |K15 − G7|
 * bounds the error of the far more accurate K15 only loosely, the achieved accuracy is usually well
 * beyond the request. A piece whose error estimate has fallen to the rounding noise of its integrand
 * (2e-14 of ∫|f| there) is accepted as it is, as QUADPACK's round-off test does.
 */
final class Quadrature {
    private static final double[] XGK = {
        0.991455371120812639206854697526329, 0.949107912342758524526189684047851,
        0.864864423359769072789712788640926, 0.741531185599394439863864773280788,
        0.586087235467691130294144845693013, 0.405845151377397166906606412076961,
        0.207784955007898467600689403773245, 0.0};
    private static final double[] WGK = {
        0.022935322010529224963732008058970, 0.063092092629978553290700663189204,
        0.104790010322250183839876322541518, 0.140653259715525918745189590510238,
        0.169004726639267902826583426598550, 0.190350578064785409913256402421014,
        0.204432940075298892414161999234649, 0.209482141084727828012999174891714};
    /** Gauss weights of the nodes XGK[1], XGK[3], XGK[5] and XGK[7]. */
    private static final double[] WG = {
        0.129484966168869693270611432679082, 0.279705391489276667901467771423780,
        0.381830050505118944950369775488975, 0.417959183673469387755102040816327};
    private static final int MAX_DEPTH = 30;
    private static final double ABSOLUTE_FLOOR = 1e-300;
    /** A piece is accepted once |K15 − G7| is at the rounding level of its integrand (cf. QUADPACK). */
    private static final double ROUNDOFF = 2e-14;

    private Quadrature() {
    }

    /**
     * ∫ f over [breaks[0], breaks[last]], each piece between consecutive break points refined until the
     * total error estimate is below relTol·|∫ f| (with an absolute floor of 1e-300).
     *
     * @param f      the integrand, finite on the interval
     * @param breaks increasing break points, at least two
     * @param relTol the relative tolerance, e.g. 1e-13
     * @return the integral
     */
    static double integrate(DoubleUnaryOperator f, double[] breaks, double relTol) {
        int pieces = breaks.length - 1;
        double[][] first = new double[pieces][];
        double rough = 0;
        for (int i = 0; i < pieces; i++) {
            first[i] = kronrod(f, breaks[i], breaks[i + 1]);
            rough += first[i][0];
        }
        double width = breaks[pieces] - breaks[0];
        double tol = Math.max(relTol * Math.abs(rough), ABSOLUTE_FLOOR);
        double sum = 0;
        for (int i = 0; i < pieces; i++) {
            double share = tol * (breaks[i + 1] - breaks[i]) / width;
            sum += refine(f, breaks[i], breaks[i + 1], first[i], share, 0);
        }
        return sum;
    }

    private static double refine(DoubleUnaryOperator f, double a, double b, double[] est, double tol, int depth) {
        if (est[1] <= tol || est[1] <= ROUNDOFF * est[2] || depth >= MAX_DEPTH) {
            return est[0];
        }
        double mid = 0.5 * (a + b);
        double[] left = kronrod(f, a, mid);
        double[] right = kronrod(f, mid, b);
        return refine(f, a, mid, left, 0.5 * tol, depth + 1) + refine(f, mid, b, right, 0.5 * tol, depth + 1);
    }

    /** Returns {K15, |K15 − G7|, K15 of |f|} on [a, b]. */
    private static double[] kronrod(DoubleUnaryOperator f, double a, double b) {
        double center = 0.5 * (a + b);
        double half = 0.5 * (b - a);
        double fc = f.applyAsDouble(center);
        double k = fc * WGK[7];
        double g = fc * WG[3];
        double abs = Math.abs(fc) * WGK[7];
        for (int j = 0; j < 7; j++) {
            double dx = half * XGK[j];
            double f1 = f.applyAsDouble(center - dx);
            double f2 = f.applyAsDouble(center + dx);
            double pair = f1 + f2;
            k += WGK[j] * pair;
            abs += WGK[j] * (Math.abs(f1) + Math.abs(f2));
            if (j % 2 == 1) {
                g += WG[j / 2] * pair;
            }
        }
        return new double[] {k * half, Math.abs((k - g) * half), abs * Math.abs(half)};
    }
}
