/**
 * Finite posets as int ids with labels and a Hasse diagram held in CSR arrays in both directions;
 * building one from generating relations (transitive reduction, cycle detection).
 */
package dev.morse.poset;
