package org.holdpoint.workflow;

import org.holdpoint.files.AtomicFiles;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.FileAlreadyExistsException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Clock;
import java.time.Instant;
import java.time.temporal.ChronoUnit;
import java.util.ArrayList;
import java.util.List;
import org.holdpoint.report.RecordSeal;
import org.holdpoint.report.ReportException;
import org.holdpoint.report.ReportInput;
import org.holdpoint.report.SignoffWorkbook;
import org.holdpoint.report.Template;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.study.Signature;
import org.holdpoint.result.StudyResult;

/**
 * Writes the sign-off workbook of an analysed study: builds the canonical study record
 * ({@link StudyFiles#toJson}, canonical form, SHA-256), optionally signs it, and has the report fill the
 * template; the file is written atomically, so a failure leaves nothing behind.
 */
public final class ReportUseCase {
    private final Clock clock;

    /** A use case on the system clock (UTC). */
    public ReportUseCase() {
        this(Clock.systemUTC());
    }

    /**
     * @param clock the clock for the sign-off time stamp and the written-at time
     */
    public ReportUseCase(Clock clock) {
        this.clock = clock;
    }

    /**
     * What was written.
     *
     * @param file           the workbook
     * @param sha256         the SHA-256 of the embedded record
     * @param keyFingerprint the signing key's fingerprint, or null when unsigned
     * @param study          the study as recorded (with the sign-off entry added)
     */
    public record Written(Path file, String sha256, String keyFingerprint, ChangeStudy study) {
    }

    /**
     * Writes the workbook.
     *
     * @param study   the study (change, data, settings, signatures so far)
     * @param result  its analysis
     * @param options template, overwrite, sign-off entry, key, charts
     * @param target  the .xlsx to write
     * @return what was written
     * @throws IOException when the file exists (and may not be replaced) or cannot be written
     * @throws SignoffException when the template is not usable or the file exists and may not be replaced
     */
    public Written write(ChangeStudy study, StudyResult result, ReportOptions options, Path target)
            throws IOException {
        Template template;
        try {
            template = options.template() == null ? Template.defaultTemplate() : Template.read(options.template());
        } catch (ReportException e) {
            throw new SignoffException(e, "%s", e.getMessage());
        }
        if (options.existing() == ReportOptions.ExistingFile.REFUSE && Files.exists(target)) {
            throw new SignoffException(null, "%s exists; give --overwrite to replace it", target);
        }
        String now = Instant.now(clock).truncatedTo(ChronoUnit.SECONDS).toString();
        ChangeStudy keyed = options.publicKey() == null ? study : study.withProvenance(study.provenance()
                .withSigningKey(RecordSigning.fingerprint(RecordSigning.readPublic(options.publicKey()))));
        // the record is the study without its signatures: its hash is what every signature signs
        byte[] record = options.keptRecord() != null ? options.keptRecord().getBytes(StandardCharsets.UTF_8)
                : StudyFiles.record(StudyFiles.toJson(keyed, result));
        String sha = StudyFiles.sha256(record);
        ChangeStudy recorded = withSignOff(keyed, options.signOff(), now, sha);
        String json = new String(record, StandardCharsets.UTF_8);
        String signatures = StudyFiles.signaturesJson(recorded.signatures());
        RecordSeal seal = options.keptSeal() != null ? options.keptSeal() : options.privateKey() == null ? null
                : RecordSigning.sign(record, options.privateKey(), options.publicKey());
        SignoffWorkbook writer = new SignoffWorkbook(template);
        try {
            // the charts are rendered inside the atomic write: a renderer that fails leaves no file behind
            AtomicFiles.write(target, options.existing() == ReportOptions.ExistingFile.REPLACE,
                    out -> writer.write(new ReportInput(recorded, result, json, sha, options.charts().charts(recorded,
                            result), Version.get(), now, seal, signatures), out));
        } catch (ReportException e) {
            throw new SignoffException(e, "%s", e.getMessage());
        } catch (FileAlreadyExistsException e) {
            throw new SignoffException(e, "%s exists; give --overwrite to replace it", target);
        }
        return new Written(target, sha, seal == null ? null : seal.keyFingerprint(), recorded);
    }

    private static ChangeStudy withSignOff(ChangeStudy study, Signature entry, String now, String recordSha) {
        List<Signature> all = new ArrayList<>();
        for (Signature s : study.signatures()) {
            // an entry made with this record (analyze --signed-by) is linked to it now
            all.add(s.record() == null ? s.stamped(now, recordSha) : s);
        }
        if (entry != null) {
            all.add(entry.stamped(now, recordSha));
        }
        return new ChangeStudy(study.change(), study.data(), study.settings(), all, study.provenance());
    }
}
