package org.holdpoint.importer;

import java.io.IOException;
import java.nio.file.Path;

/** The SHA-256 of an input file, with the importer's message when it cannot be read. */
final class Sha256 {
    private Sha256() {
    }

    /**
     * @param path the file
     * @param name its name for messages
     * @return 64 lower-case hex digits
     */
    static String of(Path path, String name) {
        try {
            return org.holdpoint.files.Sha256.ofFile(path);
        } catch (IOException e) {
            throw new ImportException(e, "file %s cannot be read (%s); check that it exists and is readable", name,
                    e.getMessage());
        }
    }
}
