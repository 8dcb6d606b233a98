package org.holdpoint.report;

import java.io.IOException;
import java.io.OutputStream;
import java.util.List;
import java.util.Map;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.ClientAnchor;
import org.apache.poi.ss.usermodel.PrintSetup;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.usermodel.Workbook;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;
import org.apache.poi.xssf.usermodel.XSSFClientAnchor;
import org.apache.poi.xssf.usermodel.XSSFDrawing;
import org.apache.poi.xssf.usermodel.XSSFSheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/**
 * Writes the sign-off workbook: fills a {@link Template}'s defined names with the change, the verdicts,
 * one detail section per characteristic with its charts, the method, the import report, the cautions,
 * the raw data (streamed, so a million values fit), the sign-off block and a hidden, protected record
 * sheet holding the canonical study record and its SHA-256. User text is always written as a text cell,
 * never as a formula; text that a spreadsheet could take for a formula also gets the quote-prefix flag.
 */
public final class SignoffWorkbook {
    /** Rows kept in memory by the streaming writer of the raw data. */
    static final int WINDOW = 500;
    private final Template template;

    /**
     * @param template the template to fill
     */
    public SignoffWorkbook(Template template) {
        this.template = template;
    }

    /** @return a writer with the default template */
    public static SignoffWorkbook withDefaultTemplate() {
        return new SignoffWorkbook(Template.defaultTemplate());
    }

    /**
     * Writes the workbook to a stream (the caller makes the file atomic).
     *
     * @param input what to show and embed
     * @param out   the stream; not closed
     * @throws IOException when writing fails
     */
    public void write(ReportInput input, OutputStream out) throws IOException {
        PoiTempFiles.install();
        XSSFWorkbook wb = new XSSFWorkbook(template.open());
        SXSSFWorkbook sx = null;
        try {
            Styles styles = new Styles(wb);
            Map<String, Integer> counts = RecordSheet.chartCounts(input);
            WorkbookPlan plan = WorkbookPlan.of(input, template.anchors(), counts, RecordSheet.LAYOUT);
            for (SheetContent content : plan.contents()) {
                fill(wb, wb.getSheet(content.sheet), content, styles);
            }
            record(wb, input, counts, styles);
            pageSetup(wb, input);
            sx = new SXSSFWorkbook(wb, WINDOW);
            rawData(sx, input, styles);
            sx.write(out);
        } finally {
            if (sx != null) {
                sx.close();
            }
            wb.close();
        }
    }

    private static void fill(XSSFWorkbook wb, XSSFSheet sh, SheetContent content, Styles styles) {
        // create rows in ascending order: XSSF inserts an out-of-order row with a linear search
        java.util.TreeSet<Integer> rows = new java.util.TreeSet<>(content.rowHeights.keySet());
        content.cells.forEach(c -> rows.add(c.row()));
        content.captions.forEach(c -> rows.add(c.row()));
        rows.forEach(r -> row(sh, r));
        for (ShownCell c : content.sorted()) {
            put(sh, c, styles);
        }
        for (ShownCell c : content.captions) {
            put(sh, c, styles);
        }
        for (CellRangeAddress m : content.merges) {
            sh.addMergedRegionUnsafe(m);
        }
        content.rowHeights.forEach((r, h) -> row(sh, r).setHeightInPoints(h));
        content.columnWidths.forEach(sh::setColumnWidth);
        content.rowBreaks.forEach(sh::setRowBreak);
        if (content.printTitleRows != null) {
            sh.setRepeatingRows(new CellRangeAddress(content.printTitleRows[0], content.printTitleRows[1], -1, -1));
        }
        if (!content.images.isEmpty()) {
            XSSFDrawing drawing = sh.createDrawingPatriarch();
            for (SheetContent.PlacedImage p : content.images) {
                int idx = wb.addPicture(p.image().png(), Workbook.PICTURE_TYPE_PNG);
                XSSFClientAnchor anchor = anchor(sh, p);
                anchor.setAnchorType(ClientAnchor.AnchorType.MOVE_DONT_RESIZE);
                drawing.createPicture(anchor, idx);
            }
        }
    }

    /**
     * A two-cell anchor that gives the picture the requested width in points and its own aspect ratio,
     * walking the column widths (pixels at 96 dpi) and row heights (points) of the sheet.
     */
    private static XSSFClientAnchor anchor(XSSFSheet sh, SheetContent.PlacedImage p) {
        double widthPx = p.widthPoints() * 96 / 72;
        double heightPt = p.widthPoints() * p.image().height() / p.image().width();
        int col = p.column();
        double left = widthPx;
        while (left > sh.getColumnWidthInPixels(col)) {
            left -= sh.getColumnWidthInPixels(col);
            col++;
        }
        int row = p.row();
        double down = heightPt;
        while (down > rowHeight(sh, row)) {
            down -= rowHeight(sh, row);
            row++;
        }
        return new XSSFClientAnchor(0, 0, (int) Math.round(left * org.apache.poi.util.Units.EMU_PER_PIXEL),
                (int) Math.round(down * org.apache.poi.util.Units.EMU_PER_POINT), p.column(), p.row(), col, row);
    }

    private static double rowHeight(XSSFSheet sh, int r) {
        Row row = sh.getRow(r);
        return row == null ? sh.getDefaultRowHeightInPoints() : row.getHeightInPoints();
    }

    static Row row(Sheet sh, int r) {
        Row row = sh.getRow(r);
        return row != null ? row : sh.createRow(r);
    }

    static void put(Sheet sh, ShownCell c, Styles styles) {
        Cell cell = row(sh, c.row()).getCell(c.column(), Row.MissingCellPolicy.CREATE_NULL_AS_BLANK);
        if (c.value() instanceof String s) {
            // setCellValue(String) always makes a text cell: a leading '=' is never parsed as a formula
            cell.setCellValue(s);
            cell.setCellStyle(styles.get(c.style(), c.decimals(), Styles.needsQuotePrefix(s)));
        } else if (c.value() instanceof Double d) {
            cell.setCellValue(d);
            cell.setCellStyle(styles.get(c.style(), c.decimals(), false));
        } else {
            cell.setBlank();
            cell.setCellStyle(styles.get(c.style(), c.decimals(), false));
        }
    }

    private void record(XSSFWorkbook wb, ReportInput input, Map<String, Integer> counts, Styles styles) {
        Anchor a = template.anchor(TemplateName.RECORD);
        XSSFSheet sh = wb.getSheet(a.sheet());
        put(sh, new ShownCell(a.row(), a.column(), "Holdpoint sign-off record: do not edit", Style.HEADING, 0, null),
                styles);
        String[] values = RecordSheet.values(input, counts, template.fingerprint());
        for (int i = 0; i < values.length; i++) {
            put(sh, new ShownCell(a.row() + 1 + i, a.column(), RecordSheet.LABELS[i], Style.LABEL, 0, null), styles);
            put(sh, new ShownCell(a.row() + 1 + i, a.column() + 1, values[i], Style.MONO, 0, null), styles);
        }
        List<String> chunks = RecordSheet.chunks(input.studyJson());
        for (int i = 0; i < chunks.size(); i++) {
            int r = a.row() + RecordSheet.FIRST_CHUNK + i;
            put(sh, new ShownCell(r, a.column(), (double) (i + 1), Style.INTEGER, 0, null), styles);
            put(sh, new ShownCell(r, a.column() + 1, chunks.get(i), Style.MONO, 0, null), styles);
        }
        sh.setColumnWidth(a.column(), 24 * 256);
        sh.setColumnWidth(a.column() + 1, 100 * 256);
        sh.protectSheet(TextBlocks.PROTECTION_PASSWORD);
        wb.setSheetHidden(wb.getSheetIndex(sh), true);
    }

    private void pageSetup(XSSFWorkbook wb, ReportInput input) {
        String recordSheet = template.anchor(TemplateName.RECORD).sheet();
        String id = escape(input.study().change().id());
        String title = escape(input.study().change().title());
        for (int i = 0; i < wb.getNumberOfSheets(); i++) {
            XSSFSheet sh = wb.getSheetAt(i);
            if (sh.getSheetName().equals(recordSheet)) {
                continue;
            }
            sh.setFitToPage(true);
            PrintSetup ps = sh.getPrintSetup();
            ps.setFitWidth((short) 1);
            ps.setFitHeight((short) 0);
            String part = escape(input.study().change().partNumber());
            String rev = escape(input.study().change().revision());
            // short enough for a portrait page: who and what on the left, the record in the middle, the page
            sh.getHeader().setLeft("Holdpoint sign-off workbook" + (title.isEmpty() ? "" : " \u00b7 " + title));
            sh.getHeader().setRight(org.apache.poi.hssf.usermodel.HeaderFooter.tab());
            sh.getFooter().setLeft("Change " + id + (part.isEmpty() ? "" : " \u00b7 part " + part
                    + (rev.isEmpty() ? "" : " rev " + rev)));
            sh.getFooter().setCenter("record " + input.sha256().substring(0, 16));
            sh.getFooter().setRight("Page " + org.apache.poi.hssf.usermodel.HeaderFooter.page() + " of "
                    + org.apache.poi.hssf.usermodel.HeaderFooter.numPages());
            sh.protectSheet(TextBlocks.PROTECTION_PASSWORD);
        }
        int summary = wb.getSheetIndex(template.anchor(TemplateName.SUMMARY_TABLE).sheet());
        wb.setActiveSheet(summary);
        wb.setFirstVisibleTab(0);
        wb.lockStructure();
    }

    /** Escapes the header/footer control character {@code &} in user text. */
    static String escape(String text) {
        String t = text.length() > 60 ? text.substring(0, 59) + "\u2026" : text;
        return t.replace("&", "&&");
    }

    private void rawData(SXSSFWorkbook sx, ReportInput input, Styles styles) {
        Anchor a = template.anchor(TemplateName.RAW_DATA);
        Sheet sh = sx.getSheet(a.sheet());
        RawDataRows rows = new RawDataRows(input, a, RecordSheet.LAYOUT);
        while (rows.hasNext()) {
            int r = rows.nextRow();
            ShownCell[] cells = rows.next();
            Row row = sh.createRow(r);
            for (ShownCell c : cells) {
                if (c.value() instanceof String s && s.isEmpty()) {
                    continue;
                }
                Cell cell = row.createCell(c.column());
                if (c.value() instanceof String s) {
                    cell.setCellValue(s);
                    cell.setCellStyle(styles.get(c.style(), c.decimals(), Styles.needsQuotePrefix(s)));
                } else {
                    cell.setCellValue((Double) c.value());
                    cell.setCellStyle(styles.get(c.style(), c.decimals(), false));
                }
            }
        }
    }
}
