package dev.morse.input;

import dev.morse.io.InputFormat;
import dev.morse.mesh.MeshReader;
import dev.morse.mesh.PolygonMesh;
import java.io.IOException;
import java.nio.file.Path;
import java.util.List;

/**
 * Polygon meshes (OBJ, OFF), read as the face poset of their regular CW complex; the complex policy
 * then finds it a CW poset and uses the cellular complex.
 */
final class MeshFileReader implements InputReader {
    @Override
    public boolean recognises(InputProbe probe) {
        return probe.header().filter(f -> f == InputFormat.OBJ || f == InputFormat.OFF).isPresent();
    }

    @Override
    public Input read(List<Path> files, ReadOptions options) throws IOException {
        long start = System.nanoTime();
        Path file = files.get(0);
        PolygonMesh mesh = InputFormat.sniff(file) == InputFormat.OBJ ? MeshReader.readObj(file) : MeshReader.readOff(file);
        return new PosetInput(file.toString(), mesh.facePoset(), InputReaders.millisSince(start));
    }
}
