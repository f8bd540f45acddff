package dev.morse.io;

import dev.morse.complex.Facets;
import java.io.IOException;
import java.io.Writer;

/** Writes listed faces in the {@code morse-simplicial 1} format, one face per line. */
public final class SimplicialWriter {
    private SimplicialWriter() {
    }

    /** Writes {@code facets} to {@code out}; does not close it. */
    public static void write(Facets facets, Writer out) throws IOException {
        out.write(SimplicialReader.KIND + " " + SimplicialReader.VERSION + "\n");
        for (int f = 0; f < facets.faceCount(); f++) {
            int[] face = facets.face(f);
            for (int i = 0; i < face.length; i++) {
                if (i > 0) {
                    out.write(' ');
                }
                out.write(facets.vertexLabel(face[i]));
            }
            out.write('\n');
        }
    }

    /** The faces as text. */
    public static String toText(Facets facets) {
        return TextOutput.render(w -> write(facets, w));
    }
}
