package org.holdpoint.workflow;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.function.Consumer;
import java.util.stream.Stream;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.study.Progress;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

/**
 * A study file changed outside the program is refused with the JSON path of what is wrong, never read
 * with a default (a text value must not become 0.0) and never an internal error (docs/study-file.md,
 * "Validation"). Each case edits one thing of a valid file written by the program.
 */
class HostileStudyFilesTest {
    private static final ObjectMapper M = new ObjectMapper();
    @TempDir
    Path dir;
    ObjectNode valid;

    @BeforeEach
    void write() throws Exception {
        ChangeStudy study = ReportFixtures.study();
        Path f = dir.resolve("valid.json");
        StudyFiles.write(study, new StudyAnalyzer().analyze(study.data(), study.settings(), Progress.NONE), f);
        valid = (ObjectNode) M.readTree(f.toFile());
        assertThat(StudyFiles.read(f).data().characteristics()).isNotEmpty();
    }

    private static ObjectNode before(ObjectNode root, int c) {
        return (ObjectNode) root.path("characteristics").get(c).get("before");
    }

    static Stream<Arguments> edits() {
        return Stream.of(
                Arguments.of("a value that is text", (Consumer<ObjectNode>) r -> ((ArrayNode) before(r, 1)
                        .get("values")).set(2, M.getNodeFactory().textNode("abc")),
                        "characteristics[1].before.values[2]: \"abc\" is not a number"),
                Arguments.of("a value too large", (Consumer<ObjectNode>) r -> ((ArrayNode) before(r, 0).get("values"))
                        .set(0, M.getNodeFactory().numberNode(new java.math.BigDecimal("1e400"))),
                        "characteristics[0].before.values[0]: 1E+400 is too large"),
                Arguments.of("a negative row", (Consumer<ObjectNode>) r -> ((ArrayNode) before(r, 0).get("rows"))
                        .set(1, M.getNodeFactory().numberNode(-3)), "characteristics[0].before.rows[1]: -3 is not a row"),
                Arguments.of("rows shorter than values", (Consumer<ObjectNode>) r -> ((ArrayNode) before(r, 0)
                        .get("rows")).remove(0), "characteristics[0].before.rows: has"),
                Arguments.of("no values", (Consumer<ObjectNode>) r -> before(r, 2).remove("values"),
                        "characteristics[2].before.values: is missing"),
                Arguments.of("an unknown stage", (Consumer<ObjectNode>) r -> {
                    ObjectNode g = ((ArrayNode) r.get("signatures")).addObject();
                    g.put("stage", "RELEASED");
                    g.put("name", "X");
                }, "signatures[0].stage: \"RELEASED\" is not one of"),
                Arguments.of("a name that is a number", (Consumer<ObjectNode>) r -> ((ObjectNode) r.path(
                        "characteristics").get(0)).put("name", 7), "characteristics[0].name: 7 is not a text"),
                Arguments.of("settings as a list", (Consumer<ObjectNode>) r -> r.putArray("settings"),
                        "settings: [] is not an object"),
                Arguments.of("alpha out of range", (Consumer<ObjectNode>) r -> ((ObjectNode) r.get("settings"))
                        .put("alpha", 7), "settings.alpha: 7 is not a level"),
                Arguments.of("an exclusion group", (Consumer<ObjectNode>) r -> {
                    ObjectNode x = ((ArrayNode) r.path("settings").get("exclusions")).addObject();
                    x.put("cell", "B3");
                    x.put("reason", "r");
                    x.put("group", "during");
                }, "group: \"during\" is not one of"));
    }

    private Path edited(Consumer<ObjectNode> edit) throws java.io.IOException {
        ObjectNode root = valid.deepCopy();
        edit.accept(root);
        return Files.writeString(dir.resolve("edited.json"), root.toString(), StandardCharsets.UTF_8);
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("edits")
    void isRefusedWithItsPath(String name, Consumer<ObjectNode> edit, String message) throws Exception {
        Path f = edited(edit);
        assertThatThrownBy(() -> StudyFiles.read(f)).as(name).isInstanceOf(StudyFileException.class)
                .hasMessageContaining(message).hasMessageContaining("edited.json");
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("edits")
    void isRefusedByTheCommandsWithExitTwo(String name, Consumer<ObjectNode> edit, String message) throws Exception {
        Path f = edited(edit);
        String url = "jdbc:h2:file:" + dir.resolve("a").toAbsolutePath() + "/db";
        String[] args = {"archive", "add", f.toString(), "--archive", url};
        var cl = org.holdpoint.Holdpoint.commandLine(org.holdpoint.workflow.WindowLauncher.NONE, args);
        java.io.StringWriter err = new java.io.StringWriter();
        cl.setErr(new java.io.PrintWriter(err, true));
        cl.setOut(new java.io.PrintWriter(new java.io.StringWriter(), true));
        int code = cl.execute(args);
        assertThat(code).as(name + ": " + err).isEqualTo(2);
        assertThat(err.toString()).contains(message);
    }
}
