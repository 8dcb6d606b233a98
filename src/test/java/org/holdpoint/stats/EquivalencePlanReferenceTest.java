package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import org.junit.jupiter.api.Test;

/** Exact TOST and t-test power and sample sizes against published and reference-library values. */
class EquivalencePlanReferenceTest {
    private static final EquivalencePlan PARALLEL_02 =
            EquivalencePlan.withDefaults().withMargin(Margin.symmetric(0.2)).withAlpha(0.05).withTablePoints(2);

    /**
     * Derived, PowerTOST sampleN.TOST exact: the table ctCW.III of the R package PowerTOST
     * (data/data_parallel.rda), computed by sampleN.TOST(design = "parallel", logscale = FALSE,
     * theta1 = -0.2, method = "exact"); margin ±0.2, α = 0.05, equal groups; N is the total, so the
     * per-group n is N/2. Every row, every difference, both targets.
     */
    @Test
    void derivedExactSampleSizeTableEveryRow() throws IOException {
        double[] differences = {0, 0.05, 0.10, 0.15};
        List<double[]> rows = rows("tost-parallel-additive-sample-size-derived.txt");
        assertThat(rows).hasSize(32);
        for (double[] row : rows) {
            double sigma = row[0];
            EquivalencePlan plan = PARALLEL_02.withTargetPower(row[1]);
            for (int j = 0; j < differences.length; j++) {
                int expectedPerGroup = (int) row[2 + j] / 2;
                PlanResult r = plan.sampleSize(differences[j], sigma);
                assertThat(r.n()).as("sigma %s, target %s, difference %s", sigma, row[1], differences[j])
                        .isEqualTo(expectedPerGroup);
                assertThat(r.nAfter()).isEqualTo(expectedPerGroup);
                assertThat(r.achievedPower()).isGreaterThanOrEqualTo(row[1]);
                assertThat(r.powerAtPrevious()).isLessThan(row[1]);
            }
        }
    }

    /**
     * The ten exact power values in the header of the same derived file (PowerTOST-derived table,
     * recomputed there by integrating over the distribution of s), printed to 6 decimals; N total.
     */
    @Test
    void tenExactPowerValuesOfTheDerivedTableHeader() {
        double[][] cases = {
            {12, 0.10, 0.00, 0.884063}, {10, 0.10, 0.00, 0.783580}, {14, 0.10, 0.05, 0.837877},
            {12, 0.10, 0.05, 0.770971}, {36, 0.20, 0.00, 0.804545}, {48, 0.20, 0.05, 0.815435},
            {102, 0.20, 0.10, 0.805899}, {398, 0.20, 0.15, 0.800840}, {100, 0.30, 0.00, 0.904154},
            {176, 0.40, 0.00, 0.902851}};
        for (double[] c : cases) {
            double power = PARALLEL_02.tostPower(c[2], c[1], (int) c[0] / 2);
            assertThat(power).as("N %s sigma %s delta %s", c[0], c[1], c[2]).isCloseTo(c[3], within(5.000001e-7));
        }
    }

    /**
     * R 4.2.2, stats::integrate of the chi form with R's own pnorm, qt and dchisq (f_χ(x) = 2x·dchisq(x², ν)),
     * rel.tol = 1e-13 (script below); an implementation independent of ours.
     * <pre>
     * tost &lt;- function(alpha, L, U, T, se, nu) { tc &lt;- qt(1 - alpha, nu); R &lt;- sqrt(nu)*(U - L)/(2*tc*se)
     *   dL &lt;- (T - L)/se; dU &lt;- (T - U)/se
     *   g &lt;- function(x) (pnorm(-tc*x/sqrt(nu) - dU) - pnorm(tc*x/sqrt(nu) - dL)) * 2*x*dchisq(x^2, nu)
     *   m &lt;- sqrt(max(nu - 1, 0)); integrate(g, max(0, m - 16), min(R, m + 16), rel.tol = 1e-13, abs.tol = 0,
     *   subdivisions = 2000)$value }
     * par &lt;- function(alpha, L, U, T, s, n1, n2) tost(alpha, L, U, T, s*sqrt(1/n1 + 1/n2), n1 + n2 - 2)
     * pai &lt;- function(alpha, L, U, T, s, m) tost(alpha, L, U, T, s/sqrt(m), m - 1)
     * </pre>
     */
    @Test
    void exactTostPowerMatchesIndependentIntegrationInR() {
        EquivalencePlan asym = EquivalencePlan.withDefaults().withMargin(Margin.of(-1, 0.8)).withTablePoints(2);
        // par(0.05, -1, 0.8, -0.2, 1, 10, 15): ratio 1.5
        assertThat(asym.withRatio(1.5).tostPower(-0.2, 1, 10)).isCloseTo(0.371066820318605, within(1e-12));
        // par(0.05, -1, 0.8, -0.2, 1, 3, 2): ratio 2/3, n2 = ceil(2) = 2
        assertThat(asym.withRatio(2.0 / 3).nAfter(3)).isEqualTo(2);
        assertThat(asym.withRatio(2.0 / 3).tostPower(-0.2, 1, 3)).isCloseTo(0.0173394729011028, within(1e-12));
        // par(0.10, -0.5, 0.5, 0.1, 0.4, 12, 24)
        assertThat(EquivalencePlan.withDefaults().withMargin(Margin.symmetric(0.5)).withAlpha(0.10).withRatio(2)
                .tostPower(0.1, 0.4, 12)).isCloseTo(0.932944973329349, within(1e-12));
        // par(0.05, -0.2, 0.2, 0.15, 1.2, 5000, 5000)
        assertThat(PARALLEL_02.tostPower(0.15, 1.2, 5000)).isCloseTo(0.669429634050317, within(1e-12));
        EquivalencePlan paired = EquivalencePlan.withDefaults().withMargin(Margin.of(-0.3, 0.4)).with(Design.PAIRED);
        // pai(0.05, -0.3, 0.4, 0.05, 0.3, m) for m = 8, 2 (ν = 1) and 30
        assertThat(paired.tostPower(0.05, 0.3, 8)).isCloseTo(0.811907313634731, within(1e-12));
        assertThat(paired.tostPower(0.05, 0.3, 2)).isCloseTo(0.112176229758469, within(1e-12));
        assertThat(paired.tostPower(0.05, 0.3, 30)).isCloseTo(0.999995546899371, within(1e-12));
        // pai(0.025, -1, 1, -0.4, 2, 60)
        assertThat(EquivalencePlan.withDefaults().withMargin(Margin.symmetric(1)).with(Design.PAIRED).withAlpha(0.025)
                .tostPower(-0.4, 2, 60)).isCloseTo(0.627369106625093, within(1e-12));
    }

    /** R 4.2.2 noncentral t (pt with ncp): power.t.test(..., strict = TRUE) and, for unequal groups, pt directly. */
    @Test
    void tTestPowerMatchesNoncentralTOfR() {
        EquivalencePlan p = EquivalencePlan.withDefaults();
        // power.t.test(n = 20, delta = 0.5, sd = 1, sig.level = 0.05, strict = TRUE)$power
        assertThat(p.tTestPower(0.5, 1, 20)).isCloseTo(0.33793902892509, within(1e-11));
        // power.t.test(n = 15, delta = 0.3, sd = 0.5, sig.level = 0.05, type = "paired", strict = TRUE)$power
        assertThat(p.with(Design.PAIRED).tTestPower(0.3, 0.5, 15)).isCloseTo(0.580427108883242, within(1e-11));
        // power.t.test(n = 2, delta = 1, sd = 1, sig.level = 0.1, strict = TRUE)$power  (ν = 2)
        assertThat(p.withAlpha(0.1).tTestPower(1, 1, 2)).isCloseTo(0.181564358979272, within(1e-11));
        // power.t.test(n = 3000, delta = 0.1, sd = 1, sig.level = 0.05, strict = TRUE)$power
        assertThat(p.tTestPower(0.1, 1, 3000)).isCloseTo(0.972087495435935, within(1e-11));
        // nu <- 23; ncp <- d/sqrt(1/10 + 1/15); q <- qt(0.975, nu);
        // pt(q, nu, ncp, lower.tail = FALSE) + pt(-q, nu, ncp), for d = -0.2 and d = 0.9
        assertThat(p.withRatio(1.5).tTestPower(-0.2, 1, 10)).isCloseTo(0.0756402448153507, within(1e-11));
        assertThat(p.withRatio(1.5).tTestPower(0.9, 1, 10)).isCloseTo(0.560441501553144, within(1e-11));
    }

    /**
     * Julious 2004, Stat. Med. 23:1921–1986, Table I (parallel, equal groups, per-group n, two-sided
     * α = 0.05, 90 % power), all 30 entries as transcribed in the TOSTER package's PowerValidation.Rmd.
     */
    @Test
    void julious2004TableOneAllThirtyEntries() throws IOException {
        EquivalencePlan plan = EquivalencePlan.withDefaults().withAlpha(0.05).withTargetPower(0.9);
        List<double[]> rows = rows("ttest-sample-size-julious2004-table1.txt");
        assertThat(rows).hasSize(30);
        for (double[] row : rows) {
            TTestPlanResult r = plan.tTestSampleSize(row[0], 1);
            assertThat(r.n()).as("delta %s", row[0]).isEqualTo((int) row[1]);
            assertThat(r.achievedPower()).isGreaterThanOrEqualTo(0.9);
            assertThat(r.powerAtPrevious()).isLessThan(0.9);
        }
    }

    static List<double[]> rows(String resource) throws IOException {
        List<double[]> out = new ArrayList<>();
        try (InputStream in = EquivalencePlanReferenceTest.class.getResourceAsStream(resource);
                BufferedReader reader = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8))) {
            String line;
            while ((line = reader.readLine()) != null) {
                if (line.isBlank() || line.startsWith("#")) {
                    continue;
                }
                String[] parts = line.trim().split("\\s+");
                double[] row = new double[parts.length];
                for (int i = 0; i < parts.length; i++) {
                    row[i] = Double.parseDouble(parts[i]);
                }
                out.add(row);
            }
        }
        return out;
    }
}
