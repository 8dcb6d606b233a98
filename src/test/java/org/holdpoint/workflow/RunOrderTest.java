package org.holdpoint.workflow;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

import org.holdpoint.stats.Sample;
import org.holdpoint.study.GroupData;
import org.junit.jupiter.api.Test;

/** The run order read from the sequence column (numbers, dates, texts) or the file's rows. */
class RunOrderTest {
    private static GroupData group(String... sequence) {
        int n = sequence.length;
        double[] v = new double[n];
        int[] rows = new int[n];
        int[] cols = new int[n];
        for (int i = 0; i < n; i++) {
            v[i] = i;
            // the rows are given in reverse so that the file's order differs from the list's
            rows[i] = 2 + n - i;
            cols[i] = 3;
        }
        return new GroupData(Sample.of(v), "run.csv", null, rows, cols, null, null, null,
                sequence.length == 0 || sequence[0] == null && n > 0 && allNull(sequence) ? null : sequence);
    }

    private static boolean allNull(String[] s) {
        for (String x : s) {
            if (x != null) {
                return false;
            }
        }
        return true;
    }

    private static int[] order(GroupData g) throws RunOrder.Unknown {
        return RunOrder.of(g, false).order();
    }

    @Test
    void numbersAreOrderedAsNumbersAndEqualOnesKeepTheirPlace() throws Exception {
        assertThat(order(group("10", "9", "100", "9", "1.5"))).containsExactly(4, 1, 3, 0, 2);
        assertThat(RunOrder.of(group("2", "1"), false).source()).isEqualTo("the sequence column (numbers)");
    }

    @Test
    void datesAreOrderedAsDatesInTheirSpelling() throws Exception {
        // day.month.year as written in many plants: text order would put 02.12. before 11.11.
        RunOrder o = RunOrder.of(group("11.11.2026 14:05", "02.12.2026 06:10", "11.11.2026 09:30"), false);
        assertThat(o.order()).containsExactly(2, 0, 1);
        assertThat(o.source()).contains("dates and times, day.month.year");
        // the text a workbook's date cell is read as
        assertThat(order(group("2026-11-12T08:00", "2026-11-11T23:59:30", "2026-11-12"))).containsExactly(1, 2, 0);
        // month/day/year with a 12-hour clock, unambiguous because one day is above 12
        assertThat(order(group("11/13/2026 1:15 PM", "11/13/2026 9:40 AM", "11/2/2026 3:00 PM")))
                .containsExactly(2, 1, 0);
    }

    @Test
    void datesThatReadTwoWaysInDifferentOrdersAreRefused() {
        assertThatThrownBy(() -> order(group("03/04/2026", "04/03/2026", "05/03/2026")))
                .isInstanceOf(RunOrder.Unknown.class).hasMessageContaining("ambiguous")
                .hasMessageContaining("year-month-day");
        assertThatThrownBy(() -> order(group("2026-11-02", "03.11.2026"))).isInstanceOf(RunOrder.Unknown.class)
                .hasMessageContaining("mixes dates");
    }

    @Test
    void textsAreInNaturalOrderAndABlankIsNamed() throws Exception {
        assertThat(order(group("run 10", "run 9", "Run 100", "run 09b"))).containsExactly(1, 3, 0, 2);
        assertThatThrownBy(() -> order(group("1", " ", "3"))).isInstanceOf(RunOrder.Unknown.class)
                .hasMessageContaining("blank at row 4");
    }

    @Test
    void withoutASequenceColumnTheRowsGiveTheOrderOnlyWhenTheUserSaysSo() throws Exception {
        GroupData g = new GroupData(Sample.of(new double[] {1, 2, 3}), "run.csv", null, new int[] {7, 3, 5},
                new int[] {2, 2, 2}, null, null, null, null);
        assertThat(RunOrder.of(g, false)).isNull();
        RunOrder o = RunOrder.of(g, true);
        assertThat(o.order()).containsExactly(1, 2, 0);
        assertThat(o.source()).contains("row order");
    }

    @Test
    void subgroupLabelsGiveAnOrderOnlyAsNumbersOrDates() throws Exception {
        assertThat(RunOrder.ofLabels(java.util.List.of("10", "2", "1")).order()).containsExactly(2, 1, 0);
        assertThat(RunOrder.ofLabels(java.util.List.of("night", "day"))).isNull();
    }
}
