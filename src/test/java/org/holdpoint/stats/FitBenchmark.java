package org.holdpoint.stats;

import java.util.Arrays;
import java.util.Locale;
import java.util.Map;

/**
 * Benchmark (a measurement, not a test): maximum-likelihood fits of each family to the seeded R samples of
 * {@code fits/} (n = 30 and 125), and the whole percentile capability with its 50 000-resample bootstrap
 * bound; prints the median of 7 timed runs after 3 warm-up runs. Compare with {@code fits/bench_scipy.py}
 * (scipy's {@code fit} of the same families on the same samples).
 * Run: java -cp target/holdpoint.jar:target/test-classes org.holdpoint.stats.FitBenchmark
 */
public final class FitBenchmark {
    private FitBenchmark() {
    }

    /**
     * Runs the benchmark.
     *
     * @param args ignored
     */
    public static void main(String[] args) {
        Map<String, double[]> samples = DistributionFitsReferenceTest.samples();
        for (String id : new String[] {"lnorm-30", "lnorm-125"}) {
            double[] x = samples.get(id);
            for (DistributionFamily f : DistributionFamily.values()) {
                int reps = 2000;
                double med = median(() -> {
                    for (int i = 0; i < reps; i++) {
                        DistributionFits.fit(f, x);
                    }
                }) / reps;
                System.out.printf(Locale.ROOT, "fit %-9s %-10s median %8.2f us%n", id, f.key(), med * 1e6);
            }
            for (DistributionFamily f : new DistributionFamily[] {DistributionFamily.LOGNORMAL,
                DistributionFamily.WEIBULL, DistributionFamily.GAMMA, DistributionFamily.RAYLEIGH}) {
                FittedDistribution fit = DistributionFits.fit(f, x);
                double med = median(() -> PercentileCapability.of(null, 100.0, 0.05).compute(fit, x));
                System.out.printf(Locale.ROOT, "capability with bootstrap bound %-9s %-10s median %8.1f ms%n", id,
                        f.key(), med * 1e3);
            }
        }
    }

    private static double median(Runnable r) {
        for (int i = 0; i < 3; i++) {
            r.run();
        }
        double[] t = new double[7];
        for (int i = 0; i < t.length; i++) {
            long t0 = System.nanoTime();
            r.run();
            t[i] = (System.nanoTime() - t0) / 1e9;
        }
        Arrays.sort(t);
        return t[3];
    }
}
