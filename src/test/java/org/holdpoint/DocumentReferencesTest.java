package org.holdpoint;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;

/**
 * Everything the code, the tests and the docs cite is in the repository: a reference to a Markdown
 * document (e.g. "docs/methods.md §3") must name a file that exists here, and no file may cite notes
 * that live outside the project (their names are spelled in pieces below so that this file does not
 * cite them itself).
 */
class DocumentReferencesTest {
    private static final List<String> OUTSIDE = List.of("ALGORITHMS" + ".md", "ALGORITHMS" + " §", "SOURCES" + ".md",
            "DESIGN" + ".md", "STYLE" + ".md", "HELPER-" + "RULES", "RULES" + ".md");
    private static final Pattern MD = Pattern.compile("([A-Za-z0-9_./-]+\\.md)\\b");

    private static List<Path> files() throws IOException {
        List<Path> out = new ArrayList<>();
        for (String root : new String[] {"src", "docs", "templates", ".ci"}) {
            Path r = Path.of(root);
            if (Files.isDirectory(r)) {
                try (Stream<Path> s = Files.walk(r)) {
                    s.filter(Files::isRegularFile).filter(p -> p.toString().matches(".*\\.(java|md|txt|sql|py|R|sh)$"))
                            .forEach(out::add);
                }
            }
        }
        out.add(Path.of("README.md"));
        out.add(Path.of("DEVELOPERS.md"));
        return out;
    }

    @Test
    void nothingCitesNotesOutsideTheRepository() throws IOException {
        List<String> found = new ArrayList<>();
        for (Path f : files()) {
            String text = Files.readString(f);
            for (String name : OUTSIDE) {
                if (text.contains(name)) {
                    found.add(f + ": " + name);
                }
            }
        }
        assertThat(found).isEmpty();
    }

    @Test
    void everyCitedMarkdownDocumentExists() throws IOException {
        List<String> missing = new ArrayList<>();
        for (Path f : files()) {
            Matcher m = MD.matcher(Files.readString(f));
            while (m.find()) {
                String ref = m.group(1);
                if (ref.startsWith("http") || ref.contains("//")) {
                    continue;
                }
                Path p = ref.contains("/") ? Path.of(ref) : f.resolveSibling(ref);
                if (!Files.exists(p) && !Files.exists(Path.of(ref)) && !Files.exists(Path.of("docs", ref))) {
                    missing.add(f + " cites " + ref);
                }
            }
        }
        assertThat(missing).isEmpty();
    }
}
