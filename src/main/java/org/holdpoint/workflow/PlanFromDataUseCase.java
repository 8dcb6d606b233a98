package org.holdpoint.workflow;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.holdpoint.stats.Descriptives;
import org.holdpoint.stats.EquivalencePlan;
import org.holdpoint.stats.Margin;
import org.holdpoint.stats.PlanResult;
import org.holdpoint.stats.StatsException;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.Dataset;
import org.holdpoint.result.Format;

/**
 * Plans every characteristic of a study at once from its data: σ is the sd of the baseline (before)
 * sample, the margin comes from the criteria (or one margin for all), and the largest n decides. The
 * power is conditional on σ = s, which the output says.
 */
public final class PlanFromDataUseCase {
    private PlanFromDataUseCase() {
    }

    /**
     * One characteristic's plan, or why it could not be planned.
     *
     * @param name   the characteristic
     * @param unit   its unit, or null
     * @param sd     the baseline sd used as σ
     * @param margin the margin in units, or null
     * @param plan   the plan, or null
     * @param note   why it was not planned, or null
     */
    public record CharacteristicPlan(String name, String unit, double sd, Margin margin, PlanResult plan, String note,
            org.holdpoint.stats.SpreadPlan.Result spread, String spreadNote,
            org.holdpoint.stats.CapabilityPlan.Result capability, String capabilityNote) {

        /** A plan without the spread and capability criteria. */
        public CharacteristicPlan(String name, String unit, double sd, Margin margin, PlanResult plan, String note) {
            this(name, unit, sd, margin, plan, note, null, null, null, null);
        }

        /** @return the parts per group the criteria planned here need (the largest), or 0 when none was planned */
        public int needed() {
            return Math.max(Math.max(plan == null ? 0 : plan.n(), spread == null ? 0 : spread.nBefore()),
                    capability == null ? 0 : capability.nAfter());
        }

        /** @return the criterion that needs the most parts here: "equivalence", "spread" or "capability", or null */
        public String drivenBy() {
            int n = needed();
            if (n == 0) {
                return null;
            }
            if (plan != null && plan.n() == n) {
                return "equivalence";
            }
            return spread != null && spread.nBefore() == n ? "spread" : "capability";
        }

        CharacteristicPlan withSpread(org.holdpoint.stats.SpreadPlan.Result r, String why) {
            return new CharacteristicPlan(name, unit, sd, margin, plan, note, r, why, capability, capabilityNote);
        }

        CharacteristicPlan withCapability(org.holdpoint.stats.CapabilityPlan.Result r, String why) {
            return new CharacteristicPlan(name, unit, sd, margin, plan, note, spread, spreadNote, r, why);
        }
    }

    /**
     * The plans and the characteristic that needs the most parts.
     *
     * @param plans   one per characteristic, in file order
     * @param driving the planned characteristic with the largest n, or null when none could be planned
     */
    public record Outcome(List<CharacteristicPlan> plans, CharacteristicPlan driving) {
        /** Copies the list. */
        public Outcome {
            plans = List.copyOf(plans);
        }
    }

    /**
     * Plans every characteristic of the data.
     *
     * @param data         the study data (the before group is the baseline)
     * @param settingsFile criteria file, or null to look beside the data
     * @param margin       one margin for all characteristics, or null to take each one's from the criteria
     * @param plan         the planning settings (α, design, ratio, target power); its margin is replaced
     * @param difference   the expected true difference after − before
     * @return the plans
     */
    public static Outcome run(ImportOptions data, Path settingsFile, Margin margin, EquivalencePlan plan,
            double difference) {
        return run(data, settingsFile, margin, plan, difference, null, 1);
    }

    /**
     * Plans every characteristic of the baseline, the equivalence test and the spread criterion.
     *
     * @param data          the baseline data
     * @param settingsFile  criteria file, or null to look beside the data
     * @param margin        one margin for all, or null for each one's
     * @param plan          the equivalence planning settings
     * @param difference    the expected true difference
     * @param sdGrowthLimit one sd-growth limit for all, or null for each one's from the criteria
     * @param sdRatio       the assumed true sd(after)/sd(before)
     * @return the plans
     */
    public static Outcome run(ImportOptions data, Path settingsFile, Margin margin, EquivalencePlan plan,
            double difference, Double sdGrowthLimit, double sdRatio) {
        return run(data, settingsFile, margin, null, plan, difference, sdGrowthLimit, sdRatio);
    }

    /**
     * As {@link #run(ImportOptions, Path, Margin, EquivalencePlan, double, Double, double)}, with a margin for
     * every characteristic given relative to its own limits (in percent of its tolerance, or of its USL).
     *
     * @param data           the baseline data
     * @param settingsFile   criteria file, or null to look beside the data
     * @param margin         one margin in units for all, or null
     * @param marginSpec     one relative margin for all, resolved against each characteristic's limits, or null
     * @param plan           the equivalence planning settings
     * @param difference     the expected true difference
     * @param sdGrowthLimit  one sd-growth limit for all, or null
     * @param sdRatio        the assumed true sd ratio
     * @return the plans
     */
    public static Outcome run(ImportOptions data, Path settingsFile, Margin margin,
            org.holdpoint.study.MarginSpec marginSpec, EquivalencePlan plan, double difference, Double sdGrowthLimit,
            double sdRatio) {
        AnalysisOutcome imported = new AnalyzeUseCase().importBaseline(data, settingsFile,
                AnalysisSettings.defaultSettings());
        AnalysisSettings settings = imported.settings();
        if (marginSpec != null) {
            // the relative margin wins over each characteristic's own, resolved against its own limits
            CharacteristicSettings over = new CharacteristicSettings(null, null, marginSpec, null, null, null);
            settings = settings.withCriteria(settings.defaults(), settings.perCharacteristic(),
                    settings.overrides() == null ? over : settings.overrides().overriddenBy(over));
        }
        return run(imported.data(), settings, margin, plan, difference, sdGrowthLimit, sdRatio);
    }

    /**
     * Plans every characteristic of data already imported, every criterion its settings name (the window's
     * Plan step and {@code plan --from}).
     *
     * @param data          the study data (the before group is the baseline)
     * @param settings      the criteria
     * @param margin        one margin for all, or null for each one's
     * @param plan          the equivalence planning settings
     * @param difference    the expected true difference
     * @param sdGrowthLimit one sd-growth limit for all, or null for each one's from the criteria
     * @param sdRatio       the assumed true sd(after)/sd(before)
     * @return the plans
     */
    public static Outcome run(Dataset data, AnalysisSettings settings, Margin margin, EquivalencePlan plan,
            double difference, Double sdGrowthLimit, double sdRatio) {
        Outcome o = run(data, settings, margin, plan, difference);
        // the spread criterion, where a limit is set: parts per group so that the sd-ratio bound passes
        List<CharacteristicPlan> out = new ArrayList<>();
        CharacteristicPlan driving = null;
        for (CharacteristicPlan p : o.plans()) {
            Double limit = sdGrowthLimit != null ? sdGrowthLimit
                    : settings.resolve(p.name()).sdGrowthLimit();
            CharacteristicPlan q = p;
            if (limit != null) {
                try {
                    q = p.withSpread(org.holdpoint.stats.SpreadPlan.forLimit(limit).withSdRatio(sdRatio)
                            .withAlpha(plan.alpha()).withRatio(plan.ratio()).withTargetPower(plan.targetPower())
                            .sampleSize(), null);
                } catch (StatsException e) {
                    q = p.withSpread(null, e.getMessage());
                }
            }
            // the capability criterion, where a requirement and limits are set: the process as the baseline shows it
            var cs = settings.resolve(p.name());
            if (cs.capabilityRequirement() != null && cs.spec().any()) {
                var c = data.characteristics().stream().filter(x -> x.name().equals(p.name())).findFirst();
                if (c.isPresent() && c.get().before().size() >= 2 && p.sd() > 0) {
                    double mean = org.holdpoint.stats.Descriptives.of(c.get().before().sample()).mean();
                    double a = cs.spec().usl() == null ? Double.POSITIVE_INFINITY : (cs.spec().usl() - mean) / p.sd();
                    double b = cs.spec().lsl() == null ? Double.POSITIVE_INFINITY : (mean - cs.spec().lsl()) / p.sd();
                    try {
                        q = q.withCapability(org.holdpoint.stats.CapabilityPlan.forRequirement(
                                cs.capabilityRequirement()).withAlpha(plan.alpha())
                                .withTargetPower(plan.targetPower()).sampleSize(a, b), null);
                    } catch (StatsException e) {
                        q = q.withCapability(null, e.getMessage());
                    }
                }
            }
            out.add(q);
            if (q.needed() > 0 && (driving == null || q.needed() > driving.needed())) {
                driving = q;
            }
        }
        return new Outcome(out, driving);
    }

    /**
     * Plans every characteristic of data already imported (the window's Plan step).
     *
     * @param data       the study data (the before group is the baseline)
     * @param settings   the criteria (each characteristic's margin and spec limits)
     * @param margin     one margin for all characteristics, or null to take each one's from the criteria
     * @param plan       the planning settings (α, design, ratio, target power); its margin is replaced
     * @param difference the expected true difference after − before
     * @return the plans
     */
    public static Outcome run(Dataset data, AnalysisSettings settings, Margin margin, EquivalencePlan plan,
            double difference) {
        List<CharacteristicPlan> plans = new ArrayList<>();
        CharacteristicPlan driving = null;
        for (CharacteristicData c : data.characteristics()) {
            CharacteristicSettings s = settings.resolve(c.name());
            String unit = s.unit() != null ? s.unit() : c.unit();
            if (c.before().size() < 2) {
                plans.add(new CharacteristicPlan(c.name(), unit, Double.NaN, null, null,
                        "fewer than 2 baseline values"));
                continue;
            }
            double sd = Descriptives.of(c.before().sample()).sd();
            Margin m;
            try {
                m = margin != null ? margin : s.margin() == null ? null : s.margin().resolve(s.spec());
            } catch (StatsException e) {
                plans.add(new CharacteristicPlan(c.name(), unit, sd, null, null, e.getMessage()));
                continue;
            }
            if (m == null || (m.lower() == null && m.upper() == null)) {
                plans.add(new CharacteristicPlan(c.name(), unit, sd, m, null,
                        "no margin set for this characteristic"));
                continue;
            }
            if (!(sd > 0)) {
                plans.add(new CharacteristicPlan(c.name(), unit, sd, m, null, "the baseline has zero spread"));
                continue;
            }
            String note = null;
            double planSd = sd;
            if (m.ratio()) {
                // a ratio margin is tested on the logarithms: plan there, with the sd of ln x and a true ratio of 1
                double[] logs = c.before().sample().values().clone();
                boolean positive = true;
                for (int i = 0; i < logs.length; i++) {
                    positive &= logs[i] > 0;
                    logs[i] = Math.log(logs[i]);
                }
                if (!positive) {
                    plans.add(new CharacteristicPlan(c.name(), unit, sd, m, null, "a ratio margin needs baseline values "
                            + "above 0"));
                    continue;
                }
                planSd = Descriptives.of(org.holdpoint.stats.Sample.of(logs)).sd();
                note = "planned on the logarithms (sd of ln x " + org.holdpoint.result.Format.num(planSd, 4)
                        + ", true ratio 1" + (difference != 0 ? "; the expected difference applies to margins in units"
                        : "") + ")";
                if (!(planSd > 0)) {
                    plans.add(new CharacteristicPlan(c.name(), unit, sd, m, null, "the baseline has zero spread"));
                    continue;
                }
            }
            try {
                PlanResult r = m.ratio() ? plan.withMargin(m.logScale()).sampleSize(0, planSd)
                        : plan.withMargin(m).sampleSize(difference, sd);
                CharacteristicPlan p = new CharacteristicPlan(c.name(), unit, sd, m, r, note);
                plans.add(p);
                if (driving == null || r.n() > driving.plan().n()) {
                    driving = p;
                }
            } catch (StatsException e) {
                plans.add(new CharacteristicPlan(c.name(), unit, sd, m, null, e.getMessage()));
            }
        }
        return new Outcome(plans, driving);
    }

    /**
     * The power curve of a spread or capability plan: power at the planned size against the true value the
     * criterion judges.
     *
     * @param title    the chart title
     * @param xLabel   the x axis
     * @param subtitle what the curve shows
     * @param yLabel   the y axis
     * @param x        the true values, increasing
     * @param power    the power at each
     * @param target   the target power
     */
    public record Curve(String title, String xLabel, String subtitle, String yLabel, double[] x, double[] power,
            double target) {
    }

    /**
     * The power curve of the criterion that decides the driving characteristic's size, when that is spread or
     * capability (the equivalence curve is the plan's own power table): power at the planned size against the
     * true sd ratio, or against the true Ppk (the baseline's centring kept, its sd scaled).
     *
     * @param o  the plans
     * @param d  the data they were made from
     * @param settings the criteria
     * @param eq the equivalence planning settings (ratio, target)
     * @return the curve, or null when the equivalence test decides or nothing was planned
     */
    public static Curve drivingCurve(Outcome o, Dataset d, AnalysisSettings settings, EquivalencePlan eq) {
        CharacteristicPlan p = o.driving();
        if (p == null) {
            return null;
        }
        int points = 25;
        double[] x = new double[points];
        double[] y = new double[points];
        if ("spread".equals(p.drivenBy()) && p.spread() != null) {
            var r = p.spread();
            var sp = org.holdpoint.stats.SpreadPlan.forLimit(r.limit()).withAlpha(r.alpha()).withRatio(eq.ratio());
            double lo = Math.min(0.5, r.limit() / 2);
            for (int i = 0; i < points; i++) {
                x[i] = lo + (r.limit() - lo) * i / (points - 1);
                y[i] = sp.withSdRatio(x[i]).power(r.nBefore());
            }
            return new Curve("Power at " + r.nBefore() + " before + " + r.nAfter() + " after — " + p.name(),
                    "true sd(after) / sd(before)", "power of the spread criterion (sd-ratio bound below "
                    + Format.num(r.limit()) + ") against the true ratio", "power (probability the bound passes)", x,
                    y, eq.targetPower());
        }
        if ("capability".equals(p.drivenBy()) && p.capability() != null) {
            var r = p.capability();
            var c = d.characteristics().stream().filter(q -> q.name().equals(p.name())).findFirst().orElseThrow();
            var spec = settings.resolve(p.name()).spec();
            double mean = org.holdpoint.stats.Descriptives.of(c.before().sample()).mean();
            double a = spec.usl() == null ? Double.POSITIVE_INFINITY : (spec.usl() - mean) / p.sd();
            double b = spec.lsl() == null ? Double.POSITIVE_INFINITY : (mean - spec.lsl()) / p.sd();
            var cp = org.holdpoint.stats.CapabilityPlan.forRequirement(r.requirement()).withAlpha(r.alpha());
            double lo = r.requirement() * 0.9;
            double hi = Math.max(r.truePpk() * 1.4, r.requirement() * 1.5);
            for (int i = 0; i < points; i++) {
                x[i] = lo + (hi - lo) * i / (points - 1);
                double scale = x[i] / r.truePpk();
                y[i] = cp.power(r.nAfter(), a * scale, b * scale);
            }
            return new Curve("Power at " + r.nAfter() + " after — " + p.name(), "true Ppk (the process's centring "
                    + "kept, its sd scaled)", "power of the capability criterion (Ppk bound above "
                    + Format.num(r.requirement()) + ") against the true Ppk", "power (probability the bound passes)",
                    x, y, eq.targetPower());
        }
        return null;
    }
}
