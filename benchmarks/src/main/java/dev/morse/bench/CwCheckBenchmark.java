package dev.morse.bench;

import dev.morse.cw.CwPosetCheck;
import dev.morse.cw.CwPosetVerdict;
import dev.morse.generate.FacePart;
import dev.morse.generate.Families;
import dev.morse.generate.Generated;
import dev.morse.generate.VoxelBlock;
import dev.morse.poset.Poset;
import org.openjdk.jmh.annotations.Benchmark;
import org.openjdk.jmh.annotations.Level;
import org.openjdk.jmh.annotations.Measurement;
import org.openjdk.jmh.annotations.Param;
import org.openjdk.jmh.annotations.Setup;
import org.openjdk.jmh.annotations.Warmup;

/**
 * Time of the CW poset check alone (thinness, the sphere test of every lower set, the incidence
 * signs) on posets already built: the boundary of the 8-cube, the proper part of B_12 and a
 * solid voxel block of 22^3 voxels. Threads as {@code -Dmorse.threads} says (default: all).
 */
@Warmup(iterations = 3)
@Measurement(iterations = 5)
public class CwCheckBenchmark extends BenchmarkDefaults {
    /** Which poset: {@code cube:D}, {@code boolean:N} or {@code block:SIDE}. */
    @Param({"cube:8", "boolean:12", "block:22"})
    public String input;

    private Poset poset;

    /** Builds the poset once per trial. */
    @Setup(Level.Trial)
    public void build() {
        String[] parts = input.split(":");
        int size = Integer.parseInt(parts[1]);
        poset = switch (parts[0]) {
            case "cube" -> ((Generated.OfPoset) Families.cube(size, FacePart.BOUNDARY)).poset();
            case "boolean" -> ((Generated.OfPoset) Families.booleanLattice(size, true)).poset();
            case "block" -> VoxelBlock.of(size, 0, 0).toPoset();
            default -> throw new IllegalArgumentException(input);
        };
    }

    /** The check. */
    @Benchmark
    public CwPosetVerdict check() {
        return CwPosetCheck.check(poset);
    }
}
