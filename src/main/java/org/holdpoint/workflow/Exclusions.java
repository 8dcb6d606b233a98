package org.holdpoint.workflow;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.Exclusion;
import org.holdpoint.study.GroupData;
import org.holdpoint.study.NameKeys;
import org.holdpoint.study.Origin;
import org.holdpoint.result.Format;

/**
 * Applies the user's exclusions (by cell, each with a mandatory reason) to one characteristic. In a
 * paired design excluding either value of a unit excludes the pair.
 */
final class Exclusions {
    private Exclusions() {
    }

    record Applied(CharacteristicData data, List<String> notes, List<Exclusion> used) {
    }

    /**
     * One value an exclusion removed.
     *
     * @param exclusion      the exclusion
     * @param characteristic the characteristic the value belongs to
     * @param before         whether it is a before value
     * @param origin         where it was read
     * @param value          the value
     */
    record Hit(Exclusion exclusion, String characteristic, boolean before, Origin origin, double value) {
    }

    /**
     * Every value the exclusions name, in the order of the exclusions.
     *
     * @param data       the imported data
     * @param exclusions the exclusions
     * @return the values they remove
     */
    static List<Hit> hits(Dataset data, List<Exclusion> exclusions) {
        List<Hit> out = new ArrayList<>();
        for (Exclusion e : exclusions) {
            out.addAll(hits(data, e));
        }
        return out;
    }

    private static List<Hit> hits(Dataset data, Exclusion e) {
        List<Hit> out = new ArrayList<>();
        for (CharacteristicData c : data.characteristics()) {
            if (!concerns(e, c)) {
                continue;
            }
            for (int g = 0; g < 2; g++) {
                GroupData d = g == 0 ? c.before() : c.after();
                for (int i = 0; i < d.size(); i++) {
                    if (e.matches(d.origin(i), g == 0)) {
                        out.add(new Hit(e, c.name(), g == 0, d.origin(i), d.sample().value(i)));
                    }
                }
            }
        }
        return out;
    }

    /**
     * The user's exclusions checked against the data before anything is analysed: each must name a
     * value that is used, and a cell named without before: or after: must not hold a value in both
     * files.
     *
     * @param data       the imported data
     * @param exclusions the exclusions
     * @return one message per exclusion that cannot be applied as written (empty when all can)
     */
    static List<String> problems(Dataset data, List<Exclusion> exclusions) {
        List<String> out = new ArrayList<>();
        for (Exclusion e : exclusions) {
            List<Hit> hits = hits(data, e);
            String ref = e.reference();
            if (hits.isEmpty()) {
                out.add(String.format(Locale.ROOT, "exclusion %s=%s: no value used in the analysis%s is at %s%s. "
                        + "Give the cell of a value that was read (the import report and the workbook's raw data "
                        + "list every value with its file, sheet and cell)", ref, e.reason(),
                        e.characteristic() == null ? "" : " of \"" + e.characteristic() + "\"", ref,
                        e.group() == null ? "" : " in the " + e.group().label() + " group"));
                continue;
            }
            if (e.group() == null && hits.stream().anyMatch(Hit::before) && hits.stream().anyMatch(h -> !h.before())) {
                Hit b = hits.stream().filter(Hit::before).findFirst().orElseThrow();
                Hit a = hits.stream().filter(h -> !h.before()).findFirst().orElseThrow();
                out.add(String.format(Locale.ROOT, "exclusion %s=%s: %s is in both files (before: %s; after: %s): "
                        + "write before:%s or after:%s", ref, e.reason(), e.cell(), b.origin().describe(),
                        a.origin().describe(), e.cell(), e.cell()));
            }
        }
        return out;
    }

    private static boolean concerns(Exclusion e, CharacteristicData c) {
        return e.characteristic() == null || NameKeys.key(e.characteristic()).equals(NameKeys.key(c.name()));
    }

    static Applied apply(CharacteristicData c, List<Exclusion> exclusions) {
        List<Exclusion> mine = new ArrayList<>();
        for (Exclusion e : exclusions) {
            if (concerns(e, c)) {
                mine.add(e);
            }
        }
        if (mine.isEmpty()) {
            return new Applied(c, List.of(), List.of());
        }
        List<Integer> dropBefore = new ArrayList<>();
        List<Integer> dropAfter = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        List<Exclusion> used = new ArrayList<>();
        for (Exclusion e : mine) {
            boolean hit = false;
            for (int i = 0; i < c.before().size(); i++) {
                if (e.matches(c.before().origin(i), true)) {
                    dropBefore.add(i);
                    if (c.paired()) {
                        dropAfter.add(i);
                    }
                    notes.add(note("before", c.before(), i, e));
                    hit = true;
                }
            }
            for (int i = 0; i < c.after().size(); i++) {
                if (e.matches(c.after().origin(i), false)) {
                    dropAfter.add(i);
                    if (c.paired()) {
                        dropBefore.add(i);
                    }
                    notes.add(note("after", c.after(), i, e));
                    hit = true;
                }
            }
            if (hit) {
                used.add(e);
            }
        }
        GroupData b = c.before().without(dropBefore.stream().distinct().mapToInt(Integer::intValue).toArray());
        GroupData a = c.after().without(dropAfter.stream().distinct().mapToInt(Integer::intValue).toArray());
        return new Applied(new CharacteristicData(c.name(), c.unit(), b, a, c.paired(), c.unmatchedUnits()), notes,
                used);
    }

    private static String note(String group, GroupData g, int i, Exclusion e) {
        return String.format(Locale.ROOT, "excluded %s value %s at %s: %s", group,
                Format.num(g.sample().value(i)), g.origin(i).describe(), e.reason());
    }
}
