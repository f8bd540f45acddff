package dev.morse.generate;

import dev.morse.poset.Poset;
import dev.morse.poset.PosetBuilder;
import java.util.ArrayList;
import java.util.LinkedHashSet;
import java.util.List;
import java.util.Set;

/**
 * Bing's house with two rooms (Bing, "Some aspects of the topology of 3-manifolds related to the
 * Poincaré conjecture", in Modern Mathematics II, ed. Saaty, 1964; pictured in Hatcher, Algebraic
 * Topology, 2002, Chapter 0; both citations from memory) as a 2-dimensional cubical complex: the face poset of unit squares of
 * the integer grid, with their edges and vertices.
 *
 * <p>The description followed: a box {@code [0,4] × [0,3] × [0,2]} divided by a floor at height 1
 * into a lower and an upper room. The upper room is entered from below through a tunnel, the square
 * tube over {@code [1,2] × [1,2]}, which crosses the lower room from a hole in the bottom to a hole
 * in the floor; the lower room is entered from above through the tube over {@code [2,3] × [1,2]},
 * which crosses the upper room from a hole in the roof to a hole in the floor. Each tube is joined to
 * the outer wall by one supporting wall in the plane y = 1 (x from 0 to 1 below, from 3 to 4 above),
 * which cuts the room around it into a ball; the house is contractible, and no edge lies in fewer
 * than two squares, so no collapse can start. 70 squares. The tests check the homology of a point
 * and the absence of free faces.
 */
public final class BingsHouse {
    private BingsHouse() {
    }

    /** The face poset of the house (a CW poset: its cellular complex is the cubical complex). */
    public static Poset facePoset() {
        Set<String> squares = new LinkedHashSet<>();
        // outer walls: bottom and roof with their holes, the four sides
        for (int x = 0; x < 4; x++) {
            for (int y = 0; y < 3; y++) {
                if (!(x == 1 && y == 1)) {
                    squares.add(square(2 * x + 1, 2 * y + 1, 0));
                }
                if (!(x == 2 && y == 1)) {
                    squares.add(square(2 * x + 1, 2 * y + 1, 4));
                }
                if (!(y == 1 && (x == 1 || x == 2))) {
                    squares.add(square(2 * x + 1, 2 * y + 1, 2));
                }
            }
        }
        for (int z = 0; z < 2; z++) {
            for (int y = 0; y < 3; y++) {
                squares.add(square(0, 2 * y + 1, 2 * z + 1));
                squares.add(square(8, 2 * y + 1, 2 * z + 1));
            }
            for (int x = 0; x < 4; x++) {
                squares.add(square(2 * x + 1, 0, 2 * z + 1));
                squares.add(square(2 * x + 1, 6, 2 * z + 1));
            }
        }
        // the tubes: four walls each, below the floor around [1,2]x[1,2], above it around [2,3]x[1,2]
        tube(squares, 1, 1);
        tube(squares, 2, 3);
        // supporting walls in the plane y = 1
        squares.add(square(1, 2, 1));
        squares.add(square(7, 2, 3));
        return build(squares);
    }

    private static void tube(Set<String> squares, int x, int zCentre) {
        squares.add(square(2 * x, 3, zCentre));
        squares.add(square(2 * x + 2, 3, zCentre));
        squares.add(square(2 * x + 1, 2, zCentre));
        squares.add(square(2 * x + 1, 4, zCentre));
    }

    /** A cell by doubled coordinates: odd coordinates are the directions it spans. */
    private static String square(int x, int y, int z) {
        return x + "." + y + "." + z;
    }

    private static Poset build(Set<String> squares) {
        PosetBuilder builder = new PosetBuilder();
        List<String> pending = new ArrayList<>(squares);
        Set<String> seen = new LinkedHashSet<>(squares);
        while (!pending.isEmpty()) {
            String cell = pending.remove(pending.size() - 1);
            int id = builder.element(cell);
            String[] parts = cell.split("\\.");
            int[] c = {Integer.parseInt(parts[0]), Integer.parseInt(parts[1]), Integer.parseInt(parts[2])};
            for (int axis = 0; axis < 3; axis++) {
                if (c[axis] % 2 == 1) {
                    for (int step : new int[] {-1, 1}) {
                        int[] f = c.clone();
                        f[axis] += step;
                        String face = square(f[0], f[1], f[2]);
                        builder.relate(builder.element(face), id, 0);
                        if (seen.add(face)) {
                            pending.add(face);
                        }
                    }
                }
            }
        }
        return builder.buildKnownAcyclic();
    }
}
