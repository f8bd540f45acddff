package dev.morse.generate;

import dev.morse.image.VoxelSet;
import dev.morse.poset.Poset;
import java.util.function.IntFunction;

/**
 * The generated families as the command line offers them, each with the variants that make sense
 * for it: whole lattices or their proper parts, boundaries, closed balls or face lattices of
 * polytopes. Every method checks its arguments and throws {@link IllegalArgumentException} with a
 * message fit for users.
 */
public final class Families {
    private Families() {
    }

    /** The Boolean lattice {@code B_n}, or its proper part (the boundary of the (n-1)-simplex). */
    public static Generated booleanLattice(int n, boolean proper) {
        Poset p = proper ? BooleanLattice.properPart(n) : BooleanLattice.lattice(n);
        return new Generated.OfPoset(p, "the Boolean lattice B_" + n + part(proper));
    }

    /** Faces of the d-simplex. */
    public static Generated simplex(int d, FacePart part) {
        Poset p = facesOf(part, d, SimplexFaces::boundaryFacePoset, SimplexFaces::closedFacePoset,
                SimplexFaces::faceLattice);
        return new Generated.OfPoset(p, faces(part) + "the " + d + "-simplex");
    }

    /** Faces of the d-cube. */
    public static Generated cube(int d, FacePart part) {
        Poset p = facesOf(part, d, CubeFaces::boundaryFacePoset, CubeFaces::closedFacePoset, CubeFaces::faceLattice);
        return new Generated.OfPoset(p, faces(part) + "the " + d + "-cube");
    }

    /** The one of three face posets of a d-polytope that {@code part} asks for. */
    private static Poset facesOf(FacePart part, int d, IntFunction<Poset> boundary, IntFunction<Poset> closed,
            IntFunction<Poset> lattice) {
        IntFunction<Poset> chosen = switch (part) {
            case BOUNDARY -> boundary;
            case CLOSED -> closed;
            case LATTICE -> lattice;
        };
        return chosen.apply(d);
    }

    /** Faces of the d-dimensional cross-polytope. */
    public static Generated crossPolytope(int d, FacePart part) {
        return new Generated.OfPoset(CrossPolytopeFaces.of(part, d), faces(part) + "the " + d
                + "-dimensional cross-polytope");
    }

    /** The partition lattice {@code Π_n}, or its proper part. */
    public static Generated partitionLattice(int n, boolean proper) {
        Poset p = proper ? PartitionLattice.properPart(n) : PartitionLattice.lattice(n);
        return new Generated.OfPoset(p, "the partition lattice Pi_" + n + part(proper));
    }

    /** The noncrossing partition lattice {@code NC_n}, or its proper part. */
    public static Generated noncrossingPartitionLattice(int n, boolean proper) {
        Poset p = proper ? NoncrossingPartitionLattice.properPart(n) : NoncrossingPartitionLattice.lattice(n);
        return new Generated.OfPoset(p, "the noncrossing partition lattice NC_" + n + part(proper));
    }

    /** The subspaces of {@code F_q^n}, or its proper part. */
    public static Generated subspaceLattice(int q, int n, boolean proper) {
        Poset p = proper ? SubspaceLattice.properPart(q, n) : SubspaceLattice.lattice(q, n);
        return new Generated.OfPoset(p, "the subspace lattice of F_" + q + "^" + n + part(proper));
    }

    /** The Bruhat order of S_n, or its proper part. */
    public static Generated bruhatOrder(int n, boolean proper) {
        Poset p = proper ? BruhatOrder.properPart(n) : BruhatOrder.of(n);
        return new Generated.OfPoset(p, "the Bruhat order of S_" + n + part(proper));
    }

    /** Every poset on {@code n} elements up to isomorphism ({@link AllPosets}), each as its own input. */
    public static java.util.List<Generated> allPosets(int n) {
        java.util.List<Poset> all = AllPosets.of(n);
        java.util.List<Generated> out = new java.util.ArrayList<>();
        for (int i = 0; i < all.size(); i++) {
            out.add(new Generated.OfPoset(all.get(i), "poset " + (i + 1) + " of the " + all.size() + " on " + n
                    + " elements up to isomorphism"));
        }
        return out;
    }

    /** The divisors of N, or the open interval (1, N). */
    public static Generated divisorLattice(int n, boolean proper) {
        Poset p = proper ? DivisorLattice.openInterval(n) : DivisorLattice.lattice(n);
        return new Generated.OfPoset(p, proper ? "the open interval (1, " + n + ") of the divisor lattice"
                : "the divisor lattice of " + n);
    }

    /** The real projective space {@code RP^d} as the antipodal quotient of the boundary of the (d+1)-cube. */
    public static Generated projectiveSpace(int d) {
        return new Generated.OfPoset(ProjectiveSpace.antipodalCubeQuotient(d), "the real projective space RP^" + d
                + ", the boundary of the " + (d + 1) + "-cube modulo the antipodal map");
    }

    /** The matching complex of {@code K_n}. */
    public static Generated matchingComplex(int n) {
        return new Generated.OfFacets(MatchingComplex.facets(n), "the matching complex of K_" + n);
    }

    /**
     * The complex {@code kind} of the graph in {@code file} (DOT, GraphML or an edge list), as a
     * simplicial file or, for the connected induced subgraphs, a poset file.
     *
     * @throws dev.morse.io.InputException when the file is not a graph file or is malformed
     */
    public static Generated graphComplex(java.nio.file.Path file, dev.morse.graph.GraphComplex kind)
            throws java.io.IOException {
        dev.morse.io.InputFormat format = requireFile(file);
        if (format != dev.morse.io.InputFormat.DOT && format != dev.morse.io.InputFormat.GRAPHML
                && format != dev.morse.io.InputFormat.EDGES) {
            throw new dev.morse.io.InputException(file.toString(), dev.morse.io.InputException.NO_LINE,
                    "a graph file is needed here (.dot, .graphml or .edges), not a " + format.kind() + " file");
        }
        dev.morse.input.Input input = dev.morse.input.InputReaders.read(java.util.List.of(file),
                new dev.morse.input.ReadOptions(dev.morse.image.ImageOptions.defaults(), kind));
        String what = "the " + kind.optionName() + (kind == dev.morse.graph.GraphComplex.CONNECTED_SUBGRAPHS
                ? " poset" : " complex") + " of the graph " + file.getFileName();
        java.util.List<String> labels = new java.util.ArrayList<>();
        if (input instanceof dev.morse.input.PosetInput poset) {
            for (int x = 0; x < poset.poset().size(); x++) {
                labels.add(poset.poset().label(x));
            }
        } else {
            dev.morse.complex.Facets facets = ((dev.morse.input.FacetInput) input).facets();
            for (int v = 0; v < facets.vertexCount(); v++) {
                labels.add(facets.vertexLabel(v));
            }
        }
        for (String label : labels) {
            try {
                dev.morse.poset.PosetBuilder.requireWritableLabel(label);
            } catch (IllegalArgumentException e) {
                // a label with white space would be read back as several vertices: refuse rather than corrupt
                throw new dev.morse.io.InputException(file.toString(), dev.morse.io.InputException.NO_LINE,
                        "cannot be written as a morse file: " + e.getMessage()
                                + "; labels there have no white space, ':' or '#'");
            }
        }
        return input instanceof dev.morse.input.PosetInput poset ? new Generated.OfPoset(poset.poset(), what)
                : new Generated.OfFacets(((dev.morse.input.FacetInput) input).facets(), what);
    }

    /**
     * The face poset of the polygon mesh in {@code file} (OBJ or OFF), a CW poset.
     *
     * @throws dev.morse.io.InputException when the file is not a mesh file or is malformed
     */
    public static Generated meshFacePoset(java.nio.file.Path file) throws java.io.IOException {
        dev.morse.io.InputFormat format = requireFile(file);
        if (format != dev.morse.io.InputFormat.OBJ && format != dev.morse.io.InputFormat.OFF) {
            throw new dev.morse.io.InputException(file.toString(), dev.morse.io.InputException.NO_LINE,
                    "a mesh file is needed here (.obj or OFF), not a " + format.kind() + " file");
        }
        dev.morse.input.PosetInput input = (dev.morse.input.PosetInput) dev.morse.input.InputReaders.read(file);
        return new Generated.OfPoset(input.poset(), "the face poset of the polygon mesh " + file.getFileName());
    }

    private static dev.morse.io.InputFormat requireFile(java.nio.file.Path file) throws java.io.IOException {
        if (!java.nio.file.Files.isRegularFile(file)) {
            throw new dev.morse.io.InputException(file.toString(), dev.morse.io.InputException.NO_LINE,
                    java.nio.file.Files.exists(file) ? "is not a regular file" : "no such file");
        }
        return dev.morse.io.InputFormat.sniff(file);
    }

    /** The chessboard complex of the {@code m × n} board. */
    public static Generated chessboardComplex(int m, int n) {
        return new Generated.OfFacets(ChessboardComplex.facets(m, n), "the chessboard complex of the " + m + "x" + n
                + " board");
    }

    /** The sum complex {@code X_A} on Z/n of Linial, Meshulam and Rosenthal ({@link SumComplex}). */
    public static Generated sumComplex(int n, int[] a) {
        return new Generated.OfFacets(SumComplex.facets(n, a), "the sum complex X_A on Z/" + n + " with A = "
                + java.util.Arrays.toString(a));
    }

    /** Bing's house with two rooms as a cubical complex ({@link BingsHouse}): contractible, no free face. */
    public static Generated bingsHouse() {
        return new Generated.OfPoset(BingsHouse.facePoset(), "Bing's house with two rooms, a cubical complex of 70 squares");
    }

    /** A solid block with straight tunnels and sealed cavities ({@link VoxelBlock}). */
    public static Generated voxelBlock(int side, int tunnels, int cavities) {
        VoxelBlock block = VoxelBlock.of(side, tunnels, cavities);
        return new Generated.OfVoxels(block.voxels(), "a " + side + "^3 voxel block with " + tunnels + " tunnels and "
                + cavities + " cavities: H = Z, Z^" + tunnels + ", Z^" + cavities + ", 0");
    }

    /** A random set of pixels or voxels in a box of two or three axes. */
    public static Generated randomVoxels(int[] extents, double density, long seed) {
        if (extents.length < 2 || extents.length > 3) {
            throw new IllegalArgumentException("give two or three sizes, not " + extents.length);
        }
        VoxelSet voxels = RandomVoxels.of(extents, density, seed);
        StringBuilder box = new StringBuilder();
        for (int e : extents) {
            box.append(box.length() > 0 ? "x" : "").append(e);
        }
        return new Generated.OfVoxels(voxels, "random voxels in a " + box + " box, density " + density + ", seed " + seed);
    }

    /** A random poset ({@link RandomPoset}). */
    public static Generated randomPoset(int n, double density, long seed) {
        return new Generated.OfPoset(RandomPoset.of(n, density, seed), "a random poset of " + n
                + " elements, pairs related with probability " + density + ", seed " + seed);
    }

    private static String part(boolean proper) {
        return proper ? ", proper part" : "";
    }

    private static String faces(FacePart part) {
        return switch (part) {
            case BOUNDARY -> "nonempty proper faces of ";
            case CLOSED -> "nonempty faces of ";
            case LATTICE -> "all faces of ";
        };
    }
}
