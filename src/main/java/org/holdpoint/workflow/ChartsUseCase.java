package org.holdpoint.workflow;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.holdpoint.chart.ChartException;

/** Renders every chart of an analysed study to PNG files in a folder (each file written atomically), on all cores. */
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
            return write(render(outcome), dir);
        } catch (ChartException e) {
            throw new IOException(e.getMessage(), e);
        }
    }

    /**
     * Renders every chart once, on all cores (for a run that writes both the files and the workbook).
     *
     * @param outcome the analysis
     * @return the rendered charts, also a chart source for the workbook
     */
    public static RenderedCharts render(AnalysisOutcome outcome) {
        return RenderedCharts.render(outcome.result(), outcome.data().characteristics(), true,
                org.holdpoint.study.Progress.NONE);
    }

    /**
     * Writes charts rendered before into a folder.
     *
     * @param charts the rendered charts
     * @param dir    the folder, created when missing
     * @return the files written
     * @throws IOException when the folder or a file cannot be written
     */
    public static List<Path> write(RenderedCharts charts, Path dir) throws IOException {
        try {
            return charts.writeTo(dir);
        } catch (ChartException e) {
            throw new IOException(e.getMessage(), e);
        }
    }
}
