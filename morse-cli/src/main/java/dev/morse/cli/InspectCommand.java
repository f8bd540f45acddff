package dev.morse.cli;

import dev.morse.input.Input;
import dev.morse.io.InputException;
import dev.morse.report.InspectionJsonWriter;
import dev.morse.report.InspectionTextWriter;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** {@code morse inspect FILE}: what a poset, simplicial complex or image is, apart from its homology. */
@Command(name = "inspect", mixinStandardHelpOptions = true,
        description = {
            "Describes a poset, simplicial file or image without computing homology.",
            "A poset: elements, covers, ranks, whether it is graded, thin and a CW poset (and if not, why not), the"
                    + " chains of its order complex per dimension, the Euler characteristic, and the Moebius function of"
                    + " the poset with a bottom and a top adjoined, checked against Philip Hall's theorem.",
            "A simplicial complex: vertices, dimension, f-vector, facets and Euler characteristic.",
            "An image or volume: its size, the foreground, the cells of its cubical complex and their Euler"
                    + " characteristic."
        })
final class InspectCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Mixin
    private InputOptions input;

    @Mixin
    private ReportOptions shown;

    @Override
    public Integer call() throws Exception {
        String text = shown.around(spec, () -> {
            Input read = input.read(spec);
            try {
                return shown.json() ? InspectionJsonWriter.toJson(read) : InspectionTextWriter.toText(read);
            } catch (IllegalStateException e) {
                // the complexes refuse to build past their cell limits with this exception, before allocating
                throw new InputException(read.source(), InputException.NO_LINE, "too large to compute: " + e.getMessage());
            }
        });
        return ReportOptions.print(spec, text);
    }
}
