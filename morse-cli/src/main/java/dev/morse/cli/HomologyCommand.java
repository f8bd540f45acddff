package dev.morse.cli;

import dev.morse.complex.ComplexChoice;
import dev.morse.homology.Coefficients;
import dev.morse.implicit.ElementOrder;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.pipeline.HomologyOptions;
import dev.morse.pipeline.HomologyPipeline;
import dev.morse.report.HomologyReport;
import dev.morse.report.JsonReportWriter;
import dev.morse.report.TextReportWriter;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.List;
import java.util.Optional;
import java.util.OptionalInt;
import dev.morse.image.ImageOptions;
import dev.morse.image.VolumeSize;
import picocli.CommandLine.ParameterException;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code morse homology FILE...}: the homology of one poset or simplicial file, image or volume. */
@Command(name = "homology",
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

    @Parameters(arity = "1..*", paramLabel = "FILE",
            description = "A morse-poset 1 or morse-simplicial 1 file, an image, a directory of slices, several"
                    + " slice images in order, or a raw volume.")
    private List<Path> files;

    @Option(names = "--json", description = "Print one JSON object instead of a table.")
    private boolean json;

    @Option(names = "--complex", paramLabel = "auto|order|cellular|implicit", defaultValue = "auto",
            converter = OptionConverters.ComplexConverter.class, completionCandidates = OptionConverters.ComplexNames.class,
            description = "Complex to build from a poset: cellular when it is a CW poset, else the order complex,"
                    + " stored or with chains generated on demand when they are too many (auto, the default);"
                    + " always the stored order complex; insist on the cellular complex; or always generate the"
                    + " chains of the order complex on demand.")
    private ComplexChoice complex;

    @Option(names = "--element-order", paramLabel = "NAME", defaultValue = "down-sets",
            converter = OptionConverters.ElementOrderConverter.class,
            completionCandidates = OptionConverters.ElementOrderNames.class,
            description = "Order of covers that fixes the matching of the order complex generated on demand;"
                    + " available: ${COMPLETION-CANDIDATES} (default ${DEFAULT-VALUE}).")
    private ElementOrder elementOrder;

    @Option(names = "--max-stored-chains", paramLabel = "N", defaultValue = "1000000",
            description = "With --complex auto, a poset with more chains than this gets its order complex generated"
                    + " on demand instead of stored (default ${DEFAULT-VALUE}).")
    private long maxStoredChains;

    @Option(names = "--coefficients", paramLabel = "Z|Q|P", defaultValue = "Z",
            converter = OptionConverters.CoefficientsConverter.class,
            description = "Coefficients: the integers Z (default, with torsion), the rationals Q, or Z/P for a prime P.")
    private Coefficients coefficients;

    @Option(names = "--reduced", description = "Report reduced homology.")
    private boolean reduced;

    @Option(names = "--matching", paramLabel = "NAME", defaultValue = MatchingHeuristics.DEFAULT,
            converter = OptionConverters.MatchingConverter.class, completionCandidates = OptionConverters.MatchingNames.class,
            description = "Acyclic matching used to shrink the complex; available: ${COMPLETION-CANDIDATES}"
                    + " (default ${DEFAULT-VALUE}). 'none' computes on every cell.")
    private String matching;

    @Option(names = "--seed", paramLabel = "N", defaultValue = "1",
            description = "Seed of the random matching's choices, and of the first trial (default ${DEFAULT-VALUE}).")
    private long seed;

    @Option(names = "--trials", paramLabel = "N", defaultValue = "1",
            description = "Run the matching N times with seeds from --seed on and report how often each vector of"
                    + " critical cells occurred.")
    private int trials;

    @Option(names = "--no-verify", description = "Trust the matching without checking that it is acyclic.")
    private boolean noVerify;

    @Option(names = "--no-poset-reduction",
            description = "Build the order complex on the poset as given, without first removing beat points and"
                    + " elements with acyclic links (which keeps the homology and is on by default).")
    private boolean noPosetReduction;

    @Option(names = "--threshold", paramLabel = "T",
            description = "Image samples at or above T are the foreground (default: half the sample range, so the"
                    + " black pixels of a bitmap and samples 128..255 of an 8-bit image; 1 for raw volumes).")
    private Integer threshold;

    @Option(names = "--invert", description = "Take the samples below the threshold as the foreground.")
    private boolean invert;

    @Option(names = "--dims", paramLabel = "X,Y[,Z]", converter = OptionConverters.VolumeSizeConverter.class,
            description = "Read FILE as a raw volume of unsigned bytes with these sizes, x varying fastest.")
    private VolumeSize dims;

    @Mixin
    private ProgressOption progress;

    // read by Failures through the parse result, which is where it matters
    @Option(names = "--debug", description = "Show stack traces of failures.")
    private boolean debug;

    @Option(names = {"-h", "--help"}, usageHelp = true, description = "Show this help and exit.")
    private boolean help;

    @Override
    public Integer call() throws Exception {
        if (threshold != null && threshold < 0) {
            throw new ParameterException(spec.commandLine(), "the threshold must not be negative, not " + threshold);
        }
        ImageOptions image = new ImageOptions(threshold == null ? OptionalInt.empty() : OptionalInt.of(threshold),
                invert, Optional.ofNullable(dims));
        HomologyOptions options = new HomologyOptions(complex, coefficients, reduced, matching, seed, trials,
                !noVerify, !noPosetReduction, image, elementOrder, maxStoredChains);
        HomologyReport report = progress.around(spec, () -> HomologyPipeline.run(files, options));
        String text = json ? JsonReportWriter.toJson(report) : TextReportWriter.toText(report);
        PrintWriter out = spec.commandLine().getOut();
        out.print(text);
        out.flush();
        return 0;
    }
}
