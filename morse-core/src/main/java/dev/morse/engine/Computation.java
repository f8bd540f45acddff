package dev.morse.engine;

import dev.morse.complex.ChainComplex;
import dev.morse.complex.ComplexKind;
import dev.morse.cw.CwPosetVerdict;
import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyGroup;
import dev.morse.image.LoadedImage;
import dev.morse.implicit.ImplicitHomology;
import dev.morse.input.Input;
import dev.morse.input.VoxelInput;
import dev.morse.io.InputFormat;
import dev.morse.matching.Matching;
import dev.morse.matching.TrialCount;
import dev.morse.morsecomplex.MorseComplex;
import dev.morse.morsecomplex.MorseOutcome;
import dev.morse.morsecomplex.MorseReduction;
import dev.morse.morsecomplex.ReductionRound;
import dev.morse.posetreduction.ReductionStats;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * One homology run, keeping what it found: the input, the plan (which complex, which engine and
 * why), the complex and matching of the stored engine, the Morse complex, the homology as asked for,
 * the trials and the time of each phase. Text, JSON, pictures and exports are views of it, never a
 * second run. Immutable (the complex and matching it holds are immutable too).
 */
public final class Computation {
    private static final String READ = "read";
    private static final String POSET_REDUCTION = "poset reduction";
    private static final String COMPLEX = "complex";

    private final Input input;
    private final ComplexPlan plan;
    private final MorseOutcome outcome;
    private final Homology unreduced;
    private final Homology homology;
    private final List<TrialCount> trials;
    private final List<PhaseTiming> timings;

    private Computation(Input input, ComplexPlan plan, MorseOutcome outcome, Homology unreduced, Homology homology,
            List<TrialCount> trials, List<PhaseTiming> timings) {
        this.input = input;
        this.plan = plan;
        this.outcome = outcome;
        this.unreduced = unreduced;
        this.homology = homology;
        this.trials = List.copyOf(trials);
        this.timings = List.copyOf(timings);
    }

    /** As {@link #of(Input, ComplexPlan, boolean, MorseOutcome, List, List)} with the request's choice of reduced homology. */
    static Computation of(Input input, ComplexPlan plan, Request request, MorseOutcome outcome,
            List<TrialCount> trials, List<PhaseTiming> after) {
        return of(input, plan, request.reduced(), outcome, trials, after);
    }

    /**
     * Assembles a run from its parts, as an engine does: the homology padded with trivial groups up
     * to the plan's top dimension and reduced when asked, and the phases in the order they ran (read,
     * poset reduction, complex, the engine's phases, then {@code after}).
     */
    public static Computation of(Input input, ComplexPlan plan, boolean reduced, MorseOutcome outcome,
            List<TrialCount> trials, List<PhaseTiming> after) {
        Objects.requireNonNull(input, "input");
        Objects.requireNonNull(plan, "plan");
        Homology unreduced = padded(outcome.homology(), plan.topDimension());
        Homology homology = reduced ? unreduced.toReduced() : unreduced;
        List<PhaseTiming> timings = new ArrayList<>();
        timings.add(new PhaseTiming(READ, input.readMillis()));
        plan.posetReduction().ifPresent(stats -> timings.add(new PhaseTiming(POSET_REDUCTION, stats.milliseconds())));
        timings.add(new PhaseTiming(COMPLEX, plan.buildMillis()));
        outcome.times().millis().forEach((phase, ms) -> timings.add(new PhaseTiming(phase, ms)));
        timings.addAll(after);
        return new Computation(input, plan, outcome, unreduced, homology, trials, timings);
    }

    /** The homology with trivial groups added up to dimension {@code top}. */
    private static Homology padded(Homology homology, int top) {
        if (homology.groups().size() > top) {
            return homology;
        }
        List<HomologyGroup> groups = new ArrayList<>(homology.groups());
        for (int d = groups.size(); d <= top; d++) {
            groups.add(HomologyGroup.free(d, 0));
        }
        return new Homology(homology.coefficients(), homology.reduced(), groups);
    }

    /** What was read. */
    public Input input() {
        return input;
    }

    /** The input's name as the user gave it. */
    public String source() {
        return input.source();
    }

    /** The format the input was read in. */
    public InputFormat format() {
        return input.format();
    }

    /** Which complex, which engine and why. */
    public ComplexPlan plan() {
        return plan;
    }

    /** Which complex was matched. */
    public ComplexKind complexKind() {
        return plan.kind();
    }

    /** The engine's name: {@code explicit} (cells stored) or {@code implicit} (chains generated on demand). */
    public String engineName() {
        return plan.engine().name();
    }

    /** Why this complex and engine, when the choice was automatic; empty otherwise. */
    public String reason() {
        return plan.reason();
    }

    /** The CW poset verdict, when the check was made. */
    public Optional<CwPosetVerdict> cwCheck() {
        return plan.cwCheck();
    }

    /** What the poset reduction did, when it ran. */
    public Optional<ReductionStats> posetReduction() {
        return plan.posetReduction();
    }

    /** What the engine found, whichever engine it was. */
    public MorseOutcome outcome() {
        return outcome;
    }

    /** The implicit engine's own account of its run, when it ran. */
    public Optional<ImplicitHomology.Outcome> implicitRun() {
        return outcome instanceof ImplicitHomology.Outcome run ? Optional.of(run) : Optional.empty();
    }

    /** The stored complex that was matched; empty for the implicit engine. */
    public Optional<ChainComplex> complex() {
        return plan.stored();
    }

    /** The acyclic matching on the stored complex; empty for the implicit engine. */
    public Optional<Matching> matching() {
        return outcome instanceof MorseReduction.Outcome stored ? Optional.of(stored.matching()) : Optional.empty();
    }

    /** The Morse complex before algebraic reduction, when one was built. */
    public Optional<MorseComplex> morseComplex() {
        return outcome.morseComplex();
    }

    /** Names of the critical cells of dimension {@code d}, in the order of the Morse complex. */
    public List<String> criticalCellNames(int d) {
        return outcome.criticalCellNames(d);
    }

    /** Cells per dimension of the matched complex (longs: a generated order complex may have more than 2^31). */
    public List<Long> cells() {
        return java.util.Arrays.stream(outcome.cells()).boxed().toList();
    }

    /** Total number of cells. */
    public long totalCells() {
        return cells().stream().mapToLong(Long::longValue).reduce(0, Math::addExact);
    }

    /** The matching's name. */
    public String matchingName() {
        return outcome.matchingName();
    }

    /** Critical cells per dimension of the matching; equal to {@link #cells()} for {@code none}. */
    public List<Integer> critical() {
        return java.util.Arrays.stream(outcome.critical()).boxed().toList();
    }

    /** Total number of critical cells. */
    public long totalCritical() {
        return outcome.totalCritical();
    }

    /** The homology as asked for: over the requested coefficients, reduced when asked. */
    public Homology homology() {
        return homology;
    }

    /** The unreduced homology over the requested coefficients. */
    public Homology unreducedHomology() {
        return unreduced;
    }

    /** The coefficients of the homology. */
    public Coefficients coefficients() {
        return homology.coefficients();
    }

    /** Whether the homology is reduced. */
    public boolean reduced() {
        return homology.reduced();
    }

    /**
     * The Morse lower bound Σ_k (β_k + t_k + t_(k−1)) on critical cells, from the unreduced homology
     * (Forman 1998).
     */
    public long morseLowerBound() {
        return MorseReduction.lowerBound(outcome.homology());
    }

    /** Critical cells beyond the Morse lower bound. */
    public long excess() {
        return totalCritical() - morseLowerBound();
    }

    /** Cells left after each round of algebraic reduction. */
    public List<ReductionRound> rounds() {
        return outcome.rounds();
    }

    /** The tally of seeded trials of the matching; empty unless several were asked for. */
    public List<TrialCount> trials() {
        return trials;
    }

    /** The phases in the order they ran. */
    public List<PhaseTiming> timings() {
        return timings;
    }

    /** For an image or volume: its size, foreground and shape. */
    public Optional<ImageFacts> image() {
        if (!(input instanceof VoxelInput voxels)) {
            return Optional.empty();
        }
        LoadedImage image = voxels.image();
        List<Integer> size = new ArrayList<>();
        for (int extent : image.voxels().sizes()) {
            size.add(extent);
        }
        return Optional.of(new ImageFacts(size, image.slices(), image.voxels().count(), image.threshold(),
                image.inverted(), unreduced.group(0).betti(), unreduced.group(1).betti(), unreduced.group(2).betti()));
    }
}
