/**
 * Exact homology of chain complexes: sparse Smith normal form over Z, exact ranks over Q and Z/p,
 * a dense oracle to test them against, and the immutable {@link dev.morse.homology.Homology} result.
 */
package dev.morse.homology;
