package dev.morse.engine;

import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexChoice;
import dev.morse.complex.ComplexKind;
import dev.morse.complex.OrderComplex;
import dev.morse.complex.SimplicialComplex;
import dev.morse.cw.CellularAttempt;
import dev.morse.cw.CwPosetCheck;
import dev.morse.cw.CwPosetVerdict;
import dev.morse.image.CubicalComplex;
import dev.morse.input.ChainComplexInput;
import dev.morse.input.FacetInput;
import dev.morse.input.Input;
import dev.morse.input.PosetInput;
import dev.morse.input.VoxelInput;
import dev.morse.io.InputException;
import dev.morse.poset.ChainCounts;
import dev.morse.poset.Poset;
import dev.morse.posetreduction.PosetReduction;
import dev.morse.posetreduction.ReductionResult;
import dev.morse.posetreduction.ReductionStats;
import java.util.Arrays;
import java.util.Locale;
import java.util.Optional;

/**
 * The one policy that chooses the complex of an input, and the engine, for every command:
 * <ul>
 * <li>a simplicial file: its simplicial complex; an image: the cubical complex of its foreground; a
 *     chain complex given by its matrices: itself;
 * <li>a poset under {@code auto}: the cellular complex when it is a CW poset (checked once here);
 *     else the order complex of the poset shrunk by {@link PosetReduction} (unless switched off),
 *     stored when its chains, counted once here, are at most the request's limit (or when every cell
 *     is needed, for matching {@code none}), and generated on demand otherwise;
 * <li>a poset under {@code order}, {@code cellular} or {@code implicit}: that complex, or a message
 *     saying why it cannot be had.
 * </ul>
 * The answer never depends on the choice, only the time and memory. Stateless.
 */
public final class ComplexPolicy {
    private ComplexPolicy() {
    }

    /**
     * Chooses and, for a stored complex, builds.
     *
     * @throws InputException when the choice does not apply to the input, the cellular complex is
     *     demanded of a poset that is not a CW poset, or the complex is too large to build
     */
    public static ComplexPlan plan(Input input, Request request) {
        long start = System.nanoTime();
        try {
            if (input instanceof PosetInput poset) {
                return forPoset(poset, request, start);
            }
            if (input instanceof FacetInput facets) {
                return stored(ComplexKind.SIMPLICIAL, onlyAuto(input, request, "a simplicial file has only its own complex"),
                        () -> SimplicialComplex.of(facets.facets(), Math.min(request.maxStoredCells(),
                                SimplicialComplex.DEFAULT_CELL_LIMIT)), start);
            }
            if (input instanceof ChainComplexInput given) {
                ChainComplex complex = given.complex();
                if (complex.cellCount() > request.maxStoredCells()) {
                    throw new IllegalStateException(complex.cellCount() + " cells, more than the "
                            + request.maxStoredCells() + " allowed here");
                }
                return stored(ComplexKind.GIVEN, onlyAuto(input, request, "a chain complex given by its matrices has"
                        + " only itself"), () -> complex, start);
            }
            VoxelInput image = (VoxelInput) input;
            return stored(ComplexKind.CUBICAL, onlyAuto(input, request, "an image has only its cubical complex"),
                    () -> CubicalComplex.of(image.image().voxels(), Math.min(request.maxStoredCells(),
                            CubicalComplex.DEFAULT_CELL_LIMIT)), start);
        } catch (IllegalStateException e) {
            // the complexes refuse to build past their cell limits with this exception, before allocating
            throw new InputException(input.source(), InputException.NO_LINE, "too large to compute: " + e.getMessage());
        }
    }

    /**
     * The stored complex that {@code choice} asks for of {@code poset} as it is: no poset reduction,
     * and the order complex stored whatever its number of chains. For studying one complex, as the
     * property tests and benchmarks do; commands go through {@link #plan}.
     *
     * @throws InputException as {@link #plan} does, naming the input {@code poset}
     * @throws IllegalArgumentException for {@link ComplexChoice#IMPLICIT}, which stores no complex
     */
    public static ChainComplex storedComplex(Poset poset, ComplexChoice choice) {
        Request request = Request.defaults().withComplex(choice).withPosetReduction(false)
                .withImplicit(Request.defaults().elementOrder(), Request.MAX_STORED_CHAIN_LIMIT);
        return plan(new PosetInput("poset", poset, 0), request).stored().orElseThrow(() -> new IllegalArgumentException(
                "the implicit order complex stores no cells; the implicit engine computes its homology"));
    }

    private static Request onlyAuto(Input input, Request request, String what) {
        if (request.complex() != ComplexChoice.AUTO) {
            throw new InputException(input.source(), InputException.NO_LINE,
                    what + "; the choice of complex applies to poset files");
        }
        return request;
    }

    private static ComplexPlan stored(ComplexKind kind, Request request, java.util.function.Supplier<ChainComplex> build,
            long start) {
        ChainComplex complex = build.get();
        return new ComplexPlan(kind, Optional.of(complex), Optional.empty(), new long[0], "", Optional.empty(),
                Optional.empty(), -1, millisSince(start));
    }

    private static ComplexPlan forPoset(PosetInput input, Request request, long start) {
        Poset poset = input.poset();
        int top = poset.maxHeight();
        switch (request.complex()) {
            case ORDER -> {
                Shrunk shrunk = shrink(poset, request);
                return storedOrder(shrunk, request, "", Optional.empty(), top, start);
            }
            case IMPLICIT -> {
                Shrunk shrunk = shrink(poset, request);
                requireOwnMatching(input, request);
                return implicit(shrunk, new long[0], "", Optional.empty(), top, start);
            }
            case CELLULAR, AUTO -> {
                CellularAttempt attempt = CwPosetCheck.tryCellular(poset);
                CwPosetVerdict verdict = attempt.verdict();
                if (attempt.cellular().isPresent()) {
                    ChainComplex cellular = attempt.cellular().get();
                    if (cellular.cellCount() > request.maxStoredCells()) {
                        throw new IllegalStateException(cellular.cellCount() + " cells, more than the "
                                + request.maxStoredCells() + " allowed here");
                    }
                    return new ComplexPlan(ComplexKind.CELLULAR, Optional.of(cellular), Optional.empty(), new long[0],
                            "", Optional.of(verdict), Optional.empty(), top, millisSince(start));
                }
                if (request.complex() == ComplexChoice.CELLULAR) {
                    throw new InputException(input.source(), InputException.NO_LINE,
                            "the cellular complex needs a CW poset, and this is not one: " + verdict.reason());
                }
                return automaticOrder(input, shrink(poset, request), request, verdict, top, start);
            }
            default -> throw new AssertionError(request.complex());
        }
    }

    /** The order complex of a poset that is not a CW poset: stored when its chains are few enough. */
    private static ComplexPlan automaticOrder(PosetInput input, Shrunk shrunk, Request request, CwPosetVerdict verdict,
            int top, long start) {
        Optional<CwPosetVerdict> cw = Optional.of(verdict);
        if (request.matching().equals(Request.NO_MATCHING)) {
            return storedOrder(shrunk, request, "the full Smith normal form on every chain (matching none) stores them",
                    cw, top, start);
        }
        long limit = request.storedChainLimit();
        long[] counts;
        long total;
        try {
            counts = ChainCounts.perDimension(shrunk.poset());
            total = Arrays.stream(counts).reduce(0, Math::addExact);
        } catch (ArithmeticException e) {
            counts = new long[0];
            total = Long.MAX_VALUE;
        }
        if (total > limit) {
            return implicit(shrunk, counts, String.format(Locale.ROOT, "more than %,d chains %s, too many to store,"
                    + " so the chains are generated on demand", limit, countedOn(shrunk)), cw, top, start);
        }
        return storedOrder(shrunk, request, String.format(Locale.ROOT, "%,d %s %s, at most the %,d stored", total,
                total == 1 ? "chain" : "chains", countedOn(shrunk), limit), cw, top, start);
    }

    /** Which poset the chains were counted on, for the reason line: the chain counts differ by a lot. */
    private static String countedOn(Shrunk shrunk) {
        return shrunk.stats().isPresent() ? "after the poset reduction" : "in the poset as given (no poset reduction)";
    }

    private static void requireOwnMatching(PosetInput input, Request request) {
        if (request.matching().equals(Request.NO_MATCHING)) {
            throw new InputException(input.source(), InputException.NO_LINE, "the implicit order complex always uses"
                    + " its own matching; the full Smith normal form on every chain (--matching none) needs --complex order");
        }
    }

    private static ComplexPlan storedOrder(Shrunk shrunk, Request request, String reason,
            Optional<CwPosetVerdict> cw, int top, long start) {
        OrderComplex complex = OrderComplex.of(shrunk.poset(), Math.min(request.maxStoredCells(),
                OrderComplex.DEFAULT_CELL_LIMIT));
        return new ComplexPlan(ComplexKind.ORDER, Optional.of(complex), Optional.empty(), new long[0], reason, cw,
                shrunk.stats(), top, buildMillis(start, shrunk));
    }

    private static ComplexPlan implicit(Shrunk shrunk, long[] counts, String reason, Optional<CwPosetVerdict> cw,
            int top, long start) {
        return new ComplexPlan(ComplexKind.ORDER, Optional.empty(), Optional.of(shrunk.poset()), counts, reason, cw,
                shrunk.stats(), top, buildMillis(start, shrunk));
    }

    /** The poset reduced when the request asks for it, and what the reduction did. */
    private record Shrunk(Poset poset, Optional<ReductionStats> stats) {
    }

    private static Shrunk shrink(Poset poset, Request request) {
        if (!request.posetReduction()) {
            return new Shrunk(poset, Optional.empty());
        }
        ReductionResult result = PosetReduction.reduce(poset);
        return new Shrunk(result.poset(), Optional.of(result.stats()));
    }

    /** The time since {@code start} less the poset reduction's, which is reported as a phase of its own. */
    private static double buildMillis(long start, Shrunk shrunk) {
        double reduction = shrunk.stats().map(ReductionStats::milliseconds).orElse(0.0);
        return Math.max(0, millisSince(start) - reduction);
    }

    private static double millisSince(long start) {
        return Math.max(0, System.nanoTime() - start) / 1e6;
    }
}
