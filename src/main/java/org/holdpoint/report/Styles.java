package org.holdpoint.report;

import java.util.HashMap;
import java.util.Map;
import org.apache.poi.ss.usermodel.BorderStyle;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.FillPatternType;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.ss.usermodel.HorizontalAlignment;
import org.apache.poi.ss.usermodel.IndexedColors;
import org.apache.poi.ss.usermodel.VerticalAlignment;
import org.apache.poi.ss.usermodel.Workbook;

/**
 * The workbook's style library: each combination of style, decimals and quote prefix is created once per
 * workbook (a workbook holds at most 64,000 styles; one per cell would break large reports).
 */
final class Styles {
    /** The typeface: metric-compatible substitutes exist on every platform. */
    static final String FONT = "Arial";
    private final Workbook wb;
    private final Map<String, CellStyle> cache = new HashMap<>();
    private final Font regular;
    private final Font bold;
    private final Font title;
    private final Font heading;
    private final Font verdict;
    private final Font mono;
    private final Font note;

    Styles(Workbook wb) {
        this.wb = wb;
        regular = font(9, false, IndexedColors.BLACK);
        bold = font(9, true, IndexedColors.BLACK);
        title = font(16, true, IndexedColors.BLACK);
        heading = font(12, true, IndexedColors.BLACK);
        verdict = font(14, true, IndexedColors.BLACK);
        mono = wb.createFont();
        mono.setFontName("Courier New");
        mono.setFontHeightInPoints((short) 8);
        note = font(8, false, IndexedColors.GREY_80_PERCENT);
    }

    private Font font(int points, boolean isBold, IndexedColors colour) {
        Font f = wb.createFont();
        f.setFontName(FONT);
        f.setFontHeightInPoints((short) points);
        f.setBold(isBold);
        f.setColor(colour.getIndex());
        return f;
    }

    /**
     * The cell style for a shown cell.
     *
     * @param style        the style
     * @param decimals     decimals of a number style
     * @param quotePrefix  whether the text must be marked as literal text (starts with = + - @ or a control)
     * @return the shared style
     */
    CellStyle get(Style style, int decimals, boolean quotePrefix) {
        String key = style + "/" + decimals + "/" + quotePrefix;
        return cache.computeIfAbsent(key, k -> create(style, decimals, quotePrefix));
    }

    private CellStyle create(Style style, int decimals, boolean quotePrefix) {
        CellStyle s = wb.createCellStyle();
        s.setFont(regular);
        s.setVerticalAlignment(VerticalAlignment.TOP);
        s.setQuotePrefixed(quotePrefix);
        switch (style) {
            case TITLE -> s.setFont(title);
            case HEADING -> s.setFont(heading);
            case LABEL -> s.setFont(bold);
            case TEXT -> {
            }
            case WRAP -> s.setWrapText(true);
            case HEADER -> {
                s.setFont(bold);
                s.setWrapText(true);
                s.setVerticalAlignment(VerticalAlignment.BOTTOM);
                fill(s, IndexedColors.GREY_25_PERCENT);
                border(s);
            }
            case CELL -> border(s);
            case CELL_WRAP -> {
                border(s);
                s.setWrapText(true);
            }
            case NUMBER, INTEGER, P_VALUE -> {
                border(s);
                s.setDataFormat(wb.createDataFormat().getFormat(formatCode(style, decimals)));
            }
            case VERDICT -> {
                s.setFont(verdict);
                s.setVerticalAlignment(VerticalAlignment.CENTER);
            }
            case PASSED -> status(s, IndexedColors.LIGHT_GREEN);
            case FAILED -> status(s, IndexedColors.ROSE);
            case INCONCLUSIVE -> status(s, IndexedColors.LIGHT_YELLOW);
            case NOT_ASSESSED -> status(s, IndexedColors.GREY_25_PERCENT);
            case MARK_PASSED, MARK_FAILED -> {
                status(s, style == Style.MARK_PASSED ? IndexedColors.LIGHT_GREEN : IndexedColors.ROSE);
                s.setFont(verdict);
                s.setAlignment(HorizontalAlignment.CENTER);
                s.setVerticalAlignment(VerticalAlignment.CENTER);
            }
            case FILLABLE -> {
                border(s);
                s.setLocked(false);
                s.setWrapText(true);
            }
            case MONO -> s.setFont(mono);
            case NOTE -> {
                s.setFont(note);
                s.setWrapText(true);
            }
            default -> throw new IllegalStateException("unknown style " + style);
        }
        return s;
    }

    /**
     * The number format of a style: what verify expects to find on every written cell, so that a format
     * that shows other digits (or hides the value) is found.
     *
     * @param style    the style
     * @param decimals decimals of a number style
     * @return the format code ("General" for every style that is not a number style)
     */
    static String formatCode(Style style, int decimals) {
        return switch (style) {
            case NUMBER -> decimals == 0 ? "0" : "0." + "0".repeat(decimals);
            case INTEGER -> "0";
            case P_VALUE -> "[<0.0001]\"< 0.0001\";0.0000";
            default -> "General";
        };
    }

    private void status(CellStyle s, IndexedColors colour) {
        s.setFont(bold);
        fill(s, colour);
        border(s);
        s.setAlignment(HorizontalAlignment.LEFT);
    }

    private static void fill(CellStyle s, IndexedColors colour) {
        s.setFillForegroundColor(colour.getIndex());
        s.setFillPattern(FillPatternType.SOLID_FOREGROUND);
    }

    private static void border(CellStyle s) {
        s.setBorderTop(BorderStyle.THIN);
        s.setBorderBottom(BorderStyle.THIN);
        s.setBorderLeft(BorderStyle.THIN);
        s.setBorderRight(BorderStyle.THIN);
        short grey = IndexedColors.GREY_50_PERCENT.getIndex();
        s.setTopBorderColor(grey);
        s.setBottomBorderColor(grey);
        s.setLeftBorderColor(grey);
        s.setRightBorderColor(grey);
    }

    /**
     * Whether a text would be taken as a formula or command by a spreadsheet or a CSV consumer.
     *
     * @param text the text
     * @return true when it starts with =, +, -, @, a tab or a carriage return
     */
    static boolean needsQuotePrefix(String text) {
        if (text == null || text.isEmpty()) {
            return false;
        }
        char c = text.charAt(0);
        return c == '=' || c == '+' || c == '-' || c == '@' || c == '\t' || c == '\r';
    }
}
