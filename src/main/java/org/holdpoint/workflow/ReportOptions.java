package org.holdpoint.workflow;

import java.nio.file.Path;
import org.holdpoint.study.Signature;

/**
 * How to write a sign-off workbook. Immutable; start from {@link #withDefaults()}.
 *
 * @param template      a template file, or null for the default template
 * @param existing      what to do when the target exists
 * @param signOff       a sign-off entry to add (its time stamp is filled in when null), or null
 * @param privateKey    an Ed25519 private key (PKCS#8 PEM) to sign the record with, or null
 * @param publicKey     the matching public key (X.509 PEM), required with {@code privateKey}
 * @param charts        the chart renderer
 */
public record ReportOptions(Path template, ExistingFile existing, Signature signOff, Path privateKey,
        Path publicKey, ChartSource charts, org.holdpoint.report.RecordSeal keptSeal, String keptRecord) {

    /** What to do when the output file exists. */
    public enum ExistingFile {
        /** Stop with a message (the default). */
        REFUSE,
        /** Replace it, atomically. */
        REPLACE
    }

    /** Validates. */
    public ReportOptions {
        existing = existing == null ? ExistingFile.REFUSE : existing;
        charts = charts == null ? ChartSource.NONE : charts;
        if ((privateKey == null) != (publicKey == null)) {
            throw new StudyFileException("signing the record needs both the private key and its public key file");
        }
        if ((keptSeal != null || keptRecord != null) && privateKey != null) {
            throw new StudyFileException("a record keeps its seal or gets a new one, not both");
        }
    }

    /**
     * Options without a kept seal.
     *
     * @param template   the template or null
     * @param existing   what to do with an existing file
     * @param signOff    a sign-off entry to add, or null
     * @param privateKey the private key or null
     * @param publicKey  the public key or null
     * @param charts     the chart source
     */
    public ReportOptions(Path template, ExistingFile existing, Signature signOff, Path privateKey, Path publicKey,
            ChartSource charts) {
        this(template, existing, signOff, privateKey, publicKey, charts, null, null);
    }

    /**
     * @param seal the Ed25519 seal of the record, kept as it is (the record is unchanged when a sign-off stage
     *             is added)
     * @return a copy
     */
    public ReportOptions withKeptSeal(org.holdpoint.report.RecordSeal seal) {
        return new ReportOptions(template, existing, signOff, privateKey, publicKey, charts, seal, keptRecord);
    }

    /**
     * @param recordJson the record's canonical text, kept byte for byte (a sign-off stage added later writes
     *                   the same record, whatever version of the program writes the new workbook)
     * @return a copy
     */
    public ReportOptions withKeptRecord(String recordJson) {
        return new ReportOptions(template, existing, signOff, privateKey, publicKey, charts, keptSeal, recordJson);
    }

    /** @return the default template, refuse to replace, no sign-off entry, no key, no charts */
    public static ReportOptions withDefaults() {
        return new ReportOptions(null, ExistingFile.REFUSE, null, null, null, ChartSource.NONE);
    }

    /**
     * @param file the template, or null for the default
     * @return a copy with that template
     */
    public ReportOptions withTemplate(Path file) {
        return new ReportOptions(file, existing, signOff, privateKey, publicKey, charts, keptSeal, keptRecord);
    }

    /**
     * @param mode what to do with an existing file
     * @return a copy
     */
    public ReportOptions withExisting(ExistingFile mode) {
        return new ReportOptions(template, mode, signOff, privateKey, publicKey, charts, keptSeal, keptRecord);
    }

    /**
     * @param entry the sign-off entry to add, or null
     * @return a copy
     */
    public ReportOptions withSignOff(Signature entry) {
        return new ReportOptions(template, existing, entry, privateKey, publicKey, charts, keptSeal, keptRecord);
    }

    /**
     * @param privateFile the private key
     * @param publicFile  the public key
     * @return a copy that signs the record
     */
    public ReportOptions withSigningKey(Path privateFile, Path publicFile) {
        return new ReportOptions(template, existing, signOff, privateFile, publicFile, charts, keptSeal, keptRecord);
    }

    /**
     * @param source the chart renderer
     * @return a copy
     */
    public ReportOptions withCharts(ChartSource source) {
        return new ReportOptions(template, existing, signOff, privateKey, publicKey, source, keptSeal, keptRecord);
    }
}
