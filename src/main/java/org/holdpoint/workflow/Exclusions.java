package org.holdpoint.workflow;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.Exclusion;
import org.holdpoint.study.GroupData;
import org.holdpoint.study.Origin;

/**
 * Applies the user's exclusions (by cell, each with a mandatory reason) to one characteristic. In a
 * paired design excluding either value of a unit excludes the pair.
 */
final class Exclusions {
    private Exclusions() {
    }

    record Applied(CharacteristicData data, List<String> notes, List<Exclusion> used) {
    }

    static Applied apply(CharacteristicData c, List<Exclusion> exclusions) {
        List<Exclusion> mine = new ArrayList<>();
        for (Exclusion e : exclusions) {
            if (e.characteristic() == null || e.characteristic().equals(c.name())) {
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
                if (matches(e.cell(), c.before().origin(i))) {
                    dropBefore.add(i);
                    if (c.paired()) {
                        dropAfter.add(i);
                    }
                    notes.add(note("before", c.before(), i, e));
                    hit = true;
                }
            }
            for (int i = 0; i < c.after().size(); i++) {
                if (matches(e.cell(), c.after().origin(i))) {
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

    static boolean matches(String ref, Origin o) {
        String r = ref.trim();
        int bang = r.lastIndexOf('!');
        if (bang >= 0) {
            String sheet = r.substring(0, bang);
            if (o.sheet() == null || !o.sheet().equalsIgnoreCase(sheet)) {
                return false;
            }
            r = r.substring(bang + 1);
        }
        return o.cell().equalsIgnoreCase(r);
    }
}
