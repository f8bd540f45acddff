package dev.morse.mesh;

import dev.morse.io.InputException;
import dev.morse.io.TextFiles;
import it.unimi.dsi.fastutil.ints.IntArrayList;
import java.io.BufferedReader;
import java.io.IOException;
import java.nio.file.Path;

/**
 * Reads polygon meshes, keeping only what the topology needs: how many vertices, and the polygons.
 * <ul>
 * <li>Wavefront OBJ (common practice): {@code v} lines are vertices, numbered from 1; {@code f} lines
 *     are polygons whose entries are {@code i}, {@code i/t}, {@code i//n} or {@code i/t/n}, of which
 *     only the vertex index {@code i} counts; a negative index counts back from the latest vertex
 *     ({@code -1} is the one just before). Every other statement ({@code vt}, {@code vn}, {@code g},
 *     {@code o}, {@code usemtl}, ...) and {@code #} comments are ignored.
 * <li>OFF (common practice): the line {@code OFF}, then {@code VERTICES FACES EDGES}, then a line per
 *     vertex, then a line per face {@code K i_1 .. i_K} (vertices numbered from 0; anything after the
 *     K indices, such as a colour, is ignored). {@code #} starts a comment.
 * </ul>
 * Errors name the file and the line.
 */
public final class MeshReader {
    private MeshReader() {
    }

    /** Reads an OBJ file. */
    public static PolygonMesh readObj(Path file) throws IOException {
        return TextFiles.read(file, MeshReader::readObj);
    }

    /** Reads OBJ text held in a string. */
    public static PolygonMesh parseObj(String text, String source) {
        return TextFiles.fromString(text, source, MeshReader::readObj);
    }

    /** Reads an OFF file. */
    public static PolygonMesh readOff(Path file) throws IOException {
        return TextFiles.read(file, MeshReader::readOff);
    }

    /** Reads OFF text held in a string. */
    public static PolygonMesh parseOff(String text, String source) {
        return TextFiles.fromString(text, source, MeshReader::readOff);
    }

    private static PolygonMesh readObj(BufferedReader reader, String source) throws IOException {
        int vertices = 0;
        IntArrayList offsets = new IntArrayList();
        offsets.add(0);
        IntArrayList corners = new IntArrayList();
        IntArrayList lines = new IntArrayList();
        IntArrayList pendingLines = new IntArrayList();
        IntArrayList pendingCorners = new IntArrayList();
        String line;
        int number = 0;
        while ((line = reader.readLine()) != null) {
            number++;
            String[] words = words(line);
            if (words.length == 0) {
                continue;
            }
            if (words[0].equals("v")) {
                vertices++;
            } else if (words[0].equals("f")) {
                for (int i = 1; i < words.length; i++) {
                    String entry = words[i];
                    int slash = entry.indexOf('/');
                    String index = slash >= 0 ? entry.substring(0, slash) : entry;
                    int k;
                    try {
                        k = Integer.parseInt(index);
                    } catch (NumberFormatException e) {
                        throw new InputException(source, number, "'" + entry + "' is not a vertex index");
                    }
                    if (k == 0) {
                        throw new InputException(source, number, "vertex index 0: OBJ numbers vertices from 1");
                    }
                    if (k < 0) {
                        if (-k > vertices) {
                            throw new InputException(source, number, "vertex index " + k + " reaches back past the "
                                    + vertices + " vertices given so far");
                        }
                        corners.add(vertices + k);
                    } else {
                        // a positive index may name a vertex given further down; checked at the end
                        corners.add(k - 1);
                        pendingLines.add(number);
                        pendingCorners.add(k);
                    }
                }
                offsets.add(corners.size());
                lines.add(number);
            }
        }
        for (int i = 0; i < pendingCorners.size(); i++) {
            if (pendingCorners.getInt(i) > vertices) {
                throw new InputException(source, pendingLines.getInt(i), "vertex index " + pendingCorners.getInt(i)
                        + " is out of range: the file has " + vertices + " vertices");
            }
        }
        return PolygonMesh.of(source, vertices, 1, offsets.toIntArray(), corners.toIntArray(), lines.toIntArray());
    }

    private static PolygonMesh readOff(BufferedReader reader, String source) throws IOException {
        String line;
        int number = 0;
        int[] counts = null;
        boolean header = false;
        int verticesSeen = 0;
        IntArrayList offsets = new IntArrayList();
        offsets.add(0);
        IntArrayList corners = new IntArrayList();
        IntArrayList lines = new IntArrayList();
        while ((line = reader.readLine()) != null) {
            number++;
            String[] words = words(line);
            if (words.length == 0) {
                continue;
            }
            int from = 0;
            if (!header) {
                if (!words[0].equals("OFF")) {
                    throw new InputException(source, number, "expected the header 'OFF'");
                }
                header = true;
                from = 1;
                if (words.length == 1) {
                    continue;
                }
            }
            if (counts == null) {
                if (words.length - from != 3) {
                    throw new InputException(source, number, "expected the counts 'VERTICES FACES EDGES'");
                }
                counts = new int[3];
                for (int i = 0; i < 3; i++) {
                    counts[i] = TextFiles.wholeNumber(words[from + i], "count", source, number);
                }
                continue;
            }
            if (verticesSeen < counts[0]) {
                if (words.length < 3) {
                    throw new InputException(source, number, "expected the coordinates of a vertex 'X Y Z'");
                }
                verticesSeen++;
                continue;
            }
            if (lines.size() == counts[1]) {
                throw new InputException(source, number, "more lines than the " + counts[0] + " vertices and "
                        + counts[1] + " faces the counts announce");
            }
            int k = TextFiles.wholeNumber(words[0], "number of vertices of a face", source, number);
            if (words.length < k + 1) {
                throw new InputException(source, number, "the face announces " + k + " vertices but lists "
                        + (words.length - 1));
            }
            for (int i = 1; i <= k; i++) {
                int v = TextFiles.wholeNumber(words[i], "vertex index", source, number);
                if (v >= counts[0]) {
                    throw new InputException(source, number, "vertex index " + v + " is out of range: there are "
                            + counts[0] + " vertices, numbered from 0");
                }
                corners.add(v);
            }
            offsets.add(corners.size());
            lines.add(number);
        }
        if (!header) {
            throw new InputException(source, InputException.NO_LINE, "empty: expected the header 'OFF'");
        }
        if (counts == null || verticesSeen < counts[0] || lines.size() < counts[1]) {
            throw new InputException(source, InputException.NO_LINE, "the file ends early: "
                    + (counts == null ? "no counts line" : verticesSeen + " of " + counts[0] + " vertices and "
                            + lines.size() + " of " + counts[1] + " faces"));
        }
        return PolygonMesh.of(source, counts[0], 0, offsets.toIntArray(), corners.toIntArray(), lines.toIntArray());
    }

    /** The words of a line with its {@code #} comment cut off. */
    private static String[] words(String line) {
        int hash = line.indexOf('#');
        String content = (hash >= 0 ? line.substring(0, hash) : line).strip();
        return content.isEmpty() ? new String[0] : content.split("\\s+");
    }

}
