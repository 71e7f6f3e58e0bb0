package org.ventcase.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.util.ArrayList;
import java.util.List;

import org.junit.jupiter.api.Test;

import picocli.CommandLine;

/**
 * A short command builds only its own sub-command (Main.commandLine): the list of sub-commands must
 * stay the same as the full command's, and each sub-command's help must read the same either way.
 * Invariant of the project's own code, no external values.
 */
class OneCommandLineTest {

    @Test
    void everySubCommandIsBuiltAloneWithTheSameHelp() {
        CommandLine full = new CommandLine(new Main());
        List<String> names = new ArrayList<>(full.getSubcommands().keySet());
        names.remove("help");
        List<String> alone = new ArrayList<>();
        for (String name : names) {
            CommandLine one = Main.commandLine(name, "--help");
            CommandLine sub = one.getSubcommands().get(name);
            if (sub == null || one.getSubcommands().size() != 1) {
                continue;
            }
            alone.add(name);
            assertEquals(full.getSubcommands().get(name).getCommandSpec().userObject().getClass(),
                    sub.getCommandSpec().userObject().getClass(), name);
            assertEquals(full.getSubcommands().get(name).getUsageMessage(CommandLine.Help.Ansi.OFF),
                    sub.getUsageMessage(CommandLine.Help.Ansi.OFF), name + " --help");
            assertEquals("ventcase " + name, sub.getCommandSpec().qualifiedName());
        }
        assertEquals(names, alone, "every sub-command of the full command is built alone");
    }

    @Test
    void unknownOrMissingSubCommandUsesTheFullCommand() {
        assertEquals(new CommandLine(new Main()).getSubcommands().keySet(),
                Main.commandLine("nonsense").getSubcommands().keySet());
        assertEquals(new CommandLine(new Main()).getSubcommands().keySet(),
                Main.commandLine().getSubcommands().keySet());
    }
}
