package org.holdpoint.workflow;

import static org.assertj.core.api.Assertions.assertThat;

import com.fasterxml.jackson.databind.JsonNode;
import java.net.URISyntaxException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.study.Progress;
import org.holdpoint.result.StudyResult;
import org.junit.jupiter.api.Test;

/**
 * Every schema version ever written stays readable: one stored study file per version
 * (study-v1-demo.json: schema 1, written by holdpoint 0.1.0 for the bundled demo study).
 */
class StudyFileVersionsTest {

    private static Path resource(String name) throws URISyntaxException {
        return Path.of(StudyFileVersionsTest.class.getResource(name).toURI());
    }

    private static StudyResult reComputesToItsStoredVerdicts(ChangeStudy study, JsonNode stored) {
        StudyResult again = new StudyAnalyzer().analyze(study.data(), study.settings(), Progress.NONE);
        List<String> storedStatus = new java.util.ArrayList<>();
        stored.path("results").path("characteristics").forEach(c -> storedStatus.add(
                c.path("verdict").path("status").asText()));
        assertThat(again.characteristics().stream().map(r -> r.verdict().status().words()).toList())
                .isEqualTo(storedStatus);
        return again;
    }

    /** The stored workbook verifies INTACT with this version; the fields a later version adds are no difference. */
    private static void verifiesIntact(String workbook, ChangeStudy study) throws Exception {
        VerifyResult v = new VerifyUseCase().verify(resource(workbook), null, Progress.NONE);
        assertThat(v.differences()).isEmpty();
        assertThat(v.status()).isEqualTo(VerifyResult.Status.INTACT);
        assertThat(v.changeId()).isEqualTo(study.change().id());
        assertThat(v.notes()).noneMatch(n -> n.contains("stored results differ") || n.contains("fault of the program"));
    }

    @Test
    void schemaVersionOneIsReadAndReComputesToItsStoredVerdicts() throws Exception {
        Path file = resource("study-v1-demo.json");
        JsonNode stored = StudyFiles.tree(Files.readString(file));
        assertThat(stored.path("schemaVersion").asInt()).isEqualTo(1);
        ChangeStudy study = StudyFiles.read(file);
        assertThat(study.change().id()).isEqualTo("CR-DEMO-0412");
        assertThat(study.data().characteristics()).hasSize(7);
        // the first value of the demo data file sample-data/boring-bar-insert.csv (row 2, column D)
        assertThat(study.data().characteristics().get(0).before().sample().value(0)).isEqualTo(25.0132);
        assertThat(study.data().characteristics().get(0).before().origin(0).cell()).isEqualTo("D2");
        StudyResult again = reComputesToItsStoredVerdicts(study, stored);
        assertThat(again.changeVerified()).isEqualTo(stored.path("results").path("changeVerified").asBoolean());
    }

    /**
     * Schema 2, written by holdpoint 0.1.0 for the demo study (holdpoint demo, study file and workbook of one
     * run): the study file is read and re-computed to its stored verdicts, and the workbook still verifies.
     */
    @Test
    void schemaVersionTwoIsReadAndItsWorkbookStillVerifies() throws Exception {
        Path file = resource("study-v2-demo.json");
        JsonNode stored = StudyFiles.tree(Files.readString(file));
        assertThat(stored.path("schemaVersion").asInt()).isEqualTo(2);
        ChangeStudy study = StudyFiles.read(file);
        assertThat(study.data().characteristics()).hasSize(7);
        StudyResult again = reComputesToItsStoredVerdicts(study, stored);
        // schema 2 knew only the normal model: re-computed so, its one-sided characteristics keep their normal Ppk
        assertThat(study.settings().methods()).isEqualTo(2);
        again.characteristics().forEach(r -> {
            if (r.checks() != null) {
                assertThat(r.checks().after().percentile()).as(r.name()).isNull();
            }
        });
        verifiesIntact("signoff-v2-demo.xlsx", study);
    }

    /**
     * Schema 3, written by the build before subgroup charts existed (commit 083a4c9) for an invented press-transfer
     * study with a subgroup column and day.month.year time stamps: it is read as method generation 3, so its control
     * charts stay individuals charts in the sequence column's text order, and its workbook still verifies.
     */
    @Test
    void schemaVersionThreeKeepsItsIndividualsChartsAndItsWorkbookStillVerifies() throws Exception {
        Path file = resource("study-v3-clip.json");
        JsonNode stored = StudyFiles.tree(Files.readString(file));
        assertThat(stored.path("schemaVersion").asInt()).isEqualTo(3);
        ChangeStudy study = StudyFiles.read(file);
        assertThat(study.settings().methods()).isEqualTo(3);
        assertThat(study.data().characteristics().get(0).before().hasSubgroups()).isTrue();
        StudyResult again = reComputesToItsStoredVerdicts(study, stored);
        again.characteristics().forEach(r -> {
            assertThat(r.checks().stability().kind()).as(r.name())
                    .isEqualTo(org.holdpoint.stats.ControlChart.Kind.INDIVIDUALS);
            assertThat(r.notes()).noneMatch(n -> n.contains("control limits rest on"));
        });
        verifiesIntact("signoff-v3-clip.xlsx", study);
        // the same study with the current methods charts the subgroups
        var current = new org.holdpoint.study.AnalysisSettings(study.settings().alpha(), false, false,
                study.settings().defaults(), study.settings().perCharacteristic(), study.settings().overrides(),
                study.settings().exclusions());
        StudyResult now = new StudyAnalyzer().analyze(study.data(), current, Progress.NONE);
        assertThat(now.characteristics().get(0).checks().stability().kind())
                .isEqualTo(org.holdpoint.stats.ControlChart.Kind.MEANS);
    }
}
