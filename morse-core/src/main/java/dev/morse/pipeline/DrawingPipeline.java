package dev.morse.pipeline;

import dev.morse.complex.CellularComplex;
import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexChoice;
import dev.morse.cw.CwPosetCheck;
import dev.morse.cw.CwPosetVerdict;
import dev.morse.complex.OrderComplex;
import dev.morse.complex.SimplicialComplex;
import dev.morse.io.InputException;
import dev.morse.io.InputFormat;
import dev.morse.matching.Matching;
import dev.morse.matching.MatchingHeuristic;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import dev.morse.matching.MatchingVerdict;
import dev.morse.matching.MatchingVerifier;
import dev.morse.poset.Poset;
import dev.morse.report.Counted;
import dev.morse.report.HasseDrawing;
import java.io.IOException;
import java.nio.file.Path;

/**
 * Prepares a Hasse diagram picture of one input, at most {@link HasseDrawing#MAX_NODES} nodes:
 * <ul>
 * <li>a CW poset: its Hasse diagram, which is the face poset of its cellular complex, with the
 *     matching of that complex marked;
 * <li>any other poset: its Hasse diagram with nothing marked, because the matching is made on the
 *     order complex, whose cells are chains rather than elements, and no pairing of elements would
 *     mean anything; the order complex itself can be drawn instead, with its matching;
 * <li>a simplicial complex: its face poset, one node per face, with the matching marked.
 * </ul>
 * The matching is verified before it is drawn. Stateless.
 */
public final class DrawingPipeline {
    private DrawingPipeline() {
    }

    /**
     * The picture of a file.
     *
     * @throws InputException for bad input, or one with more nodes than a picture takes
     * @throws IOException when reading fails for another reason
     */
    public static HasseDrawing run(Path file, DrawOptions options) throws IOException {
        return run(InputLoader.load(file), options);
    }

    /** The picture of an input already read. */
    public static HasseDrawing run(LoadedInput input, DrawOptions options) {
        String source = input.source();
        if (input.format() == InputFormat.SIMPLICIAL) {
            if (options.complex() != ComplexChoice.AUTO) {
                throw new InputException(source, InputException.NO_LINE,
                        "a simplicial file has only its own complex; the choice of complex applies to poset files");
            }
            SimplicialComplex complex = limited(source, "faces", () -> SimplicialComplex.of(input.facets(),
                    HasseDrawing.MAX_NODES));
            return marked(source, complex, "face poset of the simplicial complex", options);
        }
        Poset poset = input.poset();
        if (options.complex() == ComplexChoice.ORDER) {
            OrderComplex complex = limited(source, "chains", () -> OrderComplex.of(poset, HasseDrawing.MAX_NODES));
            return marked(source, complex, "face poset of the order complex, one node per chain", options);
        }
        if (poset.size() > HasseDrawing.MAX_NODES) {
            throw tooMany(source, poset.size() + " elements");
        }
        CwPosetVerdict verdict = CwPosetCheck.check(poset);
        if (verdict.isCwPoset()) {
            return marked(source, CwPosetCheck.cellularComplex(poset), "Hasse diagram of a CW poset, its cellular complex", options);
        }
        if (options.complex() == ComplexChoice.CELLULAR) {
            throw new InputException(source, InputException.NO_LINE,
                    "the cellular complex needs a CW poset, and this is not one: " + verdict.reason());
        }
        return HasseDrawing.ofPoset(poset, source + ": Hasse diagram of a poset that is not a CW poset; nothing marked",
                "Not a CW poset: " + verdict.reason() + ". Its matching is made on the order complex, whose cells are"
                        + " chains, not elements, so no pair of elements here is matched; the order complex can be drawn"
                        + " instead.");
    }

    private static HasseDrawing marked(String source, ChainComplex complex, String what, DrawOptions options) {
        MatchingHeuristic heuristic = MatchingHeuristics.byName(options.matching()).orElseThrow();
        Matching matching = heuristic.match(complex, new MatchingOptions(options.seed()));
        MatchingVerdict verdict = MatchingVerifier.verify(complex, matching);
        if (!verdict.valid()) {
            throw new IllegalStateException("heuristic " + heuristic.name() + " produced an invalid matching: "
                    + verdict.defect());
        }
        int critical = 0;
        for (int m : matching.criticalCounts(complex)) {
            critical += m;
        }
        return HasseDrawing.ofComplex(complex, matching, source + ": " + what + "; matching " + heuristic.name() + ", "
                + Counted.of(matching.pairCount(), "pair") + ", " + critical + " critical");
    }

    /** Builds a complex with a cell limit; the complexes signal going past it by IllegalStateException. */
    private static <T> T limited(String source, String what, java.util.function.Supplier<T> build) {
        try {
            return build.get();
        } catch (IllegalStateException e) {
            throw tooMany(source, "more " + what + " than that");
        }
    }

    private static InputException tooMany(String source, String found) {
        return new InputException(source, InputException.NO_LINE, "too large to draw: a picture takes at most "
                + HasseDrawing.MAX_NODES + " nodes, and this has " + found);
    }
}
