package dev.morse.cli;

import dev.morse.engine.Computation;
import dev.morse.morsecomplex.MorseComplex;
import dev.morse.report.Counted;
import dev.morse.report.MorseComplexExport;
import dev.morse.report.TextReportWriter;
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
import picocli.CommandLine.Spec;

/** {@code morse export FILE -o DIR}: the Morse complex's boundary matrices as Matrix Market files. */
@Command(name = "export", mixinStandardHelpOptions = true,
        description = {
            "Writes the boundary matrices of the Morse complex of a matching, one file per dimension d,"
                    + " boundary-d.mtx, in the Matrix Market coordinate format (1-based), with critical-d.txt naming"
                    + " the critical cells of dimension d in the order of the rows and columns.",
            "The complex and matching are those homology would use (the implicit engine's own matching for an order"
                    + " complex generated on demand); the summary ends with the homology, over the coefficients asked for."
        })
final class ExportCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Mixin
    private ComputationOptions computation;

    @Option(names = {"-o", "--output"}, paramLabel = "DIR", required = true,
            description = "Directory to write into; created if missing.")
    private Path directory;

    @Override
    public Integer call() throws Exception {
        Computation result = computation.compute(spec);
        MorseComplexExport export = MorseComplexExport.of(result);
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
                    MorseComplexExport.matrixFileName(d), rows, morse.cellCount(d),
                    Counted.of(entries, "nonzero entry", "nonzero entries"), MorseComplexExport.cellsFileName(d),
                    Counted.of(morse.cellCount(d), "critical cell")));
        }
        summary.append("  homology  ").append(TextReportWriter.homologyLine(result)).append('\n');
        OutputFiles.writeAll(directory, files);
        PrintWriter out = spec.commandLine().getOut();
        out.print(summary);
        out.flush();
        return 0;
    }
}
