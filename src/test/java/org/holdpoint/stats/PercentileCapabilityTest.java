package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.util.Map;
import org.junit.jupiter.api.Test;

/**
 * The parametric-bootstrap lower bound of the percentile-method Ppk (docs/methods.md §14) on the seeded R
 * samples of {@code fits/} (DistributionFitsReferenceTest checks the indices themselves against R).
 */
class PercentileCapabilityTest {
    private static final Map<String, double[]> SAMPLES = DistributionFitsReferenceTest.samples();

    /**
     * Stable to 2 decimals: with the recorded number of resamples, five other seeds move the bound by less
     * than 0.01 in all (the requirement of issue 18; a Monte Carlo property, no outside value).
     */
    @Test
    void theBoundIsStableToTwoDecimalsAcrossSeeds() {
        for (String id : new String[] {"lnorm-30", "weib-40", "gamma-25"}) {
            double[] x = SAMPLES.get(id);
            DistributionFamily family = id.startsWith("lnorm") ? DistributionFamily.LOGNORMAL
                    : id.startsWith("weib") ? DistributionFamily.WEIBULL : DistributionFamily.GAMMA;
            FittedDistribution f = DistributionFits.fit(family, x);
            double lo = Double.POSITIVE_INFINITY;
            double hi = Double.NEGATIVE_INFINITY;
            for (long seed = 1; seed <= 5; seed++) {
                double b = PercentileCapability.of(null, upper(id), 0.05)
                        .withBootstrap(seed, PercentileCapability.RESAMPLES).compute(f, x).ppkLower();
                lo = Math.min(lo, b);
                hi = Math.max(hi, b);
            }
            assertThat(hi - lo).as(id + ": spread of the bound over five seeds").isLessThan(0.01);
        }
    }

    /**
     * On a normal sample the bootstrap bound of the percentile Ppk must come close to Bissell's normal-theory
     * bound (Bissell 1990, Appl. Statist. 39:331–336, the bound {@link Capability} gives): both estimate the
     * same 95 % lower bound; they differ by the ML against the n − 1 divisor (0.8 % at n = 60) and by Monte
     * Carlo error, so 0.03 is allowed (our tolerance, no source).
     */
    @Test
    void onNormalDataTheBootstrapBoundMeetsBissellsBound() {
        double[] x = SAMPLES.get("norm-60");
        FittedDistribution f = DistributionFits.fit(DistributionFamily.NORMAL, x);
        PercentileCapabilityResult p = PercentileCapability.of(24.99, 25.03, 0.05).compute(f, x);
        CapabilityResult normal = Capability.withDefaults().withLimits(24.99, 25.03).withAlpha(0.05)
                .compute(Sample.of(x));
        assertThat(p.ppkLower()).isCloseTo(normal.ppkLower(), within(0.03));
        assertThat(p.ppkLower()).isLessThan(p.ppk());
    }

    /**
     * Coverage of the nominal 95 % bound on seeded simulations (a Monte Carlo property of the method, no outside
     * value): true Ppk 1.33 against a USL only, n = 30, 300 studies of 1000 resamples each for a lognormal
     * (sdlog 0.5) and a Weibull (shape 1.5) process. Coverage must reach 0.91 (0.95 less three Monte Carlo
     * standard errors of 0.0126); the plain percentile bound would fail this (about 0.85 measured).
     */
    @Test
    void theBoundCoversTheTrueIndexAsOftenAsItClaims() {
        for (FittedDistribution truth : new FittedDistribution[] {
            new FittedDistribution(DistributionFamily.LOGNORMAL, 0, 0.5, 30, 0),
            new FittedDistribution(DistributionFamily.WEIBULL, 1.5, 1, 30, 0)}) {
            double x50 = truth.quantile(0.5);
            double usl = x50 + 1.33 * (truth.quantile(0.99865) - x50);
            org.apache.commons.math3.random.RandomGenerator rng = new org.apache.commons.math3.random.Well19937c(11);
            int covered = 0;
            int studies = 300;
            for (int r = 0; r < studies; r++) {
                double[] x = new double[30];
                for (int i = 0; i < x.length; i++) {
                    x[i] = truth.quantile(Math.max(1e-12, rng.nextDouble()));
                }
                FittedDistribution f = DistributionFits.fit(truth.family(), x);
                double bound = PercentileCapability.of(null, usl, 0.05).withBootstrap(r + 1, 1000).compute(f, x)
                        .ppkLower();
                if (bound <= 1.33) {
                    covered++;
                }
            }
            assertThat(covered / (double) studies).as(truth.family() + " coverage").isGreaterThanOrEqualTo(0.91);
        }
    }

    @Test
    void theSeedAndTheResamplesAreRecordedAndRepeatTheBound() {
        double[] x = SAMPLES.get("weib-40");
        FittedDistribution f = DistributionFits.fit(DistributionFamily.WEIBULL, x);
        PercentileCapabilityResult a = PercentileCapability.of(null, 0.08, 0.05).compute(f, x);
        PercentileCapabilityResult b = PercentileCapability.of(null, 0.08, 0.05).compute(f, x);
        assertThat(a.seed()).isEqualTo(PercentileCapability.SEED);
        assertThat(a.resamples()).isEqualTo(PercentileCapability.RESAMPLES);
        assertThat(b.ppkLower()).isEqualTo(a.ppkLower());
        assertThat(a.ppl()).isNull();
        assertThat(a.ppk()).isEqualTo(a.ppu());
    }

    private static double upper(String id) {
        return switch (id) {
            case "lnorm-30" -> 0.05;
            case "weib-40" -> 0.08;
            default -> 0.06;
        };
    }
}
