package org.holdpoint.study;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;

/**
 * What an import kept and what it left out: the number of values used, the count of skipped cells per
 * reason, and the first problems with their addresses (all of them up to a limit).
 *
 * @param valuesUsed   the number of values kept
 * @param skipCounts   skipped cells per reason
 * @param firstSkipped the first skipped cells (at most {@link #MAX_LISTED})
 * @param messages     other remarks of the import (layout detected, header row found, …)
 */
public record ImportReport(long valuesUsed, Map<SkipReason, Long> skipCounts, List<SkippedCell> firstSkipped,
        List<String> messages) {
    /** How many skipped cells are listed one by one. */
    public static final int MAX_LISTED = 100;

    /** Copies the collections. */
    public ImportReport {
        EnumMap<SkipReason, Long> counts = new EnumMap<>(SkipReason.class);
        counts.putAll(skipCounts);
        skipCounts = java.util.Collections.unmodifiableMap(counts);
        firstSkipped = List.copyOf(firstSkipped);
        messages = List.copyOf(messages);
    }

    /** @return the total number of skipped cells */
    public long skippedTotal() {
        return skipCounts.values().stream().mapToLong(Long::longValue).sum();
    }
}
