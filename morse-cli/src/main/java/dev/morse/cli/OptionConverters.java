package dev.morse.cli;

import dev.morse.complex.ComplexChoice;
import dev.morse.generate.FacePart;
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
import java.util.List;
import java.util.stream.Stream;
import picocli.CommandLine.ITypeConverter;
import picocli.CommandLine.TypeConversionException;

/** Turns option text into morse-core values, with messages that say what is allowed. */
final class OptionConverters {
    private OptionConverters() {
    }

    /** {@code auto}, {@code order}, {@code cellular} or {@code implicit}. */
    static final class ComplexConverter implements ITypeConverter<ComplexChoice> {
        @Override
        public ComplexChoice convert(String value) {
            try {
                return ComplexChoice.parse(value);
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }

    /** The names shown for {@code --complex}. */
    static final class ComplexNames implements Iterable<String> {
        @Override
        public Iterator<String> iterator() {
            return Stream.of(ComplexChoice.values()).map(ComplexChoice::optionName).iterator();
        }
    }

    /** An element order of the implicit order complex. */
    static final class ElementOrderConverter implements ITypeConverter<ElementOrder> {
        @Override
        public ElementOrder convert(String value) {
            try {
                return ElementOrder.parse(value);
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }

    /** The names shown for {@code --element-order}. */
    static final class ElementOrderNames implements Iterable<String> {
        @Override
        public Iterator<String> iterator() {
            return Stream.of(ElementOrder.values()).map(ElementOrder::optionName).iterator();
        }
    }

    /** {@code Z}, {@code Q} or a prime. */
    static final class CoefficientsConverter implements ITypeConverter<Coefficients> {
        @Override
        public Coefficients convert(String value) {
            try {
                return Coefficients.parse(value);
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }

    /** A matching name known to morse-core. */
    static final class MatchingConverter implements ITypeConverter<String> {
        @Override
        public String convert(String value) {
            try {
                return Request.requireKnownMatching(value);
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }

    /** The names shown for {@code --matching}. */
    static final class MatchingNames implements Iterable<String> {
        @Override
        public Iterator<String> iterator() {
            List<String> names = MatchingHeuristics.names();
            return names.iterator();
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

    /** Sizes like {@code 64,64,32}. */
    static final class VolumeSizeConverter implements ITypeConverter<VolumeSize> {
        @Override
        public VolumeSize convert(String value) {
            try {
                return VolumeSize.parse(value);
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
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
}
