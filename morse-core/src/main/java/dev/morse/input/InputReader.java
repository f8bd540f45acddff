package dev.morse.input;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/**
 * One input format. Implementations keep no state; {@link InputReaders} holds them in one list,
 * asks each in turn whether it takes a file, and turns file-system failures into one-line errors,
 * so a reader reports only what is wrong inside a file.
 */
public interface InputReader {
    /** Whether this reader takes the files described by {@code probe}. */
    boolean recognises(InputProbe probe);

    /**
     * Reads the files.
     *
     * @throws dev.morse.io.InputException naming the file, and the line where one is to blame
     * @throws IOException when reading fails for a reason that is not the file's content
     */
    Input read(List<Path> files, ReadOptions options) throws IOException;
}
