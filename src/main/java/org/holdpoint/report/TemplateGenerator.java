package org.holdpoint.report;

import java.io.ByteArrayInputStream;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.Date;
import java.util.Optional;
import java.util.zip.ZipEntry;
import java.util.zip.ZipInputStream;
import java.util.zip.ZipOutputStream;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.Font;
import org.apache.poi.ss.usermodel.IndexedColors;
import org.apache.poi.ss.usermodel.Name;
import org.apache.poi.ss.usermodel.PrintSetup;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/**
 * Builds the default sign-off template, byte for byte the same on every run (fixed document dates and
 * zip entry times), so that templates/holdpoint-default.xlsx can be regenerated and compared:
 * {@code java -cp holdpoint.jar org.holdpoint.report.TemplateGenerator templates/holdpoint-default.xlsx}.
 */
public final class TemplateGenerator {
    /** The fixed time stamp of every part and of the document properties: 2026-01-01T00:00:00Z. */
    static final long FIXED_TIME = 1_767_225_600_000L;
    static final String SUMMARY = "Summary";
    static final String SIGN_OFF = "Sign-off";
    static final String DETAILS = "Details";
    static final String METHOD = "Method";
    static final String IMPORT = "Import report";
    static final String CAUTIONS = "Cautions";
    static final String RAW = "Raw data";
    static final String RECORD = "Record";

    private TemplateGenerator() {
    }

    /**
     * Writes the default template.
     *
     * @param args the target file (default templates/holdpoint-default.xlsx)
     * @throws IOException when it cannot be written
     */
    public static void main(String[] args) throws IOException {
        Path target = Path.of(args.length > 0 ? args[0] : "templates/holdpoint-default.xlsx");
        org.holdpoint.files.AtomicFiles.writeBytes(target, build());
        System.out.println("wrote " + target);
    }

    /** @return the default template's bytes, identical on every call */
    public static byte[] build() {
        try (XSSFWorkbook wb = new XSSFWorkbook()) {
            // the default font sets the unit of column widths: measure them in the font the report uses
            Font base = wb.getFontAt(0);
            base.setFontName(Styles.FONT);
            base.setFontHeightInPoints((short) 9);
            summary(wb);
            for (String name : new String[] {SIGN_OFF, DETAILS, METHOD, IMPORT, CAUTIONS, RAW, RECORD}) {
                Sheet sh = wb.createSheet(name);
                page(sh, name.equals(RAW));
            }
            name(wb, TemplateName.SIGN_OFF, SIGN_OFF, "$A$1");
            name(wb, TemplateName.DETAILS, DETAILS, "$A$1");
            name(wb, TemplateName.METHOD, METHOD, "$A$1");
            name(wb, TemplateName.IMPORT_REPORT, IMPORT, "$A$1");
            name(wb, TemplateName.CAUTIONS, CAUTIONS, "$A$1");
            name(wb, TemplateName.RAW_DATA, RAW, "$A$1");
            name(wb, TemplateName.RECORD, RECORD, "$A$1");
            var core = wb.getProperties().getCoreProperties();
            core.setCreated(Optional.of(new Date(FIXED_TIME)));
            core.setModified(Optional.of(new Date(FIXED_TIME)));
            core.setCreator("Holdpoint");
            core.setTitle("Holdpoint sign-off workbook template");
            ByteArrayOutputStream out = new ByteArrayOutputStream();
            wb.write(out);
            return normalise(out.toByteArray());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void summary(XSSFWorkbook wb) {
        Sheet sh = wb.createSheet(SUMMARY);
        page(sh, true);
        Font titleFont = wb.createFont();
        titleFont.setFontName(Styles.FONT);
        titleFont.setFontHeightInPoints((short) 18);
        titleFont.setBold(true);
        CellStyle title = wb.createCellStyle();
        title.setFont(titleFont);
        Font labelFont = wb.createFont();
        labelFont.setFontName(Styles.FONT);
        labelFont.setFontHeightInPoints((short) 9);
        labelFont.setBold(true);
        labelFont.setColor(IndexedColors.GREY_80_PERCENT.getIndex());
        CellStyle label = wb.createCellStyle();
        label.setFont(labelFont);
        Font subFont = wb.createFont();
        subFont.setFontName(Styles.FONT);
        subFont.setFontHeightInPoints((short) 10);
        subFont.setColor(IndexedColors.GREY_80_PERCENT.getIndex());
        CellStyle sub = wb.createCellStyle();
        sub.setFont(subFont);
        text(sh, 0, 1, "Process change sign-off", title);
        sh.getRow(0).setHeightInPoints(26);
        text(sh, 1, 1, "Are the parts made after the change the same as before? One row per characteristic; "
                + "the details, method, raw data and cautions follow on the other sheets.", sub);
        String[][] left = {{"Change id", "C", "HP_ChangeId"}, {"Title", "C", "HP_Title"},
            {"Kind of change", "C", "HP_Kind"}, {"Reason", "C", "HP_Reason"},
            {"Workbook written", "C", "HP_GeneratedAt"}};
        String[][] right = {{"Part number", "O", "HP_PartNumber"}, {"Revision", "O", "HP_Revision"},
            {"Requested by", "O", "HP_Requester"}, {"Request date", "O", "HP_RequestDate"},
            {"Study date", "O", "HP_StudyDate"}};
        for (int i = 0; i < left.length; i++) {
            text(sh, 3 + i, 1, left[i][0], label);
            text(sh, 3 + i, 12, right[i][0], label);
            nameOf(wb, left[i][2], SUMMARY, "$" + left[i][1] + "$" + (4 + i));
            nameOf(wb, right[i][2], SUMMARY, "$" + right[i][1] + "$" + (4 + i));
        }
        sh.createRow(9).setHeightInPoints(24);
        text(sh, 9, 1, "Overall verdict", label);
        name(wb, TemplateName.OVERALL_MARK, SUMMARY, "$C$10");
        name(wb, TemplateName.OVERALL_VERDICT, SUMMARY, "$D$10");
        name(wb, TemplateName.OVERALL_DETAIL, SUMMARY, "$D$11");
        text(sh, 11, 1, "Study record", label);
        name(wb, TemplateName.RECORD_HASH, SUMMARY, "$D$12");
        name(wb, TemplateName.SUMMARY_TABLE, SUMMARY, "$A$14");
        sh.createFreezePane(2, 14);
    }

    private static void text(Sheet sh, int r, int c, String text, CellStyle style) {
        Row row = sh.getRow(r) != null ? sh.getRow(r) : sh.createRow(r);
        var cell = row.createCell(c);
        cell.setCellValue(text);
        cell.setCellStyle(style);
    }

    private static void page(Sheet sh, boolean landscape) {
        PrintSetup ps = sh.getPrintSetup();
        ps.setPaperSize(PrintSetup.A4_PAPERSIZE);
        ps.setLandscape(landscape);
        sh.setMargin(org.apache.poi.ss.usermodel.PageMargin.LEFT, 0.6);
        sh.setMargin(org.apache.poi.ss.usermodel.PageMargin.RIGHT, 0.6);
        sh.setMargin(org.apache.poi.ss.usermodel.PageMargin.TOP, 0.8);
        sh.setMargin(org.apache.poi.ss.usermodel.PageMargin.BOTTOM, 0.8);
        sh.setMargin(org.apache.poi.ss.usermodel.PageMargin.HEADER, 0.3);
        sh.setMargin(org.apache.poi.ss.usermodel.PageMargin.FOOTER, 0.3);
        sh.setHorizontallyCenter(true);
        sh.setDisplayGridlines(false);
        sh.setPrintGridlines(false);
        sh.setDefaultRowHeightInPoints(12.75f);
    }

    private static void name(XSSFWorkbook wb, TemplateName t, String sheet, String cell) {
        nameOf(wb, t.definedName(), sheet, cell);
    }

    private static void nameOf(XSSFWorkbook wb, String name, String sheet, String cell) {
        Name n = wb.createName();
        n.setNameName(name);
        n.setRefersToFormula("'" + sheet + "'!" + cell);
    }

    /** Rewrites the zip with fixed entry times, so the bytes do not depend on the clock. */
    static byte[] normalise(byte[] zip) throws IOException {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try (ZipInputStream in = new ZipInputStream(new ByteArrayInputStream(zip));
                ZipOutputStream z = new ZipOutputStream(out)) {
            ZipEntry e;
            while ((e = in.getNextEntry()) != null) {
                ZipEntry copy = new ZipEntry(e.getName());
                copy.setTime(FIXED_TIME);
                z.putNextEntry(copy);
                in.transferTo(z);
                z.closeEntry();
            }
        }
        return out.toByteArray();
    }
}
