package dev.morse.report;

import dev.morse.complex.ComplexKind;
import dev.morse.cw.CwPosetVerdict;
import dev.morse.homology.Coefficients;
import dev.morse.homology.Homology;
import dev.morse.io.InputFormat;
import dev.morse.matching.TrialCount;
import dev.morse.morsecomplex.MorseReduction;
import dev.morse.morsecomplex.ReductionRound;
import dev.morse.posetreduction.ReductionStats;
import java.util.List;
import java.util.Objects;
import java.util.Optional;

/**
 * Everything one homology run produced, ready to be written as text or JSON. Immutable.
 *
 * @param input the input file name as the user gave it
 * @param format the format the input was read in
 * @param complex which chain complex was built
 * @param cells cells per dimension of that complex, from dimension 0 (longs: an order complex
 *     generated on demand may have more than 2^31 cells in a dimension)
 * @param matching the name of the acyclic matching used ({@code none} for none)
 * @param critical critical cells per dimension of that matching; equal to {@code cells} for {@code none}
 * @param homology the homology, with its coefficients and whether it is reduced
 * @param cwCheck the verdict of the CW poset check, when one was made
 * @param timings the phases of the run in the order they ran
 * @param rounds cells per dimension left after each round of algebraic reduction of the Morse
 *     complex (empty without a matching)
 * @param morseLowerBound the Morse lower bound Σ_k (β_k + t_k + t_(k−1)) on critical cells, from the
 *     unreduced homology (Forman 1998)
 * @param trials the spread of critical-cell vectors over repeated seeded runs of the matching (empty
 *     when only one run was asked for)
 * @param posetReduction what the homology-preserving reduction of the poset did, when one ran
 *     (the order complex was then built on the reduced poset)
 * @param image the image or volume the cubical complex was built from, for image input
 * @param engine whether the cells were stored or, for the order complex, generated on demand
 */
public record HomologyReport(
        String input,
        InputFormat format,
        ComplexKind complex,
        List<Long> cells,
        String matching,
        List<Integer> critical,
        Homology homology,
        Optional<CwPosetVerdict> cwCheck,
        List<PhaseTiming> timings,
        List<ReductionRound> rounds,
        long morseLowerBound,
        List<TrialCount> trials,
        Optional<ReductionStats> posetReduction,
        Optional<ImageFacts> image,
        ComplexEngine engine) {

    /** Validates and copies. */
    public HomologyReport {
        Objects.requireNonNull(input, "input");
        Objects.requireNonNull(format, "format");
        Objects.requireNonNull(complex, "complex");
        Objects.requireNonNull(matching, "matching");
        Objects.requireNonNull(homology, "homology");
        Objects.requireNonNull(cwCheck, "cwCheck");
        Objects.requireNonNull(engine, "engine");
        Objects.requireNonNull(posetReduction, "posetReduction");
        Objects.requireNonNull(image, "image");
        cells = List.copyOf(cells);
        critical = List.copyOf(critical);
        timings = List.copyOf(timings);
        rounds = List.copyOf(rounds);
        trials = List.copyOf(trials);
        if (morseLowerBound < 0) {
            throw new IllegalArgumentException("negative lower bound");
        }
        if (critical.size() != cells.size()) {
            throw new IllegalArgumentException("critical cells must be counted in every dimension of the complex");
        }
        for (int d = 0; d < cells.size(); d++) {
            if (cells.get(d) < 0 || critical.get(d) < 0 || critical.get(d) > cells.get(d)) {
                throw new IllegalArgumentException("bad cell or critical count in dimension " + d);
            }
        }
    }

    /** A report of a run whose cells were all stored. */
    public HomologyReport(String input, InputFormat format, ComplexKind complex, List<Long> cells, String matching,
            List<Integer> critical, Homology homology, Optional<CwPosetVerdict> cwCheck, List<PhaseTiming> timings,
            List<ReductionRound> rounds, long morseLowerBound, List<TrialCount> trials,
            Optional<ReductionStats> posetReduction, Optional<ImageFacts> image) {
        this(input, format, complex, cells, matching, critical, homology, cwCheck, timings, rounds, morseLowerBound,
                trials, posetReduction, image, ComplexEngine.STORED);
    }

    /** A report of a run whose cells were all stored, on an input neither reduced as a poset nor read as an image. */
    public HomologyReport(String input, InputFormat format, ComplexKind complex, List<Long> cells, String matching,
            List<Integer> critical, Homology homology, Optional<CwPosetVerdict> cwCheck, List<PhaseTiming> timings,
            List<ReductionRound> rounds, long morseLowerBound, List<TrialCount> trials) {
        this(input, format, complex, cells, matching, critical, homology, cwCheck, timings, rounds, morseLowerBound,
                trials, Optional.empty(), Optional.empty(), ComplexEngine.STORED);
    }

    /**
     * A report of a run without algebraic rounds or trials, the lower bound taken from
     * {@code homology}, which must then be unreduced.
     */
    public HomologyReport(String input, InputFormat format, ComplexKind complex, List<Long> cells, String matching,
            List<Integer> critical, Homology homology, Optional<CwPosetVerdict> cwCheck, List<PhaseTiming> timings) {
        this(input, format, complex, cells, matching, critical, homology, cwCheck, timings, List.of(),
                MorseReduction.lowerBound(homology), List.of(), Optional.empty(), Optional.empty(), ComplexEngine.STORED);
    }

    /** Critical cells beyond the Morse lower bound. */
    public long excess() {
        return totalCritical() - morseLowerBound;
    }

    /** The coefficients of the homology. */
    public Coefficients coefficients() {
        return homology.coefficients();
    }

    /** Whether the homology is reduced. */
    public boolean reduced() {
        return homology.reduced();
    }

    /** Total number of cells of the complex. */
    public long totalCells() {
        return cells.stream().mapToLong(Long::longValue).reduce(0, Math::addExact);
    }

    /** Total number of critical cells. */
    public long totalCritical() {
        return critical.stream().mapToLong(Integer::longValue).sum();
    }
}
