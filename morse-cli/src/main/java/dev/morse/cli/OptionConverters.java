package dev.morse.cli;

import dev.morse.complex.ComplexChoice;
import dev.morse.homology.Coefficients;
import dev.morse.implicit.ElementOrder;
import dev.morse.pipeline.HomologyPipeline;
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

    /** A matching name known to the pipeline. */
    static final class MatchingConverter implements ITypeConverter<String> {
        @Override
        public String convert(String value) {
            try {
                return HomologyPipeline.requireKnownMatching(value);
            } catch (IllegalArgumentException e) {
                throw new TypeConversionException(e.getMessage());
            }
        }
    }

    /** The names shown for {@code --matching}. */
    static final class MatchingNames implements Iterable<String> {
        @Override
        public Iterator<String> iterator() {
            List<String> names = HomologyPipeline.matchingNames();
            return names.iterator();
        }
    }
}
