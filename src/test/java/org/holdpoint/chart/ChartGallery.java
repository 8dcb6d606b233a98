package org.holdpoint.chart;

import java.nio.file.Path;
import java.util.List;

/**
 * Not a test: writes the documentation images (docs/images) from the invented demo study, so that what the README
 * shows is what the code draws. Run with the test classpath:
 * {@code java -Djava.awt.headless=true org.holdpoint.chart.ChartGallery [dir [all]]}.
 */
public final class ChartGallery {
    private ChartGallery() {
    }

    /**
     * @param args optional output directory (default docs/images) and "all" for every chart of the demo study
     */
    public static void main(String[] args) {
        Path dir = Path.of(args.length > 0 ? args[0] : "docs/images");
        boolean all = args.length > 1 && args[1].equals("all");
        ChartTheme theme = ChartTheme.withDefaults().withScale(2);
        List<ChartFixtures.Item> demo = ChartFixtures.demo();
        StudyCharts charts = StudyCharts.withDefaults().with(theme);
        ChartFixtures.Item bore = demo.get(0);
        for (NamedChart c : charts.characteristicCharts(1, demo.size(), bore.result(), bore.data())) {
            new NamedChart("example-" + c.kind().fileSuffix() + ".png", c.kind(), c.characteristic(), c.chart(),
                    c.width(), c.height()).writeTo(dir, theme.scale());
        }
        new NamedChart("example-equivalence.png", ChartKind.EQUIVALENCE, null,
                EquivalenceChart.create(ChartFixtures.study(demo).characteristics(), null, theme), theme.width(),
                theme.equivalenceHeight(demo.size())).writeTo(dir, theme.scale());
        if (all) {
            List<org.holdpoint.result.CharacteristicResult> rows = EquivalenceChartTest.manyRows(40, 7);
            new NamedChart("forty-rows.png", ChartKind.EQUIVALENCE, null, EquivalenceChart.create(rows,
                    "characteristics 1\u201340 of 40", theme), theme.width(), theme.equivalenceHeight(40))
                    .writeTo(dir, theme.scale());
            double[] d = new double[41];
            double[] p = new double[41];
            for (int i = 0; i < d.length; i++) {
                d[i] = -0.012 + i * 0.0006;
                p[i] = Math.max(0, 0.93 - 9000 * d[i] * d[i]);
            }
            new NamedChart("power.png", ChartKind.POWER_CURVE, null, PowerCurveChart.create(
                    "Bore diameter: 30 parts before, 30 after", "mm", d, p, 0.8, theme), theme.width(),
                    theme.standardHeight()).writeTo(dir, theme.scale());
            for (int i = 1; i < demo.size(); i++) {
                for (NamedChart c : charts.characteristicCharts(i + 1, demo.size(), demo.get(i).result(),
                        demo.get(i).data())) {
                    c.writeTo(dir, theme.scale());
                }
            }
        }
    }
}
