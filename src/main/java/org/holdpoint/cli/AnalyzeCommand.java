package org.holdpoint.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.Callable;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.StabilityOptions;
import org.holdpoint.study.ChangeDescription;
import org.holdpoint.study.ChangeKind;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.DistributionSetting;
import org.holdpoint.study.CriteriaCheck;
import org.holdpoint.study.Signature;
import org.holdpoint.study.Exclusion;
import org.holdpoint.study.MarginSpec;
import org.holdpoint.study.SpecLimits;
import org.holdpoint.workflow.AnalysisOutcome;
import org.holdpoint.workflow.AnalyzeUseCase;
import org.holdpoint.workflow.ChartsUseCase;

import org.holdpoint.workflow.ImportOptions;
import org.holdpoint.workflow.ReportOptions;
import org.holdpoint.workflow.ReportUseCase;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code holdpoint analyze}: import before/after data, compare every characteristic, give the verdict. */
@Command(name = "analyze", mixinStandardHelpOptions = true, sortOptions = false, usageHelpAutoWidth = true,
        header = "Compare before and after samples of every characteristic and give the verdict.",
        description = {
            "Reads FILE (CSV, TSV, TXT, XLSX or XLS), or a before file and an after file, detects the layout "
                    + "(stacked, side by side, wide or paired) unless told, and for every characteristic reports "
                    + "descriptives, the difference test (Welch by default), equivalence by two one-sided tests "
                    + "against the margin, and the spread checks.",
            "Per-characteristic criteria come from --settings FILE or from NAME.settings.csv (or .json) beside "
                    + "the data file. Options given here apply to every characteristic and override that file.",
            "Without a margin the difference tests still run and the output says that equivalence was not "
                    + "assessed."},
        footer = {"", "Examples:", "  holdpoint analyze sample-data/boring-bar-insert.csv",
            "  holdpoint analyze data.xlsx --sheet Results --margin 0.01 --json result.json",
            "  holdpoint analyze --before old.csv --after new.xlsx --margin-percent 10 --lsl 24.98 --usl 25.02",
            "  holdpoint analyze data.csv --change-id CR-0412 --report CR-0412.xlsx --signed-by \"A. Lindqvist\" "
                    + "--role \"process engineer\"",
            "", "Exit codes: 0 analysed, 2 bad input (the message names the file, sheet and cell)."})
final class AnalyzeCommand implements Callable<Integer> {
    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", arity = "0..1", paramLabel = "FILE", description = "The data file holding both groups.")
    Path file;

    @CommandLine.ArgGroup(exclusive = false, heading = "%nInput%n", order = 1)
    InputArguments input = new InputArguments();

    @CommandLine.ArgGroup(exclusive = false, heading = "%nCriteria (apply to every characteristic)%n", order = 2)
    CriteriaOptions criteria = new CriteriaOptions();

    @CommandLine.ArgGroup(exclusive = false, heading = "%nMethod%n", order = 3)
    MethodOptions method = new MethodOptions();

    @CommandLine.ArgGroup(exclusive = false, heading = "%nOutput%n", order = 4)
    OutputOptions output = new OutputOptions();

    @CommandLine.ArgGroup(exclusive = false, heading = "%nThe change (shown in the sign-off workbook)%n", order = 5)
    ChangeOptions change = new ChangeOptions();

    @CommandLine.ArgGroup(exclusive = false, heading = "%nSign-off workbook%n", order = 6)
    ReportOptionsGroup report = new ReportOptionsGroup();

    static final class ChangeOptions {
        @Option(names = "--change-id", paramLabel = "ID", description = "Change id, e.g. CR-2026-0412.")
        String id;
        @Option(names = "--title", paramLabel = "TEXT", description = "One-line title of the change.")
        String title;
        @Option(names = "--kind", paramLabel = "KIND", description = "Kind of change: tooling, machine, material, "
                + "supplier, method or other.")
        String kind;
        @Option(names = "--part", paramLabel = "NUMBER", description = "Part number.")
        String part;
        @Option(names = "--revision", paramLabel = "REV", description = "Part revision.")
        String revision;
        @Option(names = "--reason", paramLabel = "TEXT", description = "Why the change is made.")
        String reason;
        @Option(names = "--requester", paramLabel = "NAME", description = "Who requested the change.")
        String requester;
        @Option(names = "--request-date", paramLabel = "YYYY-MM-DD", description = "Date the change was requested.")
        String requestDate;
        @Option(names = "--study-date", paramLabel = "YYYY-MM-DD", description = "Date of the study.")
        String studyDate;
    }

    static final class ReportOptionsGroup {
        @Option(names = "--report", paramLabel = "OUT.xlsx", description = "Write the sign-off workbook (summary, "
                + "details, method, import report, cautions, raw data, sign-off block and the embedded record).")
        Path file;
        @Option(names = "--template", paramLabel = "FILE", description = "Fill this template instead of the default "
                + "(its defined names are described in templates/README.md).")
        Path template;
        @Option(names = "--overwrite", description = "Replace existing output files (--report, --json, "
                + "--save-study); otherwise they are kept and the command stops.")
        boolean overwrite;
        @Option(names = "--signed-by", paramLabel = "NAME", description = "Printed name for the sign-off block "
                + "(a record of who signed, not an electronic signature).")
        String signedBy;
        @Option(names = "--role", paramLabel = "ROLE", description = "Role or title of the signer.")
        String role;
        @Option(names = "--meaning", paramLabel = "TEXT", description = "Meaning of the signature, e.g. "
                + "\"prepared: study planned, measured and analysed as recorded\".")
        String meaning;
        @Option(names = "--stage", paramLabel = "STAGE", defaultValue = "prepared", description = "Sign-off stage "
                + "of --signed-by: prepared, reviewed or approved (default: ${DEFAULT-VALUE}).")
        String stage = "prepared";
        @Option(names = "--sign-key", paramLabel = "KEY.pem", description = "Also sign the record with this Ed25519 "
                + "private key (PKCS#8 PEM); needs --sign-public-key.")
        Path signKey;
        @Option(names = "--sign-public-key", paramLabel = "PUB.pem", description = "The public key of --sign-key "
                + "(X.509 PEM), stored in the workbook so that verify can say which key signed.")
        Path signPublicKey;
    }

    static final class CriteriaOptions {
        @Option(names = "--margin", paramLabel = "D", description = "Symmetric equivalence margin (-D, D) in the "
                + "characteristic's unit.")
        Double margin;
        @Option(names = "--margin-lower", paramLabel = "L", description = "Lower margin L < 0 (alone: "
                + "non-inferiority, the difference may drop by at most |L|).")
        Double marginLower;
        @Option(names = "--margin-upper", paramLabel = "U", description = "Upper margin U > 0 (alone: the "
                + "difference may rise by at most U).")
        Double marginUpper;
        @Option(names = "--margin-percent", paramLabel = "P", description = "Symmetric margin as P %% of the "
                + "tolerance width USL - LSL.")
        Double marginPercent;
        @Option(names = "--margin-percent-of-usl", paramLabel = "P", description = "Upper margin as P %% of the USL, "
                + "for a characteristic with an upper limit only (e.g. flatness may grow by at most P %% of its "
                + "USL).")
        Double marginPercentOfUsl;
        @Option(names = "--margin-ratio", paramLabel = "R", description = "Margin for the ratio after/before of the "
                + "(geometric) means, 1/R to R (R > 1, e.g. 1.25 for 0.8 to 1.25), tested on the logarithms; for "
                + "positive characteristics.")
        Double marginRatio;
        @Option(names = "--margin-ratio-lower", paramLabel = "L", description = "Lower bound of the ratio after/before "
                + "(0 < L < 1; alone: may drop to L at most).")
        Double marginRatioLower;
        @Option(names = "--margin-ratio-upper", paramLabel = "U", description = "Upper bound of the ratio after/before "
                + "(U > 1; alone: may grow by at most (U - 1) x 100 %%, e.g. 1.2).")
        Double marginRatioUpper;
        @Option(names = "--lsl", paramLabel = "X", description = "Lower specification limit.")
        Double lsl;
        @Option(names = "--nominal", paramLabel = "X", description = "Nominal value.")
        Double nominal;
        @Option(names = "--usl", paramLabel = "X", description = "Upper specification limit.")
        Double usl;
        @Option(names = "--unit", paramLabel = "TEXT", description = "Unit of measure, e.g. mm.")
        String unit;
        @Option(names = "--sd-growth-limit", paramLabel = "R", description = "Largest acceptable "
                + "sd(after)/sd(before); judged on its upper confidence bound.")
        Double sdGrowthLimit;
        @Option(names = "--distribution", paramLabel = "FAMILY", description = "Judge capability of every "
                + "characteristic by this distribution: normal, lognormal, weibull, gamma, rayleigh, or auto (the "
                + "family with the lowest AIC). Default: auto for a characteristic bounded at zero with an upper "
                + "limit, or one that departs strongly from a normal shape; normal otherwise.")
        String distribution;
        @Option(names = "--tolerance-coverage", paramLabel = "P", description = "Require the after group's "
                + "tolerance interval covering this proportion of parts (e.g. 0.99) to lie inside the limits; with "
                + "--tolerance-confidence.")
        Double toleranceCoverage;
        @Option(names = "--tolerance-confidence", paramLabel = "G", description = "The confidence of that tolerance "
                + "interval (e.g. 0.95); with --tolerance-coverage.")
        Double toleranceConfidence;
        @Option(names = "--require-stability", description = "Fail a characteristic whose after phase signals on "
                + "its control chart against the before limits (default: a signal is a finding only).")
        boolean requireStability;
    }

    static final class MethodOptions {
        @Option(names = "--alpha", paramLabel = "A", defaultValue = "0.05", description = "Significance level, "
                + "0 < A < 0.5 (default: ${DEFAULT-VALUE}). Difference intervals are (1-A), equivalence "
                + "intervals (1-2A).")
        double alpha = 0.05;
        @Option(names = "--equal-variances", description = "Assert equal variances: the pooled tests decide "
                + "instead of Welch's.")
        boolean equalVariances;
        @Option(names = "--holm", description = "Holm-adjust the difference p-values across characteristics.")
        boolean holm;
        @Option(names = "--exclude", paramLabel = "[before:|after:][SHEET!]CELL=REASON", description = "Leave out "
                + "the value at one cell of one file (e.g. C12, Data!C12, after:J31) for the stated reason; "
                + "repeatable. before:/after: is needed when both files have the cell. The reason is recorded.")
        List<String> exclude = new ArrayList<>();
        @Option(names = "--row-order-is-run-order", description = "The rows of each file are in the order the parts "
                + "were made: draw control charts in that order where no sequence or date column exists.")
        boolean rowOrderIsRunOrder;
        @Option(names = "--control-tests", paramLabel = "LIST", description = "The ISO 7870-2 tests applied to the "
                + "control charts, e.g. 1,2,3,5 or 1-8 or all (default: 1,2,3).")
        String controlTests;
    }

    @Option(names = "--analyst", paramLabel = "NAME", description = "Who ran the analysis, as the record keeps it "
            + "(default: the user name of the account).")
    String analyst;

    private String analyst() {
        String a = analyst != null && !analyst.isBlank() ? analyst : System.getProperty("user.name", "");
        return a.isBlank() ? null : a.strip();
    }

    static final class OutputOptions {
        @Option(names = "--json", paramLabel = "FILE", description = "Also write the machine-readable result.")
        Path json;
        @Option(names = {"-q", "--quiet"}, description = "Print only the overall verdict and the cautions.")
        boolean quiet;
        @Option(names = "--charts", paramLabel = "DIR", description = "Also write the charts as PNG files into DIR: "
                + "the equivalence picture and, per characteristic, box plot, histogram and normal plot.")
        Path charts;
        @Option(names = "--save-study", paramLabel = "OUT.json", description = "Also save the whole study (change, "
                + "criteria, raw values with their origins, exclusions, sign-off, results) as a study file, e.g. for "
                + "'holdpoint archive add'.")
        Path saveStudy;
    }

    @Override
    public Integer call() throws IOException {
        ImportOptions request = importOptions();
        checkReportTarget();
        checkOutputs();
        AnalysisSettings settings = settings();
        AnalysisOutcome outcome = new AnalyzeUseCase().run(request, input.settings, settings,
                new ConsoleProgress(spec.commandLine().getErr(), false));
        TextOutput text = new TextOutput(spec.commandLine().getOut());
        if (output.quiet) {
            text.printVerdict(outcome.result());
        } else {
            text.print(outcome.data(), outcome.settings(), outcome.result());
        }
        // one record for every output of this run: the signature is stamped once, so the study file, the
        // workbook's embedded record and the archived version are the same document with the same SHA-256
        Signature sig = signOff();
        String runAt = java.time.Instant.now().truncatedTo(java.time.temporal.ChronoUnit.SECONDS).toString();
        String signingKey = report.signPublicKey == null ? null
                : org.holdpoint.workflow.RecordSigning.fingerprint(
                        org.holdpoint.workflow.RecordSigning.readPublic(report.signPublicKey));
        ChangeStudy unsigned = new ChangeStudy(changeDescription(), outcome.data(), outcome.settings(), List.of(),
                new org.holdpoint.study.Provenance(analyst(), runAt, signingKey));
        // the record is the study without its sign-off entries; an entry names the record it signs. Its hash is
        // computed only when an output carries the record (for a million values it is a large part of the run)
        boolean recorded = output.saveStudy != null || report.file != null || sig != null;
        String recordSha = !recorded ? null : org.holdpoint.workflow.StudyFiles.recordSha256(
                org.holdpoint.workflow.StudyFiles.toJson(unsigned, outcome.result()));
        ChangeStudy study = new ChangeStudy(unsigned.change(), unsigned.data(), unsigned.settings(),
                sig == null ? List.of() : List.of(sig.stamped(runAt, recordSha)), unsigned.provenance());
        if (output.saveStudy != null) {
            try {
                // the record names who analysed it, when, and the key that signs the workbook, so the study file
                // and the workbook carry the same document
                org.holdpoint.workflow.StudyFiles.write(study, outcome.result(), output.saveStudy);
                spec.commandLine().getOut().printf(java.util.Locale.ROOT, "Saved the study file %s%n  record SHA-256 "
                        + "%s%n", output.saveStudy, recordSha);
                spec.commandLine().getOut().flush();
            } catch (IOException e) {
                throw new UserInputException("cannot write the study file %s (%s); check the folder is writable",
                        output.saveStudy, e.getMessage());
            }
        }
        // with both the workbook and the chart files, each chart is rendered once for both
        org.holdpoint.workflow.RenderedCharts rendered = report.file != null && output.charts != null
                ? ChartsUseCase.render(outcome) : null;
        if (report.file != null) {
            writeReport(outcome, study, rendered);
        }
        if (output.json != null) {
            try {
                AnalyzeUseCase.writeJson(outcome, output.json);
            } catch (IOException e) {
                throw new UserInputException("cannot write the JSON result to %s (%s); check the folder exists and "
                        + "is writable", output.json, e.getMessage());
            }
        }
        if (output.charts != null) {
            try {
                var files = rendered != null ? ChartsUseCase.write(rendered, output.charts)
                        : ChartsUseCase.write(outcome, output.charts);
                spec.commandLine().getOut().printf(java.util.Locale.ROOT, "Wrote %d charts to %s%n", files.size(),
                        output.charts);
                spec.commandLine().getOut().flush();
            } catch (IOException e) {
                throw new UserInputException("cannot write the charts to %s (%s); check the folder is writable",
                        output.charts, e.getMessage());
            }
        }
        return ExitCodes.OK;
    }

    private void writeReport(AnalysisOutcome outcome, ChangeStudy study,
            org.holdpoint.workflow.RenderedCharts rendered) {
        ReportOptions options = ReportOptions.withDefaults().withTemplate(report.template)
                .withExisting(report.overwrite ? ReportOptions.ExistingFile.REPLACE : ReportOptions.ExistingFile.REFUSE)
                .withCharts(rendered != null ? rendered : new org.holdpoint.workflow.StudyChartSource());
        if (report.signKey != null) {
            options = options.withSigningKey(report.signKey, report.signPublicKey);
        }
        try {
            ReportUseCase.Written w = new ReportUseCase().write(study, outcome.result(), options, report.file);
            spec.commandLine().getOut().printf(java.util.Locale.ROOT, "%nWrote the sign-off workbook %s%n  record "
                    + "SHA-256 %s%s%n", w.file(), w.sha256(), w.keyFingerprint() == null ? ""
                    : String.format(java.util.Locale.ROOT, "%n  signed with key SHA-256 %s", w.keyFingerprint()));
            spec.commandLine().getOut().flush();
        } catch (IOException e) {
            throw new UserInputException("cannot write the sign-off workbook %s (%s); check the folder exists and is "
                    + "writable", report.file, e.getMessage());
        }
    }

    private ChangeDescription changeDescription() {
        ChangeOptions c = change;
        ChangeKind kind = ChangeKind.OTHER;
        if (c.kind != null) {
            try {
                kind = ChangeKind.parse(c.kind);
            } catch (IllegalArgumentException e) {
                throw new CommandLine.ParameterException(spec.commandLine(), "--kind: " + e.getMessage());
            }
        }
        return new ChangeDescription(c.id, c.title, kind, c.part, c.revision, c.reason, c.requester, c.requestDate,
                c.studyDate);
    }

    private Signature signOff() {
        ReportOptionsGroup r = report;
        if (r.signedBy == null) {
            if (r.role != null || r.meaning != null) {
                throw new CommandLine.ParameterException(spec.commandLine(), "--role and --meaning need --signed-by");
            }
            return null;
        }
        if (r.signedBy.isBlank()) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--signed-by needs a printed name");
        }
        Signature.Stage stage = Signature.Stage.parse(r.stage);
        if (stage == null) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--stage must be prepared, reviewed or "
                    + "approved, got '" + r.stage + "'");
        }
        return new Signature(stage, r.signedBy.trim(), r.role, r.meaning, null);
    }

    private void checkReportTarget() {
        ReportOptionsGroup r = report;
        if (r.file == null) {
            if (r.template != null || r.signKey != null) {
                throw new CommandLine.ParameterException(spec.commandLine(),
                        "--template and --sign-key need --report OUT.xlsx");
            }
            if (r.signedBy != null && output.saveStudy == null) {
                throw new CommandLine.ParameterException(spec.commandLine(),
                        "--signed-by needs --report OUT.xlsx or --save-study OUT.json (the record it signs)");
            }
            if (r.signedBy != null) {
                signOff();
            }
            return;
        }
        if ((r.signKey == null) != (r.signPublicKey == null)) {
            throw new CommandLine.ParameterException(spec.commandLine(),
                    "--sign-key and --sign-public-key go together");
        }
        signOff();
        changeDescription();
    }

    /** Outputs never replace inputs or each other, and existing ones need --overwrite (README, "Outputs"). */
    private void checkOutputs() {
        Path main = file != null ? file : input.before;
        Path beside = input.settings == null && main != null && Files.isRegularFile(main)
                ? org.holdpoint.workflow.AnalyzeUseCase.settingsBeside(main) : null;
        new OutputGuard().input("the data file", file).input("the before file", input.before)
                .input("the after file", input.after).input("the settings file", input.settings)
                .input("the settings file", beside).input("the template", report.template)
                .input("the signing key", report.signKey).input("the public key", report.signPublicKey)
                .output("--report", report.file).output("--json", output.json)
                .output("--save-study", output.saveStudy).folder("--charts", output.charts)
                .check(report.overwrite);
    }

    ImportOptions importOptions() {
        return input.toImportOptions(spec.commandLine(), file);
    }

    AnalysisSettings settings() {
        String alphaProblem = CriteriaCheck.alpha(method.alpha);
        if (alphaProblem != null) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--alpha: " + alphaProblem);
        }
        CriteriaOptions c = criteria;
        MarginSpec margin = marginSpec(c);
        // the one set of criteria rules, reported on the option that holds the value
        for (CriteriaCheck.Problem p : CriteriaCheck.check(c.lsl, c.nominal, c.usl, margin, c.sdGrowthLimit,
                null)) {
            String option = switch (p.field()) {
                case LSL -> "--lsl";
                case NOMINAL -> "--nominal";
                case USL -> "--usl";
                case MARGIN -> c.marginRatioLower != null || c.marginRatioUpper != null
                        ? (c.marginRatioLower != null ? "--margin-ratio-lower" : "--margin-ratio-upper")
                        : c.marginPercentOfUsl != null ? "--margin-percent-of-usl" : c.margin != null ? "--margin"
                        : c.marginPercent != null ? "--margin-percent" : c.marginLower != null ? "--margin-lower"
                        : "--margin-upper";
                case SD_GROWTH_LIMIT -> "--sd-growth-limit";
                default -> throw new IllegalStateException("not an analyze option: " + p.field());
            };
            throw new CommandLine.ParameterException(spec.commandLine(), option + ": " + p.message());
        }
        if (margin != null && margin.kind() == MarginSpec.Kind.PERCENT_OF_UPPER_LIMIT && c.lsl != null) {
            // the limits given here are the ones the margin is judged against
            throw new CommandLine.ParameterException(spec.commandLine(), "--margin-percent-of-usl: "
                    + CriteriaCheck.resolvable(margin, new SpecLimits(c.lsl, c.nominal, c.usl)));
        }
        DistributionSetting distribution = null;
        if (c.distribution != null) {
            distribution = DistributionSetting.parse(c.distribution);
            if (distribution == null) {
                throw new CommandLine.ParameterException(spec.commandLine(), "--distribution: '" + c.distribution
                        + "' is not a distribution; use " + DistributionSetting.words());
            }
        }
        org.holdpoint.study.ToleranceRequirement tolerance = null;
        if ((c.toleranceCoverage == null) != (c.toleranceConfidence == null)) {
            throw new CommandLine.ParameterException(spec.commandLine(), (c.toleranceCoverage == null
                    ? "--tolerance-confidence needs --tolerance-coverage" : "--tolerance-coverage needs "
                    + "--tolerance-confidence") + ": give both, e.g. --tolerance-coverage 0.99 --tolerance-confidence 0.95");
        }
        if (c.toleranceCoverage != null) {
            try {
                tolerance = new org.holdpoint.study.ToleranceRequirement(c.toleranceCoverage, c.toleranceConfidence);
            } catch (IllegalArgumentException bad) {
                throw new CommandLine.ParameterException(spec.commandLine(), (c.toleranceCoverage > 0
                        && c.toleranceCoverage < 1 ? "--tolerance-confidence: " : "--tolerance-coverage: ")
                        + bad.getMessage());
            }
        }
        CharacteristicSettings overrides = new CharacteristicSettings(c.unit, new SpecLimits(c.lsl, c.nominal, c.usl),
                margin, c.sdGrowthLimit, null, input.paired ? Boolean.TRUE : null, distribution,
                c.requireStability ? Boolean.TRUE : null, tolerance);
        List<Exclusion> exclusions = new ArrayList<>();
        for (String e : method.exclude) {
            try {
                exclusions.add(Exclusion.parse(null, e));
            } catch (IllegalArgumentException bad) {
                throw new CommandLine.ParameterException(spec.commandLine(), "--exclude: " + bad.getMessage());
            }
        }
        java.util.SortedSet<Integer> tests;
        try {
            tests = method.controlTests == null ? org.holdpoint.stats.ControlChart.DEFAULT_TESTS
                    : StabilityOptions.parseTests(method.controlTests);
        } catch (IllegalArgumentException bad) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--control-tests: " + bad.getMessage());
        }
        return new AnalysisSettings(method.alpha, method.equalVariances, method.holm, null, null, overrides,
                exclusions).withStability(new StabilityOptions(method.rowOrderIsRunOrder, tests));
    }

    private MarginSpec marginSpec(CriteriaOptions c) {
        int given = (c.margin != null ? 1 : 0) + (c.marginLower != null || c.marginUpper != null ? 1 : 0)
                + (c.marginPercent != null ? 1 : 0) + (c.marginPercentOfUsl != null ? 1 : 0)
                + (c.marginRatio != null ? 1 : 0) + (c.marginRatioLower != null || c.marginRatioUpper != null ? 1 : 0);
        if (given > 1) {
            throw new CommandLine.ParameterException(spec.commandLine(), "give one kind of margin: --margin, or "
                    + "--margin-lower/--margin-upper, or --margin-percent, or --margin-percent-of-usl, or "
                    + "--margin-ratio, or --margin-ratio-lower/--margin-ratio-upper");
        }
        if (c.marginRatio != null) {
            if (!(c.marginRatio > 1) || !Double.isFinite(c.marginRatio)) {
                throw new CommandLine.ParameterException(spec.commandLine(), "--margin-ratio must be a number R above 1 "
                        + "(after/before may lie between 1/R and R), got " + c.marginRatio);
            }
            return new MarginSpec(MarginSpec.Kind.RATIO, 1 / c.marginRatio, c.marginRatio);
        }
        if (c.marginRatioLower != null || c.marginRatioUpper != null) {
            return new MarginSpec(MarginSpec.Kind.RATIO, c.marginRatioLower, c.marginRatioUpper);
        }
        if (c.marginPercentOfUsl != null) {
            return new MarginSpec(MarginSpec.Kind.PERCENT_OF_UPPER_LIMIT, null, c.marginPercentOfUsl);
        }
        if (c.margin != null) {
            if (!(c.margin > 0) || !Double.isFinite(c.margin)) {
                throw new CommandLine.ParameterException(spec.commandLine(),
                        "--margin must be a positive number D (the margin is (-D, D)), got " + c.margin);
            }
            return new MarginSpec(MarginSpec.Kind.ABSOLUTE, -c.margin, c.margin);
        }
        if (c.marginLower != null || c.marginUpper != null) {
            return new MarginSpec(MarginSpec.Kind.ABSOLUTE, c.marginLower, c.marginUpper);
        }
        if (c.marginPercent != null) {
            return new MarginSpec(MarginSpec.Kind.PERCENT_OF_TOLERANCE, c.marginPercent, c.marginPercent);
        }
        return null;
    }
}
