package org.holdpoint.stats;

/**
 * A before and an after sample summarised against one common reference, so that the difference of
 * means is formed from residual means and keeps its digits under a large common offset.
 *
 * @param before     descriptive statistics of the before group
 * @param after      descriptive statistics of the after group
 * @param difference x̄_after − x̄_before, from the residual means
 */
public record GroupPair(Descriptives before, Descriptives after, double difference) {

    /**
     * Summarises both groups with a common reference.
     *
     * @param before the before sample, ≥ 1 value
     * @param after  the after sample, ≥ 1 value
     * @return the pair
     */
    public static GroupPair of(Sample before, Sample after) {
        if (before.size() == 0) {
            throw new StatsException("the before group has no values");
        }
        if (after.size() == 0) {
            throw new StatsException("the after group has no values");
        }
        Moments.Reference ref = Moments.Reference.common(before, after);
        Moments mb = Moments.of(before, ref);
        Moments ma = Moments.of(after, ref);
        return new GroupPair(Descriptives.of(before, mb), Descriptives.of(after, ma), ma.meanResidual - mb.meanResidual);
    }

    /**
     * The paired differences after_i − before_i, exact when both samples carry decimals, otherwise in
     * binary64 (exact when the two values lie within a factor 2, Sterbenz 1974).
     *
     * @param before the before values, unit by unit
     * @param after  the after values of the same units, in the same order
     * @return the differences as a sample
     */
    public static Sample pairedDifferences(Sample before, Sample after) {
        if (before.size() != after.size()) {
            throw new StatsException("paired samples must have equal sizes, got %d before and %d after",
                    before.size(), after.size());
        }
        int n = before.size();
        if (before.hasExactDecimals() && after.hasExactDecimals()) {
            int scale = Math.max(before.scale(), after.scale());
            long[] d = new long[n];
            boolean exact = true;
            for (int i = 0; i < n && exact; i++) {
                long a = Moments.rescale(after.unscaled()[i], scale - after.scale());
                long b = Moments.rescale(before.unscaled()[i], scale - before.scale());
                if (a == Long.MIN_VALUE || b == Long.MIN_VALUE) {
                    exact = false;
                } else {
                    try {
                        d[i] = Math.subtractExact(a, b);
                    } catch (ArithmeticException e) {
                        exact = false;
                    }
                }
            }
            if (exact) {
                return Sample.ofUnscaled(d, scale);
            }
        }
        double[] d = new double[n];
        for (int i = 0; i < n; i++) {
            d[i] = after.value(i) - before.value(i);
        }
        return Sample.of(d);
    }
}
