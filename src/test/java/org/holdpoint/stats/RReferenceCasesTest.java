package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.holdpoint.stats.Accuracy.assertProbability;
import static org.holdpoint.stats.Accuracy.assertRel;
import static org.holdpoint.stats.Accuracy.number;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * t-tests, TOST, F-test, sd-growth bound, Brown–Forsythe and descriptives on 26 seeded cases of our
 * own (tiny n = 2 and 3, unequal n, unequal variances, offsets 1e6 and 1e8 with small noise, paired
 * designs, a flat before group, p near 1e-40; symmetric,
 * asymmetric and one-sided margins) against values computed with R 4.2.2 ({@code t.test},
 * {@code var.test}, {@code car::leveneTest(center = median)} 3.1-1, TOST by formula with
 * {@code pt}/{@code qt}) and, for the TOST, independently with statsmodels 0.13.5
 * ({@code ttost_ind}, {@code ttost_paired}). Inputs, calls and versions are in the resource files
 * under {@code r/} and the scripts that wrote them ({@code make-reference-values.R},
 * {@code make-statsmodels-values.py}); the suite never runs R or Python.
 *
 * <p>Agreement demanded (foundation issue): t, df, estimate, se and interval bounds to a relative
 * 1e-10, p-values to a relative 1e-8. An interval bound that lies nearer 0 than se is compared
 * relative to se, since d ∓ q·se cancels there and a relative error of the bound means nothing.
 * Orientation: every file is written as x = after, y = before (difference after − before, ratio
 * after/before), as the project reports it.
 */
class RReferenceCasesTest {
    private static final double REL = 1e-10;
    private static final double REL_P = 1e-8;

    /** One case: decimal texts of each group, and whether it has a paired design. */
    record Case(String id, List<String> before, List<String> after, boolean paired, double offset,
            Sample beforeSample, Sample afterSample) {
        Case(String id, List<String> before, List<String> after, boolean paired, double offset) {
            this(id, before, after, paired, offset, Sample.ofDecimals(before.toArray(String[]::new)),
                    Sample.ofDecimals(after.toArray(String[]::new)));
        }
    }

    private static final Map<String, Case> CASES = loadCases();

    private static Map<String, Case> loadCases() {
        Map<String, List<String>> before = new LinkedHashMap<>();
        Map<String, List<String>> after = new LinkedHashMap<>();
        for (Map<String, String> r : Accuracy.csv("r/r-inputs.csv")) {
            (r.get("group").equals("before") ? before : after).computeIfAbsent(r.get("case"), k -> new ArrayList<>())
                    .add(r.get("value"));
        }
        Map<String, Case> cases = new LinkedHashMap<>();
        for (Map<String, String> r : Accuracy.csv("r/r-cases.csv")) {
            String id = r.get("case");
            cases.put(id, new Case(id, before.get(id), after.get(id), Boolean.parseBoolean(r.get("paired")),
                    Double.parseDouble(r.get("offset"))));
        }
        return cases;
    }

    static Case caseOf(String id) {
        Case c = CASES.get(id);
        assertThat(c).as("case %s", id).isNotNull();
        return c;
    }

    private static Stream<Arguments> rows(String file) {
        return Accuracy.csv(file).stream().map(r -> Arguments.of(r.get("case") + " " + r.getOrDefault("method", ""), r));
    }

    static Stream<Arguments> ttestRows() {
        return rows("r/r-ttest.csv");
    }

    static Stream<Arguments> tostRows() {
        return rows("r/r-tost.csv");
    }

    static Stream<Arguments> statsmodelsRows() {
        return rows("r/statsmodels-tost.csv");
    }

    static Stream<Arguments> varTestRows() {
        return rows("r/r-var-test.csv");
    }

    static Stream<Arguments> sdGrowthRows() {
        return rows("r/r-sd-growth.csv");
    }

    static Stream<Arguments> descriptivesRows() {
        return Accuracy.csv("r/r-descriptives.csv").stream()
                .map(r -> Arguments.of(r.get("case") + " " + r.get("group"), r));
    }

    static Stream<Arguments> leveneRows() {
        return rows("r/r-levene.csv");
    }

    /** |actual − expected| ≤ rel·max(|expected|, scale). */
    static void assertNear(String what, double actual, double expected, double rel, double scale) {
        double tol = rel * Math.max(Math.abs(expected), scale);
        assertThat(Math.abs(actual - expected)).as("%s: got %s, expected %s", what, actual, expected)
                .isLessThanOrEqualTo(tol);
    }

    @Test
    void rParsedTheSameDoubles() {
        // precondition of the Brown-Forsythe check: R's as.numeric(text) is the correctly rounded double
        for (Map<String, String> r : Accuracy.csv("r/r-inputs.csv")) {
            assertThat(Double.parseDouble(r.get("value"))).as("%s %s", r.get("case"), r.get("value"))
                    .isEqualTo(Double.parseDouble(r.get("r_double")));
        }
        assertThat(CASES).hasSize(26);
    }

    private static TTestResult runT(Case c, String method, double alpha) {
        TTest t = TTest.withDefaults().withAlpha(alpha);
        return switch (method) {
            case "welch" -> t.with(VarianceAssumption.UNEQUAL).test(c.beforeSample(), c.afterSample());
            case "pooled" -> t.with(VarianceAssumption.EQUAL).test(c.beforeSample(), c.afterSample());
            case "paired" -> t.testPaired(c.beforeSample(), c.afterSample());
            default -> throw new IllegalArgumentException(method);
        };
    }

    /** R: t.test(after, before, var.equal, paired, conf.level) — see r/r-ttest.csv. */
    @ParameterizedTest(name = "{0}")
    @MethodSource("ttestRows")
    void tTestMatchesR(String name, Map<String, String> r) {
        Case c = caseOf(r.get("case"));
        double level = number(r, "conf_level");
        TTestResult res = runT(c, r.get("method"), 1 - level);
        assertThat(res.method().name().toLowerCase(java.util.Locale.ROOT)).isEqualTo(r.get("method"));
        assertRel(name + " t", res.t(), number(r, "t"), REL);
        assertRel(name + " df", res.df(), number(r, "df"), REL);
        assertRel(name + " estimate", res.estimate(), number(r, "estimate"), REL);
        assertRel(name + " se", res.se(), number(r, "stderr"), REL);
        assertProbability(name + " p", res.p(), number(r, "p"), REL_P);
        assertNear(name + " ci lower", res.ciLower(), number(r, "ci_lower"), REL, res.se());
        assertNear(name + " ci upper", res.ciUpper(), number(r, "ci_upper"), REL, res.se());
        assertThat(res.confidenceLevel()).isCloseTo(level, org.assertj.core.data.Offset.offset(1e-15));
    }

    static EquivalenceResult runTost(Case c, String method, Double lower, Double upper, double alpha) {
        EquivalenceTest e = EquivalenceTest.withDefaults().withMargin(new Margin(lower, upper)).withAlpha(alpha);
        return switch (method) {
            case "welch" -> e.with(VarianceAssumption.UNEQUAL).test(c.beforeSample(), c.afterSample());
            case "pooled" -> e.with(VarianceAssumption.EQUAL).test(c.beforeSample(), c.afterSample());
            case "paired" -> e.testPaired(c.beforeSample(), c.afterSample());
            default -> throw new IllegalArgumentException(method);
        };
    }

    /** R: TOST by formula with pt/qt on t.test's estimate, stderr and df — see r/r-tost.csv. */
    @ParameterizedTest(name = "{0}")
    @MethodSource("tostRows")
    void tostMatchesR(String name, Map<String, String> r) {
        Case c = caseOf(r.get("case"));
        Double lower = number(r, "margin_lower");
        Double upper = number(r, "margin_upper");
        double alpha = number(r, "alpha");
        EquivalenceResult res = runTost(c, r.get("method"), lower, upper, alpha);
        if (lower != null) {
            assertRel(name + " tL", res.tLower(), number(r, "t_lower"), REL);
            assertProbability(name + " pL", res.pLower(), number(r, "p_lower"), REL_P);
        } else {
            assertThat(res.tLower()).isNull();
            assertThat(res.pLower()).isNull();
        }
        if (upper != null) {
            assertRel(name + " tU", res.tUpper(), number(r, "t_upper"), REL);
            assertProbability(name + " pU", res.pUpper(), number(r, "p_upper"), REL_P);
        } else {
            assertThat(res.tUpper()).isNull();
            assertThat(res.pUpper()).isNull();
        }
        assertProbability(name + " p", res.p(), number(r, "p"), REL_P);
        assertNear(name + " (1-2a) lower", res.ciLower(), number(r, "ci_lower"), REL, res.se());
        assertNear(name + " (1-2a) upper", res.ciUpper(), number(r, "ci_upper"), REL, res.se());
        assertThat(res.level()).isCloseTo(1 - 2 * alpha, org.assertj.core.data.Offset.offset(1e-15));
        assertThat(res.alpha()).isEqualTo(alpha);
        // the conclusion R's own numbers imply by the tail rule (docs/methods.md §3)
        assertThat(res.conclusion()).as(name + " conclusion").isEqualTo(tailRule(lower, upper,
                number(r, "p_lower"), number(r, "p_upper"), number(r, "t_lower"), number(r, "t_upper"),
                res.df(), alpha));
    }

    /** The tail rule of docs/methods.md §3 from given p and t values. */
    static Conclusion tailRule(Double lower, Double upper, Double pL, Double pU, Double tL, Double tU, double df,
            double alpha) {
        boolean lowRej = lower == null || pL < alpha;
        boolean upRej = upper == null || pU < alpha;
        boolean outside = (lower != null && Distributions.tCdf(tL, df) < alpha)
                || (upper != null && Distributions.tCdf(-tU, df) < alpha);
        Margin.Claim claim = new Margin(lower, upper).claim();
        boolean holds = lowRej && upRej;
        return switch (claim) {
            case EQUIVALENCE -> holds ? Conclusion.EQUIVALENT : outside ? Conclusion.NOT_EQUIVALENT
                    : Conclusion.INCONCLUSIVE;
            case NON_INFERIORITY -> holds ? Conclusion.NON_INFERIOR : outside ? Conclusion.INFERIOR
                    : Conclusion.INCONCLUSIVE;
            case NON_SUPERIORITY -> holds ? Conclusion.NON_SUPERIOR : outside ? Conclusion.SUPERIOR
                    : Conclusion.INCONCLUSIVE;
        };
    }

    /** The interval rule of docs/methods.md §3: strict inequalities between the (1 − 2α) bounds and the margin. */
    static Conclusion intervalRule(Double lower, Double upper, double lo, double hi) {
        return switch (new Margin(lower, upper).claim()) {
            case EQUIVALENCE -> lower < lo && hi < upper ? Conclusion.EQUIVALENT
                    : hi < lower || lo > upper ? Conclusion.NOT_EQUIVALENT : Conclusion.INCONCLUSIVE;
            case NON_INFERIORITY -> lo > lower ? Conclusion.NON_INFERIOR
                    : hi < lower ? Conclusion.INFERIOR : Conclusion.INCONCLUSIVE;
            case NON_SUPERIORITY -> hi < upper ? Conclusion.NON_SUPERIOR
                    : lo > upper ? Conclusion.SUPERIOR : Conclusion.INCONCLUSIVE;
        };
    }

    /** Both routes of the TOST conclusion agree on every R case, and the cases cover every outcome. */
    @Test
    void tailRouteAndIntervalRouteAgree() {
        Map<Conclusion, Integer> seen = new java.util.EnumMap<>(Conclusion.class);
        int asymmetric = 0;
        for (Map<String, String> r : Accuracy.csv("r/r-tost.csv")) {
            Double lower = number(r, "margin_lower");
            Double upper = number(r, "margin_upper");
            EquivalenceResult res = runTost(caseOf(r.get("case")), r.get("method"), lower, upper,
                    number(r, "alpha"));
            assertThat(intervalRule(lower, upper, res.ciLower(), res.ciUpper()))
                    .as("%s %s (%s, %s): interval [%s, %s]", r.get("case"), r.get("method"), lower, upper,
                            res.ciLower(), res.ciUpper())
                    .isEqualTo(res.conclusion());
            // the R interval gives the same conclusion as well
            assertThat(intervalRule(lower, upper, number(r, "ci_lower"), number(r, "ci_upper")))
                    .isEqualTo(res.conclusion());
            seen.merge(res.conclusion(), 1, Integer::sum);
            if (lower != null && upper != null && -lower != upper) {
                asymmetric++;
                assertThat(res.pLower()).isNotEqualTo(res.pUpper());
            }
        }
        assertThat(seen.keySet()).as("outcomes covered: %s", seen).contains(Conclusion.EQUIVALENT,
                Conclusion.INCONCLUSIVE, Conclusion.NOT_EQUIVALENT, Conclusion.NON_INFERIOR, Conclusion.NON_SUPERIOR);
        assertThat(asymmetric).isGreaterThan(20);
    }

    /** statsmodels 0.13.5 ttost_ind / ttost_paired, a second independent source — see r/statsmodels-tost.csv. */
    @ParameterizedTest(name = "{0}")
    @MethodSource("statsmodelsRows")
    void tostMatchesStatsmodels(String name, Map<String, String> r) {
        Case c = caseOf(r.get("case"));
        EquivalenceResult res = runTost(c, r.get("method"), number(r, "margin_lower"), number(r, "margin_upper"),
                0.05);
        assertRel(name + " t1 = tL", res.tLower(), number(r, "t1"), REL);
        assertRel(name + " t2 = tU", res.tUpper(), number(r, "t2"), REL);
        assertRel(name + " df", res.df(), number(r, "df1"), REL);
        assertRel(name + " df", res.df(), number(r, "df2"), REL);
        assertProbability(name + " p1 = pL", res.pLower(), number(r, "p1"), REL_P);
        assertProbability(name + " p2 = pU", res.pUpper(), number(r, "p2"), REL_P);
        assertProbability(name + " pvalue", res.p(), number(r, "pvalue"), REL_P);
    }

    /** R: var.test(after, before) — see r/r-var-test.csv. */
    @ParameterizedTest(name = "{0}")
    @MethodSource("varTestRows")
    void fTestMatchesR(String name, Map<String, String> r) {
        Case c = caseOf(r.get("case"));
        if (Double.isInfinite(number(r, "ratio"))) {
            // a flat before group: R prints ratio Inf; the project refuses (docs/methods.md §4)
            org.assertj.core.api.Assertions.assertThatThrownBy(() -> SpreadTests.fTest(
                    Descriptives.of(c.beforeSample()).summary(), Descriptives.of(c.afterSample()).summary(), 0.05))
                    .isInstanceOf(StatsException.class).hasMessageContaining("before group has zero spread");
            return;
        }
        VarianceRatioResult res = SpreadTests.fTest(Descriptives.of(c.beforeSample()).summary(),
                Descriptives.of(c.afterSample()).summary(), 0.05);
        assertRel(name + " ratio", res.ratio(), number(r, "ratio"), REL);
        assertRel(name + " df1", res.df1(), number(r, "df1"), 0);
        assertRel(name + " df2", res.df2(), number(r, "df2"), 0);
        // against both tails taken from their own side; var.test's own p (2·min(p, 1 − p)) agrees as well
        // whenever the upper tail is not small enough for 1 − p to lose digits
        assertProbability(name + " p", res.p(), number(r, "p_both_tails"), REL_P);
        if (number(r, "p_var_test") > 1e-6) {
            assertProbability(name + " p (var.test)", res.p(), number(r, "p_var_test"), REL_P);
        }
        assertRel(name + " ci lower", res.ciLower(), number(r, "ci_lower"), REL);
        assertRel(name + " ci upper", res.ciUpper(), number(r, "ci_upper"), REL);
    }

    /**
     * R: car::leveneTest(value ~ group, center = median) — see r/r-levene.csv. With 2 + 2 values the
     * within-group sum of squares of |x − median| is zero, so F is undefined (docs/methods.md §4); R
     * prints rounding noise there (F ≈ 3.5e29), the project reports "not defined" (null).
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("leveneRows")
    void brownForsytheMatchesR(String name, Map<String, String> r) {
        Case c = caseOf(r.get("case"));
        LeveneResult res = SpreadTests.brownForsythe(c.beforeSample(), c.afterSample());
        Double f = number(r, "f");
        if (c.before().size() == 2 && c.after().size() == 2) {
            assertThat(f == null || f > 1e15).as("R's F for 2 + 2 values is noise: %s", f).isTrue();
            assertThat(res).isNull();
            return;
        }
        assertThat(res).isNotNull();
        assertRel(name + " F", res.f(), f, REL);
        assertRel(name + " df1", res.df1(), number(r, "df1"), 0);
        assertRel(name + " df2", res.df2(), number(r, "df2"), 0);
        assertProbability(name + " p", res.p(), number(r, "p"), REL_P);
    }

    /**
     * R: sqrt(f / qf(alpha, df1, df2)) and pf(f / lambda^2, df1, df2) on the var.test ratio — see
     * r/r-sd-growth.csv; the limit is met iff that p &lt; α, and then the bound lies below λ.
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("sdGrowthRows")
    void sdGrowthMatchesR(String name, Map<String, String> r) {
        Case c = caseOf(r.get("case"));
        double limit = number(r, "limit");
        double alpha = number(r, "alpha");
        if (Double.isInfinite(number(r, "sd_ratio"))) {
            org.assertj.core.api.Assertions.assertThatThrownBy(() -> SpreadTests.sdGrowth(
                    Descriptives.of(c.beforeSample()).summary(), Descriptives.of(c.afterSample()).summary(), limit,
                    alpha)).isInstanceOf(StatsException.class).hasMessageContaining("before group has zero spread");
            return;
        }
        SdGrowthResult res = SpreadTests.sdGrowth(Descriptives.of(c.beforeSample()).summary(),
                Descriptives.of(c.afterSample()).summary(), limit, alpha);
        assertRel(name + " sd ratio", res.sdRatio(), number(r, "sd_ratio"), REL);
        assertRel(name + " upper bound", res.upperBound(), number(r, "upper_bound"), REL);
        assertProbability(name + " p", res.p(), number(r, "p"), REL_P);
        assertThat(res.met()).isEqualTo(number(r, "p") < alpha);
        assertThat(res.met()).isEqualTo(number(r, "upper_bound") < limit);
        assertThat(res.level()).isCloseTo(1 - alpha, org.assertj.core.data.Offset.offset(1e-15));
    }

    /**
     * R: mean(), sd(), median(), min(), max() of the residuals (value − offset) — see
     * r/r-descriptives.csv. The offset is added back here; the sum is one rounding, so the location
     * statistics are compared to 2 ulp of max(|value|, sd) (a mean near 0 carries rounding of the size
     * of the data, not of itself), and the sd to 1e-13.
     */
    @ParameterizedTest(name = "{0}")
    @MethodSource("descriptivesRows")
    void descriptivesMatchR(String name, Map<String, String> r) {
        Case c = caseOf(r.get("case"));
        Descriptives d = Descriptives.of(r.get("group").equals("before") ? c.beforeSample() : c.afterSample());
        assertThat((double) d.n()).isEqualTo(number(r, "n"));
        double sd = number(r, "sd");
        assertUlps(name + " mean", d.mean(), c.offset() + number(r, "mean_residual"), sd);
        assertUlps(name + " median", d.median(), c.offset() + number(r, "median_residual"), sd);
        assertUlps(name + " min", d.min(), c.offset() + number(r, "min_residual"), sd);
        assertUlps(name + " max", d.max(), c.offset() + number(r, "max_residual"), sd);
        assertRel(name + " sd", d.sd(), number(r, "sd"), 1e-13);
    }

    private static void assertUlps(String what, double actual, double expected, double scale) {
        assertThat(Math.abs(actual - expected)).as("%s: got %s, expected %s", what, actual, expected)
                .isLessThanOrEqualTo(2 * Math.ulp(Math.max(Math.abs(expected), scale)));
    }
}
