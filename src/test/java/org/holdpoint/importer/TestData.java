package org.holdpoint.importer;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.GroupData;

/** Small helpers for the importer tests. */
final class TestData {
    private TestData() {
    }

    static Path write(Path dir, String name, String text) {
        try {
            return Files.writeString(dir.resolve(name), text, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static Path write(Path dir, String name, byte[] bytes) {
        try {
            return Files.write(dir.resolve(name), bytes);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static Dataset read(ImportRequest r) {
        return new DataImporter().read(r);
    }

    static Dataset read(Path file) {
        return read(ImportRequest.of(file));
    }

    static double[] values(GroupData g) {
        return g.sample().values();
    }

    static CharacteristicData only(Dataset d) {
        if (d.characteristics().size() != 1) {
            throw new AssertionError("expected one characteristic, got " + d.characteristics().size());
        }
        return d.characteristics().get(0);
    }

    static CharacteristicData named(Dataset d, String name) {
        return d.characteristics().stream().filter(c -> c.name().equals(name)).findFirst()
                .orElseThrow(() -> new AssertionError("no characteristic " + name + " in "
                        + d.characteristics().stream().map(CharacteristicData::name).toList()));
    }
}
