package dev.morse.cli;

import dev.morse.complex.ComplexChoice;
import dev.morse.homology.HomologyGroup;
import dev.morse.engine.Computation;
import dev.morse.engine.Engines;
import dev.morse.engine.Request;
import dev.morse.input.Input;
import dev.morse.input.PosetInput;
import dev.morse.inspect.PosetInspector;
import dev.morse.inspect.PosetSummary;
import dev.morse.input.InputReaders;
import dev.morse.report.TextReportWriter;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintWriter;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.Locale;
import java.util.StringJoiner;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Option;
import picocli.CommandLine.Spec;

/**
 * {@code morse demo}: three short stories on invented data, run through the same pipeline as
 * {@code morse homology}. The inputs live in the jar under {@code demo/}.
 */
@Command(name = "demo", mixinStandardHelpOptions = true, description = "Shows, on three small invented examples, what morse computes and why.")
final class DemoCommand implements Callable<Integer> {
    /** The wrapping tile map: a torus cut into 4 x 4 squares, as a face poset. */
    static final String TILE_MAP = "demo/tile-map.poset";
    /** The release plan: a poset of tasks that is not a CW poset. */
    static final String RELEASE_PLAN = "demo/release-plan.poset";
    /** The crew arrangements: the proper part of a partition lattice, told apart as a wedge of circles. */
    static final String CREW_SPLIT = "demo/crew-split.poset";

    @Spec
    private CommandSpec spec;

    // read by Failures through the parse result, which is where it matters
    @Option(names = "--debug", description = "Show stack traces of failures.")
    private boolean debug;

    @Override
    public Integer call() {
        StringBuilder text = new StringBuilder();
        text.append("""
                morse demo
                ==========
                Three short stories on invented data. Each input is a morse-poset file, run through
                the same steps as 'morse homology FILE'.

                1. A tile map that wraps around
                -------------------------------
                A level designer has drawn a map of 4 x 4 square tiles. Walking off the east side
                brings a player back on the west side, and off the north side back on the south.
                The file lists every corner, tile side and tile, each with the pieces on its
                border: the face poset of the map. Such a poset is a CW poset, so morse can
                compute on one cell per piece instead of one simplex per chain of pieces.

                """);
        Request options = Request.defaults();
        Input map = InputReaders.parse(TILE_MAP, resource(TILE_MAP));
        Computation cellular = Engines.compute(map, options);
        Computation order = Engines.compute(map, options.withComplex(ComplexChoice.ORDER));
        indent(text, TextReportWriter.toText(cellular));
        if (!cellular.homology().groups().equals(order.homology().groups())) {
            throw new IllegalStateException("the cellular and the order complex of the tile map disagree: "
                    + groups(cellular) + " against " + groups(order));
        }
        text.append(String.format(Locale.ROOT, """

                For comparison, the order complex of the same poset (what --complex order
                builds) has %d simplices, %s by dimension: %.1f times as many cells
                for the same homology, %s.
                These are the groups of a torus: one piece, two independent ways round
                (east-west and north-south), and one closed surface.

                2. A release plan
                -----------------
                Three designs come first; each of three builds waits for two of the designs, and
                each of two releases waits for two of the builds. Waiting is transitive, so the
                tasks form a poset. It is not a CW poset, so morse uses the order complex: one
                simplex per chain of tasks that must run one after another. First, though, it
                drops tasks that cannot change the answer: a task that waits for exactly one
                other, or that only one other waits for (a beat point), and a task whose
                predecessors (or successors) form an acyclic set. Four tasks go.

                """, order.totalCells(), counts(order), (double) order.totalCells() / cellular.totalCells(),
                groups(order)));
        Computation plan = Engines.compute(InputReaders.parse(RELEASE_PLAN, resource(RELEASE_PLAN)), options);
        indent(text, TextReportWriter.toText(plan));
        text.append(String.format(Locale.ROOT, """

                Betti numbers %s. H_1 counts the loops among the tasks that no chain of tasks
                fills in: the designs and builds go round one loop (server, api, web, ui, app,
                db, and back to server), and neither release closes it, since each waits for
                only two of the three builds.

                3. Is it a wedge of spheres?
                ----------------------------
                A scheduler splits four jobs among crews, and may merge two crews into one. The
                arrangements, ordered by merging, form a poset; leaving out "one crew per job"
                and "one crew for all" gives its proper part. A combinatorialist asks whether
                its order complex is a wedge of spheres, and how many: that number is, up to
                sign, the Möbius value of the whole poset from bottom to top.

                """, bettiNumbers(plan)));
        Input crews = InputReaders.parse(CREW_SPLIT, resource(CREW_SPLIT));
        Computation split = Engines.compute(crews, options.withHomology(options.coefficients(), true));
        indent(text, TextReportWriter.toText(split));
        PosetSummary summary = PosetInspector.inspect(((PosetInput) crews).poset());
        text.append(String.format(Locale.ROOT, """

                Reduced homology %s: only one dimension is nonzero, and the complex is a graph
                (chains have at most two arrangements), so it is a connected graph with %s
                independent loops: a wedge of that many circles. The Möbius value from bottom to
                top is %s, equal to the reduced Euler characteristic (Philip Hall's theorem);
                'morse inspect FILE' prints it.

                Try it on your own files: morse homology FILE [--json]; see morse homology --help.
                """, groups(split), split.homology().group(1).betti(), summary.mobius()));
        PrintWriter out = spec.commandLine().getOut();
        out.print(text);
        out.flush();
        return 0;
    }

    private static String resource(String name) {
        try (InputStream in = DemoCommand.class.getClassLoader().getResourceAsStream(name)) {
            if (in == null) {
                throw new IllegalStateException("the demo input " + name + " is missing from the jar");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    private static void indent(StringBuilder text, String block) {
        block.lines().forEach(line -> text.append("    ").append(line).append('\n'));
    }

    private static String counts(Computation report) {
        StringJoiner parts = new StringJoiner(" + ");
        report.cells().forEach(c -> parts.add(Long.toString(c)));
        return parts.toString();
    }

    private static String groups(Computation report) {
        StringJoiner parts = new StringJoiner(", ");
        for (HomologyGroup group : report.homology().groups()) {
            parts.add((report.reduced() ? "~H_" : "H_") + group.dimension() + " = "
                    + TextReportWriter.groupText(group, report.coefficients()));
        }
        return parts.toString();
    }

    private static String bettiNumbers(Computation report) {
        StringJoiner parts = new StringJoiner(", ", "[", "]");
        for (int betti : report.homology().bettiNumbers()) {
            parts.add(Integer.toString(betti));
        }
        return parts.toString();
    }
}
