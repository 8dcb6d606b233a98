package org.holdpoint.ui.swing;

import java.nio.file.Path;
import org.holdpoint.ui.model.Step;

/**
 * Not a test: walks through the steps of the window on the demo study and saves a screenshot of each
 * into the folder given (run under xvfb-run; see docs/performance.md and DEVELOPERS.md).
 */
public final class ScreenshotTour {
    private ScreenshotTour() {
    }

    /**
     * @param args output folder, theme (LIGHT or DARK), width, height
     * @throws Exception on failure
     */
    public static void main(String[] args) throws Exception {
        Path out = Path.of(args.length > 0 ? args[0] : "target/screens");
        Themes theme = args.length > 1 ? Themes.valueOf(args[1]) : Themes.LIGHT;
        int w = args.length > 2 ? Integer.parseInt(args[2]) : 1440;
        int h = args.length > 3 ? Integer.parseInt(args[3]) : 900;
        WindowDriver d = new WindowDriver();
        MainWindow win = d.open(theme, w, h);
        WindowDriver.onEdt(() -> {
            win.session().openDemo();
            return null;
        });
        WindowDriver.await("the demo results", () -> win.session().results().result() != null, 60_000);
        String suffix = theme == Themes.DARK ? "-dark" : "";
        for (Step s : Step.values()) {
            if (s == Step.SIGN_OFF) {
                WindowDriver.onEdt(() -> {
                    win.session().sign(org.holdpoint.study.Signature.Stage.PREPARED, "J. Okafor",
                            "process engineer, cell 4", "prepared the study and its data");
                    return null;
                });
                WindowDriver.await("the signature", () -> !win.session().busy()
                        && !win.session().signOff().signatures().isEmpty(), 60_000);
            }
            WindowDriver.onEdt(() -> {
                win.show(s);
                return null;
            });
            d.screenshot(out.resolve((s.ordinal() + 1) + "-" + s.name().toLowerCase(java.util.Locale.ROOT) + suffix
                    + ".png"));
        }
        // A criterion typed wrongly: the reason shows beside the cell.
        WindowDriver.onEdt(() -> {
            win.session().criteria().set(2, org.holdpoint.ui.model.CriteriaColumn.USL, "0,006");
            win.show(Step.CRITERIA);
            return null;
        });
        d.screenshot(out.resolve("3-criteria-check" + suffix + ".png"));
        java.nio.file.Path demo = win.session().dataForm().file();
        // A messy copy of the demo data: unusable cells are marked in the preview and listed in the report.
        java.nio.file.Path messy = java.nio.file.Files.createTempDirectory("holdpoint-tour").resolve("messy.csv");
        java.util.List<String> lines = new java.util.ArrayList<>(java.nio.file.Files.readAllLines(
                win.session().dataForm().file()));
        lines.set(3, lines.get(3).replaceAll(",[^,]*$", ",n/a"));
        lines.set(7, lines.get(7).replaceAll(",[^,]*$", ","));
        lines.set(12, lines.get(12).replaceAll(",[^,]*$", ",#DIV/0!"));
        java.nio.file.Files.write(messy, lines);
        WindowDriver.onEdt(() -> {
            win.session().criteria().set(2, org.holdpoint.ui.model.CriteriaColumn.USL, "0.006");
            win.session().dataForm().setFile(messy);
            win.session().importAndAnalyse();
            return null;
        });
        WindowDriver.await("the messy import", () -> !win.session().busy() && win.session().data() != null
                && win.session().data().report().skippedTotal() > 0, 60_000);
        WindowDriver.onEdt(() -> {
            win.show(Step.DATA);
            return null;
        });
        d.screenshot(out.resolve("2-data-skipped" + suffix + ".png"));
        // The same data under headers and labels the import cannot guess: mapped by hand on the Data step.
        java.nio.file.Path mapped = messy.resolveSibling("gauge-log.csv");
        java.util.List<String> renamed = new java.util.ArrayList<>();
        renamed.add("Feature,Stage,Serial,Reading");
        java.util.List<String> demoLines = java.nio.file.Files.readAllLines(demo);
        for (String line : demoLines.subList(1, demoLines.size())) {
            renamed.add(line.replace(",before,", ",old,").replace(",after,", ",new,"));
        }
        java.nio.file.Files.write(mapped, renamed);
        WindowDriver.onEdt(() -> {
            org.holdpoint.ui.model.DataForm f = win.session().dataForm();
            f.setFile(mapped);
            f.setMapping(org.holdpoint.ui.model.MappingField.GROUP, "Stage");
            f.setMapping(org.holdpoint.ui.model.MappingField.BEFORE_LABEL, "old");
            f.setMapping(org.holdpoint.ui.model.MappingField.AFTER_LABEL, "new");
            f.setMapping(org.holdpoint.ui.model.MappingField.VALUE, "Reading");
            f.setMapping(org.holdpoint.ui.model.MappingField.CHARACTERISTIC, "Feature");
            f.setMapping(org.holdpoint.ui.model.MappingField.UNIT_ID, "Serial");
            win.session().importAndAnalyse();
            return null;
        });
        WindowDriver.await("the mapped import", () -> !win.session().busy() && win.session().data() != null
                && win.session().data().report().skippedTotal() == 0, 60_000);
        WindowDriver.onEdt(() -> {
            win.show(Step.DATA);
            return null;
        });
        d.screenshot(out.resolve("2-data-mapped" + suffix + ".png"));
        d.close();
        System.exit(0);
    }
}
