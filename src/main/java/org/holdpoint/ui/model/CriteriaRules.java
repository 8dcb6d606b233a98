package org.holdpoint.ui.model;

import java.math.BigDecimal;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.MarginSpec;
import org.holdpoint.study.SpecLimits;

/** The checks of the Criteria step, cell by cell, and the conversion of a valid row to settings. */
final class CriteriaRules {
    private static final java.util.regex.Pattern NUMBER =
            java.util.regex.Pattern.compile("[-+]?(\\d+\\.?\\d*|\\.\\d+)([eE][-+]?\\d+)?");
    private CriteriaRules() {
    }

    /** A parsed margin: bounds as the study's {@link MarginSpec} wants them. */
    record Bounds(Double lower, Double upper) {
    }

    static String problem(String[] r, CriteriaColumn col) {
        String t = r[col.ordinal()];
        return switch (col) {
            case CHARACTERISTIC, UNIT -> null;
            case LSL, NOMINAL -> numberProblem(t, col == CriteriaColumn.NOMINAL ? nominalProblem(r) : null);
            case USL -> numberProblem(t, uslProblem(r));
            case MARGIN -> marginProblem(r);
            case MARGIN_IN, PAIRED, ANALYSE, DISTRIBUTION, STABILITY -> col.choices().contains(t) ? null : "choose one of " + String.join(", ",
                    col.choices());
            case SD_GROWTH -> positive(t, "the sd-growth limit", "1.25");
            case CAPABILITY -> positive(t, "the capability requirement", "1.33");
            case TOLERANCE -> toleranceProblem(t);
        };
    }

    private static String toleranceProblem(String t) {
        try {
            tolerance(t);
            return null;
        } catch (IllegalArgumentException e) {
            return e.getMessage();
        }
    }

    private static String numberProblem(String t, String relation) {
        if (!isNumber(t)) {
            return notANumber(t);
        }
        return relation;
    }

    private static String uslProblem(String[] r) {
        return specProblem(r, org.holdpoint.study.CriteriaCheck.Field.USL);
    }

    private static String nominalProblem(String[] r) {
        return specProblem(r, org.holdpoint.study.CriteriaCheck.Field.NOMINAL);
    }

    /** The one set of criteria rules (study.CriteriaCheck) applied to the limits as typed. */
    private static String specProblem(String[] r, org.holdpoint.study.CriteriaCheck.Field field) {
        return org.holdpoint.study.CriteriaCheck.check(number(r[CriteriaColumn.LSL.ordinal()]),
                number(r[CriteriaColumn.NOMINAL.ordinal()]), number(r[CriteriaColumn.USL.ordinal()]), null, null, null)
                .stream()
                .filter(p -> p.field() == field).map(org.holdpoint.study.CriteriaCheck.Problem::message).findFirst()
                .orElse(null);
    }

    private static String positive(String t, String what, String example) {
        if (!isNumber(t)) {
            return notANumber(t);
        }
        Double v = number(t);
        var problems = what.contains("sd-growth") ? org.holdpoint.study.CriteriaCheck.check(null, null, null, null, v,
                null) : org.holdpoint.study.CriteriaCheck.check(null, null, null, null, null, v);
        return problems.isEmpty() ? null : problems.get(0).message();
    }

    private static String marginProblem(String[] r) {
        String t = r[CriteriaColumn.MARGIN.ordinal()];
        if (t.isEmpty()) {
            return null;
        }
        MarginSpec.Kind kind = kindOf(r[CriteriaColumn.MARGIN_IN.ordinal()]);
        Bounds b;
        try {
            b = margin(t, kind);
        } catch (IllegalArgumentException e) {
            return e.getMessage();
        }
        return kind == MarginSpec.Kind.ABSOLUTE || kind == MarginSpec.Kind.RATIO ? null
                : org.holdpoint.study.CriteriaCheck.resolvable(new MarginSpec(kind,
                b.lower(), b.upper()), specOrNone(number(r[CriteriaColumn.LSL.ordinal()]),
                        number(r[CriteriaColumn.USL.ordinal()])));
    }

    /** The kind of margin the Margin-in choice names. */
    static MarginSpec.Kind kindOf(String marginIn) {
        return CriteriaTable.IN_PERCENT.equals(marginIn) ? MarginSpec.Kind.PERCENT_OF_TOLERANCE
                : CriteriaTable.IN_PERCENT_USL.equals(marginIn) ? MarginSpec.Kind.PERCENT_OF_UPPER_LIMIT
                : CriteriaTable.IN_RATIO.equals(marginIn) ? MarginSpec.Kind.RATIO
                : MarginSpec.Kind.ABSOLUTE;
    }

    private static SpecLimits specOrNone(Double lsl, Double usl) {
        return org.holdpoint.study.CriteriaCheck.limitsProblem(lsl, usl) == null ? new SpecLimits(lsl, null, usl)
                : SpecLimits.NONE;
    }

    /**
     * Parses a margin: one number d for (−d, d) (or ±d % of tolerance), or "L / U" with either side empty.
     *
     * @return the bounds, or null when the text is empty
     * @throws IllegalArgumentException with the reason in plain words
     */
    static Bounds margin(String text, boolean percent) {
        return margin(text, percent ? MarginSpec.Kind.PERCENT_OF_TOLERANCE : MarginSpec.Kind.ABSOLUTE);
    }

    /**
     * Parses a margin of the given kind; in percent of the USL one number p means an upper margin of p %.
     *
     * @return the bounds, or null when the text is empty
     * @throws IllegalArgumentException with the reason in plain words
     */
    static Bounds margin(String text, MarginSpec.Kind kind) {
        boolean percent = kind != MarginSpec.Kind.ABSOLUTE;
        String t = text.replace("±", "").replace("+/-", "").trim();
        if (t.isEmpty()) {
            return null;
        }
        if (kind == MarginSpec.Kind.RATIO) {
            return ratioMargin(t);
        }
        if (kind == MarginSpec.Kind.PERCENT_OF_UPPER_LIMIT) {
            Double d = parse(t.replace("/", "").trim());
            if (d == null || !(d > 0)) {
                throw new IllegalArgumentException("give a positive percentage p: the characteristic may grow by at "
                        + "most p % of its USL");
            }
            return new Bounds(null, d);
        }
        if (!t.contains("/")) {
            Double d = parse(t);
            if (d == null || !(d > 0)) {
                throw new IllegalArgumentException("give a positive number d for the margin (−d, d), or L / U");
            }
            return new Bounds(percent ? d : -d, d);
        }
        String[] parts = t.split("/", -1);
        if (parts.length != 2) {
            throw new IllegalArgumentException("write the margin as L / U, e.g. -0.01 / 0.02");
        }
        Double lo = parts[0].isBlank() ? null : parse(parts[0].trim());
        Double hi = parts[1].isBlank() ? null : parse(parts[1].trim());
        if (!parts[0].isBlank() && lo == null || !parts[1].isBlank() && hi == null) {
            throw new IllegalArgumentException("both sides of L / U must be numbers (or empty)");
        }
        if (lo == null && hi == null) {
            throw new IllegalArgumentException("give at least one side of L / U");
        }
        if (percent) {
            lo = lo == null ? null : Math.abs(lo);
        }
        String problem = org.holdpoint.study.CriteriaCheck.margin(new MarginSpec(percent
                ? MarginSpec.Kind.PERCENT_OF_TOLERANCE : MarginSpec.Kind.ABSOLUTE, lo, hi));
        if (problem != null) {
            throw new IllegalArgumentException(problem);
        }
        return new Bounds(lo, hi);
    }

    /** A ratio margin: one number R for 1/R to R, or "L / U" with either side empty. */
    private static Bounds ratioMargin(String t) {
        if (!t.contains("/")) {
            Double r = parse(t);
            if (r == null || !(r > 1)) {
                throw new IllegalArgumentException("give a ratio R above 1 for after/before between 1/R and R (e.g. "
                        + "1.25), or L / U such as 0.9 / 1.1");
            }
            return new Bounds(1 / r, r);
        }
        String[] parts = t.split("/", -1);
        Double lo = parts.length == 2 && !parts[0].isBlank() ? parse(parts[0].trim()) : null;
        Double hi = parts.length == 2 && !parts[1].isBlank() ? parse(parts[1].trim()) : null;
        if (parts.length != 2 || !parts[0].isBlank() && lo == null || !parts[1].isBlank() && hi == null
                || lo == null && hi == null) {
            throw new IllegalArgumentException("write the ratio margin as L / U, e.g. 0.9 / 1.1 (either side may be "
                    + "empty)");
        }
        String problem = org.holdpoint.study.CriteriaCheck.margin(new MarginSpec(MarginSpec.Kind.RATIO, lo, hi));
        if (problem != null) {
            throw new IllegalArgumentException(problem);
        }
        return new Bounds(lo, hi);
    }

    static CharacteristicSettings settings(String[] r) {
        String unit = r[CriteriaColumn.UNIT.ordinal()];
        SpecLimits spec = new SpecLimits(number(r[CriteriaColumn.LSL.ordinal()]),
                number(r[CriteriaColumn.NOMINAL.ordinal()]), number(r[CriteriaColumn.USL.ordinal()]));
        MarginSpec.Kind kind = kindOf(r[CriteriaColumn.MARGIN_IN.ordinal()]);
        Bounds b = margin(r[CriteriaColumn.MARGIN.ordinal()], kind);
        MarginSpec m = b == null ? null : new MarginSpec(kind, b.lower(), b.upper());
        String paired = r[CriteriaColumn.PAIRED.ordinal()];
        Boolean p = CriteriaTable.FROM_DATA.equals(paired) ? null : "yes".equals(paired);
        String d = r[CriteriaColumn.DISTRIBUTION.ordinal()];
        return new CharacteristicSettings(unit.isEmpty() ? null : unit, spec, m,
                number(r[CriteriaColumn.SD_GROWTH.ordinal()]), number(r[CriteriaColumn.CAPABILITY.ordinal()]), p,
                CriteriaTable.BY_RULE.equals(d) ? null : org.holdpoint.study.DistributionSetting.parse(d),
                CriteriaTable.REQUIRED.equals(r[CriteriaColumn.STABILITY.ordinal()]) ? Boolean.TRUE : null,
                tolerance(r[CriteriaColumn.TOLERANCE.ordinal()]));
    }

    /**
     * Reads "coverage / confidence", e.g. "0.99 / 0.95".
     *
     * @param t the cell's text
     * @return the requirement, or null for an empty cell
     * @throws IllegalArgumentException when it is not two numbers between 0 and 1
     */
    static org.holdpoint.study.ToleranceRequirement tolerance(String t) {
        if (t == null || t.isBlank()) {
            return null;
        }
        String[] parts = t.split("/");
        Double cov = parts.length == 2 && isNumber(parts[0].strip()) ? number(parts[0].strip()) : null;
        Double conf = parts.length == 2 && isNumber(parts[1].strip()) ? number(parts[1].strip()) : null;
        if (cov == null || conf == null) {
            throw new IllegalArgumentException("write the coverage and the confidence as two numbers, e.g. 0.99 / 0.95");
        }
        return new org.holdpoint.study.ToleranceRequirement(cov, conf);
    }

    static String marginText(MarginSpec m) {
        if (m.kind() == MarginSpec.Kind.PERCENT_OF_UPPER_LIMIT) {
            return text(m.upper());
        }
        if (m.kind() == MarginSpec.Kind.RATIO) {
            if (m.lower() != null && m.upper() != null && m.lower() == 1 / m.upper()) {
                return text(m.upper());
            }
            return text(m.lower()) + " / " + text(m.upper());
        }
        boolean percent = m.kind() == MarginSpec.Kind.PERCENT_OF_TOLERANCE;
        if (m.lower() != null && m.upper() != null) {
            double lo = percent ? m.lower() : -m.lower();
            if (lo == m.upper()) {
                return text(m.upper());
            }
        }
        return text(m.lower()) + " / " + text(m.upper());
    }

    static boolean isNumber(String t) {
        return t.isEmpty() || parse(t) != null;
    }

    static Double number(String t) {
        return t.isEmpty() ? null : parse(t);
    }

    private static String notANumber(String t) {
        if (t.matches("-?\\d+,\\d+")) {
            return "use a point as the decimal separator (" + t.replace(',', '.') + ")";
        }
        return "\"" + t + "\" is not a number";
    }

    private static Double parse(String t) {
        if (!NUMBER.matcher(t.trim()).matches()) {
            return null;
        }
        try {
            double v = Double.parseDouble(t.trim());
            return Double.isFinite(v) ? v : null;
        } catch (NumberFormatException e) {
            return null;
        }
    }

    static String text(Double v) {
        if (v == null) {
            return "";
        }
        return new BigDecimal(Double.toString(v)).stripTrailingZeros().toPlainString();
    }
}
