/**
 * Recognising CW posets: the check that every open lower interval is a sphere of the right
 * dimension, the incidence signs it finds, and the cellular complex built from them.
 */
package dev.morse.cw;
