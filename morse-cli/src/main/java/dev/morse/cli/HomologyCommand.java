package dev.morse.cli;

import dev.morse.cycles.Cycle;
import dev.morse.cycles.RepresentativeCycles;
import dev.morse.engine.Computation;
import java.util.List;
import dev.morse.report.JsonReportWriter;
import dev.morse.report.TextReportWriter;
import java.io.PrintWriter;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** {@code morse homology FILE...}: the homology of one poset or simplicial file, image or volume. */
@Command(name = "homology", mixinStandardHelpOptions = true,
        description = {
            "Computes the exact homology of a poset or simplicial file, or of the foreground of an image or volume.",
            "A poset file (morse-poset 1) stands for its order complex, computed on the much smaller cellular"
                    + " complex when the poset is a CW poset, else on the poset shrunk by beat points and acyclic"
                    + " links; a simplicial file (morse-simplicial 1) stands for all faces of its listed faces.",
            "An image (PBM, PGM, PPM, PNG, GIF, BMP, JPEG) stands for the cubical complex of its pixels at or above"
                    + " the threshold; several images, or a directory of them, are the slices of a volume; a raw"
                    + " byte volume needs --dims. Images are told by their first bytes."
        })
final class HomologyCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Mixin
    private ComputationOptions computation;

    @Mixin
    private JsonOption output;

    @Option(names = "--cycles", description = "Also give one representative cycle per generator of each homology"
            + " group, in the input's labels, each checked to be a cycle before it is printed.")
    private boolean cycles;

    @Override
    public Integer call() throws Exception {
        Computation result = computation.compute(spec);
        List<Cycle> found = cycles ? RepresentativeCycles.of(result) : List.of();
        PrintWriter out = spec.commandLine().getOut();
        out.print(output.json() ? JsonReportWriter.toJson(result, found) : TextReportWriter.toText(result, found));
        out.flush();
        return 0;
    }
}
