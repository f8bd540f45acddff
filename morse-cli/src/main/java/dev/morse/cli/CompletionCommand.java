package dev.morse.cli;

import java.io.PrintWriter;
import java.util.concurrent.Callable;
import picocli.AutoComplete;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/**
 * {@code morse completion}: prints a shell completion script for every command and option, generated
 * by picocli's {@link AutoComplete} from the same command tree that parses the arguments, so it
 * never falls behind them. The script is for bash, and for zsh after {@code bashcompinit}.
 */
@Command(name = "completion", mixinStandardHelpOptions = true,
        description = {
            "Prints a completion script for bash (and zsh, after 'autoload -U bashcompinit && bashcompinit')"
                    + " that completes subcommands, options and option values.",
            "Install: morse completion > ~/.local/share/bash-completion/completions/morse, or add"
                    + " 'source <(morse completion)' to ~/.bashrc or ~/.zshrc."
        })
final class CompletionCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Override
    public Integer call() {
        PrintWriter out = spec.commandLine().getOut();
        out.print(AutoComplete.bash("morse", spec.root().commandLine()));
        out.flush();
        return 0;
    }
}
