package dev.morse.testing;

import java.awt.image.BufferedImage;
import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import javax.imageio.ImageIO;

/**
 * Shapes with known homology as pixel or voxel masks, and writers of the image formats for them.
 * The writers follow the Netpbm format pages (common practice) and are independent of the readers
 * under test.
 */
public final class TestImages {
    private TestImages() {
    }

    /**
     * A square ring one pixel wide: the pixels at Chebyshev distance 2 from the centre of a 7 x 7
     * image. The union of their closed squares is an annulus: H = Z, Z (common practice).
     */
    public static boolean[][] ring() {
        boolean[][] mask = new boolean[7][7];
        for (int y = 0; y < 7; y++) {
            for (int x = 0; x < 7; x++) {
                mask[y][x] = Math.max(Math.abs(x - 3), Math.abs(y - 3)) == 2;
            }
        }
        return mask;
    }

    /** A 5 x 5 x 5 solid cube without its centre voxel: H = Z, 0, Z, 0 (common practice). Indexed [z][y][x]. */
    public static boolean[][][] cubeWithCavity() {
        boolean[][][] v = new boolean[5][5][5];
        for (int z = 0; z < 5; z++) {
            for (int y = 0; y < 5; y++) {
                for (int x = 0; x < 5; x++) {
                    v[z][y][x] = !(x == 2 && y == 2 && z == 2);
                }
            }
        }
        return v;
    }

    /** A square frame 5 x 5, one voxel wide, two voxels high: a solid torus, H = Z, Z, 0, 0. Indexed [z][y][x]. */
    public static boolean[][][] solidTorus() {
        boolean[][][] v = new boolean[2][5][5];
        for (int z = 0; z < 2; z++) {
            for (int y = 0; y < 5; y++) {
                for (int x = 0; x < 5; x++) {
                    v[z][y][x] = x == 0 || x == 4 || y == 0 || y == 4;
                }
            }
        }
        return v;
    }

    /**
     * A thickened torus surface T^2 x I: a 9 x 9 x 5 solid torus (a box around a 3 x 3 hole) with a
     * parallel solid torus of voxels removed from its inside, walls one voxel thick all round.
     * H = Z, Z^2, Z, 0 (the torus: Hatcher, Algebraic Topology, 2002, §2.1). Indexed [z][y][x].
     */
    public static boolean[][][] torusShell() {
        boolean[][][] v = new boolean[5][9][9];
        for (int z = 0; z < 5; z++) {
            for (int y = 0; y < 9; y++) {
                for (int x = 0; x < 9; x++) {
                    boolean hole = x >= 3 && x <= 5 && y >= 3 && y <= 5;
                    boolean core = z >= 1 && z <= 3 && x >= 1 && x <= 7 && y >= 1 && y <= 7
                            && (x == 1 || x == 7 || y == 1 || y == 7);
                    v[z][y][x] = !hole && !core;
                }
            }
        }
        return v;
    }

    /** Plain bitmap P1, 1 = black = the mask, rows written without spaces between the digits. */
    public static byte[] p1(boolean[][] mask) {
        StringBuilder s = new StringBuilder("P1\n# a comment\n" + mask[0].length + " " + mask.length + "\n");
        for (boolean[] row : mask) {
            for (boolean b : row) {
                s.append(b ? '1' : '0');
            }
            s.append('\n');
        }
        return s.toString().getBytes(StandardCharsets.US_ASCII);
    }

    /** Plain grey map P2 with the mask at {@code on} and the rest at {@code off}. */
    public static byte[] p2(boolean[][] mask, int max, int on, int off) {
        StringBuilder s = new StringBuilder("P2\n" + mask[0].length + " " + mask.length + "\n" + max + "\n");
        for (boolean[] row : mask) {
            for (boolean b : row) {
                s.append(b ? on : off).append(' ');
            }
            s.append('\n');
        }
        return s.toString().getBytes(StandardCharsets.US_ASCII);
    }

    /** Plain colour map P3, grey colours. */
    public static byte[] p3(boolean[][] mask, int on, int off) {
        StringBuilder s = new StringBuilder("P3 " + mask[0].length + " " + mask.length + " 255\n");
        for (boolean[] row : mask) {
            for (boolean b : row) {
                int v = b ? on : off;
                s.append(v).append(' ').append(v).append(' ').append(v).append("  ");
            }
            s.append('\n');
        }
        return s.toString().getBytes(StandardCharsets.US_ASCII);
    }

    /** Raw bitmap P4: rows packed eight pixels a byte, most significant bit first, padded. */
    public static byte[] p4(boolean[][] mask) {
        ByteArrayOutputStream out = header("P4\n" + mask[0].length + " " + mask.length + "\n");
        for (boolean[] row : mask) {
            for (int b = 0; b < (row.length + 7) / 8; b++) {
                int value = 0;
                for (int bit = 0; bit < 8; bit++) {
                    int x = 8 * b + bit;
                    if (x < row.length && row[x]) {
                        value |= 0x80 >> bit;
                    }
                }
                out.write(value);
            }
        }
        return out.toByteArray();
    }

    /** Raw grey map P5, two bytes per sample (most significant first) when {@code max > 255}. */
    public static byte[] p5(boolean[][] mask, int max, int on, int off) {
        ByteArrayOutputStream out = header("P5\n" + mask[0].length + " " + mask.length + "\n" + max + "\n");
        for (boolean[] row : mask) {
            for (boolean b : row) {
                int v = b ? on : off;
                if (max > 255) {
                    out.write(v >> 8);
                }
                out.write(v & 0xFF);
            }
        }
        return out.toByteArray();
    }

    /** Raw colour map P6: the mask in red, the rest in blue, so only the luminance tells them apart. */
    public static byte[] p6(boolean[][] mask) {
        ByteArrayOutputStream out = header("P6 " + mask[0].length + " " + mask.length + " 255\n");
        for (boolean[] row : mask) {
            for (boolean b : row) {
                // luminance of pure red 255 is 76, of pure blue 255 is 29 (BT.601 weights)
                out.write(b ? 255 : 0);
                out.write(0);
                out.write(b ? 0 : 255);
            }
        }
        return out.toByteArray();
    }

    /** An 8-bit grey PNG through javax.imageio, the mask white on black. */
    public static void png(boolean[][] mask, Path file) throws IOException {
        BufferedImage image = new BufferedImage(mask[0].length, mask.length, BufferedImage.TYPE_BYTE_GRAY);
        for (int y = 0; y < mask.length; y++) {
            for (int x = 0; x < mask[0].length; x++) {
                image.getRaster().setSample(x, y, 0, mask[y][x] ? 255 : 0);
            }
        }
        if (!ImageIO.write(image, "png", file.toFile())) {
            throw new IOException("no PNG writer");
        }
    }

    /** Raw bytes, x fastest, then y, then z: {@code on} for the mask, 0 elsewhere. */
    public static byte[] raw(boolean[][][] volume, int on) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        for (boolean[][] slice : volume) {
            for (boolean[] row : slice) {
                for (boolean b : row) {
                    out.write(b ? on : 0);
                }
            }
        }
        return out.toByteArray();
    }

    /** Writes bytes to a file and returns it. */
    public static Path write(Path file, byte[] bytes) throws IOException {
        Files.write(file, bytes);
        return file;
    }

    private static ByteArrayOutputStream header(String text) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        byte[] bytes = text.getBytes(StandardCharsets.US_ASCII);
        out.write(bytes, 0, bytes.length);
        return out;
    }
}
