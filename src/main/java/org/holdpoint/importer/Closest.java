package org.holdpoint.importer;

import java.util.ArrayList;
import java.util.Collection;
import java.util.Comparator;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Locale;
import org.apache.commons.text.similarity.LevenshteinDistance;

/**
 * The names closest to a name that matched nothing, for messages: names that contain it or are
 * contained in it first, then the nearest by edit distance (Levenshtein) of their comparison keys.
 */
public final class Closest {
    private static final int SHOWN = 3;

    private Closest() {
    }

    /**
     * @param wanted     the name that matched nothing
     * @param candidates the names there are
     * @return at most three names, closest first
     */
    public static List<String> of(String wanted, Collection<String> candidates) {
        String w = ColumnNames.parse(wanted).key();
        LevenshteinDistance lev = LevenshteinDistance.getDefaultInstance();
        List<String> all = new ArrayList<>(new LinkedHashSet<>(candidates));
        all.sort(Comparator.comparingInt((String c) -> {
            String k = ColumnNames.parse(c).key();
            return k.contains(w) || w.contains(k) ? 0 : 1;
        }).thenComparingInt(c -> lev.apply(w, ColumnNames.parse(c).key())));
        List<String> near = new ArrayList<>();
        for (String c : all) {
            String k = ColumnNames.parse(c).key();
            if (near.size() < SHOWN && (k.contains(w) || w.contains(k) || lev.apply(w, k) <= Math.max(2, w.length() / 3))) {
                near.add(c);
            }
        }
        return near;
    }

    /**
     * @param wanted     the name that matched nothing
     * @param candidates the names there are
     * @return "; the closest are "A", "B" and "C"", or "" when there is no candidate
     */
    public static String describe(String wanted, Collection<String> candidates) {
        List<String> c = of(wanted, candidates);
        if (c.isEmpty()) {
            List<String> some = new ArrayList<>(new LinkedHashSet<>(candidates));
            if (some.isEmpty()) {
                return "";
            }
            return " (the names there are: " + join(some.subList(0, Math.min(8, some.size())))
                    + (some.size() > 8 ? " and " + (some.size() - 8) + " more" : "") + ")";
        }
        return String.format(Locale.ROOT, " (did you mean %s?)", join(c).replace(" and ", " or "));
    }

    private static String join(List<String> names) {
        List<String> quoted = names.stream().map(x -> "\"" + x + "\"").toList();
        return quoted.size() == 1 ? quoted.get(0)
                : String.join(", ", quoted.subList(0, quoted.size() - 1)) + " and " + quoted.get(quoted.size() - 1);
    }
}
