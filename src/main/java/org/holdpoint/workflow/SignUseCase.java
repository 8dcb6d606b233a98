package org.holdpoint.workflow;

import java.io.IOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.holdpoint.report.ReportException;
import org.holdpoint.report.SignoffWorkbookReader;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.study.Progress;
import org.holdpoint.study.Signature;
import org.holdpoint.result.StudyResult;

/**
 * Adds a later sign-off stage to a sign-off workbook without analysing again: the workbook is verified
 * first (a signature over a record that changed is refused), then a new workbook is written with the
 * same record, byte for byte, the same hash and the same Ed25519 seal, and the sign-off list grown by one
 * entry that names the record it signs (docs/signoff-workbook.md, "Sign-off stages").
 */
public final class SignUseCase {

    /**
     * What was signed.
     *
     * @param written    the new workbook
     * @param signatures the sign-off entries it holds, in order
     */
    public record Signed(ReportUseCase.Written written, List<Signature> signatures) {
    }

    /**
     * Signs.
     *
     * @param workbook  the intact sign-off workbook (only read)
     * @param target    the new workbook
     * @param entry     the entry to add (its time is set now)
     * @param template  the template the workbook was filled from when not the default, or null
     * @param overwrite whether an existing target may be replaced
     * @return the new workbook and its sign-off list
     * @throws SignoffException when the workbook is not intact or cannot be read
     * @throws IOException      when the new workbook cannot be written
     */
    public Signed sign(Path workbook, Path target, Signature entry, Path template, boolean overwrite)
            throws IOException {
        VerifyResult check = new VerifyUseCase().verify(workbook, null, template, Progress.NONE);
        if (check.status() != VerifyResult.Status.INTACT) {
            throw new SignoffException(null, "%s was edited since it was written (%d difference%s; run 'holdpoint "
                    + "verify %s' to see them): a sign-off entry is only added to an intact record",
                    workbook, check.differences().size(), check.differences().size() == 1 ? "" : "s", workbook);
        }
        SignoffWorkbookReader reader;
        try {
            reader = SignoffWorkbookReader.open(workbook);
        } catch (ReportException e) {
            throw new SignoffException(e, "%s", e.getMessage());
        }
        ChangeStudy study = StudyFiles.parse(reader.studyJson(), workbook + " (embedded record)");
        List<Signature> signatures = new ArrayList<>(reader.signaturesJson().isBlank() ? study.signatures()
                : StudyFiles.parseSignatures(reader.signaturesJson(), workbook + " (sign-off entries)"));
        ChangeStudy current = new ChangeStudy(study.change(), study.data(), study.settings(), signatures,
                study.provenance());
        StudyResult result = new StudyAnalyzer().analyze(current.data(), current.settings(), Progress.NONE);
        ReportOptions options = ReportOptions.withDefaults().withTemplate(template)
                .withExisting(overwrite ? ReportOptions.ExistingFile.REPLACE : ReportOptions.ExistingFile.REFUSE)
                .withCharts(new StudyChartSource()).withKeptRecord(reader.studyJson()).withKeptSeal(reader.seal())
                .withSignOff(new Signature(entry.stage(), entry.name(), entry.role(), entry.meaning(), null));
        ReportUseCase.Written w = new ReportUseCase().write(current, result, options, target);
        if (!w.sha256().equals(check.sha256())) {
            throw new IllegalStateException("the record changed while a sign-off entry was added: " + check.sha256()
                    + " became " + w.sha256());
        }
        return new Signed(w, w.study().signatures());
    }
}
