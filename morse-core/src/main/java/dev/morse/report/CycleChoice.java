package dev.morse.report;

import dev.morse.cycles.Cycle;
import dev.morse.io.InputException;
import java.util.List;

/**
 * Which representative cycle a picture marks: the {@code index}-th generator (from 1) of the
 * homology in {@code dimension}, in the order {@code homology --cycles} lists them, or with
 * {@link #HIGHEST} the first generator of the highest dimension above 0 that has one (of H_0 when
 * no other has any).
 *
 * @param dimension the dimension, or -1 for the default
 * @param index the generator's place among those of its dimension, from 1
 */
public record CycleChoice(int dimension, int index) {
    /** The first generator of the highest dimension above 0 that has one. */
    public static final CycleChoice HIGHEST = new CycleChoice(-1, 1);

    /** Validates. */
    public CycleChoice {
        if (dimension < -1 || index < 1) {
            throw new IllegalArgumentException("a cycle is chosen by a dimension of at least 0 and a place from 1");
        }
    }

    /**
     * Reads {@code D} or {@code D:K}.
     *
     * @throws IllegalArgumentException when the text is neither
     */
    public static CycleChoice parse(String text) {
        String[] parts = text.split(":", -1);
        try {
            int d = Integer.parseInt(parts[0]);
            int k = parts.length == 2 ? Integer.parseInt(parts[1]) : 1;
            if (parts.length > 2 || d < 0 || k < 1) {
                throw new NumberFormatException();
            }
            return new CycleChoice(d, k);
        } catch (NumberFormatException e) {
            throw new IllegalArgumentException("'" + text + "' is not a dimension D or D:K (K-th generator, from 1)");
        }
    }

    /**
     * The chosen cycle among {@code cycles}, with its place within its dimension (from 1).
     *
     * @throws InputException when there is no such cycle, naming how many the dimension has
     */
    public Chosen pick(List<Cycle> cycles, String source) {
        int d = dimension;
        if (d < 0) {
            d = cycles.stream().mapToInt(Cycle::dimension).filter(x -> x > 0).max().orElse(0);
        }
        final int wanted = d;
        List<Cycle> ofDimension = cycles.stream().filter(c -> c.dimension() == wanted).toList();
        if (index > ofDimension.size()) {
            throw new InputException(source, InputException.NO_LINE, "there is no generator " + index + " of H_" + d
                    + ": the homology in dimension " + d + " has " + Counted.of(ofDimension.size(), "generator"));
        }
        return new Chosen(ofDimension.get(index - 1), index, ofDimension.size());
    }

    /**
     * A chosen cycle.
     *
     * @param cycle the cycle
     * @param index its place among the generators of its dimension, from 1
     * @param of how many generators that dimension has
     */
    public record Chosen(Cycle cycle, int index, int of) {
        /** One line naming it, such as {@code cycle: generator 1 of 2 of H_1, free, 4 terms}. */
        public String description() {
            return "cycle: generator " + index + " of " + of + " of H_" + cycle.dimension() + ", "
                    + (cycle.order().signum() == 0 ? "free" : "of order " + cycle.order()) + ", "
                    + Counted.of(cycle.terms().size(), "term");
        }
    }
}
