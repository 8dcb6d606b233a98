package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.Locale;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * "Two doors, one answer": the raw-sample and summary-statistic entry points of
 * {@link TTest} and {@link EquivalenceTest} give the same result within 1e-13 relative (p within
 * 1e-12, see {@link #nearP}), on seeded random samples (SplittableRandom, fixed seed).
 *
 * <p>Scale of the comparison: the summary door receives the two means already rounded to binary64,
 * so its difference carries an error of up to ulp(mean) that the raw door (difference of residual
 * means) does not. The estimate, the interval bounds and the margins' t are therefore compared
 * relative to max(|value|, se) and t relative to max(|t|, 1); the data keep |mean| ≤ 60 and sd ≥ 0.05,
 * so that error stays below 1e-13 of se. With a large common offset the doors legitimately differ;
 * {@link #rawDoorKeepsTheDifferenceUnderALargeOffset()} shows the raw door is the exact one there.
 */
class TwoDoorsTest {
    private static final double REL = 1e-13;

    private static String[] draw(SplittableRandom rnd, int n, double mean, double sd, int decimals) {
        String[] s = new String[n];
        for (int i = 0; i < n; i++) {
            double v = mean + sd * gaussian(rnd);
            s[i] = String.format(Locale.ROOT, "%." + decimals + "f", v);
        }
        return s;
    }

    private static double gaussian(SplittableRandom rnd) {
        // Box–Muller; seeded, reproducible
        return Math.sqrt(-2 * Math.log(1 - rnd.nextDouble())) * Math.cos(2 * Math.PI * rnd.nextDouble());
    }

    private static void near(String what, double a, double b, double scale) {
        double tol = REL * Math.max(Math.abs(b), scale);
        assertThat(Math.abs(a - b)).as("%s: raw %s, summary %s", what, a, b).isLessThanOrEqualTo(tol);
    }

    /**
     * p at 1e-12 relative: a relative change δ in t moves a tail p by about |t·f(t)/F(t)|·δ, a
     * condition number of 5–10 at the p of these draws, on top of the incomplete beta's own ~1e-14,
     * so 1e-13 would test the beta function's last digit rather than the doors (measured worst here:
     * 1.1e-13).
     */
    private static void nearP(String what, double a, double b) {
        assertThat(Math.abs(a - b)).as("%s: raw %s, summary %s", what, a, b).isLessThanOrEqualTo(1e-12 * b);
    }

    private static void same(String what, TTestResult raw, TTestResult sum) {
        assertThat(raw.method()).isEqualTo(sum.method());
        near(what + " estimate", raw.estimate(), sum.estimate(), raw.se());
        near(what + " se", raw.se(), sum.se(), 0);
        near(what + " df", raw.df(), sum.df(), 0);
        near(what + " t", raw.t(), sum.t(), 1);
        near(what + " ci lower", raw.ciLower(), sum.ciLower(), raw.se());
        near(what + " ci upper", raw.ciUpper(), sum.ciUpper(), raw.se());
        nearP(what + " p", raw.p(), sum.p());
    }

    private static void same(String what, EquivalenceResult raw, EquivalenceResult sum) {
        near(what + " estimate", raw.estimate(), sum.estimate(), raw.se());
        near(what + " se", raw.se(), sum.se(), 0);
        near(what + " df", raw.df(), sum.df(), 0);
        near(what + " tL", raw.tLower(), sum.tLower(), 1);
        near(what + " tU", raw.tUpper(), sum.tUpper(), 1);
        nearP(what + " pL", raw.pLower(), sum.pLower());
        nearP(what + " pU", raw.pUpper(), sum.pUpper());
        near(what + " ci lower", raw.ciLower(), sum.ciLower(), raw.se());
        near(what + " ci upper", raw.ciUpper(), sum.ciUpper(), raw.se());
        if (Math.abs(raw.p() - 0.05) > 1e-9) {
            assertThat(raw.conclusion()).as(what).isEqualTo(sum.conclusion());
        }
    }

    @Test
    void rawAndSummaryDoorsAgree() {
        SplittableRandom rnd = new SplittableRandom(20261201L);
        int checked = 0;
        for (int i = 0; i < 300; i++) {
            int nb = 2 + rnd.nextInt(40);
            int na = rnd.nextBoolean() ? nb : 2 + rnd.nextInt(40);
            double mean = -50 + 100 * rnd.nextDouble();
            double sdb = 0.05 + 5 * rnd.nextDouble();
            double sda = sdb * (0.3 + 3 * rnd.nextDouble());
            int dec = 2 + rnd.nextInt(4);
            Sample before = Sample.ofDecimals(draw(rnd, nb, mean, sdb, dec));
            Sample after = Sample.ofDecimals(draw(rnd, na, mean + sdb * (rnd.nextDouble() - 0.5), sda, dec));
            SummaryStatistics sb = Descriptives.of(before).summary();
            SummaryStatistics sa = Descriptives.of(after).summary();
            if (!(sb.variance() > 0 && sa.variance() > 0)) {
                continue;
            }
            String id = "draw " + i;
            double alpha = 0.01 + 0.2 * rnd.nextDouble();
            for (VarianceAssumption v : VarianceAssumption.values()) {
                TTest t = TTest.withDefaults().with(v).withAlpha(alpha);
                same(id + " " + v, t.test(before, after), t.test(sb, sa));
                Margin m = rnd.nextInt(4) == 0 ? new Margin(-sdb * rnd.nextDouble() - 1e-3, null)
                        : Margin.of(-sdb * (0.1 + rnd.nextDouble()), sdb * (0.1 + rnd.nextDouble()));
                EquivalenceTest e = EquivalenceTest.withDefaults().with(v).withMargin(m).withAlpha(Math.min(alpha, 0.2));
                EquivalenceResult raw = e.test(before, after);
                if (m.upper() == null) {
                    assertThat(raw.tUpper()).isNull();
                    assertThat(e.test(sb, sa).pUpper()).isNull();
                    continue;
                }
                same(id + " TOST " + v, raw, e.test(sb, sa));
            }
            if (na == nb) {
                Sample d = GroupPair.pairedDifferences(before, after);
                SummaryStatistics sd = Descriptives.of(d).summary();
                if (sd.variance() > 0) {
                    same(id + " paired", TTest.withDefaults().testPaired(before, after),
                            TTest.withDefaults().testPaired(sd));
                    EquivalenceTest e = EquivalenceTest.withDefaults().withMargin(Margin.of(-0.7 * sdb, 0.4 * sdb));
                    same(id + " paired TOST", e.testPaired(before, after), e.testPaired(sd));
                }
            }
            checked++;
        }
        assertThat(checked).isGreaterThan(250);
    }

    /**
     * Values 1e8 + noise with three decimals: the raw door's difference of means equals the exact
     * one (computed here with BigDecimal arithmetic on the decimal texts, independent of the code
     * under test) to 1e-13, while the summary door, fed means already rounded to ulp(1e8) ≈ 1.5e-8,
     * cannot do better than that rounding allows.
     */
    @Test
    void rawDoorKeepsTheDifferenceUnderALargeOffset() {
        SplittableRandom rnd = new SplittableRandom(7L);
        String[] b = draw(rnd, 9, 1e8, 0.02, 3);
        String[] a = draw(rnd, 11, 1e8 + 0.004, 0.02, 3);
        BigDecimal exact = mean(a).subtract(mean(b));
        TTestResult raw = TTest.withDefaults().test(Sample.ofDecimals(b), Sample.ofDecimals(a));
        Accuracy.assertRel("raw-door estimate vs exact", raw.estimate(), exact.doubleValue(), 1e-13);
        double summaryDoor = Descriptives.of(Sample.ofDecimals(a)).mean() - Descriptives.of(Sample.ofDecimals(b)).mean();
        assertThat(Math.abs(summaryDoor - exact.doubleValue())).as("summary door error")
                .isLessThanOrEqualTo(Math.ulp(1e8));
    }

    private static BigDecimal mean(String[] s) {
        BigDecimal sum = BigDecimal.ZERO;
        for (String v : s) {
            sum = sum.add(new BigDecimal(v));
        }
        return sum.divide(BigDecimal.valueOf(s.length), MathContext.DECIMAL128);
    }
}
