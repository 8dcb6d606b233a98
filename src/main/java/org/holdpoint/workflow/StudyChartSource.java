package org.holdpoint.workflow;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.holdpoint.chart.NamedChart;
import org.holdpoint.chart.StudyCharts;
import org.holdpoint.report.NamedImage;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.study.Progress;
import org.holdpoint.result.StudyResult;

/**
 * The charts the sign-off workbook embeds: per characteristic its box plot, histograms and normal
 * probability plot, rendered to PNG by {@code chart} (the workbook receives only the bytes).
 */
public final class StudyChartSource implements ChartSource {
    private final Progress progress;

    /** Charts without progress reports. */
    public StudyChartSource() {
        this(Progress.NONE);
    }

    /**
     * Charts that report each characteristic to a progress port and stop when it is cancelled.
     *
     * @param progress the port, called on the caller's thread
     */
    public StudyChartSource(Progress progress) {
        this.progress = progress;
    }

    @Override
    public Map<String, List<NamedImage>> charts(ChangeStudy study, StudyResult result) {
        return RenderedCharts.render(result, study.data().characteristics(), true, progress).charts(study, result);
    }
}
