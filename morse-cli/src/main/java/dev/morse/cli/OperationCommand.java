package dev.morse.cli;

import dev.morse.complex.Subdivision;
import dev.morse.generate.Generated;
import dev.morse.poset.PosetOperations;
import dev.morse.io.InputException;
import dev.morse.io.InputFiles;
import dev.morse.poset.Poset;
import java.io.IOException;
import java.nio.file.Path;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Parameters;
import java.util.function.Supplier;
import java.util.function.UnaryOperator;

/**
 * {@code morse op OPERATION POSET... -o FILE}: builds a new poset from poset files. Each operation
 * is one subcommand method; the mathematics is in {@link PosetOperations}.
 */
@Command(name = "op", mixinStandardHelpOptions = true,
        description = "Builds a new poset file from poset files: product, ordinal sum, dual, intervals, proper part,"
                + " rank selection, or the face poset of the order complex.",
        synopsisSubcommandLabel = "OPERATION",
        footer = "%nExample: morse op product circle.poset circle.poset -o torus.poset")
final class OperationCommand extends CommandGroup {
    private static final String POSET = "A poset file (morse-poset 1).";

    OperationCommand() {
        super("an operation");
    }

    @Command(name = "product", mixinStandardHelpOptions = true, description = "The product P x Q, ordered componentwise; its order complex is"
            + " homeomorphic to the product of theirs (Walker 1988).")
    int product(@Parameters(index = "0", paramLabel = "P", description = POSET) Path p,
            @Parameters(index = "1", paramLabel = "Q", description = POSET) Path q,
            @Mixin OutputFile output) throws IOException {
        Poset left = InputFiles.readPoset(p);
        Poset right = InputFiles.readPoset(q);
        Poset made = checked(p, () -> PosetOperations.product(left, right));
        return output.write(() -> new Generated.OfPoset(made, "the product of " + p + " and " + q));
    }

    @Command(name = "sum", mixinStandardHelpOptions = true, description = "The ordinal sum P + Q: every element of P below every element of Q; its"
            + " order complex is the join of theirs. Labels the two share get the prefixes 'a.' and 'b.'.")
    int sum(@Parameters(index = "0", paramLabel = "P", description = "The lower poset file.") Path p,
            @Parameters(index = "1", paramLabel = "Q", description = "The upper poset file.") Path q,
            @Mixin OutputFile output) throws IOException {
        Poset lower = InputFiles.readPoset(p);
        Poset upper = InputFiles.readPoset(q);
        Poset made = checked(p, () -> PosetOperations.ordinalSumKeepingLabelsApart(lower, upper));
        return output.write(() -> new Generated.OfPoset(made, "the ordinal sum of " + p + " below " + q));
    }

    @Command(name = "dual", mixinStandardHelpOptions = true, description = "The dual poset: the order reversed; the order complex is the same.")
    int dual(@Parameters(paramLabel = "P", description = POSET) Path p, @Mixin OutputFile output) throws IOException {
        return applied(p, output, "the dual of " + p, PosetOperations::dual);
    }

    @Command(name = "proper-part", mixinStandardHelpOptions = true, description = "The poset without its least and greatest elements.")
    int properPart(@Parameters(paramLabel = "P", description = POSET) Path p, @Mixin OutputFile output)
            throws IOException {
        return applied(p, output, "the proper part of " + p, PosetOperations::properPart);
    }

    @Command(name = "closed-interval", mixinStandardHelpOptions = true, description = "The closed interval [X, Y] = {z : X <= z <= Y}.")
    int closedInterval(@Parameters(index = "0", paramLabel = "P", description = POSET) Path p,
            @Parameters(index = "1", paramLabel = "X", description = "The label of the bottom.") String x,
            @Parameters(index = "2", paramLabel = "Y", description = "The label of the top.") String y,
            @Mixin OutputFile output) throws IOException {
        return applied(p, output, "the closed interval [" + x + ", " + y + "] of " + p, poset -> PosetOperations
                .closedInterval(poset, PosetOperations.element(poset, x), PosetOperations.element(poset, y)));
    }

    @Command(name = "open-interval", mixinStandardHelpOptions = true, description = "The open interval (X, Y) = {z : X < z < Y}.")
    int openInterval(@Parameters(index = "0", paramLabel = "P", description = POSET) Path p,
            @Parameters(index = "1", paramLabel = "X", description = "The label of the element below.") String x,
            @Parameters(index = "2", paramLabel = "Y", description = "The label of the element above.") String y,
            @Mixin OutputFile output) throws IOException {
        return applied(p, output, "the open interval (" + x + ", " + y + ") of " + p, poset -> PosetOperations
                .openInterval(poset, PosetOperations.element(poset, x), PosetOperations.element(poset, y)));
    }

    @Command(name = "rank-select", mixinStandardHelpOptions = true, description = "The elements whose rank lies in RANKS (minimal elements have"
            + " rank 0), with the order of P.")
    int rankSelect(@Parameters(index = "0", paramLabel = "P", description = POSET) Path p,
            @Parameters(index = "1", paramLabel = "RANKS", description = "Ranks like 1,3 or 1-3 or 0,2-4.",
                    converter = OptionConverters.RanksConverter.class) OptionConverters.Ranks ranks,
            @Mixin OutputFile output) throws IOException {
        return applied(p, output, "the elements of ranks " + ranks + " of " + p,
                poset -> PosetOperations.rankSelection(poset, ranks.values()));
    }

    @Command(name = "subdivide", mixinStandardHelpOptions = true, description = "The face poset of the order complex: the chains of P ordered by"
            + " inclusion; its order complex is the barycentric subdivision of that of P.")
    int subdivide(@Parameters(paramLabel = "P", description = POSET) Path p, @Mixin OutputFile output)
            throws IOException {
        return applied(p, output, "the chains of " + p + " ordered by inclusion", Subdivision::of);
    }

    /** Reads the poset file {@code p}, applies {@code operation} and writes the result with its description. */
    private static int applied(Path p, OutputFile output, String description, UnaryOperator<Poset> operation)
            throws IOException {
        Poset poset = InputFiles.readPoset(p);
        Poset made = checked(p, () -> operation.apply(poset));
        return output.write(() -> new Generated.OfPoset(made, description));
    }

    /** Runs an operation, turning its refusal of the inputs into an input error on {@code source}, the first input. */
    private static Poset checked(Path source, Supplier<Poset> operation) {
        try {
            return operation.get();
        } catch (IllegalArgumentException e) {
            throw new InputException(source.toString(), InputException.NO_LINE, e.getMessage());
        }
    }
}
