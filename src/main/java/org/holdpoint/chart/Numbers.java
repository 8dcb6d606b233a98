package org.holdpoint.chart;

import java.math.BigDecimal;
import java.math.MathContext;
import org.holdpoint.result.Format;

/** Number text on charts: up to six significant digits, no exponent for everyday magnitudes, Locale-free. */
final class Numbers {
    private Numbers() {
    }

    /**
     * @param v a finite value
     * @return v rounded to six significant digits, trailing zeros dropped, e.g. "12.45" or "-0.0035"
     */
    static String format(double v) {
        if (v == 0) {
            return "0";
        }
        BigDecimal d = new BigDecimal(v).round(new MathContext(6)).stripTrailingZeros();
        double abs = Math.abs(v);
        String s = abs >= 1e-4 && abs < 1e9 ? d.toPlainString() : d.toString();
        return s.startsWith("-") ? "\u2212" + s.substring(1) : s;
    }

    /**
     * A value in a characteristic's unit with a fixed number of decimals (its resolution plus two for a
     * statistic, its resolution for a bin width), rounded by the same rule as the text and the workbook
     * ({@link Format#fixed}), with a typographic minus.
     *
     * @param v        a finite value
     * @param decimals 0..10
     * @return e.g. "12.0483" or "−0.0035"
     */
    static String fixed(double v, int decimals) {
        String s = Format.fixed(v, decimals);
        return s.startsWith("-") ? "\u2212" + s.substring(1) : s;
    }

    /**
     * Tick labels as people write numbers: plain decimals to six significant digits, never "1E-4" or "0E0".
     *
     * @return a format for an axis' number format override
     */
    static java.text.NumberFormat plainFormat() {
        return new java.text.NumberFormat() {
            private static final long serialVersionUID = 1L;

            @Override
            public StringBuffer format(double v, StringBuffer to, java.text.FieldPosition pos) {
                // a tick a rounding error away from zero is zero
                return to.append(Math.abs(v) < 1e-12 ? "0" : Numbers.format(v).replace('\u2212', '-'));
            }

            @Override
            public StringBuffer format(long v, StringBuffer to, java.text.FieldPosition pos) {
                return to.append(v);
            }

            @Override
            public Number parse(String source, java.text.ParsePosition pos) {
                throw new UnsupportedOperationException("axis labels are not parsed");
            }
        };
    }

    /**
     * @param name the characteristic's name
     * @param unit its unit, or null
     * @return "name [unit]", or "name (unit not given)"
     */
    static String axisLabel(String name, String unit) {
        return unit == null || unit.isBlank() ? name + " (unit not given)" : name + " [" + unit + "]";
    }
}
