package org.holdpoint.workflow;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.holdpoint.chart.ChartException;
import org.holdpoint.chart.StudyCharts;

/** Renders every chart of an analysed study to PNG files in a folder (each file written atomically). */
public final class ChartsUseCase {
    private ChartsUseCase() {
    }

    /**
     * Writes the equivalence picture and, per characteristic, the box plot, histogram and normal plot.
     *
     * @param outcome the analysis
     * @param dir     the folder, created when missing
     * @return the files written
     * @throws IOException when the folder or a file cannot be written
     */
    public static List<Path> write(AnalysisOutcome outcome, Path dir) throws IOException {
        try {
            return StudyCharts.withDefaults().writeAll(outcome.result(), outcome.data().characteristics(), dir);
        } catch (ChartException e) {
            throw new IOException(e.getMessage(), e);
        }
    }
}
