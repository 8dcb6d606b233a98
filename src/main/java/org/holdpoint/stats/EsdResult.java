package org.holdpoint.stats;

import java.util.List;

/**
 * Result of Rosner's generalized ESD many-outlier procedure. Values are flagged, never dropped.
 *
 * @param n        number of values
 * @param maxTests r, the largest number of outliers tested for
 * @param alpha    the level
 * @param steps    one step per i = 1..r actually computed (fewer when the remaining values became equal)
 * @param count    the number of outliers: the largest i with R_i &gt; λ_i (0 if none)
 * @param notes    plain-words notes
 */
public record EsdResult(int n, int maxTests, double alpha, List<Step> steps, int count, List<String> notes) {

    /** Validates the record. */
    public EsdResult {
        steps = List.copyOf(steps);
        notes = List.copyOf(notes);
        if (count < 0 || count > steps.size()) {
            throw new StatsException("outlier count %d outside 0..%d", count, steps.size());
        }
    }

    /** @return the 0-based positions (caller's order) of the flagged values, in order of removal */
    public List<Integer> outlierIndices() {
        return steps.subList(0, count).stream().map(Step::index).toList();
    }

    /**
     * One step of the procedure.
     *
     * @param i      step number, 1-based
     * @param r      R_i = max|x − x̄|/s over the n − i + 1 values left
     * @param lambda λ_i = (n−i)·t/√((n−i−1+t²)(n−i+1)), t = t_{p,n−i−1}, p = 1 − α/(2(n−i+1))
     * @param index  0-based position (caller's order) of the value removed at this step
     * @param value  that value
     */
    public record Step(int i, double r, double lambda, int index, double value) {
    }
}
