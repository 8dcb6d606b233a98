package org.holdpoint.workflow;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Map;
import org.holdpoint.stats.Sample;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.ChangeDescription;
import org.holdpoint.study.ChangeKind;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.Exclusion;
import org.holdpoint.study.GroupData;
import org.holdpoint.study.ImportReport;
import org.holdpoint.study.InputInfo;
import org.holdpoint.study.Layout;
import org.holdpoint.study.MarginSpec;
import org.holdpoint.study.Progress;
import org.holdpoint.study.Signature;
import org.holdpoint.study.SpecLimits;
import org.holdpoint.result.StudyResult;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** The study file keeps everything needed to re-compute a study, and only readable versions are read. */
class StudyFilesTest {

    static ChangeStudy study() {
        // NIST StRD NumAcc4-like values: a large offset with small decimal steps, where exact decimals matter
        Sample before = Sample.ofDecimals("10000000.2", "10000000.1", "10000000.3", "10000000.1", "10000000.3");
        Sample after = Sample.ofDecimals("10000000.25", "10000000.15", "10000000.35", "10000000.2", "10000000.3");
        CharacteristicData c = new CharacteristicData("Shaft length", "mm",
                new GroupData(before, "b.csv", null, new int[] {2, 3, 4, 5, 6}, new int[] {2, 2, 2, 2, 2},
                        new String[] {"u1", "u2", "u3", "u4", "u5"}, null, null, null),
                GroupData.typed(after, "a.csv"), false, List.of());
        Dataset data = new Dataset(List.of(c), List.of(new InputInfo("b.csv", "ab12", null, Layout.STACKED, "data")),
                new ImportReport(10, Map.of(), List.of(), List.of("layout detected: stacked")));
        CharacteristicSettings s = new CharacteristicSettings("mm", new SpecLimits(9999999.0, null, 10000001.0),
                new MarginSpec(MarginSpec.Kind.PERCENT_OF_TOLERANCE, 10.0, 10.0), 1.5, null, null);
        AnalysisSettings settings = new AnalysisSettings(0.05, false, false, null, Map.of("Shaft length", s), null,
                List.of(new Exclusion(null, "B9", "not in data")));
        return new ChangeStudy(new ChangeDescription("CR-1", "New saw blade", ChangeKind.TOOLING, "P-1", "B",
                "wear", "me", "2026-11-30", "2026-12-01"), data, settings,
                List.of(new Signature(Signature.Stage.PREPARED, "A. Engineer", "process engineer", "prepared",
                        "2026-12-01T10:00:00Z")));
    }

    @Test
    void roundTripKeepsTheValuesTheSettingsAndTheCanonicalHash(@TempDir Path dir) throws Exception {
        ChangeStudy study = study();
        StudyResult result = new StudyAnalyzer().analyze(study.data(), study.settings(), Progress.NONE);
        Path file = dir.resolve("study.json");
        StudyFiles.write(study, result, file);
        ChangeStudy back = StudyFiles.read(file);
        assertThat(back.change()).isEqualTo(study.change());
        assertThat(back.signatures()).isEqualTo(study.signatures());
        assertThat(back.settings()).isEqualTo(study.settings());
        CharacteristicData c = back.data().characteristics().get(0);
        assertThat(c.before().sample().values()).containsExactly(study.data().characteristics().get(0).before()
                .sample().values());
        assertThat(c.before().sample().hasExactDecimals()).isTrue();
        assertThat(c.before().origin(0).cell()).isEqualTo("B2");
        assertThat(c.before().unit(4)).isEqualTo("u5");
        // re-computation from the file gives the same numbers, to the last bit
        StudyResult again = new StudyAnalyzer().analyze(back.data(), back.settings(), Progress.NONE);
        assertThat(again.characteristics().get(0).welch()).isEqualTo(result.characteristics().get(0).welch());
        assertThat(StudyFiles.sha256(StudyFiles.canonical(StudyFiles.toJson(back, again))))
                .isEqualTo(StudyFiles.sha256(StudyFiles.canonical(StudyFiles.toJson(study, result))));
    }

    @Test
    void aFileOfANewerSchemaOrNotAStudyIsRefusedWithTheReason(@TempDir Path dir) throws Exception {
        Path newer = dir.resolve("newer.json");
        Files.writeString(newer, "{\"schemaVersion\": 99}", StandardCharsets.UTF_8);
        assertThatThrownBy(() -> StudyFiles.read(newer)).isInstanceOf(StudyFileException.class)
                .hasMessageContaining("schema version 99");
        Path other = dir.resolve("other.json");
        Files.writeString(other, "[1,2]", StandardCharsets.UTF_8);
        assertThatThrownBy(() -> StudyFiles.read(other)).hasMessageContaining("not a Holdpoint study file");
    }

    /**
     * The criteria have one spelling: the study file's per-characteristic criteria, copied into a JSON
     * settings file as they are, read back as the same criteria (docs/settings-file.md,
     * docs/study-file.md); every kind of margin and an exclusion's group survive the round trip.
     */
    @Test
    void criteriaAreSpelledAsInASettingsFileAndSurviveTheRoundTrip(@TempDir Path dir) throws Exception {
        ChangeStudy base = study();
        Map<String, CharacteristicSettings> per = new java.util.LinkedHashMap<>();
        per.put("Shaft length", new CharacteristicSettings("mm", new SpecLimits(9999999.0, 10000000.0, 10000001.0),
                new MarginSpec(MarginSpec.Kind.ABSOLUTE, -0.25, 0.25), 1.3, 1.33, false));
        per.put("Flatness", new CharacteristicSettings("mm", new SpecLimits(null, null, 0.05),
                new MarginSpec(MarginSpec.Kind.ABSOLUTE, null, 0.02), null, 1.0, null,
                org.holdpoint.study.DistributionSetting.WEIBULL));
        per.put("Bore", new CharacteristicSettings(null, new SpecLimits(11.99, null, 12.01),
                new MarginSpec(MarginSpec.Kind.PERCENT_OF_TOLERANCE, 5.0, 12.5), 1.2, null, true));
        per.put("Web", new CharacteristicSettings(null, new SpecLimits(2.0, null, 3.0),
                new MarginSpec(MarginSpec.Kind.PERCENT_OF_TOLERANCE, 10.0, 10.0), null, null, null));
        per.put("Burr", new CharacteristicSettings(null, new SpecLimits(null, null, 0.1),
                new MarginSpec(MarginSpec.Kind.ABSOLUTE, -0.01, 0.03), null, null, null,
                org.holdpoint.study.DistributionSetting.AUTO));
        CharacteristicSettings defaults = new CharacteristicSettings(null, new SpecLimits(null, null, null),
                new MarginSpec(MarginSpec.Kind.PERCENT_OF_TOLERANCE, 10.0, 10.0), 1.5, null, null);
        AnalysisSettings settings = new AnalysisSettings(0.05, false, false, defaults, per, null,
                List.of(new Exclusion("Shaft length", Exclusion.Group.AFTER, "B3", "gauge dropped"),
                        new Exclusion(null, null, "Data!C4", "typed twice")));
        ChangeStudy study = new ChangeStudy(base.change(), base.data(), settings, base.signatures());
        StudyResult result = new StudyAnalyzer().analyze(study.data(), study.settings(), Progress.NONE);
        Path file = dir.resolve("study.json");
        StudyFiles.write(study, result, file);
        ChangeStudy back = StudyFiles.read(file);
        assertThat(back.settings()).isEqualTo(settings);
        com.fasterxml.jackson.databind.JsonNode tree = StudyFiles.tree(Files.readString(file));
        assertThat(tree.path("schemaVersion").asInt()).isEqualTo(StudyFiles.SCHEMA_VERSION);
        com.fasterxml.jackson.databind.JsonNode saved = tree.path("settings");
        assertThat(saved.path("perCharacteristic").path("Shaft length").path("margin").asDouble()).isEqualTo(0.25);
        assertThat(saved.path("perCharacteristic").path("Web").path("margin_percent").asDouble()).isEqualTo(10);
        assertThat(saved.path("perCharacteristic").path("Burr").path("margin_lower").asDouble()).isEqualTo(-0.01);
        // the distribution is spelled as in a settings file
        assertThat(saved.path("perCharacteristic").path("Flatness").path("distribution").asText()).isEqualTo("weibull");
        assertThat(saved.path("perCharacteristic").path("Burr").path("distribution").asText()).isEqualTo("auto");
        assertThat(saved.path("exclusions").get(0).path("group").asText()).isEqualTo("after");
        // the same objects as a settings file, read by the settings reader
        com.fasterxml.jackson.databind.node.ObjectNode asSettings =
                com.fasterxml.jackson.databind.node.JsonNodeFactory.instance.objectNode();
        asSettings.set("defaults", saved.path("defaults"));
        asSettings.set("characteristics", saved.path("perCharacteristic"));
        Path settingsFile = Files.writeString(dir.resolve("criteria.json"), asSettings.toString(),
                StandardCharsets.UTF_8);
        Map<String, CharacteristicSettings> read = new org.holdpoint.importer.SettingsReader().read(settingsFile);
        assertThat(read.remove(org.holdpoint.importer.SettingsReader.DEFAULTS)).isEqualTo(defaults);
        assertThat(read).isEqualTo(per);
    }
}
