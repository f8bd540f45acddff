package dev.morse.cli;

import dev.morse.engine.Engines;
import dev.morse.engine.Request;
import dev.morse.input.Input;
import dev.morse.input.VoxelInput;
import dev.morse.io.InputException;
import dev.morse.report.Counted;
import dev.morse.report.CycleChoice;
import dev.morse.report.HasseDiagramSvg;
import dev.morse.report.HasseDrawing;
import dev.morse.report.HasseDrawings;
import dev.morse.report.HasseGraphExport;
import dev.morse.report.ImageCycleOverlay;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.stream.Stream;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/** {@code morse draw FILE}: the Hasse diagram with a matching (and a cycle) marked, as SVG, DOT or GraphML. */
@Command(name = "draw", mixinStandardHelpOptions = true,
        description = {
            "Draws the face poset of the complex that homology would match, by rank from the bottom up,"
                    + " with matched pairs drawn thick and critical cells filled: an SVG picture, or a DOT or GraphML"
                    + " file for other graph tools.",
            "A CW poset is its own face poset, drawn with the matching of its cellular complex. Any other poset is"
                    + " drawn with nothing marked, since its matching pairs chains, not elements: --complex order"
                    + " or implicit draws its order complex with the matching. At most " + HasseDrawing.MAX_NODES
                    + " nodes.",
            "With --cycles an image is drawn instead with the cycle of each hole or tunnel over it, in its own colour."
        })
final class DrawCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Mixin
    private ComputationOptions computation;

    @Option(names = {"-o", "--output"}, paramLabel = "OUT",
            description = "Write the picture to this file and print a summary; without it the picture goes to standard output.")
    private Path output;

    @Option(names = "--format", paramLabel = "FORMAT", converter = FormatValues.class,
            completionCandidates = FormatValues.class, defaultValue = "svg",
            description = "svg (a picture, the default), dot (Graphviz) or graphml: the same nodes, covers and marks.")
    private Format format;

    @Option(names = "--cycles", description = "Mark the cells of one representative cycle (the first of the highest"
            + " dimension above 0, or the one --generator names); for an image, draw each hole's or tunnel's cycle"
            + " over the image instead.")
    private boolean cycles;

    @Option(names = "--generator", paramLabel = "D[:K]", converter = OptionConverters.CycleChoiceConverter.class,
            description = "The cycle to mark: the K-th generator (from 1, default 1) of the homology in dimension D,"
                    + " in the order homology --cycles lists them. Implies --cycles.")
    private CycleChoice generator;

    /** The kinds of file {@code draw} writes. */
    enum Format {
        SVG, DOT, GRAPHML;

        String optionName() {
            return name().toLowerCase(Locale.ROOT);
        }

        static Format parse(String text) {
            return Stream.of(values()).filter(f -> f.optionName().equals(text)).findFirst().orElseThrow(
                    () -> new IllegalArgumentException("'" + text + "' is not a format: svg, dot or graphml"));
        }
    }

    /** Reads {@code --format} and names its values. */
    static final class FormatValues extends OptionConverters.Named<Format> {
        FormatValues() {
            super(Format::parse, () -> Stream.of(Format.values()).map(Format::optionName));
        }
    }

    /** What was drawn: the file's text and the lines of the summary. */
    private record Picture(String text, String summary) {
    }

    @Override
    public Integer call() throws Exception {
        Request request = computation.request(spec);
        CycleChoice choice = generator != null ? generator : cycles ? CycleChoice.HIGHEST : null;
        Picture picture = computation.around(spec, () -> {
            Input input = computation.read(spec);
            if (choice != null && input instanceof VoxelInput) {
                if (format != Format.SVG) {
                    throw new InputException(input.source(), InputException.NO_LINE, "an image with its cycles is"
                            + " drawn as SVG only; leave out --format " + format.optionName());
                }
                ImageCycleOverlay.Overlay overlay = ImageCycleOverlay.of(Engines.compute(input, request));
                return new Picture(overlay.svg(), "\n" + overlay.caption() + "\n");
            }
            return hasse(HasseDrawings.draw(input, request, choice));
        });
        PrintWriter out = spec.commandLine().getOut();
        if (output == null) {
            out.print(picture.text());
        } else {
            OutputFiles.write(output, picture.text());
            out.print("wrote " + output + picture.summary());
        }
        out.flush();
        return 0;
    }

    private Picture hasse(HasseDrawing drawing) {
        String text = switch (format) {
            case SVG -> HasseDiagramSvg.toSvg(drawing);
            case DOT -> HasseGraphExport.toDot(drawing);
            case GRAPHML -> HasseGraphExport.toGraphml(drawing);
        };
        StringBuilder summary = new StringBuilder(": " + drawing.nodeCount() + " nodes, " + drawing.coverCount()
                + " covers" + (drawing.marked() ? ", " + Counted.of(drawing.matchedCount(), "matched pair") + ", "
                        + drawing.criticalCount() + " critical" : ", nothing marked") + "\n");
        summary.append(drawing.caption()).append('\n');
        if (drawing.hasCycle()) {
            summary.append(drawing.cycleDescription()).append('\n');
        }
        if (!drawing.note().isEmpty()) {
            summary.append(drawing.note()).append('\n');
        }
        return new Picture(text, summary.toString());
    }
}
