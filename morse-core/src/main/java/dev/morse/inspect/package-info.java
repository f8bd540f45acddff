/**
 * What an input is, apart from its homology: sizes, ranks, gradedness, thinness, the CW poset
 * verdict, chain counts, Euler characteristic and Möbius function, gathered into summary values.
 */
package dev.morse.inspect;
