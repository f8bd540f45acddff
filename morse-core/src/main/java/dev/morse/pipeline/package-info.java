/**
 * One homology run from a file to a report: detect the format, read, build the chain complex,
 * compute homology, and time each phase. No mathematics of its own.
 */
package dev.morse.pipeline;
