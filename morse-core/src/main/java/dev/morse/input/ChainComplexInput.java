package dev.morse.input;

import dev.morse.complex.ChainComplex;

/**
 * A chain complex given by its boundary matrices, as read: one cell per basis element, the
 * boundary as the matrices say, already checked to square to zero.
 *
 * @param source the name the input was given by (a directory, or the files joined by spaces)
 * @param complex the chain complex
 * @param readMillis milliseconds spent reading
 */
public record ChainComplexInput(String source, ChainComplex complex, double readMillis) implements Input {
}
