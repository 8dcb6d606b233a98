package org.holdpoint.stats;

import java.util.Arrays;
import java.util.Locale;
import java.util.function.IntSupplier;

/**
 * Benchmark (a main, not a test): wall time of a sample-size search that ends near n = 10,000 per group.
 * Case: margin ±0.2, T = 0.15, σ = 1.2, α = 0.05, target 0.9 (answer 9,867 per group). Five warm-up runs,
 * then the median of 11 timed runs. Run: {@code java -cp target/classes:target/test-classes:<commons-math3>
 * org.holdpoint.stats.PlanningBenchmark}.
 */
public final class PlanningBenchmark {
    private static final int WARMUP = 5;
    private static final int RUNS = 11;

    private PlanningBenchmark() {
    }

    /**
     * Prints the medians.
     *
     * @param args unused
     */
    public static void main(String[] args) {
        EquivalencePlan plan = EquivalencePlan.withDefaults().withMargin(Margin.symmetric(0.2)).withAlpha(0.05)
                .withTargetPower(0.9);
        report("TOST search + full plan (21-point power table)", () -> plan.sampleSize(0.15, 1.2).n());
        report("TOST search + minimal plan (2-point table)", () -> plan.withTablePoints(2).sampleSize(0.15, 1.2).n());
        report("single exact TOST power at n = 9,867", () -> (int) (1e6 * plan.tostPower(0.15, 1.2, 9867)));
        report("t-test search, delta 0.05 (n = 8,407)", () -> plan.tTestSampleSize(0.05, 1).n());
    }

    private static void report(String label, IntSupplier task) {
        int answer = 0;
        for (int i = 0; i < WARMUP; i++) {
            answer = task.getAsInt();
        }
        double[] ms = new double[RUNS];
        for (int i = 0; i < RUNS; i++) {
            long t0 = System.nanoTime();
            answer = task.getAsInt();
            ms[i] = (System.nanoTime() - t0) / 1e6;
        }
        Arrays.sort(ms);
        System.out.printf(Locale.ROOT, "%-50s median %8.2f ms  (min %.2f, max %.2f; result %d)%n", label,
                ms[RUNS / 2], ms[0], ms[RUNS - 1], answer);
    }
}
