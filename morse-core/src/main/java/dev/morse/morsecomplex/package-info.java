/**
 * The Morse complex of an acyclic matching: boundaries between critical cells from gradient paths,
 * and its further algebraic reduction on unit entries.
 */
package dev.morse.morsecomplex;
