/**
 * What was read: one sealed {@link dev.morse.input.Input} per kind of object, and the one registry of
 * readers that tells a file's format and turns every problem with the file into a one-line error.
 */
package dev.morse.input;
