/**
 * Interval sweeps: the homology of every open interval of a poset with a least and a greatest element
 * adjoined, and the verdicts built on them (pure, Cohen–Macaulay, spherical, Eulerian, Gorenstein*).
 */
package dev.morse.interval;
