package dev.morse.cli;

import dev.morse.input.Input;
import dev.morse.interval.IntervalSweep;
import dev.morse.interval.PosetWithBounds;
import dev.morse.interval.SweepInputs;
import dev.morse.interval.SweepOptions;
import dev.morse.interval.SweepReport;
import java.util.concurrent.Callable;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Model.CommandSpec;
import picocli.CommandLine.Spec;

/** {@code morse intervals FILE}: the homology of every open interval of P̂ and the verdicts built on them. */
@Command(name = "intervals", mixinStandardHelpOptions = true,
        description = {
            "Computes the reduced homology of the order complex of every open interval (x, y) of P-hat, the poset"
                    + " with a least element 0^ and a greatest element 1^ adjoined, and decides whether P is pure,"
                    + " Cohen-Macaulay over the coefficients (naming the first interval that fails), spherical"
                    + " (Delta(P) has homology only in its top dimension), Eulerian and Gorenstein*.",
            "A simplicial file is swept through its face poset. Every Mobius value is checked against the reduced"
                    + " Euler characteristic of its interval (Philip Hall's theorem)."
        })
final class IntervalsCommand implements Callable<Integer> {
    @Spec
    private CommandSpec spec;

    @Mixin
    private SweepCommandOptions sweep;

    @Mixin
    private ThreadsOption threads;

    @Override
    public Integer call() throws Exception {
        SweepOptions options = sweep.options(threads.threads(spec));
        SweepReport report = sweep.around(spec, () -> {
            Input read = sweep.read();
            return IntervalSweep.run(PosetWithBounds.of(SweepInputs.posetOf(read)), read.source(), options);
        });
        return sweep.print(spec, report);
    }
}
