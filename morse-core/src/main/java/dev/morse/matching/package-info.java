/**
 * Acyclic matchings on the Hasse diagram of a chain complex's cells: the heuristics that build them,
 * an exact solver for optimal ones, and an independent verifier that checks them.
 */
package dev.morse.matching;
