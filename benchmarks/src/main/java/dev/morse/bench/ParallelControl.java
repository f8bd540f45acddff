package dev.morse.bench;

import java.util.Locale;

/**
 * A control for speedup measurements on a shared machine: the same CPU-bound loop (no memory, no
 * locks) once on one thread, then twice at once on two threads. On two idle cores the second takes as
 * long as the first, a throughput ratio of 2; whatever the machine gives less is not the program's.
 *
 * <p>Arguments: {@code [rounds]} (default 2).
 */
public final class ParallelControl {
    private static final long STEPS = 1_500_000_000L;

    private ParallelControl() {
    }

    /** Entry point. */
    public static void main(String[] args) throws InterruptedException {
        int rounds = args.length > 0 ? Integer.parseInt(args[0]) : 2;
        long sink = spin(STEPS / 10);
        for (int r = 0; r < rounds; r++) {
            long start = System.nanoTime();
            sink ^= spin(STEPS);
            double one = (System.nanoTime() - start) / 1e9;
            start = System.nanoTime();
            long[] results = new long[2];
            Thread a = new Thread(() -> results[0] = spin(STEPS));
            Thread b = new Thread(() -> results[1] = spin(STEPS));
            a.start();
            b.start();
            a.join();
            b.join();
            double two = (System.nanoTime() - start) / 1e9;
            sink ^= results[0] ^ results[1];
            System.out.printf(Locale.ROOT, "one loop on one thread %.2f s; two loops on two threads %.2f s;"
                    + " throughput ratio %.2f%n", one, two, 2 * one / two);
        }
        if (sink == 42) {
            System.out.println();
        }
    }

    /** A linear congruential walk the JIT cannot skip. */
    private static long spin(long steps) {
        long x = 1;
        for (long i = 0; i < steps; i++) {
            x = x * 6364136223846793005L + 1442695040888963407L;
        }
        return x;
    }
}
