package org.holdpoint.report;

import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/**
 * The hidden record sheet: the canonical study record in chunks of at most {@value #CHUNK} characters
 * (a cell holds at most 32,767), its SHA-256, the optional signature and the layout facts the verifier
 * needs to find the shown values again. Rows are relative to the {@code HP_Record} anchor; labels in the
 * first column, values in the second.
 */
final class RecordSheet {
    /** Characters per chunk, below the 32,767 a cell holds. */
    static final int CHUNK = 32_000;
    /**
     * The format marker of row 1; its number is the layout of the shown sheets, so that a workbook is always
     * compared with the layout it was written in (1: until 2026-12; 2: Summary of 13 columns, one page of
     * numbers and box plot per characteristic, captions in words, the record's hash, part and revision on the
     * sign-off page).
     */
    static final String FORMAT = "holdpoint-signoff-record 2";
    /** The layout written now. */
    static final int LAYOUT = 2;
    private static final String MARKER = "holdpoint-signoff-record ";

    /**
     * @param marker the text of the format row
     * @return the layout it names (1 or 2), or -1 when it is not a record marker this version knows
     */
    static int layoutOf(String marker) {
        if (marker == null || !marker.startsWith(MARKER)) {
            return -1;
        }
        String n = marker.substring(MARKER.length());
        return n.equals("1") ? 1 : n.equals("2") ? 2 : -1;
    }

    /**
     * @param layout a layout number
     * @return its format marker
     */
    static String marker(int layout) {
        return MARKER + layout;
    }
    static final String[] LABELS = {"format", "sha256", "characters", "chunks", "generated at", "software",
        "charts per characteristic", "signature algorithm", "public key", "signature", "key fingerprint",
        "template", "signatures"};
    /** Offset of the first chunk row below the anchor. */
    static final int FIRST_CHUNK = 14;

    private RecordSheet() {
    }

    /**
     * The record's values, in the order of {@link #LABELS}.
     *
     * @param in          the report input
     * @param chartCounts charts per characteristic, in result order
     * @param templateFingerprint the content fingerprint of the template that was filled
     * @return the values
     */
    static String[] values(ReportInput in, Map<String, Integer> chartCounts, String templateFingerprint) {
        RecordSeal seal = in.seal();
        StringBuilder counts = new StringBuilder();
        chartCounts.values().forEach(v -> counts.append(counts.length() == 0 ? "" : ",").append(v));
        return new String[] {FORMAT, in.sha256(), Integer.toString(in.studyJson().length()),
            Integer.toString(chunks(in.studyJson()).size()), in.generatedAt(), in.softwareVersion(),
            counts.toString(), seal == null ? "" : seal.algorithm(), seal == null ? "" : seal.publicKey(),
            seal == null ? "" : seal.signature(), seal == null ? "" : seal.keyFingerprint(), templateFingerprint,
            in.signaturesJson()};
    }

    /**
     * The chart count of every characteristic of the input, in result order.
     *
     * @param in the input
     * @return name to count
     */
    static Map<String, Integer> chartCounts(ReportInput in) {
        Map<String, Integer> m = new LinkedHashMap<>();
        in.result().characteristics().forEach(c -> m.put(c.name(), in.chartsOf(c.name()).size()));
        return m;
    }

    /**
     * Splits text into chunks of at most {@link #CHUNK} characters without splitting a surrogate pair.
     *
     * @param text the text
     * @return the chunks (at least one)
     */
    static List<String> chunks(String text) {
        List<String> out = new ArrayList<>();
        int i = 0;
        while (i < text.length()) {
            int end = Math.min(text.length(), i + CHUNK);
            if (end < text.length() && Character.isHighSurrogate(text.charAt(end - 1))) {
                end--;
            }
            out.add(text.substring(i, end));
            i = end;
        }
        if (out.isEmpty()) {
            out.add("");
        }
        return out;
    }
}
