package org.precedence.runtime.provider;

/** Ranks one draw: writes the players of draw (stream, index) in acting order. */
@FunctionalInterface
interface Ranker {
    /** Writes the {@code players} players of the draw into {@code out[0..players)}, first to act first. */
    void rankInto(int stream, long index, int players, int[] out);
}
