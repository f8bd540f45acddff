package dev.morse.pipeline;

import dev.morse.complex.ComplexChoice;
import dev.morse.cw.ComplexSelection;
import dev.morse.cw.ComplexSelector;
import dev.morse.complex.SimplicialComplex;
import dev.morse.image.ImageInput;
import dev.morse.io.InputException;
import dev.morse.io.InputFormat;
import dev.morse.io.PosetReader;
import dev.morse.io.SimplicialReader;
import java.io.IOException;
import java.nio.file.AccessDeniedException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.util.Optional;

/**
 * Reads an input file of either format and builds its chain complex, turning every problem with
 * the file into an {@link InputException} naming it, as {@link HomologyPipeline} does. Shared by
 * the commands that look at one input in other ways than its homology. Stateless.
 */
public final class InputLoader {
    private InputLoader() {
    }

    /**
     * Reads {@code file}, detecting its format from the header.
     *
     * @throws InputException for bad input, including a missing, unreadable or directory file
     * @throws IOException when reading fails for another reason
     */
    public static LoadedInput load(Path file) throws IOException {
        String source = file.toString();
        if (!Files.exists(file)) {
            throw new InputException(source, InputException.NO_LINE, "no such file");
        }
        if (Files.isDirectory(file)) {
            throw new InputException(source, InputException.NO_LINE, "is a directory, not a file");
        }
        if (ImageInput.isImageFile(file)) {
            throw new InputException(source, InputException.NO_LINE,
                    "is an image; images are read by 'morse homology', this needs a poset or simplicial file");
        }
        long start = System.nanoTime();
        try {
            return switch (InputFormat.detect(file)) {
                case POSET -> LoadedInput.ofPoset(source, PosetReader.read(file), millisSince(start));
                case SIMPLICIAL -> LoadedInput.ofFacets(source, SimplicialReader.read(file), millisSince(start));
                case IMAGE, VOLUME -> throw new AssertionError("header detection finds only text formats");
            };
        } catch (NoSuchFileException e) {
            throw new InputException(source, InputException.NO_LINE, "no such file");
        } catch (AccessDeniedException e) {
            throw new InputException(source, InputException.NO_LINE, "cannot be read: permission denied");
        }
    }

    /**
     * Reads text held in memory; {@code source} names it in error messages.
     *
     * @throws InputException for bad input
     */
    public static LoadedInput parse(String source, String text) {
        long start = System.nanoTime();
        return switch (InputFormat.detect(text, source)) {
            case POSET -> LoadedInput.ofPoset(source, PosetReader.parse(text, source), millisSince(start));
            case SIMPLICIAL -> LoadedInput.ofFacets(source, SimplicialReader.parse(text, source), millisSince(start));
            case IMAGE, VOLUME -> throw new AssertionError("header detection finds only text formats");
        };
    }

    /**
     * The chain complex of {@code input}: for a poset the one {@code choice} asks for (see
     * {@link ComplexChoice}), for a simplicial input its own complex.
     *
     * @throws InputException when the cellular complex is demanded of a poset that is not a CW
     *     poset, when a choice of complex is made for a simplicial input, or when the complex is too
     *     large to build
     */
    public static BuiltComplex complex(LoadedInput input, ComplexChoice choice) {
        long start = System.nanoTime();
        try {
            if (input.format() == InputFormat.SIMPLICIAL) {
                if (choice != ComplexChoice.AUTO) {
                    throw new InputException(input.source(), InputException.NO_LINE,
                            "a simplicial file has only its own complex; the choice of complex applies to poset files");
                }
                return new BuiltComplex(simplicialComplex(input), Optional.empty(), millisSince(start));
            }
            ComplexSelection selection;
            try {
                selection = ComplexSelector.selectWithVerdict(input.poset(), choice);
            } catch (IllegalArgumentException notCw) {
                throw new InputException(input.source(), InputException.NO_LINE,
                        "the cellular complex needs a CW poset, and this is not one: " + notCw.getMessage());
            }
            return new BuiltComplex(selection.complex(), selection.verdict(), millisSince(start));
        } catch (IllegalStateException e) {
            // the complexes refuse to build past their cell limits with this exception, before allocating
            throw new InputException(input.source(), InputException.NO_LINE, "too large to compute: " + e.getMessage());
        }
    }

    /**
     * The simplicial complex of a simplicial input.
     *
     * @throws InputException when it has more faces than a complex can hold
     */
    public static SimplicialComplex simplicialComplex(LoadedInput input) {
        if (input.format() != InputFormat.SIMPLICIAL) {
            throw new IllegalArgumentException("not a simplicial input: " + input.source());
        }
        try {
            return SimplicialComplex.of(input.facets());
        } catch (IllegalStateException e) {
            throw new InputException(input.source(), InputException.NO_LINE, "too large to compute: " + e.getMessage());
        }
    }

    private static double millisSince(long startNanos) {
        return Math.max(0, System.nanoTime() - startNanos) / 1e6;
    }
}
