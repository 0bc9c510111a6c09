package org.precedence.cli.simulate;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.PrintWriter;
import java.io.StringWriter;
import java.util.concurrent.atomic.LongAdder;
import org.junit.jupiter.api.Test;

class ProgressBarTest {

    @Test
    void close_disabledBarPrintsNothing() throws Exception {
        StringWriter sink = new StringWriter();
        LongAdder done = new LongAdder();
        ProgressBar bar = new ProgressBar(new PrintWriter(sink), done, 100, false, 0).start();
        done.add(50);
        Thread.sleep(300);
        bar.close();
        assertEquals("", sink.toString());
    }

    @Test
    void close_enabledBarDrawsThenErasesItself() throws Exception {
        StringWriter sink = new StringWriter();
        LongAdder done = new LongAdder();
        done.add(25);
        ProgressBar bar = new ProgressBar(new PrintWriter(sink), done, 100, true, 0).start();
        long deadline = System.nanoTime() + 5_000_000_000L;
        while (!sink.toString().contains("%") && System.nanoTime() < deadline) {
            Thread.sleep(20);
        }
        bar.close();
        String s = sink.toString();
        assertTrue(s.startsWith("\r["), s);
        assertTrue(s.contains("25.0%"), s);
        assertTrue(s.endsWith("\r"), "erased at the end");
    }

    @Test
    void close_shortRunPrintsNothingBeforeTheDelay() {
        StringWriter sink = new StringWriter();
        try (ProgressBar bar = new ProgressBar(new PrintWriter(sink), new LongAdder(), 100, true, 1000).start()) {
            // The run ends at once: well before the one-second delay.
            assertTrue(bar != null);
        }
        assertEquals("", sink.toString());
    }

    @Test
    void line_showsFractionRateAndTimeLeft() {
        String line = ProgressBar.line(50, 100, 2.0);
        assertTrue(line.startsWith("[###############               ]"), line);
        assertTrue(line.contains("50.0%"));
        assertTrue(line.contains("2s left"), line);
    }
}
