package org.holdpoint.workflow;

import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.ZoneOffset;
import org.holdpoint.study.Signature;

/** Scratch: writes a fixture workbook for looking at. */
final class ReportSmokeMain {
    public static void main(String[] args) throws Exception {
        var study = ReportFixtures.study();
        var result = ReportFixtures.analyze(study);
        var uc = new ReportUseCase(Clock.fixed(Instant.parse("2026-11-21T09:30:00Z"), ZoneOffset.UTC));
        var w = uc.write(study, result, ReportOptions.withDefaults().withCharts(ReportFixtures.charts())
                .withExisting(ReportOptions.ExistingFile.REPLACE)
                .withSignOff(new Signature(Signature.Stage.PREPARED, "A. Lindqvist", "process engineer",
                        "prepared: study planned, measured and analysed as recorded", null)), Path.of(args[0]));
        System.out.println(w);
        var v = new VerifyUseCase().verify(Path.of(args[0]), null, org.holdpoint.study.Progress.NONE);
        System.out.println(v.status() + " " + v.differences().size());
        v.differences().forEach(d -> System.out.println(d.describe()));
        v.notes().forEach(System.out::println);
    }
}
