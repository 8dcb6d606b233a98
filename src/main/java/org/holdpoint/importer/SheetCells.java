package org.holdpoint.importer;

import java.util.Arrays;
import org.apache.poi.ss.usermodel.DateUtil;

/**
 * Turns the cells of a worksheet part (as a parser reports them) into {@link SheetData} cells: shared
 * strings (classified once per string), numbers from their stored text, date styles, booleans,
 * errors, inline strings, formulas with and without a cached value, merged ranges.
 */
final class SheetCells {
    private final SheetData data;
    private final SharedStrings strings;
    private final CellStyles styles;
    private final DecimalParser parser = new DecimalParser('.');
    private byte[] dateStyle = new byte[16];
    private byte[] sstKind = new byte[0];
    private byte[] sstScale = new byte[0];
    private long[] sstPayload = new long[0];
    private boolean[] sstDone = new boolean[0];
    private int row;
    private int col = -1;
    private char type;
    private int style;

    private final boolean date1904;

    SheetCells(SheetData data, SharedStrings strings, CellStyles styles, boolean date1904) {
        this.date1904 = date1904;
        this.data = data;
        this.strings = strings;
        this.styles = styles;
    }

    /** A row starts; {@code r} is its 1-based number or −1 when not given. */
    void startRow(int r) {
        row = r > 0 ? r : row + 1;
        col = -1;
    }

    /**
     * A cell starts.
     *
     * @param c     0-based column from its reference, or −1 when not given
     * @param t     the type attribute's first letter ('n' when absent; 'i' inline string, 'f' formula string)
     * @param s     the style index (0 when absent)
     */
    void startCell(int c, char t, int s) {
        col = c >= 0 ? c : col + 1;
        if (row == 0) {
            row = 1;
        }
        type = t;
        style = s;
    }

    /**
     * The cell ends.
     *
     * @param value   the text of its v element, or null
     * @param formula the text of its f element, or null
     * @param inline  the text of its inline string, or null
     */
    void endCell(CharSequence value, CharSequence formula, CharSequence inline) {
        if (type == 'i' && inline != null) {
            data.addText(row, col, inline.toString());
            return;
        }
        if (value == null) {
            if (formula != null) {
                data.addOther(row, col, CellKind.FORMULA_NO_VALUE, "=" + formula);
            }
            return;
        }
        switch (type) {
            case 's' -> sharedString(value);
            case 'n' -> number(value);
            case 'b' -> data.addOther(row, col, CellKind.BOOLEAN,
                    value.length() > 0 && value.charAt(0) == '1' ? "TRUE" : "FALSE");
            case 'e' -> data.addOther(row, col, CellKind.ERROR, value.toString().strip());
            case 'd' -> data.addOther(row, col, CellKind.DATE, value.toString().strip());
            default -> data.addText(row, col, value.toString());
        }
    }

    private void number(CharSequence value) {
        if (isDate(style)) {
            int r = parser.parse(value);
            String text = value.toString().strip();
            if (r != DecimalParser.NOT_A_NUMBER && DateUtil.isValidExcelDate(parser.value)) {
                text = DateUtil.getLocalDateTime(parser.value, date1904).toString();
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

    private void sharedString(CharSequence value) {
        int idx = parsePositive(value, -1);
        if (idx < 0 || idx >= strings.size()) {
            data.addOther(row, col, CellKind.ERROR, "(shared string " + value + " missing)");
            return;
        }
        if (idx >= sstDone.length) {
            int n = Math.max(idx + 1, Math.min(strings.size(), sstDone.length * 2 + 16));
            sstDone = Arrays.copyOf(sstDone, n);
            sstKind = Arrays.copyOf(sstKind, n);
            sstScale = Arrays.copyOf(sstScale, n);
            sstPayload = Arrays.copyOf(sstPayload, n);
        }
        if (!sstDone[idx]) {
            String text = strings.text(idx);
            if (!data.prepare(text)) {
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
            dateStyle[s] = (byte) (styles.isDate(s) ? 1 : 2);
        }
        return dateStyle[s] == 1;
    }

    /** The sheet's declared dimension such as "A1:B1000001", used to size the columns once. */
    void dimension(CharSequence ref) {
        if (ref == null) {
            return;
        }
        String s = ref.toString();
        int colon = s.indexOf(':');
        if (colon < 0) {
            return;
        }
        int c1 = columnOf(s.substring(0, colon));
        int c2 = columnOf(s.substring(colon + 1));
        int r1 = rowOf(s.substring(0, colon));
        int r2 = rowOf(s.substring(colon + 1));
        if (c1 >= 0 && c2 >= c1 && r1 > 0 && r2 >= r1) {
            data.sizeHint(r2 - r1 + 1, c2 - c1 + 1);
        }
    }

    /** A merged range such as "B1:C1". */
    void merge(CharSequence ref) {
        if (ref == null) {
            return;
        }
        String s = ref.toString();
        int colon = s.indexOf(':');
        if (colon < 0) {
            return;
        }
        int c1 = columnOf(s.substring(0, colon));
        int c2 = columnOf(s.substring(colon + 1));
        int r1 = rowOf(s.substring(0, colon));
        int r2 = rowOf(s.substring(colon + 1));
        if (c1 >= 0 && c2 >= c1 && r1 > 0 && r2 >= r1) {
            data.addMerged(r1, r2, c1, c2);
        }
    }

    /**
     * 0-based column of a reference such as "AB12", or −1. Hand-written rather than POI's CellReference: it is
     * called for every cell of a streamed sheet and must not allocate (a million cells per import).
     */
    static int columnOf(CharSequence ref) {
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

    /** A non-negative int of at most 9 digits, else the fallback. */
    static int parsePositive(CharSequence s, int fallback) {
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

    /** @return the type letter of a t attribute value */
    static char typeOf(CharSequence t) {
        if (t == null || t.length() == 0) {
            return 'n';
        }
        String s = t.toString();
        return s.equals("inlineStr") ? 'i' : s.equals("str") ? 'f' : s.charAt(0);
    }
}
