package org.holdpoint.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A margin as a ratio after/before from a settings file and from the options, through the text, the JSON and the
 * workbook (which must verify), and its refusals. The numbers themselves are checked against R in
 * RatioTostReferenceTest.
 */
class RatioMarginTest {
    private static Path data(Path dir) throws Exception {
        StringBuilder csv = new StringBuilder("characteristic,phase,value\n");
        double[] b = {1.21, 1.34, 1.18, 1.52, 1.27, 1.41, 1.19, 1.66, 1.31, 1.24, 1.29, 1.45, 1.33, 1.22};
        double[] a = {1.25, 1.31, 1.22, 1.58, 1.29, 1.47, 1.21, 1.71, 1.35, 1.26, 1.33, 1.49, 1.30, 1.28};
        for (double v : b) {
            csv.append("Leak rate,before,").append(v).append('\n');
            csv.append("Offset,before,").append(v - 1.3).append('\n');
        }
        for (double v : a) {
            csv.append("Leak rate,after,").append(v).append('\n');
            csv.append("Offset,after,").append(v - 1.3).append('\n');
        }
        Path f = dir.resolve("leak.csv");
        Files.writeString(f, csv);
        return f;
    }

    @Test
    void aRatioMarginFromTheSettingsIsTestedOnTheLogarithmsAndItsWorkbookVerifies(@TempDir Path dir)
            throws Exception {
        Path f = data(dir);
        Files.writeString(dir.resolve("leak.settings.csv"), "characteristic,usl,margin_ratio\nLeak rate,3,1.25\n"
                + "Offset,1,1.25\n");
        Path book = dir.resolve("leak.xlsx");
        Path json = dir.resolve("leak.json");
        AnalyzeCommandTest.Run r = AnalyzeCommandTest.run("analyze", f.toString(), "--report", book.toString(),
                "--json", json.toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("on the logarithms): (ratio margin 0.8000 to 1.2500)")
                .contains("interval of the ratio after/before (geometric means ");
        // values at or below zero cannot have a ratio margin: that characteristic says so, the other goes on
        assertThat(r.out()).contains("Offset").contains("a ratio margin needs values above 0");
        assertThat(Files.readString(json)).containsPattern("\"scale\"\\s*:\\s*\"ratio\"");
        AnalyzeCommandTest.Run v = AnalyzeCommandTest.run("verify", book.toString());
        assertThat(v.code()).as(v.out() + v.err()).isZero();
    }

    /**
     * A plan from the baseline with a ratio margin is made on the logarithms: the sd of ln x and (ln L, ln U)
     * with a true ratio of 1 (the exact TOST sample size itself is checked against published tables in
     * EquivalencePlanReferenceTest).
     */
    @Test
    void aPlanWithARatioMarginIsMadeOnTheLogarithms(@TempDir Path dir) throws Exception {
        Path f = data(dir);
        Files.writeString(dir.resolve("leak.settings.csv"), "characteristic,margin_ratio\nLeak rate,1.1\n");
        Path json = dir.resolve("plan.json");
        AnalyzeCommandTest.Run r = AnalyzeCommandTest.run("plan", "--from", f.toString(), "--power", "0.9", "--json",
                json.toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("planned on the logarithms (sd of ln x");
        var rows = new com.fasterxml.jackson.databind.ObjectMapper().readTree(json.toFile()).path("characteristics");
        var leak = rows.get(0);
        assertThat(leak.path("name").asText()).isEqualTo("Leak rate");
        double[] before = {1.21, 1.34, 1.18, 1.52, 1.27, 1.41, 1.19, 1.66, 1.31, 1.24, 1.29, 1.45, 1.33, 1.22};
        double sdLog = org.holdpoint.stats.Descriptives.of(org.holdpoint.stats.Sample.of(java.util.Arrays.stream(
                before).map(Math::log).toArray())).sd();
        int expected = org.holdpoint.stats.EquivalencePlan.withDefaults().withTargetPower(0.9)
                .withMargin(org.holdpoint.stats.Margin.of(Math.log(1 / 1.1), Math.log(1.1))).sampleSize(0, sdLog).n();
        assertThat(leak.path("nPerGroup").asInt()).isEqualTo(expected);
        assertThat(leak.path("marginScale").asText()).isEqualTo("ratio");
    }

    @Test
    void theOptionsGiveOneKindOfMarginAndRatiosInRange(@TempDir Path dir) throws Exception {
        Path f = data(dir);
        AnalyzeCommandTest.Run both = AnalyzeCommandTest.run("analyze", f.toString(), "--margin", "0.1",
                "--margin-ratio", "1.1");
        assertThat(both.code()).isEqualTo(2);
        assertThat(both.err()).contains("give one kind of margin");
        AnalyzeCommandTest.Run low = AnalyzeCommandTest.run("analyze", f.toString(), "--margin-ratio", "0.9");
        assertThat(low.code()).isEqualTo(2);
        assertThat(low.err()).contains("--margin-ratio must be a number R above 1");
        AnalyzeCommandTest.Run up = AnalyzeCommandTest.run("analyze", f.toString(), "--only", "Leak rate",
                "--margin-ratio-upper", "1.2");
        assertThat(up.code()).as(up.err()).isZero();
        assertThat(up.out()).contains("(upper ratio margin 1.2000)");
        Files.writeString(dir.resolve("leak.settings.csv"), "characteristic,margin_ratio_lower\nLeak rate,1.1\n");
        AnalyzeCommandTest.Run bad = AnalyzeCommandTest.run("analyze", f.toString());
        assertThat(bad.code()).isEqualTo(2);
        assertThat(bad.err()).contains("leak.settings.csv").contains("margin_ratio_lower")
                .contains("must lie between 0 and 1");
    }
}
