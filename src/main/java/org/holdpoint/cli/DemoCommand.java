package org.holdpoint.cli;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.io.PrintWriter;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.holdpoint.study.ChangeDescription;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.workflow.AnalysisOutcome;
import org.holdpoint.workflow.AnalyzeUseCase;

import org.holdpoint.workflow.ImportOptions;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code holdpoint demo}: the whole job on the bundled, invented sample study. */
@Command(name = "demo", mixinStandardHelpOptions = true, usageHelpAutoWidth = true,
        header = "Analyse the bundled demo study (an invented boring-bar insert supplier change).",
        description = {"Copies the bundled sample data into the output folder, analyses it with the criteria "
                + "in its settings file, prints the result and writes there result.json, the charts, the sign-off "
                + "workbook and the study file (files of an earlier demo run are replaced)."})
final class DemoCommand implements Callable<Integer> {
    static final String STUDY = "boring-bar-insert";
    /** The invented change behind the demo data. */
    static final ChangeDescription DEMO_CHANGE = org.holdpoint.workflow.StudyService.DEMO_CHANGE;

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Option(names = "--out", paramLabel = "DIR", defaultValue = "holdpoint-demo",
            description = "Folder for the demo's data and outputs (default: ${DEFAULT-VALUE}).")
    Path out;

    @Override
    public Integer call() throws IOException {
        Files.createDirectories(out);
        Path data = extract(STUDY + ".csv");
        extract(STUDY + ".settings.csv");
        AnalysisOutcome outcome = new AnalyzeUseCase().run(ImportOptions.file(data), null,
                AnalysisSettings.defaultSettings(), new ConsoleProgress(spec.commandLine().getErr(), false));
        new TextOutput(spec.commandLine().getOut()).print(outcome.data(), outcome.settings(), outcome.result());
        Path json = out.resolve("result.json");
        AnalyzeUseCase.writeJson(outcome, json);
        // each chart is rendered once, for the files and the workbook alike
        var rendered = org.holdpoint.workflow.ChartsUseCase.render(outcome);
        var charts = org.holdpoint.workflow.ChartsUseCase.write(rendered, out.resolve("charts"));
        ChangeStudy study = new ChangeStudy(DEMO_CHANGE, outcome.data(), outcome.settings(), List.of());
        var written = new org.holdpoint.workflow.ReportUseCase().write(study, outcome.result(),
                org.holdpoint.workflow.ReportOptions.withDefaults()
                        .withExisting(org.holdpoint.workflow.ReportOptions.ExistingFile.REPLACE)
                        .withCharts(rendered),
                out.resolve(STUDY + "-signoff.xlsx"));
        Path studyFile = out.resolve(STUDY + ".study.json");
        org.holdpoint.workflow.StudyFiles.write(study, outcome.result(), studyFile);
        PrintWriter w = spec.commandLine().getOut();
        w.printf(Locale.ROOT, "%nWrote %s, %d charts in %s, the sign-off workbook %s (record SHA-256 %s) and the "
                + "study file %s%n", json, charts.size(), out.resolve("charts"), written.file(), written.sha256(),
                studyFile);
        w.flush();
        return ExitCodes.OK;
    }

    private Path extract(String name) throws IOException {
        Path target = out.resolve(name);
        try (InputStream in = DemoCommand.class.getResourceAsStream("/org/holdpoint/sample-data/" + name)) {
            if (in == null) {
                throw new UserInputException("the bundled sample file %s is missing from this build", name);
            }
            org.holdpoint.files.AtomicFiles.writeBytes(target, in.readAllBytes());
        }
        return target;
    }
}
