package org.holdpoint.study;

import static org.assertj.core.api.Assertions.assertThat;

import java.util.List;
import org.junit.jupiter.api.Test;

/**
 * The one set of criteria rules (docs/settings-file.md): each field is judged once, with one problem
 * per field, and every entry point says the same. The rules are definitions of the program (a margin
 * (L, U) for after − before must contain 0; the specification limits must be ordered), not numbers
 * from an outside source.
 */
class CriteriaCheckTest {

    @Test
    void validCriteriaHaveNoProblem() {
        assertThat(CriteriaCheck.check(24.98, 25.0, 25.02, new MarginSpec(MarginSpec.Kind.ABSOLUTE, -0.01, 0.01), 1.25,
                1.33)).isEmpty();
        assertThat(CriteriaCheck.check(null, null, null, new MarginSpec(MarginSpec.Kind.ABSOLUTE, null, 0.02), null,
                null)).isEmpty();
    }

    @Test
    void eachFieldGetsAtMostOneProblem() {
        List<CriteriaCheck.Problem> p = CriteriaCheck.check(25.02, 26.0, 24.98,
                new MarginSpec(MarginSpec.Kind.ABSOLUTE, 0.01, -0.01), -1.0, 0.0);
        assertThat(p).extracting(CriteriaCheck.Problem::field).containsExactlyInAnyOrder(CriteriaCheck.Field.USL,
                CriteriaCheck.Field.NOMINAL, CriteriaCheck.Field.MARGIN, CriteriaCheck.Field.SD_GROWTH_LIMIT,
                CriteriaCheck.Field.CAPABILITY_REQUIREMENT);
        assertThat(p.stream().filter(x -> x.field() == CriteriaCheck.Field.USL).findFirst().orElseThrow().message())
                .isEqualTo("the USL (24.98) must be above the LSL (25.02)");
    }

    @Test
    void numbersTooLargeToHoldAreNamedInWords() {
        List<CriteriaCheck.Problem> p = CriteriaCheck.check(null, null, null, new MarginSpec(
                MarginSpec.Kind.ABSOLUTE, Double.NEGATIVE_INFINITY, 0.01), Double.POSITIVE_INFINITY, null);
        assertThat(p).hasSize(2).extracting(CriteriaCheck.Problem::message)
                .allMatch(m -> m.contains("finite number")).noneMatch(m -> m.contains("Infinity"));
    }

    @Test
    void percentMarginsAndLevelsAndRatios() {
        assertThat(CriteriaCheck.margin(new MarginSpec(MarginSpec.Kind.PERCENT_OF_TOLERANCE, 10.0, 150.0)))
                .contains("at most 100");
        assertThat(CriteriaCheck.resolvable(new MarginSpec(MarginSpec.Kind.PERCENT_OF_TOLERANCE, 10.0, 10.0),
                new SpecLimits(null, null, 0.08))).contains("needs both the LSL and the USL");
        assertThat(CriteriaCheck.alpha(0.05)).isNull();
        assertThat(CriteriaCheck.alpha(0.5)).contains("strictly between 0 and 0.5");
        assertThat(CriteriaCheck.allocationRatio(250)).isNull();
        assertThat(CriteriaCheck.allocationRatio(0)).contains("above 0");
    }

    @Test
    void theSettingsRecordUsesTheSameRules() {
        org.assertj.core.api.Assertions.assertThatThrownBy(() -> new CharacteristicSettings(null,
                SpecLimits.NONE, null, 0.0, null, null)).hasMessage("the sd-growth limit must be above 0, e.g. 1.25; "
                        + "got 0");
    }
}
