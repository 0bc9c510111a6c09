package org.precedence.runtime.search;

import java.time.Duration;
import java.util.Objects;
import java.util.function.Consumer;

/**
 * What to search for: the side count of each die, the subset depth required (the number of
 * dice for order-fair sets), and how to run.
 *
 * @param sides      side count of each die, in die order (A first); at least 2 dice, each ≥ 1
 * @param depth      required subset depth: every {@code depth} of the dice must be order-fair
 * @param timeLimit  stop after this long (the result is then incomplete), or null for none
 * @param threads    worker threads (a fixed pool), ≥ 1
 * @param stopAfter  stop once this many classes have been found (incomplete then), 0 for never
 * @param progress   receives a progress line every few seconds on long runs, or null
 */
public record SearchRequest(int[] sides, int depth, Duration timeLimit, int threads,
                            long stopAfter, Consumer<String> progress) {

    /** The largest number of dice the exhaustive search accepts. */
    public static final int MAX_PLAYERS = 6;
    /** The largest side count the exhaustive search accepts. */
    public static final int MAX_SIDES = 60;

    public SearchRequest {
        Objects.requireNonNull(sides, "sides");
        sides = sides.clone();
        if (sides.length < 2 || sides.length > MAX_PLAYERS) {
            throw new IllegalArgumentException("the search takes 2.." + MAX_PLAYERS
                    + " dice, got " + sides.length);
        }
        for (int d = 0; d < sides.length; d++) {
            if (sides[d] < 1 || sides[d] > MAX_SIDES) {
                throw new IllegalArgumentException("side count " + sides[d] + " of die "
                        + (d + 1) + " is outside 1.." + MAX_SIDES);
            }
        }
        if (depth < 2 || depth > sides.length) {
            throw new IllegalArgumentException("subset depth must be 2.." + sides.length
                    + ", got " + depth);
        }
        if (threads < 1) {
            throw new IllegalArgumentException("threads must be >= 1, got " + threads);
        }
        if (stopAfter < 0) {
            throw new IllegalArgumentException("stop-after must be >= 0, got " + stopAfter);
        }
        if (timeLimit != null && (timeLimit.isNegative() || timeLimit.isZero())) {
            throw new IllegalArgumentException("time limit must be positive, got " + timeLimit);
        }
    }

    /** An exhaustive order-fair search on all available processors, no limit, silent. */
    public static SearchRequest orderFair(int... sides) {
        return new SearchRequest(sides, sides.length, null,
                Runtime.getRuntime().availableProcessors(), 0, null);
    }

    /** Returns this request with another required depth. */
    public SearchRequest withDepth(int newDepth) {
        return new SearchRequest(sides, newDepth, timeLimit, threads, stopAfter, progress);
    }

    /** Returns this request with a time limit. */
    public SearchRequest withTimeLimit(Duration limit) {
        return new SearchRequest(sides, depth, limit, threads, stopAfter, progress);
    }

    /** Returns this request with another thread count. */
    public SearchRequest withThreads(int count) {
        return new SearchRequest(sides, depth, timeLimit, count, stopAfter, progress);
    }

    /** Returns this request stopping after {@code classes} classes. */
    public SearchRequest withStopAfter(long classes) {
        return new SearchRequest(sides, depth, timeLimit, threads, classes, progress);
    }

    /** Returns this request reporting progress to {@code sink}. */
    public SearchRequest withProgress(Consumer<String> sink) {
        return new SearchRequest(sides, depth, timeLimit, threads, stopAfter, sink);
    }

    /** Returns the number of dice. */
    public int players() {
        return sides.length;
    }

    @Override
    public int[] sides() {
        return sides.clone();
    }

    @Override
    public boolean equals(Object o) {
        return o instanceof SearchRequest r && java.util.Arrays.equals(r.sides, sides)
                && r.depth == depth && Objects.equals(r.timeLimit, timeLimit)
                && r.threads == threads && r.stopAfter == stopAfter;
    }

    @Override
    public int hashCode() {
        return Objects.hash(java.util.Arrays.hashCode(sides), depth, timeLimit, threads, stopAfter);
    }

    @Override
    public String toString() {
        return "SearchRequest[sides=" + java.util.Arrays.toString(sides) + ", depth=" + depth
                + ", timeLimit=" + timeLimit + ", threads=" + threads + ", stopAfter="
                + stopAfter + "]";
    }
}
