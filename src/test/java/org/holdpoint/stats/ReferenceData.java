package org.holdpoint.stats;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;

/** Loads one-value-per-line reference files (lines starting with # are comments) from test resources. */
final class ReferenceData {
    private ReferenceData() {
    }

    /** The decimal texts of the data lines, in file order, starting at 1-based line {@code firstLine}. */
    static String[] lines(String resource, int firstLine) {
        List<String> out = new ArrayList<>();
        try (InputStream in = ReferenceData.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("missing resource " + resource);
            }
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.US_ASCII));
            String line;
            int no = 0;
            while ((line = r.readLine()) != null) {
                no++;
                String t = line.trim();
                if (no >= firstLine && !t.isEmpty() && !t.startsWith("#")) {
                    out.add(t);
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out.toArray(String[]::new);
    }

    static Sample decimals(String resource) {
        return Sample.ofDecimals(lines(resource, 1));
    }
}
