package org.holdpoint.workflow;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.holdpoint.report.NamedImage;
import org.holdpoint.result.StudyResult;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.Progress;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The characteristics are analysed and their charts rendered side by side on all cores; the results, the JSON
 * and every chart's bytes are the same as one by one (issue: parallel results byte-identical to sequential ones).
 */
class ParallelSameResultsTest {
    private static AnalysisOutcome imported(Path csv) {
        return new AnalyzeUseCase().importOnly(ImportOptions.file(csv), AnalyzeUseCase.settingsBeside(csv),
                AnalysisSettings.defaultSettings());
    }

    @Test
    void theDemoASkewedAndALargeStudyGiveTheSameBytesEitherWay(@TempDir Path dir) throws Exception {
        // the demo study, and a study of our own whose characteristics need fitted distributions and the bootstrap
        StringBuilder csv = new StringBuilder("phase,Flatness A (mm),Runout B (mm),Bore C (mm)\n");
        java.util.SplittableRandom rnd = new java.util.SplittableRandom(20261204);
        for (String phase : new String[] {"before", "after"}) {
            for (int i = 0; i < 40; i++) {
                double g = -Math.log(1 - rnd.nextDouble()) * 0.004 + -Math.log(1 - rnd.nextDouble()) * 0.004;
                double w = 0.01 * Math.pow(-Math.log(1 - rnd.nextDouble()), 1 / 1.8);
                csv.append(phase).append(',').append(String.format(java.util.Locale.ROOT, "%.4f,%.4f,%.4f", g, w,
                        20 + 0.01 * (rnd.nextDouble() - 0.5))).append('\n');
            }
        }
        Path skew = dir.resolve("skew.csv");
        Files.writeString(skew, csv);
        Files.writeString(dir.resolve("skew.settings.csv"), "characteristic,usl,margin_ratio,distribution\n"
                + "Flatness A,0.06,1.25,gamma\nRunout B,0.05,1.25,weibull\nBore C,,,\n");
        // and a large one (12,000 + 12,000 values, a margin): its rank comparison runs beside its other methods
        StringBuilder big = new StringBuilder("phase,Shaft D (mm)\n");
        for (String phase : new String[] {"before", "after"}) {
            for (int i = 0; i < 12_000; i++) {
                big.append(phase).append(',').append(String.format(java.util.Locale.ROOT, "%.4f",
                        12 + 0.01 * rnd.nextGaussian())).append('\n');
            }
        }
        Path large = dir.resolve("large.csv");
        Files.writeString(large, big);
        Files.writeString(dir.resolve("large.settings.csv"), "characteristic,margin\nShaft D,0.004\n");
        for (Path file : List.of(Path.of("sample-data/boring-bar-insert.csv"), skew, large)) {
            AnalysisOutcome in = imported(file);
            StudyResult sequential = new StudyAnalyzer(false).analyze(in.data(), in.settings(), Progress.NONE);
            StudyResult parallel = new StudyAnalyzer(true).analyze(in.data(), in.settings(), Progress.NONE);
            assertThat(ResultJson.text(ResultJson.of(in.data(), in.settings(), parallel))).as(file.toString())
                    .isEqualTo(ResultJson.text(ResultJson.of(in.data(), in.settings(), sequential)));
            Map<String, List<NamedImage>> one = RenderedCharts.render(sequential, in.data().characteristics(), false,
                    Progress.NONE).charts(null, sequential);
            Map<String, List<NamedImage>> many = RenderedCharts.render(parallel, in.data().characteristics(), true,
                    Progress.NONE).charts(null, parallel);
            assertThat(many.keySet()).containsExactlyElementsOf(one.keySet());
            for (String name : one.keySet()) {
                assertThat(many.get(name)).hasSameSizeAs(one.get(name));
                for (int k = 0; k < one.get(name).size(); k++) {
                    assertThat(many.get(name).get(k).name()).isEqualTo(one.get(name).get(k).name());
                    assertThat(many.get(name).get(k).png()).as(name + " chart " + k)
                            .isEqualTo(one.get(name).get(k).png());
                }
            }
        }
    }
}
