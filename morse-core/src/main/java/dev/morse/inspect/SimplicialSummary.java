package dev.morse.inspect;

import java.util.List;

/**
 * What {@link SimplicialInspector} found about a simplicial complex. Immutable.
 *
 * @param vertices number of vertices
 * @param listedFaces number of faces listed in the file
 * @param faces faces per dimension, the f-vector {@code [f0, f1, ...]}
 * @param facets facets (faces in no larger face) per dimension
 */
public record SimplicialSummary(int vertices, int listedFaces, List<Long> faces, List<Long> facets) {
    /** Validates and copies. */
    public SimplicialSummary {
        faces = List.copyOf(faces);
        facets = List.copyOf(facets);
        if (faces.size() != facets.size()) {
            throw new IllegalArgumentException("faces and facets are counted in the same dimensions");
        }
    }

    /** The dimension, -1 without faces. */
    public int dimension() {
        return faces.size() - 1;
    }

    /** The Euler characteristic f0 − f1 + f2 − ... . */
    public long eulerCharacteristic() {
        long chi = 0;
        for (int d = 0; d < faces.size(); d++) {
            chi = d % 2 == 0 ? Math.addExact(chi, faces.get(d)) : Math.subtractExact(chi, faces.get(d));
        }
        return chi;
    }

    /** Total number of facets. */
    public long facetCount() {
        return facets.stream().mapToLong(Long::longValue).sum();
    }

    /** Whether every facet has the top dimension. */
    public boolean pure() {
        return facetCount() == (facets.isEmpty() ? 0 : facets.get(facets.size() - 1));
    }
}
