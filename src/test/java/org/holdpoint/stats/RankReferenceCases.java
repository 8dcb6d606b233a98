package org.holdpoint.stats;

import java.io.BufferedReader;
import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;

/** Reads the key/value case blocks of a reference file (case ... end). */
final class RankReferenceCases {
    private RankReferenceCases() {
    }

    /** One case: its keys mapped to the rest of the line. */
    record Case(String id, Map<String, String> values) {
        String get(String key) {
            String v = values.get(key);
            if (v == null) {
                throw new IllegalStateException("case " + id + " has no " + key);
            }
            return v;
        }

        double num(String key) {
            return Double.parseDouble(get(key).trim());
        }

        double[] nums(String key) {
            return Arrays.stream(get(key).trim().split(",")).mapToDouble(s -> Double.parseDouble(s.trim())).toArray();
        }

        boolean has(String key) {
            return values.containsKey(key);
        }

        @Override
        public String toString() {
            return id;
        }
    }

    static List<Case> load(String resource) {
        List<Case> cases = new ArrayList<>();
        try (InputStream in = RankReferenceCases.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("missing resource " + resource);
            }
            BufferedReader r = new BufferedReader(new InputStreamReader(in, StandardCharsets.UTF_8));
            String line;
            String id = null;
            Map<String, String> map = null;
            while ((line = r.readLine()) != null) {
                if (line.startsWith("#") || line.isBlank()) {
                    continue;
                }
                int sp = line.indexOf(' ');
                String key = sp < 0 ? line.trim() : line.substring(0, sp);
                String rest = sp < 0 ? "" : line.substring(sp + 1).trim();
                if (key.equals("case")) {
                    id = rest;
                    map = new LinkedHashMap<>();
                } else if (key.equals("end")) {
                    cases.add(new Case(id, map));
                    map = null;
                } else if (map != null) {
                    map.put(key, rest);
                }
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return cases;
    }
}
