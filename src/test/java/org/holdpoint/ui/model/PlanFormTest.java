package org.holdpoint.ui.model;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import java.util.ArrayList;
import java.util.List;
import org.holdpoint.stats.Design;
import org.holdpoint.stats.EquivalencePlan;
import org.holdpoint.stats.Margin;
import org.holdpoint.stats.PlanResult;
import org.holdpoint.ui.model.PlanForm.Field;
import org.holdpoint.workflow.StudyService;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Test;

/** The Plan step's model without a display: validation, planning, and planning from the demo study's baseline. */
class PlanFormTest {
    private StudySession s;
    private PlanForm f;
    private final List<UserMessage> problems = new ArrayList<>();

    @BeforeEach
    void open() {
        s = new StudySession(new StudyService(org.holdpoint.workflow.ArchiveAccess.none()), TaskRunner.DIRECT, new RecentFiles(PreferenceStore.inMemory()),
                Clock.fixed(Instant.parse("2026-12-01T08:00:00Z"), ZoneOffset.UTC));
        s.addListener(StudySession.Property.PROBLEM, e -> problems.add((UserMessage) e.getNewValue()));
        f = s.plan();
    }

    @Test
    void typedValuesAreCheckedWithTheReasonInWords() {
        f.set(Field.ALPHA, "0,05");
        assertThat(f.problem(Field.ALPHA)).contains("point as the decimal mark");
        f.set(Field.ALPHA, "0.7");
        assertThat(f.problem(Field.ALPHA)).contains("between 0 and 0.5");
        f.set(Field.ALPHA, "0.05");
        assertThat(f.problem(Field.ALPHA)).isNull();
        assertThat(f.problem(Field.SYMMETRIC)).isEqualTo("Enter a value.");
        f.set(Field.SYMMETRIC, "-1");
        assertThat(f.problem(Field.SYMMETRIC)).contains("positive");
        f.set(Field.SYMMETRIC, "0.2");
        f.set(Field.DIFFERENCE, "0.2");
        assertThat(f.problem(Field.DIFFERENCE)).contains("strictly inside the margin (-0.2, 0.2)");
        f.set(Field.POWER, "0.04");
        assertThat(f.problem(Field.POWER)).contains("above α");
        f.set(Field.POWER, "1");
        assertThat(f.problem(Field.POWER)).contains("below 1");
        f.setMarginMode(PlanForm.MarginMode.LIMITS);
        assertThat(f.problem(Field.SYMMETRIC)).as("not used with L and U").isNull();
        f.set(Field.LOWER, "0.1");
        assertThat(f.problem(Field.LOWER)).contains("negative");
        f.set(Field.RATIO, "0");
        assertThat(f.problem(Field.RATIO)).contains("above 0");
        f.setDesign(Design.PAIRED);
        assertThat(f.problem(Field.RATIO)).as("no ratio for pairs").isNull();
        assertThat(f.firstProblem()).isEqualTo(Field.LOWER);
        f.plan();
        assertThat(problems).last().extracting(UserMessage::title).isEqualTo("Values to correct");
        assertThat(f.result()).isNull();
    }

    /**
     * PowerTOST sampleN.TOST(design = "parallel", logscale = FALSE, theta1 = -0.2, method = "exact"),
     * table ctCW.III of the R package PowerTOST: σ 0.20, target 0.8, δ 0.05 gives N = 48 in total, 24 per
     * group; exact power at N = 48 is 0.815435 (the header of the derived table, recomputed by numerical
     * integration; src/test/resources/.../tost-parallel-additive-sample-size-derived.txt).
     */
    @Test
    void typedValuesGiveThePublishedSampleSize() {
        typed("0.05", "0.2", "0.05", "0.2", "0.8", "1");
        f.plan();
        assertThat(problems).isEmpty();
        PlanResult r = f.result();
        assertThat(r.n()).isEqualTo(24);
        assertThat(r.nAfter()).isEqualTo(24);
        assertThat(r.achievedPower()).isCloseTo(0.815435, within(5.000001e-7));
        assertThat(r.powerAtPrevious()).isLessThan(0.8);
        assertThat(f.resultFor()).isEqualTo("typed values");
        assertThat(f.resultLines()).extracting(l -> l[0] + "=" + l[1]).contains("Parts before (n₁)=24",
                "Parts after (n₂)=24", "Parts measured in all=48", "Achieved power (exact TOST)=81.54 %");
        assertThat(f.curveDifferences()).hasSameSizeAs(f.curvePower()).startsWith(-0.2).endsWith(0.2);
        assertThat(s.lastStatus()).isEqualTo("Planned: 24 before + 24 after.");
        assertThat(f.stale()).isFalse();
        f.set(Field.SD, "0.25");
        assertThat(f.stale()).as("the plan shown no longer matches the values").isTrue();
        f.plan();
        assertThat(f.stale()).isFalse();
    }

    /** The step passes every typed setting on: the same plan as EquivalencePlan called directly. */
    @Test
    void theStepPlansAsEquivalencePlanDoes() {
        typed("0.025", "", "0.1", "0.8", "0.85", "1.5");
        f.setMarginMode(PlanForm.MarginMode.LIMITS);
        f.set(Field.LOWER, "-1");
        f.set(Field.UPPER, "0.8");
        f.plan();
        PlanResult direct = EquivalencePlan.withDefaults().withMargin(Margin.of(-1, 0.8)).withAlpha(0.025)
                .with(Design.PARALLEL).withRatio(1.5).withTargetPower(0.85).sampleSize(0.1, 0.8);
        assertThat(f.result()).isEqualTo(direct);
        f.setDesign(Design.PAIRED);
        f.plan();
        PlanResult pairs = EquivalencePlan.withDefaults().withMargin(Margin.of(-1, 0.8)).withAlpha(0.025)
                .with(Design.PAIRED).withTargetPower(0.85).sampleSize(0.1, 0.8);
        assertThat(f.result()).isEqualTo(pairs);
        assertThat(f.resultLines().get(0)[0]).startsWith("Pairs");
    }

    @Test
    void anUnreachableTargetIsToldInWords() {
        typed("0.05", "0.2", "0.19", "50", "0.99", "1");
        f.plan();
        assertThat(problems).singleElement().extracting(UserMessage::title).isEqualTo("No plan");
        assertThat(f.result()).isNull();
    }

    /**
     * σ from the demo's before sample of "Bore depth": 0.012128632410042672, Python 3.11.7
     * statistics.stdev of the 30 'before' values of sample-data/boring-bar-insert.csv; margin ±0.02 from
     * boring-bar-insert.settings.csv.
     */
    @Test
    void theBaselineFillsSigmaAndTheMarginThenPlans() {
        s.openDemo();
        assertThat(f.characteristics()).hasSize(7).contains("Bore depth");
        f.setCharacteristic("Bore depth");
        f.set(Field.DIFFERENCE, "0");
        f.fromBaseline();
        assertThat(Double.parseDouble(f.get(Field.SD))).isCloseTo(0.012128632410042672, within(1e-6));
        assertThat(f.marginMode()).isEqualTo(PlanForm.MarginMode.SYMMETRIC);
        assertThat(Double.parseDouble(f.get(Field.SYMMETRIC))).isEqualTo(0.02);
        assertThat(f.unit()).isEqualTo("mm");
        assertThat(f.resultFor()).isEqualTo("Bore depth");
        PlanResult direct = EquivalencePlan.withDefaults().withMargin(Margin.symmetric(0.02)).withAlpha(0.05)
                .withTargetPower(0.9).sampleSize(0, Double.parseDouble(f.get(Field.SD)));
        assertThat(f.result()).isEqualTo(direct);
    }

    @Test
    void planningEveryCharacteristicNamesTheOneThatNeedsTheMostParts() {
        s.openDemo();
        f.set(Field.DIFFERENCE, "0");
        f.planAll();
        var all = f.allPlans();
        assertThat(all.plans()).hasSize(7);
        // every criterion the demo's criteria name is planned (its sd-growth limits among them), and the
        // characteristic with the largest size over all its criteria drives
        int most = all.plans().stream().mapToInt(p -> p.needed()).max().orElseThrow();
        assertThat(all.driving().needed()).isEqualTo(most);
        assertThat(all.plans()).anySatisfy(p -> assertThat(p.spread()).isNotNull());
        if (all.driving().plan() != null && all.driving().plan().n() == most) {
            assertThat(f.result()).isEqualTo(all.driving().plan());
        }
        assertThat(s.lastStatus()).contains("needs the most parts").contains(all.driving().drivenBy() + " criterion");
        // when spread or capability decides, the window draws that criterion's power curve: at the planned size
        // it reaches the target at the assumed true value (the sd ratio 1, or the baseline's Ppk)
        var curve = f.drivingCurve();
        if (!"equivalence".equals(all.driving().drivenBy())) {
            assertThat(curve).isNotNull();
            assertThat(curve.x()).hasSize(25).isSorted();
            double achieved = "spread".equals(all.driving().drivenBy()) ? all.driving().spread().achievedPower()
                    : all.driving().capability().achievedPower();
            assertThat(achieved).isGreaterThanOrEqualTo(curve.target());
        } else {
            assertThat(curve).isNull();
        }
    }

    /**
     * A tight sd-growth limit (1.2 on every characteristic of the demo) makes the spread criterion decide; the
     * window then draws the spread criterion's power curve, falling as the true ratio rises towards the limit.
     */
    @Test
    void whenSpreadDecidesItsPowerCurveIsDrawn() {
        s.openDemo();
        for (int i = 0; i < s.criteria().rowCount(); i++) {
            s.criteria().set(i, org.holdpoint.ui.model.CriteriaColumn.SD_GROWTH, "1.2");
        }
        f.set(Field.DIFFERENCE, "0");
        f.planAll();
        assertThat(f.allPlans().driving().drivenBy()).isEqualTo("spread");
        var curve = f.drivingCurve();
        assertThat(curve).isNotNull();
        assertThat(curve.xLabel()).contains("sd(after) / sd(before)");
        assertThat(curve.power()[0]).isGreaterThan(curve.power()[curve.power().length - 1]);
        // at the limit itself the bound passes with probability alpha (SpreadPlanTest checks the power against R)
        assertThat(curve.power()[curve.power().length - 1]).isCloseTo(0.05, org.assertj.core.api.Assertions.within(1e-9));
    }

    @Test
    void withoutDataTheBaselineButtonSaysWhatToDo() {
        f.fromBaseline();
        assertThat(problems).singleElement().extracting(UserMessage::title).isEqualTo("No data yet");
    }

    private void typed(String alpha, String d, String t, String sd, String power, String ratio) {
        f.set(Field.ALPHA, alpha);
        f.set(Field.SYMMETRIC, d);
        f.set(Field.DIFFERENCE, t);
        f.set(Field.SD, sd);
        f.set(Field.POWER, power);
        f.set(Field.RATIO, ratio);
    }
}
