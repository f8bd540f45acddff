/**
 * Reductions of a poset that keep the homology of its order complex: beat points (Stong 1966) and
 * elements with an acyclic link, applied before the order complex is built.
 */
package dev.morse.posetreduction;
