package org.holdpoint.importer;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;

/** The kind of an input file, told by its first bytes (not by its name). */
enum FileKind {
    /** A zip container: an Office Open XML workbook (.xlsx, .xlsm). */
    ZIP,
    /** An OLE2 compound document: a binary workbook (.xls) or an encrypted workbook. */
    OLE2,
    /** Anything else: read as delimited text. */
    TEXT;

    /**
     * Checks that the path is a readable, non-empty regular file and tells its kind.
     *
     * @param path the file
     * @param name its name for messages
     * @return the kind
     * @throws ImportException when the file is missing, a directory, unreadable, empty, or a PDF
     */
    static FileKind sniff(Path path, String name) {
        if (Files.isDirectory(path)) {
            throw new ImportException("%s is a folder, not a file; give the path of the data file", name);
        }
        if (!Files.exists(path)) {
            throw new ImportException("file %s was not found; check the path and the spelling", name);
        }
        if (!Files.isRegularFile(path)) {
            // a device (/dev/zero), a named pipe or a socket would be read for ever
            throw new ImportException("%s is not a regular file (a device, pipe or socket); save the data to a file "
                    + "and give its path", name);
        }
        byte[] head;
        try (InputStream in = Files.newInputStream(path)) {
            head = in.readNBytes(8);
        } catch (AccessDeniedException e) {
            throw new ImportException(e, "file %s cannot be read: permission denied. Ask for read access or copy the "
                    + "file to a folder of your own", name);
        } catch (NoSuchFileException e) {
            throw new ImportException(e, "file %s was not found; check the path and the spelling", name);
        } catch (IOException e) {
            throw new ImportException(e, "file %s cannot be read (%s); close any program that holds it locked and "
                    + "check the permissions", name, e.getMessage());
        }
        if (head.length == 0) {
            throw new ImportException("file %s is empty (0 bytes); export the data again", name);
        }
        if (head.length >= 4 && head[0] == 'P' && head[1] == 'K' && (head[2] == 3 || head[2] == 5 || head[2] == 7)) {
            return ZIP;
        }
        if (head.length >= 8 && (head[0] & 0xff) == 0xD0 && (head[1] & 0xff) == 0xCF && (head[2] & 0xff) == 0x11
                && (head[3] & 0xff) == 0xE0 && (head[4] & 0xff) == 0xA1 && (head[5] & 0xff) == 0xB1
                && (head[6] & 0xff) == 0x1A && (head[7] & 0xff) == 0xE1) {
            return OLE2;
        }
        if (head.length >= 4 && head[0] == '%' && head[1] == 'P' && head[2] == 'D' && head[3] == 'F') {
            throw new ImportException("file %s is a PDF document, not a spreadsheet or text file. Export the data from "
                    + "its source as .xlsx, .xls or .csv", name);
        }
        return TEXT;
    }
}
