/**
 * Interval sweeps and batches distributed over Apache Spark, with the results of the single-machine
 * sweep and batch of morse-core: the units of work are the core's serialisable values, the results are
 * put back in the core's order and written by the core's writers.
 */
package dev.morse.spark;
