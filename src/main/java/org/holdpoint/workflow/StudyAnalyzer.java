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
import org.holdpoint.study.AssumptionChecks;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.CharacteristicResult;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.Progress;
import org.holdpoint.study.StudyResult;

/**
 * The analysis use case: every characteristic of a data set against its criteria, then the overall
 * verdict. Pure computation over the study model; the numbers come from {@code stats}.
 */
public final class StudyAnalyzer {

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
        List<String> problems = new ArrayList<>();
        List<CharacteristicResult> results = new ArrayList<>();
        int i = 0;
        for (CharacteristicData c : data.characteristics()) {
            progress.checkCancelled();
            progress.step("analysing " + c.name(), (double) i++ / data.characteristics().size());
            try {
                CharacteristicResult r = analyzeOne(c, settings);
                double unusable = data.report().unusableFraction(c.name());
                if (unusable > UNUSABLE_LIMIT) {
                    List<String> notes = new ArrayList<>(r.notes());
                    notes.add(String.format(Locale.ROOT, "%.0f %% of this characteristic's cells could not be used "
                            + "(see the import report); check the data before relying on the result", unusable * 100));
                    r = r.with(r.holmP(), r.verdict(), notes);
                }
                results.add(r);
            } catch (StatsException e) {
                problems.add("characteristic \"" + c.name() + "\": " + e.getMessage());
            }
        }
        if (!problems.isEmpty()) {
            throw new AnalysisException(problems);
        }
        if (settings.holm()) {
            results = holm(results);
        }
        return Verdicts.overall(results);
    }

    /** Above this share of unusable cells a characteristic is flagged (common practice, no source). */
    static final double UNUSABLE_LIMIT = 0.05;

    /** Holm (1979) adjustment of the deciding difference p-values across characteristics, as R's p.adjust. */
    private static List<CharacteristicResult> holm(List<CharacteristicResult> results) {
        double[] p = new double[results.size()];
        for (int i = 0; i < p.length; i++) {
            p[i] = results.get(i).decidingTest().p();
        }
        double[] adjusted = org.holdpoint.stats.Holm.adjust(p);
        List<CharacteristicResult> out = new ArrayList<>();
        for (int i = 0; i < p.length; i++) {
            CharacteristicResult r = results.get(i);
            out.add(r.with(adjusted[i], r.verdict(), r.notes()));
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
            throw new StatsException("a paired analysis was requested but the data are not matched by unit; "
                    + "give a unit id column and read the file with --paired");
        }
        if (!c.unmatchedUnits().isEmpty()) {
            notes.add(String.format(Locale.ROOT, "%d unit(s) present in only one group were left out of the paired "
                    + "analysis: %s", c.unmatchedUnits().size(), abbreviate(c.unmatchedUnits())));
        }
        double alpha = study.alpha();
        Sample before = c.before().sample();
        Sample after = c.after().sample();
        checkSizes(before, after);
        GroupPair pair = GroupPair.of(before, after);
        Margin margin = s.margin() == null ? null : s.margin().resolve(s.spec());
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
                tost = EquivalenceTest.withDefaults().withMargin(margin).withAlpha(alpha).testPaired(before, after);
            }
        } else {
            method = study.equalVariances() ? LocationMethod.POOLED : LocationMethod.WELCH;
            welch = t.test(before, after);
            pooled = t.with(VarianceAssumption.EQUAL).test(before, after);
            if (margin != null) {
                EquivalenceTest eq = EquivalenceTest.withDefaults().withMargin(margin).withAlpha(alpha);
                tost = eq.test(before, after);
                tostPooled = eq.with(VarianceAssumption.EQUAL).test(before, after);
            }
        }
        Descriptives db = pair.before();
        Descriptives da = pair.after();
        VarianceRatioResult variance = null;
        LeveneResult levene = null;
        SdGrowthResult growth = null;
        if (db.variance() > 0 && da.variance() > 0) {
            variance = SpreadTests.fTest(db.summary(), da.summary(), alpha);
            if (s.sdGrowthLimit() != null) {
                growth = SpreadTests.sdGrowth(db.summary(), da.summary(), s.sdGrowthLimit(), alpha);
            }
        } else {
            String which = db.variance() > 0 ? "after" : "before";
            notes.add("the " + which + " group has zero spread (all values equal), so the variance ratio and the "
                    + "sd-growth check are undefined; check the measurement resolution");
            if (s.sdGrowthLimit() != null) {
                throw new StatsException("the %s group has zero spread, so the sd-growth limit cannot be checked; "
                        + "check the measurement resolution", which);
            }
        }
        levene = SpreadTests.brownForsythe(before, after);
        if (levene == null) {
            notes.add("Brown-Forsythe is undefined: every value equals its group median's neighbours "
                    + "(zero within-group deviation)");
        }
        AssumptionChecks checks = CharacteristicChecks.compute(c, s, margin, alpha, paired, study.equalVariances(), notes);
        String unit = s.unit() != null ? s.unit() : c.unit();
        CharacteristicResult draft = new CharacteristicResult(c.name(), unit, s, margin, paired, db, da, welch, pooled,
                pairedTest, tost, tostPooled, variance, levene, growth, null, method, checks,
                new org.holdpoint.study.Verdict(org.holdpoint.study.Verdict.Status.NOT_ASSESSED, List.of()), notes);
        return Verdicts.judge(draft);
    }

    private static void checkSizes(Sample before, Sample after) {
        if (before.size() < 2) {
            throw new StatsException("the before group has %d value(s); at least 2 are needed", before.size());
        }
        if (after.size() < 2) {
            throw new StatsException("the after group has %d value(s); at least 2 are needed", after.size());
        }
    }

    static String abbreviate(List<String> items) {
        if (items.size() <= 10) {
            return String.join(", ", items);
        }
        return String.join(", ", items.subList(0, 10)) + ", … (" + items.size() + " in all)";
    }
}
