package dev.morse.pipeline;

import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexChoice;
import dev.morse.cw.ComplexSelection;
import dev.morse.cw.ComplexSelector;
import dev.morse.cw.CwPosetVerdict;
import dev.morse.cw.CellularAttempt;
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
import dev.morse.morsecomplex.MorseReduction;
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
import dev.morse.homology.HomologyGroup;
import dev.morse.image.CubicalComplex;
import dev.morse.image.ImageInput;
import dev.morse.image.LoadedImage;
import dev.morse.posetreduction.PosetReduction;
import dev.morse.posetreduction.ReductionResult;
import dev.morse.posetreduction.ReductionStats;
import dev.morse.report.ImageFacts;
import java.util.function.Function;
import java.util.function.UnaryOperator;

/**
 * Runs homology on one input: detects the format from the header line, reads it, builds the chain
 * complex (for a poset: the cellular complex when it is a CW poset and the choice allows, else the
 * order complex, of the poset shrunk by {@link PosetReduction} unless that is switched off, stored
 * or, when it has too many chains or the choice says so, generated on demand by
 * {@link dev.morse.implicit.ImplicitHomology}; for an image or volume: the cubical complex of its
 * foreground), reduces it by the chosen acyclic matching and computes homology, returning a
 * {@link HomologyReport} with the time of each phase ({@code read}, {@code poset reduction} when
 * it ran, {@code complex}, then
 * {@code match}, {@code verify}, {@code sweep}, {@code reduce}, {@code homology} as they ran).
 * Stateless.
 */
public final class HomologyPipeline {
    /** The matching name that means no Morse reduction: every cell is critical. */
    public static final String NO_MATCHING = "none";

    private static final String READ = "read";
    private static final String COMPLEX = "complex";
    private static final String POSET_REDUCTION = "poset reduction";
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
        if (isImageInput(List.of(file), options)) {
            return fromImage(source, List.of(file), options);
        }
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
                case IMAGE, VOLUME -> throw new AssertionError("header detection finds only text formats");
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
            case IMAGE, VOLUME -> throw new AssertionError("header detection finds only text formats");
        };
    }

    /**
     * Runs on several files, which must be the slices of one volume, or on one file (see
     * {@link #run(Path, HomologyOptions)}); the report names the files joined by spaces.
     *
     * @throws InputException for bad input
     * @throws IOException when reading fails for another reason
     */
    public static HomologyReport run(List<Path> files, HomologyOptions options) throws IOException {
        if (files.size() == 1) {
            return run(files.get(0), options);
        }
        StringBuilder source = new StringBuilder();
        for (Path file : files) {
            source.append(source.length() > 0 ? " " : "").append(file);
        }
        return fromImage(source.toString(), files, options);
    }

    /** Images are told by their first bytes; a directory is a stack of slices; a raw size means a raw volume. */
    private static boolean isImageInput(List<Path> files, HomologyOptions options) {
        Path first = files.get(0);
        return files.size() > 1 || options.image().rawSize().isPresent() || Files.isDirectory(first)
                || ImageInput.isImageFile(first);
    }

    private static HomologyReport fromImage(String source, List<Path> files, HomologyOptions options)
            throws IOException {
        if (options.complex() != ComplexChoice.AUTO) {
            throw new InputException(source, InputException.NO_LINE,
                    "an image has only its cubical complex; the choice of complex applies to poset files");
        }
        long start = System.nanoTime();
        LoadedImage image = ImageInput.load(files, options.image());
        PhaseTiming read = PhaseTiming.since(READ, start);
        long built = System.nanoTime();
        ChainComplex complex;
        try {
            complex = CubicalComplex.of(image.voxels());
        } catch (IllegalStateException e) {
            throw tooLarge(source, e);
        }
        InputFormat format = image.isVolume() ? InputFormat.VOLUME : InputFormat.IMAGE;
        return finish(source, format, complex, Optional.empty(), options, read, PhaseTiming.since(COMPLEX, built),
                -1, Optional.empty(), homology -> Optional.of(imageFacts(image, homology)), ComplexEngine.STORED);
    }

    private static ImageFacts imageFacts(LoadedImage image, Homology unreduced) {
        List<Integer> size = new ArrayList<>();
        for (int extent : image.voxels().sizes()) {
            size.add(extent);
        }
        return new ImageFacts(size, image.slices(), image.voxels().count(), image.threshold(), image.inverted(),
                unreduced.group(0).betti(), unreduced.group(1).betti(), unreduced.group(2).betti());
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
        List<ReductionStats> reduction = new ArrayList<>(1);
        UnaryOperator<Poset> shrink = options.posetReduction()
                ? p -> {
                    ReductionResult result = PosetReduction.reduce(p);
                    reduction.add(result.stats());
                    return result.poset();
                }
                : UnaryOperator.identity();
        if (options.complex() == ComplexChoice.IMPLICIT) {
            Poset shrunk = shrink.apply(poset);
            return ImplicitRun.run(source, shrunk, poset.maxHeight(), Optional.empty(), options, "", read,
                    buildTiming(start, reduction), reduction.stream().findFirst());
        }
        if (options.complex() == ComplexChoice.AUTO) {
            return automatic(source, poset, options, read, start, shrink, reduction);
        }
        ComplexSelection selection;
        try {
            selection = ComplexSelector.selectWithVerdict(poset, options.complex(), shrink);
        } catch (IllegalArgumentException notCw) {
            throw new InputException(source, InputException.NO_LINE,
                    "the cellular complex needs a CW poset, and this is not one: " + notCw.getMessage());
        } catch (IllegalStateException e) {
            throw tooLarge(source, e);
        }
        // the homology is that of Δ(P): listed up to its dimension even where the reduced poset is lower
        return finish(source, InputFormat.POSET, selection.complex(), selection.verdict(), options, read,
                buildTiming(start, reduction), poset.maxHeight(), reduction.stream().findFirst(),
                homology -> Optional.empty(), ComplexEngine.STORED);
    }

    /** The time since {@code start} less the poset reduction's, which is reported as a phase of its own. */
    private static PhaseTiming buildTiming(long start, List<ReductionStats> reduction) {
        double reductionMs = reduction.stream().findFirst().map(ReductionStats::milliseconds).orElse(0.0);
        PhaseTiming build = PhaseTiming.since(COMPLEX, start);
        return new PhaseTiming(COMPLEX, Math.max(0, build.milliseconds() - reductionMs));
    }

    /**
     * The cellular complex of a CW poset; else the order complex of the (reduced) poset, stored when
     * its chains are few enough (or when every chain is needed, for matching none) and generated on
     * demand otherwise.
     */
    private static HomologyReport automatic(String source, Poset poset, HomologyOptions options, PhaseTiming read,
            long start, UnaryOperator<Poset> shrink, List<ReductionStats> reduction) {
        CellularAttempt attempt = ComplexSelector.tryCellular(poset);
        Optional<CwPosetVerdict> verdict = Optional.of(attempt.verdict());
        if (attempt.cellular().isPresent()) {
            return finish(source, InputFormat.POSET, attempt.cellular().get(), verdict, options, read,
                    PhaseTiming.since(COMPLEX, start));
        }
        Poset shrunk = shrink.apply(poset);
        ComplexEngine engine;
        if (options.matching().equals(NO_MATCHING)) {
            engine = ComplexEngine.explicit("the full Smith normal form on every chain (matching none) stores them");
        } else {
            Optional<String> implicit = ImplicitRun.reasonForImplicit(shrunk, options);
            if (implicit.isPresent()) {
                return ImplicitRun.run(source, shrunk, poset.maxHeight(), verdict, options, implicit.get(), read,
                        buildTiming(start, reduction), reduction.stream().findFirst());
            }
            engine = ComplexEngine.explicit(ImplicitRun.reasonForStored(shrunk, options));
        }
        ChainComplex complex;
        try {
            complex = OrderComplex.of(shrunk);
        } catch (IllegalStateException e) {
            throw tooLarge(source, e);
        }
        return finish(source, InputFormat.POSET, complex, verdict, options, read, buildTiming(start, reduction),
                poset.maxHeight(), reduction.stream().findFirst(), homology -> Optional.empty(), engine);
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
                PhaseTiming.since(COMPLEX, start));
    }

    private static InputException tooLarge(String source, IllegalStateException e) {
        return new InputException(source, InputException.NO_LINE, "too large to compute: " + e.getMessage());
    }

    private static HomologyReport finish(String source, InputFormat format, ChainComplex complex,
            Optional<CwPosetVerdict> verdict, HomologyOptions options, PhaseTiming read, PhaseTiming build) {
        return finish(source, format, complex, verdict, options, read, build, -1, Optional.empty(),
                homology -> Optional.empty(), ComplexEngine.STORED);
    }

    /**
     * @param top the top dimension to list homology groups up to, when higher than the complex's
     * @param reduction what the poset reduction did, if it ran
     * @param image the image facts, from the unreduced homology
     * @param engine whether the cells were stored, and why when the choice was automatic
     */
    private static HomologyReport finish(String source, InputFormat format, ChainComplex complex,
            Optional<CwPosetVerdict> verdict, HomologyOptions options, PhaseTiming read, PhaseTiming build, int top,
            Optional<ReductionStats> reduction, Function<Homology, Optional<ImageFacts>> image, ComplexEngine engine) {
        MatchingHeuristic heuristic = MatchingHeuristics.byName(options.matching()).orElseThrow();
        MorseReduction.Outcome outcome = MorseReduction.run(complex, new MorseReduction.Request(heuristic,
                new MatchingOptions(options.seed()), options.coefficients(), options.verify()));
        List<PhaseTiming> timings = new ArrayList<>(List.of(read));
        reduction.ifPresent(stats -> timings.add(new PhaseTiming(POSET_REDUCTION, stats.milliseconds())));
        timings.add(build);
        outcome.times().millis().forEach((phase, ms) -> timings.add(new PhaseTiming(phase, ms)));
        List<TrialCount> trials = List.of();
        if (options.trials() > 1) {
            long start = System.nanoTime();
            trials = MatchingTrials.run(complex, heuristic, options.seed(), options.trials());
            timings.add(PhaseTiming.since(TRIALS, start));
        }
        Homology unreduced = padded(outcome.homology(), top);
        Homology homology = options.reduced() ? unreduced.toReduced() : unreduced;
        return new HomologyReport(source, format, complex.kind(), Arrays.stream(outcome.cells()).asLongStream().boxed()
                .toList(), heuristic.name(), boxed(outcome.critical()), homology, verdict, timings, outcome.rounds(),
                outcome.lowerBound(), trials, reduction, image.apply(unreduced), engine);
    }

    /** The homology with trivial groups added up to dimension {@code top}. */
    static Homology padded(Homology homology, int top) {
        if (homology.groups().size() > top) {
            return homology;
        }
        List<HomologyGroup> groups = new ArrayList<>(homology.groups());
        for (int d = groups.size(); d <= top; d++) {
            groups.add(HomologyGroup.free(d, 0));
        }
        return new Homology(homology.coefficients(), homology.reduced(), groups);
    }

    private static List<Integer> boxed(int[] counts) {
        List<Integer> list = new ArrayList<>(counts.length);
        for (int c : counts) {
            list.add(c);
        }
        return list;
    }
}
