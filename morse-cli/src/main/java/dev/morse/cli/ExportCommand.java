package dev.morse.cli;

import dev.morse.complex.ComplexChoice;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.morsecomplex.MorseComplex;
import dev.morse.pipeline.ExportOptions;
import dev.morse.pipeline.MorseComplexExport;
import dev.morse.report.Counted;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.LinkedHashMap;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code morse export FILE -o DIR}: the Morse complex's boundary matrices as Matrix Market files. */
@Command(name = "export",
        description = {
            "Writes the boundary matrices of the Morse complex of a matching, one file per dimension d,"
                    + " boundary-d.mtx, in the Matrix Market coordinate format (1-based), with critical-d.txt naming"
                    + " the critical cells of dimension d in the order of the rows and columns."
        })
final class ExportCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Parameters(index = "0", paramLabel = "FILE", description = "A morse-poset 1 or morse-simplicial 1 file.")
    private Path file;

    @Option(names = {"-o", "--output"}, paramLabel = "DIR", required = true,
            description = "Directory to write into; created if missing.")
    private Path directory;

    @Option(names = "--matching", paramLabel = "NAME", defaultValue = MatchingHeuristics.DEFAULT,
            converter = OptionConverters.MatchingConverter.class, completionCandidates = OptionConverters.MatchingNames.class,
            description = "Matching whose Morse complex is written; available: ${COMPLETION-CANDIDATES}"
                    + " (default ${DEFAULT-VALUE}).")
    private String matching;

    @Option(names = "--complex", paramLabel = "auto|order|cellular", defaultValue = "auto",
            converter = OptionConverters.ComplexConverter.class, completionCandidates = OptionConverters.ComplexNames.class,
            description = "Complex to build from a poset, as for homology (default ${DEFAULT-VALUE}).")
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
        MorseComplexExport export = progress.around(spec,
                () -> MorseComplexExport.build(file, new ExportOptions(complex, matching, seed)));
        MorseComplex morse = export.morse();
        Map<String, String> files = new LinkedHashMap<>();
        StringBuilder summary = new StringBuilder();
        summary.append("wrote the Morse complex of ").append(export.source()).append(" (")
                .append(export.complexKind().reportName()).append(" complex, matching ").append(export.matching())
                .append(") to ").append(directory).append('\n');
        for (int d = 0; d <= morse.dimension(); d++) {
            files.put(MorseComplexExport.matrixFileName(d), export.matrixText(d));
            files.put(MorseComplexExport.cellsFileName(d), export.cellsText(d));
            int rows = d == 0 ? 0 : morse.boundary(d).rows();
            int entries = d == 0 ? 0 : morse.boundary(d).nonZeros();
            summary.append(String.format(Locale.ROOT, "  %-16s %d x %d, %s; %s: %s\n",
                    MorseComplexExport.matrixFileName(d), rows, morse.cellCount(d), Counted.of(entries, "nonzero entry", "nonzero entries"),
                    MorseComplexExport.cellsFileName(d), Counted.of(morse.cellCount(d), "critical cell")));
        }
        OutputFiles.writeAll(directory, files);
        PrintWriter out = spec.commandLine().getOut();
        out.print(summary);
        out.flush();
        return 0;
    }
}
