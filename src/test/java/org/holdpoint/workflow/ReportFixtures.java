package org.holdpoint.workflow;

import java.awt.Color;
import java.awt.Graphics2D;
import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import javax.imageio.ImageIO;
import org.holdpoint.report.NamedImage;
import org.holdpoint.stats.Sample;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.ChangeDescription;
import org.holdpoint.study.ChangeKind;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.GroupData;
import org.holdpoint.study.ImportReport;
import org.holdpoint.study.InputInfo;
import org.holdpoint.study.Layout;
import org.holdpoint.study.MarginSpec;
import org.holdpoint.study.Origin;
import org.holdpoint.study.SkipReason;
import org.holdpoint.study.SkippedCell;
import org.holdpoint.study.SpecLimits;
import org.holdpoint.result.StudyResult;

/** A small invented change study (a new honing stone for a valve body), built in code for the report tests. */
final class ReportFixtures {
    static final String[] BORE_BEFORE = {"25.0102", "25.0111", "25.0098", "25.0105", "25.0120", "25.0093", "25.0108",
        "25.0101", "25.0114", "25.0099", "25.0106", "25.0110"};
    static final String[] BORE_AFTER = {"25.0104", "25.0115", "25.0101", "25.0097", "25.0112", "25.0108", "25.0103",
        "25.0117", "25.0100", "25.0109", "25.0106", "25.0113"};
    static final String[] WALL_BEFORE = {"2.512", "2.498", "2.505", "2.489", "2.517", "2.501", "2.494", "2.508",
        "2.503", "2.499"};
    static final String[] WALL_AFTER = {"2.521", "2.509", "2.515", "2.502", "2.526", "2.511", "2.507", "2.518",
        "2.512", "2.510"};
    static final String[] TORQUE_BEFORE = {"12.1", "11.8", "12.4", "12.0", "11.9", "12.3", "12.2", "11.7"};
    static final String[] TORQUE_AFTER = {"12.5", "12.2", "12.6", "12.3", "12.4", "12.8", "12.1", "12.6"};

    private ReportFixtures() {
    }

    static ChangeStudy study() {
        return study("Bore diameter");
    }

    static ChangeStudy study(String firstName) {
        return study(firstName, Integer.MAX_VALUE);
    }

    /**
     * @param firstName the name of the first characteristic
     * @param perGroup  at most this many values per group
     * @return the study
     */
    static ChangeStudy study(String firstName, int perGroup) {
        List<CharacteristicData> chars = new ArrayList<>();
        int[] row = {2};
        chars.add(characteristic(firstName, "mm", first(BORE_BEFORE, perGroup), first(BORE_AFTER, perGroup), row));
        chars.add(characteristic("Wall thickness", "mm", first(WALL_BEFORE, perGroup), first(WALL_AFTER, perGroup),
                row));
        chars.add(characteristic("Tightening torque", "N m", first(TORQUE_BEFORE, perGroup), first(TORQUE_AFTER,
                perGroup), row));
        Map<SkipReason, Long> skips = new EnumMap<>(SkipReason.class);
        skips.put(SkipReason.TEXT, 1L);
        ImportReport report = new ImportReport(60, skips, List.of(new SkippedCell(new Origin("honing-trial.csv", null,
                70, 4), SkipReason.TEXT, "n/a")), List.of("layout detected: stacked"));
        Dataset data = new Dataset(chars, List.of(new InputInfo("honing-trial.csv",
                "0f".repeat(32), null, Layout.STACKED, "data")), report);
        Map<String, CharacteristicSettings> per = new LinkedHashMap<>();
        per.put(firstName, new CharacteristicSettings("mm", new SpecLimits(25.000, 25.0105, 25.021),
                new MarginSpec(MarginSpec.Kind.ABSOLUTE, -0.002, 0.002), 1.5, null, null));
        per.put("Wall thickness", new CharacteristicSettings("mm", new SpecLimits(2.40, 2.50, 2.60),
                new MarginSpec(MarginSpec.Kind.PERCENT_OF_TOLERANCE, 10.0, 10.0), null, null, null));
        AnalysisSettings settings = new AnalysisSettings(0.05, false, false, null, per, null, List.of());
        ChangeDescription change = new ChangeDescription("CR-2026-0117", "New honing stone supplier for valve body "
                + "bore", ChangeKind.SUPPLIER, "VB-4410", "C", "second source for the honing stones",
                "M. Okafor (process engineering)", "2026-10-05", "2026-11-20");
        return new ChangeStudy(change, data, settings, List.of());
    }

    /**
     * The fixture with one far value in the wall thickness after the change (row 32 of the file) and the torque
     * measured twice on the same eight units (paired).
     *
     * @return the study
     */
    static ChangeStudy pairedWithOutlier() {
        ChangeStudy s = study();
        List<CharacteristicData> chars = new ArrayList<>(s.data().characteristics());
        int[] row = {2};
        String[] wallAfter = WALL_AFTER.clone();
        wallAfter[wallAfter.length - 1] = "2.611";
        chars.set(1, characteristic("Wall thickness", "mm", WALL_BEFORE, wallAfter, new int[] {25}));
        GroupData before = group(TORQUE_BEFORE, new int[] {45}, 45);
        GroupData after = group(TORQUE_AFTER, new int[] {53}, 45);
        chars.set(2, new CharacteristicData("Tightening torque", "N m", before, after, true, List.of()));
        Dataset d = new Dataset(chars, s.data().inputs(), s.data().report());
        return new ChangeStudy(s.change(), d, s.settings(), s.signatures());
    }

    /**
     * The fixture with the bore measured in run order, in subgroups of three from two lots per group.
     *
     * @return the study
     */
    static ChangeStudy withOrder() {
        ChangeStudy s = study();
        List<CharacteristicData> chars = new ArrayList<>(s.data().characteristics());
        chars.set(0, new CharacteristicData(chars.get(0).name(), "mm", ordered(BORE_BEFORE, 2, "B"),
                ordered(BORE_AFTER, 14, "A"), false, List.of()));
        Dataset d = new Dataset(chars, s.data().inputs(), s.data().report());
        return new ChangeStudy(s.change(), d, s.settings(), s.signatures());
    }

    private static GroupData ordered(String[] values, int firstRow, String prefix) {
        int n = values.length;
        int[] rows = new int[n];
        int[] cols = new int[n];
        String[] units = new String[n];
        String[] lots = new String[n];
        String[] subgroups = new String[n];
        String[] sequence = new String[n];
        for (int i = 0; i < n; i++) {
            rows[i] = firstRow + i;
            cols[i] = 4;
            units[i] = String.format(java.util.Locale.ROOT, "VB-%04d", rows[i]);
            lots[i] = prefix + "-LOT-" + (i < n / 2 ? 1 : 2);
            subgroups[i] = prefix + "-SG-" + (i / 3 + 1);
            sequence[i] = Integer.toString(i + 1);
        }
        return new GroupData(Sample.ofDecimals(values), "honing-trial.csv", null, rows, cols, units, lots, subgroups,
                sequence);
    }

    private static String[] first(String[] values, int n) {
        return java.util.Arrays.copyOf(values, Math.min(n, values.length));
    }

    private static CharacteristicData characteristic(String name, String unit, String[] before, String[] after,
            int[] row) {
        return new CharacteristicData(name, unit, group(before, row), group(after, row), false, List.of());
    }

    private static GroupData group(String[] values, int[] row) {
        return group(values, row, -1);
    }

    /** @param unitBase the first unit number, or -1 to number the units by their rows */
    private static GroupData group(String[] values, int[] row, int unitBase) {
        int n = values.length;
        int[] rows = new int[n];
        int[] cols = new int[n];
        String[] units = new String[n];
        for (int i = 0; i < n; i++) {
            rows[i] = row[0]++;
            cols[i] = 4;
            units[i] = String.format(java.util.Locale.ROOT, "VB-%04d", unitBase < 0 ? rows[i] : unitBase + i);
        }
        return new GroupData(Sample.ofDecimals(values), "honing-trial.csv", null, rows, cols, units, null, null,
                null);
    }

    static StudyResult analyze(ChangeStudy s) {
        return new StudyAnalyzer().analyze(s.data(), s.settings(), org.holdpoint.study.Progress.NONE);
    }

    /** Two charts per characteristic, drawn with plain AWT (stand-ins for the chart package's PNGs). */
    static ChartSource charts() {
        return (study, result) -> {
            Map<String, List<NamedImage>> m = new LinkedHashMap<>();
            for (var c : result.characteristics()) {
                m.put(c.name(), List.of(NamedImage.of("Box plot, before and after", png(800, 600, Color.DARK_GRAY)),
                        NamedImage.of("Values in run order", png(800, 600, Color.GRAY))));
            }
            return m;
        };
    }

    static byte[] png(int w, int h, Color colour) {
        BufferedImage img = new BufferedImage(w, h, BufferedImage.TYPE_INT_RGB);
        Graphics2D g = img.createGraphics();
        g.setColor(Color.WHITE);
        g.fillRect(0, 0, w, h);
        g.setColor(colour);
        g.drawRect(10, 10, w - 21, h - 21);
        g.fillRect(w / 4, h / 3, w / 6, h / 3);
        g.fillRect(w * 7 / 12, h / 4, w / 6, h / 3);
        g.dispose();
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        try {
            ImageIO.write(img, "png", out);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toByteArray();
    }
}
