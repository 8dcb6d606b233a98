package org.holdpoint.cli;

import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;

import org.holdpoint.workflow.VerifyResult;
import org.holdpoint.workflow.VerifyUseCase;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code holdpoint verify}: check that a sign-off workbook still matches its embedded record. */
@Command(name = "verify", mixinStandardHelpOptions = true, usageHelpAutoWidth = true,
        header = "Check that a sign-off workbook was not edited since it was written.",
        description = {"Reads the study record embedded in FILE.xlsx, checks its SHA-256 (and its Ed25519 "
                + "signature, when signed), re-computes every result from the embedded raw data with this version, "
                + "and compares each value shown on the visible sheets with the re-computation. Lists every "
                + "difference with its sheet and cell. The file is only read, never changed."},
        footer = {"", "Exit codes: 0 intact, 1 edited (every difference listed; with --key also a workbook not "
                + "signed with that key), 2 not a Holdpoint sign-off workbook, unreadable, or a key file that is not "
                + "an Ed25519 public key."})
final class VerifyCommand implements Callable<Integer> {
    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE.xlsx", description = "The sign-off workbook.")
    Path file;

    @Option(names = "--key", paramLabel = "PUB.pem", description = "The public key the record must be signed with "
            + "(X.509 PEM); without it, verify says which key signed.")
    Path key;

    @Option(names = "--template", paramLabel = "TEMPLATE.xlsx", description = "The template the workbook was "
            + "filled from, when it is not the default one: its own labels, sheets and names are then compared too.")
    Path template;

    @Override
    public Integer call() {
        VerifyResult r = new VerifyUseCase().verify(file, key, template, new ConsoleProgress(spec.commandLine().getErr(),
                false));
        PrintWriter out = spec.commandLine().getOut();
        out.printf(Locale.ROOT, "Sign-off workbook %s%n", file);
        out.printf(Locale.ROOT, "  change      %s%n", r.changeId() == null ? "(record unreadable)" : r.changeId());
        out.printf(Locale.ROOT, "  record      SHA-256 %s (%s)%n", r.sha256(), r.hashMatches()
                ? "matches the stored hash" : "DOES NOT match the stored hash");
        out.printf(Locale.ROOT, "  signature   %s%n", seal(r));
        if (r.signOff().isEmpty()) {
            out.println("  sign-off    none yet");
        }
        for (int i = 0; i < r.signOff().size(); i++) {
            out.printf(Locale.ROOT, "  %s %s%n", i == 0 ? "sign-off   " : "           ", r.signOff().get(i));
        }
        if (r.status() == VerifyResult.Status.INTACT) {
            out.println("INTACT: every shown value matches the re-computation from the embedded raw data.");
        } else {
            out.printf(Locale.ROOT, "EDITED: %d difference%s found:%n", r.differences().size(),
                    r.differences().size() == 1 ? "" : "s");
            for (VerifyResult.Difference d : r.differences()) {
                out.println("  - " + d.describe());
            }
        }
        if (!r.handEntries().isEmpty()) {
            out.println("Typed into the sign-off block after the workbook was written (not part of the record):");
            r.handEntries().forEach(h -> out.println("  - " + h));
        }
        r.notes().forEach(n -> out.println("Note: " + n));
        out.flush();
        return r.status() == VerifyResult.Status.INTACT ? ExitCodes.OK : ExitCodes.ALTERED;
    }

    private static String seal(VerifyResult r) {
        return switch (r.seal()) {
            case UNSIGNED -> "none (the record was not signed with a key)";
            case MISSING -> "NONE: the record is not signed with the expected key";
            case VALID -> "valid Ed25519 signature by key SHA-256 " + r.keyFingerprint();
            case OTHER_KEY -> "valid, but by key SHA-256 " + r.keyFingerprint() + ", NOT the key given";
            case INVALID -> "INVALID: the signature does not match the record";
        };
    }
}
