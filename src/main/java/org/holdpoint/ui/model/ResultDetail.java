package org.holdpoint.ui.model;

import java.util.ArrayList;
import java.util.List;
import org.holdpoint.stats.Descriptives;
import org.holdpoint.stats.EquivalenceResult;
import org.holdpoint.stats.TTestResult;
import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.result.Format;
import org.holdpoint.result.Verdict;

/**
 * The numbers, checks and notes of one characteristic, as labelled sections of text; the window
 * only lays them out. Numbers come from the analysis and are only formatted here.
 */
public final class ResultDetail {
    /** A titled group of label–value lines. */
    public record Section(String title, List<Line> lines) {
        /** Copies the lines. */
        public Section {
            lines = List.copyOf(lines);
        }
    }

    /** One label and its value. */
    public record Line(String label, String value) {
    }

    private ResultDetail() {
    }

    /**
     * The sections of one characteristic: verdict, groups, difference, equivalence, spread, notes.
     *
     * @param r the result
     * @return the sections, in reading order
     */
    public static List<Section> of(CharacteristicResult r) {
        return of(r, null);
    }

    /**
     * The sections, with values in the characteristic's unit at a fixed number of decimals.
     *
     * @param r        the result
     * @param decimals the decimals of values in its unit (its resolution plus two), or null for six
     *                 significant digits
     * @return the sections, in reading order
     */
    public static List<Section> of(CharacteristicResult r, Integer decimals) {
        java.util.function.DoubleFunction<String> u = decimals == null ? Format::num
                : v -> Format.fixed(v, decimals);
        java.util.function.DoubleFunction<String> raw = decimals == null ? Format::num
                : v -> Format.fixed(v, Math.max(0, decimals - 2));
        List<Section> s = new ArrayList<>();
        List<Line> verdict = new ArrayList<>();
        verdict.add(new Line("Conclusion", VerdictLook.conclusion(r)));
        r.verdict().reasons().forEach(x -> verdict.add(new Line("Because", x)));
        s.add(new Section("Verdict", verdict));
        s.add(groups(r.before(), r.after(), r.unit(), u, raw));
        if (r.verdict().status() == org.holdpoint.result.Verdict.Status.NOT_ASSESSABLE) {
            s.add(new Section("Not assessable", List.of(new Line("", "No test was computed: the data of this "
                    + "characteristic cannot show a change (the reason is above). The other characteristics were "
                    + "analysed."))));
            if (!r.notes().isEmpty()) {
                s.add(new Section("Notes", r.notes().stream().map(n -> new Line("", n)).toList()));
            }
            return s;
        }
        s.add(difference(r.decidingTest(), u));
        EquivalenceResult eq = r.decidingTost();
        if (eq != null) {
            s.add(equivalence(eq, u));
        }
        s.add(spread(r));
        Section tolerance = tolerance(r);
        if (tolerance != null) {
            s.add(tolerance);
        }
        Section interval = toleranceInterval(r);
        if (interval != null) {
            s.add(interval);
        }
        if (!r.notes().isEmpty()) {
            s.add(new Section("Notes", r.notes().stream().map(n -> new Line("", n)).toList()));
        }
        return s;
    }

    /**
     * How the parts sit in the tolerance, before → after, in the same form as the other sections: the decision
     * first (the after group's lower bound of Ppk against the requirement), then the indices and the expected
     * share outside the limits under the normal model.
     */
    private static Section tolerance(CharacteristicResult r) {
        var k = r.checks();
        if (k == null) {
            return null;
        }
        if (k.before().percentile() != null || k.after().percentile() != null) {
            return fitted(r, k);
        }
        var b = k.before() == null ? null : k.before().capability();
        var a = k.after() == null ? null : k.after().capability();
        if (a == null && b == null) {
            return null;
        }
        List<Line> l = new ArrayList<>();
        Double req = r.settings().capabilityRequirement();
        double level = 1 - (a != null ? a.alpha() : b.alpha());
        if (a != null && a.ppkLower() != null) {
            l.add(new Line("Decides", "after: " + Format.percent(level) + " lower bound of Ppk " + Format.ratio(
                    a.ppkLower()) + (req == null ? " (no requirement set)" : Boolean.TRUE.equals(k.capabilityMet())
                    ? " meets the required " + Format.num(req) : " does NOT meet the required " + Format.num(req))));
        }
        l.add(new Line("Ppk", opt(b == null ? null : b.ppk()) + "  →  " + opt(a == null ? null : a.ppk())));
        l.add(new Line("Ppk lower bound", opt(b == null ? null : b.ppkLower()) + "  →  "
                + opt(a == null ? null : a.ppkLower())));
        if ((b != null && b.pp() != null) || (a != null && a.pp() != null)) {
            l.add(new Line("Pp (both limits)", opt(b == null ? null : b.pp()) + "  →  " + opt(a == null ? null
                    : a.pp())));
        }
        if ((b != null && b.cpk() != null) || (a != null && a.cpk() != null)) {
            l.add(new Line("Cpk (within)", opt(b == null ? null : b.cpk()) + "  →  " + opt(a == null ? null
                    : a.cpk())));
        }
        l.add(new Line("Outside, ppm", outside(b) + "  →  " + outside(a)));
        l.add(new Line("", "Ppk from the overall sd; expected parts per million below LSL + above USL under the "
                + "normal model, which a skewed characteristic does not follow (see the shape checks)."));
        return new Section("In the tolerance", l);
    }

    /** The tolerance interval section (docs/methods.md §17), when the criteria ask for one. */
    private static Section toleranceInterval(CharacteristicResult r) {
        var t = r.settings().tolerance();
        var k = r.checks();
        if (t == null || k == null) {
            return null;
        }
        var b = k.before().tolerance();
        var a = k.after().tolerance();
        List<Line> l = new ArrayList<>();
        String decision = org.holdpoint.result.Verdicts.toleranceFinding(r, Format::num);
        l.add(new Line("Decides", "after: " + decision));
        l.add(new Line("Interval", interval(b) + "  →  " + interval(a)));
        var any = a != null ? a : b;
        if (any != null) {
            l.add(new Line("Method", any.method().words() + ", " + any.sides().key() + (any.k() == null ? ""
                    : ", k = " + Format.num(any.k(), 6) + " (after)")));
            l.add(new Line("Confidence", (b == null ? "—" : Format.percent(b.achievedConfidence())) + "  →  "
                    + (a == null ? "—" : Format.percent(a.achievedConfidence())) + " (asked "
                    + Format.percent(t.confidence()) + ")"));
        }
        return new Section("Tolerance interval, " + t.words(), l);
    }

    private static String interval(org.holdpoint.stats.ToleranceInterval t) {
        if (t == null) {
            return "not computed";
        }
        return Format.interval(t, Format::num);
    }

    /** The tolerance section when capability is judged by a fitted distribution (percentile method). */
    private static Section fitted(CharacteristicResult r, org.holdpoint.result.AssumptionChecks k) {
        var b = k.before().percentile();
        var a = k.after().percentile();
        var any = a != null ? a : b;
        List<Line> l = new ArrayList<>();
        Double req = r.settings().capabilityRequirement();
        if (a != null && a.ppkLower() != null) {
            l.add(new Line("Decides", "after: " + Format.percent(1 - a.alpha()) + " lower bound of Ppk " + Format.ratio(
                    a.ppkLower()) + (req == null ? " (no requirement set)" : Boolean.TRUE.equals(k.capabilityMet())
                    ? " meets the required " + Format.num(req) : " does NOT meet the required " + Format.num(req))));
        }
        l.add(new Line("Model", any.fit().family().key() + " fit, percentile method" + (k.distribution() == null ? ""
                : " (" + k.distribution().reason() + ")")));
        l.add(new Line("Ppk", opt(b == null ? null : b.ppk()) + "  →  " + opt(a == null ? null : a.ppk())));
        l.add(new Line("Ppk lower bound", opt(b == null ? null : b.ppkLower()) + "  →  "
                + opt(a == null ? null : a.ppkLower())));
        if (any.pp() != null) {
            l.add(new Line("Pp (both limits)", opt(b == null ? null : b.pp()) + "  →  " + opt(a == null ? null
                    : a.pp())));
        }
        l.add(new Line("X0.135 / X50 / X99.865", quantiles(b) + "  →  " + quantiles(a)));
        l.add(new Line("Outside, ppm", (b == null ? "–" : ppm(b.ppmBelow()) + " + " + ppm(b.ppmAbove())) + "  →  "
                + (a == null ? "–" : ppm(a.ppmBelow()) + " + " + ppm(a.ppmAbove()))));
        l.add(new Line("", "Indices from the fitted distribution's 0.135 %, 50 % and 99.865 % points (ISO 22514-2 "
                + "percentile method); the lower bound by a parametric bootstrap (seed " + any.seed() + ", "
                + any.resamples() + " resamples)."));
        return new Section("In the tolerance", l);
    }

    private static String quantiles(org.holdpoint.stats.PercentileCapabilityResult c) {
        return c == null ? "–" : Format.num(c.x00135(), 4) + " / " + Format.num(c.x50(), 4) + " / "
                + Format.num(c.x99865(), 4);
    }

    private static String opt(Double v) {
        return v == null ? "–" : Format.ratio(v);
    }

    private static String outside(org.holdpoint.stats.CapabilityResult c) {
        if (c == null) {
            return "–";
        }
        return ppm(c.ppmBelow()) + " + " + ppm(c.ppmAbove());
    }

    private static String ppm(Double v) {
        return v == null ? "–" : Format.num(v, 3);
    }

    private static Section groups(Descriptives b, Descriptives a, String unit,
            java.util.function.DoubleFunction<String> f, java.util.function.DoubleFunction<String> raw) {
        String u = unit == null || unit.isEmpty() ? "" : " (" + unit + ")";
        if (b == null || a == null) {
            return new Section("Before and after" + u, List.of(new Line("n", (b == null ? 0 : b.n()) + "  →  "
                    + (a == null ? 0 : a.n()) + "  (a group without a usable value)")));
        }
        return new Section("Before and after" + u, List.of(
                new Line("n", b.n() + "  →  " + a.n()),
                new Line("Mean", f.apply(b.mean()) + "  →  " + f.apply(a.mean())),
                new Line("Standard deviation", f.apply(b.sd()) + "  →  " + f.apply(a.sd())),
                new Line("Median (type 7)", f.apply(b.median()) + "  →  " + f.apply(a.median())),
                new Line("Min … max", raw.apply(b.min()) + " … " + raw.apply(b.max()) + "  →  "
                        + raw.apply(a.min()) + " … " + raw.apply(a.max()))));
    }

    private static Section difference(TTestResult t, java.util.function.DoubleFunction<String> f) {
        return new Section("Difference after − before (" + t.method().description() + ")", List.of(
                new Line("Estimate", f.apply(t.estimate())),
                new Line(Format.percent(t.confidenceLevel()) + " interval", "(" + f.apply(t.ciLower()) + ", "
                        + f.apply(t.ciUpper()) + ")"),
                new Line("t, df, two-sided p", Format.num(t.t()) + ", " + Format.num(t.df()) + ", " + Format.p(t.p())),
                new Line("", "A non-significant difference is not evidence of sameness; the equivalence test "
                        + "decides.")));
    }

    private static Section equivalence(EquivalenceResult eq, java.util.function.DoubleFunction<String> f) {
        List<Line> l = new ArrayList<>();
        l.add(new Line("Margin", Format.margin(eq, f)));
        if (eq.ratio()) {
            l.add(new Line("Ratio after/before", Format.ratioBound(eq.estimate()) + " (of the geometric means; "
                    + "tested on the logarithms)"));
            l.add(new Line(Format.percent(eq.level()) + " interval", "(" + Format.ratioBound(eq.ciLower()) + ", "
                    + Format.ratioBound(eq.ciUpper()) + ")"));
        } else {
            l.add(new Line(Format.percent(eq.level()) + " interval", "(" + f.apply(eq.ciLower()) + ", "
                    + f.apply(eq.ciUpper()) + ")"));
        }
        if (eq.pLower() != null) {
            l.add(new Line("p (lower test)", Format.p(eq.pLower())));
        }
        if (eq.pUpper() != null) {
            l.add(new Line("p (upper test)", Format.p(eq.pUpper())));
        }
        l.add(new Line("Conclusion", eq.conclusion().words()));
        return new Section("Equivalence (two one-sided tests, each at α = " + Format.num(eq.alpha()) + ")", l);
    }

    private static Section spread(CharacteristicResult r) {
        List<Line> l = new ArrayList<>();
        if (r.variance() != null) {
            l.add(new Line("Variance ratio after/before", Format.ratio(r.variance().ratio()) + "  ("
                    + r.variance().method().words() + " p " + Format.p(r.variance().p()) + ")"));
        }
        if (r.levene() != null) {
            l.add(new Line("Brown–Forsythe", "F " + Format.num(r.levene().f()) + ", p " + Format.p(r.levene().p())));
        }
        if (r.sdGrowth() != null) {
            l.add(new Line("sd growth", "upper " + Format.percent(r.sdGrowth().level()) + " bound "
                    + Format.ratio(r.sdGrowth().upperBound()) + " against the limit " + Format.num(r.sdGrowth().limit())
                    + (r.sdGrowth().met() ? ": met" : ": NOT met")));
        }
        if (l.isEmpty()) {
            l.add(new Line("", "not computed (see the notes)"));
        }
        return new Section("Spread", l);
    }
}
