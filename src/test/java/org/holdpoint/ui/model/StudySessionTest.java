package org.holdpoint.ui.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import org.holdpoint.study.SkipReason;
import org.holdpoint.result.Verdict;
import org.holdpoint.workflow.StudyService;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The window's presentation model without a display: jobs run at once on the test thread
 * ({@link TaskRunner#DIRECT}) through the real workflow on the bundled demo study.
 */
class StudySessionTest {
    @TempDir
    Path dir;
    private StudySession s;
    private final List<Object> problems = new ArrayList<>();
    private final List<Object> steps = new ArrayList<>();

    @BeforeEach
    void open() {
        s = new StudySession(new StudyService(org.holdpoint.workflow.ArchiveAccess.none()), TaskRunner.DIRECT, new RecentFiles(PreferenceStore.inMemory()),
                Clock.fixed(Instant.parse("2026-12-01T08:00:00Z"), ZoneOffset.UTC));
        s.addListener(StudySession.Property.PROBLEM, e -> problems.add(e.getNewValue()));
        s.addListener(StudySession.Property.STEP, e -> steps.add(e.getNewValue()));
        s.openDemo();
    }

    @Test
    void theDemoOpensAnalysedAndUnchanged() {
        assertThat(problems).isEmpty();
        assertThat(s.results().rowCount()).isEqualTo(7);
        assertThat(s.criteria().rowCount()).isEqualTo(7);
        assertThat(s.criteria().get(0, CriteriaColumn.MARGIN_IN)).isEqualTo(CriteriaTable.IN_PERCENT);
        assertThat(s.change().get(ChangeForm.Field.ID)).isEqualTo("CR-DEMO-0412");
        assertThat(s.dirty()).isFalse();
        assertThat(s.results().overallWords()).startsWith("Change ");
        assertThat(steps).last().isEqualTo(Step.RESULTS);
        assertThat(s.preview().rows()).hasSize(420);
        assertThat(s.criteriaFile().getFileName().toString()).isEqualTo("boring-bar-insert.settings.csv");
    }

    /**
     * Values in a characteristic's unit are shown at its measurement resolution plus two decimals: the demo's
     * bore diameter is measured to 0.0001 mm (4 decimals), so its difference shows 6 (arithmetic on the demo
     * file, no outside source needed).
     */
    @Test
    void resultsShowValuesAtTheResolutionOfTheirData() {
        ResultsTable r = s.results();
        int row = -1;
        for (int i = 0; i < r.rowCount(); i++) {
            if (r.value(i, ResultColumn.CHARACTERISTIC).equals("Bore diameter")) {
                row = i;
            }
        }
        assertThat(row).isNotNegative();
        assertThat(r.text(row, ResultColumn.DIFFERENCE)).matches("-?\\d+\\.\\d{6}");
        assertThat((String) r.value(row, ResultColumn.INTERVAL)).matches("\\(-?\\d+\\.\\d{6}, -?\\d+\\.\\d{6}\\)");
        assertThat(r.text(row, ResultColumn.SD_RATIO)).matches("\\d\\.\\d{1,3}");
    }

    /** The Finding column names every criterion that failed, first, so a failed row never reads as passed. */
    @Test
    void theFindingNamesEveryFailedCriterion() {
        ResultsTable r = s.results();
        int checked = 0;
        for (int i = 0; i < r.rowCount(); i++) {
            var c = r.row(i);
            String finding = (String) r.value(i, ResultColumn.CONCLUSION);
            boolean spread = c.sdGrowth() != null && !c.sdGrowth().met();
            boolean capability = c.checks() != null && Boolean.FALSE.equals(c.checks().capabilityMet());
            assertThat(finding.contains("spread: sd ratio bound")).as(c.name()).isEqualTo(spread);
            assertThat(finding.contains("capability: Ppk bound")).as(c.name()).isEqualTo(capability);
            assertThat(finding).as(c.name()).contains("mean: ");
            if (spread || capability) {
                assertThat(finding).as(c.name()).doesNotStartWith("mean: ");
                checked++;
            }
        }
        assertThat(checked).as("the demo fails on spread and on capability").isGreaterThanOrEqualTo(2);
    }

    /** The detail pane shows how the parts sit in the tolerance, the deciding bound first. */
    @Test
    void theDetailShowsTheCapabilityThatDecided() {
        ResultsTable r = s.results();
        for (int i = 0; i < r.rowCount(); i++) {
            var c = r.row(i);
            if (!c.name().equals("Chamfer width")) {
                continue;
            }
            var sections = ResultDetail.of(c, r.decimals(c.name()));
            var tol = sections.stream().filter(x -> x.title().equals("In the tolerance")).findFirst().orElseThrow();
            assertThat(tol.lines().get(0).label()).isEqualTo("Decides");
            assertThat(tol.lines().get(0).value()).contains("does NOT meet the required 1")
                    .contains(org.holdpoint.result.Format.ratio(c.checks().after().capability().ppkLower()));
            assertThat(tol.lines()).extracting(ResultDetail.Line::label).contains("Ppk", "Outside, ppm");
            return;
        }
        throw new AssertionError("the demo has a Chamfer width");
    }

    @Test
    void typingMarksTheStudyUnsaved() {
        s.change().set(ChangeForm.Field.TITLE, "edited");
        assertThat(s.dirty()).isTrue();
    }

    @Test
    void theFilterShowsOnlyCharacteristicsThatDidNotPass() {
        int rows = s.criteria().rowCount();
        int[] others = new int[rows - 1];
        for (int i = 1; i < rows; i++) {
            others[i - 1] = i;
        }
        s.criteria().set(0, CriteriaColumn.SD_GROWTH, "");
        s.criteria().fillDown(CriteriaColumn.SD_GROWTH, 0, others);
        s.analyse();
        assertThat(problems).isEmpty();
        ResultsTable r = s.results();
        long passed = r.result().characteristics().stream().filter(c -> c.verdict().status() == Verdict.Status.PASSED)
                .count();
        assertThat(passed).as("without the sd-growth limit some characteristics pass").isPositive();
        r.setFilter(ResultsTable.Filter.NOT_PASSED);
        assertThat(r.shownCount()).isEqualTo(7 - (int) passed);
        for (int i = 0; i < r.rowCount(); i++) {
            assertThat(r.shows(i)).isEqualTo(r.row(i).verdict().status() != Verdict.Status.PASSED);
        }
        assertThat(r.counts()).contains(passed + " passed");
    }

    @Test
    void aBadCriterionStopsTheAnalysisAndLeadsToTheCriteriaStep() {
        Object before = s.results().result();
        s.criteria().set(2, CriteriaColumn.USL, "0,006");
        s.analyse();
        assertThat(problems).hasSize(1);
        UserMessage m = (UserMessage) problems.get(0);
        assertThat(m.what()).contains("Bore roundness").contains("USL");
        assertThat(steps).last().isEqualTo(Step.CRITERIA);
        assertThat(s.results().result()).isSameAs(before);
        assertThat(s.criteria().get(2, CriteriaColumn.USL)).isEqualTo("0,006");
    }

    @Test
    void aBadImportLosesNothingThatWasTyped() throws Exception {
        Object data = s.data();
        s.change().set(ChangeForm.Field.REASON, "typed before the import");
        s.criteria().set(0, CriteriaColumn.SD_GROWTH, "1.6");
        Path bad = dir.resolve("empty.csv");
        Files.writeString(bad, "nothing,here\n");
        s.dataForm().setFile(bad);
        s.importAndAnalyse();
        assertThat(problems).hasSize(1);
        UserMessage m = (UserMessage) problems.get(0);
        assertThat(m.title()).isEqualTo("The data could not be read");
        assertThat(m.what()).contains("empty.csv");
        assertThat(s.data()).isSameAs(data);
        assertThat(s.change().get(ChangeForm.Field.REASON)).isEqualTo("typed before the import");
        assertThat(s.criteria().get(0, CriteriaColumn.SD_GROWTH)).isEqualTo("1.6");
        assertThat(s.results().rowCount()).isEqualTo(7);
        // the message says which data are still on screen
        assertThat(m.whatToDo()).contains("still those of boring-bar-insert.csv");
    }

    /** Results computed under other criteria are marked out of date and cannot be written, signed or archived. */
    @Test
    void outOfDateResultsAreMarkedAndCannotBeWrittenOrSigned() {
        s.criteria().set(0, CriteriaColumn.SD_GROWTH, "1.6");
        assertThat(s.results().staleBecause()).isEqualTo("the criteria changed after the analysis");
        assertThat(s.results().overallWords()).startsWith("Out of date: the criteria changed");
        assertThat(s.results().overallLook()).isEqualTo(VerdictLook.NOT_ASSESSED);
        Path workbook = dir.resolve("stale.xlsx");
        s.writeWorkbook(workbook);
        assertThat(problems).hasSize(1);
        assertThat(((UserMessage) problems.get(0)).title()).isEqualTo("Results out of date");
        assertThat(workbook).doesNotExist();
        s.sign(org.holdpoint.study.Signature.Stage.PREPARED, "A. Tester", "process engineer", "prepared");
        assertThat(problems).hasSize(2);
        assertThat(s.signOff().signatures()).isEmpty();
        s.archive().save("A. Tester", "");
        assertThat(problems).hasSize(3);
        assertThat(((UserMessage) problems.get(2)).title()).isEqualTo("Results out of date");

        s.analyse();
        assertThat(s.results().staleBecause()).isNull();
        s.writeWorkbook(workbook);
        assertThat(problems).hasSize(3);
        assertThat(workbook).exists();
    }

    /**
     * A signature is bound to the record it signed: an analysis that changes nothing keeps it; one under other
     * criteria makes it void, and a void signature stops the workbook until it is removed (21 CFR 11.70, linking
     * of signatures to their records, in our words).
     */
    @Test
    void aSignatureOfAnEarlierRecordIsVoidAndStopsTheWorkbook() throws Exception {
        s.analyse();
        s.sign(org.holdpoint.study.Signature.Stage.PREPARED, "A. Tester", "process engineer", "prepared");
        assertThat(s.signOff().signatures()).hasSize(1);
        String signed = s.signOff().signatures().get(0).record();
        assertThat(signed).hasSize(64).isEqualTo(s.signOff().currentRecord());
        s.analyse();
        assertThat(s.signOff().voidCount()).as("nothing changed").isZero();

        s.criteria().set(0, CriteriaColumn.SD_GROWTH, "1.6");
        s.analyse();
        assertThat(s.signOff().voidCount()).isEqualTo(1);
        assertThat(s.signOff().currentRecord()).isNotEqualTo(signed);
        Path workbook = dir.resolve("signed.xlsx");
        s.writeWorkbook(workbook);
        assertThat(problems).hasSize(1);
        assertThat(((UserMessage) problems.get(0)).title()).isEqualTo("Signatures of an earlier record");
        assertThat(workbook).doesNotExist();

        assertThat(s.signOff().removeVoid()).isEqualTo(1);
        s.sign(org.holdpoint.study.Signature.Stage.PREPARED, "A. Tester", "process engineer", "prepared");
        s.writeWorkbook(workbook);
        assertThat(workbook).exists();
        var verified = new org.holdpoint.workflow.VerifyUseCase().verify(workbook, null,
                org.holdpoint.study.Progress.NONE);
        assertThat(verified.differences()).isEmpty();
        assertThat(verified.sha256()).isEqualTo(s.signOff().currentRecord());

        // editing the change description changes the record too
        s.change().set(ChangeForm.Field.TITLE, "another title");
        assertThat(s.signOff().voidCount()).isEqualTo(1);
    }

    @Test
    void skippedCellsAreMarkedInThePreviewAndListedInTheReport() throws Exception {
        Path f = dir.resolve("press.csv");
        Files.writeString(f, "phase,value\nbefore,1.01\nbefore,n/a\nbefore,1.03\nbefore,1.02\n"
                + "after,1.02\nafter,1.04\nafter,1.01\n");
        s.dataForm().setFile(f);
        s.importAndAnalyse();
        PreviewGrid.Row skipped = s.preview().rows().stream().filter(r -> r.skipped() != null).findFirst()
                .orElseThrow();
        assertThat(skipped.origin().cell()).isEqualTo("B3");
        assertThat(skipped.skipped()).isEqualTo(SkipReason.TEXT);
        assertThat(skipped.cell(PreviewGrid.Column.STATUS)).isEqualTo("not used: text, not a number");
        assertThat(PreviewGrid.reportLines(s.data().report())).anySatisfy(l -> assertThat(l).contains("cell B3"));
        assertThat(s.preview().rows()).extracting(r -> r.origin().row()).isSorted();
    }

    @Test
    void aSavedStudyOpensAgainWithItsCriteriaAndSignatures() {
        s.criteria().set(1, CriteriaColumn.CAPABILITY, "1.67");
        s.analyse();
        s.sign(org.holdpoint.study.Signature.Stage.REVIEWED, "C. Review", "quality engineer",
                "reviewed the analysis");
        Path file = dir.resolve("study.holdpoint.json");
        boolean[] then = {false};
        s.save(file, () -> then[0] = true);
        assertThat(then[0]).isTrue();
        assertThat(s.dirty()).isFalse();
        assertThat(s.recent().list()).first().isEqualTo(file.toAbsolutePath().normalize());

        StudySession other = new StudySession(new StudyService(org.holdpoint.workflow.ArchiveAccess.none()), TaskRunner.DIRECT,
                new RecentFiles(PreferenceStore.inMemory()), Clock.systemUTC());
        other.openStudy(file);
        assertThat(other.criteria().get(1, CriteriaColumn.CAPABILITY)).isEqualTo("1.67");
        assertThat(other.criteria().get(0, CriteriaColumn.MARGIN)).isEqualTo(s.criteria().get(0,
                CriteriaColumn.MARGIN));
        assertThat(other.signOff().signatures()).extracting(g -> g.name()).containsExactly("C. Review");
        assertThat(other.change().get(ChangeForm.Field.ID)).isEqualTo("CR-DEMO-0412");
        assertThat(other.results().rowCount()).isEqualTo(7);
        assertThat(other.dirty()).isFalse();
    }

    @Test
    void aFittedModelAndARatioMarginSurviveSavingAndOpening() {
        // Bore roundness (row 2): a Weibull model and a ratio margin typed in the window
        s.criteria().set(2, CriteriaColumn.DISTRIBUTION, "weibull");
        s.criteria().set(2, CriteriaColumn.MARGIN_IN, CriteriaTable.IN_RATIO);
        s.criteria().set(2, CriteriaColumn.MARGIN, "1.3");
        s.analyse();
        var r = s.results().row(2);
        assertThat(r.checks().distribution().chosen().key()).isEqualTo("weibull");
        assertThat(r.decidingTost().ratio()).isTrue();
        Path file = dir.resolve("fitted.holdpoint.json");
        s.save(file, () -> { });
        StudySession other = new StudySession(new StudyService(org.holdpoint.workflow.ArchiveAccess.none()),
                TaskRunner.DIRECT, new RecentFiles(PreferenceStore.inMemory()), Clock.systemUTC());
        other.openStudy(file);
        assertThat(other.criteria().get(2, CriteriaColumn.DISTRIBUTION)).isEqualTo("weibull");
        assertThat(other.criteria().get(2, CriteriaColumn.MARGIN_IN)).isEqualTo(CriteriaTable.IN_RATIO);
        assertThat(other.criteria().get(2, CriteriaColumn.MARGIN)).isEqualTo("1.3");
        assertThat(other.results().row(2).checks().after().percentile().ppk())
                .isEqualTo(r.checks().after().percentile().ppk());
        assertThat(other.results().row(2).decidingTost().ciUpper()).isEqualTo(r.decidingTost().ciUpper());
    }

    @Test
    void aStudyOfTheEarlierMethodsIsAnalysedAgainAsItWas() throws Exception {
        Path old = Path.of(getClass().getResource("/org/holdpoint/workflow/study-v2-demo.json").toURI());
        StudySession other = new StudySession(new StudyService(org.holdpoint.workflow.ArchiveAccess.none()),
                TaskRunner.DIRECT, new RecentFiles(PreferenceStore.inMemory()), Clock.systemUTC());
        other.openStudy(old);
        other.analyse();
        assertThat(other.study().settings().methods()).isEqualTo(2);
        for (int i = 0; i < other.results().rowCount(); i++) {
            var c = other.results().row(i);
            if (c.checks() != null) {
                assertThat(c.checks().after().percentile()).as(c.name()).isNull();
            }
        }
        // saved again (the current schema), it says which methods it keeps, so that it opens the same way next time
        Path again = dir.resolve("old-methods.holdpoint.json");
        other.save(again, () -> { });
        var tree = org.holdpoint.workflow.StudyFiles.tree(java.nio.file.Files.readString(again));
        assertThat(tree.path("schemaVersion").asInt()).isEqualTo(org.holdpoint.workflow.StudyFiles.SCHEMA_VERSION);
        assertThat(tree.path("settings").path("methods").asInt()).isEqualTo(2);
    }

    @Test
    void aValueIsExcludedOnlyWithAReasonAndTheRecordKeepsIt() {
        String name = s.criteria().name(0);
        String cell = s.characteristic(name).before().origin(0).cell();
        int n = s.results().row(0).before().n();
        assertThat(s.exclude(name, cell, " ")).startsWith("Say why");
        assertThat(s.exclude(name, "ZZ9999", "typo")).contains("holds no value");
        assertThat(s.exclude(name, "12", "typo")).startsWith("Give the cell");
        assertThat(s.exclude(name, cell.toLowerCase(java.util.Locale.ROOT), "gauge slipped")).isNull();
        assertThat(s.exclusions()).singleElement().satisfies(e -> {
            assertThat(e.cell()).isEqualTo(cell);
            assertThat(e.reason()).isEqualTo("gauge slipped");
        });
        assertThat(s.results().row(0).before().n()).isEqualTo(n - 1);
        assertThat(s.study().settings().exclusions()).hasSize(1);
        assertThat(s.dirty()).isTrue();
        s.clearExclusions();
        assertThat(s.results().row(0).before().n()).isEqualTo(n);
    }

    @Test
    void aCancelledTaskChangesNothing() {
        Object data = s.data();
        TaskRunner cancelling = new TaskRunner() {
            @Override
            public <T> void run(String title, Job<T> job, Consumer<Outcome<T>> done) {
                done.accept(new Outcome<>(TaskStatus.CANCELLED, null, null));
            }

            @Override
            public boolean busy() {
                return false;
            }
        };
        StudySession c = new StudySession(new StudyService(org.holdpoint.workflow.ArchiveAccess.none()), cancelling, new RecentFiles(PreferenceStore.inMemory()),
                Clock.systemUTC());
        c.openDemo();
        assertThat(c.data()).isNull();
        assertThat(c.lastStatus()).contains("cancelled; nothing was changed");
        assertThat(s.data()).isSameAs(data);
    }
}
