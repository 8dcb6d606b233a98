package org.holdpoint.importer;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.HashMap;
import java.util.List;
import java.util.Map;

/**
 * One sheet (or text file) as read, column by column in primitive arrays, with a table of the
 * distinct texts and the merged cell ranges. Sources fill it cell by cell; the layouts read it.
 */
final class SheetData {
    /** Columns above this many are refused: a real export never has them, noise often does. */
    static final int MAX_COLUMNS = 16_384;

    private final String file;
    private final String sheet;
    private SheetColumn[] columns = new SheetColumn[16];
    private int columnCount;
    private int lastRow;
    private long cellCount;
    private final Map<String, Integer> textIds = new HashMap<>();
    private final List<String> texts = new ArrayList<>();
    private final List<int[]> merged = new ArrayList<>();
    private final DecimalParser parser;
    /** Numeric cells store their number with a point whatever the separator of text numbers. */
    private final DecimalParser stored = new DecimalParser('.');
    private String[] keys = new String[16];
    private int capacityHint = 8;
    private long numbersFromText;
    /** Whether numbers stored as text take their decimal separator per column (workbooks, none given). */
    private boolean decimalPerColumn;
    /** Per column: up to 3 rows of numbers stored as text with this sheet's separator, then with the other. */
    private final Map<Integer, int[]> ownSeparatorRows = new HashMap<>();
    private final Map<Integer, int[]> otherSeparatorRows = new HashMap<>();
    private final List<Integer> otherSeparatorColumns = new ArrayList<>();

    /**
     * @param file             the file name as given
     * @param sheet            the sheet name, or null for text files
     * @param decimalSeparator the decimal separator for numbers written as text
     */
    SheetData(String file, String sheet, char decimalSeparator) {
        this.file = file;
        this.sheet = sheet;
        this.parser = new DecimalParser(decimalSeparator);
    }

    /** @return the file name */
    String file() {
        return file;
    }

    /** @return the sheet name, or null */
    String sheet() {
        return sheet;
    }

    /** @return 1 + the highest 0-based column with a cell */
    int columnCount() {
        return columnCount;
    }

    /** @return the highest 1-based row with a cell (0 when empty) */
    int lastRow() {
        return lastRow;
    }

    /** @return the number of non-blank cells */
    long cellCount() {
        return cellCount;
    }

    /** @return the decimal separator used for numbers written as text */
    char decimalSeparator() {
        return parser.separator();
    }

    /** @return how many cells held numbers written as text */
    long numbersFromText() {
        return numbersFromText;
    }

    /**
     * @param col 0-based column
     * @return the column, or null when it has no cell
     */
    SheetColumn column(int col) {
        return col < columnCount ? columns[col] : null;
    }

    /** @return the text of a string id */
    /** @return how many distinct texts the sheet holds (ids 0 to this − 1) */
    int textCount() {
        return texts.size();
    }

    String text(long id) {
        return texts.get((int) id);
    }

    /**
     * @param id a string id
     * @return the comparison key of that text ({@link ColumnNames#key}), cached
     */
    String key(long id) {
        int i = (int) id;
        if (keys.length < texts.size()) {
            keys = Arrays.copyOf(keys, Math.max(texts.size(), keys.length * 2));
        }
        String k = keys[i];
        if (k == null) {
            k = ColumnNames.key(texts.get(i));
            keys[i] = k;
        }
        return k;
    }

    /** @return the 4-int ranges {firstRow, lastRow, firstCol, lastCol} (1-based rows, 0-based columns) */
    List<int[]> merged() {
        return merged;
    }

    /**
     * The sheet's declared extent (a workbook's dimension), so columns can be sized once; at most
     * 8 million cells are reserved in all.
     *
     * @param rows    the number of rows declared
     * @param columns the number of columns declared
     */
    void sizeHint(int rows, int columns) {
        if (rows > 0 && columns > 0) {
            capacityHint = (int) Math.min(rows, Math.max(8, 8_000_000L / columns));
        }
    }

    void addMerged(int firstRow, int lastRow, int firstCol, int lastCol) {
        merged.add(new int[] {firstRow, lastRow, firstCol, lastCol});
    }

    private SheetColumn col(int row, int col) {
        if (col >= MAX_COLUMNS) {
            throw new ImportException("%s has a cell beyond column %s (row %d); a sheet may use at most %d columns. "
                    + "Delete the stray cells or copy the data to a new sheet", where(), org.holdpoint.study.Origin.columnName(MAX_COLUMNS),
                    row, MAX_COLUMNS);
        }
        if (col >= columns.length) {
            columns = Arrays.copyOf(columns, Math.max(col + 1, columns.length * 2));
        }
        SheetColumn c = columns[col];
        if (c == null) {
            c = new SheetColumn(capacityHint);
            columns[col] = c;
        }
        if (col >= columnCount) {
            columnCount = col + 1;
        }
        if (row > lastRow) {
            lastRow = row;
        }
        cellCount++;
        return c;
    }

    /** @return "file X" or "file X, sheet S" */
    String where() {
        return sheet == null ? "file " + file : "file " + file + ", sheet " + sheet;
    }

    /** Adds an exactly known number. */
    void addExact(int row, int col, long unscaled, int scale) {
        col(row, col).add(row, CellKind.NUMBER, scale, unscaled);
    }

    /** Adds a number known only as a double. */
    void addDouble(int row, int col, double value) {
        col(row, col).add(row, CellKind.NUMBER, -1, Double.doubleToRawLongBits(value));
    }

    /** Adds a cell of a non-number kind with its text. */
    void addOther(int row, int col, CellKind kind, String text) {
        col(row, col).add(row, kind, 0, id(text));
    }

    /**
     * Adds a numeric cell from its stored number text (exact when the text allows).
     *
     * @return false when the text is not a number (nothing added)
     */
    boolean addNumberText(int row, int col, CharSequence text) {
        int r = stored.parse(text);
        if (r == DecimalParser.EXACT) {
            addExact(row, col, stored.unscaled, stored.scale);
        } else if (r == DecimalParser.DOUBLE_ONLY && Double.isFinite(stored.value)) {
            addDouble(row, col, stored.value);
        } else {
            return false;
        }
        return true;
    }

    /**
     * Adds a text cell, classified: numbers written as text become numbers; NaN/infinity, true/false,
     * error codes, dates and numbers with the other decimal separator get their own kinds.
     */
    void addText(int row, int col, String text) {
        if (prepare(text)) {
            addPrepared(row, col);
        }
    }

    /** The kind of the last {@link #prepare}d text. */
    CellKind preparedKind;
    /** The scale of the last prepared text (numbers: −1 for double bits). */
    int preparedScale;
    /** The payload of the last prepared text. */
    long preparedPayload;

    /**
     * Classifies a text into {@link #preparedKind}, {@link #preparedScale}, {@link #preparedPayload}
     * without adding it, so that a source can cache the result for a repeated text.
     *
     * @param text the cell text
     * @return false when the text is blank (no cell)
     */
    boolean prepare(String text) {
        String t = text.strip();
        if (t.isEmpty()) {
            return false;
        }
        char first = t.charAt(0);
        if ((first >= '0' && first <= '9') || first == '-' || first == '+' || first == '.' || first == ','
                || first == '\u2212') {
            int r = parser.parse(t);
            if (r == DecimalParser.EXACT) {
                preparedKind = CellKind.NUMBER;
                preparedScale = parser.scale;
                preparedPayload = parser.unscaled;
                return true;
            }
            if (r == DecimalParser.DOUBLE_ONLY && Double.isFinite(parser.value)) {
                preparedKind = CellKind.NUMBER;
                preparedScale = -1;
                preparedPayload = Double.doubleToRawLongBits(parser.value);
                return true;
            }
            if (r == DecimalParser.DOUBLE_ONLY) {
                // a number too large for binary64, such as 1e400
                preparedKind = CellKind.NOT_FINITE;
                preparedScale = 0;
                preparedPayload = id(t);
                return true;
            }
        }
        preparedKind = TextClassifier.classify(t, parser.separator());
        preparedScale = 0;
        preparedPayload = id(t);
        return true;
    }

    /** Adds the last prepared text (or one cached from it) as a cell. */
    void addPrepared(int row, int col, CellKind kind, int scale, long payload) {
        if (kind == CellKind.NUMBER) {
            numbersFromText++;
            if (scale != 0) {
                note(ownSeparatorRows, row, col);
            }
        } else if (kind == CellKind.OTHER_SEPARATOR) {
            note(otherSeparatorRows, row, col);
        }
        col(row, col).add(row, kind, scale, payload);
    }

    private static void note(Map<Integer, int[]> m, int row, int col) {
        int[] rows = m.get(col);
        if (rows == null) {
            m.put(col, new int[] {1, row, 0, 0});
        } else if (rows[0] < 3) {
            rows[++rows[0]] = row;
        }
    }

    /** A workbook read without a given decimal separator: numbers stored as text take theirs per column. */
    static final char PER_COLUMN = 0;

    /**
     * The cells of one workbook sheet.
     *
     * @param file    the file name
     * @param sheet   the sheet name
     * @param decimal the decimal separator given, or {@link #PER_COLUMN}
     * @return the empty sheet data
     */
    static SheetData forWorkbook(String file, String sheet, char decimal) {
        SheetData data = new SheetData(file, sheet, decimal == PER_COLUMN ? '.' : decimal);
        if (decimal == PER_COLUMN) {
            data.decimalPerColumn();
        }
        return data;
    }

    /**
     * Numbers stored as text in a workbook take their decimal separator per column: a column whose
     * text numbers all use the other separator than this sheet's (a decimal comma where '.' is in
     * force) is read with that one; a column that mixes both is refused with its cells named. Used
     * when the user gave no decimal separator (docs/import.md, "Numbers stored as text").
     */
    void decimalPerColumn() {
        this.decimalPerColumn = true;
    }

    /** @return the 0-based columns whose text numbers were read with the other decimal separator */
    List<Integer> otherSeparatorColumns() {
        return otherSeparatorColumns;
    }

    /**
     * The cells of a column that hold numbers stored as text with each separator, for a message.
     *
     * @param col 0-based column
     * @return e.g. "with a decimal comma in J5, J9; with a decimal point in J6"
     */
    String separatorCells(int col) {
        char own = parser.separator();
        return "with a decimal " + (own == '.' ? "comma" : "point") + " in " + cells(otherSeparatorRows.get(col), col)
                + (ownSeparatorRows.containsKey(col) ? "; with a decimal " + (own == '.' ? "point" : "comma") + " in "
                        + cells(ownSeparatorRows.get(col), col) : "");
    }

    private static String cells(int[] rows, int col) {
        if (rows == null) {
            return "no cell";
        }
        StringBuilder sb = new StringBuilder();
        for (int i = 1; i <= rows[0]; i++) {
            sb.append(i > 1 ? ", " : "").append(org.holdpoint.study.Origin.columnName(col + 1)).append(rows[i]);
        }
        return sb.toString();
    }

    private void addPrepared(int row, int col) {
        addPrepared(row, col, preparedKind, preparedScale, preparedPayload);
    }

    private int id(String text) {
        Integer id = textIds.get(text);
        if (id == null) {
            id = texts.size();
            texts.add(text);
            textIds.put(text, id);
        }
        return id;
    }

    /** Puts every column in row order (sources that deliver cells out of order). */
    /**
     * Appends the cells of the next block of the same sheet, read into a sheet of their own
     * ({@link ParallelSheetScan}): afterwards this sheet holds what reading both in one pass would have given —
     * cells, texts with the same ids, merged ranges, counts and the first cells noted per column.
     *
     * @param next the next block's cells; not finished
     */
    void append(SheetData next) {
        int[] ids = new int[next.texts.size()];
        for (int i = 0; i < ids.length; i++) {
            ids[i] = id(next.texts.get(i));
        }
        for (int c = 0; c < next.columnCount; c++) {
            SheetColumn from = next.columns[c];
            if (from == null || from.size() == 0) {
                continue;
            }
            if (c >= columns.length) {
                columns = Arrays.copyOf(columns, Math.max(c + 1, columns.length * 2));
            }
            if (columns[c] == null) {
                columns[c] = new SheetColumn(capacityHint);
            }
            columns[c].appendAll(from, ids);
        }
        columnCount = Math.max(columnCount, next.columnCount);
        lastRow = Math.max(lastRow, next.lastRow);
        cellCount += next.cellCount;
        numbersFromText += next.numbersFromText;
        merged.addAll(next.merged);
        appendNotes(ownSeparatorRows, next.ownSeparatorRows);
        appendNotes(otherSeparatorRows, next.otherSeparatorRows);
    }

    /** Empties a block's sheet after it was appended, keeping its column arrays for the next block. */
    void clearForReuse() {
        for (int c = 0; c < columnCount; c++) {
            if (columns[c] != null) {
                columns[c].clear();
            }
        }
        columnCount = 0;
        lastRow = 0;
        cellCount = 0;
        textIds.clear();
        texts.clear();
        Arrays.fill(keys, null);
        merged.clear();
        numbersFromText = 0;
        ownSeparatorRows.clear();
        otherSeparatorRows.clear();
        otherSeparatorColumns.clear();
    }

    private static void appendNotes(Map<Integer, int[]> to, Map<Integer, int[]> from) {
        for (Map.Entry<Integer, int[]> e : from.entrySet()) {
            int[] rows = e.getValue();
            for (int i = 1; i <= rows[0]; i++) {
                note(to, rows[i], e.getKey());
            }
        }
    }

    void finish() {
        for (int i = 0; i < columnCount; i++) {
            if (columns[i] != null) {
                columns[i].sortIfNeeded();
            }
        }
        if (decimalPerColumn) {
            DecimalParser other = new DecimalParser(parser.separator() == '.' ? ',' : '.');
            for (int col : new java.util.TreeSet<>(otherSeparatorRows.keySet())) {
                if (!ownSeparatorRows.containsKey(col) && readWith(other, columns[col])) {
                    otherSeparatorColumns.add(col);
                }
            }
        }
    }

    /** Reads a column's other-separator texts as numbers; false (nothing changed) if one does not read. */
    private boolean readWith(DecimalParser other, SheetColumn c) {
        for (int i = 0; i < c.size(); i++) {
            if (c.kind(i) == CellKind.OTHER_SEPARATOR) {
                int r = other.parse(text(c.payload(i)).strip());
                if (r == DecimalParser.NOT_A_NUMBER || r == DecimalParser.DOUBLE_ONLY && !Double.isFinite(other.value)) {
                    return false;
                }
            }
        }
        for (int i = 0; i < c.size(); i++) {
            if (c.kind(i) == CellKind.OTHER_SEPARATOR) {
                int r = other.parse(text(c.payload(i)).strip());
                if (r == DecimalParser.EXACT) {
                    c.set(i, CellKind.NUMBER, other.scale, other.unscaled);
                } else {
                    c.set(i, CellKind.NUMBER, -1, Double.doubleToRawLongBits(other.value));
                }
                numbersFromText++;
            }
        }
        return true;
    }

    /**
     * The text of a cell as the user sees it (numbers as decimal text), or null when blank.
     *
     * @param row 1-based row
     * @param col 0-based column
     * @return the text or null
     */
    String display(int row, int col) {
        SheetColumn c = column(col);
        if (c == null) {
            return null;
        }
        int i = c.indexOfRow(row);
        return i < 0 ? null : display(c, i);
    }

    /** @return the display text of cell i of column c */
    String display(SheetColumn c, int i) {
        if (c.kind(i) != CellKind.NUMBER) {
            return text(c.payload(i));
        }
        if (c.exact(i)) {
            return java.math.BigDecimal.valueOf(c.payload(i), c.scale(i)).stripTrailingZeros().toPlainString();
        }
        return java.math.BigDecimal.valueOf(c.number(i)).stripTrailingZeros().toPlainString();
    }
}
