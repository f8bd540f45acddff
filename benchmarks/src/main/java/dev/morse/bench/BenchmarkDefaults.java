package dev.morse.bench;

import java.util.concurrent.TimeUnit;
import org.openjdk.jmh.annotations.BenchmarkMode;
import org.openjdk.jmh.annotations.Fork;
import org.openjdk.jmh.annotations.Mode;
import org.openjdk.jmh.annotations.OutputTimeUnit;
import org.openjdk.jmh.annotations.Scope;
import org.openjdk.jmh.annotations.State;

/**
 * The settings the JMH benchmarks share: the benchmark class is its own state, one per run;
 * average time in milliseconds; one fork with a 2 GiB heap. JMH's class annotations are inherited
 * and the nearest one wins, so a benchmark states only what it does differently (its warm-up and
 * measurement iterations, a larger heap, another mode).
 */
@State(Scope.Benchmark)
@BenchmarkMode(Mode.AverageTime)
@OutputTimeUnit(TimeUnit.MILLISECONDS)
@Fork(value = 1, jvmArgsAppend = {"-Xmx2g"})
public abstract class BenchmarkDefaults {
}
