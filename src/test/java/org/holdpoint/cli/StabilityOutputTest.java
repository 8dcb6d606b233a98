package org.holdpoint.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.nio.file.Files;
import java.nio.file.Path;
import org.holdpoint.stats.ControlChart;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * Control charts in run order through the command line (docs/methods.md §16): the run order comes from the
 * sequence column, not from the rows; the after phase is judged against the before limits; a signal names its
 * point and cell; it is a finding of the verdict, which it does not change. The limits and tests themselves are
 * checked against R in ControlChartReferenceTest.
 */
class StabilityOutputTest {
    @Test
    void signalsAreFoundInRunOrderAndNamedByTheirCells(@TempDir Path dir) throws Exception {
        // rows written in reverse run order; the after phase drifts upward in run order (a trend of 6 at run 6)
        double[] before = {10.02, 9.98, 10.01, 9.99, 10.03, 9.97, 10.00, 10.02, 9.98, 10.01, 9.99, 10.00};
        double[] after = {10.00, 10.01, 10.02, 10.03, 10.04, 10.05, 9.99, 10.01, 10.00, 9.98, 10.02, 10.00};
        StringBuilder csv = new StringBuilder("characteristic,phase,run order,value\n");
        for (int i = before.length - 1; i >= 0; i--) {
            csv.append("Shaft OD,before,").append(i + 1).append(',').append(before[i]).append('\n');
        }
        for (int i = after.length - 1; i >= 0; i--) {
            csv.append("Shaft OD,after,").append(i + 1).append(',').append(after[i]).append('\n');
        }
        Path f = dir.resolve("od.csv");
        Files.writeString(f, csv);
        Path json = dir.resolve("od.json");
        AnalyzeCommandTest.Run r = AnalyzeCommandTest.run("analyze", f.toString(), "--lsl", "9.9", "--usl", "10.1",
                "--margin", "0.05", "--json", json.toString());
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode c = new ObjectMapper().readTree(json.toFile()).path("characteristics").get(0);
        JsonNode st = c.path("stability");
        ControlChart.Limits l = ControlChart.limits(before);
        assertThat(st.path("before").path("ucl").asDouble()).isEqualTo(l.ucl());
        assertThat(st.path("after").path("ucl").asDouble()).as("the after phase carries the before limits")
                .isEqualTo(l.ucl());
        var expected = ControlChart.signals(after, l);
        assertThat(expected).contains(new ControlChart.Signal(3, 6));
        assertThat(st.path("after").path("signals")).hasSize(expected.size());
        JsonNode trend = st.path("after").path("signals").get(0);
        assertThat(trend.path("test").asInt()).isEqualTo(expected.get(0).test());
        assertThat(trend.path("index").asInt()).isEqualTo(expected.get(0).index());
        // run 6 of the after phase is the 7th after row from the bottom: row 2 + 12 + (12 - 6) = 20, column D
        assertThat(st.path("after").path("signals").toString()).contains("cell D20");
        // a finding, not a failure
        assertThat(c.path("verdict").path("status").asText()).isEqualTo("passed");
        assertThat(c.path("verdict").path("reasons").toString()).contains("stability: after phase not in control");
        assertThat(r.out()).contains("Not in control in run order: Shaft OD");
    }

    @Test
    void withoutARunOrderThereIsNoChart(@TempDir Path dir) throws Exception {
        StringBuilder csv = new StringBuilder("characteristic,phase,value\n");
        for (int i = 0; i < 10; i++) {
            csv.append("Shaft OD,before,").append(10 + (i % 3) * 0.01).append('\n');
            csv.append("Shaft OD,after,").append(10 + (i % 4) * 0.01).append('\n');
        }
        Path f = dir.resolve("od.csv");
        Files.writeString(f, csv);
        Path json = dir.resolve("od.json");
        AnalyzeCommandTest.Run r = AnalyzeCommandTest.run("analyze", f.toString(), "--json", json.toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(new ObjectMapper().readTree(json.toFile()).path("characteristics").get(0).has("stability"))
                .isFalse();
    }
}
