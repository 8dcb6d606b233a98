package org.holdpoint.workflow;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.holdpoint.stats.Descriptives;
import org.holdpoint.stats.EquivalenceResult;
import org.holdpoint.stats.EquivalenceTest;
import org.holdpoint.stats.GroupPair;
import org.holdpoint.stats.LeveneResult;
import org.holdpoint.stats.LocationMethod;
import org.holdpoint.stats.Margin;
import org.holdpoint.stats.Sample;
import org.holdpoint.stats.SdGrowthResult;
import org.holdpoint.stats.SpreadTests;
import org.holdpoint.stats.StatsException;
import org.holdpoint.stats.TTest;
import org.holdpoint.stats.TTestResult;
import org.holdpoint.stats.VarianceAssumption;
import org.holdpoint.stats.VarianceRatioResult;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.result.AssumptionChecks;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.Progress;
import org.holdpoint.result.StudyResult;
import org.holdpoint.result.Verdicts;
import org.holdpoint.result.Format;

/**
 * The analysis use case: every characteristic of a data set against its criteria, then the overall
 * verdict. Pure computation over the study model; the numbers come from {@code stats}.
 */
public final class StudyAnalyzer {
    private final boolean parallel;

    /** An analyser that uses every core. */
    public StudyAnalyzer() {
        this(true);
    }

    /**
     * @param parallel whether characteristics are analysed side by side, and a large characteristic's rank
     *                 comparison beside its other methods (false: one after the other, for the test that both give
     *                 the same result)
     */
    public StudyAnalyzer(boolean parallel) {
        this.parallel = parallel;
    }

    /**
     * Analyses every characteristic.
     *
     * @param data     the imported data
     * @param settings the criteria
     * @param progress progress and cancel port
     * @return the study result
     * @throws AnalysisException listing every characteristic that cannot be analysed and why
     */
    public StudyResult analyze(Dataset data, AnalysisSettings settings, Progress progress) {
        if (data.characteristics().isEmpty()) {
            throw new AnalysisException("the data hold no characteristic with values; check the layout and columns");
        }
        // the characteristics are independent: analysed side by side on the machine's cores, each result in its
        // place, so that the outcome is the same as one by one (a test compares them); progress and cancelling
        // go through one lock, since the port is not required to be thread-safe
        List<CharacteristicData> all = data.characteristics();
        CharacteristicResult[] done = new CharacteristicResult[all.size()];
        java.util.concurrent.atomic.AtomicInteger started = new java.util.concurrent.atomic.AtomicInteger();
        java.util.stream.IntStream range = java.util.stream.IntStream.range(0, all.size());
        (parallel && all.size() > 1 ? range.parallel() : range).forEach(k -> {
            CharacteristicData c = all.get(k);
            synchronized (progress) {
                progress.checkCancelled();
                progress.step("analysing " + c.name(), (double) started.getAndIncrement() / all.size());
            }
            done[k] = analyzeWithNotes(c, settings, data);
        });
        List<CharacteristicResult> results = new ArrayList<>(java.util.Arrays.asList(done));
        List<String> problems = new ArrayList<>();
        for (CharacteristicResult r : results) {
            if (r.verdict().status() == org.holdpoint.result.Verdict.Status.NOT_ASSESSABLE) {
                problems.add("characteristic \"" + r.name() + "\": " + String.join("; ", r.verdict().reasons()));
            }
        }
        if (problems.size() == results.size()) {
            throw new AnalysisException(problems);
        }
        if (settings.holm()) {
            results = holm(results);
        }
        return Verdicts.overall(results);
    }

    private CharacteristicResult analyzeWithNotes(CharacteristicData c, AnalysisSettings settings, Dataset data) {
        CharacteristicResult r;
        try {
            r = analyzeOne(c, settings);
        } catch (StatsException | CharacteristicProblem e) {
            // reported on this characteristic only; the rest of the study goes on
            r = notAssessable(c, settings, e.getMessage());
        }
        double unusable = data.report().unusableFraction(c.name());
        if (unusable > UNUSABLE_LIMIT) {
            List<String> notes = new ArrayList<>(r.notes());
            notes.add(String.format(Locale.ROOT, "%.0f %% of this characteristic's cells could not be used "
                    + "(see the import report); check the data before relying on the result", unusable * 100));
            r = r.with(r.holmP(), r.verdict(), notes);
        }
        return r;
    }

    /** Above this share of unusable cells a characteristic is flagged (common practice, no source). */
    static final double UNUSABLE_LIMIT = 0.05;

    /** Holm (1979) adjustment of the deciding difference p-values across characteristics, as R's p.adjust. */
    private static List<CharacteristicResult> holm(List<CharacteristicResult> results) {
        List<Integer> tested = new ArrayList<>();
        for (int i = 0; i < results.size(); i++) {
            if (results.get(i).decidingTest() != null) {
                tested.add(i);
            }
        }
        double[] p = new double[tested.size()];
        for (int k = 0; k < p.length; k++) {
            p[k] = results.get(tested.get(k)).decidingTest().p();
        }
        double[] adjusted = org.holdpoint.stats.Holm.adjust(p);
        List<CharacteristicResult> out = new ArrayList<>(results);
        for (int k = 0; k < p.length; k++) {
            CharacteristicResult r = results.get(tested.get(k));
            out.set(tested.get(k), r.with(adjusted[k], r.verdict(), r.notes()));
        }
        return out;
    }

    CharacteristicResult analyzeOne(CharacteristicData data, AnalysisSettings study) {
        CharacteristicSettings s = study.resolve(data.name());
        List<String> notes = new ArrayList<>();
        Exclusions.Applied applied = Exclusions.apply(data, study.exclusions());
        CharacteristicData c = applied.data();
        notes.addAll(applied.notes());
        boolean paired = s.paired() != null ? s.paired() : c.paired();
        if (paired && !c.paired()) {
            throw new CharacteristicProblem("a paired analysis was requested but the data are not matched by unit; "
                    + "give a unit id column and read the file with --paired");
        }
        if (!c.unmatchedUnits().isEmpty()) {
            notes.add(String.format(Locale.ROOT, "%d unit(s) present in only one group were left out of the paired "
                    + "analysis: %s", c.unmatchedUnits().size(), abbreviate(c.unmatchedUnits())));
        }
        double alpha = study.alpha();
        Sample before = c.before().sample();
        Sample after = c.after().sample();
        String unassessable = assessability(c);
        if (unassessable != null) {
            return notAssessable(data, study, unassessable);
        }
        checkSizes(before, after);
        Margin margin = s.margin() == null ? null : s.margin().resolve(s.spec());
        // the rank-based equivalence takes a margin in units: with a ratio margin it is left out
        CharacteristicChecks.Ranking ranking = CharacteristicChecks.startRanking(c,
                margin != null && margin.ratio() ? null : margin, alpha, paired, parallel);
        GroupPair pair = GroupPair.of(before, after);
        if (margin == null) {
            notes.add("equivalence was not assessed (no margin set)");
        }
        TTest t = TTest.withDefaults().withAlpha(alpha);
        TTestResult welch = null;
        TTestResult pooled = null;
        TTestResult pairedTest = null;
        EquivalenceResult tost = null;
        EquivalenceResult tostPooled = null;
        LocationMethod method;
        if (paired) {
            method = LocationMethod.PAIRED;
            pairedTest = t.testPaired(before, after);
            if (margin != null) {
                EquivalenceTest eq = EquivalenceTest.withDefaults().withMargin(margin).withAlpha(alpha);
                tost = margin.ratio() ? ratio(eq, before, after, true) : eq.testPaired(before, after);
            }
        } else {
            method = study.equalVariances() ? LocationMethod.POOLED : LocationMethod.WELCH;
            welch = t.test(before, after);
            pooled = t.with(VarianceAssumption.EQUAL).test(before, after);
            if (margin != null) {
                EquivalenceTest eq = EquivalenceTest.withDefaults().withMargin(margin).withAlpha(alpha);
                EquivalenceTest eqPooled = eq.with(VarianceAssumption.EQUAL);
                tost = margin.ratio() ? ratio(eq, before, after, false) : eq.test(before, after);
                tostPooled = margin.ratio() ? ratio(eqPooled, before, after, false) : eqPooled.test(before, after);
            }
        }
        Descriptives db = pair.before();
        Descriptives da = pair.after();
        VarianceRatioResult variance = null;
        LeveneResult levene = null;
        SdGrowthResult growth = null;
        if (db.variance() > 0 && da.variance() > 0) {
            if (paired && study.since(3)) {
                // pairs are correlated: the F-test's independence does not hold, the Pitman–Morgan test uses it
                try {
                    variance = SpreadTests.pitmanMorgan(before, after, alpha);
                    if (s.sdGrowthLimit() != null) {
                        growth = SpreadTests.sdGrowthPaired(before, after, s.sdGrowthLimit(), alpha);
                    }
                } catch (org.holdpoint.stats.StatsException e) {
                    if (s.sdGrowthLimit() != null) {
                        throw new CharacteristicProblem("the sd-growth limit cannot be checked: %s", e.getMessage());
                    }
                    notes.add("the paired spread test was not computed: " + e.getMessage());
                }
            } else {
                variance = SpreadTests.fTest(db.summary(), da.summary(), alpha);
                if (s.sdGrowthLimit() != null) {
                    growth = SpreadTests.sdGrowth(db.summary(), da.summary(), s.sdGrowthLimit(), alpha);
                }
            }
        } else {
            String which = db.variance() > 0 ? "after" : "before";
            notes.add("the " + which + " group has zero spread (all values equal), so the variance ratio and the "
                    + "sd-growth check are undefined; check the measurement resolution");
            if (s.sdGrowthLimit() != null) {
                throw new CharacteristicProblem("the %s group has zero spread, so the sd-growth limit cannot be checked; "
                        + "check the measurement resolution", which);
            }
        }
        levene = SpreadTests.brownForsythe(before, after);
        if (levene == null) {
            notes.add("Brown-Forsythe is undefined: every value equals its group median's neighbours "
                    + "(zero within-group deviation)");
        }
        // the rank-based equivalence takes a margin in units: with a ratio margin it is left out
        if (margin != null && margin.ratio()) {
            notes.add("the margin is a ratio after/before: equivalence is tested on the logarithms (the ratio of the "
                    + "geometric means); the rank-based equivalence is not computed for a ratio margin");
        }
        AssumptionChecks checks = CharacteristicChecks.compute(c, s, ranking, alpha, paired, study, notes);
        String unit = s.unit() != null ? s.unit() : c.unit();
        CharacteristicResult draft = CharacteristicResult.builder(c.name(), unit, s, paired, method).margin(margin)
                .descriptives(db, da)
                .location(new CharacteristicResult.LocationTests(welch, pooled, pairedTest, tost, tostPooled))
                .spread(new CharacteristicResult.SpreadTests(variance, levene, growth))
                .checks(checks)
                .verdict(new org.holdpoint.result.Verdict(org.holdpoint.result.Verdict.Status.NOT_ASSESSED, List.of()))
                .notes(notes).build();
        return Verdicts.judge(draft, Math.min(10, c.resolutionDecimals() + 2));
    }

    /**
     * Why a characteristic's data cannot be assessed at all, or null when they can: a group without a
     * usable value, a group of one value, no pair to form, or no variation at the measurement
     * resolution in either group. Derived from the data alone, so that a re-computation from the stored
     * raw values gives the same words.
     */
    static String assessability(CharacteristicData c) {
        int nb = c.before().size();
        int na = c.after().size();
        if (c.paired() && nb == 0 && na == 0 && !c.unmatchedUnits().isEmpty()) {
            return "no unit id occurs in both the before and the after group, so no pair can be formed; check that "
                    + "both groups use the same unit ids";
        }
        if (nb == 0 || na == 0) {
            String which = nb == 0 && na == 0 ? "either group" : nb == 0 ? "the before group" : "the after group";
            return "no usable value in " + which + " (the import report lists the cells that could not be used and "
                    + "why)";
        }
        if (nb < 2 || na < 2) {
            String which = nb < 2 ? "before" : "after";
            return String.format(Locale.ROOT, "the %s group has only %d value; at least 2 per group are needed",
                    which, Math.min(nb, na));
        }
        Sample b = c.before().sample();
        Sample a = c.after().sample();
        if (constant(b) && constant(a)) {
            String unit = c.unit() == null ? "" : " " + c.unit();
            String resolution = resolution(b, a);
            return String.format(Locale.ROOT, "no variation in either group: every before value is %s%s and every "
                    + "after value is %s%s%s, so the gauge cannot show a change at this resolution; check the "
                    + "measurement system", shown(b), unit, shown(a), unit,
                    resolution == null ? "" : resolution.equals("1") ? " (values recorded as whole numbers)"
                            : " (values recorded to " + resolution + unit + ")");
        }
        return null;
    }

    private static boolean constant(Sample s) {
        double first = s.value(0);
        for (int i = 1; i < s.size(); i++) {
            if (s.value(i) != first) {
                return false;
            }
        }
        return true;
    }

    private static String shown(Sample s) {
        return s.hasExactDecimals() ? s.decimal(0).toPlainString() : Format.num(s.value(0));
    }

    /** The finest step of the recorded values (10^-decimals), or null when the values are not exact decimals. */
    private static String resolution(Sample b, Sample a) {
        if (!b.hasExactDecimals() || !a.hasExactDecimals()) {
            return null;
        }
        int scale = 0;
        for (Sample s : new Sample[] {b, a}) {
            for (int i = 0; i < s.size(); i++) {
                scale = Math.max(scale, s.decimal(i).scale());
            }
        }
        return java.math.BigDecimal.ONE.movePointLeft(scale).toPlainString();
    }

    /**
     * The result of a characteristic that cannot be assessed: descriptives where a group has values,
     * no test, the verdict "not assessable" with the reason.
     */
    static CharacteristicResult notAssessable(CharacteristicData c, AnalysisSettings study, String reason) {
        CharacteristicSettings s = study.resolve(c.name());
        Margin margin = null;
        try {
            margin = s.margin() == null ? null : s.margin().resolve(s.spec());
        } catch (StatsException e) {
            reason = reason + "; the margin cannot be resolved: " + e.getMessage();
        }
        Descriptives db = c.before().size() > 0 ? Descriptives.of(c.before().sample()) : null;
        Descriptives da = c.after().size() > 0 ? Descriptives.of(c.after().sample()) : null;
        boolean paired = s.paired() != null ? s.paired() : c.paired();
        String unit = s.unit() != null ? s.unit() : c.unit();
        List<String> notes = new ArrayList<>();
        return CharacteristicResult.builder(c.name(), unit, s, paired, paired ? LocationMethod.PAIRED
                        : study.equalVariances() ? LocationMethod.POOLED : LocationMethod.WELCH).margin(margin)
                .descriptives(db, da)
                .verdict(new org.holdpoint.result.Verdict(org.holdpoint.result.Verdict.Status.NOT_ASSESSABLE,
                        List.of(reason)))
                .notes(notes).build();
    }

    /** The TOST of the ratio after/before on the logarithms; a value at or below 0 is this characteristic's problem. */
    private static EquivalenceResult ratio(EquivalenceTest eq, Sample before, Sample after, boolean paired) {
        try {
            return eq.testRatio(before, after, paired);
        } catch (org.holdpoint.stats.StatsException e) {
            throw new CharacteristicProblem("%s; give the margin in units instead", e.getMessage());
        }
    }

    private static void checkSizes(Sample before, Sample after) {
        if (before.size() < 2) {
            throw new CharacteristicProblem("the before group has %d value(s); at least 2 are needed", before.size());
        }
        if (after.size() < 2) {
            throw new CharacteristicProblem("the after group has %d value(s); at least 2 are needed", after.size());
        }
    }

    static String abbreviate(List<String> items) {
        if (items.size() <= 10) {
            return String.join(", ", items);
        }
        return String.join(", ", items.subList(0, 10)) + ", … (" + items.size() + " in all)";
    }
}
