/**
 * Graphs: a simple graph in CSR arrays, its readers (Graphviz DOT and GraphML through jgrapht-io, and
 * a plain edge list), and the complexes of a graph: clique, independence, matching complexes and the
 * poset of connected induced subgraphs.
 */
package dev.morse.graph;
