package org.holdpoint.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Map;
import java.util.concurrent.Callable;
import org.holdpoint.stats.Design;
import org.holdpoint.stats.EquivalencePlan;
import org.holdpoint.stats.Margin;
import org.holdpoint.stats.PlanResult;
import org.holdpoint.stats.StatsException;
import org.holdpoint.stats.SuccessRunPlan;
import org.holdpoint.stats.SuccessRunResult;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.ParameterException;
import picocli.CommandLine.Spec;

/**
 * {@code holdpoint plan}: the sample size (or the power at a given size) of the equivalence test, by the
 * exact power of the two one-sided tests, or the number of parts for a pass/fail characteristic.
 * Bad input raises a {@link ParameterException} (exit code 2); an unwritable JSON file gives exit code 1.
 */
@Command(name = "plan", sortOptions = false, usageHelpAutoWidth = false,
        description = {"Plans a trial before anything is measured: how many parts the equivalence test needs to "
                + "reach a target power (exact power of the two one-sided tests), or the power at a given size.",
            "With --success-run: how many parts a pass/fail characteristic needs to show a reliability with a "
                + "confidence."},
        exitCodeListHeading = "%nExit codes:%n",
        exitCodeList = {"0:plan computed",
            "2:bad input, or the JSON file could not be written (one-line message on stderr)"})
public final class PlanCommand implements Callable<Integer> {
    static final int EXIT_WRITE_FAILED = ExitCodes.BAD_INPUT;

    @Spec
    CommandSpec spec;

    @Option(names = "--alpha", paramLabel = "A", description = "Level of each one-sided test (default 0.05).")
    double alpha = 0.05;

    @Option(names = "--margin", paramLabel = "D", description = "Symmetric margin: equivalent within -D..D.")
    Double margin;

    @Option(names = "--margin-lower", paramLabel = "L", description = "Lower margin L < 0; alone, a one-sided "
            + "(non-inferiority) plan.")
    Double marginLower;

    @Option(names = "--margin-upper", paramLabel = "U", description = "Upper margin U > 0; alone, a one-sided "
            + "(non-superiority) plan.")
    Double marginUpper;

    @Option(names = "--difference", paramLabel = "T",
            description = "Expected true difference after - before, inside the margin.")
    Double difference;

    @Option(names = "--sd", paramLabel = "S",
            description = "Standard deviation (paired: of the differences), > 0.")
    Double sd;

    @Option(names = "--power", paramLabel = "P", description = "Target power: find the smallest size reaching it.")
    Double power;

    @Option(names = "--n", paramLabel = "N",
            description = "Size to evaluate instead of searching (per group, before; paired: pairs).")
    Integer n;

    @Option(names = "--paired", description = "Paired design: the same parts measured before and after.")
    boolean paired;

    @Option(names = "--ratio", paramLabel = "R",
            description = "Allocation ratio n_after/n_before (default 1); n_after = ceil(R*n_before).")
    double ratio = 1;

    @Option(names = "--success-run", description = "Plan a pass/fail characteristic instead.")
    boolean successRun;

    @Option(names = "--confidence", paramLabel = "C", description = "Pass/fail: confidence, e.g. 0.95.")
    Double confidence;

    @Option(names = "--reliability", paramLabel = "R", description = "Pass/fail: reliability to show, e.g. 0.99.")
    Double reliability;

    @Option(names = "--failures", paramLabel = "c", description = "Pass/fail: failures allowed (default 0).")
    Integer failures;

    @Option(names = "--from", paramLabel = "FILE", description = "Plan every characteristic of a study data file: "
            + "sd from its before (baseline) sample, margins from its criteria file (or --margin); the largest n "
            + "decides.")
    Path from;

    @Option(names = "--settings", paramLabel = "FILE", description = "With --from: the criteria file (default: "
            + "NAME.settings.csv beside the data).")
    Path settings;

    @Option(names = "--json", paramLabel = "FILE", description = "Also write the plan as JSON to FILE.")
    Path json;

    @Option(names = "--chart", paramLabel = "FILE.png", description = "Also draw the power curve (power against "
            + "the true difference, target marked) to a PNG file.")
    Path chart;

    @Option(names = "--overwrite", description = "Replace existing output files (--json, --chart); otherwise they "
            + "are kept and the command stops.")
    boolean overwrite;

    @Option(names = {"-h", "--help"}, usageHelp = true, description = "Show this help and exit.")
    boolean help;

    /**
     * Validates the options, computes the plan, prints it and writes the JSON file if asked.
     *
     * @return 0, or 2 when the JSON file could not be written
     * @throws ParameterException on bad input
     */
    @Override
    public Integer call() {
        Path beside = settings == null && from != null && java.nio.file.Files.isRegularFile(from)
                ? org.holdpoint.workflow.AnalyzeUseCase.settingsBeside(from) : null;
        new OutputGuard().input("the data file", from).input("the settings file", settings)
                .input("the settings file", beside).output("--json", json).output("--chart", chart).check(overwrite);
        Map<String, Object> document;
        PrintWriter out = spec.commandLine().getOut();
        try {
            if (from != null) {
                document = fromData(out);
            } else if (successRun) {
                SuccessRunResult r = successRunPlan().sampleSize();
                out.print(PlanOutput.text(r));
                document = PlanOutput.json(r);
            } else {
                PlanResult r = equivalencePlan();
                out.print(PlanOutput.text(r));
                document = PlanOutput.json(r);
                if (chart != null) {
                    try {
                        org.holdpoint.workflow.PlanChartUseCase.write(r, null, chart);
                        out.println("Power curve written to " + chart);
                    } catch (RuntimeException e) {
                        throw bad("cannot draw the power curve to " + chart + ": " + e.getMessage());
                    }
                }
            }
        } catch (StatsException e) {
            throw bad(e.getMessage());
        }
        out.flush();
        if (json != null) {
            try {
                org.holdpoint.files.AtomicFiles.writeText(json, new com.fasterxml.jackson.databind.ObjectMapper()
                        .enable(com.fasterxml.jackson.databind.SerializationFeature.INDENT_OUTPUT)
                        .writeValueAsString(document) + System.lineSeparator());
            } catch (IOException e) {
                spec.commandLine().getErr().println("cannot write the JSON file " + json + ": " + e.getMessage());
                return EXIT_WRITE_FAILED;
            }
        }
        return 0;
    }

    private PlanResult equivalencePlan() {
        if (confidence != null || reliability != null || failures != null) {
            throw bad("--confidence, --reliability and --failures belong to --success-run");
        }
        EquivalencePlan plan = EquivalencePlan.withDefaults().withMargin(margin()).withAlpha(alpha)
                .with(paired ? Design.PAIRED : Design.PARALLEL);
        if (paired && ratio != 1) {
            throw bad("--ratio applies to two groups; a paired design has one set of pairs");
        }
        plan = plan.withRatio(ratio);
        double t = require(difference, "--difference T (the expected true difference after - before)");
        double s = require(sd, "--sd S (the standard deviation; paired: of the differences)");
        if (!(s > 0)) {
            throw bad("--sd must be positive, got " + s);
        }
        if ((power == null) == (n == null)) {
            throw bad("give either --power P (search the size) or --n N (power at that size), not both or neither");
        }
        if (power != null) {
            if (!(power > alpha && power < 1)) {
                throw bad("--power must lie strictly between alpha = " + alpha + " and 1, got " + power);
            }
            return plan.withTargetPower(power).sampleSize(t, s);
        }
        return plan.powerAt(t, s, n);
    }

    private Map<String, Object> fromData(PrintWriter out) {
        if (successRun || paired || sd != null || n != null) {
            throw bad("--from plans two groups from the baseline sd: it does not take --success-run, --paired, --sd "
                    + "or --n");
        }
        if (!java.nio.file.Files.isRegularFile(from)) {
            throw bad(from + ": file not found; check the path");
        }
        double target = require(power, "--power P (the target power, e.g. 0.9)");
        if (!(target > alpha && target < 1)) {
            throw bad("--power must lie strictly between alpha = " + alpha + " and 1, got " + target);
        }
        Margin m = margin != null || marginLower != null || marginUpper != null ? margin() : null;
        EquivalencePlan plan = EquivalencePlan.withDefaults().withAlpha(alpha).withRatio(ratio).withTargetPower(target);
        double t = difference == null ? 0 : difference;
        org.holdpoint.workflow.PlanFromDataUseCase.Outcome o;
        try {
            o = org.holdpoint.workflow.PlanFromDataUseCase.run(org.holdpoint.workflow.ImportOptions.file(from),
                    settings, m, plan, t);
        } catch (org.holdpoint.workflow.AnalysisException e) {
            throw bad(String.join("; ", e.problems()));
        }
        out.printf(java.util.Locale.ROOT, "Equivalence trial plan from %s (two one-sided tests, or one for a one-sided "
                + "margin; exact power; sd from the before sample, so the power is conditional on sigma = s)%n", from);
        out.printf(java.util.Locale.ROOT, "  alpha %s per one-sided test, target power %s, expected difference %s%s%n",
                alpha, target, t, ratio == 1 ? "" : ", ratio " + ratio);
        out.printf(java.util.Locale.ROOT, "  %-28s %12s %24s %8s %8s  %s%n", "characteristic", "baseline sd", "margin",
                "n/group", "power", "note");
        java.util.List<Map<String, Object>> rows = new java.util.ArrayList<>();
        for (var p : o.plans()) {
            Map<String, Object> row = new java.util.LinkedHashMap<>();
            row.put("name", p.name());
            row.put("sd", Double.isFinite(p.sd()) ? p.sd() : null);
            row.put("marginLower", p.margin() == null ? null : p.margin().lower());
            row.put("marginUpper", p.margin() == null ? null : p.margin().upper());
            row.put("nPerGroup", p.plan() == null ? null : p.plan().n());
            row.put("achievedPower", p.plan() == null ? null : p.plan().achievedPower());
            row.put("note", p.note());
            rows.add(row);
            out.printf(java.util.Locale.ROOT, "  %-28s %12s %24s %8s %8s  %s%n", p.name(),
                    org.holdpoint.workflow.Format.num(p.sd(), 4), p.margin() == null ? "-" : "("
                            + (p.margin().lower() == null ? "none" : org.holdpoint.workflow.Format.num(
                                    p.margin().lower(), 4)) + ", "
                            + (p.margin().upper() == null ? "none" : org.holdpoint.workflow.Format.num(
                                    p.margin().upper(), 4)) + ")",
                    p.plan() == null ? "-" : Integer.toString(p.plan().n()),
                    p.plan() == null ? "-" : String.format(java.util.Locale.ROOT, "%.4f", p.plan().achievedPower()),
                    p.note() == null ? "" : p.note());
        }
        Map<String, Object> doc = new java.util.LinkedHashMap<>();
        doc.put("from", from.toString());
        doc.put("alpha", alpha);
        doc.put("targetPower", target);
        doc.put("difference", t);
        doc.put("characteristics", rows);
        if (o.driving() != null) {
            out.printf(java.util.Locale.ROOT, "Measure %d parts %s: %s needs the most.%n", o.driving().plan().n(),
                    ratio == 1 ? "per group" : "before and " + o.driving().plan().nAfter() + " after",
                    o.driving().name());
            doc.put("nPerGroup", o.driving().plan().n());
            doc.put("drivenBy", o.driving().name());
        } else {
            out.println("No characteristic could be planned; see the notes.");
        }
        out.println("With several characteristics that must all pass, the chance that all do is about the product of "
                + "their powers; plan each for a higher power when the overall claim is the goal.");
        return doc;
    }

    private Margin margin() {
        boolean split = marginLower != null || marginUpper != null;
        if (margin != null && split) {
            throw bad("give either --margin D or --margin-lower L with --margin-upper U, not both");
        }
        if (margin != null) {
            return Margin.symmetric(margin);
        }
        if (marginLower == null && marginUpper == null) {
            throw bad("give --margin D, or --margin-lower L and/or --margin-upper U (one of them alone plans a "
                    + "one-sided, non-inferiority or non-superiority, test)");
        }
        return new Margin(marginLower, marginUpper);
    }

    private SuccessRunPlan successRunPlan() {
        if (margin != null || marginLower != null || marginUpper != null || difference != null || sd != null
                || power != null || n != null || paired || ratio != 1) {
            throw bad("--success-run takes only --confidence, --reliability and --failures");
        }
        SuccessRunPlan plan = SuccessRunPlan.withDefaults()
                .withConfidence(require(confidence, "--confidence C (e.g. 0.95)"))
                .withReliability(require(reliability, "--reliability R (e.g. 0.99)"));
        return failures == null ? plan : plan.withFailures(failures);
    }

    private double require(Double value, String what) {
        if (value == null) {
            throw bad("missing " + what);
        }
        return value;
    }

    private ParameterException bad(String message) {
        return new ParameterException(spec.commandLine(), message);
    }
}
