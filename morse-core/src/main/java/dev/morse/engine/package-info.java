/**
 * From an input to a computation: the one policy that chooses the complex and the engine, the stored
 * and implicit engines behind one interface, and the {@link dev.morse.engine.Computation} value that
 * keeps what a run found for every report, picture and export.
 */
package dev.morse.engine;
