package org.holdpoint.importer;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import javax.xml.parsers.ParserConfigurationException;
import org.apache.poi.ooxml.POIXMLException;
import org.apache.poi.openxml4j.exceptions.InvalidFormatException;
import org.apache.poi.openxml4j.exceptions.NotOfficeXmlFileException;
import org.apache.poi.openxml4j.exceptions.OpenXML4JException;
import org.apache.poi.openxml4j.exceptions.OpenXML4JRuntimeException;
import org.apache.poi.openxml4j.opc.OPCPackage;
import org.apache.poi.openxml4j.opc.PackageAccess;
import org.apache.poi.util.XMLHelper;
import org.apache.poi.xssf.eventusermodel.XSSFReader;
import org.xml.sax.InputSource;
import org.xml.sax.SAXException;
import org.xml.sax.XMLReader;

/**
 * Reads one sheet of an Office Open XML workbook (.xlsx, .xlsm) with POI's streaming reader
 * ({@link XSSFReader}) and the workbook's shared strings ({@link SharedStrings}) and styles, scanning the sheet's XML so
 * that a sheet of a million rows never becomes a workbook object model. Numbers are taken from the
 * cell's stored text (exact decimals); formulas give their cached value, and a formula without one,
 * error values, booleans and date-formatted numbers keep their own kinds. POI's zip-bomb guard (the
 * minimum inflate ratio of {@code ZipSecureFile}) stays in force.
 */
final class XlsxReader {
    private XlsxReader() {
    }

    /**
     * @param path     the workbook
     * @param name     the file name for messages
     * @param sheet    sheet name or 1-based index, or null for the first sheet holding data
     * @param decimal  decimal separator of numbers stored as text ('.' when null)
     * @param messages receives remarks
     * @return the sheet's cells
     */
    static SheetData read(Path path, String name, String sheet, Character decimal, List<String> messages) {
        OPCPackage pkg;
        try {
            pkg = OPCPackage.open(path.toFile(), PackageAccess.READ);
        } catch (NotOfficeXmlFileException e) {
            throw notWorkbook(name, e);
        } catch (InvalidFormatException | OpenXML4JRuntimeException | IllegalArgumentException e) {
            if (e.getMessage() != null && e.getMessage().contains("content type part")) {
                throw notWorkbook(name, e);
            }
            throw damaged(name, e);
        }
        try {
            return readPackage(pkg, name, sheet, decimal == null ? SheetData.PER_COLUMN : decimal, messages);
        } catch (IOException | OpenXML4JException | SAXException | ParserConfigurationException | POIXMLException
                | OpenXML4JRuntimeException | IllegalStateException | IllegalArgumentException
                | UnsupportedOperationException e) {
            if (e.getMessage() != null && e.getMessage().contains("content type part")) {
                throw notWorkbook(name, e);
            }
            if (zipBomb(e)) {
                throw new ImportException(e, "file %s is refused: a part of it expands far more than the parts of a "
                        + "real workbook do (highly repetitive content such as a zip bomb or deeply nested XML; the "
                        + "inflate-ratio guard stopped reading). Ask the sender for a fresh export", name);
            }
            throw damaged(name, e);
        } finally {
            pkg.revert();
        }
    }

    private static boolean zipBomb(Throwable e) {
        for (Throwable t = e; t != null; t = t.getCause() == t ? null : t.getCause()) {
            if (t.getMessage() != null && t.getMessage().toLowerCase(Locale.ROOT).contains("zip bomb")) {
                return true;
            }
        }
        return false;
    }

    static ImportException notWorkbook(String name, Exception e) {
        return new ImportException(e, "file %s is a zip archive but not a spreadsheet workbook (it has no workbook parts). "
                + "Export the data as .xlsx, .xls or .csv", name);
    }

    static ImportException damaged(String name, Exception e) {
        if (e.getMessage() != null && e.getMessage().toLowerCase(Locale.ROOT).contains("strict ooxml")) {
            return new ImportException(e, "file %s is saved as \"Strict Open XML\", which is not read. Open it and "
                    + "save it as an ordinary .xlsx workbook", name);
        }
        return new ImportException(e, "file %s cannot be read as a spreadsheet workbook: it is damaged or incomplete (%s). "
                + "Open it in its program and save a fresh copy, or export it again", name, e.getMessage());
    }

    static SheetData readPackage(OPCPackage pkg, String name, String wanted, char decimal,
            List<String> messages) throws IOException, OpenXML4JException, SAXException, ParserConfigurationException {
        XSSFReader reader = new XSSFReader(pkg);
        SharedStrings strings = SharedStrings.read(pkg);
        CellStyles styles;
        try (InputStream in = reader.getStylesData()) {
            styles = CellStyles.read(in);
        } catch (IOException | InvalidFormatException | POIXMLException | SAXException e) {
            // a workbook without a readable styles part: no cell is known to hold a date, as before
            styles = null;
        }
        boolean date1904 = date1904(reader);
        XSSFReader.SheetIterator it = (XSSFReader.SheetIterator) reader.getSheetsData();
        List<String> names = new ArrayList<>();
        int index = 0;
        Integer wantedIndex = wanted != null && wanted.strip().matches("\\d{1,4}") ? Integer.valueOf(wanted.strip())
                : null;
        while (it.hasNext()) {
            try (InputStream in = it.next()) {
                index++;
                String sheetName = it.getSheetName();
                names.add(sheetName);
                boolean chosen = wanted == null || sheetName.equalsIgnoreCase(wanted.strip())
                        || wantedIndex != null && wantedIndex == index && !names.stream().anyMatch(
                                n -> n.equalsIgnoreCase(wanted.strip()));
                if (!chosen) {
                    continue;
                }
                SheetData data = readSheet(in, it.getSheetPart(), name, sheetName, decimal,
                        new Context(strings, styles, date1904));
                if (wanted != null || data.cellCount() > 0) {
                    if (wanted == null && index > 1) {
                        messages.add(String.format(Locale.ROOT, "%s: sheet %s read (the first sheet holding data)",
                                name, sheetName));
                    }
                    return data;
                }
            }
        }
        if (wanted != null) {
            throw new ImportException("file %s has no sheet \"%s\"; its sheets are %s. Give a sheet name or its "
                    + "number (1 = first)", name, wanted, quoteAll(names));
        }
        if (names.isEmpty()) {
            throw new ImportException("file %s is a workbook without sheets; export the data again", name);
        }
        throw new ImportException("file %s holds no data: all its sheets (%s) are empty. Choose the file that holds "
                + "the measurements", name, quoteAll(names));
    }

    private static String quoteAll(List<String> names) {
        StringBuilder sb = new StringBuilder();
        for (String n : names) {
            sb.append(sb.length() == 0 ? "" : ", ").append('"').append(n).append('"');
        }
        return sb.toString();
    }

    /**
     * Reads one sheet part with the fast byte scanner, or, for XML the scanner does not take (another
     * encoding, CDATA, a document type), with SAX from a fresh stream of the part.
     */
    /** What every sheet of a workbook shares. */
    private record Context(SharedStrings strings, CellStyles styles, boolean date1904) {
    }

    /** Whether the workbook counts dates from 1904 (workbookPr date1904, ECMA-376 Part 1 §18.2.28). */
    private static boolean date1904(XSSFReader reader) {
        try (InputStream in = reader.getWorkbookData()) {
            String head = new String(in.readNBytes(1 << 16), java.nio.charset.StandardCharsets.UTF_8);
            return head.matches("(?s).*date1904\\s*=\\s*[\"'](1|true)[\"'].*");
        } catch (IOException | InvalidFormatException | RuntimeException e) {
            return false;
        }
    }

    private static SheetData readSheet(InputStream in, org.apache.poi.openxml4j.opc.PackagePart part, String name,
            String sheetName, char decimal, Context ctx) throws IOException, SAXException,
            ParserConfigurationException {
        SheetData data = SheetData.forWorkbook(name, sheetName, decimal);
        java.util.function.Function<SheetData, SheetCells> cellsFor = d -> new SheetCells(d, ctx.strings(), ctx.styles(),
                ctx.date1904());
        try {
            int workers = ParallelSheetScan.workers();
            if (workers > 1) {
                try {
                    ParallelSheetScan.scan(in, data, () -> SheetData.forWorkbook(name, sheetName, decimal), cellsFor,
                            workers);
                } catch (ParallelSheetScan.Again again) {
                    // the blocks could not settle the part alone: scan it again from its start in one piece
                    data = SheetData.forWorkbook(name, sheetName, decimal);
                    try (InputStream whole = part.getInputStream()) {
                        new SheetXmlScanner(whole, cellsFor.apply(data)).run();
                    }
                }
            } else {
                new SheetXmlScanner(in, cellsFor.apply(data)).run();
            }
        } catch (SheetXmlScanner.Unsupported e) {
            data = SheetData.forWorkbook(name, sheetName, decimal);
            try (InputStream again = part.getInputStream()) {
                XMLReader xr = XMLHelper.newXMLReader();
                xr.setContentHandler(new SaxSheetHandler(cellsFor.apply(data)));
                xr.parse(new InputSource(again));
            }
        }
        data.finish();
        return data;
    }
}
