package org.holdpoint.importer;

import java.util.List;

/**
 * Which characteristics of a file are analysed. A name is matched against the header (or the
 * characteristic column of a stacked file) by its comparison key: case, spacing, separators and a unit
 * in trailing brackets do not matter ("Bore Ø (mm)" matches "bore ø").
 *
 * @param only      when not empty, only these characteristics are analysed; every other numeric column
 *                  is listed in the import report as not analysed
 * @param ignore    characteristics (or any columns) left out; listed in the import report
 * @param onlySource where {@code only} came from, for messages: "the settings file X", "--only", …
 */
public record ColumnChoice(List<String> only, List<String> ignore, String onlySource) {
    /** Every characteristic column is analysed. */
    public static final ColumnChoice ALL = new ColumnChoice(List.of(), List.of(), null);

    /** Copies the lists. */
    public ColumnChoice {
        only = List.copyOf(only);
        ignore = List.copyOf(ignore);
    }

    /** @return whether the choice restricts anything */
    public boolean restricts() {
        return !only.isEmpty() || !ignore.isEmpty();
    }

    /** @return the comparison keys of {@link #only} */
    List<String> onlyKeys() {
        return only.stream().map(n -> ColumnNames.parse(n).key()).toList();
    }

    /** @return the comparison keys of {@link #ignore} */
    List<String> ignoreKeys() {
        return ignore.stream().map(n -> ColumnNames.parse(n).key()).toList();
    }
}
