package dev.morse.cli;

import picocli.CommandLine.Option;

/** {@code --json}: one JSON object on standard output instead of a table. */
final class JsonOption {
    @Option(names = "--json", description = "Print one JSON object instead of a table.")
    private boolean json;

    /** Whether JSON was asked for. */
    boolean json() {
        return json;
    }
}
