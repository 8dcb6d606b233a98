package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The k-th pairwise difference and Walsh sum against brute force (all K values built and sorted here in the test),
 * on seeded random data: continuous, rounded (ties), and heavily tied (three distinct values); and, for samples too
 * large to sort every difference, against the distinct differences sorted with their multiplicities.
 */
class PairwiseSelectionTest {
    private static double[] draw(SplittableRandom rnd, int n, int kind) {
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            double g = rnd.nextGaussian() * 3 + 100;
            x[i] = switch (kind) {
                case 0 -> g;
                case 1 -> Math.round(g * 10) / 10.0;
                default -> rnd.nextInt(3) * 0.1;
            };
        }
        Arrays.sort(x);
        return x;
    }

    private static double[] bruteDifferences(double[] a, double[] b) {
        double[] d = new double[a.length * b.length];
        int c = 0;
        for (double x : a) {
            for (double y : b) {
                d[c++] = x - y;
            }
        }
        Arrays.sort(d);
        return d;
    }

    private static double[] bruteWalsh(double[] d) {
        double[] w = new double[d.length * (d.length + 1) / 2];
        int c = 0;
        for (int i = 0; i < d.length; i++) {
            for (int j = i; j < d.length; j++) {
                w[c++] = d[i] + d[j];
            }
        }
        Arrays.sort(w);
        return w;
    }

    @Test
    void everyRankOfSmallMatricesMatchesBruteForce() {
        SplittableRandom rnd = new SplittableRandom(20261201L);
        for (int rep = 0; rep < 200; rep++) {
            int kind = rep % 3;
            double[] a = draw(rnd, 1 + rnd.nextInt(40), kind);
            double[] b = draw(rnd, 1 + rnd.nextInt(40), kind);
            double[] all = bruteDifferences(a, b);
            PairwiseSelection sel = PairwiseSelection.differences(a, b);
            assertThat(sel.size()).isEqualTo(all.length);
            for (int k = 1; k <= all.length; k++) {
                assertThat(sel.select(k)).as("rep %d k %d", rep, k).isEqualTo(all[k - 1]);
            }
            double[] w = bruteWalsh(a);
            PairwiseSelection ws = PairwiseSelection.walshSums(a);
            assertThat(ws.size()).isEqualTo(w.length);
            for (int k = 1; k <= w.length; k++) {
                assertThat(ws.select(k)).as("walsh rep %d k %d", rep, k).isEqualTo(w[k - 1]);
            }
        }
    }

    @Test
    void largerMatricesPassThroughThePivotRoundsAndMatchBruteForce() {
        largerMatrices(true);
    }

    @Test
    void weightedMedianPivotAloneAlsoMatchesBruteForce() {
        largerMatrices(false);
    }

    private static void largerMatrices(boolean sampling) {
        SplittableRandom rnd = new SplittableRandom(7L);
        for (int rep = 0; rep < 12; rep++) {
            int kind = rep % 3;
            double[] a = draw(rnd, 200 + rnd.nextInt(300), kind);
            double[] b = draw(rnd, 200 + rnd.nextInt(300), kind);
            double[] all = bruteDifferences(a, b);
            PairwiseSelection sel = PairwiseSelection.differences(a, b);
            double[] w = bruteWalsh(a);
            PairwiseSelection ws = PairwiseSelection.walshSums(a);
            sel.samplePivots = sampling;
            ws.samplePivots = sampling;
            for (int t = 0; t < 60; t++) {
                int k = 1 + rnd.nextInt(all.length);
                assertThat(sel.select(k)).isEqualTo(all[k - 1]);
                int kw = 1 + rnd.nextInt(w.length);
                assertThat(ws.select(kw)).isEqualTo(w[kw - 1]);
            }
            assertThat(sel.select(1)).isEqualTo(all[0]);
            assertThat(sel.select(all.length)).isEqualTo(all[all.length - 1]);
            int h = all.length / 2;
            double[] mid = sel.middlePair();
            if (all.length % 2 == 0) {
                assertThat(mid).containsExactly(all[h - 1], all[h]);
            } else {
                assertThat(mid).containsExactly(all[h], all[h]);
            }
            int hw = w.length / 2;
            double[] midW = ws.middlePair();
            assertThat(midW[1]).isEqualTo(w[hw]);
            assertThat(midW[0]).isEqualTo(w.length % 2 == 0 ? w[hw - 1] : w[hw]);
        }
    }

    @Test
    void oneTiedAndOneUntiedSampleMatchBruteForce() {
        // the rows (first sample) or only the columns (second sample) carry weights
        SplittableRandom rnd = new SplittableRandom(20261205L);
        for (int rep = 0; rep < 8; rep++) {
            double[] tied = draw(rnd, 150 + rnd.nextInt(200), 1 + rep % 2);
            double[] untied = draw(rnd, 150 + rnd.nextInt(200), 0);
            double[] a = rep % 4 < 2 ? tied : untied;
            double[] b = rep % 4 < 2 ? untied : tied;
            double[] all = bruteDifferences(a, b);
            PairwiseSelection sel = PairwiseSelection.differences(a, b);
            sel.samplePivots = rep % 3 != 0;
            assertThat(sel.size()).isEqualTo(all.length);
            for (int t = 0; t < 80; t++) {
                int k = 1 + rnd.nextInt(all.length);
                assertThat(sel.select(k)).as("rep %d k %d", rep, k).isEqualTo(all[k - 1]);
            }
            assertThat(sel.countAtMost(all[all.length / 3])).isEqualTo(countAtMost(all, all[all.length / 3]));
        }
    }

    @Test
    void readingsAtAGaugeResolutionMatchTheSortedDistinctDifferences() {
        // 200,000 + 180,000 readings on a 0.001 grid: K = 3.6e10 is too many to sort, but the readings take a few
        // hundred distinct values, so the test forms every distinct pair's difference with its multiplicity
        // (count_a × count_b), sorts those and reads ranks off the running total: a second, independent route
        SplittableRandom rnd = new SplittableRandom(4100L);
        double[] a = new double[200_000];
        double[] b = new double[180_000];
        for (int i = 0; i < a.length; i++) {
            a[i] = Math.round((25.0 + 0.04 * rnd.nextGaussian()) * 1000) / 1000.0;
        }
        for (int i = 0; i < b.length; i++) {
            b[i] = Math.round((25.003 + 0.05 * rnd.nextGaussian()) * 1000) / 1000.0;
        }
        Arrays.sort(a);
        Arrays.sort(b);
        java.util.TreeMap<Double, Long> ca = counts(a);
        java.util.TreeMap<Double, Long> cb = counts(b);
        java.util.TreeMap<Double, Long> diffs = new java.util.TreeMap<>();
        ca.forEach((x, nx) -> cb.forEach((y, ny) -> diffs.merge(x - y, nx * ny, Long::sum)));
        double[] values = new double[diffs.size()];
        long[] upTo = new long[diffs.size()];
        int c = 0;
        long total = 0;
        for (var e : diffs.entrySet()) {
            values[c] = e.getKey();
            total += e.getValue();
            upTo[c++] = total;
        }
        long k = (long) a.length * b.length;
        assertThat(total).isEqualTo(k);
        PairwiseSelection sel = PairwiseSelection.differences(a, b);
        assertThat(sel.size()).isEqualTo(k);
        List<Long> ranks = new ArrayList<>(List.of(1L, k, (k + 1) / 2, k / 2 + 1, k / 40, k - k / 40));
        for (int t = 0; t < 30; t++) {
            ranks.add(1 + rnd.nextLong(k));
        }
        for (long r : ranks) {
            int at = Arrays.binarySearch(upTo, r);
            double expected = values[at >= 0 ? at : -at - 1];
            assertThat(sel.select(r)).as("rank %d of %d", r, k).isEqualTo(expected);
        }
        sel.prepare(k / 2 - k / 50, k / 2 + k / 50);
        assertThat(sel.select(k / 2 - k / 60)).isEqualTo(values[index(upTo, k / 2 - k / 60)]);
        assertThat(sel.middlePair()).containsExactly(values[index(upTo, k / 2)], values[index(upTo, k / 2 + 1)]);
    }

    private static int index(long[] upTo, long rank) {
        int at = Arrays.binarySearch(upTo, rank);
        return at >= 0 ? at : -at - 1;
    }

    private static java.util.TreeMap<Double, Long> counts(double[] x) {
        java.util.TreeMap<Double, Long> m = new java.util.TreeMap<>();
        for (double v : x) {
            m.merge(v, 1L, Long::sum);
        }
        return m;
    }

    private static long countAtMost(double[] sorted, double p) {
        long c = 0;
        for (double v : sorted) {
            if (v <= p) {
                c++;
            }
        }
        return c;
    }

    @Test
    void weightedMedianAndQuickselectMatchSorting() {
        SplittableRandom rnd = new SplittableRandom(3L);
        for (int rep = 0; rep < 200; rep++) {
            int n = 1 + rnd.nextInt(50);
            double[] v = new double[n];
            for (int i = 0; i < n; i++) {
                v[i] = rnd.nextInt(6);
            }
            double[] sorted = v.clone();
            Arrays.sort(sorted);
            int r = rnd.nextInt(n);
            assertThat(PairwiseSelection.quickselect(v.clone(), r)).isEqualTo(sorted[r]);
            long[] w = new long[n];
            Arrays.fill(w, 1);
            assertThat(PairwiseSelection.weightedMedian(v.clone(), w, n, r + 1)).isEqualTo(sorted[r]);
        }
    }

    @Test
    void selectionsFromAPreparedRangeEqualTheBruteForceOnes() {
        // the shared first rounds of the rank-sum selections: ranks inside and outside the prepared range
        SplittableRandom rnd = new SplittableRandom(20261204);
        for (int kind = 0; kind < 3; kind++) {
            for (int rep = 0; rep < 4; rep++) {
                double[] a = draw(rnd, 300 + rnd.nextInt(700), kind);
                double[] b = draw(rnd, 300 + rnd.nextInt(700), kind);
                double[] all = bruteDifferences(a, b);
                long k = all.length;
                long mid = (k + 1) / 2;
                long half = Math.max(1, (long) (k * (0.0005 + 0.01 * rep)));
                PairwiseSelection sel = PairwiseSelection.differences(a, b);
                sel.prepare(mid - half, mid + half);
                for (long r : new long[] {mid - half, mid - half / 2, mid, mid + 1, mid + half, 1, k, mid - half - 1,
                    mid + half + 1}) {
                    assertThat(sel.select(r)).as("kind %d, rank %d of %d", kind, r, k).isEqualTo(all[(int) r - 1]);
                }
                assertThat(sel.middlePair()).containsExactly(all[(int) ((k + 1) / 2) - 1],
                        all[(int) (k % 2 == 1 ? (k + 1) / 2 : k / 2 + 1) - 1]);
            }
        }
    }
}
