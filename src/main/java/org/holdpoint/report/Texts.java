package org.holdpoint.report;

import java.util.Locale;
import org.holdpoint.result.Verdict;

/** Text for people inside the workbook: numbers in sentences, levels, verdict marks. Locale-independent. */
final class Texts {
    private Texts() {
    }

    /**
     * @param v a value
     * @return six significant digits, trailing zeros dropped
     */
    static String num(double v) {
        if (v == 0) {
            return "0";
        }
        double a = Math.abs(v);
        if (a >= 1e-4 && a < 1e7) {
            String s = String.format(Locale.ROOT, "%.6g", v);
            if (!s.contains("e") && s.contains(".")) {
                s = s.replaceAll("0+$", "").replaceAll("\\.$", "");
            }
            return s;
        }
        return String.format(Locale.ROOT, "%.4e", v);
    }

    /**
     * @param level a probability such as 0.9
     * @return "90 %"
     */
    static String percent(double level) {
        double pct = level * 100;
        if (Math.abs(pct - Math.rint(pct)) < 1e-9) {
            return String.format(Locale.ROOT, "%d %%", (long) Math.rint(pct));
        }
        return num(pct) + " %";
    }

    /**
     * The shape shown beside a status, so that no verdict relies on colour.
     *
     * @param s the status
     * @return a heavy check mark, a heavy cross, a question mark or a dash
     */
    static String mark(Verdict.Status s) {
        return switch (s) {
            case PASSED -> "\u2714";
            case FAILED -> "\u2716";
            case INCONCLUSIVE -> "?";
            case NOT_ASSESSED -> "\u2013";
            case NOT_ASSESSABLE -> "\u2298";
        };
    }

    /**
     * @param s the status
     * @return the cell style of that status
     */
    static Style style(Verdict.Status s) {
        return switch (s) {
            case PASSED -> Style.PASSED;
            case FAILED -> Style.FAILED;
            case INCONCLUSIVE -> Style.INCONCLUSIVE;
            case NOT_ASSESSED, NOT_ASSESSABLE -> Style.NOT_ASSESSED;
        };
    }

    /**
     * @param s the status
     * @return e.g. "✔ passed"
     */
    static String status(Verdict.Status s) {
        return mark(s) + " " + s.words();
    }
}
