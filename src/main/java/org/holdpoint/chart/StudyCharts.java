package org.holdpoint.chart;

import java.nio.file.Path;
import java.text.Normalizer;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.Future;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.study.SpecLimits;
import org.holdpoint.result.StudyResult;

/**
 * All charts of a change study: the equivalence picture (in pages of rows) and, per characteristic, the box plot,
 * the histograms and the normal probability plot; rendered to PNG in memory or into a directory with safe file
 * names, each file written atomically. Immutable.
 *
 * <p>File names: {@code equivalence.png} (or {@code equivalence-1.png}, {@code -2}, … when there are several
 * pages) and {@code NNN-name-box.png}, {@code NNN-name-histogram.png}, {@code NNN-name-normal-plot.png}, where
 * NNN is the characteristic's 1-based position (so names stay unique after sanitising) and name is
 * {@link #safeName(String)}.
 */
public final class StudyCharts {
    private static final StudyCharts DEFAULTS = new StudyCharts(ChartTheme.withDefaults(), 40, 1);

    private final ChartTheme theme;
    private final int rowsPerPage;
    private final int threads;

    private StudyCharts(ChartTheme theme, int rowsPerPage, int threads) {
        this.theme = theme;
        this.rowsPerPage = rowsPerPage;
        this.threads = threads;
    }

    /**
     * The defaults: {@link ChartTheme#withDefaults()}, 40 characteristics per equivalence page, and rendering on
     * the calling thread only.
     *
     * @return the default chart set
     */
    public static StudyCharts withDefaults() {
        return DEFAULTS;
    }

    /**
     * @param newTheme the theme
     * @return a chart set with that theme
     */
    public StudyCharts with(ChartTheme newTheme) {
        if (newTheme == null) {
            throw new ChartException("a theme is required");
        }
        return new StudyCharts(newTheme, rowsPerPage, threads);
    }

    /**
     * @param rows characteristics per equivalence page, 1..{@link EquivalenceChart#MAX_ROWS}
     * @return a chart set with that page size
     */
    public StudyCharts withRowsPerPage(int rows) {
        if (rows < 1 || rows > EquivalenceChart.MAX_ROWS) {
            throw new ChartException("rows per equivalence page must lie in 1..%d, got %d", EquivalenceChart.MAX_ROWS,
                    rows);
        }
        return new StudyCharts(theme, rows, threads);
    }

    /**
     * @param count how many threads {@link #writeAll} renders characteristics on, 1..16 (1 = the calling thread);
     *              each chart is an independent object, so the files are the same whatever the count
     * @return a chart set with that many rendering threads
     */
    public StudyCharts withThreads(int count) {
        if (count < 1 || count > 16) {
            throw new ChartException("rendering threads must lie in 1..16, got %d", count);
        }
        return new StudyCharts(theme, rowsPerPage, count);
    }

    /** @return the theme in use */
    public ChartTheme theme() {
        return theme;
    }

    /**
     * The equivalence picture of the study, in pages of {@code rowsPerPage} characteristics.
     *
     * @param result the study's analysis
     * @return one chart per page, in order
     */
    public List<NamedChart> equivalencePages(StudyResult result) {
        List<CharacteristicResult> all = result.characteristics();
        List<NamedChart> pages = new ArrayList<>();
        int count = (all.size() + rowsPerPage - 1) / rowsPerPage;
        for (int p = 0; p < count; p++) {
            int from = p * rowsPerPage;
            int to = Math.min(all.size(), from + rowsPerPage);
            List<CharacteristicResult> rows = all.subList(from, to);
            String label = count == 1 ? null : String.format(Locale.ROOT, "characteristics %d\u2013%d of %d, page "
                    + "%d of %d", from + 1, to, all.size(), p + 1, count);
            String file = count == 1 ? "equivalence.png" : "equivalence-" + (p + 1) + ".png";
            pages.add(new NamedChart(file, ChartKind.EQUIVALENCE, null, EquivalenceChart.create(rows, label, theme),
                    theme.width(), theme.equivalenceHeight(rows.size())));
        }
        return pages;
    }

    /**
     * The box plot, histograms and normal probability plot of one characteristic.
     *
     * @param position the characteristic's 1-based position in the study (file name prefix)
     * @param count    the number of characteristics in the study (prefix width)
     * @param result   its analysis (spec limits, unit)
     * @param data     its data
     * @return the three charts, or none when a group has no value (a characteristic that is not assessable)
     */
    public List<NamedChart> characteristicCharts(int position, int count, CharacteristicResult result,
            CharacteristicData data) {
        if (data.before().size() == 0 || data.after().size() == 0) {
            return List.of();
        }
        SpecLimits limits = result.settings() == null ? SpecLimits.NONE : result.settings().spec();
        CharacteristicData d = data.unit() == null && result.unit() != null ? new CharacteristicData(data.name(),
                result.unit(), data.before(), data.after(), data.paired(), data.unmatchedUnits()) : data;
        String stem = String.format(Locale.ROOT, "%0" + Math.max(3, Integer.toString(count).length()) + "d-%s-",
                position, safeName(data.name()));
        double h = theme.standardHeight();
        List<NamedChart> out = new ArrayList<>(List.of(
                new NamedChart(stem + ChartKind.BOX_PLOT.fileSuffix() + ".png", ChartKind.BOX_PLOT, data.name(),
                        BoxPlotChart.withCriteria(BoxPlotChart.create(d, limits, theme), result, theme), theme.width(),
                        h),
                new NamedChart(stem + ChartKind.HISTOGRAM.fileSuffix() + ".png", ChartKind.HISTOGRAM, data.name(),
                        DistributionCharts.histogram(d, limits, theme, fits(result)), theme.width(), h),
                new NamedChart(stem + ChartKind.NORMAL_PROBABILITY.fileSuffix() + ".png",
                        ChartKind.NORMAL_PROBABILITY, data.name(), DistributionCharts.probability(d, limits, theme,
                                fits(result)), theme.width(), h)));
        if (result.checks() != null && result.checks().stability() != null) {
            out.add(new NamedChart(stem + ChartKind.RUN_CHART.fileSuffix() + ".png", ChartKind.RUN_CHART, data.name(),
                    RunChart.create(result, d.resolutionDecimals() + 2, theme), theme.width(),
                    // the means chart above the sd chart needs more height than one plot
                    result.checks().stability().kind() == org.holdpoint.stats.ControlChart.Kind.MEANS ? h * 1.3 : h));
        }
        return out;
    }

    /** The fitted distributions of both groups when capability is judged by a fitted family, else null. */
    private static org.holdpoint.stats.FittedDistribution[] fits(CharacteristicResult r) {
        var k = r.checks();
        if (k == null || k.before().percentile() == null || k.after().percentile() == null) {
            return null;
        }
        return new org.holdpoint.stats.FittedDistribution[] {k.before().percentile().fit(),
            k.after().percentile().fit()};
    }

    /**
     * Every chart of the study, built in memory (use {@link #writeAll} for large studies).
     *
     * @param result the study's analysis
     * @param data   the characteristics' data, matched to the results by name
     * @return the equivalence pages, then three charts per characteristic in study order
     * @throws ChartException if a result has no data of the same name
     */
    public List<NamedChart> all(StudyResult result, List<CharacteristicData> data) {
        List<NamedChart> charts = new ArrayList<>(equivalencePages(result));
        List<CharacteristicData> matched = match(result, data);
        int n = result.characteristics().size();
        for (int i = 0; i < n; i++) {
            charts.addAll(characteristicCharts(i + 1, n, result.characteristics().get(i), matched.get(i)));
        }
        return charts;
    }

    /**
     * Renders every chart of the study into a directory, each file written atomically; characteristics are rendered
     * on {@code threads} threads (see {@link #withThreads}), and the list keeps study order either way.
     *
     * @param result    the study's analysis
     * @param data      the characteristics' data, matched to the results by name
     * @param directory the output directory, created when missing
     * @return the written files, equivalence pages first
     * @throws ChartException if a result has no data or a file cannot be written
     */
    public List<Path> writeAll(StudyResult result, List<CharacteristicData> data, Path directory) {
        List<CharacteristicData> matched = match(result, data);
        List<Path> written = new ArrayList<>();
        for (NamedChart page : equivalencePages(result)) {
            written.add(page.writeTo(directory, theme.scale()));
        }
        int n = result.characteristics().size();
        List<Callable<List<Path>>> jobs = new ArrayList<>(n);
        for (int i = 0; i < n; i++) {
            int position = i + 1;
            CharacteristicResult r = result.characteristics().get(i);
            CharacteristicData d = matched.get(i);
            jobs.add(() -> {
                List<Path> files = new ArrayList<>(3);
                for (NamedChart c : characteristicCharts(position, n, r, d)) {
                    files.add(c.writeTo(directory, theme.scale()));
                }
                return files;
            });
        }
        written.addAll(threads == 1 ? runHere(jobs) : runPooled(jobs));
        return written;
    }

    private static List<Path> runHere(List<Callable<List<Path>>> jobs) {
        List<Path> files = new ArrayList<>();
        for (Callable<List<Path>> job : jobs) {
            files.addAll(call(job));
        }
        return files;
    }

    private static List<Path> call(Callable<List<Path>> job) {
        try {
            return job.call();
        } catch (RuntimeException e) {
            throw e;
        } catch (Exception e) {
            throw new ChartException(e, "rendering failed: %s", e.getMessage());
        }
    }

    private List<Path> runPooled(List<Callable<List<Path>>> jobs) {
        ExecutorService pool = Executors.newFixedThreadPool(threads, job -> {
            Thread t = new Thread(job, "holdpoint-chart");
            t.setDaemon(true);
            return t;
        });
        try {
            List<Future<List<Path>>> futures = new ArrayList<>(jobs.size());
            for (Callable<List<Path>> job : jobs) {
                futures.add(pool.submit(job));
            }
            List<Path> files = new ArrayList<>();
            for (Future<List<Path>> f : futures) {
                files.addAll(f.get());
            }
            return files;
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new ChartException(e, "chart rendering was interrupted");
        } catch (ExecutionException e) {
            if (e.getCause() instanceof RuntimeException re) {
                throw re;
            }
            throw new ChartException(e.getCause(), "rendering failed: %s", e.getCause().getMessage());
        } finally {
            pool.shutdownNow();
        }
    }

    private static List<CharacteristicData> match(StudyResult result, List<CharacteristicData> data) {
        Map<String, CharacteristicData> byName = new HashMap<>();
        for (CharacteristicData d : data) {
            if (byName.putIfAbsent(d.name(), d) != null) {
                throw new ChartException("two characteristics are named '%s'; rename one so that each chart can be "
                        + "matched to its data", d.name());
            }
        }
        List<CharacteristicData> matched = new ArrayList<>();
        for (CharacteristicResult r : result.characteristics()) {
            CharacteristicData d = byName.get(r.name());
            if (d == null) {
                throw new ChartException("no data were given for characteristic '%s'", r.name());
            }
            matched.add(d);
        }
        return matched;
    }

    /**
     * A file-name-safe form of a characteristic's name: accents dropped, letters and digits kept, every other run
     * of characters turned into one hyphen, lower case, at most 48 characters; "characteristic" when nothing is left.
     *
     * @param name the characteristic's name
     * @return the safe name, e.g. "bore-diameter-o-12-h7" for "Bore diameter Ø 12 H7"
     */
    public static String safeName(String name) {
        String plain = name.replace("\u00df", "ss").replace("\u00d8", "O").replace("\u00f8", "o")
                .replace("\u00b5", "u").replace("\u03bc", "u");
        String s = Normalizer.normalize(plain, Normalizer.Form.NFKD).replaceAll("\\p{M}+", "")
                .toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("^-+|-+$", "");
        if (s.length() > 48) {
            s = s.substring(0, 48).replaceAll("-+$", "");
        }
        return s.isEmpty() ? "characteristic" : s;
    }
}
