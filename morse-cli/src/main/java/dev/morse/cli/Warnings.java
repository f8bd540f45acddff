package dev.morse.cli;

import dev.morse.engine.Computation;
import dev.morse.input.Input;
import dev.morse.input.VoxelInput;
import dev.morse.matching.MatchingHeuristics;
import java.io.PrintWriter;
import java.util.ArrayList;
import java.util.List;
import picocli.CommandLine.Model.CommandSpec;

/**
 * Options that were given but do not apply to this input or engine. They are not errors (a script
 * may pass the same options to every file), but silence would let the user believe they took effect:
 * one line each on standard error, {@code morse: warning: ...}.
 */
final class Warnings {
    static final String PREFIX = "morse: warning: ";

    private Warnings() {
    }

    /** Image options given for an input that is not an image. */
    static List<String> imageOptions(Input input, boolean threshold, boolean invert) {
        List<String> found = new ArrayList<>();
        if (!(input instanceof VoxelInput)) {
            String what = input.source() + " is not an image";
            if (threshold) {
                found.add("--threshold applies only to images; " + what);
            }
            if (invert) {
                found.add("--invert applies only to images; " + what);
            }
        }
        return found;
    }

    /** Matching options given when the implicit engine, which has its own matching, ran. */
    static List<String> matchingOptions(Computation run, String matching, int trials) {
        List<String> found = new ArrayList<>();
        if (run.plan().isImplicit()) {
            String why = " does not apply: the order complex was generated on demand, with its own matching"
                    + " (--complex order stores it for the heuristics)";
            if (!matching.equals(MatchingHeuristics.DEFAULT)) {
                found.add("--matching " + matching + why);
            }
            if (trials > 1) {
                found.add("--trials " + trials + why);
            }
        }
        return found;
    }

    /** Prints each warning on its own line to the command's standard error. */
    static void print(CommandSpec spec, List<String> warnings) {
        PrintWriter err = spec.commandLine().getErr();
        for (String w : warnings) {
            err.println(PREFIX + w);
        }
        err.flush();
    }
}
