package org.holdpoint.report;

import java.io.IOException;
import java.io.InputStream;
import javax.xml.parsers.ParserConfigurationException;
import javax.xml.parsers.SAXParser;
import org.apache.poi.ss.util.CellReference;
import org.apache.poi.util.XMLHelper;
import org.apache.poi.xssf.model.SharedStrings;
import org.xml.sax.Attributes;
import org.xml.sax.SAXException;
import org.xml.sax.helpers.DefaultHandler;

/**
 * Streams the cells of one written worksheet part back in file order (for verify; the importer has its own
 * reader of the sheets it imports) (row-major, as the file format requires),
 * giving each cell's raw value and type, so that a sheet of a million values is read in constant memory.
 */
final class WrittenCellStream extends DefaultHandler {
    /** What a cell holds. */
    enum Kind {
        /** A number. */
        NUMBER,
        /** Text (shared, inline or a formula's text result). */
        TEXT,
        /** A boolean, an error or anything else. */
        OTHER
    }

    /** Receives each cell. */
    interface Sink {
        /**
         * @param row     0-based row
         * @param col     0-based column
         * @param kind    the value's kind, or null for an empty (styled) cell
         * @param text    the raw value text (number text, or the string), or null
         * @param formula the formula text when the cell holds a formula, else null
         */
        void cell(int row, int col, Kind kind, String text, String formula);

        /**
         * The style index of the cell that is given next (its {@code s} attribute; 0 when absent).
         *
         * @param style the index into the workbook's cell formats
         */
        default void style(int style) {
        }

        /**
         * A row that a reader does not see: hidden, or drawn less than 2 points high.
         *
         * @param row 0-based row
         */
        default void hiddenRow(int row) {
        }

        /**
         * Columns that a reader does not see: hidden, or less than one character wide.
         *
         * @param first 0-based first column
         * @param last  0-based last column
         */
        default void hiddenColumns(int first, int last) {
        }
    }

    private final SharedStrings strings;
    private final Sink sink;
    private final StringBuilder buf = new StringBuilder();
    private boolean inValue;
    private boolean inFormula;
    private boolean inInline;
    private String ref;
    private String type;
    private String value;
    private String formula;
    private int styleIndex;
    private final StringBuilder inline = new StringBuilder();
    private int lastRow = -1;
    private int nextCol;

    private WrittenCellStream(SharedStrings strings, Sink sink) {
        this.strings = strings;
        this.sink = sink;
    }

    /**
     * Reads one sheet part.
     *
     * @param in      the sheet XML
     * @param strings the shared strings
     * @param sink    receives the cells
     * @throws IOException when the part cannot be parsed
     */
    static void read(InputStream in, SharedStrings strings, Sink sink) throws IOException {
        try {
            SAXParser parser = XMLHelper.getSaxParserFactory().newSAXParser();
            parser.parse(in, new WrittenCellStream(strings, sink));
        } catch (SAXException | ParserConfigurationException e) {
            throw new IOException("the sheet XML cannot be parsed: " + e.getMessage(), e);
        }
    }

    @Override
    public void startElement(String uri, String localName, String qName, Attributes atts) {
        String name = localName.isEmpty() ? qName.substring(qName.indexOf(':') + 1) : localName;
        switch (name) {
            case "row" -> {
                String r = atts.getValue("r");
                lastRow = r == null ? lastRow + 1 : Integer.parseInt(r) - 1;
                nextCol = 0;
                String ht = atts.getValue("ht");
                if (truth(atts.getValue("hidden")) || ht != null && parse(ht) < 2) {
                    sink.hiddenRow(lastRow);
                }
            }
            case "col" -> {
                String w = atts.getValue("width");
                if (truth(atts.getValue("hidden")) || w != null && parse(w) < 1) {
                    sink.hiddenColumns((int) parse(atts.getValue("min")) - 1, (int) parse(atts.getValue("max")) - 1);
                }
            }
            case "c" -> {
                ref = atts.getValue("r");
                type = atts.getValue("t");
                String st = atts.getValue("s");
                styleIndex = st == null ? 0 : (int) parse(st);
                value = null;
                formula = null;
                inline.setLength(0);
            }
            case "v" -> start(true, false);
            case "f" -> start(false, true);
            case "is" -> inInline = true;
            case "t" -> {
                if (inInline) {
                    buf.setLength(0);
                }
            }
            default -> {
            }
        }
    }

    private static boolean truth(String v) {
        return "1".equals(v) || "true".equalsIgnoreCase(v);
    }

    private static double parse(String v) {
        try {
            return v == null ? Double.NaN : Double.parseDouble(v.trim());
        } catch (NumberFormatException e) {
            return Double.NaN;
        }
    }

    private void start(boolean v, boolean f) {
        inValue = v;
        inFormula = f;
        buf.setLength(0);
    }

    @Override
    public void characters(char[] ch, int start, int length) {
        if (inValue || inFormula || inInline) {
            buf.append(ch, start, length);
        }
    }

    @Override
    public void endElement(String uri, String localName, String qName) {
        String name = localName.isEmpty() ? qName.substring(qName.indexOf(':') + 1) : localName;
        switch (name) {
            case "v" -> {
                value = buf.toString();
                inValue = false;
            }
            case "f" -> {
                formula = buf.toString();
                inFormula = false;
            }
            case "t" -> {
                if (inInline) {
                    inline.append(buf);
                    buf.setLength(0);
                }
            }
            case "is" -> inInline = false;
            case "c" -> emit();
            default -> {
            }
        }
    }

    private void emit() {
        int row;
        int col;
        if (ref != null) {
            CellReference cr = new CellReference(ref);
            row = cr.getRow();
            col = cr.getCol();
        } else {
            row = lastRow;
            col = nextCol;
        }
        nextCol = col + 1;
        Kind kind;
        String text;
        String t = type == null ? "n" : type;
        switch (t) {
            case "s" -> {
                kind = value == null ? null : Kind.TEXT;
                text = value == null ? null : strings.getItemAt(Integer.parseInt(value.trim())).getString();
            }
            case "inlineStr" -> {
                kind = Kind.TEXT;
                text = inline.toString();
            }
            case "str" -> {
                kind = value == null ? null : Kind.TEXT;
                text = value;
            }
            case "n" -> {
                kind = value == null || value.isEmpty() ? null : Kind.NUMBER;
                text = value;
            }
            default -> {
                kind = Kind.OTHER;
                text = value;
            }
        }
        sink.style(styleIndex);
        sink.cell(row, col, kind, text, formula);
    }
}
