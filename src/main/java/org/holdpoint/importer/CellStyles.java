package org.holdpoint.importer;

import java.io.IOException;
import java.io.InputStream;
import java.util.Arrays;
import java.util.HashMap;
import java.util.Map;
import org.apache.poi.ss.usermodel.BuiltinFormats;
import org.apache.poi.ss.usermodel.DateUtil;
import org.apache.poi.util.XMLHelper;
import org.xml.sax.Attributes;
import org.xml.sax.InputSource;
import org.xml.sax.SAXException;
import org.xml.sax.XMLReader;
import org.xml.sax.helpers.DefaultHandler;

/**
 * Whether each cell style of a workbook shows a date: the number format of every style ({@code cellXfs}) and the
 * workbook's own formats ({@code numFmts}), read from the styles part by a SAX pass. The full styles model of the
 * spreadsheet library is not built for this (building it took about 0.1 s of every workbook import;
 * docs/performance.md); the date rule is the library's own {@link DateUtil#isADateFormat(int, String)}.
 */
final class CellStyles {
    private final int[] formatIds;
    private final Map<Integer, String> formats;

    private CellStyles(int[] formatIds, Map<Integer, String> formats) {
        this.formatIds = formatIds;
        this.formats = formats;
    }

    /**
     * Reads a styles part.
     *
     * @param in the part's XML
     * @return the styles
     * @throws IOException  when the part cannot be read
     * @throws SAXException when it is not well-formed XML
     */
    static CellStyles read(InputStream in) throws IOException, SAXException {
        Handler h = new Handler();
        try {
            XMLReader xr = XMLHelper.newXMLReader();
            xr.setContentHandler(h);
            xr.parse(new InputSource(in));
        } catch (javax.xml.parsers.ParserConfigurationException e) {
            throw new SAXException(e);
        }
        return new CellStyles(Arrays.copyOf(h.ids, h.count), h.formats);
    }

    /** @return the number of cell styles */
    int count() {
        return formatIds.length;
    }

    /**
     * @param style a style index of a cell ({@code s} attribute)
     * @return whether a number in that style is shown as a date or time
     */
    boolean isDate(int style) {
        if (style < 0 || style >= formatIds.length) {
            return false;
        }
        int id = formatIds[style];
        String format = formats.containsKey(id) ? formats.get(id) : BuiltinFormats.getBuiltinFormat(id);
        return DateUtil.isADateFormat(id, format);
    }

    private static final class Handler extends DefaultHandler {
        private final Map<Integer, String> formats = new HashMap<>();
        private int[] ids = new int[16];
        private int count;
        private boolean inCellXfs;

        @Override
        public void startElement(String uri, String localName, String qName, Attributes atts) {
            String name = localName == null || localName.isEmpty() ? qName : localName;
            switch (name) {
                case "cellXfs" -> inCellXfs = true;
                case "numFmt" -> {
                    Integer id = number(atts.getValue("numFmtId"));
                    if (id != null) {
                        formats.put(id, atts.getValue("formatCode"));
                    }
                }
                case "xf" -> {
                    if (inCellXfs) {
                        Integer id = number(atts.getValue("numFmtId"));
                        if (count == ids.length) {
                            ids = Arrays.copyOf(ids, count * 2);
                        }
                        ids[count++] = id == null ? 0 : id;
                    }
                }
                default -> {
                    // other style records do not bear on dates
                }
            }
        }

        @Override
        public void endElement(String uri, String localName, String qName) {
            String name = localName == null || localName.isEmpty() ? qName : localName;
            if (name.equals("cellXfs")) {
                inCellXfs = false;
            }
        }

        private static Integer number(String s) {
            if (s == null) {
                return null;
            }
            try {
                return Integer.valueOf(s.strip());
            } catch (NumberFormatException e) {
                return null;
            }
        }
    }
}
