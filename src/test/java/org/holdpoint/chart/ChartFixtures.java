package org.holdpoint.chart;

import java.util.ArrayList;
import java.util.List;
import java.util.SplittableRandom;
import org.holdpoint.stats.Descriptives;
import org.holdpoint.stats.EquivalenceResult;
import org.holdpoint.stats.EquivalenceTest;
import org.holdpoint.stats.LocationMethod;
import org.holdpoint.stats.Margin;
import org.holdpoint.stats.Sample;
import org.holdpoint.stats.TTest;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.GroupData;
import org.holdpoint.study.MarginSpec;
import org.holdpoint.study.SpecLimits;
import org.holdpoint.result.StudyResult;
import org.holdpoint.result.Verdict;

/**
 * An invented change study (a turned shaft after a new cutting insert) for rendering checks. The values are
 * seeded pseudo-random numbers; no numeric check relies on them.
 */
final class ChartFixtures {
    private ChartFixtures() {
    }

    /** One invented characteristic: its data and its analysis. */
    record Item(CharacteristicData data, CharacteristicResult result) {
    }

    /** The five characteristics of the demo study, in order. */
    static List<Item> demo() {
        List<Item> items = new ArrayList<>();
        SplittableRandom rnd = new SplittableRandom(42);
        double[] boreBefore = normal(rnd, 30, 12.000, 0.008, 4);
        double[] boreAfter = normal(rnd, 30, 12.002, 0.008, 4);
        boreAfter[5] = 12.031;   // two outliers, close together, so a renderer merging markers would show one
        boreAfter[17] = 12.0305;
        boreBefore[11] = 11.972;
        items.add(item("Bore diameter \u00d8 12 H7", "mm", boreBefore, boreAfter,
                new SpecLimits(11.95, 12.0, 12.05), new MarginSpec(MarginSpec.Kind.ABSOLUTE, -0.006, 0.006)));
        items.add(item("Wall thickness", "mm", normal(rnd, 25, 2.50, 0.02, 3), normal(rnd, 25, 2.56, 0.02, 3),
                new SpecLimits(2.40, 2.50, 2.60), new MarginSpec(MarginSpec.Kind.ABSOLUTE, -0.03, 0.03)));
        items.add(item("Tightening torque", "N\u00b7m", normal(rnd, 8, 24.0, 0.9, 2), normal(rnd, 8, 24.3, 0.9, 2),
                new SpecLimits(21.0, null, 27.0), new MarginSpec(MarginSpec.Kind.ABSOLUTE, -0.5, 1.0)));
        items.add(item("Hardness", "HRC", normal(rnd, 400, 58.0, 0.6, 1), normal(rnd, 400, 58.1, 0.6, 1),
                new SpecLimits(56.0, null, null), new MarginSpec(MarginSpec.Kind.ABSOLUTE, -0.4, null)));
        items.add(item("Surface roughness Ra / flank", "\u00b5m", normal(rnd, 20, 0.80, 0.05, 3),
                normal(rnd, 20, 0.78, 0.05, 3), new SpecLimits(null, null, 1.6), null));
        return items;
    }

    static StudyResult study(List<Item> items) {
        List<CharacteristicResult> results = items.stream().map(Item::result).toList();
        List<String> failing = results.stream().filter(r -> r.verdict().status() != Verdict.Status.PASSED)
                .map(r -> r.name() + ": " + r.verdict().status().words()).toList();
        return new StudyResult(results, failing.isEmpty(), failing.isEmpty() ? "change verified"
                : "change not verified", failing);
    }

    static List<CharacteristicData> data(List<Item> items) {
        return items.stream().map(Item::data).toList();
    }

    static double[] normal(SplittableRandom rnd, int n, double mean, double sd, int decimals) {
        double f = Math.pow(10, decimals);
        double[] x = new double[n];
        for (int i = 0; i < n; i++) {
            x[i] = Math.round((mean + sd * rnd.nextGaussian()) * f) / f;
        }
        return x;
    }

    static Item item(String name, String unit, double[] before, double[] after, SpecLimits spec, MarginSpec margin) {
        Sample b = Sample.of(before);
        Sample a = Sample.of(after);
        CharacteristicData data = new CharacteristicData(name, unit, GroupData.typed(b, "before.csv"),
                GroupData.typed(a, "after.csv"), false, List.of());
        Margin m = margin == null ? null : margin.resolve(spec);
        EquivalenceResult tost = m == null ? null : EquivalenceTest.withDefaults().withMargin(m).test(b, a);
        Verdict verdict = new Verdict(tost == null ? Verdict.Status.NOT_ASSESSED
                : switch (tost.conclusion()) {
                    case EQUIVALENT, NON_INFERIOR, NON_SUPERIOR -> Verdict.Status.PASSED;
                    case INCONCLUSIVE -> Verdict.Status.INCONCLUSIVE;
                    default -> Verdict.Status.FAILED;
                }, List.of());
        CharacteristicSettings settings = new CharacteristicSettings(unit, spec, margin, null, null, false);
        CharacteristicResult result = CharacteristicResult.builder(name, unit, settings, false, LocationMethod.WELCH)
                .margin(m).descriptives(Descriptives.of(b), Descriptives.of(a))
                .location(new CharacteristicResult.LocationTests(TTest.withDefaults().test(b, a), null, null, tost, null))
                .verdict(verdict).build();
        return new Item(data, result);
    }
}
