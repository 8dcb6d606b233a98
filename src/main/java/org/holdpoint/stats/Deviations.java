package org.holdpoint.stats;

/**
 * Deviations x_i − x̄ of one sample in run order, formed from the exact residuals x_i − r and the residual
 * mean (see {@link Moments}), so that a large common offset costs no digits (Chan, Golub &amp; LeVeque 1983).
 */
final class Deviations {
    private Deviations() {
    }

    /**
     * @param sample the values
     * @return x_i − x̄ for every i, in run order
     */
    static double[] of(Sample sample) {
        Moments.Reference ref = Moments.Reference.common(sample);
        Moments m = Moments.of(sample, ref);
        double[] r = Moments.residuals(sample, ref);
        for (int i = 0; i < r.length; i++) {
            r[i] -= m.meanResidual;
        }
        return r;
    }
}
