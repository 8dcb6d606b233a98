package org.holdpoint.importer;

import java.math.BigDecimal;

/**
 * Parses decimal number text into an exact unscaled integer and scale (value = unscaled·10^−scale)
 * when it fits a long with at most 18 decimals, and otherwise into the correctly rounded double.
 * Reuse one instance per reader: {@link #parse} stores its result in the instance's fields instead of
 * allocating.
 *
 * <p>Accepted: optional sign ({@code +}, {@code -} or U+2212), digits with at most one decimal
 * separator, at least one digit, an optional exponent {@code e}/{@code E} with optional sign. Spaces
 * around the number are ignored. Conversion of the unscaled form to binary64 is Clinger's fast path
 * (one IEEE division of exact operands when the mantissa is below 2⁵³ and the scale at most 22;
 * Clinger 1990, "How to read floating point numbers accurately", PLDI '90); otherwise
 * {@link BigDecimal#doubleValue()}, which is correctly rounded.
 */
final class DecimalParser {
    /** The largest scale kept exactly. */
    static final int MAX_SCALE = 18;
    private static final long MAX_EXACT = 1L << 53;
    private static final double[] POW10 = new double[23];
    private static final long[] LPOW10 = new long[19];

    static {
        double p = 1;
        for (int i = 0; i < POW10.length; i++) {
            POW10[i] = p;
            p *= 10;
        }
        long q = 1;
        for (int i = 0; i < LPOW10.length; i++) {
            LPOW10[i] = q;
            q *= 10;
        }
    }

    /** Outcome of the last {@link #parse}: not a number. */
    static final int NOT_A_NUMBER = 0;
    /** Outcome of the last {@link #parse}: exact, see {@link #unscaled} and {@link #scale}. */
    static final int EXACT = 1;
    /** Outcome of the last {@link #parse}: only the double {@link #value} is known. */
    static final int DOUBLE_ONLY = 2;

    /** The unscaled integer of the last exact parse. */
    long unscaled;
    /** The scale of the last exact parse, 0..18. */
    int scale;
    /** The correctly rounded value of the last parse that did not return {@link #NOT_A_NUMBER}. */
    double value;

    private final char separator;

    /**
     * @param separator the decimal separator, '.' or ','
     */
    DecimalParser(char separator) {
        this.separator = separator;
    }

    /** @return the decimal separator this parser accepts */
    char separator() {
        return separator;
    }

    /**
     * Parses a whole string.
     *
     * @param s the text
     * @return {@link #NOT_A_NUMBER}, {@link #EXACT} or {@link #DOUBLE_ONLY}
     */
    int parse(CharSequence s) {
        return parse(s, 0, s.length());
    }

    /**
     * Parses {@code s[from, to)}.
     *
     * @param s    the text
     * @param from first index
     * @param to   end index (exclusive)
     * @return {@link #NOT_A_NUMBER}, {@link #EXACT} or {@link #DOUBLE_ONLY}
     */
    int parse(CharSequence s, int from, int to) {
        while (from < to && s.charAt(from) <= ' ') {
            from++;
        }
        while (to > from && s.charAt(to - 1) <= ' ') {
            to--;
        }
        if (from == to) {
            return NOT_A_NUMBER;
        }
        int i = from;
        boolean negative = false;
        char c = s.charAt(i);
        if (c == '-' || c == '+' || c == '\u2212') {
            negative = c != '+';
            i++;
        }
        long mantissa = 0;
        int significant = 0;
        int digits = 0;
        int fraction = 0;
        boolean seenSeparator = false;
        boolean overflow = false;
        for (; i < to; i++) {
            c = s.charAt(i);
            if (c >= '0' && c <= '9') {
                digits++;
                if (seenSeparator) {
                    fraction++;
                }
                if (significant > 0 || c != '0') {
                    significant++;
                    if (significant <= 18) {
                        mantissa = mantissa * 10 + (c - '0');
                    } else {
                        overflow = true;
                    }
                }
            } else if (c == separator && !seenSeparator) {
                seenSeparator = true;
            } else {
                break;
            }
        }
        if (digits == 0) {
            return NOT_A_NUMBER;
        }
        long exponent = 0;
        if (i < to) {
            c = s.charAt(i);
            if (c != 'e' && c != 'E') {
                return NOT_A_NUMBER;
            }
            i++;
            boolean expNegative = false;
            if (i < to && (s.charAt(i) == '-' || s.charAt(i) == '+')) {
                expNegative = s.charAt(i) == '-';
                i++;
            }
            int expDigits = 0;
            for (; i < to; i++) {
                c = s.charAt(i);
                if (c < '0' || c > '9') {
                    return NOT_A_NUMBER;
                }
                expDigits++;
                if (exponent < 100_000_000L) {
                    exponent = exponent * 10 + (c - '0');
                }
            }
            if (expDigits == 0) {
                return NOT_A_NUMBER;
            }
            if (expNegative) {
                exponent = -exponent;
            }
        }
        if (!overflow) {
            long sc = fraction - exponent;
            long m = mantissa;
            if (sc < 0 && sc >= -18 && m != 0) {
                long p = LPOW10[(int) -sc];
                if (m <= Long.MAX_VALUE / p) {
                    m *= p;
                    sc = 0;
                }
            } else if (m == 0) {
                sc = Math.max(0, Math.min(sc, MAX_SCALE));
            }
            if (sc >= 0 && sc <= MAX_SCALE) {
                unscaled = negative ? -m : m;
                scale = (int) sc;
                value = toDouble(unscaled, scale);
                return EXACT;
            }
        }
        value = slowParse(s, from, to);
        return DOUBLE_ONLY;
    }

    private double slowParse(CharSequence s, int from, int to) {
        StringBuilder sb = new StringBuilder(to - from);
        for (int k = from; k < to; k++) {
            char c = s.charAt(k);
            sb.append(c == separator ? '.' : c == '\u2212' ? '-' : c);
        }
        return Double.parseDouble(sb.toString());
    }

    /**
     * The correctly rounded double of unscaled·10^−scale.
     *
     * @param unscaled the integer
     * @param scale    the number of decimals, 0..18
     * @return the double
     */
    static double toDouble(long unscaled, int scale) {
        if (Math.abs(unscaled) < MAX_EXACT && scale < POW10.length) {
            return scale == 0 ? (double) unscaled : (double) unscaled / POW10[scale];
        }
        return BigDecimal.valueOf(unscaled, scale).doubleValue();
    }

    /**
     * Whether unscaled·10^(to − from) fits a long, for bringing values to a common scale.
     *
     * @param unscaled the integer at scale {@code from}
     * @param from     its scale
     * @param to       the target scale, from..18
     * @return true when the rescaled integer fits
     */
    static boolean fitsRescale(long unscaled, int from, int to) {
        int d = to - from;
        if (d == 0) {
            return true;
        }
        long p = LPOW10[d];
        return Math.abs(unscaled) <= Long.MAX_VALUE / p;
    }

    /**
     * @param unscaled the integer at scale {@code from}
     * @param from     its scale
     * @param to       the target scale (checked with {@link #fitsRescale})
     * @return unscaled·10^(to − from)
     */
    static long rescale(long unscaled, int from, int to) {
        return unscaled * LPOW10[to - from];
    }
}
