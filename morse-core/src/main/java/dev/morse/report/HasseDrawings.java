package dev.morse.report;

import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexChoice;
import dev.morse.complex.OrderComplex;
import dev.morse.cw.CwPosetCheck;
import dev.morse.cw.CwPosetVerdict;
import dev.morse.engine.Computation;
import dev.morse.engine.Engines;
import dev.morse.engine.Request;
import dev.morse.implicit.ImplicitMatchingWritten;
import dev.morse.input.FacetInput;
import dev.morse.input.Input;
import dev.morse.input.PosetInput;
import dev.morse.io.InputException;
import dev.morse.matching.Matching;
import dev.morse.matching.MatchingVerdict;
import dev.morse.matching.MatchingVerifier;
import dev.morse.poset.Poset;

/**
 * Hasse diagram pictures of one input, at most {@link HasseDrawing#MAX_NODES} nodes: the face poset
 * of the complex a computation matched, with its matching marked. That is the Hasse diagram itself
 * for a CW poset (its cellular complex), the face poset of a simplicial or cubical complex, and for
 * {@code --complex order} or {@code implicit} the face poset of the order complex, one node per chain,
 * with the stored heuristic's or the implicit engine's matching. A poset that is not a CW poset
 * under {@code auto} is drawn as its own Hasse diagram with nothing marked, since its matching pairs
 * chains, not elements. Posets are drawn as given, without the poset reduction. Stateless.
 */
public final class HasseDrawings {
    private HasseDrawings() {
    }

    /**
     * Computes what the picture needs, refusing before any work an input with more nodes than a
     * picture takes, and draws it.
     *
     * @throws InputException for an input too large to draw, or a request that does not apply to it
     */
    public static HasseDrawing draw(Input input, Request request) {
        // a picture shows the input's own complex, so the poset is not shrunk first
        Request small = request.withMaxStoredCells(HasseDrawing.MAX_NODES).withPosetReduction(false);
        if (input instanceof PosetInput posetInput && request.complex() != ComplexChoice.ORDER
                && request.complex() != ComplexChoice.IMPLICIT) {
            Poset poset = posetInput.poset();
            if (poset.size() > HasseDrawing.MAX_NODES) {
                throw tooMany(input.source(), poset.size() + " elements");
            }
            if (request.complex() == ComplexChoice.AUTO) {
                CwPosetVerdict verdict = CwPosetCheck.check(poset);
                if (!verdict.isCwPoset()) {
                    return HasseDrawing.ofPoset(poset, input.source() + ": Hasse diagram of a poset that is not a CW"
                            + " poset; nothing marked", "Not a CW poset: " + verdict.reason() + ". Its matching is made"
                            + " on the order complex, whose cells are chains, not elements, so no pair of elements here"
                            + " is matched; the order complex can be drawn instead.");
                }
            }
        }
        Computation run;
        try {
            run = Engines.compute(input, small);
        } catch (InputException e) {
            if (e.problem().startsWith("too large to compute")) {
                throw tooMany(input.source(), "more " + (input instanceof PosetInput ? "chains"
                        : input instanceof FacetInput ? "faces" : "cells") + " than that");
            }
            throw e;
        }
        return of(run);
    }

    /**
     * The picture of a computation: the face poset of its complex with its matching marked.
     *
     * @throws InputException when the complex has more nodes than a picture takes
     */
    public static HasseDrawing of(Computation run) {
        long cells = run.totalCells();
        if (cells > HasseDrawing.MAX_NODES) {
            throw tooMany(run.source(), cells + " cells");
        }
        ChainComplex complex;
        Matching matching;
        if (run.complex().isPresent()) {
            complex = run.complex().get();
            matching = run.matching().orElseThrow();
        } else {
            OrderComplex chains = OrderComplex.of(run.plan().implicitPoset().orElseThrow(), HasseDrawing.MAX_NODES);
            matching = ImplicitMatchingWritten.of(chains, run.implicitRun().orElseThrow().order());
            MatchingVerdict verdict = MatchingVerifier.verify(chains, matching);
            if (!verdict.valid()) {
                throw new IllegalStateException("the implicit matching written out is not acyclic: " + verdict.defect());
            }
            complex = chains;
        }
        return HasseDrawing.ofComplex(complex, matching, run.source() + ": " + what(run) + "; matching "
                + run.matchingName() + ", " + Counted.of(matching.pairCount(), "pair") + ", " + run.totalCritical()
                + " critical");
    }

    private static String what(Computation run) {
        return switch (run.complexKind()) {
            case CELLULAR -> "Hasse diagram of a CW poset, its cellular complex";
            case ORDER -> "face poset of the order complex, one node per chain"
                    + (run.plan().isImplicit() ? " (chains generated on demand)" : "");
            case SIMPLICIAL -> "face poset of the simplicial complex";
            case CUBICAL -> "face poset of the cubical complex, one node per elementary cube";
            case GIVEN -> "cells of the chain complex given by its matrices, one node per basis element";
        };
    }

    private static InputException tooMany(String source, String found) {
        return new InputException(source, InputException.NO_LINE, "too large to draw: a picture takes at most "
                + HasseDrawing.MAX_NODES + " nodes, and this has " + found);
    }
}
