package org.holdpoint.importer;

import static org.assertj.core.api.Assertions.assertThat;
import static org.holdpoint.importer.Workbooks.row;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;
import java.util.SplittableRandom;
import org.holdpoint.study.AnalysisSettings;
import org.holdpoint.study.ChangeDescription;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.study.CharacteristicSettings;
import org.holdpoint.study.Dataset;
import org.holdpoint.study.MarginSpec;
import org.holdpoint.study.Progress;
import org.holdpoint.study.SpecLimits;
import org.holdpoint.result.StudyResult;
import org.holdpoint.workflow.ReportOptions;
import org.holdpoint.workflow.ReportUseCase;
import org.holdpoint.workflow.StudyAnalyzer;
import org.holdpoint.workflow.VerifyResult;
import org.holdpoint.workflow.VerifyUseCase;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.Timeout;
import org.junit.jupiter.api.io.TempDir;

/**
 * No false alarms: a workbook just written verifies intact for every input the import accepts. A
 * property over odd but accepted files (error values, formulas without a stored result, dates,
 * booleans, NaN and infinity texts, numbers in odd notations, control characters in skipped cells,
 * very long texts) and over the seeded mutants of the fuzz test that still import: write the sign-off
 * workbook, verify it, expect INTACT (docs/signoff-workbook.md).
 */
class FreshWorkbooksVerifyTest {
    @TempDir
    Path dir;

    private static final AnalysisSettings SETTINGS = new AnalysisSettings(0.05, false, false, null, null,
            new CharacteristicSettings(null, new SpecLimits(null, null, null),
                    new MarginSpec(MarginSpec.Kind.ABSOLUTE, -0.5, 0.5), null, null, null), List.of());

    private int written;

    /** Imports, analyses, writes and verifies; false when the file is not accepted (nothing to check). */
    private boolean writeAndVerify(Path data, String what) {
        Dataset d;
        try {
            d = new DataImporter().read(ImportRequest.of(data));
        } catch (ImportException refused) {
            return false;
        }
        StudyResult result;
        try {
            result = new StudyAnalyzer().analyze(d, SETTINGS, Progress.NONE);
        } catch (org.holdpoint.workflow.AnalysisException | org.holdpoint.stats.StatsException refused) {
            return false;
        }
        ChangeStudy study = new ChangeStudy(ChangeDescription.NONE, d, SETTINGS, List.of());
        Path xlsx = dir.resolve("fresh-" + (written++) + ".xlsx");
        try {
            new ReportUseCase().write(study, result, ReportOptions.withDefaults(), xlsx);
        } catch (java.io.IOException e) {
            throw new AssertionError(what + ": " + e, e);
        }
        VerifyResult v = new VerifyUseCase().verify(xlsx, null, Progress.NONE);
        assertThat(v.differences()).as(what).isEmpty();
        assertThat(v.notes()).as(what).isEmpty();
        assertThat(v.status()).as(what).isEqualTo(VerifyResult.Status.INTACT);
        return true;
    }

    @Test
    void oddButAcceptedFilesVerifyIntact() throws Exception {
        List<Path> files = new ArrayList<>();
        files.add(TestData.write(dir, "notations.csv", "phase,Length,Width\n"
                + "before,10.01,5.0\nbefore,1.002e1,5.01\nbefore,+10.03,5.02E+00\nbefore,10.0000000000000001,5.03\n"
                + "after,10.02,5.01\nafter,.1002E2,5.00\nafter,10.04,-0\nafter,NaN,Inf\nafter,-Infinity,n/a\n"
                + "before,1e-320,5.02\nafter,10.03,5.01\n"));
        // a value with more digits than its double keeps: its shortest decimal (0.0006) must not read back as exact
        files.add(TestData.write(dir, "long-digits.csv", "phase,Gap\nbefore,0.0005999999999999999\nbefore,0.0007\n"
                + "before,0.00065\nbefore,0.00071\nafter,0.00062\nafter,0.00068\nafter,0.0007\nafter,0.00066\n"));
        files.add(TestData.write(dir, "controls.csv", "phase,Length\nbefore,10.01\nbefore,\u0007bell\n"
                + "before,10.02\nbefore,10.03\nafter,\u001b[31mred\nafter,10.02\nafter,10.04\nafter,10.03\n"
                + "after," + "y".repeat(40_000) + "\n"));
        files.add(Workbooks.xlsx(dir.resolve("kinds.xlsx"), row("phase", "Length", "Width"),
                row("before", 10.01, 5.0), row("before", "=1/0", true), row("before", 10.02, LocalDate.of(2026, 1, 2)),
                row("before", 10.03, "#N/A"), row("after", 10.02, 5.01), row("after", "10.04", false),
                row("after", 10.03, 5.02), row("after", "1.004E1", 5.0), row("before", 10.0, 5.03)));
        files.add(Workbooks.xls(dir.resolve("kinds.xls"), row("phase", "Length"), row("before", 10.01),
                row("before", true), row("before", 10.02), row("before", 1.0E-300), row("after", 10.03),
                row("after", "x"), row("after", 10.04), row("after", 10.05)));
        int accepted = 0;
        for (Path f : files) {
            accepted += writeAndVerify(f, f.getFileName().toString()) ? 1 : 0;
        }
        assertThat(accepted).isEqualTo(files.size());
    }

    @Test
    @Timeout(600)
    void seededMutantsThatImportVerifyIntact() throws Exception {
        byte[] csv = ("Trial 3\nunit;phase;value (mm);lot\nU1;before;10,01;L1\nU2;before;10,02;L1\nU6;before;10,00;L1\n"
                + "U3;after;\"10,03\";L2\nU4;after;10,04;L2\nU5;after;n/a;L2\nU7;after;10,02;L2\n")
                .getBytes(StandardCharsets.UTF_8);
        SplittableRandom rnd = new SplittableRandom(20261203L);
        int accepted = 0;
        for (int i = 0; i < 120; i++) {
            Path f = TestData.write(dir, "m" + i + ".csv", FuzzImportTest.mutate(csv, rnd));
            accepted += writeAndVerify(f, "csv mutant " + i) ? 1 : 0;
        }
        Map<String, byte[]> parts = BadFiles.unzip(Files.readAllBytes(Workbooks.xlsx(dir.resolve("w.xlsx"),
                row("unit", "phase", "bore (mm)", "wall"), row("U1", "before", 10.01, 2.1),
                row("U2", "before", "10.02", 2.2), row("U4", "before", 10.0, 2.15), row("U1", "after", 10.03, 2.3),
                row("U2", "after", 10.04, true), row("U3", "after", 10.05, 2.5))));
        for (int i = 0; i < 60; i++) {
            Map<String, byte[]> m = new java.util.LinkedHashMap<>(parts);
            String part = rnd.nextInt(4) == 0 ? "xl/sharedStrings.xml" : "xl/worksheets/sheet1.xml";
            m.put(part, FuzzImportTest.mutate(parts.get(part), rnd));
            Path f = TestData.write(dir, "x" + i + ".xlsx", BadFiles.zip(m));
            accepted += writeAndVerify(f, "xlsx mutant " + i) ? 1 : 0;
        }
        assertThat(accepted).as("mutants that import, each written and verified").isGreaterThan(20);
    }
}
