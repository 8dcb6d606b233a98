package org.holdpoint.ui.swing;

import java.nio.file.Files;
import java.nio.file.Path;
import org.holdpoint.ui.model.ArchiveBrowser;
import org.holdpoint.ui.model.Step;

/**
 * Not a test: plans the demo study's "Bore depth" from its baseline and saves a screenshot of the Plan
 * step; then archives the demo study (and a correction) into a throwaway H2 archive, opens it read-only,
 * verifies the archive and saves a screenshot of the archive view (run under xvfb-run).
 */
public final class PlanArchiveTour {
    private PlanArchiveTour() {
    }

    /**
     * @param args output folder, theme (LIGHT or DARK)
     * @throws Exception on failure
     */
    public static void main(String[] args) throws Exception {
        Path out = Path.of(args.length > 0 ? args[0] : "target/screens");
        Themes theme = args.length > 1 ? Themes.valueOf(args[1]) : Themes.LIGHT;
        WindowDriver d = new WindowDriver();
        MainWindow win = d.open(theme, 1440, 900);
        WindowDriver.onEdt(() -> {
            win.session().openDemo();
            return null;
        });
        WindowDriver.await("the demo results", () -> win.session().results().result() != null, 60_000);
        WindowDriver.onEdt(() -> {
            win.show(Step.PLAN);
            win.session().plan().setCharacteristic("Bore depth");
            win.session().plan().fromBaseline();
            return null;
        });
        WindowDriver.await("the plan", () -> !win.session().busy() && win.session().plan().result() != null, 60_000);
        String suffix = theme == Themes.DARK ? "-dark" : "";
        d.screenshot(out.resolve("window-plan" + suffix + ".png"));
        // Values typed wrongly: the reason shows beside each field.
        WindowDriver.onEdt(() -> {
            win.session().plan().set(org.holdpoint.ui.model.PlanForm.Field.SD, "0,012");
            win.session().plan().set(org.holdpoint.ui.model.PlanForm.Field.POWER, "1.2");
            return null;
        });
        d.screenshot(out.resolve("window-plan-check" + suffix + ".png"));
        // Every characteristic, every criterion its settings name.
        WindowDriver.onEdt(() -> {
            win.session().plan().set(org.holdpoint.ui.model.PlanForm.Field.SD, "0.0121286");
            win.session().plan().set(org.holdpoint.ui.model.PlanForm.Field.POWER, "0.9");
            win.session().plan().planAll();
            return null;
        });
        WindowDriver.await("every plan", () -> !win.session().busy() && win.session().plan().allPlans() != null,
                60_000);
        d.screenshot(out.resolve("window-plan-all" + suffix + ".png"));
        WindowDriver.onEdt(() -> {
            win.session().plan().set(org.holdpoint.ui.model.PlanForm.Field.SD, "0.0121286");
            win.session().plan().set(org.holdpoint.ui.model.PlanForm.Field.POWER, "0.9");
            return null;
        });
        String url = "jdbc:h2:file:" + Files.createTempDirectory("holdpoint-tour-archive").resolve("db");
        WindowDriver.onEdt(() -> {
            win.session().archive().set(ArchiveBrowser.Field.URL, url);
            win.session().archive().save("J. Okafor", "");
            return null;
        });
        WindowDriver.await("archiving", () -> !win.session().busy() && win.session().archive().lastSaved() != null,
                60_000);
        WindowDriver.onEdt(() -> {
            win.session().change().set(org.holdpoint.ui.model.ChangeForm.Field.REQUESTER, "Process engineering, cell 5");
            win.session().archive().save("J. Okafor", "requester was the wrong cell");
            return null;
        });
        WindowDriver.await("the correction", () -> !win.session().busy()
                && win.session().archive().lastSaved().version() == 2, 60_000);
        WindowDriver.onEdt(() -> {
            win.showArchive();
            win.session().archive().set(ArchiveBrowser.Field.PART, "PH-2210");
            win.session().archive().search();
            return null;
        });
        WindowDriver.await("the search", () -> !win.session().busy() && win.session().archive().rows().size() == 2,
                60_000);
        WindowDriver.onEdt(() -> {
            win.archiveDialog().selectRow(0);
            win.session().archive().open(0);
            return null;
        });
        WindowDriver.await("the opened version", () -> !win.session().busy()
                && win.session().archive().opened() != null, 60_000);
        WindowDriver.onEdt(() -> {
            win.session().archive().verify();
            return null;
        });
        WindowDriver.await("the verification", () -> !win.session().busy()
                && win.session().archive().verified() != null, 60_000);
        d.screenshot(out.resolve("window-archive" + suffix + ".png"), win.archiveDialog());
        d.close();
        System.exit(0);
    }
}
