package dev.morse.cli;

import dev.morse.inspect.PosetInspector;
import dev.morse.inspect.SimplicialInspector;
import dev.morse.pipeline.InputLoader;
import dev.morse.pipeline.LoadedInput;
import dev.morse.report.InspectionJsonWriter;
import dev.morse.report.InspectionTextWriter;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code morse inspect FILE}: what a poset or simplicial complex is, apart from its homology. */
@Command(name = "inspect",
        description = {
            "Describes a poset or simplicial file without computing homology.",
            "A poset: elements, covers, ranks, whether it is graded, thin and a CW poset (and if not, why not), the"
                    + " chains of its order complex per dimension, the Euler characteristic, and the Moebius function of"
                    + " the poset with a bottom and a top adjoined, checked against Philip Hall's theorem.",
            "A simplicial complex: vertices, dimension, f-vector, facets and Euler characteristic."
        })
final class InspectCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "A morse-poset 1 or morse-simplicial 1 file.")
    private Path file;

    @Option(names = "--json", description = "Print one JSON object instead of a table.")
    private boolean json;

    @Mixin
    private ProgressOption progress;

    // read by Failures through the parse result, which is where it matters
    @Option(names = "--debug", description = "Show stack traces of failures.")
    private boolean debug;

    @Option(names = {"-h", "--help"}, usageHelp = true, description = "Show this help and exit.")
    private boolean help;

    @Override
    public Integer call() throws Exception {
        String text = progress.around(spec, () -> {
            LoadedInput input = InputLoader.load(file);
            return switch (input.format()) {
                case POSET -> {
                    var summary = PosetInspector.inspect(input.poset());
                    yield json ? InspectionJsonWriter.toJson(input.source(), summary)
                            : InspectionTextWriter.toText(input.source(), summary);
                }
                case SIMPLICIAL -> {
                    var summary = SimplicialInspector.inspect(input.facets(), InputLoader.simplicialComplex(input));
                    yield json ? InspectionJsonWriter.toJson(input.source(), summary)
                            : InspectionTextWriter.toText(input.source(), summary);
                }
                case IMAGE, VOLUME -> throw new IllegalStateException("the loader reads only text formats");
            };
        });
        PrintWriter out = spec.commandLine().getOut();
        out.print(text);
        out.flush();
        return 0;
    }
}
