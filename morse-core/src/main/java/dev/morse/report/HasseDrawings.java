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
import dev.morse.cycles.Cycle;
import dev.morse.cycles.RepresentativeCycles;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.stream.Collectors;

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
        return draw(input, request, null);
    }

    /**
     * As {@link #draw(Input, Request)}, with the cells of the representative cycle {@code choice}
     * marked. On the face poset of a complex these are the cells of the cycle, each with its
     * coefficient. On a poset that is not a CW poset the cycle's cells are chains of the order
     * complex, computed as {@code homology} would, so the elements on its chains are marked, and the
     * covers between consecutive elements of one of its chains.
     *
     * @param choice the cycle to mark; null for none
     * @throws InputException as {@link #draw(Input, Request)}, for a cycle that does not exist, or
     *     when the cycles cannot be found on this run ({@link RepresentativeCycles#of})
     */
    public static HasseDrawing draw(Input input, Request request, CycleChoice choice) {
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
                    HasseDrawing plain = HasseDrawing.ofPoset(poset, input.source() + ": Hasse diagram of a poset that is not a CW"
                            + " poset; nothing marked", "Not a CW poset: " + verdict.reason() + ". Its matching is made"
                            + " on the order complex, whose cells are chains, not elements, so no pair of elements here"
                            + " is matched; the order complex can be drawn instead.");
                    return choice == null ? plain : withChainCycle(plain, poset, Engines.compute(input, request), choice);
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
        HasseDrawing drawing = of(run);
        return choice == null ? drawing : withCellCycle(drawing, run, choice);
    }

    /**
     * The cells of the chosen cycle, each with its coefficient: node ids are cell ids, except on the
     * implicit engine, whose chains have no ids and are found by their names, {@code a<b<c}.
     */
    private static HasseDrawing withCellCycle(HasseDrawing drawing, Computation run, CycleChoice choice) {
        CycleChoice.Chosen chosen = choice.pick(RepresentativeCycles.of(run), run.source());
        List<String> coefficients = new ArrayList<>(Collections.nCopies(drawing.nodeCount(), (String) null));
        Map<String, Integer> byName = new HashMap<>();
        for (Cycle.Term t : chosen.cycle().terms()) {
            int node = t.cell();
            if (node < 0) {
                if (byName.isEmpty()) {
                    for (int v = 0; v < drawing.nodeCount(); v++) {
                        byName.put(drawing.label(v), v);
                    }
                }
                node = byName.get(t.label().stream().map(String::valueOf).collect(Collectors.joining("<")));
            }
            coefficients.set(node, t.coefficient().toString());
        }
        return drawing.withCycle(new HasseDrawing.CycleMark(chosen.description(), coefficients,
                new boolean[drawing.coverCount()]));
    }

    /** The elements on the chains of the chosen cycle, and the covers along them. */
    private static HasseDrawing withChainCycle(HasseDrawing drawing, Poset poset, Computation run, CycleChoice choice) {
        CycleChoice.Chosen chosen = choice.pick(RepresentativeCycles.of(run), run.source());
        Map<Long, Integer> coverIndex = new HashMap<>();
        for (int e = 0; e < drawing.coverCount(); e++) {
            coverIndex.put(((long) drawing.lowerEnd(e) << 32) | drawing.upperEnd(e), e);
        }
        List<String> coefficients = new ArrayList<>(Collections.nCopies(drawing.nodeCount(), (String) null));
        boolean[] covers = new boolean[drawing.coverCount()];
        for (Cycle.Term t : chosen.cycle().terms()) {
            int previous = -1;
            for (Object label : t.label()) {
                // a chain of the order complex, written by its elements' labels from the bottom up
                int x = poset.find((String) label).orElseThrow();
                coefficients.set(x, "");
                Integer e = previous < 0 ? null : coverIndex.get(((long) previous << 32) | x);
                if (e != null) {
                    covers[e] = true;
                }
                previous = x;
            }
        }
        return drawing.withCycle(new HasseDrawing.CycleMark(chosen.description() + " (chains of the order complex;"
                + " their elements are marked)", coefficients, covers));
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
