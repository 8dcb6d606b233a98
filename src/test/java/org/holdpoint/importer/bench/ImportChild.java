package org.holdpoint.importer.bench;

import java.nio.file.Path;
import org.holdpoint.importer.DataImporter;
import org.holdpoint.importer.ImportException;
import org.holdpoint.importer.ImportRequest;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.Dataset;

/** Imports one file and prints what it found; run in a child JVM with a small heap by the memory test. */
public final class ImportChild {
    private ImportChild() {
    }

    /**
     * @param args the file to import
     */
    public static void main(String[] args) {
        try {
            Dataset d = new DataImporter().read(ImportRequest.of(Path.of(args[0])));
            CharacteristicData c = d.characteristics().get(0);
            System.out.println("values=" + d.report().valuesUsed() + " before=" + c.before().size() + " after="
                    + c.after().size() + " exact=" + c.before().sample().hasExactDecimals() + " maxHeapMB="
                    + (Runtime.getRuntime().maxMemory() >> 20));
        } catch (ImportException e) {
            System.err.println(e.getMessage());
            System.exit(2);
        }
    }
}
