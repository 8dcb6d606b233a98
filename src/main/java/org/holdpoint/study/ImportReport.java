package org.holdpoint.study;

import java.util.Collections;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * What an import kept and what it left out: the number of values used, the count of skipped cells per
 * reason, and the first problems with their addresses (all of them up to a limit).
 *
 * @param valuesUsed               the number of values kept
 * @param skipCounts               skipped cells per reason
 * @param firstSkipped             the first skipped cells (at most {@link #MAX_LISTED})
 * @param messages                 other remarks of the import (layout detected, header row found, …)
 * @param usedPerCharacteristic    values kept per characteristic name (both groups), in file order
 * @param skippedPerCharacteristic cells of a characteristic's value columns that were not used, per name
 */
public record ImportReport(long valuesUsed, Map<SkipReason, Long> skipCounts, List<SkippedCell> firstSkipped,
        List<String> messages, Map<String, Long> usedPerCharacteristic, Map<String, Long> skippedPerCharacteristic) {
    /** How many skipped cells are listed one by one. */
    public static final int MAX_LISTED = 100;

    /** Copies the collections. */
    public ImportReport {
        EnumMap<SkipReason, Long> counts = new EnumMap<>(SkipReason.class);
        counts.putAll(skipCounts);
        skipCounts = Collections.unmodifiableMap(counts);
        firstSkipped = List.copyOf(firstSkipped);
        messages = List.copyOf(messages);
        usedPerCharacteristic = Collections.unmodifiableMap(new LinkedHashMap<>(
                usedPerCharacteristic == null ? Map.of() : usedPerCharacteristic));
        skippedPerCharacteristic = Collections.unmodifiableMap(new LinkedHashMap<>(
                skippedPerCharacteristic == null ? Map.of() : skippedPerCharacteristic));
    }

    /**
     * A report without per-characteristic counts.
     *
     * @param valuesUsed   the number of values kept
     * @param skipCounts   skipped cells per reason
     * @param firstSkipped the first skipped cells
     * @param messages     other remarks
     */
    public ImportReport(long valuesUsed, Map<SkipReason, Long> skipCounts, List<SkippedCell> firstSkipped,
            List<String> messages) {
        this(valuesUsed, skipCounts, firstSkipped, messages, null, null);
    }

    /** @return the total number of skipped cells */
    public long skippedTotal() {
        return skipCounts.values().stream().mapToLong(Long::longValue).sum();
    }

    /**
     * The share of a characteristic's cells that could not be used: skipped / (used + skipped), for
     * flagging characteristics with many unusable cells.
     *
     * @param characteristic the characteristic's name
     * @return the fraction in [0, 1], or 0 when nothing is known about the name
     */
    public double unusableFraction(String characteristic) {
        long used = usedPerCharacteristic.getOrDefault(characteristic, 0L);
        long skipped = skippedPerCharacteristic.getOrDefault(characteristic, 0L);
        return used + skipped == 0 ? 0 : (double) skipped / (used + skipped);
    }
}
