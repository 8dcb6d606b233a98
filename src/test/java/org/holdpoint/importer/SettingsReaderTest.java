package org.holdpoint.importer;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.holdpoint.importer.TestData.write;

import java.nio.file.Path;
import java.util.Map;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.MarginSpec;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

class SettingsReaderTest {
    @TempDir
    Path dir;

    @Test
    void csvWithEveryColumn() {
        Path f = write(dir, "trial.settings.csv", "# settings of trial 7\n"
                + "characteristic,unit,lsl,nominal,usl,margin,margin_lower,margin_upper,margin_percent,sd_growth_limit,"
                + "capability_min,paired\n"
                + "*,,,,,,,,10,1.25,1.33,\n"
                + "Bore,mm,9.95,10,10.05,0.01,,,,,,no\n"
                + "wall,mm,1.9,,2.1,,-0.02,0.03,,,,\n"
                + "torque,Nm,,,,,,0.5,,1.5,,yes\n");
        Map<String, CharacteristicSettings> m = new SettingsReader().read(f);
        assertThat(m.keySet()).containsExactly("*", "Bore", "wall", "torque");
        CharacteristicSettings bore = m.get("Bore");
        assertThat(bore.unit()).isEqualTo("mm");
        assertThat(bore.spec().lsl()).isEqualTo(9.95);
        assertThat(bore.spec().nominal()).isEqualTo(10.0);
        assertThat(bore.spec().usl()).isEqualTo(10.05);
        assertThat(bore.margin()).isEqualTo(new MarginSpec(MarginSpec.Kind.ABSOLUTE, -0.01, 0.01));
        assertThat(bore.paired()).isFalse();
        assertThat(m.get("wall").margin()).isEqualTo(new MarginSpec(MarginSpec.Kind.ABSOLUTE, -0.02, 0.03));
        assertThat(m.get("torque").margin()).isEqualTo(new MarginSpec(MarginSpec.Kind.ABSOLUTE, null, 0.5));
        assertThat(m.get("torque").paired()).isTrue();
        CharacteristicSettings defaults = m.get(SettingsReader.DEFAULTS);
        assertThat(defaults.margin()).isEqualTo(new MarginSpec(MarginSpec.Kind.PERCENT_OF_TOLERANCE, 10.0, 10.0));
        assertThat(defaults.sdGrowthLimit()).isEqualTo(1.25);
        assertThat(defaults.capabilityRequirement()).isEqualTo(1.33);
    }

    @Test
    void stabilityAndToleranceColumns() {
        Path f = write(dir, "t.settings.csv", "characteristic,usl,require_stability,ti_coverage,ti_confidence\n"
                + "flatness,0.05,yes,0.99,0.95\nbore,10.05,,,\n");
        Map<String, CharacteristicSettings> m = new SettingsReader().read(f);
        assertThat(m.get("flatness").requireStability()).isTrue();
        assertThat(m.get("flatness").tolerance()).isEqualTo(new org.holdpoint.study.ToleranceRequirement(0.99, 0.95));
        assertThat(m.get("bore").tolerance()).isNull();
        assertThat(m.get("bore").requireStability()).isNull();
        // the criteria survive the spelling a study file keeps them in
        CharacteristicSettings back = SettingsReader.fromJson("t", "flatness", SettingsReader.toJson(m.get("flatness")));
        assertThat(back).isEqualTo(m.get("flatness"));
        Path half = write(dir, "h.settings.csv", "characteristic,ti_coverage\nflatness,0.99\n");
        assertThatThrownBy(() -> new SettingsReader().read(half)).hasMessageContaining("column ti_confidence")
                .hasMessageContaining("give both");
        Path bad = write(dir, "b.settings.csv", "characteristic,ti_coverage,ti_confidence\nflatness,99,0.95\n");
        assertThatThrownBy(() -> new SettingsReader().read(bad)).hasMessageContaining("column ti_coverage")
                .hasMessageContaining("between 0 and 1");
    }

    @Test
    void semicolonAndDecimalComma() {
        Path f = write(dir, "s.settings.csv", "characteristic;lsl;usl;margin\nbore;9,95;10,05;0,01\n");
        assertThat(new SettingsReader().read(f).get("bore").spec().usl()).isEqualTo(10.05);
    }

    @Test
    void json() {
        Path f = write(dir, "j.settings.json", "{\"defaults\": {\"margin_percent\": 15},"
                + " \"characteristics\": {\"bore\": {\"unit\": \"mm\", \"lsl\": 9.95, \"usl\": 10.05,"
                + " \"margin_lower\": -0.01, \"margin_upper\": 0.02, \"paired\": true}}}");
        Map<String, CharacteristicSettings> m = new SettingsReader().read(f);
        assertThat(m.get("bore").margin()).isEqualTo(new MarginSpec(MarginSpec.Kind.ABSOLUTE, -0.01, 0.02));
        assertThat(m.get("bore").paired()).isTrue();
        assertThat(m.get("*").margin().kind()).isEqualTo(MarginSpec.Kind.PERCENT_OF_TOLERANCE);
    }

    @Test
    void foundBesideTheDataFile() {
        Path data = write(dir, "trial.xlsx", "x");
        assertThat(SettingsReader.findBeside(data)).isEmpty();
        Path s = write(dir, "trial.settings.json", "{}");
        assertThat(SettingsReader.findBeside(data)).contains(s);
        Path c = write(dir, "trial.settings.csv", "characteristic\n");
        assertThat(SettingsReader.findBeside(data)).contains(c);
    }

    @Test
    void badValuesNameFileLineAndColumn() {
        SettingsReader r = new SettingsReader();
        assertThatThrownBy(() -> r.read(write(dir, "a.csv", "characteristic,lsl\nbore,abc\n")))
                .isInstanceOf(ImportException.class).hasMessageContaining("a.csv, line 2, column lsl")
                .hasMessageContaining("\"abc\" is not a number");
        assertThatThrownBy(() -> r.read(write(dir, "b.csv", "characteristic,lsl,usl\nbore,2,1\n")))
                .isInstanceOf(ImportException.class).hasMessageContaining("column usl")
                .hasMessageContaining("the USL (1) must be above the LSL (2)");
        assertThatThrownBy(() -> r.read(write(dir, "c.csv", "characteristic,margin_lower\nbore,0.1\n")))
                .isInstanceOf(ImportException.class).hasMessageContaining("column margin_lower")
                .hasMessageContaining("must be below 0");
        assertThatThrownBy(() -> r.read(write(dir, "d.csv", "characteristic,margn\nbore,0.1\n")))
                .isInstanceOf(ImportException.class).hasMessageContaining("unknown column \"margn\"");
        assertThatThrownBy(() -> r.read(write(dir, "e.csv", "characteristic,margin,margin_percent\nbore,0.1,5\n")))
                .isInstanceOf(ImportException.class).hasMessageContaining("one way");
        assertThatThrownBy(() -> r.read(write(dir, "f.csv", "characteristic,paired\nbore,maybe\n")))
                .isInstanceOf(ImportException.class).hasMessageContaining("true or false");
        assertThatThrownBy(() -> r.read(write(dir, "g.csv", "characteristic\nbore\nBORE\n")))
                .isInstanceOf(ImportException.class).hasMessageContaining("given twice");
        assertThatThrownBy(() -> r.read(write(dir, "h.json", "{\"characteristics\": {\"bore\": {\"lsl\": \"x\"}}}")))
                .isInstanceOf(ImportException.class).hasMessageContaining("characteristic \"bore\", column lsl");
        assertThatThrownBy(() -> r.read(write(dir, "i.json", "{\"characteristics\": ")))
                .isInstanceOf(ImportException.class).hasMessageContaining("not valid JSON");
        assertThatThrownBy(() -> r.read(dir.resolve("missing.csv"))).isInstanceOf(ImportException.class)
                .hasMessageContaining("not found");
    }
}
