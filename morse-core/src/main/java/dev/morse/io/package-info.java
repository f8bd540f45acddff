/**
 * Reading and writing the text formats {@code morse-poset 1} and {@code morse-simplicial 1}.
 * Readers stream line by line and report bad input as an {@link dev.morse.io.InputException}.
 */
package dev.morse.io;
