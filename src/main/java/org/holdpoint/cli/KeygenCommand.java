package org.holdpoint.cli;

import java.io.IOException;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import org.holdpoint.workflow.RecordSigning;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code holdpoint keygen}: create an Ed25519 key pair for signing sign-off records. */
@Command(name = "keygen", mixinStandardHelpOptions = true, usageHelpAutoWidth = true,
        header = "Create an Ed25519 key pair for signing the record of a sign-off workbook.",
        description = {"Writes NAME.key (the private key, PKCS#8 PEM: keep it to yourself) and NAME.pub (the "
                + "public key, X.509 PEM: give it to whoever verifies), and prints the key's fingerprint. Use them "
                + "with 'analyze --report ... --sign-key NAME.key --sign-public-key NAME.pub'."})
final class KeygenCommand implements Callable<Integer> {
    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Option(names = "--out", paramLabel = "NAME", required = true, description = "Path and name of the key files, "
            + "without extension.")
    Path out;

    @Override
    public Integer call() {
        Path priv = Path.of(out + ".key");
        Path pub = Path.of(out + ".pub");
        try {
            String fp = RecordSigning.generate(priv, pub);
            spec.commandLine().getOut().printf("Wrote %s and %s%nKey fingerprint SHA-256 %s%n", priv, pub, fp);
            spec.commandLine().getOut().flush();
        } catch (IOException e) {
            throw new UserInputException("cannot write the key files %s / %s (%s); they must not exist yet", priv, pub,
                    e.getMessage());
        }
        return ExitCodes.OK;
    }
}
