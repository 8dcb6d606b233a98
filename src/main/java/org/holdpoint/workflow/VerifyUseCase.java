package org.holdpoint.workflow;

import com.fasterxml.jackson.databind.JsonNode;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import org.holdpoint.report.RecordSeal;
import org.holdpoint.report.ReportException;
import org.holdpoint.report.ReportInput;
import org.holdpoint.report.SignoffWorkbookReader;
import org.holdpoint.report.Template;
import org.holdpoint.report.WorkbookDifference;
import org.holdpoint.study.ChangeStudy;
import org.holdpoint.result.CharacteristicResult;
import org.holdpoint.study.Progress;
import org.holdpoint.result.StudyResult;

/**
 * Re-verifies a sign-off workbook: reads the embedded study record, checks its SHA-256 (and the optional
 * Ed25519 signature), re-computes every result from the embedded raw data with the current code, and
 * compares the values shown on the visible sheets with that computation, listing every difference.
 */
public final class VerifyUseCase {

    /**
     * Verifies a workbook.
     *
     * @param workbook   the .xlsx
     * @param trustedKey a public key the record should be signed with, or null
     * @param progress   progress and cancel port
     * @return the findings
     * @throws SignoffException when the file cannot be read or is not a sign-off workbook
     */
    public VerifyResult verify(Path workbook, Path trustedKey, Progress progress) {
        return verify(workbook, trustedKey, null, progress);
    }

    /**
     * Verifies a workbook written with a template of one's own.
     *
     * @param workbook   the .xlsx
     * @param trustedKey a public key the record should be signed with, or null
     * @param template   the template it was filled from when not the default one, or null
     * @param progress   progress and cancel port
     * @return the findings
     * @throws SignoffException when the file cannot be read or is not a sign-off workbook
     */
    public VerifyResult verify(Path workbook, Path trustedKey, Path template, Progress progress) {
        progress.step("reading the record", 0);
        // the key is read first: a key that cannot be read is a mistake in the command, not a finding
        java.security.PublicKey trusted = trustedKey == null ? null : RecordSigning.readPublic(trustedKey);
        SignoffWorkbookReader reader;
        try {
            reader = SignoffWorkbookReader.open(workbook);
        } catch (ReportException e) {
            throw new SignoffException(e, "%s", e.getMessage());
        }
        byte[] record = reader.studyJson().getBytes(StandardCharsets.UTF_8);
        String sha = StudyFiles.sha256(record);
        boolean hashOk = sha.equals(reader.storedSha256());
        List<WorkbookDifference> diffs = new ArrayList<>();
        List<String> notes = new ArrayList<>();
        if (!hashOk) {
            diffs.add(new WorkbookDifference("(record)", "-", "SHA-256 of the embedded study record",
                    reader.storedSha256(), sha));
        }
        RecordSeal seal = reader.seal();
        String named = recordedSigningKey(reader.studyJson());
        VerifyResult.SealState sealState = sealState(record, seal, trusted);
        if (sealState == VerifyResult.SealState.OTHER_KEY) {
            diffs.add(new WorkbookDifference("(record)", "-", "key that signed the record", seal.keyFingerprint(),
                    RecordSigning.fingerprint(trusted) + " (the key given)"));
        }
        if (seal == null && (trusted != null || named != null)) {
            sealState = VerifyResult.SealState.MISSING;
            diffs.add(new WorkbookDifference("(record)", "-", "Ed25519 signature of the record", "none: not signed "
                    + (trusted != null ? "with this key" : "at all"), "a valid signature by key "
                    + (trusted != null ? RecordSigning.fingerprint(trusted) : named)
                    + (named != null ? " (the record names the key that signed it: the signature was removed)"
                            : "")));
        } else if (seal != null && named != null && !named.equals(seal.keyFingerprint())) {
            diffs.add(new WorkbookDifference("(record)", "-", "key that signed the record", seal.keyFingerprint(),
                    named + " (the key the record names: the signature was replaced)"));
        }
        if (sealState == VerifyResult.SealState.INVALID) {
            diffs.add(new WorkbookDifference("(record)", "-", "Ed25519 signature of the record", "does not match",
                    "a valid signature by key " + seal.keyFingerprint()));
        }
        ChangeStudy study;
        StudyResult result;
        try {
            study = StudyFiles.parse(reader.studyJson(), workbook + " (embedded record)");
            if (!reader.signaturesJson().isBlank()) {
                // the sign-off entries are kept beside the record; each names the record it signs
                List<org.holdpoint.study.Signature> sigs = StudyFiles.parseSignatures(reader.signaturesJson(),
                        workbook + " (sign-off entries)");
                for (org.holdpoint.study.Signature g : sigs) {
                    if (g.record() == null || !g.record().equals(sha)) {
                        diffs.add(new WorkbookDifference("(record)", "-", "sign-off entry " + g.stage().words() + " by "
                                + g.name(), "signs record " + (g.record() == null ? "(none named)" : g.record()),
                                "signs this record " + sha));
                    }
                }
                study = new ChangeStudy(study.change(), study.data(), study.settings(), sigs, study.provenance());
            }
            progress.checkCancelled();
            progress.step("re-computing", 0.3);
            result = new StudyAnalyzer().analyze(study.data(), study.settings(), progress);
        } catch (StudyFileException | AnalysisException | org.holdpoint.stats.StatsException e) {
            diffs.add(new WorkbookDifference("(record)", "-", "embedded study record", "cannot be re-computed: "
                    + e.getMessage(), "a readable study"));
            return new VerifyResult(VerifyResult.Status.EDITED, null, sha, hashOk, sealState, fingerprint(seal),
                    convert(diffs), List.of(), notes);
        }
        compareStoredResults(reader.studyJson(), result, notes);
        // the reasons of a verdict are words: the workbook shows them as the record keeps them (hashed with it),
        // so a later version that words or formats them otherwise does not report an edit
        result = withRecordedReasons(reader.studyJson(), result);
        progress.step("comparing the shown values", 0.6);
        ReportInput expected = new ReportInput(study, result, reader.studyJson(), sha, null, version(reader), reader
                .generatedAt(), seal, reader.signaturesJson());
        Template filled = templateOf(reader, template, diffs, notes);
        SignoffWorkbookReader.Comparison cmp;
        try {
            cmp = reader.compare(expected, filled);
        } catch (ReportException e) {
            throw new SignoffException(e, "%s", e.getMessage());
        }
        diffs.addAll(cmp.differences());
        progress.step("done", 1);
        List<String> signed = new ArrayList<>();
        for (org.holdpoint.study.Signature g : study.signatures()) {
            signed.add(String.format(java.util.Locale.ROOT, "%-9s %s%s, %s%s", g.stage().words(), g.name(),
                    g.role() == null ? "" : " (" + g.role() + ")", g.timestamp() == null ? "no time" : g.timestamp(),
                    g.meaning() == null ? "" : ": \"" + g.meaning() + "\""));
        }
        return new VerifyResult(diffs.isEmpty() ? VerifyResult.Status.INTACT : VerifyResult.Status.EDITED,
                study.change().id(), sha, hashOk, sealState, fingerprint(seal), convert(diffs), cmp.handEntries(),
                notes, signed);
    }

    /**
     * The template whose own cells, sheets and names the workbook must show: the default one, or the one
     * given, recognised by the content fingerprint in the record sheet.
     */
    private static Template templateOf(SignoffWorkbookReader reader, Path given, List<WorkbookDifference> diffs,
            List<String> notes) {
        String stored = reader.templateFingerprint();
        Template dflt = Template.defaultTemplate();
        if (stored.isBlank()) {
            diffs.add(new WorkbookDifference("(record)", "-", "template fingerprint", "(missing)",
                    "the fingerprint of the template the workbook was filled from"));
            return null;
        }
        if (stored.equals(dflt.fingerprint())) {
            return dflt;
        }
        if (given != null) {
            Template t;
            try {
                t = Template.read(given);
            } catch (ReportException e) {
                throw new SignoffException(e, "%s", e.getMessage());
            }
            if (t.fingerprint().equals(stored)) {
                return t;
            }
            diffs.add(new WorkbookDifference("(record)", "-", "template fingerprint", stored,
                    t.fingerprint() + " (the template given)"));
            return null;
        }
        notes.add("the workbook was filled from a template of its own (fingerprint " + stored + "): its labels, "
                + "sheets and names were not compared; give that template with --template to compare them");
        return null;
    }

    private static JsonNode withoutReasons(JsonNode characteristics) {
        JsonNode copy = characteristics.deepCopy();
        copy.forEach(n -> {
            if (n.path("verdict") instanceof com.fasterxml.jackson.databind.node.ObjectNode v) {
                v.remove("reasons");
            }
        });
        return copy;
    }

    private static List<VerifyResult.Difference> convert(List<WorkbookDifference> diffs) {
        return diffs.stream().map(d -> new VerifyResult.Difference(d.sheet(), d.cell(), d.what(), d.shown(),
                d.expected())).toList();
    }

    private static String version(SignoffWorkbookReader reader) {
        JsonNode tree = StudyFiles.tree(reader.studyJson());
        String v = tree.path("tool").path("version").asText("");
        return v.isEmpty() ? reader.softwareVersion() : v;
    }

    private static String fingerprint(RecordSeal seal) {
        return seal == null ? null : seal.keyFingerprint();
    }

    /** The fingerprint of the key the record says it is signed with, or null (unsigned, or older records). */
    private static String recordedSigningKey(String json) {
        JsonNode k;
        try {
            k = StudyFiles.tree(json).get("signingKey");
        } catch (StudyFileException e) {
            return null;
        }
        return k == null || !k.isTextual() ? null : k.asText();
    }

    private static VerifyResult.SealState sealState(byte[] record, RecordSeal seal, java.security.PublicKey trusted) {
        if (seal == null) {
            return VerifyResult.SealState.UNSIGNED;
        }
        if (!RecordSigning.verify(record, seal)) {
            return VerifyResult.SealState.INVALID;
        }
        if (trusted != null && !RecordSigning.fingerprint(trusted).equals(seal.keyFingerprint())) {
            return VerifyResult.SealState.OTHER_KEY;
        }
        return VerifyResult.SealState.VALID;
    }

    /** Notes when the current code computes other results than those stored when the workbook was written. */
    /**
     * The results with each verdict's reasons as the record words them, where the record has the same
     * characteristic with the same verdict status (a different status keeps the fresh words, so that the
     * difference shows).
     */
    static StudyResult withRecordedReasons(String json, StudyResult result) {
        JsonNode stored = StudyFiles.tree(json).path("results").path("characteristics");
        if (!stored.isArray()) {
            return result;
        }
        java.util.Map<String, JsonNode> byName = new java.util.HashMap<>();
        stored.forEach(n -> byName.put(n.path("name").asText(), n.path("verdict")));
        List<CharacteristicResult> out = new ArrayList<>();
        for (CharacteristicResult r : result.characteristics()) {
            JsonNode v = byName.get(r.name());
            if (v != null && v.path("reasons").isArray()
                    && v.path("status").asText().equals(r.verdict().status().words())) {
                List<String> reasons = new ArrayList<>();
                v.path("reasons").forEach(x -> reasons.add(x.asText()));
                r = r.with(r.holmP(), new org.holdpoint.result.Verdict(r.verdict().status(), reasons), r.notes());
            }
            out.add(r);
        }
        return new StudyResult(out, result.changeVerified(), result.summary(), result.failing());
    }

    /**
     * Whether every value the stored tree holds is found, equal, at the same place in the fresh one (fields the
     * fresh tree adds are ignored; arrays must have the same length).
     */
    static boolean keeps(JsonNode fresh, JsonNode stored) {
        if (stored.isObject()) {
            if (!fresh.isObject()) {
                return false;
            }
            for (var it = stored.fields(); it.hasNext();) {
                var e = it.next();
                if (!fresh.has(e.getKey()) || !keeps(fresh.get(e.getKey()), e.getValue())) {
                    return false;
                }
            }
            return true;
        }
        if (stored.isArray()) {
            if (!fresh.isArray() || fresh.size() != stored.size()) {
                return false;
            }
            for (int i = 0; i < stored.size(); i++) {
                if (!keeps(fresh.get(i), stored.get(i))) {
                    return false;
                }
            }
            return true;
        }
        return stored.equals(fresh);
    }

    private static void compareStoredResults(String json, StudyResult result, List<String> notes) {
        JsonNode stored = StudyFiles.tree(json).path("results").path("characteristics");
        if (!stored.isArray()) {
            return;
        }
        var fresh = com.fasterxml.jackson.databind.node.JsonNodeFactory.instance.arrayNode();
        for (CharacteristicResult r : result.characteristics()) {
            fresh.add(ResultJson.characteristic(r));
        }
        JsonNode reread = StudyFiles.tree(new String(StudyFiles.canonical(fresh), StandardCharsets.UTF_8));
        // the reasons are words, not results: a version that words them otherwise computes the same results
        stored = withoutReasons(stored);
        reread = withoutReasons(reread);
        // a later version may report more (new fields); what the record kept must come out the same
        if (!keeps(reread, stored)) {
            String written = StudyFiles.tree(json).path("tool").path("version").asText("");
            if (written.equals(Version.get())) {
                notes.add("the results stored in the record differ from those this same version (" + written
                        + ") computes from the same data: this is a fault of the program, not an edit of the "
                        + "workbook; please report it. The shown values were compared with the re-computation");
            } else {
                notes.add("the record was written by version " + (written.isEmpty() ? "(unknown)" : written)
                        + " and its stored results differ from those version " + Version.get() + " computes "
                        + "from the same data (a change of the software, not of the workbook); the shown values "
                        + "were compared with this version's results");
            }
        }
    }
}
