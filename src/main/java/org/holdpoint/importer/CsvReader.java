package org.holdpoint.importer;

import java.io.IOException;
import java.io.InputStream;
import java.io.InputStreamReader;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.nio.charset.Charset;
import java.nio.charset.CodingErrorAction;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;

/**
 * Reads a delimited text file (CSV, TSV, TXT) into a {@link SheetData} with Apache Commons CSV. The
 * delimiter (tab, semicolon, comma or bar) and the decimal separator are detected from the first
 * lines unless given; the encoding is UTF-8 (with or without byte-order mark), UTF-16 with a
 * byte-order mark, or Windows-1252 when the bytes are not valid UTF-8.
 */
final class CsvReader {
    private static final int SAMPLE_BYTES = 64 * 1024;
    private static final char[] CANDIDATES = {'\t', ';', ',', '|'};

    private CsvReader() {
    }

    /** What detection found, for the import messages. */
    record Detected(char delimiter, char decimalSeparator, Charset charset) {
    }

    /**
     * Reads the file.
     *
     * @param path             the file
     * @param name             the file name for messages and origins
     * @param delimiter        the delimiter, or null to detect
     * @param decimalSeparator '.' or ',', or null to detect
     * @param messages         receives what was detected
     * @return the cells
     */
    static SheetData read(Path path, String name, Character delimiter, Character decimalSeparator,
            List<String> messages) {
        byte[] head = readHead(path, name);
        TextEncoding.Detected enc = TextEncoding.detect(head, name);
        int bom = enc.bom();
        Charset cs = enc.charset();
        String sample = new String(head, bom, head.length - bom, cs);
        char delim = delimiter != null ? delimiter : detectDelimiter(sample);
        char dec = decimalSeparator != null ? decimalSeparator : detectDecimal(sample, delim);
        messages.add(String.format(java.util.Locale.ROOT, "%s read as text: delimiter %s, decimal separator '%s', %s",
                name, describe(delim), dec, cs.name()));
        SheetData data = new SheetData(name, null, dec);
        CSVFormat format = CSVFormat.DEFAULT.builder().setDelimiter(delim).setQuote('"').setIgnoreEmptyLines(false)
                .setIgnoreSurroundingSpaces(true).get();
        try (InputStream in = Files.newInputStream(path)) {
            in.skipNBytes(bom);
            Reader reader = new InputStreamReader(in, cs.newDecoder().onMalformedInput(CodingErrorAction.REPLACE)
                    .onUnmappableCharacter(CodingErrorAction.REPLACE));
            try (CSVParser parser = CSVParser.builder().setReader(reader).setFormat(format).get()) {
                long line = 0;
                try {
                    for (CSVRecord rec : parser) {
                        line = rec.getRecordNumber();
                        if (line > Integer.MAX_VALUE - 1) {
                            throw new ImportException("file %s has more than %d lines; split it", name,
                                    Integer.MAX_VALUE - 1);
                        }
                        int row = (int) line;
                        for (int c = 0, n = rec.size(); c < n; c++) {
                            String v = rec.get(c);
                            if (v.indexOf('\0') >= 0) {
                                throw new ImportException("file %s, line %d holds a NUL byte (binary data in a text "
                                        + "file). Export the data again as .xlsx or .csv", name, row);
                            }
                            if (!v.isEmpty()) {
                                data.addText(row, c, v);
                            }
                        }
                    }
                } catch (UncheckedIOException | IllegalStateException e) {
                    throw new ImportException(e, "file %s cannot be read as delimited text near line %d (%s). Check "
                            + "the quotes on that line: a field that starts with \" must end with \"", name,
                            parser.getCurrentLineNumber(), rootMessage(e));
                }
            }
        } catch (IOException e) {
            throw new ImportException(e, "file %s cannot be read (%s); check that it exists and is readable", name,
                    e.getMessage());
        }
        data.finish();
        return data;
    }

    private static String rootMessage(Throwable e) {
        Throwable t = e;
        while (t.getCause() != null && t.getCause() != t) {
            t = t.getCause();
        }
        return t.getMessage();
    }

    private static String describe(char d) {
        return switch (d) {
            case '\t' -> "tab";
            case ';' -> "semicolon";
            case ',' -> "comma";
            case '|' -> "bar";
            default -> "'" + d + "'";
        };
    }

    private static byte[] readHead(Path path, String name) {
        try (InputStream in = Files.newInputStream(path)) {
            byte[] b = in.readNBytes(SAMPLE_BYTES);
            // cut at a line end so the sample never ends in a broken character or field
            int end = b.length;
            if (b.length == SAMPLE_BYTES) {
                while (end > 0 && b[end - 1] != '\n') {
                    end--;
                }
                if (end == 0) {
                    end = b.length;
                }
            }
            return end == b.length ? b : java.util.Arrays.copyOf(b, end);
        } catch (IOException e) {
            throw new ImportException(e, "file %s cannot be read (%s); check that it exists and is readable", name,
                    e.getMessage());
        }
    }


    /**
     * The delimiter whose count per line is the same on most lines (tab, then semicolon, comma, bar on
     * ties); a character absent from the sample when no candidate occurs (a one-column file).
     */
    static char detectDelimiter(String sample) {
        List<String> lines = lines(sample);
        char best = 0;
        int bestScore = 0;
        for (char d : CANDIDATES) {
            Map<Integer, Integer> freq = new HashMap<>();
            for (String l : lines) {
                int n = countOutsideQuotes(l, d);
                if (n > 0) {
                    freq.merge(n, 1, Integer::sum);
                }
            }
            int score = freq.values().stream().mapToInt(Integer::intValue).max().orElse(0);
            if (score > bestScore) {
                best = d;
                bestScore = score;
            }
        }
        if (best != 0) {
            return best;
        }
        for (char d : new char[] {',', ';', '\t', '|'}) {
            if (sample.indexOf(d) < 0) {
                return d;
            }
        }
        return ',';
    }

    private static final java.util.regex.Pattern QUOTED_COMMA_NUMBER = java.util.regex.Pattern.compile(
            "\"\\s*[+-]?\\d*,\\d+\\s*\"");
    private static final java.util.regex.Pattern POINT_NUMBER = java.util.regex.Pattern.compile(
            "(^|[,\"])\\s*[+-]?\\d*\\.\\d+\\s*(?=[,\"\\r\\n]|$)", java.util.regex.Pattern.MULTILINE);

    /**
     * ',' when numbers with a decimal comma outnumber those with a point; with a comma delimiter only
     * quoted numbers can carry a decimal comma.
     */
    static char detectDecimal(String sample, char delim) {
        if (delim == ',') {
            long comma = QUOTED_COMMA_NUMBER.matcher(sample).results().count();
            long point = POINT_NUMBER.matcher(sample).results().count();
            return comma > point ? ',' : '.';
        }
        int comma = 0;
        int point = 0;
        for (String l : lines(sample)) {
            for (String f : l.split(java.util.regex.Pattern.quote(String.valueOf(delim)), -1)) {
                String t = f.strip();
                if (t.startsWith("\"") && t.endsWith("\"") && t.length() >= 2) {
                    t = t.substring(1, t.length() - 1).strip();
                }
                if (TextClassifier.isCommaNumber(t)) {
                    comma++;
                } else if (t.indexOf('.') >= 0 && new DecimalParser('.').parse(t) != DecimalParser.NOT_A_NUMBER) {
                    point++;
                }
            }
        }
        return comma > point ? ',' : '.';
    }

    private static List<String> lines(String sample) {
        List<String> out = new ArrayList<>();
        for (String l : sample.split("\r\n|\n|\r")) {
            if (!l.isBlank()) {
                out.add(l);
            }
            if (out.size() == 200) {
                break;
            }
        }
        return out;
    }

    private static int countOutsideQuotes(String line, char d) {
        int n = 0;
        boolean quoted = false;
        for (int i = 0; i < line.length(); i++) {
            char c = line.charAt(i);
            if (c == '"') {
                quoted = !quoted;
            } else if (c == d && !quoted) {
                n++;
            }
        }
        return n;
    }
}
