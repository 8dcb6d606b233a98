package org.holdpoint.chart;

import static org.assertj.core.api.Assertions.assertThat;

import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.holdpoint.stats.BoxStatistics;
import org.junit.jupiter.api.Test;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.CategoryPlot;
import org.jfree.data.statistics.BoxAndWhiskerCategoryDataset;

class BoxPlotChartTest {
    private final ChartTheme theme = ChartTheme.withDefaults();

    @Test
    void rendersBore() throws Exception {
        ChartFixtures.Item bore = ChartFixtures.demo().get(0);
        JFreeChart chart = BoxPlotChart.create(bore.data(), bore.result().settings().spec(), theme);
        byte[] png = ChartExport.png(chart, theme.width(), theme.standardHeight(), theme.scale());
        Files.createDirectories(Path.of("target/chart-look"));
        Files.write(Path.of("target/chart-look/box.png"), png);
        CategoryPlot plot = chart.getCategoryPlot();
        BoxAndWhiskerCategoryDataset boxes = (BoxAndWhiskerCategoryDataset) plot.getDataset(0);
        assertThat(boxes.getColumnCount()).isEqualTo(2);
        assertThat(boxes.getOutliers(0, 1)).containsExactlyInAnyOrderElementsOf(
                List.of(12.031, 12.0305));
    }
}
