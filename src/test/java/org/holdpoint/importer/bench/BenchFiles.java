package org.holdpoint.importer.bench;

import java.io.IOException;
import java.io.OutputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.SplittableRandom;
import org.apache.poi.ss.usermodel.Row;
import org.apache.poi.ss.usermodel.Sheet;
import org.apache.poi.xssf.streaming.SXSSFWorkbook;

/** Generates the benchmark workbooks with a fixed seed, through POI's streaming writer. */
public final class BenchFiles {
    /** The seed of every generated file. */
    public static final long SEED = 20261201L;

    private BenchFiles() {
    }

    /**
     * A stacked workbook: header phase,value; {@code perGroup} before rows then {@code perGroup} after
     * rows, values ≈ 25 ± 0.01 with 4 decimals.
     *
     * @param file     where to write
     * @param perGroup values per group
     * @return the file
     * @throws IOException on write failure
     */
    public static Path stacked(Path file, int perGroup) throws IOException {
        SplittableRandom rnd = new SplittableRandom(SEED);
        try (SXSSFWorkbook wb = new SXSSFWorkbook(null, 1000, true, true)) {
            Sheet sh = wb.createSheet("Measurements");
            Row h = sh.createRow(0);
            h.createCell(0).setCellValue("phase");
            h.createCell(1).setCellValue("value");
            for (int i = 0; i < 2 * perGroup; i++) {
                Row r = sh.createRow(i + 1);
                boolean before = i < perGroup;
                r.createCell(0).setCellValue(before ? "before" : "after");
                double v = 25.0 + (before ? 0 : 0.002) + 0.01 * gaussian(rnd);
                r.createCell(1).setCellValue(Math.round(v * 10_000) / 10_000.0);
            }
            write(wb, file);
        }
        return file;
    }

    /**
     * A wide workbook: header group, c001 … c200; {@code rows} rows, half before and half after.
     *
     * @param file            where to write
     * @param characteristics number of characteristic columns
     * @param rows            number of data rows
     * @return the file
     * @throws IOException on write failure
     */
    public static Path wide(Path file, int characteristics, int rows) throws IOException {
        SplittableRandom rnd = new SplittableRandom(SEED);
        try (SXSSFWorkbook wb = new SXSSFWorkbook(null, 1000, true, true)) {
            Sheet sh = wb.createSheet("Wide");
            Row h = sh.createRow(0);
            h.createCell(0).setCellValue("group");
            for (int c = 0; c < characteristics; c++) {
                h.createCell(c + 1).setCellValue(String.format("c%03d (mm)", c + 1));
            }
            for (int i = 0; i < rows; i++) {
                Row r = sh.createRow(i + 1);
                r.createCell(0).setCellValue(i < rows / 2 ? "before" : "after");
                for (int c = 0; c < characteristics; c++) {
                    double v = 10 + c + 0.05 * gaussian(rnd);
                    r.createCell(c + 1).setCellValue(Math.round(v * 10_000) / 10_000.0);
                }
            }
            write(wb, file);
        }
        return file;
    }

    /**
     * A wide CSV for the full battery: header group, c001 (mm) … ; {@code rows} rows, half before and half after,
     * values ≈ 10 + c ± 0.05 with 4 decimals (the after half shifted by 0.002).
     *
     * @param file            where to write
     * @param characteristics number of characteristic columns
     * @param rows            number of data rows
     * @return the file
     * @throws IOException on write failure
     */
    public static Path wideCsv(Path file, int characteristics, int rows) throws IOException {
        SplittableRandom rnd = new SplittableRandom(SEED);
        StringBuilder sb = new StringBuilder("group");
        for (int c = 0; c < characteristics; c++) {
            sb.append(String.format(",c%03d (mm)", c + 1));
        }
        sb.append('\n');
        for (int i = 0; i < rows; i++) {
            boolean before = i < rows / 2;
            sb.append(before ? "before" : "after");
            for (int c = 0; c < characteristics; c++) {
                double v = 10 + c + (before ? 0 : 0.002) + 0.05 * gaussian(rnd);
                sb.append(',').append(java.math.BigDecimal.valueOf(Math.round(v * 10_000), 4).toPlainString());
            }
            sb.append('\n');
        }
        Path tmp = file.resolveSibling(file.getFileName() + ".tmp");
        Files.writeString(tmp, sb);
        Files.move(tmp, file, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
        return file;
    }

    /**
     * Writes the files of the whole-process benchmark (docs/performance.md) into a folder: battery-200.csv (200
     * characteristics, 500 + 500 rows) and million.xlsx (stacked, 500,000 + 500,000 values).
     *
     * @param args the folder
     * @throws IOException on write failure
     */
    public static void main(String[] args) throws IOException {
        Path dir = Path.of(args.length > 0 ? args[0] : "target/bench");
        Files.createDirectories(dir);
        wideCsv(dir.resolve("battery-200.csv"), 200, 1000);
        stacked(dir.resolve("million.xlsx"), 500_000);
        System.out.println("wrote " + dir.resolve("battery-200.csv") + " and " + dir.resolve("million.xlsx"));
    }

    private static void write(SXSSFWorkbook wb, Path file) throws IOException {
        Path tmp = file.resolveSibling(file.getFileName() + ".tmp");
        try (OutputStream out = Files.newOutputStream(tmp)) {
            wb.write(out);
        }
        Files.move(tmp, file, java.nio.file.StandardCopyOption.REPLACE_EXISTING);
    }

    /** Standard normal by the Box–Muller transform. */
    private static double gaussian(SplittableRandom rnd) {
        double u = 1 - rnd.nextDouble();
        double v = rnd.nextDouble();
        return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
    }
}
