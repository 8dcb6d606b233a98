package org.holdpoint.importer;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.holdpoint.importer.TestData.named;
import static org.holdpoint.importer.TestData.only;
import static org.holdpoint.importer.TestData.read;
import static org.holdpoint.importer.TestData.values;
import static org.holdpoint.importer.TestData.write;

import java.nio.file.Path;
import org.holdpoint.study.CharacteristicData;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.Layout;
import org.holdpoint.study.SkipReason;
import org.holdpoint.study.SkippedCell;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Delimited text input: every layout, detection rules, options, skipped cells. */
class CsvImportTest {
    @TempDir
    Path dir;

    @Test
    void stackedPhaseValue() {
        Path f = write(dir, "bore.csv", "phase,value\nbefore,10.01\nbefore,10.02\nafter,10.03\nAfter ,10.04\nafter,10.05\n");
        Dataset d = read(f);
        CharacteristicData c = only(d);
        assertThat(c.name()).isEqualTo("bore");
        assertThat(values(c.before())).containsExactly(10.01, 10.02);
        assertThat(values(c.after())).containsExactly(10.03, 10.04, 10.05);
        assertThat(c.before().sample().hasExactDecimals()).isTrue();
        assertThat(c.after().origin(1).cell()).isEqualTo("B5");
        assertThat(c.after().origin(1).sheet()).isNull();
        assertThat(d.inputs().get(0).layout()).isEqualTo(Layout.STACKED);
        assertThat(d.report().messages()).anyMatch(m -> m.contains("layout stacked") && m.contains("detected"));
        assertThat(d.report().valuesUsed()).isEqualTo(5);
    }

    @Test
    void anyColumnWithExactlyTheLabelsIsTheGroupColumn() {
        Path f = write(dir, "x.csv", "when,torque (Nm)\nBEFORE,5.1\nbefore,5.2\nafter,5.3\nafter,5.4\n");
        CharacteristicData c = only(read(f));
        assertThat(c.name()).isEqualTo("torque");
        assertThat(c.unit()).isEqualTo("Nm");
        assertThat(values(c.after())).containsExactly(5.3, 5.4);
    }

    @Test
    void stackedWithCharacteristicColumn() {
        Path f = write(dir, "s.csv", "characteristic,phase,value,unit,lot\n"
                + "bore,before,1.5,U1,L1\nwall,before,2.5,U1,L1\nbore,after,1.6,U2,L2\nwall,after,2.6,U2,L2\n"
                + "bore,before,1.4,U3,L1\nwall,after,2.7,U4,L2\n");
        Dataset d = read(f);
        assertThat(d.characteristics()).extracting(CharacteristicData::name).containsExactly("bore", "wall");
        CharacteristicData bore = named(d, "bore");
        assertThat(values(bore.before())).containsExactly(1.5, 1.4);
        assertThat(bore.before().unit(1)).isEqualTo("U3");
        assertThat(bore.before().lot(1)).isEqualTo("L1");
        assertThat(values(named(d, "wall").after())).containsExactly(2.6, 2.7);
    }

    @Test
    void sideBySideWithUnequalLengths() {
        Path f = write(dir, "sbs.csv", "before,after\n1.1,2.1\n1.2,2.2\n1.3,\n1.4,\n");
        Dataset d = read(f);
        CharacteristicData c = only(d);
        assertThat(values(c.before())).containsExactly(1.1, 1.2, 1.3, 1.4);
        assertThat(values(c.after())).containsExactly(2.1, 2.2);
        assertThat(c.paired()).isFalse();
        assertThat(d.inputs().get(0).layout()).isEqualTo(Layout.SIDE_BY_SIDE);
        // trailing blanks of the shorter column are not problems
        assertThat(d.report().skippedTotal()).isZero();
    }

    @Test
    void sideBySideForSeveralCharacteristics() {
        Path f = write(dir, "m.csv", "Bore before (mm),Bore after (mm),wall_before,wall_after\n1,2,3,4\n1.5,2.5,3.5,4.5\n");
        Dataset d = read(f);
        assertThat(d.characteristics()).extracting(CharacteristicData::name).containsExactly("Bore", "wall");
        assertThat(named(d, "Bore").unit()).isEqualTo("mm");
        assertThat(values(named(d, "wall").after())).containsExactly(4.0, 4.5);
    }

    @Test
    void pairedMatchesByUnitIdNotByRow() {
        Path f = write(dir, "p.csv", "unit,before,after\nA,1.0,1.1\nB,,2.1\nC,3.0,3.1\nD,4.0,\n");
        Dataset d = read(ImportRequest.of(f).withPaired(true));
        CharacteristicData c = only(d);
        assertThat(c.paired()).isTrue();
        assertThat(values(c.before())).containsExactly(1.0, 3.0);
        assertThat(values(c.after())).containsExactly(1.1, 3.1);
        assertThat(c.before().unit(1)).isEqualTo("C");
        assertThat(c.after().unit(1)).isEqualTo("C");
        assertThat(c.unmatchedUnits()).containsExactlyInAnyOrder("B", "D");
        assertThat(d.report().skipCounts()).containsEntry(SkipReason.UNPAIRED, 2L);
        assertThat(d.inputs().get(0).layout()).isEqualTo(Layout.PAIRED);
    }

    @Test
    void pairedStackedRowsInAnyOrder() {
        Path f = write(dir, "ps.csv", "unit,phase,value\nU2,before,2.0\nU1,before,1.0\nU1,after,1.5\nU2,after,2.5\n");
        CharacteristicData c = only(read(ImportRequest.of(f).withPaired(true)));
        assertThat(values(c.before())).containsExactly(2.0, 1.0);
        assertThat(values(c.after())).containsExactly(2.5, 1.5);
    }

    @Test
    void wideOneColumnPerCharacteristic() {
        Path f = write(dir, "w.csv", "phase,bore (mm),wall (mm),torque (Nm)\nbefore,1,2,3\nbefore,1.1,2.1,3.1\n"
                + "after,1.2,2.2,3.2\nafter,1.3,n/a,3.3\n");
        Dataset d = read(f);
        assertThat(d.characteristics()).extracting(CharacteristicData::name).containsExactly("bore", "wall", "torque");
        assertThat(named(d, "torque").unit()).isEqualTo("Nm");
        assertThat(values(named(d, "wall").after())).containsExactly(2.2);
        assertThat(d.inputs().get(0).layout()).isEqualTo(Layout.WIDE);
        SkippedCell s = d.report().firstSkipped().get(0);
        assertThat(s.origin().cell()).isEqualTo("C5");
        assertThat(s.reason()).isEqualTo(SkipReason.TEXT);
        assertThat(s.text()).isEqualTo("n/a");
        assertThat(d.report().skippedPerCharacteristic()).containsEntry("wall", 1L);
        assertThat(d.report().unusableFraction("wall")).isEqualTo(1.0 / 4);
    }

    @Test
    void semicolonWithDecimalComma() {
        Path f = write(dir, "eu.csv", "Phase;Wert;Bemerkung\nbefore;10,25;ok\nbefore;10,5;\nafter;10,75;\nafter;11;\n");
        CharacteristicData c = only(read(ImportRequest.of(f).withValueColumn("wert")));
        assertThat(values(c.before())).containsExactly(10.25, 10.5);
        assertThat(values(c.after())).containsExactly(10.75, 11.0);
    }

    @Test
    void commaDelimiterWithQuotedDecimalCommas() {
        Path f = write(dir, "q.csv", "phase,value\nbefore,\"10,25\"\nbefore,\"10,5\"\nafter,\"10,75\"\nafter,11\n");
        CharacteristicData c = only(read(f));
        assertThat(values(c.before())).containsExactly(10.25, 10.5);
        assertThat(values(c.after())).containsExactly(10.75, 11.0);
    }

    @Test
    void tabSeparatedWithTitleRowsAndBom() {
        Path f = write(dir, "t.tsv", "\uFEFFTrial 7 - cover plate\nexported 2026-11-30\n\nphase\tvalue\nbefore\t1\n"
                + "before\t2\nafter\t3\nafter\t4\n");
        Dataset d = read(f);
        assertThat(values(only(d).after())).containsExactly(3.0, 4.0);
        assertThat(only(d).after().origin(0).row()).isEqualTo(7);
        assertThat(d.report().messages()).anyMatch(m -> m.contains("header in row 4"));
    }

    @Test
    void everySkippedCellIsCountedWithItsReason() {
        Path f = write(dir, "k.csv", "phase,value,note\nbefore,1\nbefore,\nbefore,NaN\nbefore,TRUE\nbefore,2026-01-02\n"
                + "before,#DIV/0!\nbefore,n/a\nafter,3\nafter,4\nmiddle,5\n,6\nbefore,7,,stray\n");
        Dataset d = read(f);
        assertThat(d.report().skipCounts()).containsEntry(SkipReason.BLANK, 1L)
                .containsEntry(SkipReason.NOT_FINITE, 1L).containsEntry(SkipReason.BOOLEAN, 1L)
                .containsEntry(SkipReason.DATE, 1L).containsEntry(SkipReason.ERROR_VALUE, 1L)
                .containsEntry(SkipReason.TEXT, 1L).containsEntry(SkipReason.UNKNOWN_GROUP, 2L)
                .containsEntry(SkipReason.OUTSIDE_COLUMNS, 1L);
        assertThat(d.report().skippedTotal()).isEqualTo(9);
        assertThat(values(only(d).before())).containsExactly(1.0, 7.0);
        assertThat(d.report().firstSkipped()).anyMatch(s -> s.origin().cell().equals("D13")
                && s.reason() == SkipReason.OUTSIDE_COLUMNS);
    }

    @Test
    void numbersBeyondBinary64AreNotFinite() {
        Path f = write(dir, "big.csv", "before,after\n1,2\n1e400,3\n-1E999,4\n");
        Dataset d = read(f);
        assertThat(values(only(d).before())).containsExactly(1.0);
        assertThat(d.report().skipCounts()).containsEntry(SkipReason.NOT_FINITE, 2L);
    }

    @Test
    void optionsOverrideDetection() {
        Path f = write(dir, "o.csv", "grp,a,b\nold,1,10\nold,2,20\nnew,3,30\nnew,4,40\n");
        Dataset d = read(ImportRequest.of(f).withGroupColumn("grp").withValueColumn("b").withLabels("old", "new")
                .withLayout(Layout.STACKED));
        assertThat(values(only(d).after())).containsExactly(30.0, 40.0);
        assertThat(d.report().messages()).anyMatch(m -> m.contains("as requested"));
    }

    @Test
    void twoFilesBeforeAndAfter() {
        Path b = write(dir, "before.csv", "unit,bore,wall\nA,1,2\nB,1.1,2.1\n");
        Path a = write(dir, "after.csv", "unit,wall,bore\nB,2.2,1.2\nA,2.3,1.3\nC,2.4,1.4\n");
        Dataset d = read(ImportRequest.ofTwo(b, a));
        assertThat(values(named(d, "bore").after())).containsExactly(1.2, 1.3, 1.4);
        assertThat(d.inputs()).extracting(i -> i.role()).containsExactly("before", "after");
        Dataset p = read(ImportRequest.ofTwo(b, a).withPaired(true));
        CharacteristicData bore = named(p, "bore");
        assertThat(values(bore.before())).containsExactly(1.0, 1.1);
        assertThat(values(bore.after())).containsExactly(1.3, 1.2);
        assertThat(bore.unmatchedUnits()).containsExactly("C");
    }

    @Test
    void twoFilesWithOneValueColumnEach() {
        Path b = write(dir, "old.csv", "diameter\n1\n2\n3\n");
        Path a = write(dir, "new.csv", "value\n4\n5\n");
        CharacteristicData c = only(read(ImportRequest.ofTwo(b, a)));
        assertThat(c.name()).isEqualTo("diameter");
        assertThat(values(c.after())).containsExactly(4.0, 5.0);
    }

    @Test
    void sha256OfTheInput() {
        // FIPS 180-2, appendix B.1: SHA-256("abc")
        Path f = write(dir, "abc.csv", "abc");
        assertThat(Sha256.of(f, "abc.csv"))
                .isEqualTo("ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
        Path g = write(dir, "g.csv", "phase,value\nbefore,1\nbefore,2\nafter,3\nafter,4\n");
        assertThat(read(g).inputs().get(0).sha256()).hasSize(64).isEqualTo(Sha256.of(g, "g"));
    }

    @Test
    void exactDecimalsKeptAtACommonScale() {
        Path f = write(dir, "e.csv", "before,after\n10000000.2,10000000.1\n10000000.25,1e-3\n");
        CharacteristicData c = only(read(f));
        assertThat(c.before().sample().hasExactDecimals()).isTrue();
        assertThat(c.after().sample().hasExactDecimals()).isTrue();
        assertThat(values(c.after())).containsExactly(10000000.1, 0.001);
    }

    @Test
    void unknownColumnOptionIsNamed() {
        Path f = write(dir, "u.csv", "phase,value\nbefore,1\nafter,2\n");
        assertThatThrownBy(() -> read(ImportRequest.of(f).withValueColumn("reading")))
                .isInstanceOf(ImportException.class).hasMessageContaining("\"reading\"")
                .hasMessageContaining("\"phase\" (A)");
    }
}
