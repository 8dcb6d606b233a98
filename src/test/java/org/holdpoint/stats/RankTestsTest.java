package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.Arrays;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/** Literature examples, equivalence conclusions and edge cases of the rank-sum and signed-rank tests. */
class RankTestsTest {
    // Hollander & Wolfe (1973) data as on R's wilcox.test help page (reference/literature/hodges-lehmann-examples.txt)
    private static final Sample TERM = Sample.of(0.80, 0.83, 1.89, 1.04, 1.45, 1.38, 1.91, 1.64, 0.73, 1.46);
    private static final Sample EARLY = Sample.of(1.15, 0.88, 0.90, 0.74, 1.21);
    private static final Sample VISIT1 = Sample.of(1.83, 0.50, 1.62, 2.48, 1.68, 1.88, 1.55, 3.06, 1.30);
    private static final Sample VISIT2 = Sample.of(0.878, 0.647, 0.598, 2.05, 1.06, 1.29, 1.06, 3.14, 1.29);

    @Test
    void hodgesLehmannTwoSampleExample() {
        // hodges-lehmann-examples.txt (values computed with R wilcox.test, exact, 95 %; C): W = 35, shift x − y =
        // 0.305, CI (−0.15, 0.76); two-sided p = 2 × 0.1272
        RankSumResult r = RankSumTest.withDefaults().test(EARLY, TERM);
        assertThat(r.u()).isEqualTo(35.0);
        assertThat(r.method()).isEqualTo(RankMethod.EXACT);
        assertThat(r.shift()).isCloseTo(0.305, within(1e-12));
        assertThat(r.ciLower()).isCloseTo(-0.15, within(1e-12));
        assertThat(r.ciUpper()).isCloseTo(0.76, within(1e-12));
        assertThat(r.p()).isCloseTo(2 * 0.1272, within(2e-4));
        // the achieved exact level of [D_(q), D_(mn−q+1)] is at least the requested one
        assertThat(r.ci().achievedLevel()).isGreaterThanOrEqualTo(0.95);
        assertThat(r.ci().levelReached()).isTrue();
    }

    @Test
    void hodgesLehmannPairedExample() {
        // hodges-lehmann-examples.txt (R wilcox.test paired, exact; C): V = 5, p = 0.03906, HL −0.46,
        // 95 % CI (−0.786, −0.010)
        SignedRankResult r = SignedRankTest.withDefaults().test(VISIT1, VISIT2);
        assertThat(r.v()).isEqualTo(5.0);
        assertThat(r.p()).isCloseTo(0.0390625, within(1e-15)); // 10/256 exactly (2 × 5/2⁹)
        assertThat(r.shift()).isCloseTo(-0.46, within(1e-12));
        assertThat(r.ciLower()).isCloseTo(-0.786, within(1e-12));
        assertThat(r.ciUpper()).isCloseTo(-0.010, within(1e-12));
        assertThat(r.zeros()).isZero();
    }

    @Test
    void equivalenceUsesTheStrictIntervalRules() {
        // the 90 % interval of the two-sample example is (−0.08, 0.72) (R 4.2.2, rank/rank-cases.txt case hw-twosample)
        RankSumTest base = RankSumTest.withDefaults();
        RankSumResult r = base.withMargin(Margin.of(-1, 1)).test(EARLY, TERM);
        double lo = r.equivalence().interval().lower();
        double hi = r.equivalence().interval().upper();
        assertThat(lo).isEqualTo(-0.07999999999999996);
        assertThat(hi).isEqualTo(0.71999999999999997);
        assertThat(r.equivalence().interval().requestedLevel()).isCloseTo(0.90, within(1e-15));
        assertThat(r.equivalence().conclusion()).isEqualTo(Conclusion.EQUIVALENT);
        // a bound exactly on a margin is inconclusive; one ulp inside is equivalent
        assertThat(base.withMargin(Margin.of(lo, 1)).test(EARLY, TERM).equivalence().conclusion())
                .isEqualTo(Conclusion.INCONCLUSIVE);
        assertThat(base.withMargin(Margin.of(Math.nextDown(lo), 1)).test(EARLY, TERM).equivalence().conclusion())
                .isEqualTo(Conclusion.EQUIVALENT);
        assertThat(base.withMargin(Margin.of(-1, hi)).test(EARLY, TERM).equivalence().conclusion())
                .isEqualTo(Conclusion.INCONCLUSIVE);
        assertThat(base.withMargin(new Margin(-0.1, null)).test(EARLY, TERM).equivalence().conclusion())
                .isEqualTo(Conclusion.NON_INFERIOR);
        assertThat(base.withMargin(new Margin(null, 0.5)).test(EARLY, TERM).equivalence().conclusion())
                .isEqualTo(Conclusion.INCONCLUSIVE);
        // shifted by +5: the interval lies wholly above U
        Sample shifted = Sample.of(Arrays.stream(TERM.values()).map(v -> v + 5).toArray());
        assertThat(base.withMargin(Margin.symmetric(1)).test(EARLY, shifted).equivalence().conclusion())
                .isEqualTo(Conclusion.NOT_EQUIVALENT);
        assertThat(base.withMargin(new Margin(null, 1.0)).test(EARLY, shifted).equivalence().conclusion())
                .isEqualTo(Conclusion.SUPERIOR);
    }

    @Test
    void unreachableExactLevelIsReportedAndBlocksTheClaim() {
        // 4 after and 3 before values: P(U ≤ 0) = 1/C(7,3) = 1/35 ≥ 0.025, so q is raised from 0 to 1 and the
        // interval [min D, max D] has level 1 − 2/35 (docs/methods.md §5)
        RankSumResult r = RankSumTest.withDefaults().withMargin(Margin.symmetric(10))
                .test(Sample.of(2.6, 1.4, 3.3), Sample.of(1.1, 2.3, 0.7, 1.9));
        assertThat(r.ci().levelReached()).isFalse();
        assertThat(r.ci().achievedLevel()).isCloseTo(1 - 2.0 / 35, within(1e-15));
        assertThat(r.notes()).anySatisfy(n -> assertThat(n).contains("cannot be reached"));
        // the 90 % equivalence interval is reachable here (P(U ≤ 1) = 2/35 ≥ 0.05) and lies inside ±10
        assertThat(r.equivalence().interval().levelReached()).isTrue();
        assertThat(r.equivalence().conclusion()).isEqualTo(Conclusion.EQUIVALENT);
        // 3 and 3 values, α = 0.04: the 92 % interval needs P(U ≤ 0) = 1/20 ≤ 0.04, out of reach; no claim
        RankSumResult small = RankSumTest.withDefaults().withAlpha(0.04).withMargin(Margin.symmetric(10))
                .test(Sample.of(2.6, 1.4, 3.3), Sample.of(1.1, 2.3, 0.7));
        assertThat(small.equivalence().interval().levelReached()).isFalse();
        assertThat(small.equivalence().interval().achievedLevel()).isCloseTo(0.9, within(1e-15));
        assertThat(small.equivalence().conclusion()).isEqualTo(Conclusion.INCONCLUSIVE);
        assertThat(small.notes()).anySatisfy(n -> assertThat(n).contains("no equivalence claim"));
        // at α = 0.05 the 90 % level is exactly achieved by [min D, max D] (1 − 2/20): reached
        assertThat(RankSumTest.withDefaults().withMargin(Margin.symmetric(10))
                .test(Sample.of(2.6, 1.4, 3.3), Sample.of(1.1, 2.3, 0.7)).equivalence().interval().levelReached())
                .isTrue();
        // signed rank with 3 differences: fallback level 1 − 2^(1−3) = 0.75
        SignedRankResult s = SignedRankTest.withDefaults().test(Sample.of(1, 2, 3), Sample.of(1.5, 2.25, 4.125));
        assertThat(s.ci().levelReached()).isFalse();
        assertThat(s.ci().achievedLevel()).isEqualTo(0.75);
    }

    @Test
    void allEqualValuesLeaveThePValueUndefined() {
        RankSumResult r = RankSumTest.withDefaults().test(Sample.of(3, 3, 3), Sample.of(3, 3));
        assertThat(r.p()).isNull();
        assertThat(r.method()).isEqualTo(RankMethod.NORMAL);
        assertThat(r.shift()).isZero();
        assertThat(r.notes()).anySatisfy(n -> assertThat(n).contains("undefined"));
        assertThatThrownBy(() -> SignedRankTest.withDefaults().test(Sample.of(1, 2), Sample.of(1, 2)))
                .isInstanceOf(StatsException.class).hasMessageContaining("all 2 paired differences are zero");
        assertThatThrownBy(() -> SignedRankTest.withDefaults().test(Sample.of(1, 2), Sample.of(1)))
                .hasMessageContaining("equal sizes");
        assertThatThrownBy(() -> RankSumTest.withDefaults().test(Sample.of(), Sample.of(1)))
                .hasMessageContaining("at least one value");
    }

    @Test
    void zerosAreDroppedAndForceTheNormalBranch() {
        SignedRankResult r = SignedRankTest.withDefaults().test(Sample.of(1, 2, 3, 4, 5, 6),
                Sample.of(1, 2.5, 3.25, 5, 4.5, 7.125));
        assertThat(r.zeros()).isEqualTo(1);
        assertThat(r.nUsed()).isEqualTo(5);
        assertThat(r.method()).isEqualTo(RankMethod.NORMAL);
        // d = 0.5, 0.25, 1, −0.5, 1.125: |d| ranks 2.5, 1, 4, 2.5, 5 → V = 2.5 + 1 + 4 + 5 = 12.5
        assertThat(r.v()).isEqualTo(12.5);
        assertThat(r.notes()).anySatisfy(n -> assertThat(n).contains("zero difference"));
    }

    @Test
    void absoluteValuesInOrderWithoutSorting() {
        SplittableRandom rnd = new SplittableRandom(5L);
        for (int rep = 0; rep < 200; rep++) {
            double[] x = new double[rnd.nextInt(30)];
            for (int i = 0; i < x.length; i++) {
                x[i] = (rnd.nextInt(9) - 4) * 0.5;
            }
            Arrays.sort(x);
            double[] expected = Arrays.stream(x).map(Math::abs).sorted().toArray();
            assertThat(SignedRankTest.absAscending(x)).containsExactly(expected);
        }
    }

    @Test
    void twiceUIsExactBeyondTheIntRange() {
        // 50,000 × 50,000 tied values: K = 2.5e9 > 2^31; 2U recomputed here by binary search per after value
        SplittableRandom rnd = new SplittableRandom(99L);
        int n = 50_000;
        double[] a = new double[n];
        double[] b = new double[n];
        for (int i = 0; i < n; i++) {
            a[i] = rnd.nextInt(200) * 0.5;
            b[i] = rnd.nextInt(190) * 0.5;
        }
        double[] sb = b.clone();
        Arrays.sort(sb);
        long expected = 0;
        for (double v : a) {
            int less = lowerBound(sb, v);
            int leq = upperBound(sb, v);
            expected += 2L * less + (leq - less);
        }
        double[] sa = a.clone();
        Arrays.sort(sa);
        assertThat(RankSumTest.merge(sa, sb).twiceU()).isEqualTo(expected);
        // Σ(t³ − t) of the combined sample, from counting each distinct value here (t³ would overflow int)
        double[] all = new double[2 * n];
        System.arraycopy(a, 0, all, 0, n);
        System.arraycopy(b, 0, all, n, n);
        double tie = 0;
        for (double v : Arrays.stream(all).distinct().toArray()) {
            double t = Arrays.stream(all).filter(x -> x == v).count();
            tie += t * t * t - t;
        }
        assertThat(RankSumTest.merge(sa, sb).tieSum()).isEqualTo(tie);
        // U(after) + U(before) = mn
        assertThat(RankSumTest.merge(sa, sb).twiceU() + RankSumTest.merge(sb, sa).twiceU()).isEqualTo(2L * n * n);
    }

    private static int lowerBound(double[] s, double v) {
        int i = Arrays.binarySearch(s, v);
        if (i < 0) {
            return -i - 1;
        }
        while (i > 0 && s[i - 1] == v) {
            i--;
        }
        return i;
    }

    private static int upperBound(double[] s, double v) {
        int i = Arrays.binarySearch(s, v);
        if (i < 0) {
            return -i - 1;
        }
        while (i < s.length && s[i] == v) {
            i++;
        }
        return i;
    }

    @Test
    void exactDistributionsMatchEnumeration() {
        // brute force: all C(m+n, m) assignments of ranks 1..N to the first sample for small sizes
        for (int m = 1; m <= 6; m++) {
            for (int n = 1; n <= 6; n++) {
                int nn = m + n;
                double[] counts = new double[m * n + 1];
                int total = 0;
                for (int mask = 0; mask < (1 << nn); mask++) {
                    if (Integer.bitCount(mask) != m) {
                        continue;
                    }
                    total++;
                    int rankSum = 0;
                    for (int i = 0; i < nn; i++) {
                        if ((mask >> i & 1) == 1) {
                            rankSum += i + 1;
                        }
                    }
                    counts[rankSum - m * (m + 1) / 2]++;
                }
                double[] pmf = RankDistributions.mannWhitneyPmf(m, n);
                for (int u = 0; u <= m * n; u++) {
                    assertThat(pmf[u]).isCloseTo(counts[u] / total, within(1e-15));
                }
            }
        }
        // signed rank: all 2^n sign patterns
        for (int n = 1; n <= 12; n++) {
            long[] counts = new long[n * (n + 1) / 2 + 1];
            for (int mask = 0; mask < (1 << n); mask++) {
                int v = 0;
                for (int i = 0; i < n; i++) {
                    if ((mask >> i & 1) == 1) {
                        v += i + 1;
                    }
                }
                counts[v]++;
            }
            assertThat(RankDistributions.signedRankCounts(n)).containsExactly(counts);
        }
    }
}
