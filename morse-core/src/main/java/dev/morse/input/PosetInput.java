package dev.morse.input;

import dev.morse.poset.Poset;

/**
 * A poset file as read; it stands for the order complex of the poset.
 *
 * @param source the name the file was given by
 * @param poset the poset
 * @param readMillis milliseconds spent reading
 */
public record PosetInput(String source, Poset poset, double readMillis) implements Input {
}
