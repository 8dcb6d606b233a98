package org.holdpoint.importer;

import java.io.IOException;
import java.io.OutputStream;
import java.io.UncheckedIOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.List;
import org.apache.poi.hssf.usermodel.HSSFWorkbook;
import org.apache.poi.ss.usermodel.Cell;
import org.apache.poi.ss.usermodel.CellStyle;
import org.apache.poi.ss.usermodel.FormulaError;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.ss.usermodel.Workbook;
import org.apache.poi.ss.util.CellRangeAddress;
import org.apache.poi.xssf.usermodel.XSSFWorkbook;

/** Writes small test workbooks (POI's object model is fine for writing test files). */
public final class Workbooks {
    private Workbooks() {
    }

    /** A cell holding a spreadsheet error value. */
    public record Err(FormulaError error) {
    }

    /** A formula; {@code evaluate} stores its cached result. */
    public record Formula(String text) {
    }

    /** A merged range to add to a sheet, 0-based. */
    public record Merge(int firstRow, int lastRow, int firstCol, int lastCol) {
    }

    /** One sheet: its name, its rows (null = empty row, null cell = blank), merged ranges. */
    public record SheetSpec(String name, List<Object[]> rows, List<Merge> merges) {
        public SheetSpec(String name, List<Object[]> rows) {
            this(name, rows, List.of());
        }
    }

    public static Path xlsx(Path file, boolean evaluate, SheetSpec... sheets) {
        return write(new XSSFWorkbook(), file, evaluate, sheets);
    }

    public static Path xls(Path file, boolean evaluate, SheetSpec... sheets) {
        return write(new HSSFWorkbook(), file, evaluate, sheets);
    }

    public static Path xlsx(Path file, Object[]... rows) {
        return xlsx(file, true, new SheetSpec("Data", java.util.Arrays.asList(rows)));
    }

    public static Path xls(Path file, Object[]... rows) {
        return xls(file, true, new SheetSpec("Data", java.util.Arrays.asList(rows)));
    }

    public static Object[] row(Object... cells) {
        return cells;
    }

    private static Path write(Workbook wb, Path file, boolean evaluate, SheetSpec... sheets) {
        try (wb) {
            CellStyle date = wb.createCellStyle();
            date.setDataFormat(wb.getCreationHelper().createDataFormat().getFormat("yyyy-mm-dd"));
            for (SheetSpec spec : sheets) {
                Sheet sh = wb.createSheet(spec.name());
                for (int r = 0; r < spec.rows().size(); r++) {
                    Object[] cells = spec.rows().get(r);
                    if (cells == null) {
                        continue;
                    }
                    Row row = sh.createRow(r);
                    for (int c = 0; c < cells.length; c++) {
                        Object v = cells[c];
                        if (v == null) {
                            continue;
                        }
                        Cell cell = row.createCell(c);
                        if (v instanceof String s) {
                            cell.setCellValue(s);
                        } else if (v instanceof Number n) {
                            cell.setCellValue(n.doubleValue());
                        } else if (v instanceof Boolean b) {
                            cell.setCellValue(b);
                        } else if (v instanceof LocalDate d) {
                            cell.setCellValue(d);
                            cell.setCellStyle(date);
                        } else if (v instanceof Err e) {
                            cell.setCellErrorValue(e.error().getCode());
                        } else if (v instanceof Formula f) {
                            cell.setCellFormula(f.text());
                        } else if (v instanceof CellStyle) {
                            cell.setBlank();
                        } else {
                            throw new IllegalArgumentException("cell type " + v.getClass());
                        }
                    }
                }
                for (Merge m : spec.merges()) {
                    sh.addMergedRegion(new CellRangeAddress(m.firstRow(), m.lastRow(), m.firstCol(), m.lastCol()));
                }
            }
            if (evaluate) {
                wb.getCreationHelper().createFormulaEvaluator().evaluateAll();
            }
            try (OutputStream out = Files.newOutputStream(file)) {
                wb.write(out);
            }
            return file;
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
