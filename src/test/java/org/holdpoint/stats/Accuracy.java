package org.holdpoint.stats;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Test helpers: the log relative error of McCullough 1998 and relative-tolerance assertions. */
public final class Accuracy {
    private Accuracy() {
    }

    /**
     * LRE = −log10(|x − c|/|c|), or −log10|x − c| when c = 0, capped at {@code cap} digits
     * (McCullough 1998, "Assessing the reliability of statistical software: Part I", Am. Statist.
     * 52:358–366).
     */
    static double lre(double x, double c, double cap) {
        if (Double.isNaN(x)) {
            return 0;
        }
        double err = c == 0 ? Math.abs(x) : Math.abs(x - c) / Math.abs(c);
        if (err == 0) {
            return cap;
        }
        return Math.min(cap, -Math.log10(err));
    }

    /** Asserts |actual − expected| ≤ rel·|expected| (exact equality when expected is 0). */
    static void assertRel(String what, double actual, double expected, double rel) {
        assertThat(actual).as(what + ": got %s, expected %s (relative %s)", actual, expected,
                expected == 0 ? Math.abs(actual) : Math.abs(actual - expected) / Math.abs(expected))
                .isCloseTo(expected, org.assertj.core.data.Offset.offset(Math.abs(expected) * rel));
    }

    /** As {@link #assertRel} and checks that the value is a probability. */
    static void assertProbability(String what, double actual, double expected, double rel) {
        assertThat(actual).as(what + " is a probability").isBetween(0.0, 1.0);
        assertRel(what, actual, expected, rel);
    }

    /** Reads a test resource next to this class as UTF-8 lines (CR dropped). */
    static List<String> resourceLines(String name) {
        try (InputStream in = Accuracy.class.getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("missing test resource " + name);
            }
            String text = new String(in.readAllBytes(), StandardCharsets.UTF_8);
            return text.replace("\r", "").lines().toList();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * Reads a simple comma-separated resource (no quoting; lines starting with '#' are comments; the
     * first other line is the header) as one map per row, keyed by column name.
     */
    /**
     * @param name a resource path relative to this package, e.g. "fits/fit-values.csv"
     * @return one map per row, keyed by column name
     */
    public static List<Map<String, String>> csv(String name) {
        List<Map<String, String>> rows = new ArrayList<>();
        String[] header = null;
        for (String line : resourceLines(name)) {
            if (line.startsWith("#") || line.isBlank()) {
                continue;
            }
            String[] cells = line.split(",", -1);
            if (header == null) {
                header = cells;
                continue;
            }
            if (cells.length != header.length) {
                throw new IllegalStateException(name + ": row has " + cells.length + " cells, header "
                        + header.length + ": " + line);
            }
            Map<String, String> row = new LinkedHashMap<>();
            for (int i = 0; i < cells.length; i++) {
                row.put(header[i], cells[i]);
            }
            rows.add(row);
        }
        return rows;
    }

    /** A number cell as R prints it; "NA" becomes null, "Inf"/"-Inf" the infinities. */
    static Double number(Map<String, String> row, String column) {
        String v = row.get(column);
        if (v == null) {
            throw new IllegalStateException("no column " + column + " in " + row);
        }
        return switch (v) {
            case "NA" -> null;
            case "Inf" -> Double.POSITIVE_INFINITY;
            case "-Inf" -> Double.NEGATIVE_INFINITY;
            default -> Double.valueOf(v);
        };
    }
}
