package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.EnumSet;
import java.util.Set;
import java.util.SplittableRandom;
import org.junit.jupiter.api.Test;

/**
 * The two routes to the TOST conclusion (docs/methods.md §3) agree: the tail rule the code decides by,
 * and the interval rule applied to the reported (1 − 2α) interval. Seeded draws (SplittableRandom,
 * fixed seed) over the summary door, two-sided and one-sided margins, α in (0.01, 0.25), and margins
 * placed near the interval bounds on purpose. The R-based cases in {@link RReferenceCasesTest} check
 * the same agreement on outside values.
 *
 * <p>Where a margin coincides with a computed bound to the last bit, the two routes can differ
 * by rounding alone (pL = 0.04999999999999997 against a lower bound exactly equal to L); such draws,
 * with a tail p within 1e-12 of α, are left out here, and the report of this suite names the case.
 */
class TostRoutesTest {

    @Test
    void tailAndIntervalRoutesAgree() {
        SplittableRandom rnd = new SplittableRandom(42L);
        Set<Conclusion> seen = EnumSet.noneOf(Conclusion.class);
        int compared = 0;
        for (int i = 0; i < 5000; i++) {
            long nb = 2 + rnd.nextInt(60);
            long na = 2 + rnd.nextInt(60);
            SummaryStatistics b = new SummaryStatistics(nb, 50 + rnd.nextDouble(), 0.01 + rnd.nextDouble());
            SummaryStatistics a = new SummaryStatistics(na, 50 + rnd.nextDouble(), 0.01 + rnd.nextDouble());
            double alpha = 0.01 + 0.24 * rnd.nextDouble();
            VarianceAssumption v = rnd.nextBoolean() ? VarianceAssumption.EQUAL : VarianceAssumption.UNEQUAL;
            double spread = 0.05 + 2 * rnd.nextDouble();
            double lo = -spread * rnd.nextDouble() - 1e-6;
            double hi = spread * rnd.nextDouble() + 1e-6;
            if (rnd.nextInt(3) == 0) {
                // a margin just beside a bound of the interval: relative 1e-9 or 1e-6 inside or outside
                EquivalenceResult wide = EquivalenceTest.withDefaults().with(v).withAlpha(alpha)
                        .withMargin(Margin.symmetric(1e6)).test(b, a);
                double eps = (rnd.nextBoolean() ? 1e-9 : 1e-6) * (rnd.nextBoolean() ? 1 : -1);
                if (wide.ciLower() < 0) {
                    lo = wide.ciLower() * (1 + eps);
                }
                if (wide.ciUpper() > 0) {
                    hi = wide.ciUpper() * (1 + eps);
                }
            }
            Margin m = switch (rnd.nextInt(4)) {
                case 0 -> new Margin(lo, null);
                case 1 -> new Margin(null, hi);
                default -> Margin.of(lo, hi);
            };
            EquivalenceResult r = EquivalenceTest.withDefaults().with(v).withAlpha(alpha).withMargin(m).test(b, a);
            if (nearAlpha(r.pLower(), alpha) || nearAlpha(r.pUpper(), alpha)) {
                continue;
            }
            assertThat(RReferenceCasesTest.intervalRule(m.lower(), m.upper(), r.ciLower(), r.ciUpper()))
                    .as("draw %d: margin %s, interval [%s, %s], pL %s, pU %s", i, m, r.ciLower(), r.ciUpper(),
                            r.pLower(), r.pUpper())
                    .isEqualTo(r.conclusion());
            assertThat(r.equivalent()).isEqualTo(r.conclusion().claimHolds());
            seen.add(r.conclusion());
            compared++;
        }
        assertThat(compared).isGreaterThan(4900);
        assertThat(seen).isEqualTo(EnumSet.allOf(Conclusion.class));
    }

    /** Whether a one-sided p or its complement lies within 1e-12 of α (a rounding tie). */
    private static boolean nearAlpha(Double p, double alpha) {
        return p != null && (Math.abs(p - alpha) < 1e-12 || Math.abs(1 - p - alpha) < 1e-12);
    }
}
