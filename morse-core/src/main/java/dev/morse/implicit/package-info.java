/**
 * Homology of order complexes too large to store: chains are generated on demand, the critical
 * chains of a lexicographic acyclic matching are found by a pruned walk over maximal chains, and the
 * Morse boundary follows gradient paths locally.
 */
package dev.morse.implicit;
