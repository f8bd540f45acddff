package dev.morse.complex;

import dev.morse.poset.Adjacency;
import dev.morse.poset.Poset;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import java.util.ArrayList;
import java.util.List;

/**
 * The order complex Δ(P) of a poset: one simplex per nonempty chain, built as the simplicial
 * complex whose facets are the maximal chains (the maximal chains are the cover paths from a
 * minimal to a maximal element). Vertices are numbered along a linear extension, so a simplex's
 * ascending vertices are its chain read upwards.
 *
 * <p>Memory: that of {@link SimplicialComplex}, per chain.
 */
public final class OrderComplex implements ChainComplex {
    private final SimplicialComplex simplices;

    private OrderComplex(SimplicialComplex simplices) {
        this.simplices = simplices;
    }

    /** The order complex of {@code poset}. */
    public static OrderComplex of(Poset poset) {
        int n = poset.size();
        int[] extension = poset.linearExtension();
        int[] position = poset.linearExtensionPositions();
        String[] labels = new String[n];
        for (int i = 0; i < n; i++) {
            labels[i] = poset.label(extension[i]);
        }
        List<int[]> maximalChains = new ArrayList<>();
        Adjacency up = poset.upperCovers();
        for (int x = 0; x < n; x++) {
            if (poset.lowerCovers().degree(x) == 0) {
                IntArrayList chain = new IntArrayList();
                chain.add(position[x]);
                extend(x, chain, up, position, maximalChains);
            }
        }
        return new OrderComplex(new SimplicialComplex(labels, maximalChains, ComplexKind.ORDER, " < "));
    }

    private static void extend(int top, IntArrayList chain, Adjacency up, int[] position, List<int[]> out) {
        if (up.degree(top) == 0) {
            out.add(chain.toIntArray());
            return;
        }
        for (int i = up.start(top); i < up.end(top); i++) {
            int y = up.target(i);
            chain.add(position[y]);
            extend(y, chain, up, position, out);
            chain.removeInt(chain.size() - 1);
        }
    }

    @Override
    public ComplexKind kind() {
        return ComplexKind.ORDER;
    }

    @Override
    public int dimension() {
        return simplices.dimension();
    }

    @Override
    public int cellCount() {
        return simplices.cellCount();
    }

    @Override
    public int cellCount(int d) {
        return simplices.cellCount(d);
    }

    @Override
    public int firstCell(int d) {
        return simplices.firstCell(d);
    }

    @Override
    public int dimensionOf(int cell) {
        return simplices.dimensionOf(cell);
    }

    @Override
    public Boundary boundary() {
        return simplices.boundary();
    }

    @Override
    public Boundary coboundary() {
        return simplices.coboundary();
    }

    @Override
    public String cellName(int cell) {
        return simplices.cellName(cell);
    }
}
