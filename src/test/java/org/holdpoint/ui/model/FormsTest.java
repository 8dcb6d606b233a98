package org.holdpoint.ui.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import org.holdpoint.study.ChangeKind;
import org.holdpoint.study.Progress;
import org.holdpoint.study.Signature;
import org.holdpoint.workflow.DataSources;
import org.holdpoint.workflow.StudyProblem;
import org.junit.jupiter.api.Test;

/** The small models: data choice, change form, sign-off, recent files, task outcomes, plain-words problems. */
class FormsTest {

    @Test
    void twoDroppedFilesAreOrderedBeforeThenAfterByTheirNames() {
        DataForm f = new DataForm();
        f.drop(List.of(Path.of("/d/press-before.csv"), Path.of("/d/after-run.csv")));
        assertThat(f.source()).isEqualTo(DataForm.Source.TWO_FILES);
        assertThat(f.before()).isEqualTo(Path.of("/d/press-before.csv"));
        assertThat(f.after()).isEqualTo(Path.of("/d/after-run.csv"));
        f.swap();
        assertThat(f.before()).isEqualTo(Path.of("/d/after-run.csv"));
        f.drop(List.of(Path.of("/d/all.xlsx")));
        assertThat(f.source()).isEqualTo(DataForm.Source.ONE_FILE);
        assertThat(f.toSources()).isEqualTo(DataSources.of(Path.of("/d/all.xlsx")));
        f.setLayout(org.holdpoint.study.Layout.WIDE);
        f.setSheet("Run 2");
        assertThat(f.toSources()).isEqualTo(new DataSources(Path.of("/d/all.xlsx"), null, null, "Run 2", null, null,
                org.holdpoint.study.Layout.WIDE));
        assertThatThrownBy(() -> f.drop(List.of(Path.of("a"), Path.of("b"), Path.of("c"))))
                .hasMessageContaining("3 were dropped");
    }

    @Test
    void missingFilesAreNamedBeforeImporting() {
        DataForm f = new DataForm();
        assertThatThrownBy(f::toSources).hasMessage("Choose the data file first (or drop it on the window).");
        f.setSource(DataForm.Source.TWO_FILES);
        f.setBefore(Path.of("b.csv"));
        assertThatThrownBy(f::toSources).hasMessage("Choose the after file first.");
    }

    @Test
    void changeFormMarksEditsButNotLoading() {
        ChangeForm f = new ChangeForm();
        int[] edits = {0};
        f.onEdit(() -> edits[0]++);
        List<Object> seen = new ArrayList<>();
        f.addListener(ChangeForm.Field.TITLE, e -> seen.add(e.getNewValue()));
        f.load(new org.holdpoint.study.ChangeDescription("CR-1", "New die", ChangeKind.TOOLING, "P-1", "A", "", "",
                null, null));
        assertThat(edits[0]).isZero();
        assertThat(seen).containsExactly("New die");
        f.set(ChangeForm.Field.TITLE, "New die, second cavity");
        f.set(ChangeForm.Field.KIND, "Material");
        assertThat(edits[0]).isEqualTo(2);
        assertThat(f.toDescription().kind()).isEqualTo(ChangeKind.MATERIAL);
        assertThat(f.toDescription().title()).isEqualTo("New die, second cavity");
        assertThatThrownBy(() -> f.set(ChangeForm.Field.KIND, "paint")).hasMessageContaining("is not a kind of change");
    }

    /**
     * A fault of the program (here a NullPointerException in a task) is told as an internal error with its
     * details in the fault log, never as a problem with the user's input; an input problem keeps its words.
     */
    @Test
    void aProgramFaultIsToldAsOneAndLoggedAnInputProblemAsItself() throws Exception {
        TaskRunner.Outcome<Object> fault = TaskRunner.outcome(p -> {
            throw new NullPointerException("boom in a test");
        }, org.holdpoint.study.Progress.NONE);
        assertThat(fault.status()).isEqualTo(TaskStatus.FAILED);
        assertThat(fault.problem().title()).isEqualTo("Internal error");
        assertThat(fault.problem().what()).contains("NullPointerException: boom in a test")
                .contains("not the cause");
        assertThat(java.nio.file.Files.readString(FaultLog.file())).contains("boom in a test")
                .contains("at org.holdpoint");
        TaskRunner.Outcome<Object> input = TaskRunner.outcome(p -> {
            throw new org.holdpoint.workflow.StudyProblem(org.holdpoint.workflow.StudyProblem.Kind.BAD_INPUT, null,
                    "%s", "data.csv, cell B7: not a number");
        }, org.holdpoint.study.Progress.NONE);
        assertThat(input.problem().title()).isEqualTo("The data could not be read");
        assertThat(input.problem().what()).isEqualTo("data.csv, cell B7: not a number");
    }

    /** The dates of the change are calendar dates written yyyy-mm-dd (ISO 8601), or left empty. */
    @Test
    void datesOfTheChangeAreIsoDatesOrEmpty() {
        ChangeForm f = new ChangeForm();
        f.set(ChangeForm.Field.REQUEST_DATE, "2026-11-16");
        f.set(ChangeForm.Field.STUDY_DATE, "");
        assertThat(f.problem(ChangeForm.Field.REQUEST_DATE)).isNull();
        assertThat(f.toDescription().requestDate()).isEqualTo("2026-11-16");
        assertThat(f.toDescription().studyDate()).isNull();
        f.set(ChangeForm.Field.STUDY_DATE, "27.11.2026");
        assertThat(f.problem(ChangeForm.Field.STUDY_DATE)).contains("year-month-day");
        assertThatThrownBy(f::toDescription).hasMessageStartingWith("Study date: Write the date");
        f.set(ChangeForm.Field.STUDY_DATE, "2026-02-30");
        assertThat(f.problem(ChangeForm.Field.STUDY_DATE)).as("no such day").isNotNull();
    }

    @Test
    void signaturesNeedNameRoleAndMeaningAndAreStamped() {
        Clock clock = Clock.fixed(Instant.parse("2026-12-01T10:15:30Z"), ZoneOffset.UTC);
        SignOffForm s = new SignOffForm(clock);
        assertThat(SignOffForm.problem(" ", "QM", "approved")).startsWith("Enter the printed name");
        assertThat(SignOffForm.problem("A", "", "approved")).startsWith("Enter the role");
        assertThat(SignOffForm.problem("A", "QM", " ")).startsWith("Say what the signature means");
        String record = "a".repeat(64);
        assertThatThrownBy(() -> s.sign(Signature.Stage.APPROVED, "A", "", "x", record)).isInstanceOf(
                IllegalArgumentException.class);
        assertThatThrownBy(() -> s.sign(Signature.Stage.APPROVED, "A", "QM", "x", null)).isInstanceOf(
                IllegalArgumentException.class);
        Signature g = s.sign(Signature.Stage.APPROVED, " B. Quality ", "quality manager", "approved for production",
                record);
        assertThat(g.name()).isEqualTo("B. Quality");
        assertThat(g.timestamp()).isEqualTo("2026-12-01T10:15:30Z");
        assertThat(g.record()).isEqualTo(record);
        assertThat(s.signatures()).containsExactly(g);
        assertThat(s.isVoid(g)).isFalse();
    }

    /**
     * A signature is linked to the record it signs (21 CFR 11.70: signatures linked to their records so they
     * cannot be transferred to another record; summarised in our words): when the record changes, the
     * signature no longer applies and says so; only such void signatures can be removed.
     */
    @Test
    void aSignatureOfAnotherRecordIsVoidAndOnlyVoidOnesCanBeRemoved() {
        SignOffForm s = new SignOffForm(Clock.systemUTC());
        Signature first = s.sign(Signature.Stage.PREPARED, "A", "engineer", "prepared", "a".repeat(64));
        s.setCurrentRecord("b".repeat(64));
        assertThat(s.isVoid(first)).isTrue();
        Signature second = s.sign(Signature.Stage.REVIEWED, "B", "quality engineer", "reviewed", "b".repeat(64));
        assertThat(s.isVoid(second)).isFalse();
        assertThat(s.voidCount()).isEqualTo(1);
        assertThat(s.removeVoid()).isEqualTo(1);
        assertThat(s.signatures()).containsExactly(second);
        s.setCurrentRecord(null);
        assertThat(s.isVoid(second)).as("an edited, not yet re-computed record").isTrue();
    }

    @Test
    void recentFilesAreNewestFirstWithoutDuplicatesAndAtMostEight() {
        RecentFiles r = new RecentFiles(PreferenceStore.inMemory());
        for (int i = 0; i < 10; i++) {
            r.add(Path.of("/data/f" + i + ".csv"));
        }
        r.add(Path.of("/data/f5.csv"));
        List<Path> l = r.list();
        assertThat(l).hasSize(RecentFiles.MAX);
        assertThat(l.get(0)).isEqualTo(Path.of("/data/f5.csv"));
        assertThat(l).doesNotHaveDuplicates();
        assertThat(r.lastFolder()).isEqualTo(Path.of("/data"));
    }

    @Test
    void taskOutcomesTellCompletedCancelledAndFailedApart() {
        assertThat(TaskRunner.outcome(p -> 42, Progress.NONE)).isEqualTo(new TaskRunner.Outcome<>(
                TaskStatus.COMPLETED, 42, null));
        assertThat(TaskRunner.outcome(p -> {
            throw new Progress.CancelledException();
        }, Progress.NONE).status()).isEqualTo(TaskStatus.CANCELLED);
        TaskRunner.Outcome<Object> bad = TaskRunner.outcome(p -> {
            throw new StudyProblem(StudyProblem.Kind.BAD_INPUT, null, "data.csv, cell C7: \"n/a\" is not a number");
        }, Progress.NONE);
        assertThat(bad.status()).isEqualTo(TaskStatus.FAILED);
        assertThat(bad.problem().what()).isEqualTo("data.csv, cell C7: \"n/a\" is not a number");
        assertThat(bad.problem().whatToDo()).contains("Nothing you typed has been lost");
        Progress stopped = new Progress() {
            @Override
            public void step(String what, double fraction) {
            }

            @Override
            public boolean cancelled() {
                return true;
            }
        };
        assertThat(TaskRunner.outcome(p -> {
            throw new java.io.UncheckedIOException(new java.nio.channels.ClosedByInterruptException());
        }, stopped).status()).as("an interrupted read after Cancel is a cancel, not a failure")
                .isEqualTo(TaskStatus.CANCELLED);
        TaskRunner.Outcome<Object> odd = TaskRunner.outcome(p -> {
            throw new IllegalStateException("boom");
        }, Progress.NONE);
        assertThat(odd.problem().what()).contains("IllegalStateException: boom").doesNotContain("at org.");
        assertThat(odd.problem().whatToDo()).contains("Save your work");
    }
}
