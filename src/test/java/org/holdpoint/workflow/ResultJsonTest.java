package org.holdpoint.workflow;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.util.List;
import java.util.Map;
import org.holdpoint.stats.Sample;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.GroupData;
import org.holdpoint.study.ImportReport;
import org.holdpoint.study.MarginSpec;
import org.holdpoint.study.Progress;
import org.holdpoint.study.SpecLimits;
import org.junit.jupiter.api.Test;

/**
 * The machine-readable result: computed statistics at full double precision (they read back to the same
 * double), a margin from a percentage of the tolerance as the exact decimal it is, the verdict in words.
 */
class ResultJsonTest {

    private static CharacteristicResult analysed() {
        // invented values of a 0.20 mm wide tolerance, margin 20 % of it (0.04 mm)
        double[] before = {8.012, 7.995, 8.004, 8.010, 7.998, 8.001, 8.006, 7.993, 8.003, 8.000};
        double[] after = {8.005, 8.011, 7.999, 8.008, 8.002, 7.996, 8.009, 8.004, 8.001, 8.007};
        CharacteristicData d = new CharacteristicData("Spigot diameter", "mm",
                GroupData.typed(Sample.of(before), "b.csv"), GroupData.typed(Sample.of(after), "a.csv"), false,
                List.of());
        CharacteristicSettings s = new CharacteristicSettings("mm", new SpecLimits(7.9, 8.0, 8.1),
                new MarginSpec(MarginSpec.Kind.PERCENT_OF_TOLERANCE, 20.0, 20.0), null, null, null);
        AnalysisSettings all = new AnalysisSettings(0.05, false, false, null, Map.of("Spigot diameter", s), null,
                null);
        return new StudyAnalyzer().analyze(new Dataset(List.of(d), List.of(), new ImportReport(20, Map.of(),
                List.of(), List.of())), all, Progress.NONE).characteristics().get(0);
    }

    @Test
    void statisticsKeepFullPrecisionAndAMarginInPercentIsItsExactDecimal() throws Exception {
        CharacteristicResult r = analysed();
        JsonNode n = new ObjectMapper().readTree(ResultJson.text(ResultJson.characteristic(r)));
        // 20 % of 0.20 is 0.04 exactly, written so (not 0.04000000000000057)
        JsonNode margin = n.path("criteria").path("margin");
        assertThat(margin.path("entered").asText()).isEqualTo("percent of tolerance");
        assertThat(margin.path("upper").toString()).isEqualTo("0.04");
        assertThat(margin.path("lower").toString()).isEqualTo("-0.04");
        assertThat(n.path("tost").path("upperMargin").toString()).isEqualTo("0.04");
        // a computed interval bound reads back to the very double the analysis gave
        assertThat(n.path("tost").path("ciLower").asDouble()).isEqualTo(r.decidingTost().ciLower());
        assertThat(n.path("tost").path("ciUpper").asDouble()).isEqualTo(r.decidingTost().ciUpper());
        assertThat(n.path("welch").path("p").asDouble()).isEqualTo(r.welch().p());
        assertThat(n.path("verdict").path("status").asText()).isEqualTo(r.verdict().status().words());
        assertThat(n.path("verdict").path("reasons")).hasSize(r.verdict().reasons().size());
    }
}
