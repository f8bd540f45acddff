package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.util.Set;
import org.junit.jupiter.api.Test;

class CompletionCommandTest {
    @Test
    void theScriptCompletesEverySubcommand() {
        CliRun run = CliRun.morse("completion");
        assertEquals(0, run.code(), run.err());
        String script = run.out();
        Set<String> subcommands = MorseCommand.newCommandLine().getSubcommands().keySet();
        assertTrue(subcommands.size() >= 12, subcommands.toString());
        // the top-level function offers exactly the subcommands, in the order of the help
        assertTrue(script.contains("local commands=\"" + String.join(" ", subcommands) + "\""),
                "the script does not complete every subcommand of " + subcommands);
        // the function bash calls, registered for the command
        assertTrue(script.contains("complete -F _complete_morse"), "no completion function is registered");
        assertTrue(script.contains("--format"), "draw's options are completed too");
    }
}
