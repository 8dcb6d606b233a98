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

    @Test
    void withoutARunOrderANoteSaysHowToGiveOne(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("od.csv");
        Files.writeString(f, plain(new double[] {10.01, 10.03, 9.99, 10.00, 10.02, 9.98, 10.01, 10.00},
                new double[] {10.00, 10.02, 10.01, 9.99, 10.03, 10.00, 10.01, 10.02}));
        Path json = dir.resolve("od.json");
        AnalyzeCommandTest.Run r = AnalyzeCommandTest.run("analyze", f.toString(), "--margin", "0.05", "--json",
                json.toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(new ObjectMapper().readTree(json.toFile()).path("characteristics").get(0).path("notes").toString())
                .contains("no control chart: the run order of the before values is not known")
                .contains("--row-order-is-run-order");
    }

    private static String plain(double[] before, double[] after) {
        StringBuilder csv = new StringBuilder("characteristic,phase,value\n");
        for (double v : before) {
            csv.append("Shaft OD,before,").append(v).append('\n');
        }
        for (double v : after) {
            csv.append("Shaft OD,after,").append(v).append('\n');
        }
        return csv.toString();
    }

    @Test
    void theRowsGiveTheOrderWhenTheUserSaysSoAndRequiredStabilityFailsOnAnAfterSignal(@TempDir Path dir)
            throws Exception {
        double[] before = {10.02, 9.98, 10.01, 9.99, 10.03, 9.97, 10.00, 10.02, 9.98, 10.01, 9.99, 10.00};
        // the after phase rises steadily for seven points: test 3 at its 6th and 7th point
        double[] after = {10.00, 10.005, 10.01, 10.015, 10.02, 10.025, 10.03, 10.00, 9.99, 10.01, 10.00, 9.99};
        Path f = dir.resolve("od.csv");
        Files.writeString(f, plain(before, after));
        Path json = dir.resolve("od.json");
        AnalyzeCommandTest.Run r = AnalyzeCommandTest.run("analyze", f.toString(), "--margin", "0.05",
                "--row-order-is-run-order", "--require-stability", "--json", json.toString());
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode c = new ObjectMapper().readTree(json.toFile()).path("characteristics").get(0);
        assertThat(c.path("stability").path("runOrder").asText()).contains("row order");
        var expected = ControlChart.signals(after, ControlChart.limits(before));
        assertThat(expected).contains(new ControlChart.Signal(3, 6), new ControlChart.Signal(3, 7));
        assertThat(c.path("stability").path("after").path("signals")).hasSize(expected.size());
        assertThat(c.path("verdict").path("status").asText()).isEqualTo("failed");
        assertThat(c.path("verdict").path("reasons").toString()).contains("stability required: after phase");
        // without the requirement the same study passes, the signal a finding
        AnalyzeCommandTest.Run finding = AnalyzeCommandTest.run("analyze", f.toString(), "--margin", "0.05",
                "--row-order-is-run-order", "--json", json.toString(), "--overwrite");
        assertThat(finding.code()).as(finding.err()).isZero();
        // required but no run order: not shown to be stable, so it cannot pass
        AnalyzeCommandTest.Run unknown = AnalyzeCommandTest.run("analyze", f.toString(), "--margin", "0.05",
                "--require-stability", "--json", json.toString(), "--overwrite");
        JsonNode u = new ObjectMapper().readTree(json.toFile()).path("characteristics").get(0);
        assertThat(u.path("verdict").path("status").asText()).as(unknown.out()).isEqualTo("inconclusive");
        assertThat(u.path("verdict").path("reasons").toString()).contains("stability required, but no control chart");
    }

    @Test
    void aListOfTestsIsCheckedAndAllEightCanBeAsked(@TempDir Path dir) throws Exception {
        Path f = dir.resolve("od.csv");
        Files.writeString(f, plain(new double[] {10.01, 10.03, 9.99, 10.00, 10.02, 9.98, 10.01, 10.00},
                new double[] {10.00, 10.02, 10.01, 9.99, 10.03, 10.00, 10.01, 10.02}));
        AnalyzeCommandTest.Run bad = AnalyzeCommandTest.run("analyze", f.toString(), "--control-tests", "1,9");
        assertThat(bad.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(bad.err()).contains("--control-tests").contains("1 to 8");
        Path json = dir.resolve("od.json");
        AnalyzeCommandTest.Run all = AnalyzeCommandTest.run("analyze", f.toString(), "--row-order-is-run-order",
                "--control-tests", "all", "--json", json.toString());
        assertThat(all.code()).as(all.err()).isZero();
        assertThat(new ObjectMapper().readTree(json.toFile()).path("characteristics").get(0).path("stability")
                .path("before").path("tests").toString()).isEqualTo("[1,2,3,4,5,6,7,8]");
    }

    @Test
    void subgroupsGiveMeansAndSdChartsInTheOrderOfTheirDates(@TempDir Path dir) throws Exception {
        // dates written day.month.year: as text, 02.12. would come before 30.11.; the last after subgroup is off
        StringBuilder csv = new StringBuilder("characteristic;phase;lot hour;time stamp;value\n");
        java.util.Random rnd = new java.util.Random(7);
        String[] days = {"29.11.2026", "30.11.2026", "01.12.2026", "02.12.2026"};
        int hour = 0;
        for (String phase : new String[] {"before", "after"}) {
            for (int k = 0; k < 12; k++) {
                String stamp = days[(phase.equals("after") ? 2 : 0) + k / 6] + " " + String.format("%02d:00", 6 + 2 * (k % 6));
                for (int j = 0; j < 4; j++) {
                    double v = 5 + 0.01 * rnd.nextGaussian() + (phase.equals("after") && k == 11 ? 0.05 : 0);
                    csv.append("Bore;").append(phase).append(";H").append(hour).append(';').append(stamp).append(';')
                            .append(String.format(java.util.Locale.ROOT, "%.4f", v)).append('\n');
                }
                hour++;
            }
        }
        Path f = dir.resolve("bore.csv");
        Files.writeString(f, csv);
        Path json = dir.resolve("bore.json");
        AnalyzeCommandTest.Run r = AnalyzeCommandTest.run("analyze", f.toString(), "--subgroup-column", "lot hour",
                "--sequence-column", "time stamp", "--json", json.toString());
        assertThat(r.code()).as(r.err()).isZero();
        JsonNode st = new ObjectMapper().readTree(json.toFile()).path("characteristics").get(0).path("stability");
        assertThat(st.path("runOrder").asText()).contains("day.month.year");
        assertThat(st.path("before").path("method").asText()).startsWith("subgroup mean and standard deviation");
        assertThat(st.path("before").path("subgroupSize").asInt()).isEqualTo(4);
        assertThat(st.path("after").path("points").asInt()).isEqualTo(12);
        JsonNode last = st.path("after").path("signals").get(st.path("after").path("signals").size() - 1);
        assertThat(last.path("index").asInt()).isEqualTo(12);
        assertThat(last.path("origin").asText()).startsWith("subgroup H23 (4 values");
        assertThat(r.out()).contains("subgroup mean and standard deviation charts");
    }
}
