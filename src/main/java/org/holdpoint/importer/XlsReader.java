package org.holdpoint.importer;

import java.nio.file.Path;
import java.util.List;

/** Placeholder. */
final class XlsReader {
    private XlsReader() {
    }

    static SheetData read(Path path, String name, String sheet, Character decimal, List<String> messages) {
        throw new ImportException("file %s: workbooks are not read yet", name);
    }
}
