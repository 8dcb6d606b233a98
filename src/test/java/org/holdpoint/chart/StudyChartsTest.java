package org.holdpoint.chart;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import javax.imageio.ImageIO;
import javax.imageio.ImageReader;
import javax.imageio.metadata.IIOMetadataNode;
import javax.imageio.stream.ImageInputStream;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.result.StudyResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.w3c.dom.Node;

/** The chart set of a whole (invented) study, written to a directory. */
class StudyChartsTest {
    private final ChartTheme theme = ChartTheme.withDefaults().withScale(1.5);
    private final StudyCharts charts = StudyCharts.withDefaults().with(theme);
    private final List<ChartFixtures.Item> demo = ChartFixtures.demo();

    @Test
    void writesEveryChartWithSafeNamesAndNoTemporaryFiles(@TempDir Path dir) throws IOException {
        StudyResult study = ChartFixtures.study(demo);
        List<double[]> before = new ArrayList<>();
        for (ChartFixtures.Item it : demo) {
            before.add(it.data().before().sample().values());
        }
        List<Path> written = charts.writeAll(study, ChartFixtures.data(demo), dir.resolve("charts"));
        assertThat(written).hasSize(1 + 3 * demo.size());
        try (Stream<Path> files = Files.list(dir.resolve("charts"))) {
            assertThat(files.map(p -> p.getFileName().toString()).toList()).hasSize(written.size())
                    .allMatch(n -> n.matches("[a-z0-9-]+\\.png"))
                    .contains("equivalence.png", "001-bore-diameter-o-12-h7-box.png",
                            "003-tightening-torque-histogram.png", "005-surface-roughness-ra-flank-normal-plot.png");
        }
        for (Path p : written) {
            BufferedImage img = ImageIO.read(p.toFile());
            double height = p.getFileName().toString().startsWith("equivalence")
                    ? theme.equivalenceHeight(demo.size()) : theme.standardHeight();
            ChartAssertions.assertRendered(img, theme.width(), height, theme.scale());
        }
        for (int i = 0; i < demo.size(); i++) {
            assertThat(demo.get(i).data().before().sample().values()).containsExactly(before.get(i));
        }
        // written again: files are replaced, still no temporary file left behind
        charts.writeAll(study, ChartFixtures.data(demo), dir.resolve("charts"));
        try (Stream<Path> files = Files.list(dir.resolve("charts"))) {
            assertThat(files.count()).isEqualTo(written.size());
        }
    }

    @Test
    void twoThreadsWriteTheSameFilesInTheSameOrder(@TempDir Path dir) throws IOException {
        StudyResult study = ChartFixtures.study(demo);
        List<Path> one = charts.writeAll(study, ChartFixtures.data(demo), dir.resolve("one"));
        List<Path> two = charts.withThreads(2).writeAll(study, ChartFixtures.data(demo), dir.resolve("two"));
        assertThat(two).extracting(p -> p.getFileName().toString())
                .containsExactlyElementsOf(one.stream().map(p -> p.getFileName().toString()).toList());
        for (int i = 0; i < one.size(); i++) {
            assertThat(Files.readAllBytes(two.get(i))).as(one.get(i).getFileName().toString())
                    .isEqualTo(Files.readAllBytes(one.get(i)));
        }
        assertThatThrownBy(() -> charts.withThreads(0)).isInstanceOf(ChartException.class);
    }

    @Test
    void pngCarriesItsPhysicalResolution(@TempDir Path dir) throws IOException {
        byte[] png = charts.equivalencePages(ChartFixtures.study(demo)).get(0).png(theme.scale());
        try (ImageInputStream in = ImageIO.createImageInputStream(new java.io.ByteArrayInputStream(png))) {
            ImageReader reader = ImageIO.getImageReadersByFormatName("png").next();
            reader.setInput(in);
            IIOMetadataNode root = (IIOMetadataNode) reader.getImageMetadata(0).getAsTree("javax_imageio_png_1.0");
            Node phys = root.getElementsByTagName("pHYs").item(0);
            long perMetre = Long.parseLong(phys.getAttributes().getNamedItem("pixelsPerUnitXAxis").getNodeValue());
            // 72 pt per inch × 1.5 px per pt = 108 dpi = 4252 px per metre (1 in = 0.0254 m, by definition)
            assertThat(perMetre).isEqualTo(Math.round(108 / 0.0254));
            reader.dispose();
        }
    }

    @Test
    void largeStudiesArePagedForty(@TempDir Path dir) {
        List<CharacteristicResult> rows = EquivalenceChartTest.manyRows(85, 11);
        StudyResult study = new StudyResult(rows, false, "change not verified", List.of());
        List<NamedChart> pages = charts.equivalencePages(study);
        assertThat(pages).extracting(NamedChart::fileName).containsExactly("equivalence-1.png", "equivalence-2.png",
                "equivalence-3.png");
        assertThat(pages).extracting(p -> ((org.jfree.chart.axis.SymbolAxis) p.chart().getXYPlot().getRangeAxis())
                .getSymbols().length).containsExactly(40, 40, 5);
        assertThat(pages.get(2).height()).isEqualTo(theme.equivalenceHeight(5));
    }

    @Test
    void missingOrDuplicateDataAreNamed() {
        StudyResult study = ChartFixtures.study(demo);
        List<CharacteristicData> data = new ArrayList<>(ChartFixtures.data(demo));
        data.remove(1);
        assertThatThrownBy(() -> charts.all(study, data)).isInstanceOf(ChartException.class)
                .hasMessageContaining("'Wall thickness'");
        List<CharacteristicData> twice = new ArrayList<>(ChartFixtures.data(demo));
        twice.add(twice.get(0));
        assertThatThrownBy(() -> charts.all(study, twice)).isInstanceOf(ChartException.class)
                .hasMessageContaining("two characteristics are named");
    }

    @Test
    void unwritableTargetFailsWithTheFileName(@TempDir Path dir) throws IOException {
        Path blocker = Files.writeString(dir.resolve("not-a-folder"), "x");
        NamedChart c = charts.equivalencePages(ChartFixtures.study(demo)).get(0);
        assertThatThrownBy(() -> c.writeTo(blocker, 1)).isInstanceOf(ChartException.class)
                .hasMessageContaining("not-a-folder");
        try (Stream<Path> files = Files.list(dir)) {
            assertThat(files.count()).as("nothing but the blocking file").isEqualTo(1);
        }
    }

    @Test
    void safeNames() {
        assertThat(StudyCharts.safeName("Bore diameter \u00d8 12 H7")).isEqualTo("bore-diameter-o-12-h7");
        assertThat(StudyCharts.safeName("../../etc/passwd")).isEqualTo("etc-passwd");
        assertThat(StudyCharts.safeName("Rauheit R\u00e4 / \u00b5m")).isEqualTo("rauheit-ra-um");
        assertThat(StudyCharts.safeName("CON")).isEqualTo("con");
        assertThat(StudyCharts.safeName("***")).isEqualTo("characteristic");
        assertThat(StudyCharts.safeName("x".repeat(100))).hasSize(48);
        assertThat(StudyCharts.safeName("Stra\u00dfe")).isEqualTo("strasse");
    }

    @Test
    void allBuildsThreeChartsPerCharacteristicPlusTheEquivalencePage() {
        List<NamedChart> all = charts.all(ChartFixtures.study(demo), ChartFixtures.data(demo));
        assertThat(all).hasSize(1 + 3 * demo.size());
        assertThat(all).filteredOn(c -> c.kind() == ChartKind.BOX_PLOT).hasSize(demo.size());
        assertThat(all).filteredOn(c -> c.kind() == ChartKind.HISTOGRAM).hasSize(demo.size());
        assertThat(all).filteredOn(c -> c.kind() == ChartKind.NORMAL_PROBABILITY).hasSize(demo.size());
    }

    @Test
    void degenerateGroupsStillRender() {
        // a single value and a constant group: no sd, no curve, no reference line, but every chart draws
        org.holdpoint.stats.Sample one = org.holdpoint.stats.Sample.of(7.5);
        org.holdpoint.stats.Sample flat = org.holdpoint.stats.Sample.of(7.4, 7.4, 7.4, 7.4);
        CharacteristicData d = new CharacteristicData("Slot width", "mm",
                org.holdpoint.study.GroupData.typed(one, "typed"), org.holdpoint.study.GroupData.typed(flat, "typed"),
                false, List.of());
        org.holdpoint.study.SpecLimits limits = new org.holdpoint.study.SpecLimits(7.0, null, 8.0);
        for (org.jfree.chart.JFreeChart c : List.of(BoxPlotChart.create(d, limits, theme),
                DistributionCharts.histogram(d, limits, theme), DistributionCharts.normalProbability(d, limits, theme))) {
            BufferedImage img = ChartAssertions.decode(ChartExport.png(c, theme.width(), theme.standardHeight(), 1));
            ChartAssertions.assertRendered(img, theme.width(), theme.standardHeight(), 1);
        }
    }
}
