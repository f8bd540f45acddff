/**
 * Representative cycles: a basis of each homology group of the Morse complex from Smith normal
 * forms with their transforms, lifted along the gradient flow to cycles of the complex itself.
 */
package dev.morse.cycles;
