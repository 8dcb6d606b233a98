package org.holdpoint.importer;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Random;
import org.holdpoint.importer.Workbooks.Merge;
import org.holdpoint.importer.Workbooks.SheetSpec;

/**
 * Measuring-machine exports of an invented injection-moulded sensor housing (SH-220), before and after a
 * resin supplier change: two title rows, a merged band row ("Traceability", "Dimensions", "Form",
 * "Process"), the header, a units row, trace columns (part serial, resin lot, cavity, measurement date),
 * text cells "n/a" and "OOT", a wall thickness constant at 1.5 and a mould temperature constant at 85.
 */
public final class ShopFloorFiles {
    private ShopFloorFiles() {
    }

    private static List<Object[]> housingRows(String phase, int n, int firstSerial, double shift, Random rnd,
            int extraTitleRows) {
        List<Object[]> rows = new ArrayList<>();
        rows.add(Workbooks.row("Dimensional report - sensor housing SH-220 rev C"));
        rows.add(Workbooks.row("Exported by the line 3 measuring machine"));
        for (int i = 0; i < extraTitleRows; i++) {
            rows.add(Workbooks.row("Operator note: probe recalibrated"));
        }
        rows.add(Workbooks.row("Traceability", null, null, null, null, "Dimensions", null, null, null, "Form", null,
                "Process"));
        rows.add(Workbooks.row("Part serial", "Resin lot", "Cavity", "Meas. date", "Phase", "Overall length", "Width",
                "Pin hole dia", "Weight", "Flatness", "Wall thickness", "Mould temp"));
        rows.add(Workbooks.row(null, null, null, null, null, "mm", "mm", "mm", "g", "mm", "mm", "°C"));
        for (int k = 0; k < n; k++) {
            rows.add(Workbooks.row(String.format(Locale.ROOT, "SH%05d", firstSerial + k),
                    phase.equals("before") ? "R-2291" : "V-0317", (double) (1 + k % 4),
                    LocalDate.of(2026, 11, 2).plusDays(k), phase,
                    Math.round((42 + shift + 0.008 * rnd.nextGaussian()) * 1000) / 1000.0,
                    k == n - 3 ? "n/a" : Math.round((18.5 + 0.006 * rnd.nextGaussian()) * 1000) / 1000.0,
                    Math.round((3.2 + 0.004 * rnd.nextGaussian()) * 1000) / 1000.0,
                    k == n - 5 ? "OOT" : Math.round((12.4 + 0.05 * rnd.nextGaussian()) * 100) / 100.0,
                    Math.round(Math.exp(-3.6 + 0.35 * rnd.nextGaussian()) * 1000) / 1000.0, 1.5, 85.0));
        }
        return rows;
    }

    /**
     * Writes one export.
     *
     * @param file           the workbook to write
     * @param phase          "before" or "after" (the Phase column)
     * @param firstSerial    the first part serial number
     * @param shift          the shift of the overall length's mean
     * @param extraTitleRows title rows beyond the usual two (moves the header down)
     * @param seed           the random seed
     * @return the file
     */
    public static Path housing(Path file, String phase, int firstSerial, double shift, int extraTitleRows, long seed) {
        int band = 2 + extraTitleRows;
        return Workbooks.xlsx(file, true, new SheetSpec("CMM export", housingRows(phase, 30, firstSerial, shift,
                new Random(seed), extraTitleRows), List.of(new Merge(band, band, 0, 4), new Merge(band, band, 5, 8),
                        new Merge(band, band, 9, 10))));
    }

}
