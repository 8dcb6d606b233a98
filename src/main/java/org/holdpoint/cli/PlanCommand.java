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
import org.holdpoint.stats.CapabilityPlan;
import org.holdpoint.stats.SpreadPlan;
import org.holdpoint.result.Format;
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

    @Option(names = "--from", paramLabel = "FILE", description = "Plan every characteristic of the baseline data "
            + "(a file of before values only is fine; in a file with a group column the before rows): sd from the "
            + "baseline, margins and sd-growth limits from its criteria file (or the options); the largest n, with "
            + "its criterion, decides. Takes the input options below.")
    Path from;

    @picocli.CommandLine.ArgGroup(exclusive = false, heading = "%nInput (reading the baseline with --from, or --before and "
            + "--after; --paired also plans a paired design without data)%n", order = 1)
    InputArguments input = new InputArguments();

    @Option(names = "--sd-growth-limit", paramLabel = "R", description = "Also plan the spread criterion: parts per "
            + "group so that the one-sided upper bound of sd(after)/sd(before) falls below R (with --from: for every "
            + "characteristic; otherwise alone with --power, or beside an equivalence plan).")
    Double sdGrowthLimit;

    @Option(names = "--sd-ratio", paramLabel = "RHO", description = "The true sd(after)/sd(before) assumed for the "
            + "spread plan (default 1: the spread did not change).")
    Double sdRatio;

    @Option(names = "--margin-percent", paramLabel = "P", description = "With --from: a symmetric margin of P %% of "
            + "each characteristic's own tolerance width USL - LSL.")
    Double marginPercent;

    @Option(names = "--margin-percent-of-usl", paramLabel = "P", description = "With --from: an upper margin of P %% "
            + "of each characteristic's USL (characteristics with an upper limit only).")
    Double marginPercentOfUsl;

    @Option(names = "--capability-min", paramLabel = "R", description = "Plan the capability criterion: parts after "
            + "the change so that the lower bound of Ppk exceeds R (with --ppk; --from takes each characteristic's "
            + "requirement and its baseline).")
    Double capabilityMin;

    @Option(names = "--ppk", paramLabel = "P", description = "The true Ppk assumed for the capability plan (one "
            + "specification limit; for two limits the nearer one, which decides when the process is off centre).")
    Double ppk;

    @Option(names = "--distribution-free", description = "Plan a distribution-free tolerance interval (Wilks): the "
            + "fewest parts whose smallest and largest values cover --tolerance-coverage of the population with "
            + "--tolerance-confidence, two-sided and one-sided.")
    boolean distributionFree;
    @Option(names = "--tolerance-coverage", paramLabel = "P", description = "With --distribution-free: the proportion "
            + "of parts to cover, e.g. 0.95.")
    Double toleranceCoverage;
    @Option(names = "--tolerance-confidence", paramLabel = "G", description = "With --distribution-free: the "
            + "confidence, e.g. 0.95.")
    Double toleranceConfidence;
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
        Path beside = input.settings == null && from != null && java.nio.file.Files.isRegularFile(from)
                ? org.holdpoint.workflow.AnalyzeUseCase.settingsBeside(from) : null;
        new OutputGuard().input("the data file", from).input("the settings file", input.settings)
                .input("the settings file", beside).output("--json", json).output("--chart", chart).check(overwrite);
        Map<String, Object> document;
        PrintWriter out = spec.commandLine().getOut();
        try {
            if (from != null || input.before != null || input.after != null) {
                document = fromData(out);
            } else if (distributionFree || toleranceCoverage != null || toleranceConfidence != null) {
                document = toleranceSample(out);
            } else if (successRun) {
                SuccessRunResult r = successRunPlan().sampleSize();
                out.print(PlanOutput.text(r));
                document = PlanOutput.json(r);
            } else if (capabilityMin != null || ppk != null) {
                CapabilityPlan.Result c = capabilityPlan();
                out.print(capabilityText(c));
                document = new java.util.LinkedHashMap<>();
                document.put("capability", capabilityJson(c));
            } else if (sdGrowthLimit != null && margin == null && marginLower == null && marginUpper == null
                    && difference == null && sd == null) {
                // the spread criterion by itself
                SpreadPlan.Result s = spreadPlan();
                out.print(spreadText(s));
                document = new java.util.LinkedHashMap<>();
                document.put("spread", spreadJson(s));
            } else {
                PlanResult r = equivalencePlan();
                out.print(PlanOutput.text(r));
                document = PlanOutput.json(r);
                if (sdGrowthLimit != null) {
                    SpreadPlan.Result s = spreadPlan();
                    out.print(spreadText(s));
                    document.put("spread", spreadJson(s));
                    boolean spreadDrives = s.nBefore() > r.n();
                    out.printf(java.util.Locale.ROOT, "Measure %d parts per group: the %s criterion needs the most.%n",
                            Math.max(s.nBefore(), r.n()), spreadDrives ? "spread" : "equivalence");
                    document.put("drivenBy", spreadDrives ? "spread" : "equivalence");
                }
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

    private SpreadPlan.Result spreadPlan() {
        if (input.paired) {
            throw bad("the spread plan compares two independent groups; it does not take --paired");
        }
        SpreadPlan p = SpreadPlan.forLimit(sdGrowthLimit).withSdRatio(sdRatio == null ? 1 : sdRatio).withAlpha(alpha)
                .withRatio(ratio);
        if ((power == null) == (n == null)) {
            throw bad("give either --power P (search the size) or --n N (power at that size), not both or neither");
        }
        if (power != null) {
            if (!(power > alpha && power < 1)) {
                throw bad("--power must lie strictly between alpha = " + alpha + " and 1, got " + power);
            }
            return p.withTargetPower(power).sampleSize();
        }
        return p.powerAt(n);
    }

    private CapabilityPlan.Result capabilityPlan() {
        if (capabilityMin == null || ppk == null) {
            throw bad("the capability plan needs --capability-min R (the requirement) and --ppk P (the true Ppk assumed)");
        }
        if (margin != null || marginLower != null || marginUpper != null || sdGrowthLimit != null || input.paired) {
            throw bad("--capability-min plans the capability criterion by itself; plan the others in their own run, or "
                    + "all of them per characteristic with --from");
        }
        if (!(ppk > 0)) {
            throw bad("--ppk must be positive, got " + ppk);
        }
        CapabilityPlan p = CapabilityPlan.forRequirement(capabilityMin).withAlpha(alpha);
        double a = 3 * ppk;
        if ((power == null) == (n == null)) {
            throw bad("give either --power P (search the size) or --n N (power at that size), not both or neither");
        }
        if (power != null) {
            if (!(power > alpha && power < 1)) {
                throw bad("--power must lie strictly between alpha = " + alpha + " and 1, got " + power);
            }
            return p.withTargetPower(power).sampleSize(a, Double.POSITIVE_INFINITY);
        }
        double at = p.power(n, a, Double.POSITIVE_INFINITY);
        return new CapabilityPlan.Result(capabilityMin, ppk, alpha, Double.NaN, n, at,
                n > 3 ? p.power(n - 1, a, Double.POSITIVE_INFINITY) : null);
    }

    static String capabilityText(CapabilityPlan.Result c) {
        return String.format(java.util.Locale.ROOT, "Capability criterion: the %s lower bound of Ppk (Bissell) after "
                + "the change must exceed %s; true Ppk assumed %s, one specification limit (exact: noncentral t)%n"
                + "  parts after %d; power %.4f%s%s%n", Format.percent(1 - c.alpha()), Format.num(c.requirement()),
                Format.num(c.truePpk()), c.nAfter(), c.achievedPower(), Double.isNaN(c.targetPower()) ? ""
                : String.format(java.util.Locale.ROOT, " (target %s)", Format.num(c.targetPower())),
                c.powerAtPrevious() == null ? "" : String.format(java.util.Locale.ROOT, "; with one part fewer %.4f",
                        c.powerAtPrevious()));
    }

    static Map<String, Object> capabilityJson(CapabilityPlan.Result c) {
        Map<String, Object> m = new java.util.LinkedHashMap<>();
        m.put("requirement", c.requirement());
        m.put("truePpk", c.truePpk());
        m.put("alpha", c.alpha());
        m.put("targetPower", Double.isNaN(c.targetPower()) ? null : c.targetPower());
        m.put("method", "lower bound of Ppk (Bissell) above the requirement; exact probability for one limit "
                + "(noncentral t as a chi integral)");
        m.put("nAfter", c.nAfter());
        m.put("achievedPower", c.achievedPower());
        m.put("powerAtNMinus1", c.powerAtPrevious());
        return m;
    }

    static String spreadText(SpreadPlan.Result s) {
        return String.format(java.util.Locale.ROOT, "Spread criterion: the one-sided %s upper bound of sd(after)/"
                + "sd(before) must fall below the limit %s; true ratio assumed %s (F distribution, exact under "
                + "normality)%n  parts before %d, after %d; power %.4f%s%s%n", Format.percent(1 - s.alpha()),
                Format.num(s.limit()), Format.num(s.sdRatio()), s.nBefore(), s.nAfter(), s.achievedPower(),
                s.targetPower() == null ? "" : String.format(java.util.Locale.ROOT, " (target %s)", Format.num(
                        s.targetPower())), s.powerAtPrevious() == null ? "" : String.format(java.util.Locale.ROOT,
                        "; with one part fewer before %.4f", s.powerAtPrevious()));
    }

    static Map<String, Object> spreadJson(SpreadPlan.Result s) {
        Map<String, Object> m = new java.util.LinkedHashMap<>();
        m.put("limit", s.limit());
        m.put("sdRatio", s.sdRatio());
        m.put("alpha", s.alpha());
        m.put("targetPower", s.targetPower());
        m.put("nPerGroup", s.nBefore());
        m.put("nAfter", s.nAfter());
        m.put("achievedPower", s.achievedPower());
        m.put("powerAtNMinus1", s.powerAtPrevious());
        return m;
    }

    private PlanResult equivalencePlan() {
        if (marginPercent != null || marginPercentOfUsl != null) {
            throw bad("--margin-percent and --margin-percent-of-usl need each characteristic's limits: use them with "
                    + "--from, or give the margin in units (--margin D)");
        }
        if (confidence != null || reliability != null || failures != null) {
            throw bad("--confidence, --reliability and --failures belong to --success-run");
        }
        EquivalencePlan plan = EquivalencePlan.withDefaults().withMargin(margin()).withAlpha(alpha)
                .with(input.paired ? Design.PAIRED : Design.PARALLEL);
        if (input.paired && ratio != 1) {
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
        if (capabilityMin != null || ppk != null) {
            throw bad("with --from the capability requirement is each characteristic's capability_min and the process "
                    + "its baseline; --capability-min and --ppk plan one assumed process without data");
        }
        if (successRun || input.paired || sd != null || n != null) {
            throw bad("--from plans two groups from the baseline sd: it does not take --success-run, --paired, --sd "
                    + "or --n");
        }
        if (from != null && !java.nio.file.Files.isRegularFile(from)) {
            throw bad(from + ": file not found; check the path");
        }
        org.holdpoint.workflow.ImportOptions data = input.toImportOptions(spec.commandLine(), from);
        double target = require(power, "--power P (the target power, e.g. 0.9)");
        if (!(target > alpha && target < 1)) {
            throw bad("--power must lie strictly between alpha = " + alpha + " and 1, got " + target);
        }
        Margin m = margin != null || marginLower != null || marginUpper != null ? margin() : null;
        if ((marginPercent != null || marginPercentOfUsl != null) && (m != null
                || marginPercent != null && marginPercentOfUsl != null)) {
            throw bad("give one kind of margin: --margin, --margin-lower/--margin-upper, --margin-percent or "
                    + "--margin-percent-of-usl");
        }
        org.holdpoint.study.MarginSpec relative = marginPercent != null ? new org.holdpoint.study.MarginSpec(
                org.holdpoint.study.MarginSpec.Kind.PERCENT_OF_TOLERANCE, marginPercent, marginPercent)
                : marginPercentOfUsl != null ? new org.holdpoint.study.MarginSpec(
                        org.holdpoint.study.MarginSpec.Kind.PERCENT_OF_UPPER_LIMIT, null, marginPercentOfUsl) : null;
        if (relative != null && org.holdpoint.study.CriteriaCheck.margin(relative) != null) {
            throw bad((marginPercent != null ? "--margin-percent: " : "--margin-percent-of-usl: ")
                    + org.holdpoint.study.CriteriaCheck.margin(relative));
        }
        EquivalencePlan plan = EquivalencePlan.withDefaults().withAlpha(alpha).withRatio(ratio).withTargetPower(target);
        double t = difference == null ? 0 : difference;
        org.holdpoint.workflow.PlanFromDataUseCase.Outcome o;
        try {
            o = org.holdpoint.workflow.PlanFromDataUseCase.run(data, input.settings, m, relative, plan, t,
                    sdGrowthLimit, sdRatio == null ? 1 : sdRatio);
        } catch (org.holdpoint.workflow.AnalysisException e) {
            throw bad(String.join("; ", e.problems()));
        }
        out.printf(java.util.Locale.ROOT, "Equivalence trial plan from %s (two one-sided tests, or one for a one-sided "
                + "margin; exact power; sd from the before sample, so the power is conditional on sigma = s)%n", from);
        out.printf(java.util.Locale.ROOT, "  alpha %s per one-sided test, target power %s, expected difference %s%s%n",
                alpha, target, t, ratio == 1 ? "" : ", ratio " + ratio);
        out.printf(java.util.Locale.ROOT, "  %-28s %12s %24s %8s %8s %8s %8s %8s %8s  %s%n", "characteristic",
                "baseline sd", "margin", "n/group", "power", "n spread", "power", "n capab", "power", "note");
        java.util.List<Map<String, Object>> rows = new java.util.ArrayList<>();
        for (var p : o.plans()) {
            Map<String, Object> row = new java.util.LinkedHashMap<>();
            row.put("name", p.name());
            row.put("sd", Double.isFinite(p.sd()) ? p.sd() : null);
            row.put("marginLower", p.margin() == null ? null : p.margin().lower());
            row.put("marginUpper", p.margin() == null ? null : p.margin().upper());
            if (p.margin() != null && p.margin().ratio()) {
                row.put("marginScale", "ratio");
            }
            row.put("nPerGroup", p.plan() == null ? null : p.plan().n());
            row.put("achievedPower", p.plan() == null ? null : p.plan().achievedPower());
            row.put("note", p.note());
            row.put("spread", p.spread() == null ? null : spreadJson(p.spread()));
            row.put("spreadNote", p.spreadNote());
            row.put("drivenBy", p.drivenBy());
            if (p.capability() != null) {
                Map<String, Object> cap = new java.util.LinkedHashMap<>();
                cap.put("requirement", p.capability().requirement());
                cap.put("truePpk", p.capability().truePpk());
                cap.put("method", "lower bound of Ppk (Bissell) above the requirement; exact probability for the "
                        + "baseline's mean and sd (chi integral)");
                cap.put("nAfter", p.capability().nAfter());
                cap.put("achievedPower", p.capability().achievedPower());
                cap.put("powerAtNMinus1", p.capability().powerAtPrevious());
                row.put("capability", cap);
            } else {
                row.put("capability", null);
            }
            row.put("capabilityNote", p.capabilityNote());
            rows.add(row);
            String capN = p.capability() == null ? "-" : p.capability().nAfter() + ("capability".equals(p.drivenBy())
                    ? "*" : "");
            String capP = p.capability() == null ? "-" : String.format(java.util.Locale.ROOT, "%.4f",
                    p.capability().achievedPower());
            String spreadN = p.spread() == null ? "-" : p.spread().nBefore() + ("spread".equals(p.drivenBy()) ? "*" : "");
            String spreadP = p.spread() == null ? "-" : String.format(java.util.Locale.ROOT, "%.4f",
                    p.spread().achievedPower());
            out.printf(java.util.Locale.ROOT, "  %-28s %12s %24s %8s %8s %8s %8s %8s %8s  %s%n", p.name(),
                    org.holdpoint.result.Format.num(p.sd(), 4), p.margin() == null ? "-" : (p.margin().ratio() ? "ratio "
                            : "") + "("
                            + (p.margin().lower() == null ? "none" : org.holdpoint.result.Format.num(
                                    p.margin().lower(), 4)) + ", "
                            + (p.margin().upper() == null ? "none" : org.holdpoint.result.Format.num(
                                    p.margin().upper(), 4)) + ")",
                    p.plan() == null ? "-" : p.plan().n() + ("equivalence".equals(p.drivenBy())
                            && (p.spread() != null || p.capability() != null) ? "*" : ""),
                    p.plan() == null ? "-" : String.format(java.util.Locale.ROOT, "%.4f", p.plan().achievedPower()),
                    spreadN, spreadP, capN, capP, String.join("; ", java.util.stream.Stream.of(p.note(),
                            p.spreadNote(), p.capabilityNote()).filter(java.util.Objects::nonNull).toList()));
        }
        Map<String, Object> doc = new java.util.LinkedHashMap<>();
        doc.put("from", from.toString());
        doc.put("alpha", alpha);
        doc.put("targetPower", target);
        doc.put("difference", t);
        doc.put("characteristics", rows);
        if (o.driving() != null) {
            var d = o.driving();
            int needed = d.needed();
            out.printf(java.util.Locale.ROOT, "Measure %d parts %s: %s needs the most (its %s criterion; * marks the "
                    + "criterion that drives each row).%n", needed, ratio == 1 ? "per group" : "before and "
                    + (int) Math.ceil(ratio * needed - 1e-9) + " after", d.name(), d.drivenBy());
            doc.put("nPerGroup", needed);
            doc.put("drivenBy", d.name());
            doc.put("drivingCriterion", d.drivenBy());
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

    /** The distribution-free tolerance plan (Wilks 1941; docs/methods.md §17). */
    private Map<String, Object> toleranceSample(PrintWriter out) {
        if (!distributionFree) {
            throw bad("--tolerance-coverage and --tolerance-confidence plan a tolerance interval with "
                    + "--distribution-free (the normal interval needs no plan of its own: its factor k is computed "
                    + "for any n)");
        }
        if (toleranceCoverage == null || toleranceConfidence == null) {
            throw bad("--distribution-free needs --tolerance-coverage and --tolerance-confidence, e.g. 0.95 and 0.95");
        }
        int two;
        int one;
        try {
            two = org.holdpoint.stats.ToleranceFactors.wilksSampleSize(toleranceCoverage, toleranceConfidence, true);
            one = org.holdpoint.stats.ToleranceFactors.wilksSampleSize(toleranceCoverage, toleranceConfidence, false);
        } catch (StatsException e) {
            throw bad("--tolerance-coverage / --tolerance-confidence: " + e.getMessage());
        }
        String cov = org.holdpoint.result.Format.percent(toleranceCoverage);
        String conf = org.holdpoint.result.Format.percent(toleranceConfidence);
        out.printf(java.util.Locale.ROOT, "Distribution-free tolerance interval (Wilks 1941), %s coverage with %s "
                + "confidence:%n  two-sided, between the smallest and the largest value: %d parts (confidence "
                + "reached %s)%n  one-sided, below the largest or above the smallest value: %d parts (confidence "
                + "reached %s)%nEvery part counts: a part excluded later lowers the confidence below %s.%n", cov, conf,
                two, org.holdpoint.result.Format.percent(org.holdpoint.stats.ToleranceFactors.wilksTwoSided(two,
                        toleranceCoverage)), one, org.holdpoint.result.Format.percent(
                        org.holdpoint.stats.ToleranceFactors.wilksOneSided(one, toleranceCoverage)), conf);
        Map<String, Object> plan = new java.util.LinkedHashMap<>();
        plan.put("coverage", toleranceCoverage);
        plan.put("confidence", toleranceConfidence);
        plan.put("method", "distribution-free (Wilks 1941)");
        plan.put("twoSided", two);
        plan.put("oneSided", one);
        Map<String, Object> document = new java.util.LinkedHashMap<>();
        document.put("toleranceSample", plan);
        return document;
    }

    private SuccessRunPlan successRunPlan() {
        if (margin != null || marginLower != null || marginUpper != null || difference != null || sd != null
                || power != null || n != null || input.paired || ratio != 1) {
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
