package org.holdpoint.stats;

/**
 * Neumaier's improved Kahan summation (Neumaier 1974, ZAMM 54:39–51), added to term by term: the one compensated
 * sum of the numerics (docs/methods.md §1).
 */
final class CompensatedSum {
    private double sum;
    private double c;

    /**
     * @param v the next term
     */
    void add(double v) {
        double t = sum + v;
        c += Math.abs(sum) >= Math.abs(v) ? (sum - t) + v : (v - t) + sum;
        sum = t;
    }

    /** @return the sum with its compensation */
    double value() {
        return sum + c;
    }

    /**
     * @param x the terms
     * @return their compensated sum
     */
    static double of(double[] x) {
        CompensatedSum s = new CompensatedSum();
        for (double v : x) {
            s.add(v);
        }
        return s.value();
    }
}
