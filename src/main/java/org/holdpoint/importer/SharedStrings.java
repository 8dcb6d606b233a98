package org.holdpoint.importer;

import java.io.IOException;
import java.io.InputStream;
import java.io.PushbackInputStream;
import java.util.ArrayList;
import java.util.List;
import javax.xml.parsers.ParserConfigurationException;
import org.apache.poi.openxml4j.opc.OPCPackage;
import org.apache.poi.openxml4j.opc.PackagePart;
import org.apache.poi.util.XMLHelper;
import org.apache.poi.xssf.usermodel.XSSFRelation;
import org.xml.sax.Attributes;
import org.xml.sax.InputSource;
import org.xml.sax.SAXException;
import org.xml.sax.XMLReader;
import org.xml.sax.helpers.DefaultHandler;

/**
 * The shared-strings part of a workbook (ECMA-376 Part 1 §18.4) as plain texts: each string item's text runs
 * joined, phonetic runs left out, and the {@code _xHHHH_} character escapes of §22.9.2.19 decoded, which is the
 * text the spreadsheet library's read-only table gives through its rich-text object. The rich-text object is not
 * built here: making the first one loads the library's whole XML schema model (about 60 MB allocated and a tenth
 * of a second of a million-value import; docs/performance.md). The number of strings is the number of items read,
 * not the part's optional {@code count} attribute, which some writers leave out (the library's table then
 * reported no strings at all).
 */
final class SharedStrings {
    private static final String MAIN_NS = "http://schemas.openxmlformats.org/spreadsheetml/2006/main";
    private final List<String> items;

    private SharedStrings(List<String> items) {
        this.items = items;
    }

    /**
     * Reads the package's shared-strings part (the first part of that content type), or none.
     *
     * @param pkg the workbook package
     * @return the strings (none when the package has no such part)
     * @throws IOException  when the part cannot be read
     * @throws SAXException when it is not well-formed XML
     */
    static SharedStrings read(OPCPackage pkg) throws IOException, SAXException {
        List<PackagePart> parts = pkg.getPartsByContentType(XSSFRelation.SHARED_STRINGS.getContentType());
        if (parts.isEmpty()) {
            return new SharedStrings(List.of());
        }
        try (InputStream in = parts.get(0).getInputStream()) {
            return read(in);
        }
    }

    /**
     * Reads a shared-strings part.
     *
     * @param in the part's XML (an empty part holds no strings)
     * @return the strings
     * @throws IOException  when the part cannot be read
     * @throws SAXException when it is not well-formed XML
     */
    static SharedStrings read(InputStream in) throws IOException, SAXException {
        PushbackInputStream pin = new PushbackInputStream(in, 1);
        int first = pin.read();
        if (first < 0) {
            return new SharedStrings(List.of());
        }
        pin.unread(first);
        Handler h = new Handler();
        try {
            XMLReader xr = XMLHelper.newXMLReader();
            xr.setContentHandler(h);
            xr.parse(new InputSource(pin));
        } catch (ParserConfigurationException e) {
            throw new SAXException(e);
        }
        return new SharedStrings(h.items);
    }

    /** @return the number of string items */
    int size() {
        return items.size();
    }

    /**
     * @param index 0-based item index, {@code 0 <= index < size()}
     * @return the item's text with its character escapes decoded
     */
    String text(int index) {
        return decodeEscapes(items.get(index));
    }

    /**
     * Decodes the {@code _xHHHH_} escapes (an underscore, 'x', four hexadecimal digits, an underscore) left to
     * right, each into the UTF-16 unit it names; a decoded escape is not read again, so {@code _x005F_x0041_}
     * stays {@code _x0041_} after its underscore is decoded.
     *
     * @param s a text
     * @return the text with its escapes decoded
     */
    static String decodeEscapes(String s) {
        int at = s.indexOf("_x");
        if (at < 0) {
            return s;
        }
        StringBuilder sb = null;
        int copied = 0;
        int n = s.length();
        for (int i = at; i + 7 <= n; ) {
            if (s.charAt(i) == '_' && s.charAt(i + 1) == 'x' && s.charAt(i + 6) == '_') {
                int v = hex4(s, i + 2);
                if (v >= 0) {
                    if (sb == null) {
                        sb = new StringBuilder(n);
                    }
                    sb.append(s, copied, i).append((char) v);
                    i += 7;
                    copied = i;
                    continue;
                }
            }
            i++;
        }
        return sb == null ? s : sb.append(s, copied, n).toString();
    }

    private static int hex4(String s, int from) {
        int v = 0;
        for (int i = from; i < from + 4; i++) {
            char c = s.charAt(i);
            int d = c >= '0' && c <= '9' ? c - '0' : c >= 'A' && c <= 'F' ? c - 'A' + 10
                    : c >= 'a' && c <= 'f' ? c - 'a' + 10 : -1;
            if (d < 0) {
                return -1;
            }
            v = v * 16 + d;
        }
        return v;
    }

    /** Collects the text of each {@code si}: its {@code t} elements outside phonetic runs ({@code rPh}). */
    private static final class Handler extends DefaultHandler {
        private final List<String> items = new ArrayList<>();
        private final StringBuilder text = new StringBuilder(64);
        private boolean inSst;
        private boolean inT;
        private boolean inPhonetic;

        @Override
        public void startElement(String uri, String localName, String qName, Attributes atts) {
            if (uri != null && !uri.equals(MAIN_NS)) {
                return;
            }
            switch (localName) {
                case "sst" -> inSst = true;
                case "si" -> text.setLength(0);
                case "t" -> inT = true;
                case "rPh" -> inPhonetic = true;
                default -> {
                    // run properties and other elements hold no text of the item
                }
            }
        }

        @Override
        public void endElement(String uri, String localName, String qName) {
            if (uri != null && !uri.equals(MAIN_NS)) {
                return;
            }
            switch (localName) {
                case "si" -> {
                    if (inSst) {
                        items.add(text.toString());
                    }
                }
                case "t" -> inT = false;
                case "rPh" -> inPhonetic = false;
                default -> {
                    // nothing to close
                }
            }
        }

        @Override
        public void characters(char[] ch, int start, int length) {
            if (inT && !inPhonetic && inSst) {
                text.append(ch, start, length);
            }
        }
    }
}
