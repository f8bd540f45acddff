package dev.morse.cli;

import dev.morse.complex.ComplexChoice;
import dev.morse.generate.FacePart;
import dev.morse.report.CycleChoice;
import dev.morse.image.VolumeSize;
import java.util.Collections;
import java.util.Set;
import java.util.StringJoiner;
import java.util.TreeSet;
import dev.morse.homology.Coefficients;
import dev.morse.implicit.ElementOrder;
import dev.morse.engine.Request;
import dev.morse.matching.MatchingHeuristics;
import java.util.Iterator;
import java.util.function.Function;
import java.util.function.Supplier;
import java.util.stream.Stream;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/** Turns option text into morse-core values, with messages that say what is allowed. */
final class OptionConverters {
    private OptionConverters() {
    }

    /** A converter by a morse-core parse method, whose IllegalArgumentException is the message users see. */
    abstract static class Parsed<T> implements ITypeConverter<T> {
        private final Function<String, T> parse;

        Parsed(Function<String, T> parse) {
            this.parse = parse;
        }

        @Override
        public final T convert(String value) {
            try {
                return parse.apply(value);
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }

    /**
     * A converter by a morse-core parse method that also names the values it accepts, for help and
     * shell completion: one class serves as an option's {@code converter} and its
     * {@code completionCandidates}.
     */
    abstract static class Named<T> extends Parsed<T> implements Iterable<String> {
        private final Supplier<Stream<String>> names;

        Named(Function<String, T> parse, Supplier<Stream<String>> names) {
            super(parse);
            this.names = names;
        }

        @Override
        public final Iterator<String> iterator() {
            return names.get().iterator();
        }
    }

    /** {@code auto}, {@code order}, {@code cellular} or {@code implicit}. */
    static final class ComplexValues extends Named<ComplexChoice> {
        ComplexValues() {
            super(ComplexChoice::parse, () -> Stream.of(ComplexChoice.values()).map(ComplexChoice::optionName));
        }
    }

    /** An element order of the implicit order complex. */
    static final class ElementOrderValues extends Named<ElementOrder> {
        ElementOrderValues() {
            super(ElementOrder::parse, () -> Stream.of(ElementOrder.values()).map(ElementOrder::optionName));
        }
    }

    /** {@code Z}, {@code Q} or a prime. */
    static final class CoefficientsConverter extends Parsed<Coefficients> {
        CoefficientsConverter() {
            super(Coefficients::parse);
        }
    }

    /** A matching name known to morse-core. */
    static final class MatchingValues extends Named<String> {
        MatchingValues() {
            super(Request::requireKnownMatching, () -> MatchingHeuristics.everyKnown().keySet().stream());
        }
    }

    /** {@code boundary}, {@code closed} or {@code lattice}. */
    static final class FacePartConverter implements ITypeConverter<FacePart> {
        @Override
        public FacePart convert(String value) {
            for (FacePart part : FacePart.values()) {
                if (part.optionName().equals(value.strip())) {
                    return part;
                }
            }
            throw new TypeConversionException("the part must be boundary, closed or lattice, not '" + value + "'");
        }
    }

    /** The complex of a graph: clique, independence, matching or connected-subgraphs. */
    static final class GraphComplexConverter implements ITypeConverter<dev.morse.graph.GraphComplex> {
        @Override
        public dev.morse.graph.GraphComplex convert(String value) {
            return dev.morse.graph.GraphComplex.byName(value.strip()).orElseThrow(() -> new TypeConversionException(
                    "the complex of a graph must be clique, independence, matching or connected-subgraphs, not '"
                            + value + "'"));
        }
    }

    /** Sizes like {@code 64,64,32}. */
    static final class VolumeSizeConverter extends Parsed<VolumeSize> {
        VolumeSizeConverter() {
            super(VolumeSize::parse);
        }
    }

    /**
     * A set of ranks, ascending.
     *
     * @param values the ranks
     */
    record Ranks(Set<Integer> values) {
        /** Copies. */
        Ranks {
            values = Collections.unmodifiableSet(new TreeSet<>(values));
        }

        /** The ranks joined by commas. */
        @Override
        public String toString() {
            StringJoiner text = new StringJoiner(",");
            values.forEach(r -> text.add(Integer.toString(r)));
            return text.toString();
        }
    }

    /** A set of ranks like {@code 1,3} or {@code 0,2-4}. */
    static final class RanksConverter implements ITypeConverter<Ranks> {
        private static final int MAX_RANK_RANGE = 1_000_000;

        @Override
        public Ranks convert(String value) {
            Set<Integer> ranks = new TreeSet<>();
            for (String part : value.split(",", -1)) {
                String p = part.strip();
                try {
                    int dash = p.indexOf('-');
                    int from = Integer.parseInt(dash < 0 ? p : p.substring(0, dash).strip());
                    int to = dash < 0 ? from : Integer.parseInt(p.substring(dash + 1).strip());
                    if (from < 0 || to < from || to - from > MAX_RANK_RANGE) {
                        throw new TypeConversionException("ranks must be non-negative, ranges ascending and shorter"
                                + " than " + MAX_RANK_RANGE + ": '" + p + "'");
                    }
                    for (int r = from; r <= to; r++) {
                        ranks.add(r);
                    }
                } catch (NumberFormatException e) {
                    throw new TypeConversionException("ranks must be numbers or ranges like 1,3 or 0,2-4, not '"
                            + value + "'");
                }
            }
            return new Ranks(ranks);
        }
    }

    /** {@code D} or {@code D:K}: the K-th generator of H_D. */
    static final class CycleChoiceConverter extends Parsed<CycleChoice> {
        CycleChoiceConverter() {
            super(CycleChoice::parse);
        }
    }
}
