package dev.morse.pipeline;

import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexChoice;
import dev.morse.complex.ComplexSelection;
import dev.morse.complex.ComplexSelector;
import dev.morse.complex.CwPosetVerdict;
import dev.morse.complex.CellularAttempt;
import dev.morse.complex.Facets;
import dev.morse.complex.OrderComplex;
import dev.morse.complex.SimplicialComplex;
import dev.morse.homology.Homology;
import dev.morse.io.InputException;
import dev.morse.io.InputFormat;
import dev.morse.io.PosetReader;
import dev.morse.io.SimplicialReader;
import dev.morse.matching.MatchingHeuristic;
import dev.morse.matching.MatchingHeuristics;
import dev.morse.matching.MatchingOptions;
import dev.morse.matching.MatchingTrials;
import dev.morse.matching.TrialCount;
import dev.morse.morse.MorseReduction;
import dev.morse.poset.Poset;
import dev.morse.report.ComplexEngine;
import dev.morse.report.HomologyReport;
import dev.morse.report.PhaseTiming;
import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * Runs homology on one input: detects the format from the header line, reads it, builds the chain
 * complex (for a poset: the cellular complex when it is a CW poset and the choice allows, else the
 * order complex, stored or, when it has too many chains or the choice says so, generated on demand
 * by {@link dev.morse.implicit.ImplicitHomology}), reduces it by the chosen acyclic matching and computes homology, returning a
 * {@link HomologyReport} with the time of each phase ({@code read}, {@code complex}, then
 * {@code match}, {@code verify}, {@code sweep}, {@code reduce}, {@code homology} as they ran).
 * Stateless.
 */
public final class HomologyPipeline {
    /** The matching name that means no Morse reduction: every cell is critical. */
    public static final String NO_MATCHING = "none";

    private static final String READ = "read";
    private static final String COMPLEX = "complex";
    private static final String TRIALS = "trials";

    private HomologyPipeline() {
    }

    /** The names accepted as a matching, in the order to show them. */
    public static List<String> matchingNames() {
        return MatchingHeuristics.names();
    }

    /**
     * Returns {@code name} if it names a matching.
     *
     * @throws IllegalArgumentException naming the available matchings otherwise
     */
    public static String requireKnownMatching(String name) {
        if (name == null || MatchingHeuristics.byName(name).isEmpty()) {
            throw new IllegalArgumentException("unknown matching '" + name + "'; available: "
                    + String.join(", ", matchingNames()));
        }
        return name;
    }

    /**
     * Runs on a file; its name appears in the report and in error messages as given.
     *
     * @throws InputException for bad input, including a missing or unreadable file
     * @throws IOException when reading fails for another reason
     */
    public static HomologyReport run(Path file, HomologyOptions options) throws IOException {
        String source = file.toString();
        requireReadable(file);
        long start = System.nanoTime();
        try {
            return switch (InputFormat.detect(file)) {
                case POSET -> {
                    Poset poset = PosetReader.read(file);
                    yield fromPoset(source, poset, options, PhaseTiming.since(READ, start));
                }
                case SIMPLICIAL -> {
                    Facets facets = SimplicialReader.read(file);
                    yield fromFacets(source, facets, options, PhaseTiming.since(READ, start));
                }
            };
        } catch (NoSuchFileException e) {
            throw new InputException(source, InputException.NO_LINE, "no such file");
        } catch (AccessDeniedException e) {
            throw new InputException(source, InputException.NO_LINE, "cannot be read: permission denied");
        }
    }

    /**
     * Runs on text held in memory; {@code source} names it in the report and in error messages.
     *
     * @throws InputException for bad input
     */
    public static HomologyReport run(String source, String text, HomologyOptions options) {
        long start = System.nanoTime();
        return switch (InputFormat.detect(text, source)) {
            case POSET -> {
                Poset poset = PosetReader.parse(text, source);
                yield fromPoset(source, poset, options, PhaseTiming.since(READ, start));
            }
            case SIMPLICIAL -> {
                Facets facets = SimplicialReader.parse(text, source);
                yield fromFacets(source, facets, options, PhaseTiming.since(READ, start));
            }
        };
    }

    private static void requireReadable(Path file) {
        String source = file.toString();
        if (!Files.exists(file)) {
            throw new InputException(source, InputException.NO_LINE, "no such file");
        }
        if (Files.isDirectory(file)) {
            throw new InputException(source, InputException.NO_LINE, "is a directory, not a file");
        }
    }

    private static HomologyReport fromPoset(String source, Poset poset, HomologyOptions options, PhaseTiming read) {
        long start = System.nanoTime();
        if (options.complex() == ComplexChoice.IMPLICIT) {
            return ImplicitRun.run(source, poset, Optional.empty(), options, "", read, PhaseTiming.since(COMPLEX, start));
        }
        if (options.complex() == ComplexChoice.AUTO) {
            return automatic(source, poset, options, read, start);
        }
        ComplexSelection selection;
        try {
            selection = ComplexSelector.selectWithVerdict(poset, options.complex());
        } catch (IllegalArgumentException notCw) {
            throw new InputException(source, InputException.NO_LINE,
                    "the cellular complex needs a CW poset, and this is not one: " + notCw.getMessage());
        } catch (IllegalStateException e) {
            throw tooLarge(source, e);
        }
        return finish(source, InputFormat.POSET, selection.complex(), selection.verdict(), options, read,
                PhaseTiming.since(COMPLEX, start), ComplexEngine.STORED);
    }

    /**
     * The cellular complex of a CW poset; else the order complex, stored when its chains are few
     * enough (or when every chain is needed, for matching none) and generated on demand otherwise.
     */
    private static HomologyReport automatic(String source, Poset poset, HomologyOptions options, PhaseTiming read,
            long start) {
        CellularAttempt attempt = ComplexSelector.tryCellular(poset);
        Optional<CwPosetVerdict> verdict = Optional.of(attempt.verdict());
        if (attempt.cellular().isPresent()) {
            return finish(source, InputFormat.POSET, attempt.cellular().get(), verdict, options, read,
                    PhaseTiming.since(COMPLEX, start), ComplexEngine.STORED);
        }
        ComplexEngine engine;
        if (options.matching().equals(NO_MATCHING)) {
            engine = ComplexEngine.explicit("the full Smith normal form on every chain (matching none) stores them");
        } else {
            Optional<String> implicit = ImplicitRun.reasonForImplicit(poset, options);
            if (implicit.isPresent()) {
                return ImplicitRun.run(source, poset, verdict, options, implicit.get(), read,
                        PhaseTiming.since(COMPLEX, start));
            }
            engine = ComplexEngine.explicit(ImplicitRun.reasonForStored(poset, options));
        }
        ChainComplex complex;
        try {
            complex = OrderComplex.of(poset);
        } catch (IllegalStateException e) {
            throw tooLarge(source, e);
        }
        return finish(source, InputFormat.POSET, complex, verdict, options, read, PhaseTiming.since(COMPLEX, start),
                engine);
    }

    private static HomologyReport fromFacets(String source, Facets facets, HomologyOptions options, PhaseTiming read) {
        if (options.complex() != ComplexChoice.AUTO) {
            throw new InputException(source, InputException.NO_LINE,
                    "a simplicial file has only its own complex; the choice of complex applies to poset files");
        }
        long start = System.nanoTime();
        ChainComplex complex;
        try {
            complex = SimplicialComplex.of(facets);
        } catch (IllegalStateException e) {
            throw tooLarge(source, e);
        }
        return finish(source, InputFormat.SIMPLICIAL, complex, Optional.empty(), options, read,
                PhaseTiming.since(COMPLEX, start), ComplexEngine.STORED);
    }

    private static InputException tooLarge(String source, IllegalStateException e) {
        return new InputException(source, InputException.NO_LINE, "too large to compute: " + e.getMessage());
    }

    private static HomologyReport finish(String source, InputFormat format, ChainComplex complex,
            Optional<CwPosetVerdict> verdict, HomologyOptions options, PhaseTiming read, PhaseTiming build,
            ComplexEngine engine) {
        MatchingHeuristic heuristic = MatchingHeuristics.byName(options.matching()).orElseThrow();
        MorseReduction.Outcome outcome = MorseReduction.run(complex, new MorseReduction.Request(heuristic,
                new MatchingOptions(options.seed()), options.coefficients(), options.verify()));
        List<PhaseTiming> timings = new ArrayList<>(List.of(read, build));
        outcome.times().millis().forEach((phase, ms) -> timings.add(new PhaseTiming(phase, ms)));
        List<TrialCount> trials = List.of();
        if (options.trials() > 1) {
            long start = System.nanoTime();
            trials = MatchingTrials.run(complex, heuristic, options.seed(), options.trials());
            timings.add(PhaseTiming.since(TRIALS, start));
        }
        Homology homology = options.reduced() ? outcome.homology().toReduced() : outcome.homology();
        return new HomologyReport(source, format, complex.kind(), Arrays.stream(outcome.cells()).asLongStream().boxed()
                .toList(), heuristic.name(), boxed(outcome.critical()), homology, verdict, timings, outcome.rounds(),
                outcome.lowerBound(), trials, engine);
    }

    private static List<Integer> boxed(int[] counts) {
        List<Integer> list = new ArrayList<>(counts.length);
        for (int c : counts) {
            list.add(c);
        }
        return list;
    }
}
