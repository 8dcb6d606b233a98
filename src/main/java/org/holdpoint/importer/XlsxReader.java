package org.holdpoint.importer;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
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
import org.apache.poi.ss.usermodel.DateUtil;
import org.apache.poi.util.XMLHelper;
import org.apache.poi.xssf.eventusermodel.ReadOnlySharedStringsTable;
import org.apache.poi.xssf.eventusermodel.XSSFReader;
import org.apache.poi.xssf.model.StylesTable;
import org.apache.poi.xssf.usermodel.XSSFCellStyle;
import org.xml.sax.Attributes;
import org.xml.sax.InputSource;
import org.xml.sax.SAXException;
import org.xml.sax.XMLReader;
import org.xml.sax.helpers.DefaultHandler;

/**
 * Reads one sheet of an Office Open XML workbook (.xlsx, .xlsm) with POI's streaming reader
 * ({@link XSSFReader}, the shared-strings table and the styles), parsing the sheet's XML with SAX so
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
            throw damaged(name, e);
        }
        try {
            return readPackage(pkg, name, sheet, decimal == null ? '.' : decimal, messages);
        } catch (IOException | OpenXML4JException | SAXException | ParserConfigurationException | POIXMLException
                | OpenXML4JRuntimeException | IllegalStateException | IllegalArgumentException
                | UnsupportedOperationException e) {
            if (zipBomb(e)) {
                throw new ImportException(e, "file %s looks like a zip bomb: a part of it expands far more than a real "
                        + "workbook does (POI's inflate-ratio guard stopped reading). Do not open it; ask the sender "
                        + "for a fresh export", name);
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
        return new ImportException(e, "file %s is a zip archive but not an Excel workbook (it has no workbook parts). "
                + "Export the data as .xlsx, .xls or .csv", name);
    }

    static ImportException damaged(String name, Exception e) {
        return new ImportException(e, "file %s cannot be read as an Excel workbook: it is damaged or incomplete (%s). "
                + "Open it in its program and save a fresh copy, or export it again", name, e.getMessage());
    }

    private static SheetData readPackage(OPCPackage pkg, String name, String wanted, char decimal,
            List<String> messages) throws IOException, OpenXML4JException, SAXException, ParserConfigurationException {
        XSSFReader reader = new XSSFReader(pkg);
        ReadOnlySharedStringsTable strings = new ReadOnlySharedStringsTable(pkg, false);
        StylesTable styles;
        try {
            styles = reader.getStylesTable();
        } catch (IOException | InvalidFormatException | POIXMLException e) {
            styles = null;
        }
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
                SheetData data = new SheetData(name, sheetName, decimal);
                parse(in, new Handler(data, strings, styles));
                data.finish();
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

    private static void parse(InputStream in, Handler h) throws IOException, SAXException,
            ParserConfigurationException {
        XMLReader xr = XMLHelper.newXMLReader();
        xr.setContentHandler(h);
        xr.parse(new InputSource(in));
    }

    /** A mutable view of a char buffer, so numbers are parsed without making strings. */
    static final class CharSlice implements CharSequence {
        char[] buf = new char[64];
        int len;

        void clear() {
            len = 0;
        }

        void append(char[] ch, int start, int length) {
            if (len + length > buf.length) {
                buf = Arrays.copyOf(buf, Math.max(buf.length * 2, len + length));
            }
            System.arraycopy(ch, start, buf, len, length);
            len += length;
        }

        @Override
        public int length() {
            return len;
        }

        @Override
        public char charAt(int index) {
            return buf[index];
        }

        @Override
        public CharSequence subSequence(int start, int end) {
            return new String(buf, start, end - start);
        }

        @Override
        public String toString() {
            return new String(buf, 0, len);
        }
    }

    /** SAX handler of a worksheet part: rows, cells, merged ranges. */
    private static final class Handler extends DefaultHandler {
        private final SheetData data;
        private final ReadOnlySharedStringsTable strings;
        private final StylesTable styles;
        private final CharSlice value = new CharSlice();
        private final CharSlice formula = new CharSlice();
        private final CharSlice inline = new CharSlice();
        private final DecimalParser parser = new DecimalParser('.');
        private byte[] dateStyle = new byte[16];
        private byte[] sstKind = new byte[0];
        private byte[] sstScale = new byte[0];
        private long[] sstPayload = new long[0];
        private boolean[] sstDone = new boolean[0];
        private int row;
        private int col;
        private char type;
        private int style;
        private boolean hasValue;
        private boolean hasFormula;
        private boolean inCell;
        private int capture;
        private static final int NONE = 0;
        private static final int V = 1;
        private static final int F = 2;
        private static final int T = 3;

        Handler(SheetData data, ReadOnlySharedStringsTable strings, StylesTable styles) {
            this.data = data;
            this.strings = strings;
            this.styles = styles;
        }

        @Override
        public void startElement(String uri, String localName, String qName, Attributes atts) {
            switch (localName) {
                case "row" -> {
                    String r = atts.getValue("r");
                    row = r == null ? row + 1 : parsePositive(r, row + 1);
                    col = -1;
                }
                case "c" -> startCell(atts);
                case "v" -> {
                    if (inCell) {
                        capture = V;
                        hasValue = true;
                        value.clear();
                    }
                }
                case "f" -> {
                    if (inCell) {
                        capture = F;
                        hasFormula = true;
                        formula.clear();
                    }
                }
                case "t" -> {
                    if (inCell && type == 'i') {
                        capture = T;
                        hasValue = true;
                    }
                }
                case "mergeCell" -> merge(atts.getValue("ref"));
                default -> {
                }
            }
        }

        private void startCell(Attributes atts) {
            inCell = true;
            hasValue = false;
            hasFormula = false;
            inline.clear();
            String ref = atts.getValue("r");
            int c = ref == null ? -1 : columnOf(ref);
            col = c >= 0 ? c : col + 1;
            if (row == 0) {
                row = 1;
            }
            String t = atts.getValue("t");
            type = t == null || t.isEmpty() ? 'n' : t.equals("inlineStr") ? 'i' : t.equals("str") ? 'f' : t.charAt(0);
            String s = atts.getValue("s");
            style = s == null ? 0 : parsePositive(s, 0);
        }

        @Override
        public void characters(char[] ch, int start, int length) {
            switch (capture) {
                case V -> value.append(ch, start, length);
                case F -> formula.append(ch, start, length);
                case T -> inline.append(ch, start, length);
                default -> {
                }
            }
        }

        @Override
        public void endElement(String uri, String localName, String qName) {
            switch (localName) {
                case "v", "f", "t" -> capture = NONE;
                case "c" -> {
                    if (inCell) {
                        endCell();
                    }
                    inCell = false;
                }
                default -> {
                }
            }
        }

        private void endCell() {
            if (!hasValue) {
                if (hasFormula) {
                    data.addOther(row, col, CellKind.FORMULA_NO_VALUE, "=" + formula);
                }
                return;
            }
            switch (type) {
                case 's' -> sharedString();
                case 'n' -> number();
                case 'b' -> data.addOther(row, col, CellKind.BOOLEAN,
                        value.len > 0 && value.buf[0] == '1' ? "TRUE" : "FALSE");
                case 'e' -> data.addOther(row, col, CellKind.ERROR, value.toString().strip());
                case 'i' -> data.addText(row, col, inline.toString());
                case 'f' -> data.addText(row, col, value.toString());
                case 'd' -> data.addOther(row, col, CellKind.DATE, value.toString().strip());
                default -> data.addText(row, col, value.toString());
            }
        }

        private void number() {
            if (isDate(style)) {
                int r = parser.parse(value);
                String text = value.toString().strip();
                if (r != DecimalParser.NOT_A_NUMBER && DateUtil.isValidExcelDate(parser.value)) {
                    text = DateUtil.getLocalDateTime(parser.value).toString();
                }
                data.addOther(row, col, CellKind.DATE, text);
                return;
            }
            if (!data.addNumberText(row, col, value)) {
                String t = value.toString().strip();
                if (!t.isEmpty()) {
                    data.addText(row, col, t);
                }
            }
        }

        private void sharedString() {
            int idx = parsePositive(value, -1);
            if (idx < 0 || idx >= strings.getCount()) {
                data.addOther(row, col, CellKind.ERROR, "(shared string " + value + " missing)");
                return;
            }
            if (idx >= sstDone.length) {
                int n = Math.max(idx + 1, Math.min(strings.getCount(), sstDone.length * 2 + 16));
                sstDone = Arrays.copyOf(sstDone, n);
                sstKind = Arrays.copyOf(sstKind, n);
                sstScale = Arrays.copyOf(sstScale, n);
                sstPayload = Arrays.copyOf(sstPayload, n);
            }
            if (!sstDone[idx]) {
                String text = strings.getItemAt(idx).getString();
                if (text == null || !data.prepare(text)) {
                    sstKind[idx] = -1;
                } else {
                    sstKind[idx] = (byte) data.preparedKind.ordinal();
                    sstScale[idx] = (byte) data.preparedScale;
                    sstPayload[idx] = data.preparedPayload;
                }
                sstDone[idx] = true;
            }
            if (sstKind[idx] >= 0) {
                data.addPrepared(row, col, CellKind.of(sstKind[idx]), sstScale[idx], sstPayload[idx]);
            }
        }

        private boolean isDate(int s) {
            if (styles == null || s < 0) {
                return false;
            }
            if (s >= dateStyle.length) {
                dateStyle = Arrays.copyOf(dateStyle, Math.max(s + 1, dateStyle.length * 2));
            }
            if (dateStyle[s] == 0) {
                boolean date = false;
                if (s < styles.getNumCellStyles()) {
                    XSSFCellStyle cs = styles.getStyleAt(s);
                    date = cs != null && DateUtil.isADateFormat(cs.getDataFormat(), cs.getDataFormatString());
                }
                dateStyle[s] = (byte) (date ? 1 : 2);
            }
            return dateStyle[s] == 1;
        }

        private void merge(String ref) {
            if (ref == null) {
                return;
            }
            int colon = ref.indexOf(':');
            if (colon < 0) {
                return;
            }
            int c1 = columnOf(ref.substring(0, colon));
            int c2 = columnOf(ref.substring(colon + 1));
            int r1 = rowOf(ref.substring(0, colon));
            int r2 = rowOf(ref.substring(colon + 1));
            if (c1 >= 0 && c2 >= c1 && r1 > 0 && r2 >= r1) {
                data.addMerged(r1, r2, c1, c2);
            }
        }

        /** 0-based column of a reference such as "AB12", or −1. */
        private static int columnOf(CharSequence ref) {
            int c = 0;
            int i = 0;
            for (; i < ref.length(); i++) {
                char ch = ref.charAt(i);
                if (ch >= 'A' && ch <= 'Z') {
                    c = c * 26 + (ch - 'A' + 1);
                } else if (ch >= 'a' && ch <= 'z') {
                    c = c * 26 + (ch - 'a' + 1);
                } else {
                    break;
                }
                if (c > SheetData.MAX_COLUMNS * 2) {
                    return -1;
                }
            }
            return i == 0 ? -1 : c - 1;
        }

        private static int rowOf(String ref) {
            int i = 0;
            while (i < ref.length() && Character.isLetter(ref.charAt(i))) {
                i++;
            }
            return parsePositive(ref.substring(i), -1);
        }

        private static int parsePositive(CharSequence s, int fallback) {
            int n = 0;
            int len = s.length();
            if (len == 0 || len > 9) {
                return fallback;
            }
            for (int i = 0; i < len; i++) {
                char ch = s.charAt(i);
                if (ch < '0' || ch > '9') {
                    return fallback;
                }
                n = n * 10 + (ch - '0');
            }
            return n;
        }
    }
}
