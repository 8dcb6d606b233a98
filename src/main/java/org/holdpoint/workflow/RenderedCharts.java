package org.holdpoint.workflow;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.stream.IntStream;
import org.holdpoint.chart.ChartExport;
import org.holdpoint.chart.NamedChart;
import org.holdpoint.chart.StudyCharts;
import org.holdpoint.report.NamedImage;
import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.result.StudyResult;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.Progress;

/**
 * Every chart of an analysed study rendered once to PNG, on all cores: the files of {@code --charts} and the
 * images the sign-off workbook embeds are the same bytes (a run that writes both renders each chart once). Each
 * chart is an independent object, so the bytes do not depend on the number of threads (tested).
 */
public final class RenderedCharts implements ChartSource {
    private final List<NamedImage> pages;
    private final Map<String, List<NamedImage>> perCharacteristic;

    private RenderedCharts(List<NamedImage> pages, Map<String, List<NamedImage>> perCharacteristic) {
        this.pages = List.copyOf(pages);
        this.perCharacteristic = java.util.Collections.unmodifiableMap(perCharacteristic);
    }

    /**
     * Renders the equivalence pages and every characteristic's charts.
     *
     * @param result   the analysis
     * @param data     the characteristics' data, matched by name
     * @param parallel whether characteristics are rendered side by side
     * @param progress progress and cancel port (called under a lock)
     * @return the rendered charts
     */
    public static RenderedCharts render(StudyResult result, List<CharacteristicData> data, boolean parallel,
            Progress progress) {
        StudyCharts charts = StudyCharts.withDefaults();
        double scale = charts.theme().scale();
        List<NamedImage> pages = new ArrayList<>();
        for (NamedChart page : charts.equivalencePages(result)) {
            pages.add(NamedImage.of(page.fileName(), page.png(scale)));
        }
        int n = result.characteristics().size();
        @SuppressWarnings("unchecked")
        List<NamedImage>[] done = new List[n];
        AtomicInteger started = new AtomicInteger();
        IntStream range = IntStream.range(0, n);
        (parallel ? range.parallel() : range).forEach(i -> {
            CharacteristicResult r = result.characteristics().get(i);
            synchronized (progress) {
                progress.checkCancelled();
                progress.step("drawing the charts of " + r.name(), 0.8 * started.getAndIncrement() / n);
            }
            CharacteristicData d = data.stream().filter(c -> c.name().equals(r.name())).findFirst().orElse(null);
            List<NamedImage> images = new ArrayList<>();
            if (d != null) {
                for (NamedChart nc : charts.characteristicCharts(i + 1, n, r, d)) {
                    images.add(NamedImage.of(nc.fileName(), nc.png(scale)));
                }
            }
            done[i] = images;
        });
        Map<String, List<NamedImage>> map = new LinkedHashMap<>();
        for (int i = 0; i < n; i++) {
            if (!done[i].isEmpty()) {
                map.put(result.characteristics().get(i).name(), done[i]);
            }
        }
        return new RenderedCharts(pages, map);
    }

    /**
     * Writes every chart into a folder, each file atomically.
     *
     * @param directory the folder (created when missing)
     * @return the files, equivalence pages first, then the characteristics in study order
     * @throws java.io.IOException when the folder cannot be made
     */
    public List<Path> writeTo(Path directory) throws java.io.IOException {
        java.nio.file.Files.createDirectories(directory);
        List<Path> written = new ArrayList<>();
        for (NamedImage p : pages) {
            written.add(ChartExport.writeAtomically(p.png(), directory.resolve(p.name())));
        }
        for (List<NamedImage> images : perCharacteristic.values()) {
            for (NamedImage i : images) {
                written.add(ChartExport.writeAtomically(i.png(), directory.resolve(i.name())));
            }
        }
        return written;
    }

    /** @return the equivalence pages */
    public List<NamedImage> pages() {
        return pages;
    }

    @Override
    public Map<String, List<NamedImage>> charts(ChangeStudy study, StudyResult result) {
        return perCharacteristic;
    }
}
