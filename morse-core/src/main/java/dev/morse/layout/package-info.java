/**
 * Layered drawings of graphs whose nodes sit on given levels (Hasse diagrams by rank): the proper
 * layered graph with dummy nodes, orderings of each layer that reduce edge crossings, the exact
 * crossing count, and horizontal coordinates. Plain int arrays in, plain arrays out.
 */
package dev.morse.layout;
