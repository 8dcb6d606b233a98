package org.holdpoint.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import java.io.IOException;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/** Writes output files atomically: a temporary file in the same folder, then a rename over the target. */
final class AtomicFiles {
    private static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

    private AtomicFiles() {
    }

    /**
     * Writes {@code value} as JSON (Jackson; doubles in full precision, shortest round-trip form).
     *
     * @param target the file to create or replace
     * @param value  maps, lists, strings and numbers
     * @throws IOException if the folder is missing or not writable
     */
    static void writeJson(Path target, Object value) throws IOException {
        write(target, MAPPER.writeValueAsBytes(value));
    }

    /**
     * Writes bytes to a temporary file beside the target and moves it into place with ATOMIC_MOVE, so
     * a reader never sees a half-written file; the temporary file is removed on failure.
     *
     * @param target the file to create or replace
     * @param bytes  the content
     * @throws IOException if writing or moving fails
     */
    static void write(Path target, byte[] bytes) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path folder = absolute.getParent();
        Path temp = Files.createTempFile(folder, "." + absolute.getFileName() + ".", ".tmp");
        try {
            Files.write(temp, bytes);
            try {
                Files.move(temp, absolute, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(temp, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(temp);
        }
    }
}
