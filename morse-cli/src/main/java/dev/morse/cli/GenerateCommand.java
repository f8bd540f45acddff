package dev.morse.cli;

import dev.morse.generate.FacePart;
import dev.morse.generate.Families;
import dev.morse.image.VolumeSize;
import java.io.IOException;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.ParameterException;

/**
 * {@code morse generate FAMILY ARGS -o FILE}: writes one poset or simplicial complex of a classical
 * family. Each family is one subcommand method; the mathematics is in {@link Families}.
 */
@Command(name = "generate", mixinStandardHelpOptions = true,
        description = {
            "Writes a poset (morse-poset 1) or a simplicial complex (morse-simplicial 1) of a classical family.",
            "Lattices come whole unless --proper is given; polytopes come as the boundary sphere unless --part says"
                    + " otherwise. Voxel families write the face poset of their cubical complex."
        },
        synopsisSubcommandLabel = "FAMILY",
        footer = "%nExample: morse generate partition 5 --proper -o pi5.poset")
final class GenerateCommand extends CommandGroup {
    private static final String PROPER = "Write the proper part (the lattice without its least and greatest elements).";
    private static final String PART = "boundary (default: the sphere), closed (the ball) or lattice (all faces, the"
            + " empty one included).";

    /** The size of the ground set of a lattice, and whether to keep only its proper part. */
    static final class LatticeOnSet {
        @Parameters(paramLabel = "N", description = "The size of the ground set.")
        int size;

        @Option(names = "--proper", description = PROPER)
        boolean proper;
    }

    /** The dimension of a polytope, and which of its faces to write. */
    static final class PolytopeFaces {
        @Parameters(paramLabel = "D", description = "The dimension.")
        int dimension;

        @Option(names = "--part", paramLabel = "PART", defaultValue = "boundary", description = PART,
                converter = OptionConverters.FacePartConverter.class)
        FacePart part;
    }

    GenerateCommand() {
        super("a family");
    }

    @Command(name = "boolean", mixinStandardHelpOptions = true, description = "The Boolean lattice B_n of subsets of {1..n}; proper part: the"
            + " boundary of the (n-1)-simplex, a sphere S^(n-2).")
    int booleanLattice(@Mixin LatticeOnSet lattice, @Mixin OutputFile output) throws IOException {
        return output.write(() -> Families.booleanLattice(lattice.size, lattice.proper));
    }

    @Command(name = "simplex", mixinStandardHelpOptions = true, description = "Face poset of the d-simplex.")
    int simplex(@Mixin PolytopeFaces faces, @Mixin OutputFile output) throws IOException {
        return output.write(() -> Families.simplex(faces.dimension, faces.part));
    }

    @Command(name = "cube", mixinStandardHelpOptions = true, description = "Face poset of the d-cube (faces as words over 0, 1, *).")
    int cube(@Mixin PolytopeFaces faces, @Mixin OutputFile output) throws IOException {
        return output.write(() -> Families.cube(faces.dimension, faces.part));
    }

    @Command(name = "cross", mixinStandardHelpOptions = true, description = "Face poset of the d-dimensional cross-polytope (faces as sign vectors).")
    int cross(@Mixin PolytopeFaces faces, @Mixin OutputFile output) throws IOException {
        return output.write(() -> Families.crossPolytope(faces.dimension, faces.part));
    }

    @Command(name = "partition", mixinStandardHelpOptions = true, description = "The partition lattice Pi_n; proper part: a wedge of (n-1)! spheres"
            + " S^(n-3) (Bjorner 1980).")
    int partition(@Mixin LatticeOnSet lattice, @Mixin OutputFile output) throws IOException {
        return output.write(() -> Families.partitionLattice(lattice.size, lattice.proper));
    }

    @Command(name = "noncrossing", mixinStandardHelpOptions = true, description = "The noncrossing partition lattice NC_n; proper part: a wedge of"
            + " Catalan(n-1) spheres S^(n-3) (Kreweras 1972).")
    int noncrossing(@Mixin LatticeOnSet lattice, @Mixin OutputFile output) throws IOException {
        return output.write(() -> Families.noncrossingPartitionLattice(lattice.size, lattice.proper));
    }

    @Command(name = "subspace", mixinStandardHelpOptions = true, description = "The lattice of subspaces of F_q^n (q a prime power); proper part: a"
            + " wedge of q^(n(n-1)/2) spheres S^(n-2) (Solomon-Tits).")
    int subspace(@Parameters(index = "0", paramLabel = "Q", description = "The order of the field.") int q,
            @Parameters(index = "1", paramLabel = "N", description = "The dimension of the space.") int n,
            @Option(names = "--proper", description = PROPER) boolean proper,
            @Mixin OutputFile output) throws IOException {
        return output.write(() -> Families.subspaceLattice(q, n, proper));
    }

    @Command(name = "bruhat", mixinStandardHelpOptions = true, description = "The Bruhat order of the symmetric group"
            + " S_n (n <= 6), permutations in one-line notation; proper part: without the identity and the reversal.")
    int bruhat(@Parameters(paramLabel = "N", description = "The degree of the symmetric group.") int n,
            @Option(names = "--proper", description = PROPER) boolean proper,
            @Mixin OutputFile output) throws IOException {
        return output.write(() -> Families.bruhatOrder(n, proper));
    }

    @Command(name = "posets", mixinStandardHelpOptions = true, description = "Every poset on n elements (n <= 7)"
            + " up to isomorphism, one file each (nN-0001.poset, ...) in a directory: 1, 1, 2, 5, 16, 63, 318, 2045 of"
            + " them for n = 0..7.")
    int posets(@Parameters(paramLabel = "N", description = "The number of elements.") int n,
            @Option(names = {"-o", "--output"}, paramLabel = "DIR", required = true,
                    description = "The directory to write into; created if needed.") java.nio.file.Path directory)
            throws IOException {
        java.util.List<dev.morse.generate.Generated> all;
        try {
            all = Families.allPosets(n);
        } catch (IllegalArgumentException e) {
            throw new ParameterException(spec.commandLine(), e.getMessage(), e);
        }
        java.util.Map<String, String> files = new java.util.LinkedHashMap<>();
        for (int i = 0; i < all.size(); i++) {
            dev.morse.generate.Generated g = all.get(i);
            files.put(String.format(java.util.Locale.ROOT, "n%d-%04d.poset", n, i + 1),
                    dev.morse.io.TextOutput.render(g::write));
        }
        OutputFiles.writeAll(directory, files);
        spec.commandLine().getOut().println("wrote " + all.size() + " posets on " + n + " elements into " + directory);
        return 0;
    }

    @Command(name = "divisor", mixinStandardHelpOptions = true, description = "The divisors of N under divisibility; proper part: the open interval"
            + " (1, N).")
    int divisor(@Parameters(paramLabel = "N", description = "The number.") int n,
            @Option(names = "--proper", description = "Write the open interval (1, N).") boolean proper,
            @Mixin OutputFile output) throws IOException {
        return output.write(() -> Families.divisorLattice(n, proper));
    }

    @Command(name = "projective", mixinStandardHelpOptions = true, description = "The real projective space RP^d: the boundary of the (d+1)-cube"
            + " modulo the antipodal map, a CW poset.")
    int projective(@Parameters(paramLabel = "D", description = "The dimension.") int d,
            @Mixin OutputFile output) throws IOException {
        return output.write(() -> Families.projectiveSpace(d));
    }

    @Command(name = "matching", mixinStandardHelpOptions = true, description = "The matching complex of the complete graph K_n (simplicial).")
    int matching(@Parameters(paramLabel = "N", description = "The number of vertices of K_n.") int n,
            @Mixin OutputFile output) throws IOException {
        return output.write(() -> Families.matchingComplex(n));
    }

    @Command(name = "graph", mixinStandardHelpOptions = true, description = "A complex of the graph in FILE (Graphviz"
            + " DOT, GraphML, or an edge list .edges): its clique, independence or matching complex (simplicial), or"
            + " the poset of its connected induced subgraphs.")
    int graph(@Parameters(paramLabel = "FILE", description = "The graph file.") java.nio.file.Path file,
            @Option(names = "--graph-as", paramLabel = "COMPLEX", defaultValue = "clique",
                    converter = OptionConverters.GraphComplexConverter.class,
                    description = "clique (default), independence, matching or connected-subgraphs.")
            dev.morse.graph.GraphComplex kind,
            @Mixin OutputFile output) throws IOException {
        dev.morse.generate.Generated made = Families.graphComplex(file, kind);
        return output.write(() -> made);
    }

    @Command(name = "mesh", mixinStandardHelpOptions = true, description = "The face poset of the polygon mesh in FILE"
            + " (Wavefront .obj or OFF): vertices, edges and polygons of its regular CW complex.")
    int mesh(@Parameters(paramLabel = "FILE", description = "The mesh file.") java.nio.file.Path file,
            @Mixin OutputFile output) throws IOException {
        dev.morse.generate.Generated made = Families.meshFacePoset(file);
        return output.write(() -> made);
    }

    @Command(name = "chessboard", mixinStandardHelpOptions = true, description = "The chessboard complex of non-attacking rooks on an M x N board"
            + " (simplicial).")
    int chessboard(@Parameters(index = "0", paramLabel = "M", description = "Rows.") int m,
            @Parameters(index = "1", paramLabel = "N", description = "Columns.") int n,
            @Mixin OutputFile output) throws IOException {
        return output.write(() -> Families.chessboardComplex(m, n));
    }

    @Command(name = "voxel-block", mixinStandardHelpOptions = true, description = "A solid SIDE^3 block of voxels with straight tunnels and sealed"
            + " cavities: H = Z, Z^tunnels, Z^cavities, 0.")
    int voxelBlock(@Parameters(paramLabel = "SIDE", description = "Voxels along each axis, at most 1290 (so that SIDE^3"
                    + " voxels fit an int index).") int side,
            @Option(names = "--tunnels", paramLabel = "T", defaultValue = "0", description = "Tunnels (default 0).")
                    int tunnels,
            @Option(names = "--cavities", paramLabel = "C", defaultValue = "0", description = "Cavities (default 0).")
                    int cavities,
            @Mixin OutputFile output) throws IOException {
        return output.write(() -> Families.voxelBlock(side, tunnels, cavities));
    }

    @Command(name = "random-voxels", mixinStandardHelpOptions = true, description = "Random pixels or voxels in a box, each present with the given"
            + " density.")
    int randomVoxels(@Parameters(paramLabel = "SIZE", description = "The box, like 20,20 or 20,20,20.",
                    converter = OptionConverters.VolumeSizeConverter.class) VolumeSize size,
            @Option(names = "--density", paramLabel = "P", defaultValue = "0.5",
                    description = "Probability of each position (default ${DEFAULT-VALUE}).") double density,
            @Option(names = "--seed", paramLabel = "S", defaultValue = "1", description = "Random seed (default"
                    + " ${DEFAULT-VALUE}).") long seed,
            @Mixin OutputFile output) throws IOException {
        return output.write(() -> Families.randomVoxels(size.extents(), density, seed));
    }

    @Command(name = "random-poset", mixinStandardHelpOptions = true, description = "A random poset: each pair i < j of N elements related with the"
            + " given density, then closed transitively.")
    int randomPoset(@Parameters(paramLabel = "N", description = "The number of elements.") int n,
            @Option(names = "--density", paramLabel = "P", defaultValue = "0.1",
                    description = "Probability of each relation (default ${DEFAULT-VALUE}).") double density,
            @Option(names = "--seed", paramLabel = "S", defaultValue = "1", description = "Random seed (default"
                    + " ${DEFAULT-VALUE}).") long seed,
            @Mixin OutputFile output) throws IOException {
        return output.write(() -> Families.randomPoset(n, density, seed));
    }
}
