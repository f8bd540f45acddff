/**
 * Many inputs in one run: each read, computed and reported on its own, failures included, on a
 * bounded pool of threads, in the order the inputs were given.
 */
package dev.morse.batch;
