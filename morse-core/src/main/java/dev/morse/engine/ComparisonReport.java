package dev.morse.engine;

import dev.morse.complex.ComplexKind;
import dev.morse.cw.CwPosetVerdict;
import dev.morse.homology.Homology;
import dev.morse.homology.HomologyGroup;
import dev.morse.io.InputFormat;
import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.Optional;
import dev.morse.matching.OptimalMatching;

/**
 * Several matching heuristics run on one complex: the complex, its integral homology (computed
 * once, by {@code referenceMatching}, and matched by every other run), the Morse lower bounds, and
 * one {@link MatchingRun} per heuristic. Immutable.
 *
 * @param input the input file as given
 * @param format its format
 * @param complex which complex was built
 * @param cells cells per dimension of the complex
 * @param cwCheck the CW poset verdict, when a check was made
 * @param homology the unreduced homology over the requested coefficients, from which the bounds come
 * @param reducedShown whether reports show the reduced homology instead
 * @param referenceMatching the heuristic whose run gave {@code homology}
 * @param setup the phases before the heuristics ran ({@code read}, {@code complex})
 * @param runs one run per heuristic, in the order asked for
 * @param seed the seed of the first (or only) run of each heuristic
 * @param optimum the exact optimum of the matchings on this complex, or the best found with its bound
 *     when the search ran out of time; empty when it was not sought
 */
public record ComparisonReport(String input, InputFormat format, ComplexKind complex, List<Long> cells,
        Optional<CwPosetVerdict> cwCheck, Homology homology, boolean reducedShown, String referenceMatching, List<PhaseTiming> setup,
        List<MatchingRun> runs, long seed, Optional<OptimalMatching> optimum) {
    /** Validates and copies. */
    public ComparisonReport {
        Objects.requireNonNull(input, "input");
        Objects.requireNonNull(format, "format");
        Objects.requireNonNull(complex, "complex");
        Objects.requireNonNull(cwCheck, "cwCheck");
        Objects.requireNonNull(homology, "homology");
        Objects.requireNonNull(referenceMatching, "referenceMatching");
        if (homology.reduced()) {
            throw new IllegalArgumentException("the Morse bounds need unreduced homology");
        }
        cells = List.copyOf(cells);
        setup = List.copyOf(setup);
        runs = List.copyOf(runs);
        if (runs.isEmpty()) {
            throw new IllegalArgumentException("a comparison needs at least one run");
        }
    }

    /**
     * The Morse lower bound of each dimension, {@code β_d + t_d + t_(d-1)}, t_d counting the torsion
     * factors of H_d: the Morse complex of any acyclic matching is a free chain complex with this
     * homology, whose d-chains need β_d generators for the free part, t_d for the torsion of H_d
     * and t_(d-1) as the boundaries that make the torsion of H_(d-1) (Forman 1998).
     */
    public List<Long> boundByDimension() {
        List<Long> bounds = new ArrayList<>();
        List<HomologyGroup> groups = homology.groups();
        for (int d = 0; d < cells.size(); d++) {
            HomologyGroup g = homology.group(d);
            long below = d > 0 && d - 1 < groups.size() ? homology.group(d - 1).torsion().size() : 0;
            bounds.add(g.betti() + g.torsion().size() + below);
        }
        return bounds;
    }

    /** The Morse lower bound on the total number of critical cells. */
    public long morseLowerBound() {
        return boundByDimension().stream().mapToLong(Long::longValue).sum();
    }

    /** Critical cells of {@code run} beyond the bound. */
    public long excess(MatchingRun run) {
        return run.totalCritical() - morseLowerBound();
    }

    /** The homology as reports show it: reduced when asked for. */
    public Homology shownHomology() {
        return reducedShown ? homology.toReduced() : homology;
    }

    /** Critical cells of {@code run} beyond the best matching found by the exact search, when it ran. */
    public Optional<Long> gap(MatchingRun run) {
        return optimum.map(o -> run.totalCritical() - o.criticalTotal());
    }

    /**
     * For a randomized matching run several times, the spread of its trials' totals against the Morse
     * bound and the exact optimum when it was sought; empty for a single run.
     */
    public Optional<TrialSpectrum> spectrum(MatchingRun run) {
        if (run.trials().isEmpty()) {
            return Optional.empty();
        }
        return Optional.of(TrialSpectrum.of(run.trials(), morseLowerBound(), optimum.map(OptimalMatching::criticalTotal)));
    }

    /** Total number of cells. */
    public long totalCells() {
        return cells.stream().mapToLong(Long::longValue).sum();
    }
}
