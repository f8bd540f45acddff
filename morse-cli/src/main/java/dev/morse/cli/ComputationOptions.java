package dev.morse.cli;

import dev.morse.engine.Computation;
import dev.morse.engine.Engines;
import dev.morse.engine.Request;
import dev.morse.input.Input;
import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;

/**
 * Everything a command that runs one computation is told: the input, the engine, the one
 * matching and how to run, as {@code morse homology} takes them. Commands that draw or export the computation
 * take the very same options, so that they show what homology computed.
 */
final class ComputationOptions {
    @Mixin
    private InputOptions input;

    @Mixin
    private RequestOptions request;

    @Mixin
    private RunOptions run;

    /** Reads the input; see {@link InputOptions#read}. */
    Input read(CommandSpec spec) throws IOException {
        return input.read(spec);
    }

    /** The request the options make; see {@link RequestOptions#request}. */
    Request request(CommandSpec spec) {
        return request.request(spec);
    }

    /** Runs {@code work} with the progress line, unless {@code --quiet}. */
    <T> T around(CommandSpec spec, java.util.concurrent.Callable<T> work) throws Exception {
        return run.around(spec, work);
    }

    /** Reads the input and computes, with the progress line; warns of options that did not apply. */
    Computation compute(CommandSpec spec) throws Exception {
        Request asked = request(spec);
        Computation result = run.around(spec, () -> Engines.compute(read(spec), asked));
        List<String> warnings = new ArrayList<>(input.warnings(result.input()));
        warnings.addAll(Warnings.matchingOptions(result, request.matchingName(), request.trials()));
        Warnings.print(spec, warnings);
        return result;
    }
}
