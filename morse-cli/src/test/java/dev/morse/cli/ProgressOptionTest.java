package dev.morse.cli;

import static org.junit.jupiter.api.Assertions.assertEquals;

import java.io.IOException;
import java.nio.file.Path;
import java.util.List;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/**
 * The progress line shows only on a terminal. Tests never run on one ({@code System.console()} is
 * null), so standard error stays empty with or without {@code --quiet}, which every computing
 * command accepts.
 */
class ProgressOptionTest {
    @TempDir
    Path dir;

    @Test
    void everyComputingCommandAcceptsQuietAndWritesNothingToStandardError() throws IOException {
        String file = Inputs.write(dir, "square.poset", Inputs.SQUARE);
        String out = dir.resolve("out").toString();
        for (List<String> args : List.of(List.of("homology", file), List.of("inspect", file), List.of("compare", file),
                List.of("draw", file), List.of("export", file, "-o", out))) {
            for (String quiet : List.of("--quiet", "-q")) {
                List<String> all = new java.util.ArrayList<>(args);
                all.add(quiet);
                CliRun run = CliRun.morse(all.toArray(new String[0]));
                assertEquals(0, run.code(), all + ": " + run.err());
                assertEquals("", run.err(), all.toString());
            }
            CliRun run = CliRun.morse(args.toArray(new String[0]));
            assertEquals("", run.err(), args + " off a terminal");
        }
    }
}
