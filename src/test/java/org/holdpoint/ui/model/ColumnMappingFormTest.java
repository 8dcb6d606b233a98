package org.holdpoint.ui.model;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.workflow.ColumnMapping;
import org.holdpoint.workflow.StudyService;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The Data step's column mapping without a display: named columns and labels reach the import, the
 * detected layout is shown, and a bad name is told in plain words without losing what was typed. The
 * expected values are the numbers written into the invented input file itself.
 */
class ColumnMappingFormTest {
    /** Invented: a stage column with the words old/new and a reading column; neither name nor label is detected. */
    private static final String STAGES = "Stage,Reading\nold,4.12\nold,4.15\nold,4.11\nold,4.14\nold,4.13\n"
            + "new,4.10\nnew,4.12\nnew,4.09\nnew,4.11\nnew,4.13\nnew,4.10\n";
    @TempDir
    Path dir;
    private StudySession s;
    private final List<UserMessage> problems = new ArrayList<>();

    @BeforeEach
    void open() {
        s = new StudySession(new StudyService(org.holdpoint.workflow.ArchiveAccess.none()), TaskRunner.DIRECT, new RecentFiles(PreferenceStore.inMemory()),
                Clock.fixed(Instant.parse("2026-12-01T08:00:00Z"), ZoneOffset.UTC));
        s.addListener(StudySession.Property.PROBLEM, e -> problems.add((UserMessage) e.getNewValue()));
    }

    @Test
    void columnsThatCannotBeDetectedImportOnceMapped() throws Exception {
        Path f = dir.resolve("stages.csv");
        Files.writeString(f, STAGES);
        s.dataForm().setFile(f);
        s.importAndAnalyse();
        assertThat(problems).hasSize(1);
        assertThat(s.data()).isNull();

        problems.clear();
        s.dataForm().setMapping(MappingField.GROUP, "Stage");
        s.dataForm().setMapping(MappingField.VALUE, "Reading");
        s.dataForm().setMapping(MappingField.BEFORE_LABEL, "old");
        s.dataForm().setMapping(MappingField.AFTER_LABEL, " new ");
        s.importAndAnalyse();

        assertThat(problems).isEmpty();
        assertThat(s.data().characteristics()).hasSize(1);
        CharacteristicData c = s.data().characteristics().get(0);
        assertThat(c.before().sample().values()).containsExactly(4.12, 4.15, 4.11, 4.14, 4.13);
        assertThat(c.after().sample().values()).containsExactly(4.10, 4.12, 4.09, 4.11, 4.13, 4.10);
        assertThat(s.detectedLayout()).anySatisfy(l -> assertThat(l).contains("group column").contains("Stage")
                .contains("\"old\"").contains("\"new\"").contains("Reading"));
        assertThat(s.dataForm().mapping(MappingField.GROUP)).isEqualTo("Stage");
        assertThat(s.dataForm().mapping(MappingField.AFTER_LABEL)).isEqualTo("new");
    }

    @Test
    void aBadColumnNameIsToldInPlainWordsAndTheMappingIsKept() throws Exception {
        Path f = dir.resolve("stages.csv");
        Files.writeString(f, STAGES);
        s.dataForm().setFile(f);
        s.dataForm().setMapping(MappingField.GROUP, "Stag");
        s.dataForm().setMapping(MappingField.VALUE, "Reading");
        s.dataForm().setMapping(MappingField.BEFORE_LABEL, "old");
        s.dataForm().setMapping(MappingField.AFTER_LABEL, "new");
        s.importAndAnalyse();

        assertThat(problems).hasSize(1);
        UserMessage m = problems.get(0);
        assertThat(m.what()).contains("stages.csv").contains("no group column \"Stag\"").contains("Stage")
                .doesNotContain("Exception").doesNotContain("at org.");
        assertThat(s.data()).isNull();
        assertThat(s.dataForm().mapping(MappingField.GROUP)).isEqualTo("Stag");
        assertThat(s.dataForm().mapping(MappingField.VALUE)).isEqualTo("Reading");
        assertThat(s.dataForm().mapping(MappingField.BEFORE_LABEL)).isEqualTo("old");
        assertThat(s.dataForm().mapping(MappingField.AFTER_LABEL)).isEqualTo("new");
    }

    @Test
    void aHeaderRowThatIsNotANumberIsToldBeforeImporting() throws Exception {
        Path f = dir.resolve("stages.csv");
        Files.writeString(f, STAGES);
        s.dataForm().setFile(f);
        s.dataForm().setMapping(MappingField.HEADER_ROW, "first");
        s.importAndAnalyse();
        assertThat(problems).singleElement().satisfies(m -> assertThat(m.what()).contains("\"first\"")
                .contains("not a row number"));
        assertThat(s.dataForm().mapping(MappingField.HEADER_ROW)).isEqualTo("first");
    }

    @Test
    void aHeaderRowBelowTitleRowsIsUsedWhenTyped() throws Exception {
        Path f = dir.resolve("titled.csv");
        Files.writeString(f, "Bore gauge log\nStage,Reading\n" + STAGES.substring(STAGES.indexOf('\n') + 1));
        s.dataForm().setFile(f);
        s.dataForm().setMapping(MappingField.HEADER_ROW, "2");
        s.dataForm().setMapping(MappingField.GROUP, "A");
        s.dataForm().setMapping(MappingField.VALUE, "B");
        s.dataForm().setMapping(MappingField.BEFORE_LABEL, "old");
        s.dataForm().setMapping(MappingField.AFTER_LABEL, "new");
        s.importAndAnalyse();
        assertThat(problems).isEmpty();
        assertThat(s.data().characteristics().get(0).before().size()).isEqualTo(5);
        assertThat(s.data().characteristics().get(0).after().size()).isEqualTo(6);
        assertThat(s.data().characteristics().get(0).before().origin(0).cell()).isEqualTo("B3");
    }

    @Test
    void theMappingTravelsToTheSourcesAndBlankMeansDetected() {
        DataForm f = new DataForm();
        f.setFile(Path.of("/d/all.csv"));
        assertThat(f.toSources().columns()).isEqualTo(ColumnMapping.NONE);
        f.setMapping(MappingField.UNIT_ID, "Serial");
        f.setMapping(MappingField.LOT, "  ");
        f.setMapping(MappingField.HEADER_ROW, "3");
        ColumnMapping m = f.toSources().columns();
        assertThat(m.unitId()).isEqualTo("Serial");
        assertThat(m.lot()).isNull();
        assertThat(m.headerRow()).isEqualTo(3);
    }
}
