package org.holdpoint.importer;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.holdpoint.study.ImportReport;
import org.holdpoint.study.Origin;
import org.holdpoint.study.SkipReason;
import org.holdpoint.study.SkippedCell;

/** Records every cell an import did not use: counts per reason and per characteristic, the first 100 in full. */
final class SkipLog {
    private final EnumMap<SkipReason, Long> counts = new EnumMap<>(SkipReason.class);
    private final Map<String, Long> perCharacteristic = new LinkedHashMap<>();
    private final List<SkippedCell> first = new ArrayList<>();
    private final List<String> messages = new ArrayList<>();

    /**
     * Records one skipped cell.
     *
     * @param characteristic the characteristic it belonged to, or null
     * @param origin         where it is
     * @param reason         why it was not used
     * @param text           its text (may be empty)
     */
    void skip(String characteristic, Origin origin, SkipReason reason, String text) {
        counts.merge(reason, 1L, Long::sum);
        if (characteristic != null) {
            perCharacteristic.merge(characteristic, 1L, Long::sum);
        }
        if (first.size() < ImportReport.MAX_LISTED) {
            first.add(new SkippedCell(origin, reason, shorten(text)));
        }
    }

    /** Longest cell text echoed in the report; a longer one is cut and its length said. */
    static final int MAX_TEXT = 80;

    /** A cell's text as the report shows it: whole when short, else its start and its length. */
    static String shorten(String text) {
        if (text == null) {
            return "";
        }
        if (text.length() <= MAX_TEXT) {
            return text;
        }
        int end = Character.isHighSurrogate(text.charAt(MAX_TEXT - 1)) ? MAX_TEXT - 1 : MAX_TEXT;
        return text.substring(0, end) + String.format(java.util.Locale.ROOT, "… (%,d characters)", text.length());
    }

    /** Adds a remark (layout chosen, header row found, …). */
    void message(String m) {
        messages.add(m);
    }

    /** @return the remarks so far (live list) */
    List<String> messages() {
        return messages;
    }

    /** @return skipped cells counted for one characteristic */
    long skippedFor(String characteristic) {
        return perCharacteristic.getOrDefault(characteristic, 0L);
    }

    /** @return the count for one reason */
    long count(SkipReason reason) {
        return counts.getOrDefault(reason, 0L);
    }

    /** @return the first skipped cells recorded */
    List<SkippedCell> first() {
        return first;
    }

    /**
     * @param valuesUsed    the number of values kept
     * @param usedPerCharacteristic values kept per characteristic
     * @return the report
     */
    ImportReport report(long valuesUsed, Map<String, Long> usedPerCharacteristic) {
        return new ImportReport(valuesUsed, counts, first, messages, usedPerCharacteristic, perCharacteristic);
    }
}
