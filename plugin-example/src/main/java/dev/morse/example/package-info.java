/**
 * An example plug-in: a matching heuristic in its own jar, found by {@link java.util.ServiceLoader}
 * through {@code META-INF/services/dev.morse.matching.MatchingHeuristic}.
 */
package dev.morse.example;
