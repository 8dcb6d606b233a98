package org.holdpoint.chart;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.awt.image.BufferedImage;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.ui.Layer;
import org.jfree.data.xy.XYDataset;
import org.junit.jupiter.api.Test;

/** Rendering checks of the power curve from plain arrays (invented numbers shaped like a TOST power curve). */
class PowerCurveChartTest {
    private final ChartTheme theme = ChartTheme.withDefaults();

    @Test
    void oneItemPerPointTargetMarkedArraysUntouched() {
        double[] d = new double[41];
        double[] p = new double[41];
        for (int i = 0; i < d.length; i++) {
            d[i] = -0.02 + i * 0.001;
            p[i] = Math.max(0, 0.9 - 2000 * d[i] * d[i]);
        }
        double[] dCopy = d.clone();
        double[] pCopy = p.clone();
        JFreeChart chart = PowerCurveChart.create("Bore diameter, n = 30 + 30", "mm", d, p, 0.8, theme);
        XYPlot plot = chart.getXYPlot();
        XYDataset data = plot.getDataset();
        assertThat(data.getSeriesCount()).isEqualTo(1);
        assertThat(data.getItemCount(0)).isEqualTo(41);
        for (int i = 0; i < d.length; i++) {
            assertThat(data.getXValue(0, i)).isEqualTo(d[i]);
            assertThat(data.getYValue(0, i)).isEqualTo(p[i]);
        }
        assertThat(plot.getRangeMarkers(Layer.FOREGROUND)).hasSize(1);
        ValueMarker target = (ValueMarker) plot.getRangeMarkers(Layer.FOREGROUND).iterator().next();
        assertThat(target.getValue()).isEqualTo(0.8);
        assertThat(target.getLabel()).isEqualTo("target 80%");
        assertThat(plot.getRangeAxis().getRange().contains(0) && plot.getRangeAxis().getRange().contains(1)).isTrue();
        assertThat(plot.getDomainAxis().getRange().contains(-0.02) && plot.getDomainAxis().getRange().contains(0.02))
                .isTrue();
        assertThat(d).containsExactly(dCopy);
        assertThat(p).containsExactly(pCopy);
        BufferedImage img = ChartAssertions.decode(ChartExport.png(chart, theme.width(), theme.standardHeight(),
                theme.scale()));
        ChartAssertions.assertRendered(img, theme.width(), theme.standardHeight(), theme.scale());
    }

    @Test
    void badInputIsRefusedWithTheOffendingPoint() {
        assertThatThrownBy(() -> PowerCurveChart.create("t", null, new double[] {0, 1}, new double[] {0.5}, 0.8,
                theme)).isInstanceOf(ChartException.class).hasMessageContaining("2 differences and 1 powers");
        assertThatThrownBy(() -> PowerCurveChart.create("t", null, new double[] {0, 0}, new double[] {0.5, 0.6}, 0.8,
                theme)).isInstanceOf(ChartException.class).hasMessageContaining("point 2");
        assertThatThrownBy(() -> PowerCurveChart.create("t", null, new double[] {0, 1}, new double[] {0.5, 1.2}, 0.8,
                theme)).isInstanceOf(ChartException.class).hasMessageContaining("point 2 is 1.2");
        assertThatThrownBy(() -> PowerCurveChart.create("t", null, new double[] {0, 1}, new double[] {0.5, 0.6}, 1.0,
                theme)).isInstanceOf(ChartException.class).hasMessageContaining("target power");
    }
}
