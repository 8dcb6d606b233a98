package org.holdpoint.importer;

import java.nio.ByteBuffer;
import java.nio.charset.CharacterCodingException;
import java.nio.charset.Charset;
import java.nio.charset.CodingErrorAction;
import java.nio.charset.StandardCharsets;

/**
 * The encoding of a text file as people's tools write it: UTF-8 with or without a byte-order mark,
 * UTF-16 with a byte-order mark (or without one, recognised by its NUL bytes), or Windows-1252 (the code page of most office exports in Western
 * Europe and the Americas) when the bytes are not valid UTF-8. Data files and settings files are
 * read by this one routine, so a file that imports as data also reads as settings
 * (docs/import.md, "Text files").
 */
final class TextEncoding {

    /** Windows-1252, the fallback for bytes that are not UTF-8. */
    static final Charset WINDOWS_1252 = Charset.forName("windows-1252");

    private TextEncoding() {
    }

    /**
     * What the first bytes of a file say.
     *
     * @param charset the encoding
     * @param bom     the length of the byte-order mark to skip (0 when none)
     */
    record Detected(Charset charset, int bom) {
    }

    /**
     * Detects the encoding from the first bytes of a file (a sample cut at a line end).
     *
     * @param head the first bytes
     * @param name the file name for messages
     * @return the encoding and the byte-order mark length
     * @throws ImportException when the bytes hold a NUL without a UTF-16 byte-order mark (not text)
     */
    static Detected detect(byte[] head, String name) {
        if (head.length >= 3 && (head[0] & 0xff) == 0xEF && (head[1] & 0xff) == 0xBB && (head[2] & 0xff) == 0xBF) {
            return new Detected(StandardCharsets.UTF_8, 3);
        }
        if (head.length >= 2 && (head[0] & 0xff) == 0xFF && (head[1] & 0xff) == 0xFE) {
            return new Detected(StandardCharsets.UTF_16LE, 2);
        }
        if (head.length >= 2 && (head[0] & 0xff) == 0xFE && (head[1] & 0xff) == 0xFF) {
            return new Detected(StandardCharsets.UTF_16BE, 2);
        }
        Charset utf16 = utf16WithoutMark(head);
        if (utf16 != null) {
            return new Detected(utf16, 0);
        }
        for (byte b : head) {
            if (b == 0) {
                throw new ImportException("file %s is not a text file (it holds binary data) and not a workbook "
                        + "either. Export the data as .xlsx, .xls or .csv and try again", name);
            }
        }
        return new Detected(validUtf8(head) ? StandardCharsets.UTF_8 : WINDOWS_1252, 0);
    }

    /**
     * Decodes a whole (small) file: detection over all its bytes, the byte-order mark dropped.
     *
     * @param bytes the file's bytes
     * @param name  the file name for messages
     * @return the text and the encoding found
     */
    static Decoded decode(byte[] bytes, String name) {
        Detected d = detect(bytes, name);
        return new Decoded(new String(bytes, d.bom(), bytes.length - d.bom(), d.charset()), d.charset());
    }

    /**
     * A decoded file.
     *
     * @param text    the text without byte-order mark
     * @param charset the encoding it was read with
     */
    record Decoded(String text, Charset charset) {
    }

    /**
     * UTF-16 written without a byte-order mark: text of Latin letters and digits has a NUL in every
     * other byte (odd bytes for little-endian, even for big-endian) and almost none in the others.
     *
     * @param head the first bytes
     * @return the UTF-16 variant, or null when the bytes do not look like it
     */
    private static Charset utf16WithoutMark(byte[] head) {
        int pairs = head.length / 2;
        if (pairs < 2) {
            return null;
        }
        int evenNul = 0;
        int oddNul = 0;
        for (int i = 0; i + 1 < head.length; i += 2) {
            evenNul += head[i] == 0 ? 1 : 0;
            oddNul += head[i + 1] == 0 ? 1 : 0;
        }
        if (oddNul >= 0.9 * pairs && evenNul <= 0.02 * pairs) {
            return StandardCharsets.UTF_16LE;
        }
        if (evenNul >= 0.9 * pairs && oddNul <= 0.02 * pairs) {
            return StandardCharsets.UTF_16BE;
        }
        return null;
    }

    static boolean validUtf8(byte[] b) {
        try {
            StandardCharsets.UTF_8.newDecoder().onMalformedInput(CodingErrorAction.REPORT)
                    .onUnmappableCharacter(CodingErrorAction.REPORT).decode(ByteBuffer.wrap(b));
            return true;
        } catch (CharacterCodingException e) {
            return false;
        }
    }
}
