package org.holdpoint.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.holdpoint.cli.AnalyzeCommandTest.Run;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * A characteristic with an upper limit only (flatness, runout) may take its margin as a percentage of that
 * limit: 10 % of a USL of 0.05 mm is an upper margin of 0.005 mm exactly (decimal arithmetic on the numbers as
 * entered; no outside source needed), one-sided, said as such in the JSON. Invented data: a housing's flatness.
 */
class MarginOfUpperLimitTest {
    @TempDir
    Path dir;

    private Path data() throws Exception {
        StringBuilder csv = new StringBuilder("phase,flatness\n");
        java.util.SplittableRandom rnd = new java.util.SplittableRandom(5);
        for (String phase : new String[] {"before", "after"}) {
            for (int i = 0; i < 30; i++) {
                csv.append(phase).append(String.format(java.util.Locale.ROOT, ",%.4f%n",
                        Math.abs(0.012 + 0.003 * rnd.nextGaussian())));
            }
        }
        return Files.writeString(dir.resolve("housing.csv"), csv.toString());
    }

    @Test
    void aMarginInPercentOfTheUslIsAnExactUpperMargin() throws Exception {
        Path csv = data();
        Files.writeString(dir.resolve("housing.settings.csv"),
                "characteristic,unit,usl,margin_percent_of_usl\nflatness,mm,0.05,10\n");
        Path json = dir.resolve("r.json");
        Run r = AnalyzeCommandTest.run("analyze", csv.toString(), "-q", "--json", json.toString());
        assertThat(r.code()).as(r.err()).isIn(0, 1);
        JsonNode m = new ObjectMapper().readTree(json.toFile()).path("characteristics").get(0).path("criteria")
                .path("margin");
        assertThat(m.path("entered").asText()).isEqualTo("percent of the USL");
        assertThat(m.path("upper").toString()).isEqualTo("0.005");
        assertThat(m.path("lower").isNull()).isTrue();
    }

    @Test
    void withBothLimitsItIsRefusedOnItsOwnOption() throws Exception {
        Path csv = data();
        Run r = AnalyzeCommandTest.run("analyze", csv.toString(), "--lsl", "0", "--usl", "0.05",
                "--margin-percent-of-usl", "10");
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("--margin-percent-of-usl").contains("% of the tolerance");
    }
}
