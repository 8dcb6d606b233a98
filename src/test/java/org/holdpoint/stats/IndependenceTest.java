package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

import java.util.List;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;
import org.junit.jupiter.params.provider.MethodSource;

/** Lag-1 autocorrelation against the NIST StRD certified r(1) and R 4.2.2; the runs test against base-R values. */
class IndependenceTest {

    /** NIST StRD univariate summary statistics, certified r(1) from the file headers (docs/sources.md §A, P). */
    @ParameterizedTest(name = "{0}")
    @CsvSource({
        "PiDigits, -0.00355099287237972, 14",
        "Lottery, -0.120948622967393, 14",
        "Lew, -0.307304800605679, 14",
        "Mavro, 0.937989183438248, 14",
        "Michelso, 0.535199668621283, 14",
        "NumAcc1, -0.5, 14",
        "NumAcc2, -0.999, 14",
        "NumAcc3, -0.999, 14",
        "NumAcc4, -0.999, 14"})
    void strdCertifiedLag1(String name, double certified, int digits) {
        String[] lines = ReferenceData.lines("/org/holdpoint/stats/strd/" + name + ".dat", 61);
        Sample s = Sample.ofDecimals(lines);
        double r1 = Independence.lag1(s).r1();
        // log relative error (McCullough 1998) at least the stated digits; certified values carry 15
        double lre = -Math.log10(Math.abs(r1 - certified) / Math.abs(certified));
        assertThat(lre).as("%s r1 = %s", name, r1).isGreaterThanOrEqualTo(digits);
    }

    static List<RankReferenceCases.Case> cases() {
        return RankReferenceCases.load("/org/holdpoint/stats/independence/independence-cases.txt");
    }

    /** R 4.2.2: acf(x, lag.max = 1, plot = FALSE)$acf[2], the z formulas with pnorm, runs by choose()/pnorm. */
    @ParameterizedTest(name = "{0}")
    @MethodSource("cases")
    void matchesR(RankReferenceCases.Case c) {
        Sample x = Sample.of(c.nums("x"));
        Lag1Result lag = Independence.lag1(x);
        assertThat(lag.r1()).isCloseTo(c.num("r1"), within(1e-13));
        assertThat(lag.pBartlett()).isCloseTo(c.num("pBartlett"), within(1e-10 * c.num("pBartlett")));
        assertThat(lag.pRefined()).isCloseTo(c.num("pRefined"), within(1e-10 * c.num("pRefined")));
        RunsResult runs = Independence.runs(x);
        assertThat(runs.above()).isEqualTo((int) c.num("above"));
        assertThat(runs.below()).isEqualTo((int) c.num("below"));
        assertThat(runs.runs()).isEqualTo((int) c.num("runs"));
        assertThat(runs.atMedian()).isEqualTo(x.size() - runs.above() - runs.below());
        assertThat(runs.method().word()).isEqualTo(c.get("runsMethod"));
        assertThat(runs.p()).isCloseTo(c.num("runsP"), within(1e-12 * c.num("runsP")));
    }

    @Test
    void exactRunsDistributionMatchesEnumeration() {
        // brute force in the test: every arrangement of n1 '+' and n2 '−' (bit patterns), runs counted directly
        for (int n1 = 1; n1 <= 7; n1++) {
            for (int n2 = 1; n2 <= 7; n2++) {
                int nn = n1 + n2;
                double[] counts = new double[nn + 1];
                int total = 0;
                for (int mask = 0; mask < (1 << nn); mask++) {
                    if (Integer.bitCount(mask) != n1) {
                        continue;
                    }
                    total++;
                    int r = 1;
                    for (int i = 1; i < nn; i++) {
                        if (((mask >> i) & 1) != ((mask >> (i - 1)) & 1)) {
                            r++;
                        }
                    }
                    counts[r]++;
                }
                double[] pmf = Independence.runsPmf(n1, n2);
                for (int r = 0; r <= nn; r++) {
                    assertThat(pmf[r]).isCloseTo(counts[r] / total, within(1e-15));
                }
            }
        }
    }

    @Test
    void refinedMomentsOfR1DerivedCheckedBySeededSimulation() {
        // derived, checked by seeded simulation: E r1 = −1/n and Var r1 = (n−2)²/(n²(n−1)) for i.i.d. normal data
        int n = 20;
        int reps = 40_000;
        SplittableRandom rnd = new SplittableRandom(20261204L);
        double sum = 0;
        double sum2 = 0;
        for (int k = 0; k < reps; k++) {
            double[] x = new double[n];
            for (int i = 0; i < n; i++) {
                x[i] = rnd.nextGaussian();
            }
            double r = Independence.lag1(Sample.of(x)).r1();
            sum += r;
            sum2 += r * r;
        }
        double mean = sum / reps;
        double var = sum2 / reps - mean * mean;
        double theoryVar = (n - 2.0) * (n - 2.0) / (n * n * (n - 1.0));
        assertThat(mean).isCloseTo(-1.0 / n, within(4 * Math.sqrt(theoryVar / reps)));
        // the variance estimate has a relative SE of about √(2/reps) ≈ 0.7 %; allow 3 %
        assertThat(var).isCloseTo(theoryVar, within(0.03 * theoryVar));
        // the Bartlett variance 1/n is visibly different here
        assertThat(Math.abs(var - 1.0 / n)).isGreaterThan(0.1 * theoryVar);
    }

    @Test
    void undefinedCases() {
        assertThatThrownBy(() -> Independence.lag1(Sample.of(1, 2))).hasMessageContaining("at least 3");
        assertThatThrownBy(() -> Independence.lag1(Sample.of(4, 4, 4, 4))).hasMessageContaining("equal");
        assertThatThrownBy(() -> Independence.runs(Sample.of(4, 4, 4, 5))).hasMessageContaining("above and below");
        RunsResult r = Independence.runs(Sample.of(1, 2, 3, 4, 5));
        assertThat(r.atMedian()).isEqualTo(1);
        assertThat(r.runs()).isEqualTo(2);
        assertThat(r.tooFewRuns()).isTrue();
    }
}
