package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assertions.fail;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;
import java.util.Random;
import java.util.stream.Stream;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * Mutated inputs and option lists against every command, in this JVM: whatever the input, the exit
 * code is 0 or 2, never 1; an exit code 2 comes with exactly one line on standard error and nothing
 * on standard output; and a failed run leaves the output directory as it was. Fixed seed; try others
 * with {@code -Dmorse.fuzz.seed=N} (and {@code -Dmorse.fuzz.runs=N}). Every failure names the seed,
 * the run, the command line and the input.
 */
class CommandFuzzTest {
    private static final long SEED = Long.getLong("morse.fuzz.seed", 20_261_202L);
    private static final int RUNS = Integer.getInteger("morse.fuzz.runs", 10_000);
    private static final String KEEP = "keep.txt";
    private static final String KEPT = "an output file that a failed run must leave alone\n";

    /** Valid inputs of every kind, to be mutated. */
    private static final List<String> BASES = List.of(
            Inputs.SQUARE, Inputs.RP2, Inputs.LOOP,
            "morse-poset 1\nv1\nv2\ne1: v1 v2\ne2: v1 v2\n",
            "morse-poset 1\n# nothing\n",
            "morse-simplicial 1\na b c\nc d\n",
            "morse-poset 1\nb\nx: b\ny: b\nt: x y\n",
            "P1\n3 3\n0 1 0\n1 1 1\n0 1 0\n",
            "P2\n3 2\n255\n0 200 0\n255 0 128\n",
            "P1\n4 4\n1 1 1 1\n1 0 0 1\n1 0 0 1\n1 1 1 1\n");
    /** Pieces inserted by mutations: format syntax, bad characters, numbers out of range. */
    private static final List<String> PIECES = List.of(":", ": ", "#", " ", "\n", "\t", "\u0000", "é", "\uFFFD", "\r\n",
            "morse-poset 1\n", "morse-simplicial 1\n", "morse-poset 2\n", "x: x\n", "a: b\nb: a\n", "-",
            "99999999999999999999", "2147483648", "-1", "0", "P1\n", "P4\n", "a a\n", "::", "v1: v1 v2\n", "x y z w\n");
    private static final List<String> FAMILIES = List.of("boolean", "simplex", "cube", "cross", "partition",
            "noncrossing", "divisor", "projective", "matching", "voxel-block", "random-poset", "random-voxels",
            "chessboard", "subspace", "no-such-family");
    private static final List<String> SIZES = List.of("-1", "0", "1", "2", "3", "x", "1000000000", "100000",
            "2147483648", "3,3", "0,0", "4,4,4");

    private final Random random = new Random(SEED);

    @TempDir
    Path dir;

    @Test
    void everyRunEndsInSuccessOrOneLineOfBadInput() throws IOException {
        Path in = Files.createDirectories(dir.resolve("in"));
        Path out = Files.createDirectories(dir.resolve("out"));
        Path keep = out.resolve(KEEP);
        // one command line for all runs, as picocli resets every option before it parses again:
        // building it costs more than most runs
        CommandLine line = MorseCommand.newCommandLine();
        long started = System.nanoTime();
        for (int run = 0; run < RUNS; run++) {
            Files.writeString(keep, KEPT);
            byte[] input = input();
            Path file = in.resolve("input" + pick(List.of(".poset", ".simplicial", ".pbm", ".txt", "")));
            Files.write(file, input);
            List<String> args = arguments(file, in, out);
            CliRun result = CliRun.run(line, args.toArray(new String[0]));
            String where = "seed " + SEED + ", run " + run + ": morse " + String.join(" ", args) + "\ninput:\n"
                    + new String(input, StandardCharsets.UTF_8) + "\nstdout:\n" + result.out() + "\nstderr:\n"
                    + result.err();
            if (result.code() != 0 && result.code() != 2) {
                fail("exit code " + result.code() + ", " + where);
            }
            if (result.code() == 2) {
                assertEquals(1, result.errLines().size(), "one line on standard error, " + where);
                assertEquals("", result.out(), "nothing on standard output, " + where);
                assertEquals(List.of(KEEP), names(out), "no output written, " + where);
                assertEquals(KEPT, Files.readString(keep), "the output file unchanged, " + where);
            } else {
                assertTrue(!result.err().contains("internal error"), where);
            }
            clear(out);
            Files.deleteIfExists(file);
        }
        System.out.printf(java.util.Locale.ROOT, "CommandFuzzTest: %d runs with seed %d in %.1f s%n", RUNS, SEED,
                (System.nanoTime() - started) / 1e9);
    }

    private <T> T pick(List<T> list) {
        return list.get(random.nextInt(list.size()));
    }

    /** A base input with up to three mutations; now and then raw bytes, invalid UTF-8 included. */
    private byte[] input() {
        if (random.nextInt(40) == 0) {
            byte[] bytes = new byte[random.nextInt(64)];
            random.nextBytes(bytes);
            return bytes;
        }
        String text = pick(BASES);
        int mutations = random.nextInt(4);
        for (int m = 0; m < mutations; m++) {
            text = mutate(text);
        }
        return text.getBytes(StandardCharsets.UTF_8);
    }

    private String mutate(String text) {
        int at = text.isEmpty() ? 0 : random.nextInt(text.length() + 1);
        List<String> lines = new ArrayList<>(text.lines().toList());
        switch (random.nextInt(7)) {
            case 0 -> {
                int end = Math.min(text.length(), at + 1 + random.nextInt(6));
                return text.substring(0, Math.min(at, text.length())) + text.substring(end);
            }
            case 1 -> {
                return text.substring(0, at) + pick(PIECES) + text.substring(at);
            }
            case 2 -> {
                if (!lines.isEmpty()) {
                    lines.add(random.nextInt(lines.size() + 1), pick(lines));
                }
                return String.join("\n", lines) + "\n";
            }
            case 3 -> {
                if (lines.size() > 1) {
                    int a = random.nextInt(lines.size());
                    int b = random.nextInt(lines.size());
                    String t = lines.get(a);
                    lines.set(a, lines.get(b));
                    lines.set(b, t);
                }
                return String.join("\n", lines) + "\n";
            }
            case 4 -> {
                return text.substring(0, at);
            }
            case 5 -> {
                return pick(List.of("morse-poset 1", "morse-simplicial 1", "P1", "P2", "", "# header?"))
                        + text.substring(text.indexOf('\n') < 0 ? text.length() : text.indexOf('\n'));
            }
            default -> {
                char c = (char) (' ' + random.nextInt(95));
                return text.substring(0, at) + c + text.substring(at);
            }
        }
    }

    /** A command line: a command, its files and outputs, and a few options, valid or not. */
    private List<String> arguments(Path file, Path in, Path out) throws IOException {
        List<String> args = new ArrayList<>();
        String output = random.nextInt(4) == 0 ? out.resolve(KEEP).toString() : out.resolve("made").toString();
        // compare measures heap peaks after a System.gc() per matching, so it is drawn rarely
        switch (random.nextInt(50) == 0 ? -1 : random.nextInt(9)) {
            case -1 -> args.addAll(List.of("compare", file.toString()));
            case 0, 1, 2, 4 -> args.addAll(List.of("homology", file.toString()));
            case 3 -> args.addAll(List.of("inspect", file.toString()));
            case 5 -> args.addAll(List.of("draw", file.toString(), "-o", output));
            case 6 -> args.addAll(List.of("export", file.toString(), "-o", out.resolve("exported").toString()));
            case 7 -> {
                String op = pick(List.of("dual", "proper-part", "subdivide", "product", "sum", "bogus"));
                args.addAll(List.of("op", op, file.toString()));
                if (op.equals("product") || op.equals("sum")) {
                    Path other = in.resolve("other.poset");
                    Files.writeString(other, Inputs.SQUARE);
                    args.add(random.nextBoolean() ? other.toString() : file.toString());
                }
                args.addAll(List.of("-o", output));
            }
            default -> {
                String family = pick(FAMILIES);
                args.addAll(List.of("generate", family, pick(SIZES)));
                if (family.equals("subspace") || family.equals("chessboard")) {
                    args.add(pick(SIZES));
                }
                if (random.nextBoolean()) {
                    args.addAll(List.of("-o", output));
                }
                return args;
            }
        }
        int options = random.nextInt(5);
        for (int i = 0; i < options; i++) {
            args.addAll(option());
        }
        return args;
    }

    private List<String> option() {
        return switch (random.nextInt(16)) {
            case 0 -> List.of("--json");
            case 1 -> List.of("--reduced");
            case 2 -> List.of("--complex", pick(List.of("auto", "order", "cellular", "implicit", "sideways")));
            case 3 -> List.of("--coefficients", pick(List.of("Z", "Q", "2", "3", "4", "0", "-3", "2147483647",
                    "9223372036854775783", "R")));
            case 4 -> List.of("--matching", pick(List.of("coreduction", "collapse", "lexicographic", "random", "none",
                    "none,none", "random,collapse", "bogus", "")));
            case 5 -> List.of("--trials", pick(List.of("0", "-1", "2", "3", "1000001", "1000000000", "many")));
            case 6 -> List.of("--seed", pick(List.of("1", "-5", "x", "99999999999999999999")));
            case 7 -> List.of("--max-stored-chains", pick(List.of("-1", "0", "5", "1152921504606846977", "x")));
            case 8 -> List.of("--threshold", pick(List.of("1", "-1", "300", "x")));
            case 9 -> List.of("--invert");
            case 10 -> List.of("--dims", pick(List.of("2,2", "8,8,8", "0,0", "-1,2", "1,1,1,1", "x")));
            case 11 -> List.of("--no-poset-reduction");
            case 12 -> List.of("--element-order", pick(List.of("down-sets", "ids", "upside-down")));
            case 13 -> List.of("--no-verify");
            case 14 -> List.of("--quiet");
            default -> List.of(pick(List.of("--bogus", "-z", "--trials", "--", "extra-file")));
        };
    }

    private static List<String> names(Path directory) throws IOException {
        try (Stream<Path> files = Files.list(directory)) {
            return files.map(p -> p.getFileName().toString()).sorted().toList();
        }
    }

    /** Removes everything in {@code directory} (a successful run's outputs) before the next run. */
    private static void clear(Path directory) throws IOException {
        try (Stream<Path> files = Files.walk(directory)) {
            for (Path p : files.sorted(Comparator.reverseOrder()).toList()) {
                if (!p.equals(directory)) {
                    Files.delete(p);
                }
            }
        }
    }
}
