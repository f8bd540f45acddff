/**
 * Exact homology: sparse Smith normal form over the integers, ranks over Z/p and Q, and the
 * immutable {@link dev.morse.homology.Homology} result.
 */
package dev.morse.homology;
