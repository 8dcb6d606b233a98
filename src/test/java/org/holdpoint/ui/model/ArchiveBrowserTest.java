package org.holdpoint.ui.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Path;
import java.sql.Connection;
import java.sql.DriverManager;
import java.sql.Statement;
import java.time.Clock;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import org.holdpoint.Holdpoint;
import org.holdpoint.ui.model.ArchiveBrowser.Field;
import org.holdpoint.workflow.StudyService;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The archive view's model without a display, over a throwaway embedded H2 archive: save the demo
 * study from the window, search with each filter, open read-only, verify, and detect a direct edit.
 */
class ArchiveBrowserTest {
    @TempDir
    Path dir;
    private StudySession s;
    private ArchiveBrowser a;
    private String url;
    private final List<UserMessage> problems = new ArrayList<>();

    @BeforeEach
    void open() {
        s = new StudySession(new StudyService(Holdpoint.archives()), TaskRunner.DIRECT, new RecentFiles(PreferenceStore.inMemory()),
                Clock.fixed(Instant.parse("2026-12-01T08:00:00Z"), ZoneOffset.UTC));
        s.addListener(StudySession.Property.PROBLEM, e -> problems.add((UserMessage) e.getNewValue()));
        s.openDemo();
        a = s.archive();
        url = "jdbc:h2:file:" + dir.resolve("db").toAbsolutePath();
        a.set(Field.URL, url);
    }

    @Test
    void filtersAreCheckedAsTyped() {
        a.set(Field.URL, "postgres://host/db");
        assertThat(a.problem(Field.URL)).contains("starts with jdbc:");
        a.set(Field.URL, url);
        a.set(Field.FROM, "2026-13-01");
        assertThat(a.problem(Field.FROM)).contains("year-month-day");
        a.set(Field.FROM, "2026-03-01");
        a.set(Field.TO, "2026-02-01");
        assertThat(a.problem(Field.TO)).contains("before the start date");
        a.search();
        assertThat(problems).singleElement().extracting(UserMessage::title).isEqualTo("Filters to correct");
        a.set(Field.TO, "2026-03-31");
        assertThat(a.toQuery().createdFrom()).isEqualTo(Instant.parse("2026-03-01T00:00:00Z"));
        assertThat(a.toQuery().createdTo()).as("the end date is included").isEqualTo(Instant.parse("2026-04-01T00:00:00Z"));
    }

    @Test
    void saveSearchOpenReadOnlyAndVerify() throws Exception {
        a.save("J. Okafor", "");
        assertThat(problems).isEmpty();
        assertThat(a.lastSaved().version()).isEqualTo(1);
        assertThat(a.lastSaved().changeId()).isEqualTo("CR-DEMO-0412");

        a.search();
        assertThat(a.rows()).hasSize(1);
        assertThat(a.value(0, ArchiveBrowser.Column.PART)).isEqualTo("PH-2210 rev C");
        assertThat(a.value(0, ArchiveBrowser.Column.STATE)).isEqualTo("current");
        assertThat(count(Field.PART, "ph-2210")).as("case-insensitive").isEqualTo(1);
        assertThat(count(Field.PART, "HB-9999")).isZero();
        assertThat(count(Field.CHARACTERISTIC, "Bore depth")).isEqualTo(1);
        assertThat(count(Field.CHARACTERISTIC, "Thread pitch")).isZero();
        assertThat(count(Field.KIND, "supplier")).isEqualTo(1);
        assertThat(count(Field.KIND, "tooling")).isZero();
        String verdict = a.lastSaved().verdict();
        assertThat(count(Field.VERDICT, verdict)).isEqualTo(1);
        assertThat(count(Field.SIGNER, "Nobody Signed")).isZero();
        String today = LocalDate.now(ZoneOffset.UTC).toString();
        assertThat(count(Field.FROM, today)).isEqualTo(1);
        assertThat(count(Field.FROM, LocalDate.now(ZoneOffset.UTC).plusDays(2).toString())).isZero();
        a.set(Field.FROM, "");

        a.search();
        a.open(0);
        var o = a.opened();
        assertThat(o.study().change().id()).isEqualTo("CR-DEMO-0412");
        assertThat(o.events()).isNotEmpty();
        assertThat(a.openedLines().get(0)).startsWith("READ-ONLY — archived version 1 of CR-DEMO-0412");
        assertThat(a.openedResults().rowCount()).isEqualTo(7);
        assertThat(a.openedResults()).isNotSameAs(s.results());

        a.verify();
        assertThat(a.verified().intact()).isTrue();
        assertThat(a.verifiedLines().get(0)).startsWith("Intact:");

        // Saving the same change again is a correction: refused without a reason, accepted with one.
        a.save("J. Okafor", "");
        assertThat(problems).singleElement().extracting(UserMessage::what).asString()
                .contains("already archived (version 1)").contains("needs a reason");
        a.save("J. Okafor", "corrected the requester");
        assertThat(a.lastSaved().version()).isEqualTo(2);
        a.search();
        assertThat(a.rows()).hasSize(2);
        a.setVersions(org.holdpoint.study.ArchiveQuery.Versions.CURRENT);
        a.search();
        assertThat(a.rows()).singleElement().extracting(v -> v.version()).isEqualTo(2);

        // An edit made directly in the database is found and the record named.
        try (Connection c = DriverManager.getConnection(url); Statement st = c.createStatement()) {
            st.executeUpdate("UPDATE study SET title = 'edited behind the archive' WHERE version = 1");
        }
        a.verify();
        assertThat(a.verified().intact()).isFalse();
        assertThat(a.verifiedLines().get(0)).startsWith("ALTERED:");
        assertThat(String.join("\n", a.verifiedLines())).contains("study");
    }

    @Test
    void archivingNeedsAPartNumberAndSomeoneWhoArchives() {
        assertThat(a.saveProblem(" ")).isEqualTo("Enter who archives the study.");
        s.change().set(ChangeForm.Field.PART_NUMBER, "");
        a.save("J. Okafor", "");
        assertThat(problems).singleElement().extracting(UserMessage::what).asString().contains("part number");
    }

    @Test
    void anUnreachableArchiveIsToldInWords() {
        a.set(Field.URL, "jdbc:nosuchdriver://nowhere/db");
        a.search();
        assertThat(problems).singleElement().extracting(UserMessage::title).isEqualTo("The archive refused or failed");
    }

    private int count(Field f, String value) {
        a.set(f, value);
        a.search();
        int n = a.rows().size();
        a.set(f, "");
        return n;
    }
}
