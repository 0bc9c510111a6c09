package org.precedence.cli.simulate;

/**
 * Raw counts of the sessions one worker ran, for one player count. Every figure is an integer
 * and merging only adds or takes maxima, so the merged tally does not depend on which worker
 * ran which sessions, nor in what order. Plain mutable fields: a tally is written by one
 * worker and read after the workers finish.
 */
final class Tally {
    /** Runs of the same first player of this length or longer share the last bucket. */
    static final int RUN_CAP = 20;

    final int players;
    /** Packed ranking counts ({@link Rankings#pack}); null beyond {@link Rankings#MAX_COUNTED}. */
    final long[] packed;
    /** {@code seat[player][position]}, kept directly only when rankings are not counted. */
    final long[][] seat;
    /** How often each player acted first. */
    final long[] leads;
    /** {@code runs[k]}: maximal runs of exactly k rounds with the same first player (k < cap). */
    final long[] runs = new long[RUN_CAP + 1];

    long rounds;
    long throwsTaken;
    long mostThrows;
    long longestRun;

    long sessionsCompleted;
    long lopsidedSessions;
    long doubleShareSessions;
    /** Sum over whole sessions of the busiest leader's lead count. */
    long sumBusiest;
    /** Largest lead count of one player in one whole session. */
    long worstBusiest;
    /** Sum over whole sessions of the session's longest run. */
    long sumLongestRun;

    Tally(int players) {
        this.players = players;
        this.packed = Rankings.counted(players) ? new long[Rankings.cells(players)] : null;
        this.seat = Rankings.counted(players) ? null : new long[players][players];
        this.leads = new long[players];
    }

    /** Adds {@code other} into this tally. */
    void add(Tally other) {
        if (other.players != players) {
            throw new IllegalArgumentException("cannot merge tallies of " + players + " and "
                    + other.players + " players");
        }
        if (packed != null) {
            for (int i = 0; i < packed.length; i++) {
                packed[i] += other.packed[i];
            }
        } else {
            for (int p = 0; p < players; p++) {
                for (int q = 0; q < players; q++) {
                    seat[p][q] += other.seat[p][q];
                }
            }
        }
        for (int p = 0; p < players; p++) {
            leads[p] += other.leads[p];
        }
        for (int k = 0; k < runs.length; k++) {
            runs[k] += other.runs[k];
        }
        rounds += other.rounds;
        throwsTaken += other.throwsTaken;
        mostThrows = Math.max(mostThrows, other.mostThrows);
        longestRun = Math.max(longestRun, other.longestRun);
        sessionsCompleted += other.sessionsCompleted;
        lopsidedSessions += other.lopsidedSessions;
        doubleShareSessions += other.doubleShareSessions;
        sumBusiest += other.sumBusiest;
        worstBusiest = Math.max(worstBusiest, other.worstBusiest);
        sumLongestRun += other.sumLongestRun;
    }

    /** Returns the player × position counts, derived from the ranking counts when those are kept. */
    long[][] seatCounts() {
        if (seat != null) {
            long[][] copy = new long[players][];
            for (int p = 0; p < players; p++) {
                copy[p] = seat[p].clone();
            }
            return copy;
        }
        long[][] s = new long[players][players];
        for (int[] ranking : Rankings.lexicographic(players)) {
            long c = packed[Rankings.pack(ranking, players)];
            for (int pos = 0; pos < players; pos++) {
                s[ranking[pos]][pos] += c;
            }
        }
        return s;
    }

    /** Returns the ranking counts in lexicographic ranking order, or null when not kept. */
    long[] rankingCounts() {
        if (packed == null) {
            return null;
        }
        int[][] all = Rankings.lexicographic(players);
        long[] c = new long[all.length];
        for (int i = 0; i < all.length; i++) {
            c[i] = packed[Rankings.pack(all[i], players)];
        }
        return c;
    }
}
