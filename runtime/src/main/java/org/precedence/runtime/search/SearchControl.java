package org.precedence.runtime.search;

import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.LongAdder;

/**
 * Shared stop signal and work counters of one search run. Workers poll {@link #shouldStop}
 * cheaply (the clock is read only every few thousand nodes) so that a time limit or an early
 * stop takes effect within milliseconds on every thread.
 */
final class SearchControl {
    private final long deadlineNanos;
    private final AtomicBoolean stopped = new AtomicBoolean();
    private volatile String stopReason;
    final LongAdder nodes = new LongAdder();

    SearchControl(long deadlineNanos) {
        this.deadlineNanos = deadlineNanos;
    }

    /** Counts {@code n} visited nodes and reports whether the search must stop. */
    boolean shouldStop(long visitedSinceLastCheck) {
        if (stopped.get()) {
            return true;
        }
        nodes.add(visitedSinceLastCheck);
        if (deadlineNanos != Long.MAX_VALUE && System.nanoTime() - deadlineNanos > 0) {
            stop("time limit reached");
        }
        return stopped.get();
    }

    boolean stopped() {
        return stopped.get();
    }

    void stop(String reason) {
        if (stopped.compareAndSet(false, true)) {
            stopReason = reason;
        }
    }

    String stopReason() {
        return stopReason;
    }
}
