package org.holdpoint.workflow;

import java.time.LocalDate;
import java.time.LocalDateTime;
import java.time.LocalTime;
import java.time.ZoneOffset;
import java.time.format.DateTimeFormatter;
import java.time.format.DateTimeFormatterBuilder;
import java.time.format.DateTimeParseException;
import java.time.format.ResolverStyle;
import java.time.temporal.TemporalAccessor;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.Comparator;
import java.util.List;
import java.util.Locale;
import java.util.function.IntFunction;
import org.holdpoint.study.GroupData;

/**
 * The order in which a group's values were made (docs/methods.md §16): from the sequence column (numbers, dates
 * and times, or texts in natural order), or the file's row order when the user says the rows are in run order.
 *
 * <p>Dates are read in one of a few spellings (ISO 8601 year-month-day with or without a time, day.month.year,
 * day/month/year, month/day/year, a time of day alone); every entry must read in the same spelling. When two
 * spellings read every entry but put them in different orders (e.g. 03/04/2026 as 3 April and as 4 March) the
 * order is ambiguous and no chart is drawn: the user is told to write the dates as year-month-day.
 *
 * @param order  the indices of the group's values in run order (equal keys keep the file's order)
 * @param source how the order is known, in words
 */
record RunOrder(int[] order, String source) {

    /** The order could not be told; the message says why and what to do. */
    static final class Unknown extends Exception {
        private static final long serialVersionUID = 1L;

        Unknown(String message) {
            super(message, null, false, false);
        }
    }

    /** A date spelling: a name and formatters tried in turn. */
    private record Spelling(String name, List<DateTimeFormatter> formats) {
    }

    private static final List<Spelling> SPELLINGS = List.of(
            new Spelling("year-month-day", List.of(DateTimeFormatter.ISO_LOCAL_DATE_TIME, f("uuuu-MM-dd[ HH:mm[:ss]]"),
                    f("uuuu/MM/dd[ HH:mm[:ss]]"))),
            new Spelling("day.month.year", List.of(f("d.M.uuuu[ H:mm[:ss]]"))),
            new Spelling("day/month/year", List.of(f("d/M/uuuu[ H:mm[:ss]]"))),
            new Spelling("month/day/year", List.of(f("M/d/uuuu[ H:mm[:ss]]"), f("M/d/uuuu h:mm[:ss] a"))),
            new Spelling("time of day", List.of(f("H:mm[:ss]"), f("h:mm[:ss] a"))));

    private static DateTimeFormatter f(String pattern) {
        return new DateTimeFormatterBuilder().parseCaseInsensitive().appendPattern(pattern).toFormatter(Locale.ROOT)
                .withResolverStyle(ResolverStyle.STRICT);
    }

    /** Copies the array. */
    RunOrder {
        order = order.clone();
    }

    @Override
    public int[] order() {
        return order.clone();
    }

    /**
     * The run order of a group.
     *
     * @param g             the group
     * @param rowOrderKnown whether the user says the file's rows are in run order (used without a sequence column)
     * @return the order, or null when none is known
     * @throws Unknown when a sequence column exists but does not give an order (blank entries, mixed or ambiguous
     *                 dates)
     */
    static RunOrder of(GroupData g, boolean rowOrderKnown) throws Unknown {
        if (g.hasSequence()) {
            return byKeys(g.size(), g::sequence, i -> "row " + g.origin(i).row(), "the sequence column", true);
        }
        if (rowOrderKnown) {
            Integer[] idx = boxed(g.size());
            Arrays.sort(idx, Comparator.<Integer>comparingInt(i -> g.origin(i).row())
                    .thenComparingInt(i -> g.origin(i).column()));
            return new RunOrder(unboxed(idx), "the file's row order (the user says the rows are in run order)");
        }
        return null;
    }

    /**
     * The order of a group's subgroups from their labels alone, when they are numbers or dates (used when no run
     * order of the values is known).
     *
     * @param labels the subgroup labels
     * @return the indices of the labels in order, or null when the labels are not numbers or dates
     * @throws Unknown when the labels are dates in mixed or ambiguous spellings
     */
    static RunOrder ofLabels(List<String> labels) throws Unknown {
        return byKeys(labels.size(), labels::get, i -> "subgroup " + labels.get(i), "the subgroup labels", false);
    }

    private static RunOrder byKeys(int n, IntFunction<String> text, IntFunction<String> where, String source,
            boolean textsAllowed) throws Unknown {
        String[] keys = new String[n];
        for (int i = 0; i < n; i++) {
            String t = text.apply(i);
            if (t == null || t.isBlank()) {
                throw new Unknown(source + " is blank at " + where.apply(i) + ", so the run order is not known; fill "
                        + "it in or exclude the value");
            }
            keys[i] = t.strip();
        }
        double[] numbers = numbers(keys);
        if (numbers != null) {
            return new RunOrder(sorted(n, Comparator.comparingDouble(i -> numbers[i])), source + " (numbers)");
        }
        List<Spelling> fits = new ArrayList<>();
        List<long[]> keysBy = new ArrayList<>();
        boolean anyDate = false;
        for (Spelling s : SPELLINGS) {
            long[] k = new long[n];
            boolean all = true;
            for (int i = 0; i < n; i++) {
                Long v = parse(s, keys[i]);
                if (v == null) {
                    all = false;
                } else {
                    anyDate = true;
                    k[i] = v;
                }
            }
            if (all) {
                fits.add(s);
                keysBy.add(k);
            }
        }
        if (!fits.isEmpty()) {
            int[] first = sorted(n, Comparator.comparingLong(i -> keysBy.get(0)[i]));
            for (int j = 1; j < fits.size(); j++) {
                long[] k = keysBy.get(j);
                if (!Arrays.equals(first, sorted(n, Comparator.comparingLong(i -> k[i])))) {
                    throw new Unknown(source + " holds dates that read both as " + fits.get(0).name() + " and as "
                            + fits.get(j).name() + ", in different orders, so the run order is ambiguous; write the "
                            + "dates as year-month-day (e.g. 2026-11-02 08:15)");
                }
            }
            return new RunOrder(first, source + " (dates and times, " + fits.get(0).name() + ")");
        }
        if (anyDate) {
            throw new Unknown(source + " mixes dates in different spellings (or dates and other texts), so the run "
                    + "order is not known; write every entry in one spelling, e.g. 2026-11-02 08:15");
        }
        if (!textsAllowed) {
            return null;
        }
        return new RunOrder(sorted(n, (a, b) -> natural(keys[a], keys[b])), source + " (texts, numbers within them "
                + "compared as numbers)");
    }

    private static double[] numbers(String[] keys) {
        double[] v = new double[keys.length];
        for (int i = 0; i < keys.length; i++) {
            String k = keys[i];
            // a plain decimal number; "1e3", "NaN" or "Infinity" are not sequence numbers
            if (!k.matches("[+-]?(\\d+([.,]\\d*)?|[.,]\\d+)")) {
                return null;
            }
            v[i] = Double.parseDouble(k.replace(',', '.'));
        }
        return v;
    }

    private static Long parse(Spelling s, String text) {
        for (DateTimeFormatter fmt : s.formats()) {
            try {
                TemporalAccessor t = fmt.parseBest(text, LocalDateTime::from, LocalDate::from, LocalTime::from);
                if (t instanceof LocalDateTime d) {
                    return d.toEpochSecond(ZoneOffset.UTC) * 1_000_000_000L + d.getNano();
                }
                if (t instanceof LocalDate d) {
                    return d.atStartOfDay().toEpochSecond(ZoneOffset.UTC) * 1_000_000_000L;
                }
                return ((LocalTime) t).toNanoOfDay();
            } catch (DateTimeParseException e) {
                // not this format; the next one is tried
            }
        }
        return null;
    }

    /** Texts compared with runs of digits as numbers ("run 9" before "run 10"), then as written. */
    static int natural(String a, String b) {
        int i = 0;
        int j = 0;
        while (i < a.length() && j < b.length()) {
            char x = a.charAt(i);
            char y = b.charAt(j);
            if (Character.isDigit(x) && Character.isDigit(y)) {
                int si = i;
                int sj = j;
                while (i < a.length() && Character.isDigit(a.charAt(i))) {
                    i++;
                }
                while (j < b.length() && Character.isDigit(b.charAt(j))) {
                    j++;
                }
                String da = a.substring(si, i).replaceFirst("^0+(?=.)", "");
                String db = b.substring(sj, j).replaceFirst("^0+(?=.)", "");
                int c = da.length() != db.length() ? Integer.compare(da.length(), db.length()) : da.compareTo(db);
                if (c != 0) {
                    return c;
                }
            } else {
                int c = Character.compare(Character.toLowerCase(x), Character.toLowerCase(y));
                if (c != 0) {
                    return c;
                }
                i++;
                j++;
            }
        }
        int c = Integer.compare(a.length() - i, b.length() - j);
        return c != 0 ? c : a.compareTo(b);
    }

    private static int[] sorted(int n, Comparator<Integer> by) {
        Integer[] idx = boxed(n);
        Arrays.sort(idx, by);
        return unboxed(idx);
    }

    private static Integer[] boxed(int n) {
        Integer[] idx = new Integer[n];
        for (int i = 0; i < n; i++) {
            idx[i] = i;
        }
        return idx;
    }

    private static int[] unboxed(Integer[] idx) {
        int[] r = new int[idx.length];
        for (int i = 0; i < r.length; i++) {
            r[i] = idx[i];
        }
        return r;
    }
}
