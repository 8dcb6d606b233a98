package org.holdpoint.importer;

import java.io.IOException;
import java.io.InputStream;
import java.nio.charset.StandardCharsets;
import java.util.Arrays;

/**
 * A fast, allocation-light scanner of a worksheet part's XML (UTF-8), reporting rows, cells, their
 * value, formula and inline-string texts and merged ranges to {@link SheetCells}. It reads the bytes
 * once and parses numbers straight from them; XML it does not take (another encoding, CDATA, a
 * document type) raises {@link Unsupported} so the caller can fall back to a SAX parser. Element names
 * are compared without their namespace prefix, as SpreadsheetML (ECMA-376 Part 1, §18.3) defines them.
 */
final class SheetXmlScanner {
    /** The XML uses a construct the scanner does not take; read it with SAX instead. */
    static final class Unsupported extends Exception {
        private static final long serialVersionUID = 1L;

        Unsupported(String what) {
            super(what, null, false, false);
        }
    }

    private final InputStream in;
    private final SheetCells cells;
    private byte[] buf;
    private int pos;
    private int lim;
    /** Whether the bytes start the part (a byte-order mark and the encoding are checked there). */
    private final boolean start;
    /** Whether the bytes end the part (then the end of the sheet's data must have been seen). */
    private final boolean end;
    private boolean rowSeen;
    private boolean markupAmongRows;
    private final ByteText value = new ByteText();
    private final ByteText formula = new ByteText();
    private final ByteText inline = new ByteText();
    private final ByteText attrR = new ByteText();
    private final ByteText attrT = new ByteText();
    private final ByteText attrS = new ByteText();
    private ByteText capture;
    private boolean inCell;
    private boolean hasV;
    private boolean hasF;
    private boolean hasT;
    private char cellType;
    private boolean sheetDataEnded;

    SheetXmlScanner(InputStream in, SheetCells cells) {
        this.in = in;
        this.cells = cells;
        this.buf = new byte[1 << 16];
        this.start = true;
        this.end = true;
    }

    /**
     * A scanner of one block of a part's bytes, cut before a row's start tag ({@link ParallelSheetScan}).
     *
     * @param block  the bytes (not copied, not changed)
     * @param length how many of them to scan
     * @param cells  receives the cells
     * @param start  whether the block starts the part
     * @param end    whether the block ends the part
     */
    SheetXmlScanner(byte[] block, int length, SheetCells cells, boolean start, boolean end) {
        this.in = null;
        this.cells = cells;
        this.buf = block;
        this.lim = length;
        this.start = start;
        this.end = end;
    }

    /**
     * @return whether a comment or processing instruction came after the first row: a block of such a part may
     *         have been cut inside it, so the part is scanned again in one piece
     */
    boolean markupAmongRows() {
        return markupAmongRows;
    }

    /**
     * Scans the whole part.
     *
     * @throws IOException  on a read failure or XML cut off inside a tag
     * @throws Unsupported  for XML the scanner does not take
     */
    void run() throws IOException, Unsupported {
        if (in != null) {
            fill();
        }
        if (start && lim >= 2 && ((buf[0] & 0xff) == 0xFE || (buf[0] & 0xff) == 0xFF || buf[0] == 0 || buf[1] == 0)) {
            throw new Unsupported("not UTF-8");
        }
        if (start && lim >= 3 && (buf[0] & 0xff) == 0xEF && (buf[1] & 0xff) == 0xBB && (buf[2] & 0xff) == 0xBF) {
            pos = 3;
        }
        for (;;) {
            int p = pos;
            for (;;) {
                while (p < lim && buf[p] != '<') {
                    p++;
                }
                if (capture != null) {
                    capture.append(buf, pos, p - pos);
                }
                pos = p;
                if (p < lim) {
                    break;
                }
                if (!fill()) {
                    if (!sheetDataEnded && end) {
                        throw new IOException("the sheet's XML ends before its data is complete (the file is "
                                + "truncated)");
                    }
                    return;
                }
                p = pos;
            }
            int end = scanTag();
            while (end < 0) {
                if (!fill()) {
                    throw new IOException("the sheet's XML ends inside a tag (the file is truncated)");
                }
                end = scanTag();
            }
            pos = end + 1;
        }
    }

    /** Reads more bytes after compacting; false at the end of the stream. */
    private boolean fill() throws IOException {
        if (in == null) {
            return false;
        }
        if (pos > 0) {
            System.arraycopy(buf, pos, buf, 0, lim - pos);
            lim -= pos;
            pos = 0;
        }
        if (lim == buf.length) {
            buf = Arrays.copyOf(buf, buf.length * 2);
        }
        int n = in.read(buf, lim, buf.length - lim);
        if (n <= 0) {
            return false;
        }
        lim += n;
        return true;
    }

    /**
     * Reads the tag starting at pos in one pass (name, then the attributes a cell, row or merged range
     * needs) and reports it; returns the index of its closing '>', or −1 when the buffer ends first (then
     * nothing was reported and the caller reads more and calls again).
     */
    private int scanTag() throws Unsupported {
        int i = pos + 1;
        if (i >= lim) {
            return -1;
        }
        byte b1 = buf[i];
        if (b1 == '!') {
            markupAmongRows |= rowSeen;
            return comment();
        }
        if (b1 == '?') {
            markupAmongRows |= rowSeen;
            return quotedEnd(i);
        }
        boolean close = b1 == '/';
        if (close) {
            i++;
        }
        int n = i;
        while (i < lim && buf[i] > ' ' && buf[i] != '/' && buf[i] != '>') {
            if (buf[i] == ':') {
                n = i + 1;
            }
            i++;
        }
        if (i >= lim) {
            return -1;
        }
        int len = i - n;
        if (close) {
            int end = quotedEnd(i);
            if (end >= 0) {
                closeTag(n, len);
            }
            return end;
        }
        byte first = buf[n];
        if (len == 1 && first == 'c' || len == 3 && first == 'r' && buf[n + 1] == 'o' && buf[n + 2] == 'w'
                || len == 9 && matches(n, "mergeCell") || len == 9 && matches(n, "dimension")) {
            int end = attributes(i, len == 9);
            if (end < 0) {
                return -1;
            }
            boolean selfClosing = buf[end - 1] == '/';
            if (len == 1) {
                startCell(selfClosing);
            } else if (len == 3) {
                rowSeen = true;
                cells.startRow(attrR.length() == 0 ? -1 : SheetCells.parsePositive(attrR, -1));
            } else if (first == 'm') {
                cells.merge(attrR.toString());
            } else {
                cells.dimension(attrR.toString());
            }
            return end;
        }
        int end = quotedEnd(i);
        if (end >= 0) {
            openTag(n, len, buf[end - 1] == '/');
        }
        return end;
    }

    /** The '>' ending a tag, from index i, outside quoted values; −1 when not in the buffer. */
    private int quotedEnd(int i) {
        byte quote = 0;
        for (; i < lim; i++) {
            byte b = buf[i];
            if (quote != 0) {
                if (b == quote) {
                    quote = 0;
                }
            } else if (b == '"' || b == '\'') {
                quote = b;
            } else if (b == '>') {
                return i;
            }
        }
        return -1;
    }

    private int comment() throws Unsupported {
        if (lim - pos < 4) {
            return -1;
        }
        if (buf[pos + 2] != '-' || buf[pos + 3] != '-') {
            throw new Unsupported("CDATA or document type");
        }
        for (int i = pos + 4; i + 2 < lim; i++) {
            if (buf[i] == '-' && buf[i + 1] == '-' && buf[i + 2] == '>') {
                return i + 2;
            }
        }
        return -1;
    }

    private void closeTag(int n, int len) {
        if (len == 9 && matches(n, "sheetData")) {
            sheetDataEnded = true;
        } else if (len == 1) {
            byte c = buf[n];
            if (c == 'c') {
                endCell();
            } else if (c == 'v' || c == 'f' || c == 't') {
                capture = null;
            }
        }
    }

    private void openTag(int n, int len, boolean selfClosing) {
        if (len == 9 && selfClosing && matches(n, "sheetData")) {
            sheetDataEnded = true;
            return;
        }
        if (len != 1) {
            return;
        }
        switch (buf[n]) {
            case 'v' -> {
                if (inCell) {
                    hasV = true;
                    value.clear();
                    capture = selfClosing ? null : value;
                }
            }
            case 'f' -> {
                if (inCell) {
                    hasF = true;
                    formula.clear();
                    capture = selfClosing ? null : formula;
                }
            }
            case 't' -> {
                if (inCell && cellType == 'i') {
                    hasT = true;
                    capture = selfClosing ? null : inline;
                }
            }
            default -> {
            }
        }
    }

    private boolean matches(int n, String name) {
        for (int i = 0; i < name.length(); i++) {
            if (buf[n + i] != name.charAt(i)) {
                return false;
            }
        }
        return true;
    }

    private void startCell(boolean selfClosing) {
        cellType = attrT.length() == 0 ? 'n' : attrT.length() == 1 ? attrT.charAt(0)
                : SheetCells.typeOf(attrT.toString());
        cells.startCell(attrR.length() == 0 ? -1 : SheetCells.columnOf(attrR), cellType,
                attrS.length() == 0 ? 0 : SheetCells.parsePositive(attrS, 0));
        inCell = true;
        hasV = false;
        hasF = false;
        hasT = false;
        inline.clear();
        if (selfClosing) {
            endCell();
        }
    }

    private void endCell() {
        if (inCell) {
            cells.endCell(hasV ? value : null, hasF ? formula : null, hasT ? inline : null);
        }
        inCell = false;
        capture = null;
    }

    /**
     * Reads the attributes r, t, s (or ref, into attrR, for merged ranges) from index i up to the tag's
     * '>', which it returns; −1 when the buffer ends first.
     */
    private int attributes(int i, boolean ref) {
        attrR.clear();
        attrT.clear();
        attrS.clear();
        for (;;) {
            while (i < lim && buf[i] <= ' ') {
                i++;
            }
            if (i >= lim) {
                return -1;
            }
            byte b = buf[i];
            if (b == '>') {
                return i;
            }
            if (b == '/') {
                i++;
                continue;
            }
            int ns = i;
            while (i < lim && buf[i] != '=' && buf[i] > ' ' && buf[i] != '>') {
                i++;
            }
            int nl = i - ns;
            while (i < lim && buf[i] != '"' && buf[i] != '\'' && buf[i] != '>') {
                i++;
            }
            if (i >= lim) {
                return -1;
            }
            if (buf[i] == '>') {
                return i;
            }
            byte q = buf[i++];
            int vs = i;
            while (i < lim && buf[i] != q) {
                i++;
            }
            if (i >= lim) {
                return -1;
            }
            ByteText target = null;
            if (ref) {
                if (nl == 3 && buf[ns] == 'r' && buf[ns + 1] == 'e' && buf[ns + 2] == 'f') {
                    target = attrR;
                }
            } else if (nl == 1) {
                byte c = buf[ns];
                target = c == 'r' ? attrR : c == 't' ? attrT : c == 's' ? attrS : null;
            }
            if (target != null) {
                target.append(buf, vs, i - vs);
            }
            i++;
        }
    }

    /** Bytes of a text in the XML: chars are the bytes (ASCII numbers); toString decodes UTF-8 and entities. */
    static final class ByteText implements CharSequence {
        private byte[] b = new byte[64];
        private int len;

        void clear() {
            len = 0;
        }

        void append(byte[] src, int off, int n) {
            if (n <= 0) {
                return;
            }
            if (len + n > b.length) {
                b = Arrays.copyOf(b, Math.max(b.length * 2, len + n));
            }
            System.arraycopy(src, off, b, len, n);
            len += n;
        }

        @Override
        public int length() {
            return len;
        }

        @Override
        public char charAt(int index) {
            return (char) (b[index] & 0xff);
        }

        @Override
        public CharSequence subSequence(int start, int end) {
            return toString().substring(start, end);
        }

        @Override
        public String toString() {
            String s = new String(b, 0, len, StandardCharsets.UTF_8);
            return s.indexOf('&') < 0 ? s : unescape(s);
        }

        private static String unescape(String s) {
            StringBuilder sb = new StringBuilder(s.length());
            int i = 0;
            while (i < s.length()) {
                char c = s.charAt(i);
                int semi = c == '&' ? s.indexOf(';', i) : -1;
                if (semi < 0 || semi - i > 10) {
                    sb.append(c);
                    i++;
                    continue;
                }
                String ent = s.substring(i + 1, semi);
                switch (ent) {
                    case "amp" -> sb.append('&');
                    case "lt" -> sb.append('<');
                    case "gt" -> sb.append('>');
                    case "quot" -> sb.append('"');
                    case "apos" -> sb.append('\'');
                    default -> {
                        int cp = -1;
                        try {
                            if (ent.startsWith("#x") || ent.startsWith("#X")) {
                                cp = Integer.parseInt(ent.substring(2), 16);
                            } else if (ent.startsWith("#")) {
                                cp = Integer.parseInt(ent.substring(1));
                            }
                        } catch (NumberFormatException e) {
                            cp = -1;
                        }
                        if (cp >= 0 && Character.isValidCodePoint(cp)) {
                            sb.appendCodePoint(cp);
                        } else {
                            sb.append(s, i, semi + 1);
                        }
                    }
                }
                i = semi + 1;
            }
            return sb.toString();
        }
    }
}
