package org.holdpoint.workflow;

import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicBoolean;
import org.holdpoint.stats.Sample;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.GroupData;
import org.holdpoint.study.ImportReport;
import org.holdpoint.study.Progress;

/**
 * Analyses a small invented characteristic on a thread of its own while the layout of the user's data is worked out
 * (on one core), so that the analysis' one-time costs (loading and initialising its classes, the first evaluations of the t, F and
 * normal distributions, the first compilations of the rank selection) are paid beside the import instead of at the
 * start of the user's analysis (docs/performance.md). Its result is not used.
 */
public final class AnalysisWarmUp {
    /** Values per group: enough for every check the analysis makes, few enough to take milliseconds. */
    static final int N = 60;

    private AnalysisWarmUp() {
    }

    private static final AtomicBoolean STARTED = new AtomicBoolean();

    /**
     * Cells read from which the warm-up pays (measured: a million values −50 ms, the battery of 200 characteristics
     * −50 ms; a 20-row workbook +6 ms, within the noise, so small files go without it).
     */
    static final long FROM_CELLS = 20_000;

    /**
     * Starts the warm-up when a file of at least {@value #FROM_CELLS} cells has been read.
     *
     * @param cells the cells read
     */
    public static void startFor(long cells) {
        if (cells >= FROM_CELLS) {
            start();
        }
    }

    /** Starts the warm-up on a daemon thread, once per process (later calls do nothing). */
    public static void start() {
        if (!STARTED.compareAndSet(false, true)) {
            return;
        }
        Thread t = new Thread(AnalysisWarmUp::run, "holdpoint-analysis-warm-up");
        t.setDaemon(true);
        t.setPriority(Thread.MIN_PRIORITY);
        t.start();
    }

    /**
     * Analyses the invented characteristic: readings at a resolution of 0.001 with ties, the after group shifted by
     * a few steps (no random numbers: the same values every time).
     *
     * @return the number of characteristics analysed (one)
     */
    static int run() {
        long[] before = new long[N];
        long[] after = new long[N];
        for (int i = 0; i < N; i++) {
            before[i] = 10_000 + (i * 37) % 23;
            after[i] = 10_003 + (i * 29) % 19;
        }
        CharacteristicData c = new CharacteristicData("warm-up", "mm",
                GroupData.typed(Sample.ofUnscaled(before, 3), "warm-up"),
                GroupData.typed(Sample.ofUnscaled(after, 3), "warm-up"), false, List.of());
        Dataset d = new Dataset(List.of(c), List.of(), new ImportReport(2L * N, Map.of(), List.of(), List.of()));
        return new StudyAnalyzer().analyze(d, AnalysisSettings.defaultSettings(), Progress.NONE).characteristics()
                .size();
    }
}
