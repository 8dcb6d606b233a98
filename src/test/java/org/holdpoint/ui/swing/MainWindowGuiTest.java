package org.holdpoint.ui.swing;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.junit.jupiter.api.Assumptions.assumeFalse;

import java.awt.GraphicsEnvironment;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JTable;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.ui.model.Step;
import org.holdpoint.workflow.StudyFiles;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeAll;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

/**
 * Smoke test of the real window (needs a display, e.g. xvfb-run; skipped without one): it opens on the
 * demo study, analyses it again through the Analyse button, saves the study file and writes the
 * sign-off workbook through the window's model, and takes a screenshot into target/; then plans from the
 * baseline on the Plan step and searches, opens read-only and verifies a throwaway archive by the archive view's buttons.
 */
@Tag("gui")
class MainWindowGuiTest {
    private static final Path OUT = Path.of("target", "gui-smoke");
    private WindowDriver driver;

    @BeforeAll
    static void needsDisplay() {
        assumeFalse(GraphicsEnvironment.isHeadless(), "no display: the window smoke test is skipped");
    }

    @AfterEach
    void close() throws Exception {
        if (driver != null) {
            driver.close();
        }
    }

    @Test
    void opensOnTheDemoAnalysesSavesAndWritesTheWorkbook() throws Exception {
        driver = new WindowDriver();
        MainWindow w = driver.open(Themes.LIGHT, 1440, 900);
        WindowDriver.onEdt(() -> {
            w.session().openDemo();
            return null;
        });
        WindowDriver.await("the demo study analysed", () -> w.session().results().result() != null, 60_000);

        // The window shows the seven invented characteristics and an overall verdict in words.
        JTable results = WindowDriver.onEdt(() -> (JTable) find(w.getContentPane(), "results"));
        assertThat(WindowDriver.onEdt(results::getRowCount)).isEqualTo(7);
        String verdict = WindowDriver.onEdt(() -> ((JLabel) find(w.getContentPane(), "verdict")).getText());
        assertThat(verdict).startsWith("Change");
        assertThat(WindowDriver.onEdt(w::currentStep)).isEqualTo(Step.RESULTS);
        assertThat(WindowDriver.onEdt(() -> w.session().dirty())).isFalse();

        // Analyse again through the Criteria step's button (the job runs off the event thread).
        Object firstResult = WindowDriver.onEdt(() -> w.session().results().result());
        WindowDriver.onEdt(() -> {
            w.show(Step.CRITERIA);
            ((JButton) find(w.getContentPane(), "analyse")).doClick();
            return null;
        });
        WindowDriver.await("the second analysis", () -> w.session().results().result() != firstResult
                && !w.session().busy(), 60_000);
        assertThat(WindowDriver.onEdt(() -> w.session().results().rowCount())).isEqualTo(7);

        // Sign, save the study file and write the workbook.
        Files.createDirectories(OUT);
        Path study = OUT.resolve("demo.holdpoint.json");
        Path workbook = OUT.resolve("demo-sign-off.xlsx");
        Files.deleteIfExists(study);
        Files.deleteIfExists(workbook);
        WindowDriver.onEdt(() -> {
            w.session().sign(org.holdpoint.study.Signature.Stage.PREPARED, "A. Tester", "process engineer",
                    "prepared the study and its data");
            return null;
        });
        WindowDriver.await("the signature", () -> !w.session().busy()
                && !w.session().signOff().signatures().isEmpty(), 60_000);
        WindowDriver.onEdt(() -> {
            w.session().save(study, null);
            return null;
        });
        WindowDriver.await("the study file", () -> !w.session().busy() && w.session().studyFile() != null, 60_000);
        ChangeStudy back = StudyFiles.read(study);
        assertThat(back.data().characteristics()).hasSize(7);
        assertThat(back.signatures()).extracting(s -> s.name()).containsExactly("A. Tester");
        assertThat(back.change().id()).isEqualTo("CR-DEMO-0412");

        WindowDriver.onEdt(() -> {
            w.show(Step.SIGN_OFF);
            w.session().writeWorkbook(workbook);
            return null;
        });
        WindowDriver.await("the workbook", () -> !w.session().busy() && w.session().lastWorkbook() != null, 120_000);
        assertThat(workbook).isRegularFile();
        byte[] head = Files.readAllBytes(workbook);
        assertThat(head[0]).isEqualTo((byte) 'P'); // an .xlsx is a zip archive: "PK"
        assertThat(head[1]).isEqualTo((byte) 'K');
        assertThat(WindowDriver.onEdt(() -> w.session().lastProblem())).isNull();

        WindowDriver.onEdt(() -> {
            w.show(Step.RESULTS);
            return null;
        });
        BufferedImage shot = driver.screenshot(OUT.resolve("results.png"));
        assertThat(shot.getWidth()).isGreaterThan(800);
        assertThat(distinctColours(shot)).as("the screenshot shows a drawn window, not a blank area")
                .isGreaterThan(50);

        // Everything is saved, so closing asks nothing and disposes the window.
        assertThat(WindowDriver.onEdt(() -> w.session().dirty())).isFalse();
        WindowDriver.onEdt(() -> {
            w.closeWindow();
            return null;
        });
        assertThat(WindowDriver.onEdt(w::isDisplayable)).isFalse();
    }

    @Test
    void plansFromTheBaselineAndSearchesOpensAndVerifiesTheArchive() throws Exception {
        driver = new WindowDriver();
        MainWindow w = driver.open(Themes.LIGHT, 1440, 900);
        WindowDriver.onEdt(() -> {
            w.session().openDemo();
            return null;
        });
        WindowDriver.await("the demo study analysed", () -> w.session().results().result() != null, 60_000);

        // Plan step: choose a characteristic and press "From the baseline data"; the sizes and the curve appear.
        WindowDriver.onEdt(() -> {
            w.show(Step.PLAN);
            ((javax.swing.JComboBox<?>) find(w.getContentPane(), "plan.characteristic")).setSelectedItem("Bore depth");
            ((JButton) find(w.getContentPane(), "plan.fromBaseline")).doClick();
            return null;
        });
        WindowDriver.await("the plan", () -> !w.session().busy() && w.session().plan().result() != null, 60_000);
        int n = WindowDriver.onEdt(() -> w.session().plan().result().n());
        assertThat(WindowDriver.onEdt(() -> ((JLabel) find(w.getContentPane(), "plan.value.0")).getText()))
                .isEqualTo(Integer.toString(n));
        assertThat(WindowDriver.onEdt(() -> w.session().plan().resultFor())).isEqualTo("Bore depth");

        // Archive view: save the study to a throwaway archive, then search, open read-only and verify by its buttons.
        Path db = Files.createTempDirectory("holdpoint-gui-archive");
        WindowDriver.onEdt(() -> {
            w.session().archive().set(org.holdpoint.ui.model.ArchiveBrowser.Field.URL, "jdbc:h2:file:" + db.resolve("db"));
            w.session().archive().save("A. Tester", "");
            return null;
        });
        WindowDriver.await("archiving", () -> !w.session().busy() && w.session().archive().lastSaved() != null, 60_000);
        WindowDriver.onEdt(() -> {
            w.showArchive();
            ((JButton) find(w.archiveDialog().getContentPane(), "archive.search")).doClick();
            return null;
        });
        WindowDriver.await("the search", () -> !w.session().busy() && w.session().archive().rows().size() == 1, 60_000);
        WindowDriver.onEdt(() -> {
            w.archiveDialog().selectRow(0);
            ((JButton) find(w.archiveDialog().getContentPane(), "archive.open")).doClick();
            return null;
        });
        WindowDriver.await("the opened version", () -> !w.session().busy() && w.session().archive().opened() != null,
                60_000);
        assertThat(WindowDriver.onEdt(() -> ((javax.swing.text.JTextComponent) find(w.archiveDialog().getContentPane(),
                "archive.readOnly")).getText())).startsWith("READ-ONLY");
        WindowDriver.onEdt(() -> {
            ((JButton) find(w.archiveDialog().getContentPane(), "archive.verify")).doClick();
            return null;
        });
        WindowDriver.await("the verification", () -> !w.session().busy() && w.session().archive().verified() != null,
                60_000);
        assertThat(WindowDriver.onEdt(() -> ((javax.swing.text.JTextComponent) find(w.archiveDialog().getContentPane(),
                "archive.verification")).getText())).startsWith("Intact");
        assertThat(WindowDriver.onEdt(() -> w.session().lastProblem())).isNull();
        WindowDriver.onEdt(() -> {
            w.archiveDialog().dispose();
            return null;
        });
    }

    /**
     * Two measuring-machine exports with title rows, bands, a units row, trace columns and two constant
     * columns: the window shows every characteristic, the two constant ones as not assessable with the
     * reason in the Finding column, and a characteristic set to "no" in the Analyse column is left out.
     */
    @Test
    void showsNotAssessableCharacteristicsAndLetsTheUserChooseWhatIsAnalysed() throws Exception {
        Path dir = Files.createTempDirectory("holdpoint-shop-floor");
        Path before = org.holdpoint.importer.ShopFloorFiles.housing(dir.resolve("before.xlsx"), "before", 1000, 0, 0,
                11);
        Path after = org.holdpoint.importer.ShopFloorFiles.housing(dir.resolve("after.xlsx"), "after", 2000, 0.002, 1,
                12);
        driver = new WindowDriver();
        MainWindow w = driver.open(Themes.LIGHT, 1440, 900);
        WindowDriver.onEdt(() -> {
            var f = w.session().dataForm();
            f.setSource(org.holdpoint.ui.model.DataForm.Source.TWO_FILES);
            f.setBefore(before);
            f.setAfter(after);
            w.session().importAndAnalyse();
            return null;
        });
        WindowDriver.await("the exports analysed", () -> !w.session().busy() && w.session().results().result() != null
                && w.session().results().rowCount() == 7, 60_000);
        var table = w.session().results();
        int unassessable = 0;
        for (int r = 0; r < table.rowCount(); r++) {
            if (table.value(r, org.holdpoint.ui.model.ResultColumn.VERDICT)
                    == org.holdpoint.ui.model.VerdictLook.NOT_ASSESSABLE) {
                unassessable++;
                assertThat(String.valueOf(table.value(r, org.holdpoint.ui.model.ResultColumn.CONCLUSION)))
                        .contains("no variation in either group");
            }
        }
        assertThat(unassessable).isEqualTo(2);
        Files.createDirectories(OUT);
        WindowDriver.onEdt(() -> {
            w.show(Step.RESULTS);
            return null;
        });
        driver.screenshot(OUT.resolve("shop-floor-results.png"));
        WindowDriver.onEdt(() -> {
            var c = w.session().criteria();
            for (int r = 0; r < c.rowCount(); r++) {
                if (c.name(r).equals("Mould temp")) {
                    c.set(r, org.holdpoint.ui.model.CriteriaColumn.ANALYSE, "no");
                }
            }
            w.show(Step.CRITERIA);
            return null;
        });
        driver.screenshot(OUT.resolve("shop-floor-criteria.png"));
        Object first = WindowDriver.onEdt(() -> w.session().results().result());
        WindowDriver.onEdt(() -> {
            w.session().analyse();
            return null;
        });
        WindowDriver.await("the second analysis", () -> !w.session().busy()
                && w.session().results().result() != first, 60_000);
        assertThat(WindowDriver.onEdt(() -> w.session().results().rowCount())).isEqualTo(6);
        assertThat(WindowDriver.onEdt(() -> w.session().study().data().report().messages()))
                .anyMatch(m -> m.contains("not analysed") && m.contains("Mould temp"));
    }

    /**
     * At 1280 × 800 every row of the demo's results is in view, the detail pane is wide enough to read and
     * the chart keeps its share after the window was made smaller from 1920 × 1080 (screenshots of both sizes
     * go to target/gui-smoke and were looked at).
     */
    @Test
    void isUsableAt1280By800AndKeepsItsProportionsOnResize() throws Exception {
        driver = new WindowDriver();
        MainWindow w = driver.open(Themes.LIGHT, 1920, 1080);
        WindowDriver.onEdt(() -> {
            w.session().openDemo();
            return null;
        });
        WindowDriver.await("the demo study analysed", () -> w.session().results().result() != null, 60_000);
        Files.createDirectories(OUT);
        driver.screenshot(OUT.resolve("results-1920x1080.png"));
        JComponent charts = WindowDriver.onEdt(() -> find(w.getContentPane(), "charts"));
        double wide = WindowDriver.onEdt(() -> charts.getWidth() / (double) w.getContentPane().getWidth());
        WindowDriver.onEdt(() -> {
            w.setSize(1280, 800);
            w.validate();
            return null;
        });
        Thread.sleep(500);
        WindowDriver.onEdt(() -> {
            w.validate();
            return null;
        });
        driver.screenshot(OUT.resolve("results-1280x800.png"));
        JTable results = WindowDriver.onEdt(() -> (JTable) find(w.getContentPane(), "results"));
        java.awt.Rectangle view = WindowDriver.onEdt(results::getVisibleRect);
        int rows = WindowDriver.onEdt(results::getRowCount);
        int rowHeight = WindowDriver.onEdt(results::getRowHeight);
        assertThat(view.height).as("all %d rows in view at 1280 x 800", rows).isGreaterThanOrEqualTo(rows * rowHeight);
        JComponent detail = WindowDriver.onEdt(() -> find(w.getContentPane(), "detail"));
        assertThat(WindowDriver.onEdt(detail::getWidth)).as("the detail pane is wide enough to read")
                .isGreaterThanOrEqualTo(320);
        double narrow = WindowDriver.onEdt(() -> charts.getWidth() / (double) w.getContentPane().getWidth());
        assertThat(narrow).as("the chart keeps its share of the window").isCloseTo(wide, within(0.08));
        assertThat(WindowDriver.onEdt(charts::getWidth)).isGreaterThanOrEqualTo(480);
    }

    static JComponent find(java.awt.Container root, String name) {
        for (java.awt.Component c : root.getComponents()) {
            if (name.equals(c.getName()) && c instanceof JComponent j) {
                return j;
            }
            if (c instanceof java.awt.Container k) {
                JComponent f = find(k, name);
                if (f != null) {
                    return f;
                }
            }
        }
        return null;
    }

    private static int distinctColours(BufferedImage img) {
        java.util.Set<Integer> s = new java.util.HashSet<>();
        for (int y = 0; y < img.getHeight(); y += 4) {
            for (int x = 0; x < img.getWidth(); x += 4) {
                s.add(img.getRGB(x, y));
            }
        }
        return s.size();
    }
}
