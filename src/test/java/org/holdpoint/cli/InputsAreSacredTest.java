package org.holdpoint.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Random;
import org.holdpoint.cli.AnalyzeCommandTest.Run;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.condition.EnabledOnOs;
import org.junit.jupiter.api.condition.OS;
import org.junit.jupiter.api.io.TempDir;

/**
 * Outputs never replace inputs, existing outputs are kept without --overwrite, and inputs that are not
 * regular files are refused at once (README, "Outputs"). The files are invented: a stacked CSV of a
 * sealing-face flatness before and after a lapping-plate change.
 */
class InputsAreSacredTest {
    @TempDir
    Path dir;
    Path data;
    Path settings;
    byte[] dataBytes;

    @BeforeEach
    void files() throws Exception {
        StringBuilder sb = new StringBuilder("phase,Face width\n");
        Random rnd = new Random(9);
        for (String phase : new String[] {"before", "after"}) {
            for (int i = 0; i < 12; i++) {
                sb.append(phase).append(',').append(String.format(Locale.ROOT, "%.3f", 6 + 0.01 * rnd.nextGaussian()))
                        .append('\n');
            }
        }
        data = Files.writeString(dir.resolve("lapping.csv"), sb.toString(), StandardCharsets.UTF_8);
        dataBytes = Files.readAllBytes(data);
        settings = Files.writeString(dir.resolve("lapping.settings.csv"), "characteristic,lsl,usl,margin\n"
                + "Face width,5.95,6.05,0.02\n", StandardCharsets.UTF_8);
    }

    private static Run run(String... args) {
        return AnalyzeCommandTest.run(args);
    }

    @Test
    void anOutputThatNamesAnInputIsRefusedBeforeAnythingIsRead() throws Exception {
        for (String option : new String[] {"--json", "--save-study", "--report"}) {
            Run r = run("analyze", data.toString(), option, data.toString(), "--overwrite");
            assertThat(r.code()).as(option).isEqualTo(ExitCodes.BAD_INPUT);
            assertThat(r.err()).as(option).contains(option, "is the data file", "an output never replaces an input");
            assertThat(Files.readAllBytes(data)).as(option).isEqualTo(dataBytes);
        }
        // the settings file found beside the data is an input too, also through another spelling of its path
        Run s = run("analyze", data.toString(), "--json", dir.resolve("sub/../lapping.settings.csv").toString());
        assertThat(s.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(s.err()).contains("is the settings file");
        // a symbolic link to the data is the data
        Path link = Files.createSymbolicLink(dir.resolve("link.json"), data);
        Run l = run("analyze", data.toString(), "--json", link.toString(), "--overwrite");
        assertThat(l.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(Files.readAllBytes(data)).isEqualTo(dataBytes);
        Run two = run("analyze", data.toString(), "--json", dir.resolve("r.json").toString(), "--save-study",
                dir.resolve("r.json").toString());
        assertThat(two.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(two.err()).contains("--json and --save-study name the same file");
        assertThat(dir.resolve("r.json")).doesNotExist();
    }

    @Test
    void anExistingOutputIsKeptWithoutOverwrite() throws Exception {
        Path json = Files.writeString(dir.resolve("result.json"), "kept");
        Path study = Files.writeString(dir.resolve("study.json"), "kept too");
        Run r = run("analyze", data.toString(), "--json", json.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("result.json exists; give --overwrite to replace it");
        assertThat(Files.readString(json)).isEqualTo("kept");
        Run s = run("analyze", data.toString(), "--save-study", study.toString());
        assertThat(s.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(Files.readString(study)).isEqualTo("kept too");
        Run ok = run("analyze", data.toString(), "--json", json.toString(), "--save-study", study.toString(),
                "--overwrite");
        assertThat(ok.code()).as(ok.err()).isZero();
        assertThat(Files.readString(json)).startsWith("{");
        assertThat(Files.readString(study)).startsWith("{");
    }

    @Test
    @EnabledOnOs(OS.LINUX)
    void devicesPipesAndFoldersAreRefusedAtOnce() throws Exception {
        for (String device : new String[] {"/dev/zero", "/dev/urandom"}) {
            Run r = run("analyze", device);
            assertThat(r.code()).as(device).isEqualTo(ExitCodes.BAD_INPUT);
            assertThat(r.err()).as(device).contains(device, "is not a regular file");
        }
        Path fifo = dir.resolve("pipe.csv");
        Process p = new ProcessBuilder("mkfifo", fifo.toString()).inheritIO().start();
        assertThat(p.waitFor()).isZero();
        Run r = run("analyze", fifo.toString());
        assertThat(r.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(r.err()).contains("is not a regular file");
        Run folder = run("analyze", dir.toString());
        assertThat(folder.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(folder.err()).contains("is a folder");
        Run settingsPipe = run("analyze", data.toString(), "--settings", fifo.toString());
        assertThat(settingsPipe.code()).isEqualTo(ExitCodes.BAD_INPUT);
        assertThat(settingsPipe.err()).contains("is not a regular file");
    }
}
