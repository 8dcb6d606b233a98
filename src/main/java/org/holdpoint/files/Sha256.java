package org.holdpoint.files;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.security.MessageDigest;
import java.security.NoSuchAlgorithmException;
import java.util.HexFormat;

/** SHA-256 (FIPS 180-4) as 64 lower-case hex digits: the one hash helper of the program. */
public final class Sha256 {
    private Sha256() {
    }

    private static MessageDigest digest() {
        try {
            return MessageDigest.getInstance("SHA-256");
        } catch (NoSuchAlgorithmException e) {
            throw new IllegalStateException("SHA-256 is required of every Java platform", e);
        }
    }

    /**
     * @param bytes the bytes
     * @return their hash
     */
    public static String of(byte[] bytes) {
        return HexFormat.of().formatHex(digest().digest(bytes));
    }

    /**
     * @param text a text
     * @return the hash of its UTF-8 bytes
     */
    public static String ofText(String text) {
        return of(text.getBytes(StandardCharsets.UTF_8));
    }

    /**
     * The hash of a file's bytes, read in blocks (a file of any size).
     *
     * @param file the file
     * @return its hash
     * @throws IOException when it cannot be read
     */
    public static String ofFile(Path file) throws IOException {
        MessageDigest md = digest();
        try (InputStream in = Files.newInputStream(file)) {
            byte[] buf = new byte[1 << 16];
            int n;
            while ((n = in.read(buf)) > 0) {
                md.update(buf, 0, n);
            }
        }
        return HexFormat.of().formatHex(md.digest());
    }
}
