package dev.morse.cycles;

import dev.morse.complex.ChainComplex;
import dev.morse.complex.OrderComplex;
import dev.morse.complex.SimplicialComplex;
import dev.morse.image.CubicalComplex;
import java.util.ArrayList;
import java.util.List;

/**
 * A cell in the input's own terms, as the JSON contract of representative cycles writes it: a
 * simplex by its vertex labels, a chain by its element labels from the bottom up (both in the order
 * that orients them), a cell of a CW poset by its element's label alone, an elementary cube by one
 * {@code [low, high]} pair per axis in pixel units.
 */
final class CellLabels {
    private CellLabels() {
    }

    static List<Object> of(ChainComplex complex, int cell) {
        List<Object> label = new ArrayList<>();
        if (complex instanceof SimplicialComplex simplicial) {
            for (int v : simplicial.simplex(cell)) {
                label.add(simplicial.facets().vertexLabel(v));
            }
        } else if (complex instanceof OrderComplex order) {
            for (int x : order.chain(cell)) {
                label.add(order.poset().label(x));
            }
        } else if (complex instanceof CubicalComplex cubes) {
            int[] cube = cubes.cube(cell);
            for (int a = 0; a < cube.length / 2; a++) {
                label.add(List.of(cube[2 * a], cube[2 * a] + cube[2 * a + 1]));
            }
        } else {
            label.add(complex.cellName(cell));
        }
        return label;
    }
}
