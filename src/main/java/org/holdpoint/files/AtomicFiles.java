package org.holdpoint.files;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;

/**
 * Writes output files atomically: into a temporary file in the target's folder, then one move, so a
 * reader never sees a half-written file and a failure leaves nothing behind. The temporary file is
 * created as any new file is, so the output gets the permissions the user's umask gives (a workbook in
 * a shared folder can be read by the others); only a private key is created readable by its owner
 * alone.
 */
public final class AtomicFiles {
    private AtomicFiles() {
    }

    /** Writes the content of an output stream. */
    @FunctionalInterface
    public interface Writer {
        /**
         * @param out the stream to write to
         * @throws IOException on failure
         */
        void write(OutputStream out) throws IOException;
    }

    /**
     * Writes text (UTF-8) atomically, replacing an existing file.
     *
     * @param target the file
     * @param text   the content
     * @throws IOException when it cannot be written (nothing is left behind)
     */
    public static void writeText(Path target, String text) throws IOException {
        write(target, true, out -> out.write(text.getBytes(StandardCharsets.UTF_8)));
    }

    /**
     * Writes bytes atomically, replacing an existing file.
     *
     * @param target the file
     * @param bytes  the content
     * @throws IOException when it cannot be written (nothing is left behind)
     */
    public static void writeBytes(Path target, byte[] bytes) throws IOException {
        write(target, true, out -> out.write(bytes));
    }

    /**
     * Writes a file atomically.
     *
     * @param target    the file
     * @param overwrite whether an existing file may be replaced
     * @param writer    produces the content
     * @throws IOException when it cannot be written (nothing is left behind)
     */
    public static void write(Path target, boolean overwrite, Writer writer) throws IOException {
        write(target, overwrite, false, writer);
    }

    /**
     * Writes a file readable and writable by its owner only (a private key), atomically.
     *
     * @param target    the file
     * @param writer    produces the content
     * @throws IOException when it cannot be written or exists (nothing is left behind)
     */
    public static void writePrivate(Path target, Writer writer) throws IOException {
        write(target, false, true, writer);
    }

    private static final java.security.SecureRandom RANDOM = new java.security.SecureRandom();

    /** Temporary files being written now: removed by a shutdown hook when the program is stopped. */
    private static final java.util.Set<Path> PENDING = java.util.concurrent.ConcurrentHashMap.newKeySet();

    static {
        // Ctrl+C or a plain kill (SIGTERM) runs shutdown hooks: no hidden .part file is left behind. A
        // kill -9 cannot be caught (README, "Outputs" says what it may leave).
        Runtime.getRuntime().addShutdownHook(new Thread(() -> {
            for (Path p : PENDING) {
                try {
                    Files.deleteIfExists(p);
                } catch (IOException e) {
                    System.err.println("holdpoint: could not remove the unfinished file " + p + " (" + e.getMessage()
                            + "); delete it by hand");
                }
            }
        }, "holdpoint-cleanup"));
    }

    private static void write(Path target, boolean overwrite, boolean ownerOnly, Writer writer) throws IOException {
        Path abs = target.toAbsolutePath();
        Path dir = abs.getParent();
        if (!overwrite && Files.exists(abs)) {
            throw new FileAlreadyExistsException(abs.toString(), null, "exists; use --overwrite to replace it");
        }
        if (dir != null) {
            Files.createDirectories(dir);
        }
        // a plain new file, not createTempFile: its owner-only permissions would survive the move
        Path tmp = (dir == null ? Path.of("") : dir).resolve("." + abs.getFileName() + "."
                + Long.toHexString(RANDOM.nextLong() & Long.MAX_VALUE) + ".part");
        PENDING.add(tmp);
        try {
            java.util.Set<java.nio.file.OpenOption> options = java.util.Set.of(
                    java.nio.file.StandardOpenOption.CREATE_NEW, java.nio.file.StandardOpenOption.WRITE);
            java.nio.channels.SeekableByteChannel ch;
            if (ownerOnly && tmp.getFileSystem().supportedFileAttributeViews().contains("posix")) {
                ch = Files.newByteChannel(tmp, options, java.nio.file.attribute.PosixFilePermissions.asFileAttribute(
                        java.nio.file.attribute.PosixFilePermissions.fromString("rw-------")));
            } else {
                ch = Files.newByteChannel(tmp, options);
            }
            try (OutputStream out = java.nio.channels.Channels.newOutputStream(ch)) {
                writer.write(out);
            }
            try {
                Files.move(tmp, abs, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException e) {
                Files.move(tmp, abs, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(tmp);
            PENDING.remove(tmp);
        }
    }
}
