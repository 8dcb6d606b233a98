package org.holdpoint.workflow;

import java.util.List;
import java.util.Map;
import org.holdpoint.report.NamedImage;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.result.StudyResult;

/**
 * Supplies the chart PNGs of every characteristic for the sign-off workbook. The workflow plugs the chart
 * renderer in here; the report only embeds the bytes it receives.
 */
@FunctionalInterface
public interface ChartSource {
    /** No charts. */
    ChartSource NONE = (study, result) -> Map.of();

    /**
     * Renders the charts.
     *
     * @param study  the study
     * @param result its analysis
     * @return chart PNGs per characteristic name, in the order they are shown
     */
    Map<String, List<NamedImage>> charts(ChangeStudy study, StudyResult result);
}
