package dev.morse.cli;

import dev.morse.complex.ComplexChoice;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.pipeline.DrawOptions;
import dev.morse.pipeline.DrawingPipeline;
import dev.morse.report.Counted;
import dev.morse.report.HasseDiagramSvg;
import dev.morse.report.HasseDrawing;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code morse draw FILE}: an SVG picture of the Hasse diagram with a matching marked. */
@Command(name = "draw",
        description = {
            "Draws the Hasse diagram of a poset, or the face poset of a complex, as SVG, by rank from the bottom up,"
                    + " with matched pairs drawn thick and critical cells filled.",
            "A CW poset is drawn with the matching of its cellular complex. Any other poset is drawn with nothing"
                    + " marked, since its matching pairs chains, not elements: --complex order draws its order complex."
                    + " At most " + HasseDrawing.MAX_NODES + " nodes."
        })
final class DrawCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "A morse-poset 1 or morse-simplicial 1 file.")
    private Path file;

    @Option(names = {"-o", "--output"}, paramLabel = "OUT.svg",
            description = "Write the picture to this file and print a summary; without it the SVG goes to standard output.")
    private Path output;

    @Option(names = "--matching", paramLabel = "NAME", defaultValue = MatchingHeuristics.DEFAULT,
            converter = OptionConverters.MatchingConverter.class, completionCandidates = OptionConverters.MatchingNames.class,
            description = "Matching to mark; available: ${COMPLETION-CANDIDATES} (default ${DEFAULT-VALUE}).")
    private String matching;

    @Option(names = "--complex", paramLabel = "auto|order|cellular", defaultValue = "auto",
            converter = OptionConverters.ComplexConverter.class, completionCandidates = OptionConverters.ComplexNames.class,
            description = "For a poset: its own Hasse diagram (auto, cellular) or the face poset of its order complex (order).")
    private ComplexChoice complex;

    @Option(names = "--seed", paramLabel = "N", defaultValue = "1",
            description = "Seed of the random matching's choices (default ${DEFAULT-VALUE}).")
    private long seed;

    @Mixin
    private ProgressOption progress;

    // read by Failures through the parse result, which is where it matters
    @Option(names = "--debug", description = "Show stack traces of failures.")
    private boolean debug;

    @Option(names = {"-h", "--help"}, usageHelp = true, description = "Show this help and exit.")
    private boolean help;

    @Override
    public Integer call() throws Exception {
        HasseDrawing drawing = progress.around(spec,
                () -> DrawingPipeline.run(file, new DrawOptions(complex, matching, seed)));
        String svg = HasseDiagramSvg.toSvg(drawing);
        PrintWriter out = spec.commandLine().getOut();
        if (output == null) {
            out.print(svg);
        } else {
            OutputFiles.write(output, svg);
            out.println("wrote " + output + ": " + drawing.nodeCount() + " nodes, " + drawing.coverCount() + " covers"
                    + (drawing.marked() ? ", " + Counted.of(drawing.matchedCount(), "matched pair") + ", "
                            + drawing.criticalCount() + " critical" : ", nothing marked"));
            out.println(drawing.caption());
            if (!drawing.note().isEmpty()) {
                out.println(drawing.note());
            }
        }
        out.flush();
        return 0;
    }
}
