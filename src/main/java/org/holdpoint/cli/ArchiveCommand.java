package org.holdpoint.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.PrintWriter;
import java.nio.file.Files;
import java.nio.file.Path;
import java.time.Instant;
import java.time.LocalDate;
import java.time.ZoneOffset;
import java.time.format.DateTimeParseException;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.holdpoint.study.ArchiveException;
import org.holdpoint.study.ArchiveQuery;
import org.holdpoint.study.ArchivedSignature;
import org.holdpoint.study.AuditEvent;
import org.holdpoint.study.ChangeRecordArchive;
import org.holdpoint.study.StudyVersion;
import org.holdpoint.study.VerificationReport;
import org.holdpoint.workflow.ArchiveUseCase;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code holdpoint archive ...}: the change-record archive. */
@Command(name = "archive", mixinStandardHelpOptions = true, usageHelpAutoWidth = true,
        header = "Keep, find, sign and verify change records.",
        description = {"Change records are append-only: a study is archived as an immutable version, a correction "
                + "is a new version that supersedes it, and every entry of the audit trail carries the hash of the "
                + "previous one, so that an edit made directly in the database is found by 'archive verify'.",
            "Default archive: an embedded database file in the user's data folder. A shared PostgreSQL archive is "
                    + "chosen with --archive jdbc:postgresql://... or archive.url in "
                    + "~/.config/holdpoint/settings.properties."},
        subcommands = {ArchiveCommand.Add.class, ArchiveCommand.ListStudies.class, ArchiveCommand.Show.class,
            ArchiveCommand.Sign.class, ArchiveCommand.Export.class, ArchiveCommand.Verify.class},
        footer = {"", "Exit codes: 0 done (verify: intact), 1 verify found something altered, 2 bad input or refused, "
                + "3 internal error; a retryable conflict says so and changed nothing."})
final class ArchiveCommand implements Runnable {
    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Override
    public void run() {
        spec.commandLine().usage(spec.commandLine().getOut());
    }

    /** Options every archive command shares. */
    static class Common {
        @CommandLine.Spec
        CommandLine.Model.CommandSpec spec;

        @Option(names = "--archive", paramLabel = "URL", description = "JDBC URL of the archive (default: the "
                + "configured one, else the embedded file in the user's data folder).")
        String url;

        @Option(names = "--json", description = "Print the result as JSON.")
        boolean json;

        PrintWriter out() {
            return spec.commandLine().getOut();
        }

        ChangeRecordArchive open() {
            try {
                return HoldpointCommand.archives(spec).open(url);
            } catch (ArchiveException e) {
                throw new UserInputException("cannot open the archive: %s", e.getMessage());
            }
        }

        int fail(ArchiveException e) {
            PrintWriter err = spec.commandLine().getErr();
            err.println("holdpoint: " + e.getMessage() + (e.isRetryable() ? " (retry: nothing was changed)" : ""));
            err.flush();
            return ExitCodes.BAD_INPUT;
        }

        void printJson(ObjectNode node) {
            try {
                out().println(new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT).writeValueAsString(node));
                out().flush();
            } catch (com.fasterxml.jackson.core.JsonProcessingException e) {
                throw new IllegalStateException(e);
            }
        }
    }

    @Command(name = "add", mixinStandardHelpOptions = true, header = "Archive a study file as a new version.")
    static final class Add extends Common implements Callable<Integer> {
        @Parameters(paramLabel = "STUDY.json", description = "A study file written by 'analyze --save-study'.")
        Path study;
        @Option(names = "--actor", paramLabel = "NAME", description = "Who archives it (default: the login name).")
        String actor;
        @Option(names = "--reason", paramLabel = "TEXT", description = "Why; required when the change is already "
                + "archived and this version supersedes it.")
        String reason;

        @Override
        public Integer call() {
            if (!Files.isRegularFile(study)) {
                throw new UserInputException("%s: file not found; check the path", study);
            }
            try (ChangeRecordArchive a = open()) {
                ArchiveUseCase useCase = new ArchiveUseCase(a);
                StudyVersion v = useCase.add(study, actor != null ? actor
                        : System.getProperty("user.name", "unknown"), reason);
                if (json) {
                    printJson(versionJson(v));
                } else {
                    out().printf(Locale.ROOT, "Archived %s version %d as id %d%s (record SHA-256 %s)%n",
                            v.changeId(), v.version(), v.id(), v.supersedes() == null ? ""
                                    : ", superseding id " + v.supersedes(), useCase.lastRecordSha256());
                    out().flush();
                }
                return ExitCodes.OK;
            } catch (ArchiveException e) {
                return fail(e);
            }
        }
    }

    @Command(name = "list", mixinStandardHelpOptions = true, header = "List archived change records.")
    static final class ListStudies extends Common implements Callable<Integer> {
        @Option(names = "--part", paramLabel = "TEXT", description = "Only part numbers containing TEXT (any case; "
                + "* for any run of characters, as in HX-*-B).")
        String part;
        @Option(names = "--characteristic", paramLabel = "TEXT", description = "Only records with a characteristic "
                + "whose name contains TEXT (any case; * as a wildcard).")
        String characteristic;
        @Option(names = "--kind", paramLabel = "KIND", description = "Only this kind of change (tooling, machine, "
                + "material, supplier, method, other).")
        String kind;
        @Option(names = "--verdict", paramLabel = "VERDICT", description = "Only 'verified' or 'not verified'.")
        String verdict;
        @Option(names = "--from", paramLabel = "DATE", description = "Archived on or after this date (yyyy-mm-dd).")
        String from;
        @Option(names = "--to", paramLabel = "DATE", description = "Archived on or before this date (yyyy-mm-dd; the "
                + "whole day counts).")
        String to;
        @Option(names = "--signer", paramLabel = "TEXT", description = "Only records signed by a person whose name "
                + "contains TEXT (any case; * as a wildcard).")
        String signer;
        @Option(names = "--all-versions", description = "Include superseded versions.")
        boolean all;

        @Override
        public Integer call() {
            ArchiveQuery q = ArchiveQuery.withDefaults();
            q = part == null ? q : q.withPartNumber(part);
            q = characteristic == null ? q : q.withCharacteristic(characteristic);
            q = kind == null ? q : q.withChangeKind(kind);
            q = verdict == null ? q : q.withVerdict(verdict);
            q = signer == null ? q : q.withSigner(signer);
            if (from != null || to != null) {
                q = q.withCreatedBetween(day(from, "--from"), day(to, "--to"));
            }
            q = q.withVersions(all ? ArchiveQuery.Versions.ALL : ArchiveQuery.Versions.CURRENT);
            try (ChangeRecordArchive a = open()) {
                List<StudyVersion> found = new ArchiveUseCase(a).list(q);
                if (json) {
                    ObjectNode root = JsonNodeFactory.instance.objectNode();
                    ArrayNode list = root.putArray("studies");
                    found.forEach(v -> list.add(versionJson(v)));
                    printJson(root);
                } else {
                    out().printf(Locale.ROOT, "%-6s %-16s %-3s %-12s %-5s %-10s %-13s %-20s %s%n", "id", "change",
                            "ver", "part", "rev", "kind", "verdict", "archived", "signed by");
                    for (StudyVersion v : found) {
                        out().printf(Locale.ROOT, "%-6d %-16s %-3d %-12s %-5s %-10s %-13s %-20s %s%n", v.id(),
                                v.changeId(), v.version(), v.partNumber(), v.revision(), v.changeKind(), v.verdict(),
                                v.archivedAt().toString().substring(0, 19), String.join(", ", v.signers()));
                    }
                    out().printf(Locale.ROOT, "%d record(s)%n", found.size());
                    out().flush();
                }
                return ExitCodes.OK;
            } catch (ArchiveException e) {
                return fail(e);
            }
        }

        private Instant day(String text, String option) {
            if (text == null) {
                return option.equals("--from") ? Instant.EPOCH : Instant.parse("9999-12-31T00:00:00Z");
            }
            try {
                LocalDate d = LocalDate.parse(text);
                // --to includes its whole day
                return (option.equals("--to") ? d.plusDays(1) : d).atStartOfDay(ZoneOffset.UTC).toInstant();
            } catch (DateTimeParseException e) {
                throw new CommandLine.ParameterException(spec.commandLine(), option + " needs a date as yyyy-mm-dd, "
                        + "got '" + text + "'");
            }
        }
    }

    @Command(name = "show", mixinStandardHelpOptions = true, header = "Show one archived record and its audit trail.")
    static final class Show extends Common implements Callable<Integer> {
        @Parameters(paramLabel = "ID", description = "The record's id (see 'archive list').")
        long id;

        @Override
        public Integer call() {
            try (ChangeRecordArchive a = open()) {
                ArchiveUseCase.Shown s = new ArchiveUseCase(a).show(id);
                StudyVersion v = s.study().version();
                if (json) {
                    ObjectNode root = versionJson(v);
                    ArrayNode events = root.putArray("events");
                    for (AuditEvent e : s.events()) {
                        ObjectNode o = events.addObject();
                        o.put("seq", e.seq());
                        o.put("kind", e.kind().name());
                        o.put("who", e.who());
                        o.put("when", e.when().toString());
                        o.put("what", e.what());
                        o.put("why", e.why());
                        o.put("hash", e.hash());
                    }
                    root.put("study", s.study().json());
                    printJson(root);
                    return ExitCodes.OK;
                }
                PrintWriter out = out();
                out.printf(Locale.ROOT, "Record %d: change %s version %d%s%n", v.id(), v.changeId(), v.version(),
                        v.isCurrent() ? " (current)" : " (superseded by id " + v.supersededBy() + ")");
                out.printf(Locale.ROOT, "  %s%n  part %s rev %s, kind %s, verdict: %s%n", v.title(), v.partNumber(),
                        v.revision(), v.changeKind(), v.verdict());
                out.printf(Locale.ROOT, "  characteristics: %s%n", String.join(", ", v.characteristics()));
                out.printf(Locale.ROOT, "  author %s, created %s, archived %s%n  study SHA-256 %s%n", v.author(),
                        v.created(), v.archivedAt(), v.jsonSha256());
                for (org.holdpoint.study.Signature sig : s.changeStudy().signatures()) {
                    out.printf(Locale.ROOT, "  signed in the record: %s %s (%s), %s, \"%s\"%n",
                            sig.stage() == null ? "" : sig.stage().words(), sig.name(), sig.role(), sig.timestamp(),
                            sig.meaning());
                }
                for (ArchivedSignature sig : v.signatures()) {
                    out.printf(Locale.ROOT, "  signed in the archive: %s (%s), %s, \"%s\"%n", sig.signer(), sig.role(),
                            sig.signedAt(), sig.meaning());
                }
                out.println("  Audit trail:");
                for (AuditEvent e : s.events()) {
                    out.printf(Locale.ROOT, "    #%d %s %s by %s: %s%s%n", e.seq(), e.when(), e.kind(), e.who(),
                            e.what(), e.why() == null ? "" : " (why: " + e.why() + ")");
                }
                out.flush();
                return ExitCodes.OK;
            } catch (ArchiveException e) {
                return fail(e);
            }
        }
    }

    @Command(name = "sign", mixinStandardHelpOptions = true, header = "Sign the current version of a record.")
    static final class Sign extends Common implements Callable<Integer> {
        @Parameters(paramLabel = "ID", description = "The record's id.")
        long id;
        @Option(names = "--signed-by", required = true, paramLabel = "NAME", description = "Printed name.")
        String signer;
        @Option(names = "--role", required = true, paramLabel = "ROLE", description = "Role, e.g. quality manager.")
        String role;
        @Option(names = "--stage", paramLabel = "STAGE", defaultValue = "approved", description = "prepared, "
                + "reviewed or approved (default: ${DEFAULT-VALUE}); shown in the exported workbook's sign-off block.")
        String stage = "approved";

        private org.holdpoint.study.Signature.Stage parseStage() {
            org.holdpoint.study.Signature.Stage st = org.holdpoint.study.Signature.Stage.parse(stage);
            if (st == null) {
                throw new UserInputException("--stage must be prepared, reviewed or approved, got '%s'", stage);
            }
            return st;
        }

        @Option(names = "--meaning", required = true, paramLabel = "TEXT", description = "What the signature means, "
                + "e.g. 'approved for production'.")
        String meaning;

        @Override
        public Integer call() {
            try (ChangeRecordArchive a = open()) {
                ArchivedSignature s = new ArchiveUseCase(a).sign(id, signer, role, ArchiveUseCase.stageMeaning(
                        parseStage(), meaning));
                out().printf(Locale.ROOT, "Signed record %d: %s (%s), %s%n", id, s.signer(), s.role(), s.signedAt());
                out().flush();
                return ExitCodes.OK;
            } catch (ArchiveException e) {
                return fail(e);
            }
        }
    }

    @Command(name = "export", mixinStandardHelpOptions = true, header = "Write the sign-off workbook of an archived "
            + "record, re-computed from its stored raw data.")
    static final class Export extends Common implements Callable<Integer> {
        @Parameters(paramLabel = "ID", description = "The record's id.")
        long id;
        @Option(names = "--report", required = true, paramLabel = "FILE.xlsx", description = "The workbook to write.")
        Path report;
        @Option(names = "--overwrite", description = "Replace an existing file.")
        boolean overwrite;

        @Override
        public Integer call() {
            try (ChangeRecordArchive a = open()) {
                var written = new ArchiveUseCase(a).export(id, report, overwrite);
                out().printf(Locale.ROOT, "Wrote %s for record %d (record SHA-256 %s)%n", written.file(), id,
                        written.sha256());
                out().flush();
                return ExitCodes.OK;
            } catch (ArchiveException e) {
                return fail(e);
            } catch (java.io.IOException e) {
                throw new UserInputException("cannot write %s (%s); check the folder, or give --overwrite to replace "
                        + "an existing file", report, e.getMessage());
            }
        }
    }

    @Command(name = "verify", mixinStandardHelpOptions = true, header = "Check that nothing in the archive was "
            + "altered: exit 0 intact, 1 altered (naming each record).")
    static final class Verify extends Common implements Callable<Integer> {
        @Override
        public Integer call() {
            try (ChangeRecordArchive a = open()) {
                VerificationReport r = new ArchiveUseCase(a).verify();
                if (json) {
                    ObjectNode root = JsonNodeFactory.instance.objectNode();
                    root.put("intact", r.intact());
                    root.put("eventsChecked", r.eventsChecked());
                    root.put("studiesChecked", r.studiesChecked());
                    root.put("headHash", r.headHash());
                    ArrayNode p = root.putArray("problems");
                    r.problems().forEach(x -> p.addObject().put("record", x.record()).put("detail", x.detail()));
                    printJson(root);
                } else {
                    out().printf(Locale.ROOT, "%s: %d audit entries, %d studies, %d signatures checked; head hash %s%n",
                            r.intact() ? "INTACT" : "ALTERED", r.eventsChecked(), r.studiesChecked(),
                            r.signaturesChecked(), r.headHash());
                    r.problems().forEach(x -> out().println("  - " + x.record() + ": " + x.detail()));
                    out().flush();
                }
                return r.intact() ? ExitCodes.OK : ExitCodes.ALTERED;
            } catch (ArchiveException e) {
                return fail(e);
            }
        }
    }

    static ObjectNode versionJson(StudyVersion v) {
        ObjectNode o = JsonNodeFactory.instance.objectNode();
        o.put("id", v.id());
        o.put("changeId", v.changeId());
        o.put("version", v.version());
        if (v.supersedes() == null) {
            o.putNull("supersedes");
        } else {
            o.put("supersedes", v.supersedes());
        }
        o.put("title", v.title());
        o.put("kind", v.changeKind());
        o.put("partNumber", v.partNumber());
        o.put("revision", v.revision());
        ArrayNode c = o.putArray("characteristics");
        v.characteristics().forEach(c::add);
        o.put("verdict", v.verdict());
        o.put("author", v.author());
        o.put("created", v.created().toString());
        o.put("archivedAt", v.archivedAt().toString());
        o.put("sha256", v.jsonSha256());
        ArrayNode d = o.putArray("documentSigners");
        v.documentSigners().forEach(d::add);
        ArrayNode s = o.putArray("signatures");
        for (ArchivedSignature sig : v.signatures()) {
            ObjectNode x = s.addObject();
            x.put("signer", sig.signer());
            x.put("role", sig.role());
            x.put("meaning", sig.meaning());
            x.put("signedAt", sig.signedAt().toString());
        }
        return o;
    }
}
