package org.holdpoint.report;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Comparator;
import java.util.stream.Stream;
import org.apache.poi.util.DefaultTempFileCreationStrategy;
import org.apache.poi.util.TempFile;

/**
 * The temporary files of the streaming workbook writer (one per sheet it streams, megabytes for a large
 * raw-data sheet) go into one folder of this process, removed when the workbook is written and, by a
 * shutdown hook, when the program is stopped while writing (README, "Outputs").
 */
final class PoiTempFiles {
    private static Path folder;

    private PoiTempFiles() {
    }

    /** Points the writer's temporary files at this process's folder (once). */
    static synchronized void install() {
        if (folder != null) {
            return;
        }
        try {
            folder = Files.createTempDirectory("holdpoint-");
        } catch (IOException e) {
            throw new ReportException(e, "cannot create a temporary folder for writing the workbook (%s); check that "
                    + "the temporary folder (java.io.tmpdir) exists and is writable", e.getMessage());
        }
        TempFile.setTempFileCreationStrategy(new DefaultTempFileCreationStrategy(folder.toFile()));
        Path f = folder;
        Runtime.getRuntime().addShutdownHook(new Thread(() -> delete(f), "holdpoint-poi-cleanup"));
    }

    private static void delete(Path dir) {
        try (Stream<Path> s = Files.walk(dir)) {
            s.sorted(Comparator.reverseOrder()).forEach(p -> p.toFile().delete());
        } catch (IOException e) {
            System.err.println("holdpoint: could not remove the temporary folder " + dir + " (" + e.getMessage()
                    + "); delete it by hand");
        }
    }
}
