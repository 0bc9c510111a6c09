package org.precedence.cli.simulate;

import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;

/**
 * Cooperative cancellation of a run. Workers poll {@link #requested()} at check points (every
 * few thousand rounds) and stop there, leaving only whole rounds in their tallies.
 *
 * <p>{@link #installOnInterrupt()} adds a JVM shutdown hook (Ctrl-C sends SIGINT, which starts
 * the JVM's shutdown): the hook asks the run to stop, then waits (at most {@value
 * #GRACE_SECONDS} s) until the command has printed the partial result and called {@link
 * #finished()}, because the JVM exits as soon as the hooks return.
 */
final class Cancellation {
    static final int GRACE_SECONDS = 15;

    private final AtomicBoolean requested = new AtomicBoolean();
    private final CountDownLatch printed = new CountDownLatch(1);
    private Thread hook;

    /** Asks every worker to stop at its next check point. */
    void request() {
        requested.set(true);
    }

    /** Returns whether stopping was asked for. */
    boolean requested() {
        return requested.get();
    }

    /** Installs the shutdown hook described in the class comment. */
    void installOnInterrupt() {
        hook = new Thread(() -> {
            request();
            try {
                printed.await(GRACE_SECONDS, TimeUnit.SECONDS);
            } catch (InterruptedException e) {
                Thread.currentThread().interrupt();
            }
        }, "precedence-simulate-interrupt");
        Runtime.getRuntime().addShutdownHook(hook);
    }

    /** Tells the hook that the result is out; removes the hook when the JVM is not shutting down. */
    void finished() {
        printed.countDown();
        if (hook != null) {
            try {
                Runtime.getRuntime().removeShutdownHook(hook);
            } catch (IllegalStateException shuttingDown) {
                // The hook is running: it has just been released by the count-down above.
            }
            hook = null;
        }
    }
}
