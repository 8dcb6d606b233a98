package org.holdpoint.stats;

import java.util.PriorityQueue;
import java.util.function.DoubleUnaryOperator;

/**
 * Globally adaptive 7/15-point Gauss–Kronrod quadrature on a partition of a finite interval, with a
 * bounded amount of work.
 *
 * <p>Each piece is estimated by the 15-point Kronrod rule K15 with error |K15 − G7| against the embedded
 * 7-point Gauss rule (Kronrod 1965; nodes and weights as in QUADPACK's QK15, Piessens et al. 1983). As in
 * QUADPACK's QAG, the piece with the largest error is bisected until the summed error is below the
 * tolerance. A piece whose error has fallen to the rounding noise of its integrand (2e-14 of ∫|f| there)
 * is not split again, and at most 400 bisections are made, so noise can never make the work explode.
 * Since |K15 − G7| bounds the error of the far more accurate K15 only loosely, the achieved accuracy is
 * usually well beyond the request.
 */
final class Quadrature {
    /** The Kronrod abscissae on [−1, 1], the last being 0; the odd-indexed ones are the Gauss nodes. */
    static final double[] XGK = {
        0.991455371120812639206854697526329, 0.949107912342758524526189684047851,
        0.864864423359769072789712788640926, 0.741531185599394439863864773280788,
        0.586087235467691130294144845693013, 0.405845151377397166906606412076961,
        0.207784955007898467600689403773245, 0.0};
    /** The Kronrod weights of {@link #XGK}. */
    static final double[] WGK = {
        0.022935322010529224963732008058970, 0.063092092629978553290700663189204,
        0.104790010322250183839876322541518, 0.140653259715525918745189590510238,
        0.169004726639267902826583426598550, 0.190350578064785409913256402421014,
        0.204432940075298892414161999234649, 0.209482141084727828012999174891714};
    /** Gauss weights of the nodes XGK[1], XGK[3], XGK[5] and XGK[7]. */
    private static final double[] WG = {
        0.129484966168869693270611432679082, 0.279705391489276667901467771423780,
        0.381830050505118944950369775488975, 0.417959183673469387755102040816327};
    private static final int MAX_BISECTIONS = 400;
    private static final double ABSOLUTE_FLOOR = 1e-300;
    private static final double ROUNDOFF = 2e-14;

    private Quadrature() {
    }

    /** One piece [a, b] with its K15 value, error estimate and K15 of |f|. */
    private record Piece(double a, double b, double value, double error, double abs) {
        boolean atNoise() {
            return error <= ROUNDOFF * abs;
        }
    }

    /**
     * ∫ f over [breaks[0], breaks[last]], refined until the summed error estimate is below
     * relTol·|∫ f| (with an absolute floor of 1e-300) or the work bound is reached.
     *
     * @param f      the integrand, finite on the interval
     * @param breaks increasing break points, at least two
     * @param relTol the relative tolerance, e.g. 1e-13
     * @return the integral
     * @throws StatsException when the tolerance is not reached within the work bound
     */
    static double integrate(DoubleUnaryOperator f, double[] breaks, double relTol) {
        PriorityQueue<Piece> open = new PriorityQueue<>((p, q) -> Double.compare(q.error, p.error));
        double value = 0;
        double error = 0;
        double settled = 0;
        for (int i = 0; i + 1 < breaks.length; i++) {
            Piece p = kronrod(f, breaks[i], breaks[i + 1]);
            value += p.value;
            if (p.atNoise()) {
                settled += p.value;
            } else {
                error += p.error;
                open.add(p);
            }
        }
        for (int k = 0; k < MAX_BISECTIONS && !open.isEmpty()
                && error > Math.max(relTol * Math.abs(value), ABSOLUTE_FLOOR); k++) {
            Piece worst = open.poll();
            double mid = 0.5 * (worst.a + worst.b);
            Piece left = kronrod(f, worst.a, mid);
            Piece right = kronrod(f, mid, worst.b);
            value += left.value + right.value - worst.value;
            error -= worst.error;
            for (Piece p : new Piece[] {left, right}) {
                if (p.atNoise()) {
                    settled += p.value;
                } else {
                    error += p.error;
                    open.add(p);
                }
            }
        }
        if (!open.isEmpty() && error > Math.max(relTol * Math.abs(value), ABSOLUTE_FLOOR)) {
            // fail loudly: a result short of its tolerance is never handed on as if it were met
            throw new StatsException("numerical integration did not reach its tolerance %s after %d bisections "
                    + "(estimated relative error %s); the integrand is too rough for this method", relTol,
                    MAX_BISECTIONS, error / Math.max(Math.abs(value), ABSOLUTE_FLOOR));
        }
        // re-add in one pass to avoid the drift of the running update
        double sum = settled;
        for (Piece p : open) {
            sum += p.value;
        }
        return sum;
    }

    private static Piece kronrod(DoubleUnaryOperator f, double a, double b) {
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
        return new Piece(a, b, k * half, Math.abs((k - g) * half), abs * Math.abs(half));
    }
}
