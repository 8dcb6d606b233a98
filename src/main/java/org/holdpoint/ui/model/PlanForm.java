package org.holdpoint.ui.model;

import java.util.ArrayList;
import java.util.EnumMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import org.holdpoint.stats.Design;
import org.holdpoint.stats.EquivalencePlan;
import org.holdpoint.stats.Margin;
import org.holdpoint.stats.PlanResult;
import org.holdpoint.stats.PowerPoint;
import org.holdpoint.stats.StatsException;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.Dataset;
import org.holdpoint.workflow.PlanFromDataUseCase;

/**
 * The Plan step: how many parts a trial needs to show equivalence with a target power, by the exact
 * TOST power of {@link EquivalencePlan} (σ typed, or the sd of the current study's before sample).
 * Values are validated as typed; the reason is shown beside a bad field. Lives on the event thread;
 * planning runs through the session's task runner.
 */
public final class PlanForm {
    /** The typed values. */
    public enum Field {
        /** α of each one-sided test. */
        ALPHA("α (each one-sided test)", "0.05"),
        /** Symmetric margin D: (−D, +D). */
        SYMMETRIC("Margin ± D", ""),
        /** Lower margin L. */
        LOWER("Lower margin L", ""),
        /** Upper margin U. */
        UPPER("Upper margin U", ""),
        /** Expected true difference T = after − before. */
        DIFFERENCE("Expected true difference (after − before)", "0"),
        /** σ; for pairs the sd of the differences. */
        SD("Standard deviation σ", ""),
        /** Target power. */
        POWER("Target power", "0.9"),
        /** Allocation ratio n_after / n_before. */
        RATIO("Allocation ratio (after : before)", "1");

        private final String label;
        private final String initial;

        Field(String label, String initial) {
            this.label = label;
            this.initial = initial;
        }

        /** @return the field's label */
        public String label() {
            return label;
        }
    }

    /** How the margin is typed. */
    public enum MarginMode {
        /** One half-width D: (−D, +D). */
        SYMMETRIC("± D (symmetric)"),
        /** Two limits L &lt; 0 &lt; U. */
        LIMITS("L and U");

        private final String words;

        MarginMode(String words) {
            this.words = words;
        }

        @Override
        public String toString() {
            return words;
        }
    }

    /** The bound properties. */
    public enum Property {
        /** A value, the margin mode or the design changed (problems may have changed). */
        VALUES,
        /** A new plan (or none). */
        RESULT,
        /** The characteristics of the current data changed. */
        CHARACTERISTICS
    }

    /** What a planning job hands back: a plan, or why there is none. */
    private record Planned(PlanResult plan, String note) {
    }

    private final Bound<Property> bound = new Bound<>(this, Property.class);
    private final StudySession session;
    private final Map<Field, String> values = new EnumMap<>(Field.class);
    private MarginMode marginMode = MarginMode.SYMMETRIC;
    private Design design = Design.PARALLEL;
    private String characteristic;
    private String unit;
    private String filledFrom;
    private PlanResult result;
    private String resultFor = "";
    private PlanFromDataUseCase.Outcome all;
    private PlanFromDataUseCase.Curve drivingCurve;

    /** @return the curve of the driving criterion of the last "plan all" when spread or capability drives, or null */
    public PlanFromDataUseCase.Curve drivingCurve() {
        return drivingCurve;
    }


    private boolean stale;

    PlanForm(StudySession session) {
        this.session = session;
        for (Field f : Field.values()) {
            values.put(f, f.initial);
        }
        bound.addListener(Property.VALUES, e -> stale = result != null);
        session.addListener(StudySession.Property.DATA, e -> {
            List<String> names = characteristics();
            if (characteristic == null || !names.contains(characteristic)) {
                characteristic = names.isEmpty() ? null : names.get(0);
            }
            bound.fireChanged(Property.CHARACTERISTICS);
        });
    }

    /**
     * @param f the field
     * @return its text
     */
    public String get(Field f) {
        return values.get(f);
    }

    /**
     * Sets a field's text as typed (not checked here; see {@link #problem}).
     *
     * @param f    the field
     * @param text the text
     */
    public void set(Field f, String text) {
        String t = text == null ? "" : text;
        if (!t.equals(values.get(f))) {
            values.put(f, t);
            if (f == Field.SD || f == Field.SYMMETRIC || f == Field.LOWER || f == Field.UPPER) {
                filledFrom = null;
                unit = null;
            }
            bound.fireChanged(Property.VALUES);
        }
    }

    /** @return how the margin is typed */
    public MarginMode marginMode() {
        return marginMode;
    }

    /** @param m how the margin is typed */
    public void setMarginMode(MarginMode m) {
        if (m != marginMode) {
            marginMode = m;
            bound.fireChanged(Property.VALUES);
        }
    }

    /** @return parallel groups or pairs */
    public Design design() {
        return design;
    }

    /** @param d parallel groups or pairs */
    public void setDesign(Design d) {
        if (d != design) {
            design = d;
            bound.fireChanged(Property.VALUES);
        }
    }

    /** @return the characteristic whose baseline fills σ, or null */
    public String characteristic() {
        return characteristic;
    }

    /** @param name the characteristic whose baseline fills σ */
    public void setCharacteristic(String name) {
        characteristic = name;
    }

    /** @return the characteristics of the current data, in file order */
    public List<String> characteristics() {
        Dataset d = session.data();
        return d == null ? List.of() : d.characteristics().stream().map(c -> c.name()).toList();
    }

    /** @return whether a field is used with the current margin mode and design */
    public boolean uses(Field f) {
        return switch (f) {
            case SYMMETRIC -> marginMode == MarginMode.SYMMETRIC;
            case LOWER, UPPER -> marginMode == MarginMode.LIMITS;
            case RATIO -> design == Design.PARALLEL;
            default -> true;
        };
    }

    /**
     * Why a field's text cannot be used, or null when it can (or the field is not used now).
     *
     * @param f the field
     * @return the reason in plain words, or null
     */
    public String problem(Field f) {
        if (!uses(f)) {
            return null;
        }
        String t = values.get(f).trim();
        if (t.isEmpty()) {
            return "Enter a value.";
        }
        Double v = number(t);
        if (v == null) {
            return t.contains(",") ? "Use a point as the decimal mark, e.g. 0.05." : "Enter a number, e.g. 0.05.";
        }
        return switch (f) {
            case ALPHA -> org.holdpoint.study.CriteriaCheck.alpha(v);
            case SYMMETRIC -> v > 0 ? null : "D must be positive: the margin is −D to +D.";
            case LOWER -> v < 0 ? null : "L must be negative: the margin must contain 0.";
            case UPPER -> v > 0 ? null : "U must be positive: the margin must contain 0.";
            case DIFFERENCE -> differenceProblem(v);
            case SD -> v > 0 ? null : "σ must be positive.";
            case POWER -> powerProblem(v);
            case RATIO -> org.holdpoint.study.CriteriaCheck.allocationRatio(v);
        };
    }

    private String differenceProblem(double t) {
        Margin m = marginOrNull();
        if (m == null) {
            return null;
        }
        return m.lower() < t && t < m.upper() ? null
                : "The expected difference must lie strictly inside the margin (" + fmt(m.lower()) + ", "
                        + fmt(m.upper()) + ").";
    }

    private String powerProblem(double p) {
        Double a = problemFree(Field.ALPHA) ? number(values.get(Field.ALPHA).trim()) : null;
        if (!(p > 0 && p < 1)) {
            return "The target power is a probability below 1, e.g. 0.9.";
        }
        return a != null && p <= a ? "The target power must be above α." : null;
    }

    private boolean problemFree(Field f) {
        return problem(f) == null;
    }

    /** @return the first field with a problem, or null when all used fields are valid */
    public Field firstProblem() {
        for (Field f : Field.values()) {
            if (problem(f) != null) {
                return f;
            }
        }
        return null;
    }

    /**
     * The margin as typed.
     *
     * @return the margin, or null when its fields are not valid
     */
    public Margin marginOrNull() {
        if (marginMode == MarginMode.SYMMETRIC) {
            return problem(Field.SYMMETRIC) == null ? Margin.symmetric(value(Field.SYMMETRIC)) : null;
        }
        return problem(Field.LOWER) == null && problem(Field.UPPER) == null
                ? Margin.of(value(Field.LOWER), value(Field.UPPER)) : null;
    }

    /**
     * The planning settings as typed.
     *
     * @return the settings
     * @throws IllegalStateException when a field has a problem
     */
    public EquivalencePlan toPlan() {
        Field bad = firstProblem();
        if (bad != null) {
            throw new IllegalStateException(bad.label() + ": " + problem(bad));
        }
        return settings(marginOrNull());
    }

    private EquivalencePlan settings(Margin m) {
        EquivalencePlan p = EquivalencePlan.withDefaults().withAlpha(value(Field.ALPHA)).with(design)
                .withTargetPower(value(Field.POWER));
        if (m != null) {
            p = p.withMargin(m);
        }
        return design == Design.PARALLEL ? p.withRatio(value(Field.RATIO)) : p;
    }

    /** Plans with the typed values: the smallest n whose exact TOST power reaches the target. */
    public void plan() {
        EquivalencePlan p;
        try {
            p = toPlan();
        } catch (IllegalStateException e) {
            session.problem(new UserMessage("Values to correct", e.getMessage(),
                    "Correct the marked fields (the reason is shown beside each), then plan again."));
            return;
        }
        double t = value(Field.DIFFERENCE);
        double sd = value(Field.SD);
        String title = filledFrom != null ? filledFrom : "typed values";
        session.start("Planning", x -> {
            try {
                return new Planned(p.sampleSize(t, sd), null);
            } catch (StatsException e) {
                return new Planned(null, e.getMessage());
            }
        }, r -> {
            all = null;
            drivingCurve = null;
            if (r.plan() == null) {
                show(null, "");
                session.problem(new UserMessage("No plan", "The target power cannot be reached: " + r.note() + ".",
                        "Widen the margin, lower the target power or move the expected difference towards 0."));
                return;
            }
            show(r.plan(), title);
            session.status("Planned: " + sizeWords(r.plan()) + ".");
        });
    }

    /**
     * Fills σ (and the margin, when the criteria set one) from the before sample of the chosen
     * characteristic of the current study, then plans when every value is valid.
     */
    public void fromBaseline() {
        String name = characteristic;
        AnalysisSettings settings = baselineSettings();
        if (settings == null || name == null) {
            return;
        }
        Dataset d = session.data();
        session.start("Reading the baseline of " + name, x -> PlanFromDataUseCase.run(d, settings, null,
                EquivalencePlan.withDefaults(), 0.0), o -> {
                    var c = o.plans().stream().filter(q -> q.name().equals(name)).findFirst().orElse(null);
                    if (c == null || !(c.sd() > 0)) {
                        session.problem(new UserMessage("No baseline spread", "\"" + name + "\" has "
                                + (c == null ? "no data" : c.note() != null ? c.note() : "no spread") + ".",
                                "Choose another characteristic, or type σ."));
                        return;
                    }
                    if (c.margin() != null && c.margin().ratio()) {
                        session.problem(new UserMessage("A ratio margin", "\"" + name + "\" has a margin for the "
                                + "ratio after/before; this form plans a margin in units.", "Press \"Plan every "
                                + "characteristic\", which plans a ratio margin on the logarithms, or type a margin "
                                + "in units here."));
                        return;
                    }
                    fill(c.sd(), c.margin(), c.unit(), name);
                    if (firstProblem() == null) {
                        plan();
                    }
                });
    }

    /**
     * Plans every characteristic of the current study with its own baseline σ and criteria margin and
     * names the one that needs the most parts.
     */
    public void planAll() {
        for (Field f : List.of(Field.ALPHA, Field.POWER, Field.RATIO)) {
            if (problem(f) != null) {
                session.problem(new UserMessage("Values to correct", f.label() + ": " + problem(f),
                        "Correct the marked field, then plan again."));
                return;
            }
        }
        Double t = number(values.get(Field.DIFFERENCE).trim());
        if (t == null) {
            session.problem(new UserMessage("Values to correct", Field.DIFFERENCE.label() + ": enter a number.",
                    "Correct the marked field, then plan again."));
            return;
        }
        AnalysisSettings settings = baselineSettings();
        if (settings == null) {
            return;
        }
        EquivalencePlan p = settings(null);
        Dataset d = session.data();
        session.start("Planning every characteristic", x -> {
            var out = PlanFromDataUseCase.run(d, settings, null, p, t, null, 1);
            PlanFromDataUseCase.Curve curve = PlanFromDataUseCase.drivingCurve(out, d, settings, p);
            return java.util.Map.entry(out, java.util.Optional.ofNullable(curve));
        }, done -> {
            var o = done.getKey();
            drivingCurve = done.getValue().orElse(null);
            var drive = o.driving();
            if (drive == null) {
                show(null, "");
                all = o;
                bound.fireChanged(Property.RESULT);
                session.problem(new UserMessage("No plan", "No characteristic could be planned; see the list.",
                        "Set a two-sided margin for each characteristic on the Criteria step."));
                return;
            }
            all = o;
            if (drive.plan() != null) {
                fill(drive.sd(), drive.margin(), drive.unit(), drive.name());
                show(drive.plan(), drive.name());
            } else {
                show(null, "");
                bound.fireChanged(Property.RESULT);
            }
            session.status("Planned every characteristic; \"" + drive.name() + "\" needs the most parts: "
                    + drive.needed() + " per group, for its " + drive.drivenBy() + " criterion.");
        });
    }

    private AnalysisSettings baselineSettings() {
        if (session.data() == null) {
            session.problem(new UserMessage("No data yet", "There is no baseline to plan from.",
                    "Open the before data on the Data step, or type σ."));
            return null;
        }
        try {
            return session.currentSettings();
        } catch (IllegalStateException | IllegalArgumentException e) {
            session.problem(new UserMessage("Criteria to correct", e.getMessage(),
                    "Correct the marked cells on the Criteria step, then plan again."));
            return null;
        }
    }

    private void fill(double sd, Margin m, String u, String name) {
        values.put(Field.SD, fmt(sd, 6));
        if (m != null && m.lower() != null && m.upper() != null) {
            if (Math.abs(m.lower() + m.upper()) <= 1e-12 * m.upper()) {
                marginMode = MarginMode.SYMMETRIC;
                values.put(Field.SYMMETRIC, fmt(m.upper(), 6));
            } else {
                marginMode = MarginMode.LIMITS;
                values.put(Field.LOWER, fmt(m.lower(), 6));
                values.put(Field.UPPER, fmt(m.upper(), 6));
            }
        }
        characteristic = name;
        filledFrom = name;
        unit = u == null ? "" : u;
        bound.fireChanged(Property.VALUES);
    }

    private void show(PlanResult r, String title) {
        result = r;
        stale = false;
        resultFor = title;
        bound.fireChanged(Property.RESULT);
    }

    /** @return whether a value changed since the last plan was made */
    public boolean stale() {
        return stale;
    }

    /** @return the last plan, or null */
    public PlanResult result() {
        return result;
    }

    /** @return what the last plan is for: a characteristic's name or "typed values" */
    public String resultFor() {
        return resultFor;
    }

    /** @return the unit of the characteristic last filled from the data, or null */
    public String unit() {
        return unit == null || unit.isEmpty() ? null : unit;
    }

    /** @return the plans of every characteristic from the last "plan all", or null */
    public PlanFromDataUseCase.Outcome allPlans() {
        return all;
    }

    /**
     * The last plan as labelled lines.
     *
     * @return label and value pairs; empty when there is no plan
     */
    public List<String[]> resultLines() {
        List<String[]> l = new ArrayList<>();
        PlanResult r = result;
        if (r == null) {
            return l;
        }
        if (r.design() == Design.PAIRED) {
            l.add(new String[] {"Pairs (each part measured before and after)", Integer.toString(r.n())});
        } else {
            l.add(new String[] {"Parts before (n₁)", Integer.toString(r.n())});
            l.add(new String[] {"Parts after (n₂)", Integer.toString(r.nAfter())});
        }
        l.add(new String[] {"Parts measured in all", Long.toString(r.totalUnits())});
        if (r.targetPower() != null) {
            l.add(new String[] {"Target power", pct(r.targetPower())});
        }
        l.add(new String[] {"Achieved power (exact TOST)", pct(r.achievedPower())});
        l.add(new String[] {r.design() == Design.PAIRED ? "Power with one pair fewer"
                : "Power with one part fewer in each group", r.powerAtPrevious() == null ? "not defined"
                : pct(r.powerAtPrevious())});
        l.add(new String[] {"t-test power for the expected difference", pct(r.tTestPower())});
        String u = unit() == null ? "" : " " + unit();
        l.add(new String[] {"Margin (L, U)", "(" + (Double.isInfinite(r.marginLower()) ? "none" : fmt(r.marginLower()))
                + ", " + (Double.isInfinite(r.marginUpper()) ? "none" : fmt(r.marginUpper())) + ")" + u});
        l.add(new String[] {"α, σ, expected difference", fmt(r.alpha()) + ", " + fmt(r.sd()) + u + ", "
                + fmt(r.difference()) + u});
        return l;
    }

    /** @return the true differences of the power curve of the last plan */
    public double[] curveDifferences() {
        return result == null ? new double[0]
                : result.powerTable().stream().mapToDouble(PowerPoint::difference).toArray();
    }

    /** @return the power at each {@link #curveDifferences difference} */
    public double[] curvePower() {
        return result == null ? new double[0] : result.powerTable().stream().mapToDouble(PowerPoint::power).toArray();
    }

    /**
     * @param property the property
     * @param listener told of changes, on the event thread
     */
    public void addListener(Property property, java.beans.PropertyChangeListener listener) {
        bound.addListener(property, listener);
    }

    /** @return the plan's size in words, e.g. "12 before + 12 after" */
    static String sizeWords(PlanResult r) {
        return r.design() == Design.PAIRED ? r.n() + " pairs" : r.n() + " before + " + r.nAfter() + " after";
    }

    private double value(Field f) {
        return number(values.get(f).trim());
    }

    private static Double number(String t) {
        if (!t.matches("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?")) {
            return null;
        }
        double v = Double.parseDouble(t);
        return Double.isFinite(v) ? v : null;
    }

    private static String pct(double p) {
        // two decimals: the power one part below the plan lies just under the target (79.96 %, not "80.0 %")
        return String.format(Locale.ROOT, "%.2f %%", 100 * p);
    }

    /**
     * A value with 4 significant digits, without trailing zeros.
     *
     * @param v the value
     * @return the text
     */
    static String fmt(double v) {
        return fmt(v, 4);
    }

    private static String fmt(double v, int digits) {
        return new java.math.BigDecimal(v).round(new java.math.MathContext(digits)).stripTrailingZeros()
                .toPlainString();
    }
}
