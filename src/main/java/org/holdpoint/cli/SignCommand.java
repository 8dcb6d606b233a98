package org.holdpoint.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.holdpoint.study.Signature;
import org.holdpoint.workflow.SignUseCase;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code holdpoint sign}: add a later sign-off stage to a sign-off workbook, without analysing again. */
@Command(name = "sign", mixinStandardHelpOptions = true, usageHelpAutoWidth = true,
        header = "Add a sign-off stage (reviewed, approved) to a sign-off workbook.",
        description = {"Verifies FILE.xlsx, then writes --out NEW.xlsx with the same record (the same SHA-256 "
                + "and, when it was sealed, the same Ed25519 signature) and one more sign-off entry, which names the "
                + "record it signs. FILE.xlsx is only read. A workbook that was edited is refused."},
        footer = {"", "Exit codes: 0 signed, 2 the workbook was edited or cannot be read, or bad options."})
final class SignCommand implements Callable<Integer> {
    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE.xlsx", description = "The sign-off workbook to sign.")
    Path file;

    @Option(names = "--out", required = true, paramLabel = "NEW.xlsx", description = "The new workbook.")
    Path out;

    @Option(names = "--stage", required = true, paramLabel = "STAGE", description = "prepared, reviewed or "
            + "approved.")
    String stage;

    @Option(names = "--signed-by", required = true, paramLabel = "NAME", description = "Printed name of the signer.")
    String signedBy;

    @Option(names = "--role", paramLabel = "ROLE", description = "Role or title of the signer.")
    String role;

    @Option(names = "--meaning", paramLabel = "TEXT", description = "Meaning of the signature, e.g. \"approved "
            + "for production\".")
    String meaning;

    @Option(names = "--template", paramLabel = "TEMPLATE.xlsx", description = "The template the workbook was "
            + "filled from, when it is not the default one.")
    Path template;

    @Option(names = "--overwrite", description = "Replace NEW.xlsx if it exists.")
    boolean overwrite;

    @Override
    public Integer call() throws IOException {
        Signature.Stage st = Signature.Stage.parse(stage);
        if (st == null) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--stage must be prepared, reviewed or "
                    + "approved, got '" + stage + "'");
        }
        if (signedBy.isBlank()) {
            throw new CommandLine.ParameterException(spec.commandLine(), "--signed-by needs the signer's name");
        }
        new OutputGuard().input("the workbook to sign", file).input("the template", template).output("--out", out)
                .check(overwrite);
        SignUseCase.Signed s = new SignUseCase().sign(file, out, new Signature(st, signedBy.strip(), role, meaning,
                null), template, overwrite);
        PrintWriter w = spec.commandLine().getOut();
        w.printf(Locale.ROOT, "Wrote the sign-off workbook %s%n  record SHA-256 %s (unchanged)%n", out,
                s.written().sha256());
        for (Signature g : s.signatures()) {
            w.printf(Locale.ROOT, "  %-9s %s%s, %s%n", g.stage().words(), g.name(), g.role() == null ? ""
                    : " (" + g.role() + ")", g.timestamp());
        }
        w.flush();
        return ExitCodes.OK;
    }
}
