package dev.morse.implicit;

/**
 * What the walk over maximal chains did.
 *
 * @param nodes chains from 0̂ that the walk extended or looked at
 * @param facets maximal chains reached
 * @param skippedSubtrees subtrees left out because every fibre in them is resolved
 * @param defectiveFacets maximal chains whose fibre needed the element-by-element matching
 */
public record SearchStatistics(long nodes, long facets, long skippedSubtrees, long defectiveFacets) {
}
