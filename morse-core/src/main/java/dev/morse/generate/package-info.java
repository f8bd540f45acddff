/**
 * Generators of classical posets and complexes with known homology. Also operations on posets and
 * the reference corpus built from them: its writer and the reader of its manifest.
 */
package dev.morse.generate;
