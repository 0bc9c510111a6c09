package org.precedence.runtime.randomness;

/**
 * A per-thread view of a {@link RollGenerator} that may keep state between requests, so that
 * callers walking counters in order pay less. It returns exactly the words of {@link
 * RollGenerator#block} for every request (tested); only the cost differs.
 *
 * <p>Not thread-safe: one per thread.
 */
public abstract class BlockCursor {
    BlockCursor() {
    }

    /** Writes the four words of the block at counter (c0, c1, c2, c3) into {@code out[0..3]}. */
    public abstract void block(long c0, long c1, long c2, long c3, long[] out);

    /** The plain cursor: every request goes to the generator. */
    static final class Direct extends BlockCursor {
        private final RollGenerator generator;

        Direct(RollGenerator generator) {
            this.generator = generator;
        }

        @Override
        public void block(long c0, long c1, long c2, long c3, long[] out) {
            generator.block(c0, c1, c2, c3, out);
        }
    }
}
