package org.holdpoint.importer;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Map;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import java.util.zip.ZipOutputStream;
import org.apache.poi.poifs.crypt.EncryptionInfo;
import org.apache.poi.poifs.crypt.EncryptionMode;
import org.apache.poi.poifs.crypt.Encryptor;
import org.apache.poi.poifs.filesystem.POIFSFileSystem;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/** Builders of damaged and hostile inputs for the bad-file corpus and the fuzz test. */
final class BadFiles {
    private BadFiles() {
    }

    /** The entries of a zip archive, in order. */
    static Map<String, byte[]> unzip(byte[] zip) {
        Map<String, byte[]> m = new LinkedHashMap<>();
        try (ZipInputStream in = new ZipInputStream(new ByteArrayInputStream(zip))) {
            ZipEntry e;
            while ((e = in.getNextEntry()) != null) {
                m.put(e.getName(), in.readAllBytes());
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return m;
    }

    /** A zip archive of the given entries (deflated). */
    static byte[] zip(Map<String, byte[]> entries) {
        ByteArrayOutputStream bos = new ByteArrayOutputStream();
        try (ZipOutputStream out = new ZipOutputStream(bos)) {
            for (Map.Entry<String, byte[]> e : entries.entrySet()) {
                out.putNextEntry(new ZipEntry(e.getKey()));
                out.write(e.getValue());
                out.closeEntry();
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return bos.toByteArray();
    }

    /** A valid workbook whose sheet part is padded with megabytes of blanks: it inflates over 1000-fold. */
    static byte[] zipBomb(byte[] validXlsx) {
        Map<String, byte[]> m = unzip(validXlsx);
        String sheet = new String(m.get("xl/worksheets/sheet1.xml"), StandardCharsets.UTF_8);
        int at = sheet.indexOf("<sheetData>") + "<sheetData>".length();
        String padded = sheet.substring(0, at) + " ".repeat(30_000_000) + sheet.substring(at);
        m.put("xl/worksheets/sheet1.xml", padded.getBytes(StandardCharsets.UTF_8));
        return zip(m);
    }

    /** The workbook encrypted with a password (agile encryption, as current spreadsheet programs write it). */
    static byte[] encrypted(XSSFWorkbook wb, String password) {
        try (POIFSFileSystem fs = new POIFSFileSystem(); wb) {
            EncryptionInfo info = new EncryptionInfo(EncryptionMode.agile);
            Encryptor enc = info.getEncryptor();
            enc.confirmPassword(password);
            try (OutputStream os = enc.getDataStream(fs)) {
                wb.write(os);
            }
            ByteArrayOutputStream bos = new ByteArrayOutputStream();
            fs.writeFilesystem(bos);
            return bos.toByteArray();
        } catch (IOException | java.security.GeneralSecurityException e) {
            throw new IllegalStateException(e);
        }
    }

    /** An OLE2 compound document that holds no workbook (as a word processor's file would). */
    static byte[] oleWithoutWorkbook() {
        try (POIFSFileSystem fs = new POIFSFileSystem()) {
            fs.createDocument(new ByteArrayInputStream("not a workbook".getBytes(StandardCharsets.US_ASCII)),
                    "WordDocument");
            ByteArrayOutputStream bos = new ByteArrayOutputStream();
            fs.writeFilesystem(bos);
            return bos.toByteArray();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    static byte[] bytes(Path p) {
        try {
            return Files.readAllBytes(p);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
