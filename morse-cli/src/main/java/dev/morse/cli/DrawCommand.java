package dev.morse.cli;

import dev.morse.engine.Request;
import dev.morse.report.Counted;
import dev.morse.report.HasseDiagramSvg;
import dev.morse.report.HasseDrawing;
import dev.morse.report.HasseDrawings;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code morse draw FILE}: an SVG picture of the Hasse diagram with a matching marked. */
@Command(name = "draw", mixinStandardHelpOptions = true,
        description = {
            "Draws the face poset of the complex that homology would match, as SVG, by rank from the bottom up,"
                    + " with matched pairs drawn thick and critical cells filled.",
            "A CW poset is its own face poset, drawn with the matching of its cellular complex. Any other poset is"
                    + " drawn with nothing marked, since its matching pairs chains, not elements: --complex order"
                    + " or implicit draws its order complex with the matching. At most " + HasseDrawing.MAX_NODES
                    + " nodes."
        })
final class DrawCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Mixin
    private ComputationOptions computation;

    @Option(names = {"-o", "--output"}, paramLabel = "OUT.svg",
            description = "Write the picture to this file and print a summary; without it the SVG goes to standard output.")
    private Path output;

    @Override
    public Integer call() throws Exception {
        Request request = computation.request(spec);
        HasseDrawing drawing = computation.around(spec, () -> HasseDrawings.draw(computation.read(spec), request));
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
