package org.holdpoint.importer;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.holdpoint.study.Origin;
import org.holdpoint.study.SkipReason;

/**
 * Matches the before and after values of a paired design by unit id, never by row position: the
 * matched units in the before group's order, the units found in only one group listed and left out.
 */
final class Pairing {
    private Pairing() {
    }

    /**
     * The outcome of matching.
     *
     * @param before    the before values of matched units
     * @param after     the after values, in the same unit order
     * @param unmatched unit ids present in only one group
     */
    record Matched(GroupBuilder before, GroupBuilder after, List<String> unmatched) {
    }

    /**
     * @param name   the characteristic (for messages)
     * @param before the before values with unit ids
     * @param after  the after values with unit ids
     * @param log    receives the unmatched values as skips
     * @return the matched groups
     * @throws ImportException when a unit id occurs twice in one group
     */
    static Matched match(String name, GroupBuilder before, GroupBuilder after, SkipLog log) {
        Map<String, Integer> bi = index(name, before, "before");
        Map<String, Integer> ai = index(name, after, "after");
        GroupBuilder nb = before.emptyCopy();
        GroupBuilder na = after.emptyCopy();
        List<String> unmatched = new ArrayList<>();
        for (int i = 0; i < before.size(); i++) {
            Integer j = ai.get(before.unit(i));
            if (j == null) {
                unmatched.add(before.unit(i));
                log.skip(name, origin(before, i), SkipReason.UNPAIRED, before.unit(i));
            } else {
                nb.addFrom(before, i);
                na.addFrom(after, j);
            }
        }
        for (int j = 0; j < after.size(); j++) {
            if (!bi.containsKey(after.unit(j))) {
                unmatched.add(after.unit(j));
                log.skip(name, origin(after, j), SkipReason.UNPAIRED, after.unit(j));
            }
        }
        if (nb.size() == 0) {
            throw new ImportException("characteristic %s: no unit id occurs in both the before and the after group "
                    + "(before: %s; after: %s), so no pair can be formed. Check that both groups use the same unit ids",
                    name, sample(before), sample(after));
        }
        return new Matched(nb, na, unmatched);
    }

    private static String sample(GroupBuilder g) {
        StringBuilder sb = new StringBuilder();
        for (int i = 0; i < Math.min(3, g.size()); i++) {
            sb.append(i == 0 ? "" : ", ").append(g.unit(i));
        }
        return g.size() > 3 ? sb + ", …" : sb.toString();
    }

    private static Map<String, Integer> index(String name, GroupBuilder g, String which) {
        Map<String, Integer> m = new HashMap<>(g.size() * 2);
        for (int i = 0; i < g.size(); i++) {
            Integer prev = m.putIfAbsent(g.unit(i), i);
            if (prev != null) {
                throw new ImportException("file %s%s, characteristic %s: unit id \"%s\" appears twice in the %s group "
                        + "(cells %s and %s). In a paired design every unit is measured once before and once after; "
                        + "correct the duplicate id", g.file(), g.sheet() == null ? "" : ", sheet " + g.sheet(), name,
                        g.unit(i), which, g.cell(prev), g.cell(i));
            }
        }
        return m;
    }

    private static Origin origin(GroupBuilder g, int i) {
        return new Origin(g.file(), g.sheet(), g.row(i), g.column(i));
    }
}
