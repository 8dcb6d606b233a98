package org.holdpoint.importer;

import java.io.IOException;
import java.io.InputStream;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.poi.openxml4j.opc.OPCPackage;

/**
 * Reads a small workbook bundled with the program on a thread of its own, so that the spreadsheet library's
 * one-time initialisation (its logging interface, the XML parser factories, the package's part and relation
 * tables, the date formats of the document properties; about 0.2 s of single-threaded class loading) runs while
 * the command line is still being parsed, instead of after it (docs/performance.md). The user's files are not
 * touched here; the real import reads them as before and finds the library ready.
 */
public final class WorkbookWarmUp {
    private static final String RESOURCE = "warm-up.xlsx";

    private WorkbookWarmUp() {
    }

    /**
     * Whether command-line arguments name a workbook of the Office Open XML kind (.xlsx, .xlsm), alone or as an
     * option's value.
     *
     * @param args the arguments
     * @return whether one of them ends with such an extension
     */
    public static boolean namesWorkbook(String[] args) {
        for (String a : args) {
            String s = a.toLowerCase(Locale.ROOT);
            if (s.endsWith(".xlsx") || s.endsWith(".xlsm")) {
                return true;
            }
        }
        return false;
    }

    /**
     * Starts reading the bundled workbook on a daemon thread.
     *
     * @return the thread (started)
     */
    public static Thread start() {
        Thread t = new Thread(WorkbookWarmUp::run, "holdpoint-workbook-warm-up");
        t.setDaemon(true);
        t.setPriority(Thread.MIN_PRIORITY);
        t.start();
        return t;
    }

    /**
     * Reads the bundled workbook's first sheet as an import reads a sheet.
     *
     * @return the number of cells read (the bundled workbook has four)
     */
    static long run() {
        try (InputStream in = WorkbookWarmUp.class.getResourceAsStream(RESOURCE)) {
            if (in == null) {
                throw new IllegalStateException("the bundled workbook " + RESOURCE + " is missing from the program");
            }
            OPCPackage pkg = OPCPackage.open(in);
            try {
                List<String> messages = new ArrayList<>();
                return XlsxReader.readPackage(pkg, RESOURCE, null, SheetData.PER_COLUMN, messages).cellCount();
            } finally {
                pkg.revert();
            }
        } catch (IOException | org.apache.poi.openxml4j.exceptions.OpenXML4JException | org.xml.sax.SAXException
                | javax.xml.parsers.ParserConfigurationException e) {
            throw new IllegalStateException("the bundled workbook " + RESOURCE + " could not be read", e);
        }
    }
}
