package org.holdpoint.cli;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/** The {@code plan} command run through picocli's execute with captured writers. */
class PlanCommandTest {
    @TempDir
    Path dir;

    private final StringWriter out = new StringWriter();
    private final StringWriter err = new StringWriter();

    private int run(String... args) {
        CommandLine cl = new CommandLine(new PlanCommand());
        cl.setExecutionExceptionHandler(new Failures());
        out.getBuffer().setLength(0);
        err.getBuffer().setLength(0);
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(err, true));
        return cl.execute(args);
    }

    private JsonNode json(Path file) throws IOException {
        return new ObjectMapper().readTree(Files.readString(file));
    }

    private static List<String> keys(JsonNode node) {
        List<String> names = new ArrayList<>();
        node.fieldNames().forEachRemaining(names::add);
        return names;
    }

    @Test
    void searchPrintsThePlanAndWritesTheJson() throws IOException {
        Path file = dir.resolve("plan.json");
        int code = run("--alpha", "0.05", "--margin", "0.2", "--difference", "0", "--sd", "0.1", "--power", "0.8",
                "--json", file.toString());
        assertThat(code).as(err.toString()).isZero();
        assertThat(out.toString()).contains("n per group          6").contains("power                0.884063")
                .contains("power at n - 1       0.783580");
        JsonNode j = json(file);
        assertThat(keys(j)).containsExactly("design", "alpha", "marginLower", "marginUpper", "difference", "sd",
                "ratio", "targetPower", "nPerGroup", "achievedPower", "powerAtNMinus1", "tTestPower", "powerTable");
        assertThat(j.get("nPerGroup").asInt()).isEqualTo(6);
        // derived, PowerTOST sampleN.TOST exact table header: N = 12, sigma 0.1, delta 0 -> 0.884063
        assertThat(j.get("achievedPower").asDouble()).isCloseTo(0.884063, within(5.000001e-7));
        assertThat(j.get("tTestPower").asDouble()).isCloseTo(0.05, within(1e-12));
        assertThat(j.get("powerTable")).hasSize(21);
        assertThat(keys(j.get("powerTable").get(0))).containsExactly("difference", "power");
        assertThat(j.get("powerTable").get(0).get("difference").asDouble()).isEqualTo(-0.2);
        // full double precision, not the 6 decimals of the text
        assertThat(j.get("achievedPower").asText()).hasSizeGreaterThan(12);
        try (Stream<Path> files = Files.list(dir)) {
            assertThat(files).containsExactly(file);
        }
    }

    @Test
    void ratioAddsTheAfterGroupSize() throws IOException {
        Path file = dir.resolve("ratio.json");
        Files.writeString(file, "old content");
        String[] args = {"--margin-lower", "-0.2", "--margin-upper", "0.25", "--difference", "0.05", "--sd", "0.2",
            "--power", "0.9", "--ratio", "1.5", "--json", file.toString()};
        // an existing output is kept unless --overwrite is given
        assertThat(run(args)).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(err.toString()).contains("ratio.json exists; give --overwrite to replace it");
        assertThat(Files.readString(file)).isEqualTo("old content");
        String[] again = java.util.Arrays.copyOf(args, args.length + 1);
        again[args.length] = "--overwrite";
        int code = run(again);
        assertThat(code).as(err.toString()).isZero();
        JsonNode j = json(file);
        int n = j.get("nPerGroup").asInt();
        assertThat(j.get("nAfter").asInt()).isEqualTo((int) Math.ceil(1.5 * n));
        assertThat(j.get("achievedPower").asDouble()).isGreaterThanOrEqualTo(0.9);
        assertThat(out.toString()).contains("n before").contains("n after");
    }

    @Test
    void pairedPlanAtAGivenSize() throws IOException {
        Path file = dir.resolve("paired.json");
        int code = run("--margin", "0.5", "--difference", "0.1", "--sd", "0.4", "--n", "12", "--paired", "--json",
                file.toString());
        assertThat(code).as(err.toString()).isZero();
        JsonNode j = json(file);
        assertThat(j.has("nPairs")).isTrue();
        assertThat(j.has("nPerGroup")).isFalse();
        assertThat(j.has("nAfter")).isFalse();
        assertThat(j.has("targetPower")).isFalse();
        assertThat(j.get("nPairs").asInt()).isEqualTo(12);
        assertThat(j.get("design").asText()).isEqualTo("paired");
        assertThat(out.toString()).contains("pairs                12");
    }

    @Test
    void successRunSizes() throws IOException {
        // 59 parts for 95 %/95 % and 299 for 95 %/99 %: the well-known success-run values
        assertThat(run("--success-run", "--confidence", "0.95", "--reliability", "0.95")).isZero();
        assertThat(out.toString()).contains("parts to test        59");
        Path file = dir.resolve("run.json");
        assertThat(run("--success-run", "--confidence", "0.95", "--reliability", "0.99", "--json", file.toString()))
                .isZero();
        assertThat(json(file).get("nParts").asInt()).isEqualTo(299);
        // R 4.2.2: smallest n with pbinom(1, n, 0.05) <= 0.05 is 93
        assertThat(run("--success-run", "--confidence", "0.95", "--reliability", "0.95", "--failures", "1")).isZero();
        assertThat(out.toString()).contains("parts to test        93");
    }

    /**
     * A margin with one bound plans one one-sided test (its exact power: OneSidedPlanTest against R); the
     * power at a size where the expected difference sits on the bound is given (alpha), not refused.
     */
    @Test
    void aOneSidedMarginPlansANonInferiorityTest() throws IOException {
        assertThat(run("--margin-lower", "-0.02", "--difference", "0", "--sd", "0.03", "--power", "0.8")).as(err.toString())
                .isZero();
        assertThat(out.toString()).contains("lower bound only: -0.02", "non-inferiority");
        assertThat(out.toString()).containsPattern("\\b29\\b");
        Path json = dir.resolve("upper.json");
        assertThat(run("--margin-upper", "0.02", "--difference", "0.02", "--sd", "0.03", "--n", "30", "--json",
                json.toString())).as(err.toString()).isZero();
        JsonNode j = json(json);
        assertThat(j.path("marginLower").isNull()).isTrue();
        assertThat(j.path("achievedPower").asDouble()).isCloseTo(0.05, org.assertj.core.api.Assertions.within(1e-9));
    }

    /**
     * The failing case of the planning issue: a settings file whose flatness may only grow (an upper margin
     * alone) made `plan --from` stop with an internal error (exit 3); it now plans that characteristic with one
     * one-sided test. Invented data: a housing's flatness and bore, 25 parts before and after.
     */
    @Test
    void planFromAStudyWithAnUpperOnlyMarginPlansEveryCharacteristic() throws IOException {
        StringBuilder csv = new StringBuilder("phase,flatness,bore\n");
        java.util.SplittableRandom rnd = new java.util.SplittableRandom(17);
        for (String phase : new String[] {"before", "after"}) {
            for (int i = 0; i < 25; i++) {
                csv.append(phase).append(String.format(java.util.Locale.ROOT, ",%.4f,%.4f%n",
                        Math.abs(0.012 + 0.004 * rnd.nextGaussian()), 25 + 0.003 * rnd.nextGaussian()));
            }
        }
        Path data = Files.writeString(dir.resolve("housing.csv"), csv.toString());
        Files.writeString(dir.resolve("housing.settings.csv"),
                "characteristic,unit,usl,margin_upper,margin\nflatness,mm,0.05,0.004,\nbore,mm,,,0.004\n");
        int code = run("--from", data.toString(), "--power", "0.9");
        assertThat(code).as(err.toString()).isZero();
        assertThat(out.toString()).containsPattern("flatness\\s+\\S+\\s+\\(none, 0.004\\)\\s+\\d+");
        assertThat(out.toString()).containsPattern("bore\\s+\\S+\\s+\\(-0.004, 0.004\\)\\s+\\d+");
    }

    /**
     * Before a trial only the baseline exists: a file without a group column is read as before values only
     * (its sd is the sd of all its rows), and a stacked file's before rows are the baseline.
     */
    @Test
    void planFromABaselineOnlyFile() throws IOException {
        // invented: eight flatness readings of the current process, nothing measured after the change yet
        Path baseline = Files.writeString(dir.resolve("baseline.csv"),
                "flatness\n0.011\n0.014\n0.009\n0.012\n0.016\n0.010\n0.013\n0.012\n");
        int code = run("--from", baseline.toString(), "--margin-upper", "0.004", "--power", "0.9", "--json",
                dir.resolve("b.json").toString());
        assertThat(code).as(err.toString()).isZero();
        JsonNode row = json(dir.resolve("b.json")).path("characteristics").get(0);
        // sd of the eight values (arithmetic: mean 0.012125, sum of squared deviations 3.4875e-5, /7, square root)
        assertThat(row.path("sd").asDouble()).isCloseTo(Math.sqrt(3.4875e-5 / 7),
                org.assertj.core.api.Assertions.within(1e-12));
        assertThat(row.path("nPerGroup").asInt()).isPositive();
        assertThat(row.path("marginLower").isNull()).isTrue();
    }

    /**
     * The spread criterion planned by itself and beside the equivalence test; the larger size is named with
     * its criterion. Reference: R 4.2.2, pf(R^2*qf(alpha, n-1, n-1)/rho^2, n-1, n-1) (SpreadPlanTest): limit 1.3,
     * rho 1, power 0.8 needs 92 per group (0.80134336731073985).
     */
    @Test
    void theSpreadCriterionIsPlannedAndCanDriveTheSize() throws IOException {
        Path alone = dir.resolve("spread.json");
        assertThat(run("--sd-growth-limit", "1.3", "--power", "0.8", "--json", alone.toString())).as(err.toString())
                .isZero();
        JsonNode s = json(alone).path("spread");
        assertThat(s.path("nPerGroup").asInt()).isEqualTo(92);
        assertThat(s.path("achievedPower").asDouble()).isCloseTo(0.80134336731073985,
                org.assertj.core.api.Assertions.within(1e-12));
        assertThat(keys(s)).containsExactly("limit", "sdRatio", "alpha", "targetPower", "nPerGroup", "nAfter",
                "achievedPower", "powerAtNMinus1");
        Path both = dir.resolve("both.json");
        assertThat(run("--margin", "0.004", "--difference", "0", "--sd", "0.003", "--power", "0.8",
                "--sd-growth-limit", "1.3", "--json", both.toString())).as(err.toString()).isZero();
        assertThat(out.toString()).contains("Measure 92 parts per group: the spread criterion needs the most.");
        assertThat(json(both).path("drivenBy").asText()).isEqualTo("spread");
    }

    /**
     * plan --from plans every criterion a characteristic's settings name (equivalence, spread, capability)
     * and marks the one that needs the most parts; the capability size is the one CapabilityPlan gives for the
     * baseline's mean and sd (that class is checked against the noncentral t and a simulation).
     */
    @Test
    void planFromPlansEveryCriterionAndNamesTheDrivingOne() throws IOException {
        Path baseline = Files.writeString(dir.resolve("shaft.csv"),
                "diameter\n12.004\n11.998\n12.001\n12.006\n11.997\n12.002\n12.000\n12.003\n11.999\n12.005\n");
        Files.writeString(dir.resolve("shaft.settings.csv"),
                "characteristic,unit,lsl,usl,margin,sd_growth_limit,capability_min\ndiameter,mm,11.98,12.02,0.004,1.5,1.0\n");
        assertThat(run("--from", baseline.toString(), "--power", "0.9", "--json", dir.resolve("s.json").toString()))
                .as(err.toString()).isZero();
        JsonNode row = json(dir.resolve("s.json")).path("characteristics").get(0);
        double mean = 12.0015;
        double sdv = row.path("sd").asDouble();
        int expectCap = org.holdpoint.stats.CapabilityPlan.forRequirement(1.0).withTargetPower(0.9)
                .sampleSize((12.02 - mean) / sdv, (mean - 11.98) / sdv).nAfter();
        assertThat(row.path("capability").path("nAfter").asInt()).isEqualTo(expectCap);
        assertThat(row.path("spread").path("nPerGroup").asInt()).isEqualTo(54);
        int[] ns = {row.path("nPerGroup").asInt(), 54, expectCap};
        int max = Math.max(ns[0], Math.max(ns[1], ns[2]));
        String criterion = row.path("drivenBy").asText();
        assertThat(criterion.equals("equivalence") ? ns[0] : criterion.equals("spread") ? ns[1] : ns[2])
                .isEqualTo(max);
        assertThat(json(dir.resolve("s.json")).path("drivingCriterion").asText()).isEqualTo(criterion);
    }

    /** The capability criterion by itself: the size CapabilityPlan gives (checked there against R and scipy). */
    @Test
    void theCapabilityCriterionIsPlannedByItself() throws IOException {
        Path file = dir.resolve("cap.json");
        assertThat(run("--capability-min", "1.33", "--ppk", "1.6", "--power", "0.9", "--json", file.toString()))
                .as(err.toString()).isZero();
        JsonNode c = json(file).path("capability");
        // the smallest n reaching 0.9 for a true Ppk of 1.6 (a = 4.8) is 141 (CapabilityPlanTest)
        assertThat(c.path("nAfter").asInt()).isEqualTo(141);
        assertThat(out.toString()).contains("parts after 141");
        assertThat(run("--capability-min", "1.33", "--power", "0.9")).isEqualTo(2);
        assertThat(err.toString()).contains("--ppk P");
    }

    /**
     * Margins relative to each characteristic's own limits in plan --from: 20 % of a 0.02 tolerance is ±0.004,
     * 10 % of a USL of 0.05 an upper margin of 0.005 (arithmetic); a characteristic whose limits do not allow it
     * is reported on its own row. Invented baseline.
     */
    @Test
    void relativeMarginsAreResolvedPerCharacteristic() throws IOException {
        Path baseline = Files.writeString(dir.resolve("housing.csv"),
                "flatness,bore\n0.011,25.001\n0.014,24.998\n0.009,25.003\n0.012,25.000\n0.016,24.997\n0.010,25.002\n");
        Files.writeString(dir.resolve("housing.settings.csv"),
                "characteristic,unit,lsl,usl\nflatness,mm,,0.05\nbore,mm,24.99,25.01\n");
        Path json = dir.resolve("rel.json");
        assertThat(run("--from", baseline.toString(), "--power", "0.9", "--margin-percent", "20", "--json",
                json.toString())).as(err.toString()).isZero();
        JsonNode rows = json(json).path("characteristics");
        assertThat(rows.get(1).path("marginUpper").asDouble()).isEqualTo(0.004);
        assertThat(rows.get(0).path("note").asText()).contains("needs both LSL and USL");
        assertThat(run("--from", baseline.toString(), "--power", "0.9", "--margin-percent-of-usl", "10", "--json",
                json.toString(), "--overwrite")).as(err.toString()).isZero();
        rows = json(json).path("characteristics");
        assertThat(rows.get(0).path("marginUpper").asDouble()).isEqualTo(0.005);
        assertThat(rows.get(0).path("marginLower").isNull()).isTrue();
        assertThat(run("--margin-percent", "20", "--difference", "0", "--sd", "1", "--power", "0.8")).isEqualTo(2);
        assertThat(err.toString()).contains("use them with --from");
    }

    @Test
    void badInputExitsWithTwoAndAOneLineMessage() {
        String[][] cases = {
            {"the expected difference 0.3 lies on or outside the margin", "--margin", "0.2", "--difference", "0.3", "--sd", "1",
                "--power", "0.8"},
            {"the expected difference 0.2 lies on or outside the margin", "--margin", "0.2", "--difference", "0.2", "--sd", "1",
                "--power", "0.8"},
            {"--sd must be positive", "--margin", "0.2", "--difference", "0", "--sd", "0", "--power", "0.8"},
            {"--sd must be positive", "--margin", "0.2", "--difference", "0", "--sd", "-1", "--power", "0.8"},
            {"--power must lie strictly between alpha = 0.05 and 1", "--margin", "0.2", "--difference", "0", "--sd",
                "1", "--power", "0.04"},
            {"--power must lie strictly between alpha = 0.05 and 1", "--margin", "0.2", "--difference", "0", "--sd",
                "1", "--power", "1"},
            {"the cap was reached", "--margin", "0.2", "--difference", "0.15", "--sd", "100", "--power", "0.8"},
            {"not both", "--margin", "0.2", "--margin-lower", "-0.1", "--margin-upper", "0.1", "--difference", "0",
                "--sd", "1", "--power", "0.8"},
            {"either --power P", "--margin", "0.2", "--difference", "0", "--sd", "1", "--power", "0.8", "--n", "5"},
            {"missing --difference", "--margin", "0.2", "--sd", "1", "--power", "0.8"},
            {"alpha must lie strictly between 0 and 0.5", "--alpha", "0.6", "--margin", "0.2", "--difference", "0",
                "--sd", "1", "--power", "0.8"},
            {"--ratio applies to two groups", "--margin", "0.2", "--difference", "0", "--sd", "1", "--power", "0.8",
                "--paired", "--ratio", "2"},
            {"--success-run takes only", "--success-run", "--confidence", "0.95", "--reliability", "0.9", "--sd",
                "1"},
            {"missing --reliability", "--success-run", "--confidence", "0.95"},
            {"confidence must lie strictly between 0 and 1", "--success-run", "--confidence", "1.5",
                "--reliability", "0.9"}};
        for (String[] c : cases) {
            StringWriter e = new StringWriter();
            CommandLine cl = new CommandLine(new PlanCommand());
            cl.setOut(new PrintWriter(new StringWriter(), true));
            cl.setErr(new PrintWriter(e, true));
            int code = cl.execute(java.util.Arrays.copyOfRange(c, 1, c.length));
            assertThat(code).as(c[0]).isEqualTo(2);
            String first = e.toString().lines().findFirst().orElse("");
            assertThat(first).as("first line of stderr").contains(c[0]);
            assertThat(e.toString()).doesNotContain("Exception").doesNotContain("\tat ");
        }
    }

    @Test
    void unwritableJsonFileExitsWithTwo() throws IOException {
        Path notAFolder = java.nio.file.Files.writeString(dir.resolve("a-file"), "x");
        Path file = notAFolder.resolve("plan.json");
        int code = run("--margin", "0.2", "--difference", "0", "--sd", "0.1", "--power", "0.8", "--json",
                file.toString());
        assertThat(code).isEqualTo(2);
        assertThat(err.toString().lines()).hasSize(1);
        assertThat(err.toString()).startsWith("cannot write the JSON file");
    }

    /** The whole help screen against the golden text in plan-usage.txt (update it when the options change). */
    @Test
    void usageHelpMatchesTheGoldenText() throws IOException {
        assertThat(run("--help")).isZero();
        String golden;
        try (var in = PlanCommandTest.class.getResourceAsStream("plan-usage.txt")) {
            golden = new String(in.readAllBytes(), java.nio.charset.StandardCharsets.UTF_8);
        }
        assertThat(out.toString().replace("\r\n", "\n")).isEqualTo(golden);
    }
}
