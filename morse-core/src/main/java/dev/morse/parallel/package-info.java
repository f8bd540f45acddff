/**
 * How many threads the parallel phases use and the one pool they share; every parallel phase
 * gives the same result with one thread as with many.
 */
package dev.morse.parallel;
