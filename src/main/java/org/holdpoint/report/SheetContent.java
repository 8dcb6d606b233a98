package org.holdpoint.report;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.apache.poi.ss.util.CellRangeAddress;

/**
 * What the writer puts on one sheet besides the template's own content: cells, merges, row heights,
 * page breaks, column widths, images and the rows repeated on every printed page.
 */
final class SheetContent {
    /** A chart placed at a cell, scaled to a width in points. */
    record PlacedImage(NamedImage image, int row, int column, double widthPoints) {
    }

    /** The longest text a spreadsheet cell may hold. */
    static final int MAX_TEXT = 32_767;
    final String sheet;
    final List<ShownCell> cells = new ArrayList<>();
    final List<CellRangeAddress> merges = new ArrayList<>();
    final Map<Integer, Float> rowHeights = new LinkedHashMap<>();
    final List<Integer> rowBreaks = new ArrayList<>();
    final Map<Integer, Integer> columnWidths = new LinkedHashMap<>();
    final List<PlacedImage> images = new ArrayList<>();
    /** Chart captions: written, but not compared by the verifier (charts are renderings, not record). */
    final List<ShownCell> captions = new ArrayList<>();
    int[] printTitleRows;

    SheetContent(String sheet) {
        this.sheet = sheet;
    }

    void text(int row, int col, String text, Style style, String label) {
        if (text.length() > MAX_TEXT) {
            text = text.substring(0, MAX_TEXT - 40) + " … (cut: longer than a cell may hold)";
        }
        cells.add(new ShownCell(row, col, text, style, 0, label));
    }

    void number(int row, int col, Double value, Style style, int decimals, String label) {
        cells.add(new ShownCell(row, col, value, value == null ? Style.CELL : style, decimals, label));
    }

    void merge(int row1, int row2, int col1, int col2) {
        if (row2 > row1 || col2 > col1) {
            merges.add(new CellRangeAddress(row1, row2, col1, col2));
        }
    }

    void height(int row, float points) {
        rowHeights.merge(row, points, Math::max);
    }

    void width(int col, int characters) {
        columnWidths.put(col, characters * 256);
    }

    /** @return the cells in row-major order */
    List<ShownCell> sorted() {
        List<ShownCell> s = new ArrayList<>(cells);
        s.sort(Comparator.comparingInt(ShownCell::row).thenComparingInt(ShownCell::column));
        return s;
    }
}
