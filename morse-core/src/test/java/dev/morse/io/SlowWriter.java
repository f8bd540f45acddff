package dev.morse.io;

import java.io.IOException;
import java.nio.file.Path;

/**
 * A program for {@link AtomicOutputTest}: starts writing its argument through {@link AtomicOutput},
 * says so on standard output, and then waits to be stopped in the middle of the write.
 */
public final class SlowWriter {
    private SlowWriter() {
    }

    /** Writes to {@code args[0]} and never finishes. */
    public static void main(String[] args) throws IOException {
        AtomicOutput.write(Path.of(args[0]), out -> {
            out.write("partial\n");
            out.flush();
            System.out.println("writing");
            System.out.flush();
            try {
                Thread.sleep(Long.MAX_VALUE);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        });
    }
}
