package org.holdpoint.stats;

/**
 * Holm's step-down adjustment of m p-values (Holm 1979, "A simple sequentially rejective multiple test procedure",
 * Scand. J. Statist. 6:65–70): with p_(1) ≤ … ≤ p_(m), p̃_(i) = max_{j≤i} min(1, (m − j + 1)·p_(j)), mapped back to
 * input order (ties keep input order); equal to R's {@code p.adjust(p, method = "holm")}. It is meant for the
 * two-sided difference p-values, never for equivalence decisions (those are an intersection–union test and need
 * no adjustment, Berger 1982).
 */
public final class Holm {
    private Holm() {
    }

    /**
     * The Holm-adjusted p-values.
     *
     * @param p the p-values, each in [0, 1]; not modified
     * @return the adjusted values in input order
     * @throws StatsException if a value is not a probability
     */
    public static double[] adjust(double[] p) {
        int m = p.length;
        for (int i = 0; i < m; i++) {
            if (!(p[i] >= 0 && p[i] <= 1)) {
                throw new StatsException("p-value %d is not a probability (%s)", i + 1, p[i]);
            }
        }
        Integer[] order = new Integer[m];
        for (int i = 0; i < m; i++) {
            order[i] = i;
        }
        // stable sort: ties keep input order
        java.util.Arrays.sort(order, (x, y) -> Double.compare(p[x], p[y]));
        double[] out = new double[m];
        double running = 0;
        for (int j = 0; j < m; j++) {
            double v = Math.min(1, (m - j) * p[order[j]]);
            running = Math.max(running, v);
            out[order[j]] = running;
        }
        return out;
    }
}
