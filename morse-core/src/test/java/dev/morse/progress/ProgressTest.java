package dev.morse.progress;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertNull;
import static org.junit.jupiter.api.Assertions.assertSame;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.concurrent.atomic.AtomicReference;
import org.junit.jupiter.api.Test;

class ProgressTest {
    /** A clock that moves only when told to. */
    private static final class ManualClock implements ProgressCounter.Clock {
        private long now;

        @Override
        public long nanoTime() {
            return now;
        }

        void advanceSeconds(double seconds) {
            now += (long) (seconds * 1e9);
        }
    }

    @Test
    void withoutAnInstalledSinkPhasesReportToTheSilentOne() {
        assertSame(Progress.SILENT, Progress.current());
    }

    @Test
    void anInstalledSinkHoldsUntilItsScopeClosesAndOnlyOnItsThread() throws InterruptedException {
        ProgressCounter counter = new ProgressCounter();
        AtomicReference<Progress> seenElsewhere = new AtomicReference<>();
        try (ProgressScope scope = Progress.use(counter)) {
            assertSame(counter, Progress.current());
            Thread other = new Thread(() -> seenElsewhere.set(Progress.current()));
            other.start();
            other.join();
        }
        assertSame(Progress.SILENT, seenElsewhere.get());
        assertSame(Progress.SILENT, Progress.current());
    }

    @Test
    void nestedScopesRestoreTheOuterSink() {
        ProgressCounter outer = new ProgressCounter();
        try (ProgressScope a = Progress.use(outer)) {
            try (ProgressScope b = Progress.use(Progress.SILENT)) {
                assertSame(Progress.SILENT, Progress.current());
            }
            assertSame(outer, Progress.current());
        }
    }

    @Test
    void counterRemembersTheLatestPhaseAndCount() {
        ManualClock clock = new ManualClock();
        ProgressCounter counter = new ProgressCounter(clock);
        assertNull(counter.snapshot());
        clock.advanceSeconds(1);
        counter.begin("match", "cells", 1000);
        counter.reached(300);
        counter.advance(200);
        clock.advanceSeconds(2);
        ProgressSnapshot s = counter.snapshot();
        assertEquals(new ProgressSnapshot("match", "cells", 500, 1000, 2_000_000_000L, 3_000_000_000L), s);
        counter.begin("sweep", "critical cells", 0);
        assertEquals(0, counter.snapshot().done());
    }

    @Test
    void lineShowsPhaseCountTotalRateAndElapsedTime() {
        // 1,200,000 cells in 1.5 s of the phase: 800,000 per second
        ProgressSnapshot s = new ProgressSnapshot("match", "cells", 1_200_000, 5_000_000, 1_500_000_000L, 3_250_000_000L);
        assertEquals("match: 1,200,000 of 5,000,000 cells (24%), 800,000 cells/s, 3.3 s elapsed", s.line());
    }

    @Test
    void lineWithoutATotalShowsTheCountAlone() {
        ProgressSnapshot s = new ProgressSnapshot("read", "lines", 40_960, 0, 2_000_000_000L, 2_000_000_000L);
        assertEquals("read: 40,960 lines, 20,480 lines/s, 2.0 s elapsed", s.line());
    }

    @Test
    void displayRewritesOneLineAndBlanksItWhenClosed() {
        ManualClock clock = new ManualClock();
        ProgressCounter counter = new ProgressCounter(clock);
        StringWriter terminal = new StringWriter();
        ProgressDisplay display = ProgressDisplay.manual(new PrintWriter(terminal), counter);
        display.refresh();
        assertEquals("", terminal.toString(), "nothing to show before a phase begins");
        counter.begin("verify", "cells", 10);
        counter.reached(5);
        clock.advanceSeconds(1);
        display.refresh();
        String first = "verify: 5 of 10 cells (50%), 5 cells/s, 1.0 s elapsed";
        assertEquals("\r" + first, terminal.toString());
        counter.begin("sweep", "critical cells", 0);
        display.refresh();
        String second = "sweep: 0 critical cells, 1.0 s elapsed";
        String padded = second + " ".repeat(first.length() - second.length());
        assertEquals("\r" + first + "\r" + padded, terminal.toString());
        display.close();
        assertEquals("\r" + first + "\r" + padded + "\r" + " ".repeat(first.length()) + "\r", terminal.toString());
        display.refresh();
        display.close();
        assertEquals("\r" + first + "\r" + padded + "\r" + " ".repeat(first.length()) + "\r", terminal.toString(),
                "a closed display writes nothing more");
    }
}
