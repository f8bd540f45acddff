/**
 * How far a long computation is: the {@link dev.morse.progress.Progress} sink that phases report to
 * (silent unless one is installed), a counter to read from another thread, and a one-line display.
 */
package dev.morse.progress;
