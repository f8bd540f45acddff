package dev.morse.example;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;
import static org.junit.jupiter.api.Assumptions.assumeTrue;

import dev.morse.cli.MorseCommand;
import dev.morse.generate.Triangulations;
import dev.morse.io.SimplicialWriter;
import java.io.File;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.concurrent.TimeUnit;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import picocli.CommandLine;

/**
 * The plug-in end to end: with this module's jar on the class path, the real command line offers
 * {@code --matching lower-star}, verifies its matching and gets the right homology.
 */
class PluginCommandLineTest {
    /** The 6-vertex RP^2 (REFERENCES.md): H_0 = Z, H_1 = Z/2, H_2 = 0; the library's own triangulation. */
    private static final String RP2 = SimplicialWriter.toText(Triangulations.projectivePlane6());

    @TempDir
    Path dir;

    private record Run(int code, String out, String err) {
    }

    private static Run morse(String... args) {
        StringWriter out = new StringWriter();
        StringWriter err = new StringWriter();
        CommandLine command = MorseCommand.newCommandLine();
        command.setOut(new PrintWriter(out, true));
        command.setErr(new PrintWriter(err, true));
        int code = command.execute(args);
        return new Run(code, out.toString(), err.toString());
    }

    private String rp2() throws IOException {
        return Files.writeString(dir.resolve("rp2.simplicial"), RP2).toString();
    }

    @Test
    void homologyOffersThePlugInAndGetsTheRightAnswer() throws IOException {
        Run help = morse("homology", "--help");
        assertTrue(help.out().contains("lower-star"), "listed among the matchings:\n" + help.out());
        Run run = morse("homology", rp2(), "--matching", "lower-star");
        assertEquals(0, run.code(), run.err());
        List<String> lines = run.out().lines().toList();
        assertTrue(lines.get(3).startsWith("  matching  lower-star, critical cells "), lines.get(3));
        assertTrue(run.out().contains("    H_0 = Z\n    H_1 = Z/2\n    H_2 = 0\n"), run.out());
    }

    @Test
    void compareRunsThePlugInBesideTheBuiltInsAndFindsAgreement() throws IOException {
        Run run = morse("compare", rp2(), "--matching", "coreduction,lower-star");
        assertEquals(0, run.code(), run.err());
        assertTrue(run.out().contains("H_0 = Z, H_1 = Z/2, H_2 = 0 (by coreduction; every matching agrees)"), run.out());
        assertTrue(run.out().lines().anyMatch(l -> l.startsWith("  lower-star ")), run.out());
    }

    @Test
    void theShadedJarFindsThePlugInOnItsClassPath() throws Exception {
        Path jar = Path.of(System.getProperty("morse.jar", "../morse-cli/target/morse.jar"));
        Path classes = Path.of(System.getProperty("plugin.classes", "target/classes"));
        // the jar exists once morse-cli is packaged, as in a full build of the project
        assumeTrue(Files.isRegularFile(jar), "no " + jar + " to run");
        Path launcher = Path.of(System.getProperty("java.home"), "bin", "java");
        Process process = new ProcessBuilder(launcher.toString(), "-cp", jar + File.pathSeparator + classes,
                "dev.morse.cli.MorseCommand", "homology", rp2(), "--matching", "lower-star", "--json")
                .redirectErrorStream(true).start();
        String output = new String(process.getInputStream().readAllBytes(), StandardCharsets.UTF_8);
        assertTrue(process.waitFor(60, TimeUnit.SECONDS), "the command finished");
        assertEquals(0, process.exitValue(), output);
        assertTrue(output.contains("\"matching\": \"lower-star\""), output);
        assertTrue(output.contains("\"torsion\": [ 2 ]"), output);
    }
}
