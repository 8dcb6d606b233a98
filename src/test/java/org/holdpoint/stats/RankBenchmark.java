package org.holdpoint.stats;

import java.util.Arrays;
import java.util.Locale;
import java.util.SplittableRandom;

/**
 * Benchmark (a measurement, not a test): the rank-sum and signed-rank comparisons with Hodges–Lehmann estimate
 * and both intervals on 100,000 × 100,000 values; prints the median of 5 timed runs (wall and thread CPU time)
 * after 3 warm-up runs.
 * Run: java -cp target/classes:target/test-classes:$HOME/.m2/repository/org/apache/commons/commons-math3/3.6.1/
 * commons-math3-3.6.1.jar org.holdpoint.stats.RankBenchmark
 */
public final class RankBenchmark {
    private RankBenchmark() {
    }

    /**
     * Runs the benchmark.
     *
     * @param args ignored
     */
    public static void main(String[] args) {
        int n = 100_000;
        SplittableRandom rnd = new SplittableRandom(42);
        for (String kind : new String[] {"continuous", "rounded to 0.01 (tied)"}) {
            double[] b = new double[n];
            double[] a = new double[n];
            for (int i = 0; i < n; i++) {
                b[i] = 25 + rnd.nextGaussian() * 0.4;
                a[i] = 25.02 + rnd.nextGaussian() * 0.45;
                if (kind.startsWith("rounded")) {
                    b[i] = Math.round(b[i] * 100) / 100.0;
                    a[i] = Math.round(a[i] * 100) / 100.0;
                }
            }
            Sample before = Sample.of(b);
            Sample after = Sample.of(a);
            RankSumTest rs = RankSumTest.withDefaults().withMargin(Margin.symmetric(0.1));
            SignedRankTest sr = SignedRankTest.withDefaults().withMargin(Margin.symmetric(0.1));
            report("rank sum 1e5 x 1e5, " + kind, () -> rs.test(before, after).toString());
            report("signed rank 1e5 pairs, " + kind, () -> sr.test(before, after).toString());
            double[] sa = a.clone();
            double[] sb = b.clone();
            Arrays.sort(sa);
            Arrays.sort(sb);
            PairwiseSelection sel = PairwiseSelection.differences(sa, sb);
            report("one k-th difference selection (K = 1e10), " + kind,
                    () -> sel.select(5_000_000_000L) + " rounds " + sel.lastRounds);
        }
    }

    private static void report(String what, java.util.function.Supplier<String> task) {
        String out = null;
        for (int i = 0; i < 3; i++) {
            out = task.get();
        }
        java.lang.management.ThreadMXBean bean = java.lang.management.ManagementFactory.getThreadMXBean();
        long[] t = new long[5];
        long[] cpu = new long[5];
        for (int i = 0; i < 5; i++) {
            long c = bean.getCurrentThreadCpuTime();
            long s = System.nanoTime();
            out = task.get();
            t[i] = System.nanoTime() - s;
            cpu[i] = bean.getCurrentThreadCpuTime() - c;
        }
        Arrays.sort(t);
        Arrays.sort(cpu);
        // wall time suffers when the machine is shared; thread CPU time much less so
        System.out.printf(Locale.ROOT, "%-50s wall median %7.1f ms (min %.1f), cpu median %7.1f ms (min %.1f)%n  %s%n",
                what, t[2] / 1e6, t[0] / 1e6, cpu[2] / 1e6, cpu[0] / 1e6,
                out.length() > 300 ? out.substring(0, 300) : out);
    }
}
