package dev.morse.cli;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;

/** Small input files shared by the command tests; the source of each value is beside it. */
final class Inputs {
    /** The face poset of a square: four corners, four sides, one face; a closed disk and a CW poset. */
    static final String SQUARE = """
            morse-poset 1
            a
            b
            c
            d
            ab: a b
            bc: b c
            cd: c d
            da: d a
            face: ab bc cd da
            """;
    /**
     * The 6-vertex triangulation of RP^2 (classical; REFERENCES.md): f = (6, 15, 10), H = Z, Z/2, 0.
     * The facet list is from memory; HomologyCommandTest checks it independently.
     */
    static final String RP2 = """
            morse-simplicial 1
            1 2 3
            1 3 4
            1 4 5
            1 5 6
            1 2 6
            2 3 5
            3 4 6
            4 5 2
            5 6 3
            6 2 4
            """;
    /** An edge with both ends at one vertex: not a CW poset (an element of height 1 covering one). */
    static final String LOOP = "morse-poset 1\nv\ne: v\n";

    private Inputs() {
    }

    /** Writes {@code text} to {@code dir/name} and returns the path as a string. */
    static String write(Path dir, String name, String text) throws IOException {
        Path file = dir.resolve(name);
        Files.writeString(file, text);
        return file.toString();
    }
}
