package dev.morse.batch;

import java.io.Serializable;
import java.util.Objects;

/**
 * One input of a batch, the unit of its work: the file as the user named it, and its place in the
 * batch. A plain serialisable value, so that the work can be shipped to other machines.
 *
 * @param index the place in the batch, from 0
 * @param path the file as named
 */
public record BatchItem(int index, String path) implements Serializable {
    private static final long serialVersionUID = 1L;

    /** Validates. */
    public BatchItem {
        Objects.requireNonNull(path, "path");
        if (index < 0) {
            throw new IllegalArgumentException("negative index");
        }
    }
}
