package dev.morse.cli;

import dev.morse.engine.Request;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;

/**
 * The options that make a {@link Request}: the engine, the one matching and how to run it. Shared
 * by the commands that compute one input ({@link ComputationOptions}) and by {@code batch}, which
 * computes many with the same request.
 */
final class RequestOptions {
    @Mixin
    private EngineOptions engine;

    @Mixin
    private MatchingChoice matching;

    @Mixin
    private MatchingRuns runs;

    /** The request the options make; see {@link EngineOptions#request}. */
    Request request(CommandSpec spec) {
        return engine.request(spec, runs, matching.name());
    }

    /** The matching named by {@code --matching}. */
    String matchingName() {
        return matching.name();
    }

    /** The number of trials asked for by {@code --trials}. */
    int trials() {
        return runs.trials();
    }
}
