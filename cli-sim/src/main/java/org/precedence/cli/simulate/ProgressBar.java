package org.precedence.cli.simulate;

import java.io.PrintWriter;
import java.util.Locale;
import java.util.concurrent.atomic.LongAdder;

/**
 * A one-line progress bar on stderr, redrawn in place with a carriage return. It appears only
 * if the run is still going after a delay (one second by default), so short runs print nothing,
 * and it erases itself when closed, before the result is printed.
 */
final class ProgressBar implements AutoCloseable {
    private static final int WIDTH = 30;
    private static final long REDRAW_MILLIS = 200;

    private final PrintWriter err;
    private final LongAdder done;
    private final long total;
    private final long delayMillis;
    private final Thread thread;
    private volatile boolean stopped;
    private boolean drawn;

    /** Creates a bar; nothing happens until {@link #start()}, and nothing at all unless {@code enabled}. */
    ProgressBar(PrintWriter err, LongAdder done, long total, boolean enabled, long delayMillis) {
        this.err = err;
        this.done = done;
        this.total = Math.max(1, total);
        this.delayMillis = delayMillis;
        this.thread = enabled ? new Thread(this::loop, "precedence-progress") : null;
        if (thread != null) {
            thread.setDaemon(true);
        }
    }

    ProgressBar start() {
        if (thread != null) {
            thread.start();
        }
        return this;
    }

    private void loop() {
        long started = System.nanoTime();
        try {
            Thread.sleep(delayMillis);
            while (!stopped) {
                draw(started);
                Thread.sleep(REDRAW_MILLIS);
            }
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
        }
    }

    private synchronized void draw(long started) {
        if (stopped) {
            return;
        }
        err.print('\r' + line(done.sum(), total, (System.nanoTime() - started) / 1e9));
        err.flush();
        drawn = true;
    }

    /** Renders the bar for {@code now} of {@code total} rounds after {@code seconds}. */
    static String line(long now, long total, double seconds) {
        double fraction = Math.min(1.0, (double) now / total);
        int filled = (int) Math.round(fraction * WIDTH);
        double rate = seconds > 0 ? now / seconds : 0;
        String eta = rate > 0 ? formatSeconds((total - now) / rate) : "?";
        return "[" + "#".repeat(filled) + " ".repeat(WIDTH - filled) + "] "
                + String.format(Locale.ROOT, "%5.1f%%  %.1fM rounds/s  %s left  (Ctrl-C: stop and show so far)",
                        100 * fraction, rate / 1e6, eta);
    }

    private static String formatSeconds(double s) {
        long secs = Math.round(s);
        return secs >= 60 ? (secs / 60) + "m" + String.format(Locale.ROOT, "%02d", secs % 60) + "s" : secs + "s";
    }

    @Override
    public void close() {
        stopped = true;
        if (thread != null) {
            thread.interrupt();
            try {
                thread.join(1000);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }
        synchronized (this) {
            if (drawn) {
                err.print('\r' + " ".repeat(WIDTH + 80) + '\r');
                err.flush();
            }
        }
    }
}
