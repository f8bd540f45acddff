/**
 * Chain complexes with graded cells and sparse integer boundaries: the order complex of a poset,
 * the cellular complex of a CW poset (with the check that recognises one), and simplicial complexes.
 */
package dev.morse.complex;
