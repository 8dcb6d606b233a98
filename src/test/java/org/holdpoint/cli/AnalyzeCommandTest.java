package org.holdpoint.cli;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** The analyze and demo commands as a user runs them: exit codes, the text, the JSON contract. */
class AnalyzeCommandTest {
    record Run(int code, String out, String err) {
    }

    static Run run(String... args) {
        CommandLine cl = org.holdpoint.Holdpoint.commandLine(org.holdpoint.workflow.WindowLauncher.NONE, args);
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        int code = cl.execute(args);
        return new Run(code, out.toString(), err.toString());
    }

    @Test
    void demoAnalysesTheBundledStudyAndWritesTheJsonContract(@TempDir Path dir) throws Exception {
        Run r = run("demo", "--out", dir.toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("Bore diameter", "Surface roughness Ra", "CHANGE NOT VERIFIED", "Cautions:",
                "Welch two-sample t, Welch-Satterthwaite df");
        JsonNode json = new ObjectMapper().readTree(dir.resolve("result.json").toFile());
        assertThat(json.path("tool").path("name").asText()).isEqualTo("holdpoint");
        assertThat(json.path("input").path("sha256").asText()).hasSize(64);
        assertThat(json.path("characteristics")).hasSize(7);
        JsonNode first = json.path("characteristics").get(0);
        for (String block : new String[] {"before", "after", "welch", "pooled", "tost", "tostPooled", "variance",
            "levene", "verdict", "notes"}) {
            assertThat(first.has(block)).as(block).isTrue();
        }
        for (String key : new String[] {"lowerMargin", "upperMargin", "estimate", "df", "pLower", "pUpper", "p",
            "ciLower", "ciUpper", "equivalent", "conclusion"}) {
            assertThat(first.path("tost").has(key)).as(key).isTrue();
        }
        assertThat(first.has("paired")).isFalse();
    }

    /**
     * The reasons of a verdict are read by people: values in the characteristic's unit at its resolution plus
     * two decimals (the demo's bore diameter is recorded to 0.0001 mm, so 6), ratios and indices at three
     * (common practice, no source; the rule is the project's own, docs/methods.md). Arithmetic on the demo
     * file, no outside value is needed.
     */
    @Test
    void verdictReasonsUseTheDecimalsOfTheirCharacteristic(@TempDir Path dir) {
        Run r = run("demo", "--out", dir.toString());
        assertThat(r.code()).as(r.err()).isZero();
        String bore = r.out().substring(r.out().indexOf("== Bore diameter"));
        bore = bore.substring(0, bore.indexOf("\n== ", 5));
        assertThat(bore).containsPattern("Verdict: \\[.\\] \\w+\\R    \\w+: the 90 % interval of the difference "
                + "\\(-?\\d+\\.\\d{6}, -?\\d+\\.\\d{6}\\) [^()]+\\(margin -\\d\\.\\d{6} to \\d\\.\\d{6}\\)");
        assertThat(bore).containsPattern("Hodges-Lehmann shift -?\\d\\.\\d{6}, ");
        assertThat(bore).containsPattern("upper bound of sd\\(after\\)/sd\\(before\\) = \\d\\.\\d{3} ->");
        // no floating-point noise and no 6-significant-digit residue anywhere in the reasons
        for (String line : r.out().split("\\R")) {
            if (line.startsWith("    ") && (line.contains("interval") || line.contains("bound"))) {
                assertThat(line).doesNotContainPattern("\\d\\.\\d{11,}").doesNotContainPattern("\\de-\\d");
            }
        }
    }

    @Test
    void withoutAMarginTheDifferenceTestsRunAndEquivalenceIsNotAssessed(@TempDir Path dir) throws Exception {
        Path csv = dir.resolve("plain.csv");
        Files.writeString(csv, "phase,value\nbefore,1.1\nbefore,1.3\nbefore,1.2\nafter,1.25\nafter,1.35\n"
                + "after,1.3\n", StandardCharsets.UTF_8);
        Path json = dir.resolve("out.json");
        Run r = run("analyze", csv.toString(), "--json", json.toString());
        assertThat(r.code()).as(r.err()).isZero();
        assertThat(r.out()).contains("equivalence was not assessed (no margin set)");
        JsonNode c = new ObjectMapper().readTree(json.toFile()).path("characteristics").get(0);
        assertThat(c.has("tost")).isFalse();
        assertThat(c.path("welch").path("p").isNumber()).isTrue();
    }

    @Test
    void badInputGivesExitCodeTwoAndOneClearMessage(@TempDir Path dir) throws Exception {
        Run missing = run("analyze", dir.resolve("nope.csv").toString());
        assertThat(missing.code()).isEqualTo(2);
        assertThat(missing.err()).contains("nope.csv").contains("not found").doesNotContain("Exception");

        Path csv = dir.resolve("d.csv");
        Files.writeString(csv, "phase,value\nbefore,1\nbefore,2\nafter,3\nafter,4\n", StandardCharsets.UTF_8);
        Run alpha = run("analyze", csv.toString(), "--alpha", "0.7");
        assertThat(alpha.code()).isEqualTo(2);
        assertThat(alpha.err()).contains("--alpha");
        Run margin = run("analyze", csv.toString(), "--margin-lower", "0.5");
        assertThat(margin.code()).isEqualTo(2);
        assertThat(margin.err()).contains("must contain 0");
        Run reason = run("analyze", csv.toString(), "--exclude", "B2");
        assertThat(reason.code()).isEqualTo(2);
        assertThat(reason.err()).contains("reason is required");

        Path flat = dir.resolve("flat.csv");
        Files.writeString(flat, "phase,value\nbefore,1\nbefore,1\nafter,1\nafter,1\n", StandardCharsets.UTF_8);
        Run zero = run("analyze", flat.toString());
        assertThat(zero.code()).isEqualTo(2);
        assertThat(zero.err()).contains("no variation in either group", "whole numbers");
    }

    @Test
    void helpAndVersionReadWell() {
        Run help = run("--help");
        assertThat(help.code()).isZero();
        assertThat(help.out()).contains("analyze", "demo", "Exit codes");
        Run analyzeHelp = run("help", "analyze");
        assertThat(analyzeHelp.out()).contains("--margin", "--margin-percent", "--equal-variances", "--json",
                "--paired", "--settings");
        Run version = run("--version");
        assertThat(version.out()).startsWith("holdpoint ");
    }
}
