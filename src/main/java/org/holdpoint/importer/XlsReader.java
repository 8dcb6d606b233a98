package org.holdpoint.importer;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.apache.poi.EncryptedDocumentException;
import org.apache.poi.hssf.OldExcelFormatException;
import org.apache.poi.hssf.usermodel.HSSFWorkbook;
import org.apache.poi.poifs.filesystem.DirectoryNode;
import org.apache.poi.poifs.filesystem.POIFSFileSystem;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellType;
import org.apache.poi.ss.usermodel.DateUtil;
import org.apache.poi.ss.usermodel.FormulaError;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.ss.util.NumberToTextConverter;

/**
 * Reads one sheet of a binary .xls workbook (.xls, BIFF8) with POI's HSSF, and tells an encrypted
 * (password-protected) workbook in an OLE2 container apart. Numbers become the decimal text a spreadsheet
 * shows for them ({@link NumberToTextConverter}, 15 significant digits), read exactly; formulas give
 * their cached result.
 */
final class XlsReader {
    private XlsReader() {
    }

    /**
     * @param path     the workbook
     * @param name     the file name for messages
     * @param sheet    sheet name or 1-based index, or null for the first sheet holding data
     * @param decimal  decimal separator of numbers stored as text ('.' when null)
     * @param messages receives remarks
     * @return the sheet's cells
     */
    static SheetData read(Path path, String name, String sheet, Character decimal, List<String> messages) {
        try (POIFSFileSystem fs = new POIFSFileSystem(path.toFile(), true)) {
            DirectoryNode root = fs.getRoot();
            if (root.hasEntryCaseInsensitive("EncryptionInfo") || root.hasEntryCaseInsensitive("EncryptedPackage")) {
                throw passwordProtected(name, null);
            }
            if (!root.hasEntryCaseInsensitive("Workbook") && !root.hasEntryCaseInsensitive("Book")) {
                throw new ImportException("file %s is an office document but not a spreadsheet "
                        + "workbook (perhaps a text or other document). Export the data as .xlsx, .xls or .csv", name);
            }
            try (HSSFWorkbook wb = new HSSFWorkbook(root, false)) {
                return readWorkbook(wb, name, sheet, decimal == null ? SheetData.PER_COLUMN : decimal, messages);
            }
        } catch (EncryptedDocumentException e) {
            throw passwordProtected(name, e);
        } catch (OldExcelFormatException e) {
            throw new ImportException(e, "file %s is in an old binary spreadsheet format (from 1995 or earlier) that is not read. "
                    + "Open it and save it as .xlsx", name);
        } catch (IOException | RuntimeException e) {
            if (e instanceof ImportException ie) {
                throw ie;
            }
            throw new ImportException(e, "file %s cannot be read as a spreadsheet workbook: it is damaged or incomplete (%s). "
                    + "Open it in its program and save a fresh copy, or export it again", name, e.getMessage());
        }
    }

    static ImportException passwordProtected(String name, Exception e) {
        return new ImportException(e, "file %s is protected with a password (encrypted), so its cells cannot be read. "
                + "Open it with the password, save a copy without one, and import that copy", name);
    }

    private static SheetData readWorkbook(HSSFWorkbook wb, String name, String wanted, char decimal,
            List<String> messages) {
        List<String> names = new ArrayList<>();
        for (int i = 0; i < wb.getNumberOfSheets(); i++) {
            names.add(wb.getSheetName(i));
        }
        if (wanted != null) {
            int idx = -1;
            for (int i = 0; i < names.size(); i++) {
                if (names.get(i).equalsIgnoreCase(wanted.strip())) {
                    idx = i;
                }
            }
            if (idx < 0 && wanted.strip().matches("\\d{1,4}")) {
                idx = Integer.parseInt(wanted.strip()) - 1;
            }
            if (idx < 0 || idx >= names.size()) {
                throw new ImportException("file %s has no sheet \"%s\"; its sheets are %s. Give a sheet name or its "
                        + "number (1 = first)", name, wanted, String.join(", ", names));
            }
            return readSheet(wb.getSheetAt(idx), name, decimal);
        }
        for (int i = 0; i < names.size(); i++) {
            SheetData d = readSheet(wb.getSheetAt(i), name, decimal);
            if (d.cellCount() > 0) {
                if (i > 0) {
                    messages.add(String.format(Locale.ROOT, "%s: sheet %s read (the first sheet holding data)", name,
                            names.get(i)));
                }
                return d;
            }
        }
        throw new ImportException("file %s holds no data: all its sheets (%s) are empty. Choose the file that holds "
                + "the measurements", name, String.join(", ", names));
    }

    private static SheetData readSheet(Sheet sheet, String name, char decimal) {
        SheetData data = SheetData.forWorkbook(name, sheet.getSheetName(), decimal);
        for (Row row : sheet) {
            int r = row.getRowNum() + 1;
            for (Cell cell : row) {
                int c = cell.getColumnIndex();
                CellType t = cell.getCellType();
                if (t == CellType.FORMULA) {
                    t = cell.getCachedFormulaResultType();
                }
                switch (t) {
                    case NUMERIC -> {
                        if (DateUtil.isCellDateFormatted(cell)) {
                            data.addOther(r, c, CellKind.DATE, String.valueOf(cell.getLocalDateTimeCellValue()));
                        } else {
                            double v = cell.getNumericCellValue();
                            if (!data.addNumberText(r, c, NumberToTextConverter.toText(v))) {
                                data.addDouble(r, c, v);
                            }
                        }
                    }
                    case STRING -> data.addText(r, c, cell.getStringCellValue());
                    case BOOLEAN -> data.addOther(r, c, CellKind.BOOLEAN, cell.getBooleanCellValue() ? "TRUE" : "FALSE");
                    case ERROR -> data.addOther(r, c, CellKind.ERROR, errorText(cell.getErrorCellValue()));
                    default -> {
                    }
                }
            }
        }
        for (CellRangeAddress m : sheet.getMergedRegions()) {
            data.addMerged(m.getFirstRow() + 1, m.getLastRow() + 1, m.getFirstColumn(), m.getLastColumn());
        }
        data.finish();
        return data;
    }

    private static String errorText(byte code) {
        try {
            return FormulaError.forInt(code).getString();
        } catch (IllegalArgumentException e) {
            return "#ERROR(" + code + ")";
        }
    }
}
