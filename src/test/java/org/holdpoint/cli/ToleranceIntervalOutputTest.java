package org.holdpoint.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.holdpoint.stats.Sample;
import org.holdpoint.stats.ToleranceFactors;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Tolerance intervals through the command line (docs/methods.md §17): the after group's interval against the
 * limits decides the criterion; the factors themselves are checked against scipy in
 * ToleranceFactorsReferenceTest, so the interval here is recomputed from them and the group's mean and sd.
 */
class ToleranceIntervalOutputTest {
    private static final double[] BEFORE = {12.503, 12.497, 12.501, 12.499, 12.502, 12.498, 12.500, 12.504, 12.496,
        12.501, 12.499, 12.500};
    private static final double[] AFTER = {12.502, 12.498, 12.500, 12.501, 12.499, 12.503, 12.497, 12.500, 12.502,
        12.498, 12.501, 12.499};

    private static Path data(Path dir) throws Exception {
        StringBuilder csv = new StringBuilder("phase,Pin length (mm)\n");
        for (double v : BEFORE) {
            csv.append("before,").append(v).append('\n');
        }
        for (double v : AFTER) {
            csv.append("after,").append(v).append('\n');
        }
        Path f = dir.resolve("pins.csv");
        Files.writeString(f, csv);
        return f;
    }

    @Test
    void theAfterIntervalInsideTheLimitsPassesAndOutsideFails(@TempDir Path dir) throws Exception {
        Path f = data(dir);
        Path json = dir.resolve("pins.json");
        AnalyzeCommandTest.Run r = AnalyzeCommandTest.run("analyze", f.toString(), "--lsl", "12.49", "--usl",
                "12.51", "--margin", "0.003", "--tolerance-coverage", "0.99", "--tolerance-confidence", "0.95",
                "--json", json.toString());
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode c = new ObjectMapper().readTree(json.toFile()).path("characteristics").get(0);
        JsonNode after = c.path("toleranceInterval").path("after");
        double k = ToleranceFactors.twoSided(12, 0.99, 0.95);
        var d = org.holdpoint.stats.Descriptives.of(Sample.of(AFTER));
        assertThat(after.path("k").asDouble()).isEqualTo(k);
        assertThat(after.path("lower").asDouble()).isCloseTo(d.mean() - k * d.sd(), org.assertj.core.data.Offset.offset(1e-12));
        assertThat(after.path("upper").asDouble()).isCloseTo(d.mean() + k * d.sd(), org.assertj.core.data.Offset.offset(1e-12));
        assertThat(after.path("sides").asText()).isEqualTo("two-sided");
        assertThat(after.path("method").asText()).isEqualTo("normal");
        assertThat(c.path("toleranceInterval").path("before").path("coverage").asDouble()).isEqualTo(0.99);
        assertThat(c.path("verdict").path("status").asText()).isEqualTo("passed");
        assertThat(c.path("verdict").path("reasons").toString()).contains("99 % / 95 % tolerance interval")
                .contains("inside the limits");
        // limits the interval does not fit: the criterion fails the characteristic
        AnalyzeCommandTest.Run tight = AnalyzeCommandTest.run("analyze", f.toString(), "--lsl", "12.495", "--usl",
                "12.505", "--margin", "0.003", "--tolerance-coverage", "0.99", "--tolerance-confidence", "0.95",
                "--json", json.toString(), "--overwrite");
        assertThat(tight.code()).as(tight.err()).isZero();
        JsonNode t = new ObjectMapper().readTree(json.toFile()).path("characteristics").get(0);
        assertThat(t.path("verdict").path("status").asText()).isEqualTo("failed");
        assertThat(t.path("verdict").path("reasons").toString()).contains("is not inside the limits");
    }

    @Test
    void oneLimitGivesOneBoundAndBothOptionsAreNeeded(@TempDir Path dir) throws Exception {
        Path f = data(dir);
        Path json = dir.resolve("pins.json");
        AnalyzeCommandTest.Run r = AnalyzeCommandTest.run("analyze", f.toString(), "--usl", "12.51", "--margin",
                "0.003", "--tolerance-coverage", "0.95", "--tolerance-confidence", "0.95", "--json", json.toString());
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode after = new ObjectMapper().readTree(json.toFile()).path("characteristics").get(0)
                .path("toleranceInterval").path("after");
        assertThat(after.path("sides").asText()).isEqualTo("upper");
        assertThat(after.path("lower").isNull()).isTrue();
        assertThat(after.path("k").asDouble()).isEqualTo(ToleranceFactors.oneSided(12, 0.95, 0.95));
        AnalyzeCommandTest.Run half = AnalyzeCommandTest.run("analyze", f.toString(), "--tolerance-coverage", "0.95");
        assertThat(half.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(half.err()).contains("--tolerance-coverage needs --tolerance-confidence");
    }

    @Test
    void aFittedFamilyWithoutAnExactIntervalUsesTheDistributionFreeOneAndSaysWhatItReaches(@TempDir Path dir)
            throws Exception {
        StringBuilder csv = new StringBuilder("phase,Flatness (mm)\n");
        java.util.SplittableRandom rnd = new java.util.SplittableRandom(41);
        for (String phase : new String[] {"before", "after"}) {
            for (int i = 0; i < 60; i++) {
                double w = 0.01 * Math.pow(-Math.log(1 - rnd.nextDouble()), 1 / 1.6);
                csv.append(phase).append(',').append(String.format(java.util.Locale.ROOT, "%.4f", w)).append('\n');
            }
        }
        Path f = dir.resolve("flat.csv");
        Files.writeString(f, csv);
        Path json = dir.resolve("flat.json");
        AnalyzeCommandTest.Run r = AnalyzeCommandTest.run("analyze", f.toString(), "--usl", "0.06", "--margin-ratio",
                "1.25", "--distribution", "weibull", "--tolerance-coverage", "0.95", "--tolerance-confidence", "0.95",
                "--json", json.toString());
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode c = new ObjectMapper().readTree(json.toFile()).path("characteristics").get(0);
        JsonNode after = c.path("toleranceInterval").path("after");
        assertThat(after.path("method").asText()).isEqualTo("distribution-free");
        // 60 values reach 1 - 0.95^60 for one bound (Wilks 1941)
        assertThat(after.path("achievedConfidence").asDouble()).isCloseTo(1 - Math.pow(0.95, 60),
                org.assertj.core.data.Offset.offset(1e-12));
        assertThat(c.path("notes").toString()).contains("no exact tolerance interval exists for the weibull family");
    }

    @Test
    void theDistributionFreePlanGivesBothSizes(@TempDir Path dir) throws Exception {
        Path json = dir.resolve("plan.json");
        AnalyzeCommandTest.Run r = AnalyzeCommandTest.run("plan", "--distribution-free", "--tolerance-coverage", "0.95",
                "--tolerance-confidence", "0.95", "--json", json.toString());
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode t = new ObjectMapper().readTree(json.toFile()).path("toleranceSample");
        // Wilks (1941): 93 values for [min, max] and 59 for one bound at 95 % / 95 %
        assertThat(t.path("twoSided").asInt()).isEqualTo(93);
        assertThat(t.path("oneSided").asInt()).isEqualTo(59);
    }
}
