package org.holdpoint.stats;

/**
 * Lag-1 autocorrelation of one group in run order with its approximate tests of independence (the output labels
 * them "approximate").
 *
 * @param n          number of values
 * @param r1         Σ_{i&lt;n}(x_i − x̄)(x_{i+1} − x̄)/Σ(x_i − x̄)², the NIST StRD definition
 * @param zBartlett  r1·√n (Bartlett 1946: r1 ≈ N(0, 1/n))
 * @param pBartlett  2Φ(−|zBartlett|)
 * @param zRefined   (r1 + 1/n)/√((n−2)²/(n²(n−1))), with E r1 = −1/n and the normal-theory variance
 * @param pRefined   2Φ(−|zRefined|)
 */
public record Lag1Result(int n, double r1, double zBartlett, double pBartlett, double zRefined, double pRefined) {

    /** Validates the record. */
    public Lag1Result {
        if (n < 3 || !(Math.abs(r1) <= 1 + 1e-12) || !(pBartlett >= 0 && pBartlett <= 1)
                || !(pRefined >= 0 && pRefined <= 1)) {
            throw new StatsException("invalid lag-1 result: n = %d, r1 = %s", n, r1);
        }
    }
}
