package org.holdpoint.cli;

import static org.assertj.core.api.Assertions.assertThat;

import java.io.PrintWriter;
import java.io.StringWriter;
import org.holdpoint.workflow.ArchiveAccess;
import org.holdpoint.workflow.WindowLauncher;
import org.junit.jupiter.api.Test;
import picocli.CommandLine;

/**
 * A run that names its subcommand builds only that one (a faster start); help, the usage, a mistyped name and the
 * version still see every subcommand, and a subcommand's own help reads the same either way.
 */
class SubcommandsBuiltTest {
    private static CommandLine built(String... args) {
        return HoldpointCommand.create(WindowLauncher.NONE, ArchiveAccess.none(), args);
    }

    private static String out(CommandLine cl, String... args) {
        StringWriter out = new StringWriter();
        cl.setOut(new PrintWriter(out, true));
        cl.setErr(new PrintWriter(out, true));
        cl.execute(args);
        return out.toString();
    }

    @Test
    void onlyTheNamedSubcommandIsBuilt() {
        assertThat(built("analyze", "data.xlsx").getSubcommands().keySet()).containsExactly("analyze");
        assertThat(built("archive", "list").getSubcommands().keySet()).containsExactly("archive");
        assertThat(built("archive", "list").getSubcommands().get("archive").getSubcommands().keySet())
                .contains("add", "list", "show", "sign");
        assertThat(built("gui").getSubcommands().keySet()).containsExactly("gui");
    }

    @Test
    void helpUsageVersionAndMistypedNamesSeeEverySubcommand() {
        String[] all = {"analyze", "plan", "demo", "verify", "sign", "archive", "keygen", "help", "gui"};
        for (String[] args : new String[][] {{}, {"--help"}, {"-V"}, {"help", "plan"}, {"analyse", "x.csv"}}) {
            assertThat(built(args).getSubcommands().keySet()).as(String.join(" ", args)).containsExactly(all);
        }
        assertThat(out(built("analyse", "x.csv"), "analyse", "x.csv")).contains("Did you mean: holdpoint analyze");
        assertThat(out(built("help", "plan"), "help", "plan")).contains("Usage: holdpoint plan");
    }

    @Test
    void aSubcommandsHelpReadsTheSameBuiltAloneOrWithTheOthers() {
        for (String name : new String[] {"analyze", "plan", "verify", "archive"}) {
            assertThat(out(built(name, "--help"), name, "--help")).as(name)
                    .isEqualTo(out(HoldpointCommand.create(WindowLauncher.NONE, ArchiveAccess.none()), name, "--help"))
                    .contains("Usage: holdpoint " + name);
        }
    }
}
